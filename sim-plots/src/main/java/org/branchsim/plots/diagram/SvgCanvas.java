package org.branchsim.plots.diagram;

import java.util.List;
import java.util.Locale;

/**
 * Writes the drawing primitives as SVG 1.1 text (W3C, "Scalable Vector Graphics 1.1", 2011): one self-contained
 * {@code <svg>} element, black lines on white, that a browser shows inline or from a file. Coordinates in diagram
 * units, kept to 0.1.
 */
public final class SvgCanvas implements Canvas {

    private final StringBuilder body = new StringBuilder();
    private final double width;
    private final double height;

    /** @param width drawing width, diagram units @param height drawing height, diagram units */
    public SvgCanvas(double width, double height) {
        this.width = width;
        this.height = height;
    }

    @Override
    public void polyline(List<Point> points, Stroke stroke) {
        body.append("<polyline fill=\"none\" points=\"").append(points(points)).append('"');
        if (stroke == Stroke.DASHED) {
            body.append(" stroke-dasharray=\"5 3\"");
        } else if (stroke == Stroke.HEAVY) {
            body.append(" stroke-width=\"2.6\"");
        }
        body.append("/>\n");
    }

    @Override
    public void polygon(List<Point> points, boolean filled) {
        body.append("<polygon points=\"").append(points(points)).append("\" fill=\"")
                .append(filled ? "black" : "none").append("\"/>\n");
    }

    @Override
    public void circle(double x, double y, double r, boolean filled) {
        body.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"%.1f\" fill=\"%s\"/>%n", x, y, r,
                filled ? "black" : "none"));
    }

    @Override
    public void text(double x, double y, String text, Anchor anchor, double size, boolean grey) {
        body.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"%.1f\" text-anchor=\"%s\"%s>",
                x, y, size, anchor.name().toLowerCase(Locale.ROOT), grey ? " fill=\"#555555\" font-style=\"italic\""
                        : " fill=\"black\"")).append(escape(text)).append("</text>\n");
    }

    /**
     * @param title the drawing's title (XML-escaped into {@code <title>}, read by screen readers)
     * @param description a longer description for {@code <desc>}, empty for none
     * @return the whole {@code <svg>} element
     */
    public String svg(String title, String description) {
        return String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\" "
                + "viewBox=\"0 0 %.0f %.0f\" role=\"img\" font-family=\"DejaVu Sans, Arial, sans-serif\">%n", width,
                height, width, height)
                + "<title>" + escape(title) + "</title>\n"
                + (description.isEmpty() ? "" : "<desc>" + escape(description) + "</desc>\n")
                + "<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n"
                + "<g stroke=\"black\" stroke-width=\"1.4\" stroke-linejoin=\"round\">\n"
                + body.toString().replace("<text ", "<text stroke=\"none\" ")
                + "</g>\n</svg>\n";
    }

    /** @return the text with the five XML special characters replaced by entities (XML 1.0, section 2.4) */
    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&apos;");
    }

    private static String points(List<Point> points) {
        StringBuilder sb = new StringBuilder();
        for (Point p : points) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            sb.append(String.format(Locale.ROOT, "%.1f,%.1f", p.x(), p.y()));
        }
        return sb.toString();
    }
}
