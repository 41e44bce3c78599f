package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;
import org.branchsim.core.laws.KinematicRipple;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.PeriodicDrive;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Pressure-compensated variable-displacement pump. Delivery Q = eta_v D_max eps omega (times a kinematic ripple
 * factor when one is given), eps = 1 - s/S the displacement fraction set by the yoke (swash plate) stroke s, 0..S.
 * <ul>
 * <li>Compensator spool (mass m_c, travel x from its spring stop, 0..x_max): (p_out - p_in) A_c' against a spring
 * F_0 + k x and viscous damping. At x = x_0 (the null) both edges are closed; below it the control chamber drains
 * to the inlet through an edge of width w and opening x_0 - x, above it the outlet feeds the control chamber
 * through an edge of opening x - x_0. The preload is derived from the setting so that the spool stands at its null
 * at the setting: F_0 = p_set A_c' - k x_0.</li>
 * <li>Control chamber (volume V_0 + A_y s, pressure p_c a state): dp_c/dt = beta/V (q_feed - q_drain - q_bleed -
 * A_y s'), with a bleed orifice to the inlet that keeps the spool just open at its null.</li>
 * <li>Control piston and yoke (mass m_y, area A_y): m_y s'' = (p_c - p_in) A_y - (F_b + k_b s) - c_y s', a bias spring
 * that holds the pump at full displacement until the control pressure reaches p_b = F_b/A_y, and gives the full
 * stroke at p_e: k_b = (p_e - p_b) A_y / S. Stops at full and zero displacement.</li>
 * </ul>
 * Below the setting the spool rests on its stop, the control chamber is drained and the pump delivers full flow;
 * at the setting the spool meters oil into the control chamber until the yoke finds the displacement the circuit
 * takes: the outlet then stays within the compensator's droop k (x_max - x_0)/A_c' above the setting. Steady flow
 * forces on the spool and the pistons' own swivel torques are neglected. Control oil returns to the inlet (case
 * drain into the tank). Sources: Manring, Hydraulic Control Systems, Wiley 2005 (pressure-compensated pump);
 * Merritt 1967 (orifice, compressibility). See docs/theory.md 6.13.
 *
 * <p>Partial derivatives in closed form: the delivery's dQ/ds = -eta_v D_max omega f(theta) / S while 0 &lt;= s &lt;= S
 * (zero where eps is clamped) and dQ/dtheta = eta_v D_max eps omega f'(theta); each compensator edge's dq/d(dp) by
 * {@link OrificeLaw#slope} and dq/d(opening) = q/opening + dq/d(dp_t) d(dp_t)/d(opening), d(dp_t)/d(opening) =
 * -2 dp_t/opening (zero while the edge is closed); the bleed's dq/d(dp); the displacement flows' A_c' and A_y per
 * velocity; the control chamber's d(dp_c/dt) = beta/V dQ_c plus beta'(p_c) Q_c/V per p_c and -beta Q_c A_y/V^2 per s;
 * and the member forces' pressure areas, spring rates and damping coefficients (see {@link #suppliesPartials}).
 */
public final class CompensatedPump implements Element, PeriodicDrive {

    /**
     * Compensator spool.
     *
     * @param setting compensator setting p_set (outlet over inlet at the spool's null), Pa
     * @param diameter spool diameter (end area A_c' = pi d^2/4), m
     * @param springRate spring rate k, N/m
     * @param mass spool mass, kg
     * @param damping viscous damping, N*s/m
     * @param nullTravel travel x_0 from the spring stop to the null (both edges closed), m
     * @param maxTravel travel x_max to the far stop, m (more than x_0)
     * @param width metering width w of each edge, m
     * @param cd discharge coefficient of the edges and the bleed
     */
    public record Compensator(double setting, double diameter, double springRate, double mass, double damping,
                              double nullTravel, double maxTravel, double width, double cd) {

        /** @return spool end area, m^2 */
        public double area() {
            return OrificeLaw.circleArea(diameter);
        }

        /** @return the spring preload F_0 = p_set A - k x_0, N */
        public double preload() {
            return setting * area() - springRate * nullTravel;
        }

        /** @return the droop k (x_max - x_0)/A: outlet pressure rise from the null to the far stop, Pa */
        public double droop() {
            return springRate * (maxTravel - nullTravel) / area();
        }
    }

    /**
     * Control piston and yoke.
     *
     * @param diameter control piston diameter (area A_y), m
     * @param stroke stroke S from full to zero displacement, m
     * @param deadVolume control chamber volume at full displacement, m^3
     * @param mass yoke and piston mass reduced to the piston, kg
     * @param damping viscous damping, N*s/m
     * @param biasPressure control pressure p_b where destroking starts, Pa
     * @param endPressure control pressure p_e at full stroke (zero displacement), Pa (more than p_b)
     * @param bleedDiameter diameter of the bleed orifice from the chamber to the inlet, m
     */
    public record ControlPiston(double diameter, double stroke, double deadVolume, double mass, double damping,
                                double biasPressure, double endPressure, double bleedDiameter) {

        /** @return piston area, m^2 */
        public double area() {
            return OrificeLaw.circleArea(diameter);
        }

        /** @return bias spring rate k_b = (p_e - p_b) A_y / S, N/m */
        public double springRate() {
            return (endPressure - biasPressure) * area() / stroke;
        }
    }

    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final double maxDisplacement;
    private final double volumetricEfficiency;
    private final ScheduledInput speed;
    private final KinematicRipple ripple;
    private final Compensator comp;
    private final ControlPiston piston;
    private final TravelLimitedMass spool;
    private final TravelLimitedMass yoke;
    private final double bleedArea;
    private Fluid fluid;
    private double transitionConstant;
    private double bleedTransition;
    private StateSlot control;
    private StateSlot angle;
    private SignalHandle q;
    private SignalHandle speedSignal;
    private SignalHandle fraction;
    private SignalHandle controlPressure;
    private SignalHandle controlFlow;
    private EnergyAccount supply;
    private EnergyAccount controlLoss;
    private EnergyAccount chamberStored;

    /**
     * @param id element id
     * @param inlet suction node (usually a tank); control oil returns here
     * @param outlet delivery node
     * @param maxDisplacement displacement at full stroke, m^3/rad
     * @param speed shaft speed, rad/s (initial value)
     * @param volumetricEfficiency volumetric efficiency, 0..1
     * @param ripple kinematic flow ripple, or null
     * @param comp compensator spool
     * @param piston control piston and yoke
     */
    public CompensatedPump(String id, Node inlet, Node outlet, double maxDisplacement, double speed,
                           double volumetricEfficiency, KinematicRipple ripple, Compensator comp,
                           ControlPiston piston) {
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.maxDisplacement = maxDisplacement;
        this.volumetricEfficiency = volumetricEfficiency;
        this.speed = new ScheduledInput(id + ".speed", Dimension.ROTATIONAL_SPEED, speed);
        this.ripple = ripple;
        this.comp = comp;
        this.piston = piston;
        this.spool = new TravelLimitedMass(id, "compensator", comp.mass(), 0.0, comp.maxTravel(), 0.0, "spring stop",
                "far stop");
        this.yoke = new TravelLimitedMass(id, "yoke", piston.mass(), 0.0, piston.stroke(), 0.0, "full-displacement stop",
                "zero-displacement stop");
        this.bleedArea = OrificeLaw.circleArea(piston.bleedDiameter());
    }

    /** @return the speed schedule, rad/s */
    public ScheduledInput speed() {
        return speed;
    }

    /** @return the compensator */
    public Compensator compensator() {
        return comp;
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
    public KinematicRipple ripple() {
        return ripple;
    }

    @Override
    public StateSlot drivePhase() {
        return angle;
    }

    @Override
    public void bind(Binder b) {
        fluid = b.fluid();
        transitionConstant = OrificeLaw.transitionConstant(comp.cd(), fluid.density(), fluid.kinematicViscosity());
        bleedTransition = OrificeLaw.roundHoleTransition(transitionConstant, bleedArea);
        b.input(speed);
        control = b.state("control.p", Dimension.PRESSURE, inlet.initialPressure(), 1e5);
        spool.bind(b, s -> spoolForces(s).net(), 0.05);
        yoke.bind(b, s -> yokeForces(s).net(), 0.05);
        if (ripple != null) {
            angle = b.state("shaft.angle", Dimension.ANGLE, 0.0, 2.0 * Math.PI);
        }
        q = b.signal("q", Dimension.VOLUME_FLOW);
        speedSignal = b.signal("speed", Dimension.ROTATIONAL_SPEED);
        fraction = b.signal("displacement.fraction", Dimension.DIMENSIONLESS);
        controlPressure = b.signal("control.p", Dimension.PRESSURE);
        controlFlow = b.signal("control.q", Dimension.VOLUME_FLOW);
        supply = b.account("delivered", EnergyAccount.Kind.SUPPLY);
        controlLoss = b.account("control oil.loss", EnergyAccount.Kind.LOSS);
        chamberStored = b.account("control chamber compression", EnergyAccount.Kind.STORED);
    }

    private Forces spoolForces(StateView s) {
        double x = spool.position(s);
        double v = spool.velocity(s);
        return new Forces((s.pressure(outlet) - s.pressure(inlet)) * comp.area(),
                -(comp.preload() + comp.springRate() * x), -comp.damping() * v, 0.0, 0.0);
    }

    private Forces yokeForces(StateView s) {
        double y = yoke.position(s);
        double v = yoke.velocity(s);
        double ay = piston.area();
        return new Forces((s.value(control) - s.pressure(inlet)) * ay,
                -(piston.biasPressure() * ay + piston.springRate() * y), -piston.damping() * v, 0.0, 0.0);
    }

    private double edgeFlow(double opening, double dp) {
        if (opening <= 0.0) {
            return 0.0;
        }
        return OrificeLaw.flow(comp.cd(), comp.width() * opening, dp, fluid.density(), edgeTransition(opening));
    }

    /** @return the edge's transition pressure dp_t = K / (4 opening^2), Pa (opening positive, m) */
    private double edgeTransition(double opening) {
        return transitionConstant / (4.0 * opening * opening);
    }

    /** @return dq/d(dp) of {@link #edgeFlow}, m^3/(s Pa); zero while the edge is closed (opening &lt;= 0) */
    private double edgePressureSlope(double opening, double dp) {
        if (opening <= 0.0) {
            return 0.0;
        }
        return OrificeLaw.slope(comp.cd(), comp.width() * opening, dp, fluid.density(), edgeTransition(opening));
    }

    /**
     * @param q the edge's flow {@link #edgeFlow} at this opening and pressure drop, m^3/s
     * @return dq/d(opening) of {@link #edgeFlow}, m^2/s: through the area, dq/dA w = q/opening, and through the
     *         transition pressure, dq/d(dp_t) (-2 dp_t/opening); zero while the edge is closed (opening &lt;= 0)
     */
    private double edgeOpeningSlope(double opening, double dp, double q) {
        if (opening <= 0.0) {
            return 0.0;
        }
        double area = comp.width() * opening;
        double transition = edgeTransition(opening);
        double transitionSlope = OrificeLaw.transitionSlope(comp.cd(), area, dp, fluid.density(), transition);
        return q / opening + transitionSlope * (-2.0 * transition / opening);
    }

    /** @return displacement fraction eps = 1 - s/S at yoke stroke s */
    private double fractionAt(double stroke) {
        return Math.max(0.0, Math.min(1.0, 1.0 - stroke / piston.stroke()));
    }

    /** @return d(eps)/ds at yoke stroke s, 1/m: -1/S for 0 &lt;= s &lt;= S, zero where eps is clamped */
    private double fractionSlope(double stroke) {
        return stroke >= 0.0 && stroke <= piston.stroke() ? -1.0 / piston.stroke() : 0.0;
    }

    /**
     * @return true: {@link #evaluate} adds the partials of the delivery, the compensator's edge, bleed and
     *         displacement flows, the control chamber's pressure rate and both members' forces in closed form
     */
    @Override
    public boolean suppliesPartials() {
        return true;
    }

    /**
     * Partials of the compensator's node flows: the feed q_f(x - x_0, p_out - p_c) out of the outlet (into the
     * control chamber), the drain q_d(x_0 - x, p_c - p_in) and bleed q_b(p_c - p_in) into the inlet, and the
     * displacement flows -A_c' x' into the outlet and A_c' x' + A_y s' into the inlet.
     *
     * @param feedSlope dq_f/d(p_out - p_c), m^3/(s Pa)
     * @param feedOpeningSlope dq_f/d(x - x_0), m^2/s
     * @param returnSlope d(q_d + q_b)/d(p_c - p_in), m^3/(s Pa)
     * @param drainOpeningSlope dq_d/d(x_0 - x), m^2/s
     */
    private void flowPartials(Evaluation e, double feedSlope, double feedOpeningSlope, double returnSlope,
                              double drainOpeningSlope) {
        e.inflowPartial(outlet, outlet, -feedSlope);
        e.inflowPartial(outlet, control, feedSlope);
        e.inflowPartial(outlet, spool.positionSlot(), -feedOpeningSlope);
        e.inflowPartial(inlet, control, returnSlope);
        e.inflowPartial(inlet, inlet, -returnSlope);
        e.inflowPartial(inlet, spool.positionSlot(), -drainOpeningSlope);
        e.inflowPartial(outlet, spool.velocitySlot(), -comp.area());
        e.inflowPartial(inlet, spool.velocitySlot(), comp.area());
        e.inflowPartial(inlet, yoke.velocitySlot(), piston.area());
    }

    /**
     * Partials of dp_c/dt = beta(p_c)/V Q_c with V = V_0 + A_y s and Q_c = q_f - q_d - q_b - A_y s': beta/V dQ_c/d(.),
     * plus beta'(p_c) Q_c/V per p_c and -beta Q_c A_y/V^2 per s (arguments as {@link #flowPartials}).
     */
    private void chamberPartials(Evaluation e, double beta, double volume, double inflow, double feedSlope,
                                 double feedOpeningSlope, double returnSlope, double drainOpeningSlope) {
        double k = beta / volume;
        double ay = piston.area();
        e.derivativePartial(control, outlet, k * feedSlope);
        e.derivativePartial(control, control, -k * (feedSlope + returnSlope)
                + fluid.bulkModulusSlope(e.value(control), Double.POSITIVE_INFINITY) / volume * inflow);
        e.derivativePartial(control, inlet, k * returnSlope);
        e.derivativePartial(control, spool.positionSlot(), k * (feedOpeningSlope + drainOpeningSlope));
        e.derivativePartial(control, yoke.positionSlot(), -k * inflow * ay / volume);
        e.derivativePartial(control, yoke.velocitySlot(), -k * ay);
    }

    /**
     * Member force partials: the spool's dF/dp_out = A_c', dF/dp_in = -A_c', dF/dx = -k, dF/dx' = -c; the yoke's
     * dF/dp_c = A_y, dF/dp_in = -A_y, dF/ds = -k_b, dF/ds' = -c_y.
     */
    private void memberPartials(Evaluation e) {
        spool.forcePartial(e, outlet, comp.area());
        spool.forcePartial(e, inlet, -comp.area());
        spool.forcePartial(e, spool.positionSlot(), -comp.springRate());
        spool.forcePartial(e, spool.velocitySlot(), -comp.damping());
        yoke.forcePartial(e, control, piston.area());
        yoke.forcePartial(e, inlet, -piston.area());
        yoke.forcePartial(e, yoke.positionSlot(), -piston.springRate());
        yoke.forcePartial(e, yoke.velocitySlot(), -piston.damping());
    }

    @Override
    public void evaluate(Evaluation e) {
        double omega = e.input(speed);
        double pIn = e.pressure(inlet);
        double pOut = e.pressure(outlet);
        double pc = e.value(control);
        double x = spool.position(e);
        double s = yoke.position(e);
        double sDot = yoke.velocity(e);
        double eps = fractionAt(s);
        double ripplePart = ripple == null ? 1.0 : ripple.factor(e.value(angle));
        double flow = volumetricEfficiency * maxDisplacement * eps * omega * ripplePart;
        if (ripple != null) {
            e.derivative(angle, omega);
        }
        double feedOpening = x - comp.nullTravel();
        double drainOpening = comp.nullTravel() - x;
        double qFeed = edgeFlow(feedOpening, pOut - pc);
        double qDrain = edgeFlow(drainOpening, pc - pIn);
        double qBleed = OrificeLaw.flow(comp.cd(), bleedArea, pc - pIn, fluid.density(), bleedTransition);
        e.flow(inlet, outlet, flow);
        e.inflow(outlet, -qFeed); // into the control chamber (chamberInflow below), not to the inlet
        e.inflow(inlet, qDrain + qBleed);
        double xDot = spool.velocity(e);
        double ay = piston.area();
        // the spool's end faces and the yoke piston's back displace oil as they move
        e.inflow(outlet, -comp.area() * xDot);
        e.inflow(inlet, comp.area() * xDot + ay * sDot);
        double chamberInflow = qFeed - qDrain - qBleed - ay * sDot;
        double volume = piston.deadVolume() + ay * s;
        double beta = fluid.effectiveBulkModulus(pc, Double.POSITIVE_INFINITY);
        e.derivative(control, Compressibility.pressureRate(beta, volume, chamberInflow));
        spool.apply(e, spoolForces(e));
        yoke.apply(e, yokeForces(e));
        if (e.partials()) {
            double mean = volumetricEfficiency * maxDisplacement * omega;
            e.flowPartial(inlet, outlet, yoke.positionSlot(), mean * ripplePart * fractionSlope(s));
            if (ripple != null) {
                e.flowPartial(inlet, outlet, angle, mean * eps * ripple.slope(e.value(angle)));
            }
            double feedSlope = edgePressureSlope(feedOpening, pOut - pc);
            double feedOpeningSlope = edgeOpeningSlope(feedOpening, pOut - pc, qFeed);
            double drainSlope = edgePressureSlope(drainOpening, pc - pIn);
            double drainOpeningSlope = edgeOpeningSlope(drainOpening, pc - pIn, qDrain);
            double bleedSlope = OrificeLaw.slope(comp.cd(), bleedArea, pc - pIn, fluid.density(), bleedTransition);
            flowPartials(e, feedSlope, feedOpeningSlope, drainSlope + bleedSlope, drainOpeningSlope);
            chamberPartials(e, beta, volume, chamberInflow, feedSlope, feedOpeningSlope, drainSlope + bleedSlope,
                    drainOpeningSlope);
            memberPartials(e);
        }
        if (e.recording()) {
            e.signal(q, flow);
            e.signal(speedSignal, omega);
            e.signal(fraction, eps);
            e.signal(controlPressure, pc);
            e.signal(controlFlow, qFeed);
            e.power(supply, (pOut - pIn) * flow);
            e.power(controlLoss, (pOut - pc) * qFeed + (pc - pIn) * (qDrain + qBleed));
            e.power(chamberStored, pc * chamberInflow);
        }
    }
}
