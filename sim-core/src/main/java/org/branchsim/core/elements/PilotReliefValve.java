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
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Pilot-operated (two-stage) relief valve, ports inlet, outlet (tank) and drain (the pilot's spill; tie it to
 * the outlet's tank for an internally drained valve). Built from the parts of the pilot-operated reducing
 * valve: {@link PoppetGeometry} poppets on {@link TravelLimitedMass} members, a damping orifice
 * ({@link OrificeLaw}) and a spring chamber ({@link Compressibility}).
 * <ul>
 * <li>Main poppet, lift x from its seat: inlet pressure on its seat area A_s, the spring-chamber pressure p_c on
 * the same area behind it (balanced piston) and a light spring: m x'' = (p_in - p_c) A_s - (F_m0 + k_m x)
 * - c_m x' - F_flow; it passes the main flow from inlet to outlet.</li>
 * <li>Damping orifice from the inlet to the spring chamber: Q_o.</li>
 * <li>Spring chamber of volume V_c(x) = V_c0 - A_s x: dp_c/dt = beta_e / V_c (Q_o - Q_p + A_s x' - A_p x_p').</li>
 * <li>Pilot poppet, lift x_p: m_p x_p'' = (p_c - p_drain) A_p - (F_p0 + k_p x_p) - c_p x_p' - F_flow,p; it spills Q_p
 * from the chamber to the drain.</li>
 * </ul>
 * The setting is the pilot's cracking pressure, F_p0 = setting A_p: below it nothing flows and p_c = p_in;
 * above it the pilot flow through the damping orifice drops p_c below p_in until the main poppet lifts, at
 * p_in - p_c = F_m0 / A_s. With a light main spring the inlet stays near the pilot's pressure whatever the
 * flow: the override is small.
 *
 * <p>It supplies the closed-form partial derivatives of everything it adds ({@link #suppliesPartials}): the seat
 * flows' and flow forces' slopes from {@link PoppetGeometry}, the damping orifice's from {@link OrificeLaw}, the
 * chamber's bulk-modulus slope from {@link Fluid}, as the pilot-operated reducing valve does.
 */
public final class PilotReliefValve implements Element {

    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final Node drain;
    private final PoppetGeometry main;
    private final double chamberVolume;
    private final double orificeArea;
    private final double orificeCd;
    private final PoppetGeometry pilot;
    private final TravelLimitedMass mainMember;
    private final TravelLimitedMass pilotMember;
    private double density;
    private double mainTransitionConstant;
    private double pilotTransitionConstant;
    private double orificeTransition;
    private Fluid fluid;
    private StateSlot chamber;
    private PilotStagePartials pilotStage;
    private SignalHandle qMain;
    private SignalHandle qOrifice;
    private SignalHandle qDrain;
    private SignalHandle pChamber;
    private EnergyAccount mainLoss;
    private EnergyAccount orificeLoss;
    private EnergyAccount pilotLoss;
    private EnergyAccount chamberStored;

    /**
     * @param id element id
     * @param inlet protected line
     * @param outlet tank side of the main poppet
     * @param drain where the pilot spills (a tank, or the outlet's tank)
     * @param main main poppet (its preload is the light main spring's)
     * @param chamberVolume spring-chamber volume with the main poppet seated, m^3 (more than A_s * max lift)
     * @param orificeDiameter damping orifice diameter, m
     * @param orificeCd damping orifice discharge coefficient
     * @param pilot pilot poppet (its preload is the setting times its seat area)
     */
    public PilotReliefValve(String id, Node inlet, Node outlet, Node drain, PoppetGeometry main, double chamberVolume,
                            double orificeDiameter, double orificeCd, PoppetGeometry pilot) {
        if (chamberVolume <= main.seatArea() * main.maxLift()) {
            throw new IllegalArgumentException("spring chamber of " + id + " smaller than the main poppet's swept volume");
        }
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.drain = drain;
        this.main = main;
        this.chamberVolume = chamberVolume;
        this.orificeArea = OrificeLaw.circleArea(orificeDiameter);
        this.orificeCd = orificeCd;
        this.pilot = pilot;
        this.mainMember = new TravelLimitedMass(id, "poppet", main.mass(), 0.0, main.maxLift(), 0.0, "seat", "lift stop");
        this.pilotMember = new TravelLimitedMass(id, "pilot", pilot.mass(), 0.0, pilot.maxLift(), 0.0, "seat",
                "lift stop");
    }

    /** @return the setting: the pilot's cracking pressure F_p0 / A_p, Pa */
    public double setting() {
        return pilot.preload() / pilot.seatArea();
    }

    /** @return the main spring's bias F_m0 / A_s: how far p_c must fall below p_in to lift the main poppet, Pa */
    public double mainSpringBias() {
        return main.preload() / main.seatArea();
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
        mainTransitionConstant = main.transitionConstant(density, nu);
        pilotTransitionConstant = pilot.transitionConstant(density, nu);
        orificeTransition = OrificeLaw.transitionPressure(orificeCd, OrificeLaw.circularDiameter(orificeArea), density,
                nu);
        chamber = b.state("chamber.p", Dimension.PRESSURE, inlet.initialPressure(), 1e5);
        pilotStage = new PilotStagePartials(fluid, chamber, inlet, drain, mainMember, main.seatArea(), pilotMember,
                pilot, pilotTransitionConstant);
        mainMember.bind(b, s -> mainForces(s).net(), 0.1);
        pilotMember.bind(b, s -> pilotForces(s).net(), 0.05);
        qMain = b.signal("q", Dimension.VOLUME_FLOW);
        qOrifice = b.signal("orifice.q", Dimension.VOLUME_FLOW);
        qDrain = b.signal("drain.q", Dimension.VOLUME_FLOW);
        pChamber = b.signal("chamber.p", Dimension.PRESSURE);
        mainLoss = b.account("main seat.loss", EnergyAccount.Kind.LOSS);
        orificeLoss = b.account("damping orifice.loss", EnergyAccount.Kind.LOSS);
        pilotLoss = b.account("pilot seat.loss", EnergyAccount.Kind.LOSS);
        chamberStored = b.account("chamber compression", EnergyAccount.Kind.STORED);
        b.couple(b.pressureOf(inlet), b.pressureOf(outlet), chamber, mainMember.positionSlot(),
                mainMember.velocitySlot());
        b.couple(chamber, pilotMember.positionSlot(), pilotMember.velocitySlot(), b.pressureOf(drain));
    }

    private Forces mainForces(StateView s) {
        double x = mainMember.position(s);
        double v = mainMember.velocity(s);
        double dpSeat = s.pressure(inlet) - s.pressure(outlet);
        double dpBody = s.pressure(inlet) - s.value(chamber);
        return new Forces(dpBody * main.seatArea(), -(main.preload() + main.springRate() * x), -main.damping() * v,
                -main.flowForce(x, dpSeat), 0.0);
    }

    private Forces pilotForces(StateView s) {
        double x = pilotMember.position(s);
        double v = pilotMember.velocity(s);
        double dp = s.value(chamber) - s.pressure(drain);
        return new Forces(dp * pilot.seatArea(), -(pilot.preload() + pilot.springRate() * x), -pilot.damping() * v,
                -pilot.flowForce(x, dp), 0.0);
    }

    /**
     * Main stage partials: the seat flow's dq/d(p_in - p_out) and dq/dx; the inlet's displacement inflow -A_s x'
     * (d/dx' = -A_s); the poppet force's dF/dp_in = A_s - dF_flow/d(dp), dF/dp_out = dF_flow/d(dp),
     * dF/dp_c = -A_s, dF/dx = -k_m - dF_flow/dx, dF/dx' = -c_m.
     */
    private void mainStagePartials(Evaluation e, double x, double dp) {
        double slope = main.flowPressureSlope(x, dp, density, mainTransitionConstant);
        e.flow(inlet, outlet, 0.0, slope, -slope);
        e.flowPartial(inlet, outlet, mainMember.positionSlot(),
                main.flowLiftSlope(x, dp, density, mainTransitionConstant));
        double as = main.seatArea();
        e.inflowPartial(inlet, mainMember.velocitySlot(), -as);
        double dFflow = main.flowForcePressureSlope(x, dp);
        mainMember.forcePartial(e, inlet, as - dFflow);
        mainMember.forcePartial(e, outlet, dFflow);
        mainMember.forcePartial(e, chamber, -as);
        mainMember.forcePartial(e, mainMember.positionSlot(), -main.springRate() - main.flowForceLiftSlope(x, dp));
        mainMember.forcePartial(e, mainMember.velocitySlot(), -main.damping());
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double pIn = e.pressure(inlet);
        double pOut = e.pressure(outlet);
        double pd = e.pressure(drain);
        double pc = e.value(chamber);
        double x = mainMember.position(e);
        double xDot = mainMember.velocity(e);
        double xp = pilotMember.position(e);
        double xpDot = pilotMember.velocity(e);
        double as = main.seatArea();
        double ap = pilot.seatArea();

        double qm = main.flowAt(x, pIn - pOut, density, mainTransitionConstant);
        double qo = OrificeLaw.flow(orificeCd, orificeArea, pIn - pc, density, orificeTransition);
        double qp = pilot.flowAt(xp, pc - pd, density, pilotTransitionConstant);
        e.flow(inlet, outlet, qm);
        e.inflow(inlet, -qo - as * xDot);
        e.inflow(drain, qp + ap * xpDot);
        double chamberInflow = qo - qp + as * xDot - ap * xpDot;
        double vc = chamberVolume - as * x;
        double beta = fluid.effectiveBulkModulus(pc, Double.POSITIVE_INFINITY);
        e.derivative(chamber, Compressibility.pressureRate(beta, vc, chamberInflow));
        mainMember.apply(e, mainForces(e));
        pilotMember.apply(e, pilotForces(e));
        if (e.partials()) {
            mainStagePartials(e, x, pIn - pOut);
            pilotStage.add(e, OrificeLaw.slope(orificeCd, orificeArea, pIn - pc, density, orificeTransition), xp,
                    pc - pd, beta, vc, chamberInflow);
        }
        if (e.recording()) {
            e.signal(qMain, qm);
            e.signal(qOrifice, qo);
            e.signal(qDrain, qp + ap * xpDot);
            e.signal(pChamber, pc);
            e.power(mainLoss, (pIn - pOut) * qm);
            e.power(orificeLoss, (pIn - pc) * qo);
            e.power(pilotLoss, (pc - pd) * qp);
            e.power(chamberStored, pc * chamberInflow);
        }
    }
}
