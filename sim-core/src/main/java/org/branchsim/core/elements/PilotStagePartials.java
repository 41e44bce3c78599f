package org.branchsim.core.elements;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.parts.TravelLimitedMass;

/**
 * The closed-form partial derivatives the pilot-operated valves share: their spring chamber and their pilot
 * poppet's force. The chamber (pressure p_c, a state) is fed through the damping orifice from one node (the
 * reducing valve's outlet, the relief valve's inlet) and emptied by the pilot poppet into the drain; the main
 * member's end of area A_m closes on it, so V_c = V_c0 - A_m x_m and
 * dp_c/dt = beta_e(p_c)/V_c Q_c with Q_c = q_o(p_feed - p_c) - q_p(x_p, p_c - p_d) + A_m x_m' - A_p x_p'.
 * The pilot poppet (seat area A_p) is pushed open by (p_c - p_d) A_p less its flow force and closed by its spring
 * and damping. SI throughout: Pa, m, m^3/s, N.
 */
final class PilotStagePartials {

    private final Fluid fluid;
    private final StateSlot chamber;
    private final Node feed;
    private final Node drain;
    private final TravelLimitedMass main;
    private final double mainArea;
    private final TravelLimitedMass pilot;
    private final PoppetGeometry pilotSeat;
    private final double density;
    private final double seatTransitionConstant;

    /**
     * @param fluid the circuit's fluid
     * @param chamber the spring chamber's pressure state
     * @param feed the node the damping orifice draws from
     * @param drain the drain node
     * @param main the main member (spool or poppet)
     * @param mainArea its end area closing on the chamber, m^2
     * @param pilot the pilot poppet's member
     * @param pilotSeat the pilot poppet's geometry
     * @param seatTransitionConstant the pilot seat's laminar transition constant ({@link
     *        PoppetGeometry#transitionConstant}), Pa m^2
     */
    PilotStagePartials(Fluid fluid, StateSlot chamber, Node feed, Node drain, TravelLimitedMass main, double mainArea,
                       TravelLimitedMass pilot, PoppetGeometry pilotSeat, double seatTransitionConstant) {
        this.fluid = fluid;
        this.chamber = chamber;
        this.feed = feed;
        this.drain = drain;
        this.main = main;
        this.mainArea = mainArea;
        this.pilot = pilot;
        this.pilotSeat = pilotSeat;
        this.density = fluid.density();
        this.seatTransitionConstant = seatTransitionConstant;
    }

    /**
     * Adds every partial of the pilot stage: {@link #flows}, {@link #chamber} and {@link #pilotForce}, the pilot
     * seat's flow slopes taken at the given lift and pressure drop.
     *
     * @param dqo the damping orifice's dq_o/d(p_feed - p_c), m^3/(s Pa)
     * @param lift pilot lift x_p, m
     * @param dp p_c - p_d, Pa
     * @param beta beta_e(p_c), Pa
     * @param vc chamber volume V_c, m^3
     * @param inflow the chamber's net inflow Q_c, m^3/s
     */
    void add(Evaluation e, double dqo, double lift, double dp, double beta, double vc, double inflow) {
        double dqp = pilotSeat.flowPressureSlope(lift, dp, density, seatTransitionConstant);
        double dqpdx = pilotSeat.flowLiftSlope(lift, dp, density, seatTransitionConstant);
        flows(e, dqo, dqp, dqpdx);
        chamber(e, beta, vc, inflow, dqo, dqp, dqpdx);
        pilotForce(e, lift, dp);
    }

    /**
     * Adds the partials of the pilot stage's flows into the nodes: the damping orifice's out of the feed node,
     * -q_o(p_feed - p_c), and the pilot seat's plus the poppet's displacement into the drain, q_p(x_p, p_c - p_d)
     * + A_p x_p'.
     *
     * @param dqo dq_o/d(p_feed - p_c), m^3/(s Pa)
     * @param dqp dq_p/d(p_c - p_d), m^3/(s Pa)
     * @param dqpdx dq_p/dx_p, m^2/s
     */
    private void flows(Evaluation e, double dqo, double dqp, double dqpdx) {
        e.inflowPartial(feed, feed, -dqo);
        e.inflowPartial(feed, chamber, dqo);
        e.inflowPartial(drain, chamber, dqp);
        e.inflowPartial(drain, drain, -dqp);
        e.inflowPartial(drain, pilot.positionSlot(), dqpdx);
        e.inflowPartial(drain, pilot.velocitySlot(), pilotSeat.seatArea());
    }

    /**
     * Adds d(dp_c/dt)/d(.) = beta/V_c dQ_c/d(.) per p_feed, p_c, p_d, x_p, x_m', x_p'; plus beta Q_c A_m / V_c^2
     * per x_m and beta'(p_c) Q_c / V_c per p_c.
     *
     * @param beta beta_e(p_c), Pa
     * @param vc chamber volume V_c, m^3
     * @param inflow Q_c, m^3/s
     * @param dqo dq_o/d(p_feed - p_c), m^3/(s Pa)
     * @param dqp dq_p/d(p_c - p_d), m^3/(s Pa)
     * @param dqpdx dq_p/dx_p, m^2/s
     */
    private void chamber(Evaluation e, double beta, double vc, double inflow, double dqo, double dqp, double dqpdx) {
        double k = beta / vc;
        e.derivativePartial(chamber, feed, k * dqo);
        e.derivativePartial(chamber, chamber, k * (-dqo - dqp)
                + fluid.bulkModulusSlope(e.value(chamber), Double.POSITIVE_INFINITY) / vc * inflow);
        e.derivativePartial(chamber, drain, k * dqp);
        e.derivativePartial(chamber, pilot.positionSlot(), -k * dqpdx);
        e.derivativePartial(chamber, main.velocitySlot(), k * mainArea);
        e.derivativePartial(chamber, pilot.velocitySlot(), -k * pilotSeat.seatArea());
        e.derivativePartial(chamber, main.positionSlot(), k * inflow * mainArea / vc);
    }

    /**
     * Adds the pilot poppet's force partials: dF/d(p_c - p_d) = A_p - dF_flow/d(dp), dF/dx_p = -k_p - dF_flow/dx_p,
     * dF/dx_p' = -c_p.
     *
     * @param x pilot lift, m
     * @param dp p_c - p_d, Pa
     */
    private void pilotForce(Evaluation e, double x, double dp) {
        double dFdp = pilotSeat.seatArea() - pilotSeat.flowForcePressureSlope(x, dp);
        pilot.forcePartial(e, chamber, dFdp);
        pilot.forcePartial(e, drain, -dFdp);
        pilot.forcePartial(e, pilot.positionSlot(), -pilotSeat.springRate() - pilotSeat.flowForceLiftSlope(x, dp));
        pilot.forcePartial(e, pilot.velocitySlot(), -pilotSeat.damping());
    }
}
