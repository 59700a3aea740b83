package org.inkgate.analysis.graphics;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Objects;
import java.util.function.Consumer;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.apache.batik.svggen.SVGIDGenerator;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Turns one Graphics2D drawing routine into SVG text (through Apache Batik's SVGGraphics2D) or
 * PNG bytes (through the JDK), so every chart of the analysis has a single drawing routine and
 * no hand-built SVG strings. Works with {@code java.awt.headless=true}.
 */
public final class Drawings {
    private static final String SVG_NS = "http://www.w3.org/2000/svg";

    private Drawings() {
    }

    /**
     * The drawing as one {@code <svg>} element, ready to inline into HTML.
     *
     * @param id      element id; also prefixes every id Batik generates (clip paths, gradients) so
     *                several drawings can share one page
     * @param title   accessible title, written as the SVG {@code <title>}
     * @param painter draws on a canvas of width x height pixels, origin top left
     */
    public static String svg(String id, String title, int width, int height, Consumer<Graphics2D> painter) {
        Objects.requireNonNull(id, "id");
        Document doc = newSvgDocument();
        SVGGeneratorContext ctx = SVGGeneratorContext.createDefault(doc);
        ctx.setIDGenerator(new PrefixedIds(id));
        ctx.setComment(null);
        ctx.setEmbeddedFontsOn(false);
        // Batik's default graphic context names the JDK's logical font 'Dialog', which no browser
        // knows (it falls back to a serif face); start every drawing in a sans-serif face instead
        SVGGeneratorContext.GraphicContextDefaults defaults = new SVGGeneratorContext.GraphicContextDefaults();
        defaults.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        ctx.setGraphicContextDefaults(defaults);
        SVGGraphics2D g = new SVGGraphics2D(ctx, false);
        g.setSVGCanvasSize(new Dimension(width, height));
        paintWhite(g, width, height);
        painter.accept(g);
        Element root = g.getRoot();
        root.setAttribute("id", id);
        root.setAttribute("viewBox", "0 0 " + width + " " + height);
        root.setAttribute("role", "img");
        Element titleElement = doc.createElementNS(SVG_NS, "title");
        titleElement.setTextContent(Objects.requireNonNullElse(title, ""));
        root.insertBefore(titleElement, root.getFirstChild());
        prefixFixedIds(root, id);
        sansSerifFamilies(root);
        StringWriter out = new StringWriter();
        try {
            g.stream(root, out, true, false);
        } catch (IOException e) {
            throw new UncheckedIOException("SVG writing failed in memory", e);
        }
        return withoutXmlProlog(out.toString());
    }

    /** The same drawing as PNG bytes. */
    public static byte[] png(int width, int height, Consumer<Graphics2D> painter) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            paintWhite(g, width, height);
            painter.accept(g);
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(image, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException("PNG encoding failed in memory", e);
        }
        return out.toByteArray();
    }

    private static void paintWhite(Graphics2D g, int width, int height) {
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
    }

    private static Document newSvgDocument() {
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            return f.newDocumentBuilder().getDOMImplementation().createDocument(SVG_NS, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK's XML DOM is not available", e);
        }
    }

    // Batik names its one shared <defs> "genericDefs" in every drawing; nothing refers to it, so
    // prefixing it keeps ids unique when several drawings are inlined in one page.
    private static void prefixFixedIds(Element root, String prefix) {
        NodeList all = root.getElementsByTagNameNS(SVG_NS, "*");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if ("genericDefs".equals(e.getAttribute("id"))) {
                e.setAttribute("id", prefix + "-genericDefs");
            }
        }
    }

    /** The JDK's logical font names, which mean nothing to a browser. */
    private static final java.util.regex.Pattern LOGICAL_FAMILY = java.util.regex.Pattern.compile(
            "font-family:\\s*'?(Dialog|DialogInput|SansSerif|Serif|Monospaced)'?");

    // every text of a chart is sans-serif: a logical family left by a library becomes the CSS generic
    private static void sansSerifFamilies(Element root) {
        NodeList all = root.getElementsByTagNameNS(SVG_NS, "*");
        for (int i = -1; i < all.getLength(); i++) {
            Element e = i < 0 ? root : (Element) all.item(i);
            if (e.hasAttribute("style")) {
                e.setAttribute("style", LOGICAL_FAMILY.matcher(e.getAttribute("style")).replaceAll("font-family:sans-serif"));
            }
            if (e.hasAttribute("font-family")) {
                e.setAttribute("font-family", "sans-serif");
            }
        }
    }

    // Inline SVG in HTML needs no XML declaration; Batik may write one for a streamed fragment.
    private static String withoutXmlProlog(String svg) {
        int start = svg.indexOf("<svg");
        return start > 0 ? svg.substring(start) : svg;
    }

    /** Batik's ids (clipPath1, ...) prefixed by the drawing's id, so inlined drawings never clash. */
    private static final class PrefixedIds extends SVGIDGenerator {
        private final String prefix;

        PrefixedIds(String prefix) {
            this.prefix = prefix;
        }

        @Override
        public String generateID(String kind) {
            return super.generateID(prefix + "-" + kind);
        }
    }
}
