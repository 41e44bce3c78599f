package org.branchsim.core.laws;

/**
 * Flow area of a poppet lifted from its seat, and the areas the seat's pressure acts on. A conical poppet (full
 * cone angle alpha) on a sharp seat of diameter d opens the lateral area of a cone frustum:
 * A = pi d x sin(alpha/2) (1 - x sin(alpha) / (2 d)) (geometry of the frustum surface; common textbook form),
 * which grows up to the useful lift d / sin(alpha) and stays there beyond it. A flat (disc) seat opens
 * A = pi d x up to x = d/4, where it equals the seat bore area. The hydraulic force acts on the seat area
 * pi d^2 / 4. The jet leaves at half the cone angle to the axis (used by {@link FlowForce}). Lengths in m,
 * areas in m^2, angles in rad. The cone's trigonometry is computed once: the simulator evaluates these laws at
 * every derivative evaluation.
 */
public final class PoppetSeat {

    /** Cone angles from this close to pi on count as a flat seat, rad. */
    private static final double FLAT_MARGIN = 1e-9;
    /** Smallest lift used for the gap's hydraulic diameter, m (keeps the laminar transition finite when seated). */
    private static final double MIN_GAP_LIFT = 1e-9;

    private final double seatDiameter;
    private final double coneAngle;
    private final boolean flat;
    private final double sinHalf;
    private final double sinFull;
    private final double usefulLift;

    /**
     * @param seatDiameter seat diameter d, m
     * @param coneAngle full cone angle alpha, rad (pi for a flat disc)
     */
    public PoppetSeat(double seatDiameter, double coneAngle) {
        this.seatDiameter = seatDiameter;
        this.coneAngle = coneAngle;
        this.flat = coneAngle >= Math.PI - FLAT_MARGIN;
        this.sinHalf = Math.sin(0.5 * Math.min(coneAngle, Math.PI));
        this.sinFull = Math.sin(coneAngle);
        this.usefulLift = flat ? 0.25 * seatDiameter : seatDiameter / sinFull;
    }

    /** @return the lift at which the frustum area stops growing (d / sin(alpha), or d/4 for a flat seat), m */
    public double usefulLift() {
        return usefulLift;
    }

    /**
     * @param lift poppet lift x, m (below zero counts as zero, beyond the useful lift as the useful lift)
     * @return flow area, m^2
     */
    public double area(double lift) {
        double x = Math.max(0.0, Math.min(lift, usefulLift));
        if (flat) {
            return Math.PI * seatDiameter * x;
        }
        return Math.PI * seatDiameter * x * sinHalf * (1.0 - x * sinFull / (2.0 * seatDiameter));
    }

    /**
     * @param lift poppet lift x, m
     * @return dA/dx, m: pi d sin(alpha/2) (1 - x sin(alpha) / d) for a cone, pi d for a flat seat, between the
     *         seat and the useful lift; zero outside (the area is constant there)
     */
    public double areaSlope(double lift) {
        if (lift <= 0.0 || lift >= usefulLift) {
            return 0.0;
        }
        if (flat) {
            return Math.PI * seatDiameter;
        }
        return Math.PI * seatDiameter * sinHalf * (1.0 - lift * sinFull / seatDiameter);
    }

    /** @return d(d_h)/dx of {@link #gapHydraulicDiameter}: 2 sin(alpha/2) above the smallest gap lift, else zero */
    public double gapHydraulicDiameterSlope(double lift) {
        return lift > MIN_GAP_LIFT ? 2.0 * sinHalf : 0.0;
    }

    /** @return the hydraulic diameter of the annular gap, twice the gap width x sin(alpha/2), m */
    public double gapHydraulicDiameter(double lift) {
        return 2.0 * sinHalf * Math.max(lift, MIN_GAP_LIFT);
    }

    /** @return the seat area pi d^2 / 4 the pressure acts on, m^2 */
    public double seatArea() {
        return 0.25 * Math.PI * seatDiameter * seatDiameter;
    }

    /** @return the angle of the jet leaving the seat to the poppet's axis, half the cone angle, rad */
    public double jetAngle() {
        return Math.min(coneAngle, Math.PI) / 2.0;
    }
}
