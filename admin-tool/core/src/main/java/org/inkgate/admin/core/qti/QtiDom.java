package org.inkgate.admin.core.qti;

import java.util.ArrayList;
import java.util.List;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/** Small DOM readings the QTI importers share: QTI 3 and 2.x attribute names, classes, children, safe printing. */
final class QtiDom {

    private QtiDom() {
    }

    static String attribute(Element e, String qti3, String qti2) {
        return e.hasAttribute(qti3) ? e.getAttribute(qti3) : e.getAttribute(qti2);
    }

    static boolean hasClass(Element e, String cls) {
        return List.of(e.getAttribute("class").split("\\s+")).contains(cls);
    }

    static String local(Element e) {
        return e.getLocalName() == null ? e.getTagName() : e.getLocalName();
    }

    static List<Element> children(Element parent) {
        List<Element> out = new ArrayList<>();
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e) {
                out.add(e);
            }
        }
        return out;
    }

    /** Every descendant element (document order), or those with the given local name. */
    static List<Element> descendants(Element root, String name) {
        List<Element> out = new ArrayList<>();
        for (Element c : children(root)) {
            if (name == null || local(c).equals(name)) {
                out.add(c);
            }
            out.addAll(descendants(c, name));
        }
        return out;
    }

    /** Outside text as it may be shown: controls as \\uXXXX, at most 200 characters. */
    static String printable(String s) {
        StringBuilder out = new StringBuilder();
        s.codePoints().limit(200).forEach(c -> {
            if (c < 0x20 || (c >= 0x7F && c < 0xA0)) {
                out.append(String.format("\\u%04X", c));
            } else {
                out.appendCodePoint(c);
            }
        });
        return s.length() > 200 ? out + "..." : out.toString();
    }
}
