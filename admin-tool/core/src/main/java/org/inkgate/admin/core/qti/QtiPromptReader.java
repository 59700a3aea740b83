package org.inkgate.admin.core.qti;

import static org.inkgate.admin.core.qti.QtiDom.children;
import static org.inkgate.admin.core.qti.QtiDom.descendants;
import static org.inkgate.admin.core.qti.QtiDom.local;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.w3c.dom.Element;

/**
 * Turns a QTI item's or test's body content into the blocks of an Inkgate prompt (headings,
 * paragraphs, lists), noting for the test owner each element a prompt cannot hold.
 */
final class QtiPromptReader {

    private static final Set<String> HTML_CONTAINERS = Set.of("div", "section", "article", "blockquote");

    private final List<String> notes;

    /** {@code notes} receives what was left out or changed, for the import's report. */
    QtiPromptReader(List<String> notes) {
        this.notes = notes;
    }

    /** Turns body content into prompt blocks, listing what the prompt cannot hold. */
    List<MarkdownBlocks.Block> blocks(List<Element> elements, String where) {
        List<MarkdownBlocks.Block> out = new ArrayList<>();
        for (Element e : elements) {
            String name = local(e);
            if (name.matches("h[1-6]")) {
                out.add(new MarkdownBlocks.Heading(name.charAt(1) - '0', text(e, where)));
            } else if (name.equals("p")) {
                out.add(new MarkdownBlocks.Paragraph(text(e, where)));
            } else if (name.equals("ul") || name.equals("ol")) {
                List<String> items = new ArrayList<>();
                for (Element li : children(e)) {
                    items.add(text(li, where));
                }
                out.add(new MarkdownBlocks.ListBlock(name.equals("ol"), items));
            } else if (name.equals("qti-extended-text-interaction") || name.equals("extendedTextInteraction")) {
                for (Element p : children(e)) {
                    if (local(p).equals("qti-prompt") || local(p).equals("prompt")) {
                        out.addAll(blocks(children(p).isEmpty() ? List.of(p) : children(p), where));
                    }
                }
            } else if (HTML_CONTAINERS.contains(name) || name.equals("qti-prompt") || name.equals("prompt")
                    || name.equals("qti-content-body")) {
                if (children(e).isEmpty() && !e.getTextContent().isBlank()) {
                    out.add(new MarkdownBlocks.Paragraph(text(e, where)));
                } else {
                    out.addAll(blocks(children(e), where));
                }
            } else {
                notes.add(where + ": " + name + " has no place in an Inkgate prompt"
                        + (e.getTextContent().isBlank() ? "; left out" : "; its text was kept as a paragraph"));
                if (!e.getTextContent().isBlank()) {
                    out.add(new MarkdownBlocks.Paragraph(e.getTextContent().strip()));
                }
            }
        }
        return out;
    }

    List<MarkdownBlocks.Block> blocks(Element parent, String where) {
        return blocks(children(parent), where);
    }

    private String text(Element e, String where) {
        for (Element inner : descendants(e, null)) {
            String n = local(inner);
            if (n.equals("img") || n.equals("object") || n.equals("math") || n.equals("audio") || n.equals("video")) {
                notes.add(where + ": " + n + " has no place in an Inkgate prompt; left out");
            }
        }
        return e.getTextContent().strip();
    }

    static List<Element> content(Element rubricBlock) {
        for (Element c : children(rubricBlock)) {
            if (local(c).equals("qti-content-body")) {
                return children(c);
            }
        }
        return children(rubricBlock);
    }
}
