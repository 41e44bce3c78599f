package org.branchsim.plots.diagram;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.util.List;

/**
 * Paints the drawing primitives with Java2D onto a graphics context (the PNG rasteriser), with the same line
 * widths, dash pattern and text sizes as {@link SvgCanvas}, antialiased, black on white.
 */
public final class Java2dCanvas implements Canvas {

    private static final BasicStroke SOLID = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
    private static final BasicStroke DASHED = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
            10f, new float[] {5f, 3f}, 0f);
    private static final BasicStroke HEAVY = new BasicStroke(2.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
    private static final Color GREY = new Color(0x555555);

    private final Graphics2D g;

    /** @param g the graphics context to paint on (its transform sets the scale) */
    public Java2dCanvas(Graphics2D g) {
        this.g = g;
    }

    @Override
    public void polyline(List<Point> points, Stroke stroke) {
        g.setColor(Color.BLACK);
        g.setStroke(stroke == Stroke.DASHED ? DASHED : stroke == Stroke.HEAVY ? HEAVY : SOLID);
        g.draw(path(points, false));
    }

    @Override
    public void polygon(List<Point> points, boolean filled) {
        g.setColor(Color.BLACK);
        g.setStroke(SOLID);
        Path2D p = path(points, true);
        if (filled) {
            g.fill(p);
        }
        g.draw(p);
    }

    @Override
    public void circle(double x, double y, double r, boolean filled) {
        g.setColor(Color.BLACK);
        g.setStroke(SOLID);
        Ellipse2D e = new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
        if (filled) {
            g.fill(e);
        }
        g.draw(e);
    }

    @Override
    public void text(double x, double y, String text, Anchor anchor, double size, boolean grey) {
        g.setColor(grey ? GREY : Color.BLACK);
        g.setFont(new Font(Font.SANS_SERIF, grey ? Font.ITALIC : Font.PLAIN, (int) Math.round(size)));
        double w = g.getFontMetrics().stringWidth(text);
        double x0 = anchor == Anchor.START ? x : anchor == Anchor.MIDDLE ? x - w / 2 : x - w;
        g.drawString(text, (float) x0, (float) y);
    }

    private static Path2D path(List<Point> points, boolean closed) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(points.get(0).x(), points.get(0).y());
        for (int i = 1; i < points.size(); i++) {
            p.lineTo(points.get(i).x(), points.get(i).y());
        }
        if (closed) {
            p.closePath();
        }
        return p;
    }
}
