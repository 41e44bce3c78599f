package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.parts.Corner;
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Pilot-operated pressure reducing valve, normally open, ports inlet, outlet and drain (external drain).
 * <ul>
 * <li>Main spool, travel y from the fully open stop (0) towards closing: outlet pressure on one end (directly,
 * or through a sensing orifice into a {@link SpoolEndChamber} at p_e), the spring-chamber pressure p_c and a
 * light spring on the other: m y'' = (p_e - p_c) A_s - (F_s0 + k_s y) - c_s y' + F_flow. The metering edge
 * opening is s = L_open - y ({@link MeteringEdge}).</li>
 * <li>Spring chamber: its own volume V_c(y) = V_c0 - A_s y and pressure,
 * dp_c/dt = beta_e/V_c (Q_o - Q_p + A_s y' - A_p x').</li>
 * <li>Damping orifice from the outlet to the chamber: Q_o by {@link OrificeLaw}.</li>
 * <li>Pilot poppet on its seat, lift x: m_p x'' = (p_c - p_drain) A_p - (F_p0 + k_p x) - c_p x' - F_flow,p;
 * it spills Q_p from the chamber to the drain.</li>
 * </ul>
 * The setting (outlet pressure at small demand, free drain) fixes the pilot preload by
 * {@link #pilotPreloadFor}: docs/theory.md section 6.5 gives the derivation.
 */
public final class PilotReducingValve implements Element, ReducingValve {

    /**
     * Main stage: metering edge, spool mass, spring, damping, stroke, and the optional end chamber fed
     * through a sensing orifice (null: outlet pressure acts on the spool end directly).
     */
    public record MainStage(MeteringEdge edge, double mass, double springRate, double springPreload,
                            double damping, double stroke, SpoolEndChamber endChamber) {
        /** @return the spool spring's force at the closing point divided by the spool area, Pa */
        public double springBias() {
            return (springPreload + springRate * edge.openLength()) / edge.endArea();
        }
    }

    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final Node drain;
    private final MainStage main;
    private final double chamberVolume;
    private final double orificeArea;
    private final double orificeCd;
    private final PoppetGeometry pilot;
    private final double setting;
    private final TravelLimitedMass spool;
    private final TravelLimitedMass poppet;
    private final SpoolEndChamber.Bound end;
    private double density;
    private double edgeTransitionConstant;
    private double seatTransitionConstant;
    private double orificeTransition;
    private Fluid fluid;
    private StateSlot chamber;
    private PilotStagePartials pilotStage;
    private SignalHandle pIn;
    private SignalHandle pOut;
    private SignalHandle pChamber;
    private SignalHandle qMain;
    private SignalHandle qPilot;
    private SignalHandle qDrain;
    private SignalHandle opening;
    private SignalHandle meteringPower;
    private SignalHandle drainPower;
    private EnergyAccount meteringLoss;
    private EnergyAccount orificeLoss;
    private EnergyAccount pilotLoss;
    private EnergyAccount chamberStored;

    /**
     * @param id element id
     * @param inlet supply side
     * @param outlet reduced-pressure side
     * @param drain external drain (a tank)
     * @param main main stage
     * @param chamberVolume spring-chamber volume with the spool fully open, m^3 (more than A_s * stroke)
     * @param orificeDiameter damping orifice diameter, m
     * @param orificeCd damping orifice discharge coefficient
     * @param pilot pilot poppet (its preload already set)
     * @param setting the setting this valve was built for, Pa (reported by metrics)
     */
    public PilotReducingValve(String id, Node inlet, Node outlet, Node drain, MainStage main, double chamberVolume,
                              double orificeDiameter, double orificeCd, PoppetGeometry pilot, double setting) {
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.drain = drain;
        this.main = main;
        this.chamberVolume = chamberVolume;
        this.orificeArea = OrificeLaw.circleArea(orificeDiameter);
        this.orificeCd = orificeCd;
        this.pilot = pilot;
        this.setting = setting;
        this.spool = new TravelLimitedMass(id, "spool", main.mass(), 0.0, main.stroke(), 0.0, "open stop", "closed stop");
        this.poppet = new TravelLimitedMass(id, "pilot", pilot.mass(), 0.0, pilot.maxLift(), 0.0, "seat", "lift stop");
        this.end = main.endChamber() == null ? null : new SpoolEndChamber.Bound(main.endChamber(), outlet,
                main.edge().endArea());
    }

    /**
     * The pilot spring preload that makes the valve regulate at {@code setting} at small demand with a free
     * drain: the outlet sits above the chamber by the spool spring bias dp_b = (F_s0 + k_s L_open)/A_s, so
     * the pilot holds p_c = setting - dp_b while passing the damping orifice's flow at dp_b; the lift x_p that
     * passes that flow at p_c follows from the seat flow law, and F_p0 = p_c A_p - k_p x_p - F_flow,p(x_p).
     *
     * @param setting outlet pressure at small demand, Pa
     * @param main main stage
     * @param orificeDiameter damping orifice diameter, m
     * @param orificeCd its discharge coefficient
     * @param pilot pilot poppet (its preload is ignored)
     * @param fluid the fluid
     * @return the preload, N; NaN when the setting is not above the spool spring bias or the pilot cannot pass
     *         the flow within its lift
     */
    public static double pilotPreloadFor(double setting, MainStage main, double orificeDiameter, double orificeCd,
                                         PoppetGeometry pilot, Fluid fluid) {
        double bias = main.springBias();
        double pc = setting - bias;
        if (pc <= 0.0) {
            return Double.NaN;
        }
        double rho = fluid.density();
        double nu = fluid.kinematicViscosity();
        double area = OrificeLaw.circleArea(orificeDiameter);
        double q = OrificeLaw.flow(orificeCd, area, bias, rho,
                OrificeLaw.transitionPressure(orificeCd, orificeDiameter, rho, nu));
        double lo = 0.0;
        double hi = pilot.maxLift();
        if (pilot.flow(hi, pc, rho, nu) < q) {
            return Double.NaN;
        }
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (pilot.flow(mid, pc, rho, nu) < q) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double x = 0.5 * (lo + hi);
        return pc * pilot.seatArea() - pilot.springRate() * x - pilot.flowForce(x, pc);
    }

    @Override
    public double setting() {
        return setting;
    }

    /**
     * Sets the coefficients of restitution of the main spool at its stops and of the pilot poppet at its seat and
     * stop (0, the default: they stop dead); part of building the circuit, before it is bound.
     *
     * @param spoolRestitution the main spool's, 0 to 1
     * @param pilotRestitution the pilot poppet's, 0 to 1
     * @return this valve
     */
    public PilotReducingValve withRestitution(double spoolRestitution, double pilotRestitution) {
        spool.withRestitution(spoolRestitution);
        poppet.withRestitution(pilotRestitution);
        return this;
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
        fluid = b.fluid();
        density = fluid.density();
        double nu = fluid.kinematicViscosity();
        edgeTransitionConstant = OrificeLaw.transitionConstant(main.edge().cd(), density, nu);
        seatTransitionConstant = pilot.transitionConstant(density, nu);
        orificeTransition = OrificeLaw.roundHoleTransition(OrificeLaw.transitionConstant(orificeCd, density, nu),
                orificeArea);
        chamber = b.state("chamber.p", Dimension.PRESSURE, 0.0, 1e5);
        pilotStage = new PilotStagePartials(fluid, chamber, outlet, drain, spool, main.edge().endArea(), poppet, pilot,
                seatTransitionConstant);
        if (end != null) {
            end.bind(b);
        }
        spool.bind(b, s -> spoolForces(s).net(), 0.05);
        poppet.bind(b, s -> poppetForces(s).net(), 0.05);
        pIn = b.signal("p.in", Dimension.PRESSURE);
        pOut = b.signal("p.out", Dimension.PRESSURE);
        pChamber = b.signal("chamber.p", Dimension.PRESSURE);
        qMain = b.signal("q", Dimension.VOLUME_FLOW);
        qPilot = b.signal("pilot.q", Dimension.VOLUME_FLOW);
        qDrain = b.signal("drain.q", Dimension.VOLUME_FLOW);
        opening = b.signal("metering.area", Dimension.AREA);
        meteringPower = b.signal("metering.power", Dimension.POWER);
        drainPower = b.signal("drain.power", Dimension.POWER);
        meteringLoss = b.account("metering.loss", EnergyAccount.Kind.LOSS);
        orificeLoss = b.account("damping orifice.loss", EnergyAccount.Kind.LOSS);
        pilotLoss = b.account("pilot seat.loss", EnergyAccount.Kind.LOSS);
        chamberStored = b.account("chamber compression", EnergyAccount.Kind.STORED);
        b.discontinuity(new Corner(id, "metering edge reaches its closing point", "corner",
                s -> main.edge().opening(spool.position(s))));
        // main stage: metering flow, spool forces, damping orifice, chamber volume
        b.couple(b.pressureOf(inlet), b.pressureOf(outlet), chamber, spool.positionSlot(), spool.velocitySlot(),
                end == null ? null : end.pressureSlot());
        // pilot stage: poppet forces and seat flow out of the chamber
        b.couple(chamber, poppet.positionSlot(), poppet.velocitySlot(), b.pressureOf(drain));
    }

    /**
     * Main stage partials: metering flow dq/d(dp) and dq/dy = -dq/ds; the outlet's displacement flow and volume
     * (no end chamber: dV_2/dy = A_s); the spool force's dF/dp_e = A_s, dF/dp_c = -A_s, dF/dy = -k_s - dF_flow/ds, dF/dy' = -c_s, and the
     * flow force's dF_flow/d(dp) on p_1 and -p_2.
     */
    private void mainStagePartials(Evaluation e, double s, double dp) {
        MeteringEdge edge = main.edge();
        double slope = edge.flowPressureSlope(s, dp, density, edgeTransitionConstant);
        e.flow(inlet, outlet, 0.0, slope, -slope);
        e.flowPartial(inlet, outlet, spool.positionSlot(),
                -edge.flowOpeningSlope(s, dp, density, edgeTransitionConstant));
        double as = edge.endArea();
        if (end == null) {
            e.volumePartial(outlet, spool.positionSlot(), as);
            e.inflowPartial(outlet, spool.velocitySlot(), -as);
            spool.forcePartial(e, outlet, as);
        } else {
            spool.forcePartial(e, end.pressureSlot(), as);
        }
        spool.forcePartial(e, chamber, -as);
        double dFflow = edge.flowForcePressureSlope(s, dp);
        spool.forcePartial(e, inlet, dFflow);
        spool.forcePartial(e, outlet, -dFflow);
        spool.forcePartial(e, spool.positionSlot(), -main.springRate() - edge.flowForceOpeningSlope(s, dp));
        spool.forcePartial(e, spool.velocitySlot(), -main.damping());
    }

    private Forces spoolForces(StateView s) {
        double y = spool.position(s);
        double v = spool.velocity(s);
        double p1 = s.pressure(inlet);
        double p2 = s.pressure(outlet);
        double pEnd = end == null ? p2 : end.pressure(s);
        double pc = s.value(chamber);
        double area = main.edge().endArea();
        return new Forces((pEnd - pc) * area, -(main.springPreload() + main.springRate() * y), -main.damping() * v,
                main.edge().flowForce(main.edge().opening(y), p1 - p2), 0.0);
    }

    private Forces poppetForces(StateView s) {
        double x = poppet.position(s);
        double v = poppet.velocity(s);
        double dp = s.value(chamber) - s.pressure(drain);
        return new Forces(dp * pilot.seatArea(), -(pilot.preload() + pilot.springRate() * x), -pilot.damping() * v,
                -pilot.flowForce(x, dp), 0.0);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double p1 = e.pressure(inlet);
        double p2 = e.pressure(outlet);
        double pd = e.pressure(drain);
        double pc = e.value(chamber);
        double y = spool.position(e);
        double ydot = spool.velocity(e);
        double x = poppet.position(e);
        double xdot = poppet.velocity(e);
        double as = main.edge().endArea();
        double ap = pilot.seatArea();

        double s = main.edge().opening(y);
        double qm = main.edge().flowAt(s, p1 - p2, density, edgeTransitionConstant);
        e.flow(inlet, outlet, qm);
        double qo = OrificeLaw.flow(orificeCd, orificeArea, p2 - pc, density, orificeTransition);
        double qp = pilot.flowAt(x, pc - pd, density, seatTransitionConstant);
        e.inflow(outlet, -qo);
        if (end == null) {
            // the spool end's chamber is part of the outlet node: its volume A_s y and its displacement flow
            e.volume(outlet, as * y);
            e.inflow(outlet, -as * ydot);
        } else {
            end.evaluate(e, y, ydot, spool.positionSlot(), spool.velocitySlot());
        }
        e.inflow(drain, qp + ap * xdot);
        double chamberInflow = qo - qp + as * ydot - ap * xdot;
        double vc = chamberVolume - as * y;
        double beta = fluid.effectiveBulkModulus(pc, Double.POSITIVE_INFINITY);
        e.derivative(chamber, Compressibility.pressureRate(beta, vc, chamberInflow));
        spool.apply(e, spoolForces(e));
        poppet.apply(e, poppetForces(e));
        if (e.partials()) {
            mainStagePartials(e, s, p1 - p2);
            pilotStage.add(e, OrificeLaw.slope(orificeCd, orificeArea, p2 - pc, density, orificeTransition), x,
                    pc - pd, beta, vc, chamberInflow);
        }
        if (e.recording()) {
            e.signal(pIn, p1);
            e.signal(pOut, p2);
            e.signal(pChamber, pc);
            e.signal(qMain, qm);
            e.signal(qPilot, qo);
            e.signal(qDrain, qp + ap * xdot);
            e.signal(opening, main.edge().area(s));
            double pm = (p1 - p2) * qm;
            double pilotPower = (p2 - pc) * qo + (pc - pd) * qp;
            e.signal(meteringPower, pm);
            e.signal(drainPower, pilotPower);
            e.power(meteringLoss, pm);
            e.power(orificeLoss, (p2 - pc) * qo);
            e.power(pilotLoss, (pc - pd) * qp);
            e.power(chamberStored, pc * chamberInflow);
        }
    }
}
