package org.inkgate.admin.core.qti;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * A small streaming XML 1.0 writer for the QTI files, written here because the JDK's writers leave
 * a carriage return in text as a raw character, which every XML parser turns into a line feed (XML
 * 1.0, section 2.11), and pass characters XML 1.0 forbids straight into the file. Here:
 * <ul>
 *   <li>text escapes {@code & < >} and writes CR as {@code &#13;}, so a CR survives a round trip;</li>
 *   <li>attribute values also escape {@code "} and write tab, LF and CR as character references
 *       (section 3.3.3, attribute-value normalisation, would otherwise turn them into spaces);</li>
 *   <li>characters outside XML 1.0's {@code Char} production (section 2.2: controls other than tab,
 *       LF, CR; U+FFFE, U+FFFF; unpaired surrogates) become U+FFFD REPLACEMENT CHARACTER and are
 *       counted ({@link #replaced()}): no character reference can carry them.</li>
 * </ul>
 * Elements are indented two spaces per level unless they hold text.
 */
public final class XmlOut implements AutoCloseable {

    /** What stands in for a character XML 1.0 forbids. */
    public static final char REPLACEMENT = '\uFFFD';

    private final Writer out;
    private final Deque<Frame> open = new ArrayDeque<>();
    private boolean startTagOpen;
    private long replaced;

    /** An open element: its name, whether it holds element children, whether it holds text (mixed: no indenting). */
    private static final class Frame {
        final String name;
        boolean children;
        boolean text;

        Frame(String name) {
            this.name = name;
        }
    }

    public XmlOut(Writer out) throws IOException {
        this.out = out;
        out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
    }

    /** Opens an element (qualified name as written, e.g. {@code qti-item-body} or {@code ink:policy}). */
    public XmlOut start(String name) throws IOException {
        closeStartTag();
        Frame parent = open.peek();
        if (parent != null) {
            parent.children = true;
            if (!parent.text) {
                out.write('\n');
                indent(open.size());
            }
        }
        out.write('<');
        out.write(name);
        open.push(new Frame(name));
        startTagOpen = true;
        return this;
    }

    /** Adds an attribute to the element just opened; a null value writes nothing. */
    public XmlOut attribute(String name, String value) throws IOException {
        if (!startTagOpen) {
            throw new IllegalStateException("attribute " + name + " after the start tag was closed");
        }
        if (value == null) {
            return this;
        }
        out.write(' ');
        out.write(name);
        out.write("=\"");
        escape(value, true);
        out.write('"');
        return this;
    }

    /** Writes text inside the open element (which from now on is not indented: its whitespace is content). */
    public XmlOut text(String text) throws IOException {
        closeStartTag();
        escape(text, false);
        open.element().text = true;
        return this;
    }

    /** An element holding only text. */
    public XmlOut element(String name, String text) throws IOException {
        start(name);
        text(text);
        return end();
    }

    public XmlOut end() throws IOException {
        Frame f = open.pop();
        if (startTagOpen) {
            out.write("/>");
            startTagOpen = false;
            return this;
        }
        if (f.children && !f.text) {
            out.write('\n');
            indent(open.size());
        }
        out.write("</");
        out.write(f.name);
        out.write('>');
        return this;
    }

    /** How many forbidden characters were replaced so far. */
    public long replaced() {
        return replaced;
    }

    @Override
    public void close() throws IOException {
        if (!open.isEmpty()) {
            throw new IllegalStateException("elements still open: " + open.peek().name);
        }
        out.write('\n');
        out.flush();
    }

    private void closeStartTag() throws IOException {
        if (startTagOpen) {
            out.write('>');
            startTagOpen = false;
        }
    }

    private void indent(int depth) throws IOException {
        for (int i = 0; i < depth; i++) {
            out.write("  ");
        }
    }

    private void escape(String s, boolean attribute) throws IOException {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                out.write(c);
                out.write(s.charAt(++i));
                continue;
            }
            switch (c) {
                case '&' -> out.write("&amp;");
                case '<' -> out.write("&lt;");
                case '>' -> out.write("&gt;");
                case '\r' -> out.write("&#13;");
                case '"' -> out.write(attribute ? "&quot;" : "\"");
                case '\n' -> out.write(attribute ? "&#10;" : "\n");
                case '\t' -> out.write(attribute ? "&#9;" : "\t");
                default -> {
                    if (allowed(c)) {
                        out.write(c);
                    } else {
                        out.write(REPLACEMENT);
                        replaced++;
                    }
                }
            }
        }
    }

    /** XML 1.0 section 2.2 {@code Char}, for one UTF-16 unit that is not part of a surrogate pair. */
    static boolean allowed(char c) {
        return c >= 0x20 && c <= 0xD7FF || c == 0x9 || c == 0xA || c == 0xD || c >= 0xE000 && c <= 0xFFFD;
    }
}
