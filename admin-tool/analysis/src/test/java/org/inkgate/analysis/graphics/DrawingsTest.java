package org.inkgate.analysis.graphics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HashSet;
import java.util.Set;
import java.util.function.Consumer;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/** One drawing routine gives well-formed SVG (W3C SVG 1.1 namespace) and a PNG (PNG spec signature). */
class DrawingsTest {
    // PNG signature bytes: PNG specification (W3C, 2003), section 5.2
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};

    private static final Consumer<Graphics2D> CLIPPED_DRAWING = g -> {
        g.setClip(new Rectangle(10, 10, 80, 40));
        g.setColor(Color.BLUE);
        g.fillRect(0, 0, 100, 60);
        g.setColor(Color.BLACK);
        g.drawString("bands <1-9> & \"criteria\"", 12, 30);
    };

    @Test
    void svg_ofADrawing_isWellFormedSvgWithTitleAndId() throws Exception {
        String svg = Drawings.svg("chart-a", "Scores by condition", 100, 60, CLIPPED_DRAWING);
        Element root = parse(svg).getDocumentElement();
        assertEquals("svg", root.getLocalName());
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI());
        assertEquals("chart-a", root.getAttribute("id"));
        assertEquals("0 0 100 60", root.getAttribute("viewBox"));
        assertEquals("Scores by condition", root.getElementsByTagNameNS("*", "title").item(0).getTextContent());
        assertTrue(svg.contains("bands &lt;1-9&gt; &amp;"), "text is escaped, not dropped");
    }

    @Test
    void svg_twoDrawingsOnOnePage_shareNoIds() throws Exception {
        Set<String> ids = new HashSet<>();
        for (String name : new String[] {"chart-a", "chart-b"}) {
            NodeList all = parse(Drawings.svg(name, name, 100, 60, CLIPPED_DRAWING)).getElementsByTagNameNS("*", "*");
            for (int i = 0; i < all.getLength(); i++) {
                String id = ((Element) all.item(i)).getAttribute("id");
                if (!id.isEmpty()) {
                    assertTrue(ids.add(id), "id used twice on one page: " + id);
                    assertTrue(id.startsWith(name), id + " carries its drawing's prefix");
                }
            }
        }
        assertTrue(ids.size() > 2, "the clip path got an id of its own: " + ids);
    }

    @Test
    void png_ofTheSameDrawing_isAPngImage() throws Exception {
        byte[] png = Drawings.png(100, 60, CLIPPED_DRAWING);
        assertArrayEquals(PNG_SIGNATURE, Arrays.copyOf(png, 8));
        var image = javax.imageio.ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(100, image.getWidth());
        assertEquals(Color.WHITE.getRGB(), image.getRGB(2, 2), "outside the clip stays white");
        assertEquals(Color.BLUE.getRGB(), image.getRGB(50, 45), "inside the clip is painted");
    }

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
    }

    @Test
    void svg_textInJavaLogicalFonts_isSansSerifForTheBrowser() throws Exception {
        // 'Dialog', 'Serif' and 'SansSerif' are the JDK's logical names; a browser knows none of them
        String svg = Drawings.svg("fonts", "Fonts", 200, 80, g -> {
            g.drawString("default", 5, 15);
            g.setFont(new java.awt.Font(java.awt.Font.DIALOG, java.awt.Font.PLAIN, 11));
            g.drawString("dialog", 5, 35);
            g.setFont(new java.awt.Font(java.awt.Font.SERIF, java.awt.Font.BOLD, 11));
            g.drawString("serif", 5, 55);
        });
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("font-family(?::|=\")\\s*([^;\"]+)").matcher(svg);
        int families = 0;
        while (m.find()) {
            assertEquals("sans-serif", m.group(1).trim(), svg);
            families++;
        }
        assertTrue(families > 0, svg);
    }
}
