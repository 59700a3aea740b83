package org.inkgate.admin.core.qti;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayInputStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** The writer read back by the JDK's standard DOM parser (a conforming XML 1.0 processor). */
class XmlOutTest {

    private static Element readBack(String xml) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)))
                .getDocumentElement();
    }

    @Test
    void textAndAttributes_keepCrLfAndTab_throughAParser() throws Exception {
        StringWriter w = new StringWriter();
        String value = "a\r\nb\rc\nd\te \"q\" <&>";
        try (XmlOut x = new XmlOut(w)) {
            x.start("root").attribute("note", value).text(value).end();
        }
        Element root = readBack(w.toString());
        // XML 1.0 section 2.11 turns a raw CR into LF, section 3.3.3 turns raw tab/LF/CR in attributes into spaces:
        // only character references keep them
        assertEquals(value, root.getTextContent());
        assertEquals(value, root.getAttribute("note"));
    }

    @Test
    void forbiddenCharacters_becomeReplacementCharacters_andAreCounted() throws Exception {
        StringWriter w = new StringWriter();
        XmlOut x = new XmlOut(w);
        // section 2.2 Char excludes U+0000-U+0008, U+000B, U+000C, U+000E-U+001F, U+FFFE, U+FFFF and lone surrogates
        x.start("root").text("\u0000\u0008\u000B\u000C\u001F\uFFFE\uFFFF\uD800x\uDC00 \uD83D\uDE00 ok").end();
        x.close();
        assertEquals(9, x.replaced());
        assertEquals("\uFFFD".repeat(8) + "x\uFFFD \uD83D\uDE00 ok", readBack(w.toString()).getTextContent());
    }

    @Test
    void mixedContent_isNotIndented_elementContentIs() throws Exception {
        StringWriter w = new StringWriter();
        try (XmlOut x = new XmlOut(w)) {
            x.start("div").start("p").text("one ").start("b").text("two").end().text(" three").end().end();
        }
        assertEquals("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<div>\n  <p>one <b>two</b> three</p>\n</div>\n",
                w.toString());
    }
}
