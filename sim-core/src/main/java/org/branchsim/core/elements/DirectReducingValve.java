package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateView;
import org.branchsim.core.parts.Corner;
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Direct-acting pressure reducing valve, normally open, ports inlet, outlet and drain (the spring chamber
 * is drained). The spool, travel y from the open stop, is balanced by outlet pressure against one spring:
 * m y'' = (p_e - p_drain) A_s - (F0 + k y) - c y' + F_flow, with p_e the outlet pressure, or the pressure of a
 * {@link SpoolEndChamber} fed from the outlet through a sensing orifice. The spring must carry the whole outlet force,
 * so it is stiff and the outlet pressure falls as the opening (the flow) grows. The setting is the outlet
 * pressure at the closing point: F0 = p_set A_s - k L_open.
 */
public final class DirectReducingValve implements Element, ReducingValve {
    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final Node drain;
    private final MeteringEdge edge;
    private final double springRate;
    private final double preload;
    private final double damping;
    private final double setting;
    private final TravelLimitedMass spool;
    private final SpoolEndChamber.Bound end;
    private double density;
    private double transitionConstant;
    private SignalHandle pOut;
    private SignalHandle qMain;
    private SignalHandle qDrain;
    private SignalHandle meteringPower;
    private SignalHandle drainPower;
    private EnergyAccount meteringLoss;

    /**
     * @param id element id
     * @param inlet supply side
     * @param outlet reduced-pressure side
     * @param drain spring-chamber drain (a tank)
     * @param edge metering edge
     * @param mass spool mass, kg
     * @param springRate N/m
     * @param setting outlet pressure at the closing point, Pa (the preload follows)
     * @param damping viscous damping, N*s/m
     * @param stroke spool stroke, m
     * @param endChamber sensing chamber under the spool end, or null when outlet pressure acts directly
     */
    public DirectReducingValve(String id, Node inlet, Node outlet, Node drain, MeteringEdge edge, double mass,
                               double springRate, double setting, double damping, double stroke,
                               SpoolEndChamber endChamber) {
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.drain = drain;
        this.edge = edge;
        this.springRate = springRate;
        this.setting = setting;
        this.preload = setting * edge.endArea() - springRate * edge.openLength();
        this.damping = damping;
        this.spool = new TravelLimitedMass(id, "spool", mass, 0.0, stroke, 0.0, "open stop", "closed stop");
        this.end = endChamber == null ? null : new SpoolEndChamber.Bound(endChamber, outlet, edge.endArea());
    }

    /**
     * Sets the spool's coefficient of restitution at its stops (0, the default: it stops dead); part of building the
     * circuit, before it is bound.
     *
     * @param e coefficient of restitution, 0 to 1
     * @return this valve
     */
    public DirectReducingValve withRestitution(double e) {
        spool.withRestitution(e);
        return this;
    }

    /** @return the spring preload, N (positive for a valid valve) */
    public double preload() {
        return preload;
    }

    @Override
    public double setting() {
        return setting;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(inlet, outlet, drain);
    }

    @Override
    public void bind(Binder b) {
        density = b.fluid().density();
        transitionConstant = OrificeLaw.transitionConstant(edge.cd(), density, b.fluid().kinematicViscosity());
        spool.bind(b, s -> forces(s).net(), 0.05);
        if (end != null) {
            end.bind(b);
        }
        pOut = b.signal("p.out", Dimension.PRESSURE);
        qMain = b.signal("q", Dimension.VOLUME_FLOW);
        qDrain = b.signal("drain.q", Dimension.VOLUME_FLOW);
        meteringPower = b.signal("metering.power", Dimension.POWER);
        drainPower = b.signal("drain.power", Dimension.POWER);
        meteringLoss = b.account("metering.loss", EnergyAccount.Kind.LOSS);
        b.discontinuity(new Corner(id, "metering edge reaches its closing point", "corner",
                s -> edge.opening(spool.position(s))));
    }

    /**
     * The partials: metering flow dq/d(dp) and dq/dy = -dq/ds; displacement flows A_s per y' and volumes A_s per y
     * (outlet without end chamber: +A_s, drain: -A_s); the force's
     * dF/dp_e = A_s, dF/dp_drain = -A_s, dF/dy = -k - dF_flow/ds, dF/dy' = -c, dF/dp_1 = -dF/dp_2 (flow force part)
     * = dF_flow/d(dp).
     */
    private void addPartials(Evaluation e, double s, double dp) {
        double slope = edge.flowPressureSlope(s, dp, density, transitionConstant);
        e.flow(inlet, outlet, 0.0, slope, -slope);
        e.flowPartial(inlet, outlet, spool.positionSlot(), -edge.flowOpeningSlope(s, dp, density, transitionConstant));
        double as = edge.endArea();
        if (end == null) {
            e.volumePartial(outlet, spool.positionSlot(), as);
            e.inflowPartial(outlet, spool.velocitySlot(), -as);
            spool.forcePartial(e, outlet, as);
        } else {
            spool.forcePartial(e, end.pressureSlot(), as);
        }
        e.volumePartial(drain, spool.positionSlot(), -as);
        e.inflowPartial(drain, spool.velocitySlot(), as);
        spool.forcePartial(e, drain, -as);
        double dFflow = edge.flowForcePressureSlope(s, dp);
        spool.forcePartial(e, inlet, dFflow);
        spool.forcePartial(e, outlet, -dFflow);
        spool.forcePartial(e, spool.positionSlot(), -springRate - edge.flowForceOpeningSlope(s, dp));
        spool.forcePartial(e, spool.velocitySlot(), -damping);
    }

    private Forces forces(StateView s) {
        double y = spool.position(s);
        double p1 = s.pressure(inlet);
        double p2 = s.pressure(outlet);
        double pEnd = end == null ? p2 : end.pressure(s);
        return new Forces((pEnd - s.pressure(drain)) * edge.endArea(), -(preload + springRate * y),
                -damping * spool.velocity(s), edge.flowForce(edge.opening(y), p1 - p2), 0.0);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double p1 = e.pressure(inlet);
        double p2 = e.pressure(outlet);
        double y = spool.position(e);
        double ydot = spool.velocity(e);
        double s = edge.opening(y);
        double qm = edge.flowAt(s, p1 - p2, density, transitionConstant);
        double displaced = edge.endArea() * ydot;
        e.flow(inlet, outlet, qm);
        if (end == null) {
            // the spool end's chamber is part of the outlet node: its volume A_s y and its displacement flow
            e.volume(outlet, edge.endArea() * y);
            e.inflow(outlet, -displaced);
        } else {
            end.evaluate(e, y, ydot, spool.positionSlot(), spool.velocitySlot());
        }
        // the spring chamber, vented to the drain, gives up A_s y of its volume as the spool closes
        e.volume(drain, -edge.endArea() * y);
        e.inflow(drain, displaced);
        spool.apply(e, forces(e));
        if (e.partials()) {
            addPartials(e, s, p1 - p2);
        }
        if (e.recording()) {
            double pm = (p1 - p2) * qm;
            e.signal(pOut, p2);
            e.signal(qMain, qm);
            e.signal(qDrain, displaced);
            e.signal(meteringPower, pm);
            e.signal(drainPower, 0.0);
            e.power(meteringLoss, pm);
        }
    }
}
