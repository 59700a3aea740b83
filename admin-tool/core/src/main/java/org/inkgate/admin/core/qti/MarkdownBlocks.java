package org.inkgate.admin.core.qti;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Prompts and instructions between Inkgate's Markdown and QTI's XHTML, block by block: the subset
 * the delivery client shows (headings, paragraphs, bulleted and numbered lists). Inline marks
 * ({@code *emphasis*}, links) stay as written text; HTML comments are left out (the client does not
 * show them either). A text written with one blank line between blocks, {@code -} bullets and
 * numbers from 1 comes back from {@link #toMarkdown} exactly as it was.
 */
public final class MarkdownBlocks {

    /** One block of a prompt. */
    public sealed interface Block permits Heading, Paragraph, ListBlock {
    }

    /** {@code #}..{@code ######}: level 1 to 6. */
    public record Heading(int level, String text) implements Block {
    }

    /** Lines of a paragraph, line breaks kept as written. */
    public record Paragraph(String text) implements Block {
    }

    public record ListBlock(boolean ordered, List<String> items) implements Block {
        public ListBlock {
            items = List.copyOf(items);
        }
    }

    private static final Pattern COMMENT = Pattern.compile("<!--.*?-->", Pattern.DOTALL);
    private static final Pattern HEADING = Pattern.compile("(#{1,6})\\s+(.*?)\\s*#*\\s*");
    private static final Pattern BULLET = Pattern.compile("\\s*[-*+]\\s+(.*)");
    private static final Pattern NUMBERED = Pattern.compile("\\s*\\d+[.)]\\s+(.*)");

    private MarkdownBlocks() {
    }

    public static List<Block> parse(String markdown) {
        List<Block> blocks = new ArrayList<>();
        StringBuilder paragraph = new StringBuilder();
        List<String> items = new ArrayList<>();
        Boolean ordered = null;
        String text = COMMENT.matcher(markdown.replace("\r\n", "\n").replace('\r', '\n')).replaceAll("");
        for (String line : text.split("\n", -1)) {
            Matcher h = HEADING.matcher(line);
            Matcher b = BULLET.matcher(line);
            Matcher n = NUMBERED.matcher(line);
            boolean item = b.matches() || n.matches();
            if (line.isBlank() || h.matches() || item) {
                flushParagraph(blocks, paragraph);
            }
            if (line.isBlank() || h.matches() || (item && ordered != null && ordered != n.matches())) {
                ordered = flushList(blocks, items, ordered);
            }
            if (line.isBlank()) {
                continue;
            }
            if (h.matches()) {
                blocks.add(new Heading(h.group(1).length(), h.group(2)));
            } else if (item) {
                ordered = n.matches();
                items.add(n.matches() ? n.group(1) : b.group(1));
            } else if (ordered != null) {
                // a line straight after a list item continues that item
                items.set(items.size() - 1, items.get(items.size() - 1) + "\n" + line);
            } else {
                paragraph.append(paragraph.isEmpty() ? "" : "\n").append(line);
            }
        }
        flushParagraph(blocks, paragraph);
        flushList(blocks, items, ordered);
        return blocks;
    }

    private static void flushParagraph(List<Block> blocks, StringBuilder paragraph) {
        if (!paragraph.isEmpty()) {
            blocks.add(new Paragraph(paragraph.toString()));
            paragraph.setLength(0);
        }
    }

    private static Boolean flushList(List<Block> blocks, List<String> items, Boolean ordered) {
        if (!items.isEmpty()) {
            blocks.add(new ListBlock(ordered, items));
            items.clear();
        }
        return null;
    }

    public static String toMarkdown(List<Block> blocks) {
        StringBuilder out = new StringBuilder();
        for (Block block : blocks) {
            if (!out.isEmpty()) {
                out.append("\n\n");
            }
            switch (block) {
                case Heading h -> out.append("#".repeat(h.level())).append(' ').append(h.text());
                case Paragraph p -> out.append(p.text());
                case ListBlock l -> {
                    for (int i = 0; i < l.items().size(); i++) {
                        out.append(i == 0 ? "" : "\n").append(l.ordered() ? (i + 1) + ". " : "- ").append(l.items().get(i));
                    }
                }
            }
        }
        return out.append('\n').toString();
    }

    /** Writes the blocks as XHTML elements (no namespace prefix: inside a QTI document they take its namespace). */
    public static void write(List<Block> blocks, XmlOut x) throws IOException {
        for (Block block : blocks) {
            switch (block) {
                case Heading h -> x.element("h" + h.level(), h.text());
                case Paragraph p -> x.element("p", p.text());
                case ListBlock l -> {
                    x.start(l.ordered() ? "ol" : "ul");
                    for (String item : l.items()) {
                        x.element("li", item);
                    }
                    x.end();
                }
            }
        }
    }
}
