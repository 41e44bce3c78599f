package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.plots.diagram.Canvas.Point;
import org.branchsim.plots.diagram.Canvas.Stroke;

/**
 * Draws in a symbol's own frame (origin at the symbol's centre, y down, the first port below) onto a canvas, at
 * a place and optionally mirrored top to bottom; and the compound marks symbols share: straight lines, arrows,
 * springs, arcs, envelopes (ISO 1219-1:2012 basic shapes).
 */
final class Pen {

    /** Arrowhead length and half width, diagram units. */
    private static final double HEAD = 7;
    private static final double HEAD_HALF = 3.2;

    private final Canvas canvas;
    private final double cx;
    private final double cy;
    private final boolean flipped;

    Pen(Canvas canvas, double cx, double cy, boolean flipped) {
        this.canvas = canvas;
        this.cx = cx;
        this.cy = cy;
        this.flipped = flipped;
    }

    /** @return a point of the symbol's frame on the canvas */
    Point at(double x, double y) {
        return new Point(cx + x, cy + (flipped ? -y : y));
    }

    void line(Stroke s, double... xy) {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            pts.add(at(xy[i], xy[i + 1]));
        }
        canvas.polyline(pts, s);
    }

    void line(double... xy) {
        line(Stroke.SOLID, xy);
    }

    void polygon(boolean filled, double... xy) {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            pts.add(at(xy[i], xy[i + 1]));
        }
        canvas.polygon(pts, filled);
    }

    void circle(double x, double y, double r, boolean filled) {
        Point p = at(x, y);
        canvas.circle(p.x(), p.y(), r, filled);
    }

    /** Square or rectangular envelope centred on (x, y). */
    void box(double x, double y, double halfW, double halfH) {
        polygon(false, x - halfW, y - halfH, x + halfW, y - halfH, x + halfW, y + halfH, x - halfW, y + halfH);
    }

    /** A straight flow arrow from (x0, y0) to (x1, y1), head filled, at the end. */
    void arrow(double x0, double y0, double x1, double y1) {
        double len = Math.hypot(x1 - x0, y1 - y0);
        double ux = (x1 - x0) / len;
        double uy = (y1 - y0) / len;
        double bx = x1 - HEAD * ux;
        double by = y1 - HEAD * uy;
        line(x0, y0, bx, by);
        polygon(true, x1, y1, bx - HEAD_HALF * uy, by + HEAD_HALF * ux, bx + HEAD_HALF * uy, by - HEAD_HALF * ux);
    }

    /** A compression spring drawn as a zigzag between (x0, y) and (x1, y). */
    void spring(double x0, double x1, double y) {
        int teeth = 6;
        double[] xy = new double[2 * (teeth + 2)];
        xy[0] = x0;
        xy[1] = y;
        for (int k = 1; k <= teeth; k++) {
            xy[2 * k] = x0 + (x1 - x0) * (k - 0.5) / teeth;
            xy[2 * k + 1] = y + (k % 2 == 1 ? -5 : 5);
        }
        xy[2 * teeth + 2] = x1;
        xy[2 * teeth + 3] = y;
        line(xy);
    }

    /** A spring with the oblique arrow that marks it adjustable. */
    void adjustableSpring(double x0, double x1, double y) {
        spring(x0, x1, y);
        arrow(x0 - 1, y + 9, x1 + 2, y - 10);
    }

    /** A circular arc around (x, y) of radius r from angle a0 to a1 (radians, y down, 0 = +x). */
    void arc(double x, double y, double r, double a0, double a1) {
        int n = 10;
        double[] xy = new double[2 * (n + 1)];
        for (int k = 0; k <= n; k++) {
            double a = a0 + (a1 - a0) * k / n;
            xy[2 * k] = x + r * Math.cos(a);
            xy[2 * k + 1] = y + r * Math.sin(a);
        }
        line(xy);
    }

    /** A restriction on a vertical line at (x, y): two arcs bowing towards the line. */
    void restriction(double x, double y) {
        double r = 9;
        arc(x - 3 - r, y, r, -0.7, 0.7);
        arc(x + 3 + r, y, r, Math.PI - 0.7, Math.PI + 0.7);
    }

    void text(double x, double y, String s, Canvas.Anchor anchor, double size) {
        Point p = at(x, y);
        canvas.text(p.x(), p.y(), s, anchor, size, false);
    }
}
