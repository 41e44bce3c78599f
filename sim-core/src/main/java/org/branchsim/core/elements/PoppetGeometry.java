package org.branchsim.core.elements;

import org.branchsim.core.laws.FlowForce;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.laws.PoppetSeat;

/**
 * A spring-loaded poppet on a seat: seat diameter (m), cone angle (rad), spring (N/m, N), mass (kg), damping
 * (N*s/m), travel (m), Cd, and the flow and force laws that follow from them: the seat's areas from
 * {@link PoppetSeat}, the flow from {@link OrificeLaw}, the closing flow force from {@link FlowForce} with the jet
 * leaving at half the cone angle. Shared by the direct-acting relief valve and the pilot stage of the
 * pilot-operated reducing valve.
 */
public final class PoppetGeometry {
    private final double seatDiameter;
    private final double coneAngle;
    private final double springRate;
    private final double preload;
    private final double mass;
    private final double damping;
    private final double maxLift;
    private final double cd;
    private final PoppetSeat seat;
    /** cos of the seat's jet angle, computed once. */
    private final double jetCosine;

    /**
     * @param seatDiameter seat diameter, m
     * @param coneAngle full cone angle, rad (pi for a flat seat)
     * @param springRate spring rate, N/m
     * @param preload spring force at zero lift, N
     * @param mass moving mass (poppet plus a third of the spring), kg
     * @param damping viscous damping coefficient, N*s/m
     * @param maxLift lift at the stop, m
     * @param cd discharge coefficient
     */
    public PoppetGeometry(double seatDiameter, double coneAngle, double springRate, double preload, double mass,
                          double damping, double maxLift, double cd) {
        this.seatDiameter = seatDiameter;
        this.coneAngle = coneAngle;
        this.springRate = springRate;
        this.preload = preload;
        this.mass = mass;
        this.damping = damping;
        this.maxLift = maxLift;
        this.cd = cd;
        this.seat = new PoppetSeat(seatDiameter, coneAngle);
        this.jetCosine = Math.cos(seat.jetAngle());
    }

    /** @return seat diameter, m */
    public double seatDiameter() {
        return seatDiameter;
    }

    /** @return spring rate, N/m */
    public double springRate() {
        return springRate;
    }

    /** @return spring force at zero lift, N */
    public double preload() {
        return preload;
    }

    /** @return moving mass, kg */
    public double mass() {
        return mass;
    }

    /** @return viscous damping, N*s/m */
    public double damping() {
        return damping;
    }

    /** @return lift at the stop, m */
    public double maxLift() {
        return maxLift;
    }

    /** @return seat area the pressure acts on, m^2 */
    public double seatArea() {
        return seat.seatArea();
    }

    /** @return flow area at a lift, m^2 ({@link PoppetSeat#area}) */
    public double area(double lift) {
        return seat.area(lift);
    }

    /**
     * @param lift lift, m
     * @param dp pressure difference across the seat, Pa
     * @param density kg/m^3
     * @param nu kinematic viscosity, m^2/s
     * @return flow through the seat, m^3/s, positive with dp
     */
    public double flow(double lift, double dp, double density, double nu) {
        return flowAt(lift, dp, density, OrificeLaw.transitionConstant(cd, density, nu));
    }

    /**
     * The seat flow with the laminar transition constant K computed once by the caller: the gap's transition
     * pressure is K / d_h^2, d_h = 2 x sin(alpha/2).
     *
     * @param lift lift, m
     * @param dp pressure difference across the seat, Pa
     * @param density kg/m^3
     * @param transitionConstant K of {@link OrificeLaw#transitionConstant}, Pa m^2
     * @return flow through the seat, m^3/s, positive with dp
     */
    public double flowAt(double lift, double dp, double density, double transitionConstant) {
        double a = area(lift);
        if (a <= 0.0) {
            return 0.0;
        }
        return OrificeLaw.flow(cd, a, dp, density, gapTransition(lift, transitionConstant));
    }

    private double gapTransition(double lift, double transitionConstant) {
        double dh = seat.gapHydraulicDiameter(lift);
        return transitionConstant / (dh * dh);
    }

    /** @return the transition constant of this poppet's seat for a fluid, Pa m^2 */
    public double transitionConstant(double density, double nu) {
        return OrificeLaw.transitionConstant(cd, density, nu);
    }

    /** @return dq/d(dp) of {@link #flowAt}, m^3/(s Pa) */
    public double flowPressureSlope(double lift, double dp, double density, double transitionConstant) {
        double a = area(lift);
        if (a <= 0.0) {
            return 0.0;
        }
        return OrificeLaw.slope(cd, a, dp, density, gapTransition(lift, transitionConstant));
    }

    /**
     * @return dq/dx of {@link #flowAt}, m^2/s: q/A dA/dx + dq/d(dp_t) d(dp_t)/dx, with d(dp_t)/dx = -2 dp_t / d_h
     *         d(d_h)/dx
     */
    public double flowLiftSlope(double lift, double dp, double density, double transitionConstant) {
        double a = area(lift);
        if (a <= 0.0) {
            return 0.0;
        }
        double dpT = gapTransition(lift, transitionConstant);
        double q = OrificeLaw.flow(cd, a, dp, density, dpT);
        double dh = seat.gapHydraulicDiameter(lift);
        return q / a * seat.areaSlope(lift)
                + OrificeLaw.transitionSlope(cd, a, dp, density, dpT) * (-2.0 * dpT / dh)
                * seat.gapHydraulicDiameterSlope(lift);
    }

    /** @return steady flow force closing the poppet, N; the jet leaves at half the cone angle to the axis */
    public double flowForce(double lift, double dp) {
        return FlowForce.closingForceAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, area(lift), dp, jetCosine);
    }

    /** @return dF/d(dp) of {@link #flowForce}, N/Pa */
    public double flowForcePressureSlope(double lift, double dp) {
        return FlowForce.pressureSlopeAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, area(lift), dp, jetCosine);
    }

    /** @return dF/dx of {@link #flowForce}, N/m */
    public double flowForceLiftSlope(double lift, double dp) {
        return FlowForce.areaSlopeAtCosine(cd, FlowForce.VELOCITY_COEFFICIENT, dp, jetCosine) * seat.areaSlope(lift);
    }

    /** @return a copy with a different preload, N */
    public PoppetGeometry withPreload(double newPreload) {
        return new PoppetGeometry(seatDiameter, coneAngle, springRate, newPreload, mass, damping, maxLift, cd);
    }
}
