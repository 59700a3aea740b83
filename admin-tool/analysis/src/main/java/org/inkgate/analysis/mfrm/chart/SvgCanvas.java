package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;
import java.util.Locale;

/** Writes the drawing as a standalone SVG 1.1 element (W3C SVG 1.1 Second Edition). */
final class SvgCanvas implements Canvas {
    private final StringBuilder sb = new StringBuilder();
    private final int width;
    private final int height;

    SvgCanvas(int width, int height, String title) {
        this.width = width;
        this.height = height;
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(width)
                .append("\" height=\"").append(height).append("\" viewBox=\"0 0 ").append(width).append(' ')
                .append(height).append("\" role=\"img\" font-family=\"sans-serif\">");
        sb.append("<title>").append(escape(title)).append("</title>");
        rect(0, 0, width, height, Color.WHITE);
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Color colour, double w) {
        sb.append("<line x1=\"").append(n(x1)).append("\" y1=\"").append(n(y1)).append("\" x2=\"").append(n(x2))
                .append("\" y2=\"").append(n(y2)).append("\" stroke=\"").append(hex(colour))
                .append("\" stroke-width=\"").append(n(w)).append("\"/>");
    }

    @Override
    public void rect(double x, double y, double w, double h, Color fill) {
        sb.append("<rect x=\"").append(n(x)).append("\" y=\"").append(n(y)).append("\" width=\"").append(n(w))
                .append("\" height=\"").append(n(h)).append("\" fill=\"").append(hex(fill)).append("\"/>");
    }

    @Override
    public void circle(double cx, double cy, double r, Color fill) {
        sb.append("<circle cx=\"").append(n(cx)).append("\" cy=\"").append(n(cy)).append("\" r=\"").append(n(r))
                .append("\" fill=\"").append(hex(fill)).append("\"/>");
    }

    @Override
    public void polyline(double[] xs, double[] ys, Color colour, double w) {
        sb.append("<polyline fill=\"none\" stroke=\"").append(hex(colour)).append("\" stroke-width=\"").append(n(w))
                .append("\" points=\"");
        for (int i = 0; i < xs.length; i++) {
            sb.append(i == 0 ? "" : " ").append(n(xs[i])).append(',').append(n(ys[i]));
        }
        sb.append("\"/>");
    }

    @Override
    public void text(String s, double x, double y, double size, boolean bold, Color colour, Anchor anchor) {
        sb.append("<text x=\"").append(n(x)).append("\" y=\"").append(n(y)).append("\" font-size=\"").append(n(size))
                .append('"');
        if (bold) {
            sb.append(" font-weight=\"bold\"");
        }
        if (anchor != Anchor.START) {
            sb.append(" text-anchor=\"").append(anchor == Anchor.MIDDLE ? "middle" : "end").append('"');
        }
        sb.append(" fill=\"").append(hex(colour)).append("\">").append(escape(s)).append("</text>");
    }

    @Override
    public void verticalText(String s, double x, double y, double size, Color colour) {
        sb.append("<text transform=\"translate(").append(n(x)).append(',').append(n(y))
                .append(") rotate(-90)\" font-size=\"").append(n(size)).append("\" text-anchor=\"middle\" fill=\"")
                .append(hex(colour)).append("\">").append(escape(s)).append("</text>");
    }

    /** The finished element. */
    String finish() {
        return sb + "</svg>";
    }

    int width() {
        return width;
    }

    int height() {
        return height;
    }

    private static String n(double v) {
        return String.format(Locale.ROOT, "%.2f", v).replaceAll("\\.?0+$", "");
    }

    private static String hex(Color c) {
        return String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }

    static String escape(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '&' -> out.append("&amp;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&apos;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
