package org.branchsim.core.elements;

import org.branchsim.core.laws.FlowForce;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.laws.PoppetSeat;

/**
 * A spring-loaded poppet on a seat: seat diameter, cone angle, spring, mass, damping, travel, Cd, and the
 * flow and force laws that follow from them. Shared by the direct-acting relief valve and the pilot stage
 * of the pilot-operated reducing valve.
 *
 * @param seatDiameter seat diameter, m
 * @param coneAngle full cone angle, rad (pi for a flat seat)
 * @param springRate spring rate, N/m
 * @param preload spring force at zero lift, N
 * @param mass moving mass (poppet plus a third of the spring), kg
 * @param damping viscous damping coefficient, N*s/m
 * @param maxLift lift at the stop, m
 * @param cd discharge coefficient
 */
public record PoppetGeometry(double seatDiameter, double coneAngle, double springRate, double preload,
                             double mass, double damping, double maxLift, double cd) {

    /** @return seat area the pressure acts on, m^2 */
    public double seatArea() {
        return PoppetSeat.seatArea(seatDiameter);
    }

    /** @return flow area at a lift, m^2 */
    public double area(double lift) {
        return PoppetSeat.area(seatDiameter, coneAngle, Math.min(lift, PoppetSeat.usefulLift(seatDiameter, coneAngle)));
    }

    /**
     * @param lift lift, m
     * @param dp pressure difference across the seat, Pa
     * @param density kg/m^3
     * @param nu kinematic viscosity, m^2/s
     * @return flow through the seat, m^3/s, positive with dp
     */
    public double flow(double lift, double dp, double density, double nu) {
        double a = area(lift);
        if (a <= 0.0) {
            return 0.0;
        }
        double dh = PoppetSeat.gapHydraulicDiameter(coneAngle, lift);
        return OrificeLaw.flow(cd, a, dp, density, OrificeLaw.transitionPressure(cd, dh, density, nu));
    }

    /** @return steady flow force closing the poppet, N; jet leaves at half the cone angle to the axis */
    public double flowForce(double lift, double dp) {
        double jet = Math.min(coneAngle, Math.PI) / 2.0;
        return FlowForce.closingForce(cd, FlowForce.VELOCITY_COEFFICIENT, area(lift), dp, jet);
    }

    /** @return a copy with a different preload, N */
    public PoppetGeometry withPreload(double newPreload) {
        return new PoppetGeometry(seatDiameter, coneAngle, springRate, newPreload, mass, damping, maxLift, cd);
    }
}
