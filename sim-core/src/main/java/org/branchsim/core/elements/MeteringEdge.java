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
        double q = 0.0;
        double edge = edgeArea(s);
        if (edge > 0.0) {
            q += OrificeLaw.flow(cd, edge, dp, density, OrificeLaw.transitionPressure(cd, 2.0 * s, density, nu));
        }
        double notch = notchAreaAt(s);
        if (notch > 0.0) {
            q += OrificeLaw.flow(cd, notch, dp, density,
                    OrificeLaw.transitionPressure(cd, OrificeLaw.circularDiameter(notch), density, nu));
        }
        return q;
    }

    /** @return steady flow force, N, pushing the spool towards closing */
    public double flowForce(double s, double dp) {
        return FlowForce.closingForceAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, area(s), dp,
                FlowForce.SPOOL_JET_COSINE);
    }
}
