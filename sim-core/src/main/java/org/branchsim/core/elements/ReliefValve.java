package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateView;
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Direct-acting poppet relief valve from inlet to outlet (tank). The poppet (lift x from its seat at 0 to
 * its stop) obeys m x'' = (p_in - p_out) A_s - (F0 + k x) - c x' - F_flow, where A_s is the seat area and
 * F_flow the steady flow force. The setting (cracking pressure) is F0 / A_s. Seat and stop are events.
 * The poppet face displaces A_s x' from the inlet to the outlet side.
 */
public final class ReliefValve implements Element {
    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final PoppetGeometry poppet;
    private final TravelLimitedMass member;
    private double density;
    private double transitionConstant;
    private SignalHandle q;
    private EnergyAccount loss;

    /**
     * @param id element id
     * @param inlet protected line
     * @param outlet tank side
     * @param poppet poppet geometry, spring and mass
     */
    public ReliefValve(String id, Node inlet, Node outlet, PoppetGeometry poppet) {
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.poppet = poppet;
        this.member = new TravelLimitedMass(id, "poppet", poppet.mass(), 0.0, poppet.maxLift(), 0.0, "seat", "lift stop");
    }

    /**
     * Sets the poppet's coefficient of restitution at its seat and lift stop; part of building the circuit.
     *
     * @param e 0 (dead stop, the default) to 1 (elastic rebound)
     * @return this valve
     */
    public ReliefValve withRestitution(double e) {
        member.withRestitution(e);
        return this;
    }

    /** @return the cracking pressure F0 / A_s, Pa */
    public double setting() {
        return poppet.preload() / poppet.seatArea();
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(inlet, outlet);
    }

    @Override
    public void bind(Binder b) {
        density = b.fluid().density();
        transitionConstant = poppet.transitionConstant(density, b.fluid().kinematicViscosity());
        member.bind(b, s -> forces(s).net(), 0.1);
        q = b.signal("q", Dimension.VOLUME_FLOW);
        loss = b.account("loss", EnergyAccount.Kind.LOSS);
    }

    /**
     * The partials: the seat flow's dq/d(dp) and dq/dx, the displacement flow's A_s, and the force's
     * dF/d(dp) = A_s - dF_flow/d(dp), dF/dx = -k - dF_flow/dx, dF/dv = -c.
     */
    private void addPartials(Evaluation e, double x, double dp) {
        double slope = poppet.flowPressureSlope(x, dp, density, transitionConstant);
        e.flow(inlet, outlet, 0.0, slope, -slope);
        e.flowPartial(inlet, outlet, member.positionSlot(), poppet.flowLiftSlope(x, dp, density, transitionConstant));
        double as = poppet.seatArea();
        e.inflowPartial(inlet, member.velocitySlot(), -as);
        e.inflowPartial(outlet, member.velocitySlot(), as);
        double dFdp = as - poppet.flowForcePressureSlope(x, dp);
        member.forcePartial(e, inlet, dFdp);
        member.forcePartial(e, outlet, -dFdp);
        member.forcePartial(e, member.positionSlot(), -poppet.springRate() - poppet.flowForceLiftSlope(x, dp));
        member.forcePartial(e, member.velocitySlot(), -poppet.damping());
    }

    private Forces forces(StateView s) {
        double x = member.position(s);
        double v = member.velocity(s);
        double dp = s.pressure(inlet) - s.pressure(outlet);
        return new Forces(dp * poppet.seatArea(), -(poppet.preload() + poppet.springRate() * x),
                -poppet.damping() * v, -poppet.flowForce(x, dp), 0.0);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double x = member.position(e);
        double v = member.velocity(e);
        double dp = e.pressure(inlet) - e.pressure(outlet);
        double flow = poppet.flowAt(x, dp, density, transitionConstant);
        e.flow(inlet, outlet, flow);
        double displaced = poppet.seatArea() * v;
        e.inflow(inlet, -displaced);
        e.inflow(outlet, displaced);
        member.apply(e, forces(e));
        if (e.partials()) {
            addPartials(e, x, dp);
        }
        if (e.recording()) {
            e.signal(q, flow);
            e.power(loss, dp * flow);
        }
    }
}
