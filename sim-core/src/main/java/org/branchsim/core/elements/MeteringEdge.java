package org.branchsim.core.elements;

import org.branchsim.core.laws.FlowForce;
import org.branchsim.core.laws.OrificeLaw;

/**
 * The metering edge of a reducing valve's main spool. With spool travel y measured from the fully open
 * stop, the edge opening is s = L_open - y. The flow area is the edge's w * s while s > 0, plus a V-shaped
 * metering notch whose area grows as u^2 (u = (s + L_n)/L_n, 0..1) until the edge itself opens, so the
 * spool can hold a small, smoothly varying opening near closure. Flow by {@link OrificeLaw}; flow force by
 * {@link FlowForce} at the 69 deg jet angle, closing.
 *
 * @param spoolDiameter spool diameter (end area pi d^2/4 takes the pressures), m
 * @param width metering width (pi d for a full-circumference edge, less for slots), m
 * @param openLength edge opening at the fully open stop, L_open, m
 * @param notchLength length L_n over which the notch still passes flow after the edge closes, m
 * @param notchArea notch area when the edge is just closing (s = 0), m^2
 * @param cd discharge coefficient
 */
public record MeteringEdge(double spoolDiameter, double width, double openLength, double notchLength,
                           double notchArea, double cd) {

    /** @return spool end area, m^2 */
    public double endArea() {
        return OrificeLaw.circleArea(spoolDiameter);
    }

    /** @return edge opening s for spool travel y, m (negative when the edge overlaps) */
    public double opening(double travel) {
        return openLength - travel;
    }

    /** @return area of the main edge at opening s, m^2 */
    public double edgeArea(double s) {
        return width * Math.max(0.0, s);
    }

    /** @return area of the notch at opening s, m^2 */
    public double notchAreaAt(double s) {
        if (notchLength <= 0.0 || notchArea <= 0.0) {
            return 0.0;
        }
        double u = Math.max(0.0, Math.min(1.0, (s + notchLength) / notchLength));
        return notchArea * u * u;
    }

    /** @return total flow area at opening s, m^2 */
    public double area(double s) {
        return edgeArea(s) + notchAreaAt(s);
    }

    /**
     * @param s edge opening, m
     * @param dp inlet minus outlet pressure, Pa
     * @param density kg/m^3
     * @param nu kinematic viscosity, m^2/s
     * @return flow from inlet to outlet, m^3/s
     */
    public double flow(double s, double dp, double density, double nu) {
        return flowAt(s, dp, density, OrificeLaw.transitionConstant(cd, density, nu));
    }

    /**
     * The flow with the opening's laminar transition constant computed once by the caller: the edge's
     * transition pressure is K / (2 s)^2 (hydraulic diameter twice the opening), the notch's pi K / (4 A_n).
     *
     * @param s edge opening, m
     * @param dp inlet minus outlet pressure, Pa
     * @param density kg/m^3
     * @param transitionConstant K of {@link OrificeLaw#transitionConstant}, Pa m^2
     * @return flow from inlet to outlet, m^3/s
     */
    public double flowAt(double s, double dp, double density, double transitionConstant) {
        double q = 0.0;
        double edge = edgeArea(s);
        if (edge > 0.0) {
            q += OrificeLaw.flow(cd, edge, dp, density, edgeTransition(s, transitionConstant));
        }
        double notch = notchAreaAt(s);
        if (notch > 0.0) {
            q += OrificeLaw.flow(cd, notch, dp, density, OrificeLaw.roundHoleTransition(transitionConstant, notch));
        }
        return q;
    }

    private static double edgeTransition(double s, double transitionConstant) {
        return transitionConstant / (4.0 * s * s);
    }

    /** @return dq/d(dp) of {@link #flowAt}, m^3/(s Pa) */
    public double flowPressureSlope(double s, double dp, double density, double transitionConstant) {
        double slope = 0.0;
        double edge = edgeArea(s);
        if (edge > 0.0) {
            slope += OrificeLaw.slope(cd, edge, dp, density, edgeTransition(s, transitionConstant));
        }
        double notch = notchAreaAt(s);
        if (notch > 0.0) {
            slope += OrificeLaw.slope(cd, notch, dp, density, OrificeLaw.roundHoleTransition(transitionConstant, notch));
        }
        return slope;
    }

    /**
     * @return dq/ds of {@link #flowAt}, m^2/s: per path, dq/dA dA/ds + dq/d(dp_t) d(dp_t)/ds with dq/dA = q/A;
     *         the edge's d(dp_t)/ds = -2 dp_t / s, the notch's d(dp_t)/ds = -dp_t / A_n dA_n/ds
     */
    public double flowOpeningSlope(double s, double dp, double density, double transitionConstant) {
        double slope = 0.0;
        double edge = edgeArea(s);
        if (edge > 0.0) {
            double dpT = edgeTransition(s, transitionConstant);
            double q = OrificeLaw.flow(cd, edge, dp, density, dpT);
            slope += q / edge * width + OrificeLaw.transitionSlope(cd, edge, dp, density, dpT) * (-2.0 * dpT / s);
        }
        double notch = notchAreaAt(s);
        double notchSlope = notchAreaSlope(s);
        if (notch > 0.0 && notchSlope != 0.0) {
            double dpT = OrificeLaw.roundHoleTransition(transitionConstant, notch);
            double q = OrificeLaw.flow(cd, notch, dp, density, dpT);
            slope += (q / notch + OrificeLaw.transitionSlope(cd, notch, dp, density, dpT) * (-dpT / notch))
                    * notchSlope;
        }
        return slope;
    }

    /** @return dA/ds of the notch, m: 2 A_n u / L_n while 0 < u < 1, else zero */
    public double notchAreaSlope(double s) {
        if (notchLength <= 0.0 || notchArea <= 0.0) {
            return 0.0;
        }
        double u = (s + notchLength) / notchLength;
        return u > 0.0 && u < 1.0 ? 2.0 * notchArea * u / notchLength : 0.0;
    }

    /** @return dA/ds of the total area, m: w (while the edge is open) plus the notch's slope */
    public double areaSlope(double s) {
        return (s > 0.0 ? width : 0.0) + notchAreaSlope(s);
    }

    /** @return dF/d(dp) of {@link #flowForce}, N/Pa */
    public double flowForcePressureSlope(double s, double dp) {
        return FlowForce.pressureSlopeAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, area(s), dp,
                FlowForce.SPOOL_JET_COSINE);
    }

    /** @return dF/ds of {@link #flowForce}, N/m */
    public double flowForceOpeningSlope(double s, double dp) {
        return FlowForce.areaSlopeAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, dp, FlowForce.SPOOL_JET_COSINE)
                * areaSlope(s);
    }

    /** @return steady flow force, N, pushing the spool towards closing */
    public double flowForce(double s, double dp) {
        return FlowForce.closingForceAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, area(s), dp,
                FlowForce.SPOOL_JET_COSINE);
    }
}
