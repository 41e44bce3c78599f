package org.branchsim.core.laws;

/**
 * Flow area of a poppet lifted from its seat. A conical poppet (full cone angle alpha) on a sharp seat of
 * diameter d opens the lateral area of a cone frustum: A = pi d x sin(alpha/2) (1 - x sin(alpha) / (2 d))
 * (geometry of the frustum surface; common textbook form). A flat (disc) seat opens A = pi d x, used up to
 * x = d/4 where it equals the seat bore area. The hydraulic force acts on the seat area pi d^2 / 4.
 */
public final class PoppetSeat {

    private PoppetSeat() {
    }

    /**
     * @param seatDiameter seat diameter d, m
     * @param coneAngle full cone angle alpha, rad (pi for a flat disc)
     * @param lift poppet lift x, m (values below zero give zero)
     * @return flow area, m^2
     */
    public static double area(double seatDiameter, double coneAngle, double lift) {
        double x = Math.max(0.0, lift);
        if (coneAngle >= Math.PI - 1e-9) {
            return Math.PI * seatDiameter * Math.min(x, 0.25 * seatDiameter);
        }
        return Math.PI * seatDiameter * x * Math.sin(0.5 * coneAngle)
                * (1.0 - x * Math.sin(coneAngle) / (2.0 * seatDiameter));
    }

    /** @return the lift at which the frustum area stops growing (or d/4 for a flat seat), m */
    public static double usefulLift(double seatDiameter, double coneAngle) {
        if (coneAngle >= Math.PI - 1e-9) {
            return 0.25 * seatDiameter;
        }
        return seatDiameter / Math.sin(coneAngle);
    }

    /** @return the hydraulic diameter of the annular gap at small lift (twice the gap width), m */
    public static double gapHydraulicDiameter(double coneAngle, double lift) {
        double gap = Math.max(lift, 1e-9) * Math.sin(0.5 * Math.min(coneAngle, Math.PI));
        return 2.0 * gap;
    }

    /** @return the seat area pi d^2 / 4 the pressure acts on, m^2 */
    public static double seatArea(double seatDiameter) {
        return 0.25 * Math.PI * seatDiameter * seatDiameter;
    }
}
