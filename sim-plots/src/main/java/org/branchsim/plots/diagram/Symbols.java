package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.plots.diagram.Canvas.Point;
import org.branchsim.plots.diagram.Canvas.Stroke;

/**
 * The graphic symbol of each element kind, drawn from the rules of ISO 1219-1:2012 (fluid power graphical
 * symbols): energy conversion units in a circle with a filled triangle (pointing out of a pump, into a motor);
 * valves in square envelopes with the flow path as an arrow (in line with the ports when normally open, beside
 * them when normally closed), springs as zigzags (with an oblique arrow when adjustable), pilot and drain lines
 * dashed; a check valve as a ball on a seat; an orifice as a restriction of the line; a cylinder as its barrel,
 * piston and rod; a gas-loaded accumulator as an upright capsule with a separator. Each symbol is drawn in its
 * own frame: centre at the origin, y down, first port below ({@link #PORT_REACH} diagram units under the
 * centre), second port above. The element's id is written by the caller.
 */
final class Symbols {

    /** Distance of a port's end from the symbol's centre, diagram units. */
    static final double PORT_REACH = 32;
    /** Half the side of a valve envelope, diagram units. */
    static final double HALF = 17;

    private Symbols() {
    }

    /** @return the ports' ends in the symbol's own frame, in the kind's port order */
    static List<Point> ports(SymbolKind kind, int portCount) {
        return switch (kind) {
            case PILOT_REDUCING_VALVE, PILOT_RELIEF_VALVE -> List.of(new Point(0, PORT_REACH),
                    new Point(0, -PORT_REACH), new Point(76, 14));
            case DIRECT_REDUCING_VALVE -> List.of(new Point(0, PORT_REACH), new Point(0, -PORT_REACH),
                    new Point(46, 14));
            case CYLINDER -> List.of(new Point(-40, PORT_REACH), new Point(40, PORT_REACH));
            case ACCUMULATOR -> List.of(new Point(0, PORT_REACH));
            case GENERIC -> {
                List<Point> pts = new ArrayList<>();
                for (int i = 0; i < portCount; i++) {
                    pts.add(new Point((i / 2) * 12 - (portCount - 1) / 2 * 6.0, i % 2 == 0 ? PORT_REACH
                            : -PORT_REACH));
                }
                yield pts;
            }
            default -> List.of(new Point(0, PORT_REACH), new Point(0, -PORT_REACH));
        };
    }

    /** @return the leftmost and rightmost x the symbol reaches in its frame, diagram units */
    static double[] extent(SymbolKind kind) {
        return switch (kind) {
            case PUMP -> new double[] {-34, 20};
            case COMPENSATED_PUMP -> new double[] {-34, 40};
            case PILOT_RELIEF_VALVE -> new double[] {-30, 88};
            case MOTOR -> new double[] {-20, 34};
            case RELIEF_VALVE -> new double[] {-30, 40};
            case DIRECT_REDUCING_VALVE -> new double[] {-30, 58};
            case PILOT_REDUCING_VALVE -> new double[] {-30, 88};
            case DIRECTIONAL_PATH -> new double[] {-32, 34};
            case CYLINDER -> new double[] {-52, 72};
            default -> new double[] {-20, 20};
        };
    }

    /** Draws the symbol of a kind with the pen (which places and orients it). */
    static void draw(SymbolKind kind, Pen p, int portCount) {
        switch (kind) {
            case PUMP -> pump(p);
            case COMPENSATED_PUMP -> compensatedPump(p);
            case PILOT_RELIEF_VALVE -> pilotRelief(p);
            case MOTOR -> motor(p);
            case RELIEF_VALVE -> relief(p);
            case DIRECT_REDUCING_VALVE -> directReducing(p);
            case PILOT_REDUCING_VALVE -> pilotReducing(p);
            case DIRECTIONAL_PATH -> directionalPath(p);
            case CHECK_VALVE -> check(p);
            case ORIFICE -> orifice(p);
            case CYLINDER -> cylinder(p);
            case ACCUMULATOR -> accumulator(p);
            case LINE -> line(p);
            case GENERIC -> generic(p, portCount);
            default -> throw new IllegalArgumentException("no symbol for " + kind);
        }
    }

