package org.branchsim.plots.diagram;

import java.util.List;

/**
 * The drawing primitives a circuit diagram is made of, in diagram units (1 unit = 1 px in the PNG, 1 user unit in
 * the SVG; y grows downwards). One implementation writes SVG text, another paints with Java2D, so that both files
 * show the same drawing.
 */
public interface Canvas {

    /** Line style: solid for working lines, dashed for pilot and drain lines (ISO 1219-1:2012 line types). */
    enum Stroke {
        /** Working (main) line. */
        SOLID,
        /** Pilot or drain line. */
        DASHED,
        /** Symbol outline drawn a little heavier (actuator piston). */
        HEAVY
    }

    /** Text placement relative to its anchor point. */
    enum Anchor {
        /** Text starts at the point. */
        START,
        /** Text is centred on the point. */
        MIDDLE,
        /** Text ends at the point. */
        END
    }

    /** A point in diagram units. @param x right @param y down */
    record Point(double x, double y) {
    }

    /** Draws a polyline through the points (at least two). */
    void polyline(List<Point> points, Stroke stroke);

    /** Draws a closed polygon, filled with the line colour or only outlined. */
    void polygon(List<Point> points, boolean filled);

    /** Draws a circle of radius r around (x, y), filled with the line colour or only outlined. */
    void circle(double x, double y, double r, boolean filled);

    /** Writes text with its baseline at y; size in diagram units; grey for secondary labels (node names). */
    void text(double x, double y, String text, Anchor anchor, double size, boolean grey);
}
