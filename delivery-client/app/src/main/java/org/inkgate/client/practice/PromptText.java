package org.inkgate.client.practice;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * A prompt or instructions text reduced from Markdown to plain blocks: headings, paragraphs
 * and list items. Inline marks are dropped, HTML comments are left out, nothing is rendered
 * as HTML; this is deliberately a small subset, enough for prompts written as plain prose.
 */
public record PromptText(List<Block> blocks) {

    /** The kinds of block a prompt is made of. */
    public enum Kind { HEADING, PARAGRAPH, LIST_ITEM }

    /** One block of plain text. */
    public record Block(Kind kind, String text) {
        public Block {
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(text, "text");
        }
    }

    private static final Pattern COMMENT = Pattern.compile("<!--.*?-->", Pattern.DOTALL);
    private static final Pattern HEADING = Pattern.compile("^#{1,6}\\s+(.*?)\\s*#*\\s*$");
    private static final Pattern LIST_ITEM = Pattern.compile("^\\s*(?:[-*+]|\\d+[.)])\\s+(.*)$");
    private static final Pattern STRONG_OR_EMPHASIS = Pattern.compile("(\\*\\*|__|\\*|_)(\\S(?:.*?\\S)?)\\1");
    private static final Pattern CODE = Pattern.compile("`([^`]*)`");
    private static final Pattern LINK = Pattern.compile("\\[([^\\]]*)]\\([^)]*\\)");

    public PromptText {
        blocks = List.copyOf(blocks);
    }

    public static PromptText parse(String markdown) {
        List<Block> blocks = new ArrayList<>();
        StringBuilder paragraph = new StringBuilder();
        boolean inListItem = false;
        for (String line : COMMENT.matcher(markdown.replace("\r\n", "\n")).replaceAll("").split("\n", -1)) {
            var heading = HEADING.matcher(line);
            var item = LIST_ITEM.matcher(line);
            if (line.isBlank()) {
                flush(blocks, paragraph);
                inListItem = false;
            } else if (heading.matches()) {
                flush(blocks, paragraph);
                blocks.add(new Block(Kind.HEADING, inline(heading.group(1))));
                inListItem = false;
            } else if (item.matches()) {
                flush(blocks, paragraph);
                blocks.add(new Block(Kind.LIST_ITEM, inline(item.group(1))));
                inListItem = true;
            } else if (inListItem) {
                // a line straight after a list item continues that item
                Block last = blocks.removeLast();
                blocks.add(new Block(Kind.LIST_ITEM, last.text() + " " + inline(line)));
            } else {
                paragraph.append(paragraph.isEmpty() ? "" : " ").append(line.strip());
            }
        }
        flush(blocks, paragraph);
        return new PromptText(blocks);
    }

    /** The whole text as plain lines, for screen readers and tests. */
    public String plainText() {
        StringBuilder out = new StringBuilder();
        for (Block block : blocks) {
            if (!out.isEmpty()) {
                out.append('\n');
            }
            out.append(block.kind() == Kind.LIST_ITEM ? "- " : "").append(block.text());
        }
        return out.toString();
    }

    private static void flush(List<Block> blocks, StringBuilder paragraph) {
        if (!paragraph.isEmpty()) {
            blocks.add(new Block(Kind.PARAGRAPH, inline(paragraph.toString())));
            paragraph.setLength(0);
        }
    }

    private static String inline(String text) {
        String plain = LINK.matcher(text).replaceAll("$1");
        plain = CODE.matcher(plain).replaceAll("$1");
        plain = STRONG_OR_EMPHASIS.matcher(plain).replaceAll("$2");
        plain = STRONG_OR_EMPHASIS.matcher(plain).replaceAll("$2");
        return plain.strip();
    }
}