    private static void stubs(Pen p, double inner) {
        p.line(0, inner, 0, PORT_REACH);
        p.line(0, -inner, 0, -PORT_REACH);
    }

    /** Circle, filled triangle at the outlet pointing outwards, drive shaft to the left. */
    private static void pump(Pen p) {
        double r = 18;
        p.circle(0, 0, r, false);
        stubs(p, r);
        p.polygon(true, 0, -r, -6.5, -r + 10, 6.5, -r + 10);
        p.line(-r, 0, -34, 0);
        p.line(-29, -4, -25, 4);
    }

    /**
     * The pump with the oblique arrow across it (variable displacement) and, on its right, the compensator: a
     * dashed control line from the outlet to a spring that sets the pressure at which displacement is reduced.
     */
    private static void compensatedPump(Pen p) {
        pump(p);
        p.arrow(-16, 16, 16, -16);
        p.line(Stroke.DASHED, 0, -26, 26, -26, 26, -8);
        p.spring(18, 40, 0);
    }

    /**
     * Main stage: normally closed (arrow beside the ports), fixed spring; inlet pressure fed (dashed) under it and
     * through the damping orifice to its spring chamber, which the pilot stage (a small normally closed relief
     * valve with an adjustable spring) relieves through the external drain.
     */
    private static void pilotRelief(Pen p) {
        p.box(0, 0, HALF, HALF);
        stubs(p, HALF);
        p.arrow(7, HALF - 4, 7, -HALF + 4);
        p.line(Stroke.DASHED, 0, 24, -26, 24, -26, 0, -HALF, 0);
        p.spring(HALF, 34, 0);
        p.line(Stroke.DASHED, 34, 0, 46, 0, 46, -13);
        p.restriction(46, -5);
        double py = -22;
        p.box(46, py, 9, 9);
        p.arrow(49.5, py + 6, 49.5, py - 6);
        p.adjustableSpring(55, 68, py);
        p.line(Stroke.DASHED, 46, py - 9, 46, py - 16, 76, py - 16, 76, 14);
    }

    /** Circle, filled triangle at the inlet pointing inwards, output shaft to the right. */
    private static void motor(Pen p) {
        double r = 18;
        p.circle(0, 0, r, false);
        stubs(p, r);
        p.polygon(true, 0, r - 10, -6.5, r - 1.2, 6.5, r - 1.2);
        p.line(r, 0, 34, 0);
        p.line(25, -4, 29, 4);
    }

    /**
     * Normally closed: the arrow lies beside the ports; inlet pressure (dashed pilot line from the inlet) pushes
     * against the adjustable spring.
     */
    private static void relief(Pen p) {
        p.box(0, 0, HALF, HALF);
        stubs(p, HALF);
        p.arrow(7, HALF - 4, 7, -HALF + 4);
        p.line(Stroke.DASHED, 0, 24, -26, 24, -26, 0, -HALF, 0);
        p.adjustableSpring(HALF, 36, 0);
    }

    /** Normally open: arrow in line with the ports, outlet pressure fed back (dashed) against the spring. */
    private static void reducingMain(Pen p) {
        p.box(0, 0, HALF, HALF);
        stubs(p, HALF);
        p.arrow(0, HALF - 3, 0, -HALF + 3);
        p.line(Stroke.DASHED, 0, -25, -26, -25, -26, 0, -HALF, 0);
    }

    private static void directReducing(Pen p) {
        reducingMain(p);
        p.adjustableSpring(HALF, 36, 0);
        // drain of the spring chamber, dashed, to the drain port
        p.line(Stroke.DASHED, 36, 0, 46, 0, 46, 14);
    }

    /**
     * Main stage: normally open, fixed spring; its spring chamber fed from the outlet through the damping orifice
     * and relieved by the pilot stage (a small normally closed relief valve with an adjustable spring) whose
     * flow leaves through the external drain; pilot and drain lines dashed.
     */
    private static void pilotReducing(Pen p) {
        reducingMain(p);
        p.spring(HALF, 34, 0);
        // spring chamber to the pilot stage, through the damping orifice
        p.line(Stroke.DASHED, 34, 0, 46, 0, 46, -13);
        p.restriction(46, -5);
        double py = -22;
        p.box(46, py, 9, 9);
        p.arrow(49.5, py + 6, 49.5, py - 6);
        p.adjustableSpring(55, 68, py);
        // pilot stage outlet to the drain port
        p.line(Stroke.DASHED, 46, py - 9, 46, py - 16, 76, py - 16, 76, 14);
    }

    /**
     * One metering path of a directional valve: envelope with an open path, the parallel lines of an
     * infinitely variable (proportional) valve above and below, solenoid on the left, return spring on the right.
     */
    private static void directionalPath(Pen p) {
        p.box(0, 0, HALF, HALF);
        stubs(p, HALF);
        p.arrow(0, HALF - 3, 0, -HALF + 3);
        p.line(-HALF - 4, -HALF - 4, HALF + 4, -HALF - 4);
        p.line(-HALF - 4, HALF + 4, HALF + 4, HALF + 4);
        p.box(-HALF - 7, 0, 7, 6);
        p.line(-HALF - 14, 6, -HALF, -6);
        p.spring(HALF, 34, 0);
    }

    /** Ball on a conical seat: free flow from the first port (below) to the second. */
    private static void check(Pen p) {
        double r = 6.5;
        p.circle(0, -2, r, false);
        p.line(-10, -8, 0, 8, 10, -8);
        p.line(0, 8, 0, PORT_REACH);
        p.line(0, -2 - r, 0, -PORT_REACH);
    }

    /** The line through a restriction. */
    private static void orifice(Pen p) {
        p.line(0, PORT_REACH, 0, -PORT_REACH);
        p.restriction(0, 0);
    }

    /** Barrel, piston and rod (double-acting, single rod), ports under the cap end and the rod end. */
    private static void cylinder(Pen p) {
        p.box(0, 0, 52, 15);
        p.line(Stroke.HEAVY, -18, -15, -18, 15);
        p.line(-18, -3.5, 72, -3.5, 72, 3.5, -18, 3.5);
        p.line(-40, 15, -40, PORT_REACH);
        p.line(40, 15, 40, PORT_REACH);
    }

    /** Upright capsule, separator across it, filled triangle in the gas space (gas-loaded). */
    private static void accumulator(Pen p) {
        int n = 24;
        double[] xy = new double[2 * n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n;
            xy[2 * k] = 11 * Math.cos(a);
            xy[2 * k + 1] = -2 + 19 * Math.sin(a);
        }
        p.polygon(false, xy);
        p.line(-11, -2, 11, -2);
        p.polygon(true, 0, -15, -4.5, -8, 4.5, -8);
        p.line(0, 17, 0, PORT_REACH);
    }

    /** A line with dynamics of its own: drawn as a flexible line (an arc between its ends). */
    private static void line(Pen p) {
        stubs(p, 14);
        p.arc(0, 0, 14, Math.PI / 2, -Math.PI / 2);
    }

    /** A plain envelope with a line to each port. */
    private static void generic(Pen p, int portCount) {
        p.box(0, 0, HALF, HALF);
        List<Point> pts = ports(SymbolKind.GENERIC, portCount);
        for (Point q : pts) {
            p.line(q.x(), Math.signum(q.y()) * HALF, q.x(), q.y());
        }
    }
}
