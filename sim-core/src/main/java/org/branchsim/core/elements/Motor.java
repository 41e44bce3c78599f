package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;

/**
 * Fixed-displacement hydraulic motor from port a to port b. Flow Q = D omega + K_L (p_a - p_b), with
 * D in m^3/rad and a laminar leakage conductance K_L; torque balance
 * J omega' = D (p_a - p_b) - B omega - T_f(omega) - T_load(t) - T_g(theta). Shaft speed omega, rad/s, positive when a
 * is the inlet.
 * <ul>
 * <li>Friction ({@link Friction}, optional): Coulomb level T_c, breakaway T_s and Stribeck speed w_s,
 * T_f = [T_c + (T_s - T_c) exp(-(omega/w_s)^2)] tanh(omega/w_r), regularised over w_r as the cylinder's Coulomb
 * friction is (Armstrong-Helouvry, Dupont and Canudas de Wit, Automatica 30(7), 1994).</li>
 * <li>Overrunning load ({@link OverrunningLoad}, optional): a weight swinging on the motor's shaft through a gear of
 * ratio i (motor turns per load turn): T_g = T_max sin(phi_0 + theta/i), theta the shaft angle (a state,
 * theta' = omega). It pulls the load towards phi = 0 and drives the motor whenever the load swings down: the motor
 * then pumps.</li>
 * </ul>
 * The load inertia J overruns too: when the supply stops, it keeps the motor turning against its outlet.
 * Partials: dQ/dp_a = -dQ/dp_b = K_L, dQ/domega = D; d(omega')/dp_a = -d(omega')/dp_b = D/J,
 * d(omega')/domega = -(B + T_f'(omega))/J, d(omega')/dtheta = -T_max cos(phi)/(i J), d(theta')/domega = 1.
 */
public final class Motor implements Element {

    /**
     * Friction with breakaway, all torques N*m, speeds rad/s.
     *
     * @param coulomb Coulomb (running) friction torque T_c
     * @param breakaway breakaway (static) torque T_s, at least T_c
     * @param stribeckSpeed speed w_s over which friction falls from breakaway to Coulomb
     * @param regularisationSpeed speed w_r of the tanh regularisation through zero speed
     */
    public record Friction(double coulomb, double breakaway, double stribeckSpeed, double regularisationSpeed) {

        /**
         * @param omega shaft speed, rad/s
         * @return friction torque opposing the speed, N*m
         */
        public double torque(double omega) {
            return level(omega) * Math.tanh(omega / regularisationSpeed);
        }

        /**
         * @param omega shaft speed, rad/s
         * @return d(torque)/d(omega), N*m*s/rad
         */
        public double slope(double omega) {
            double r = omega / stribeckSpeed;
            double levelSlope = (breakaway - coulomb) * Math.exp(-r * r) * (-2.0 * r / stribeckSpeed);
            double tanh = Math.tanh(omega / regularisationSpeed);
            return levelSlope * tanh + level(omega) * (1.0 - tanh * tanh) / regularisationSpeed;
        }

        private double level(double omega) {
            double r = omega / stribeckSpeed;
            return coulomb + (breakaway - coulomb) * Math.exp(-r * r);
        }
    }

    /**
     * A weight on the shaft that gravity pulls towards its lowest position.
     *
     * @param maxTorque torque of the weight at the motor shaft with its arm horizontal, N*m
     * @param initialAngle load angle from the lowest position at t = 0, rad (positive in the direction a turn from a
     *        to b moves it)
     * @param ratio motor turns per load turn (gear ratio)
     */
    public record OverrunningLoad(double maxTorque, double initialAngle, double ratio) {

        /**
         * @param shaftAngle motor shaft angle from its start, rad
         * @return load angle from the lowest position, rad
         */
        public double loadAngle(double shaftAngle) {
            return initialAngle + shaftAngle / ratio;
        }

        /**
         * @param shaftAngle motor shaft angle, rad
         * @return gravity torque opposing rotation from a to b, N*m
         */
        public double torque(double shaftAngle) {
            return maxTorque * Math.sin(loadAngle(shaftAngle));
        }
    }

    private final String id;
    private final Node a;
    private final Node b;
    private final double displacement;
    private final double inertia;
    private final double viscousDamping;
    private final double leakageConductance;
    private final ScheduledInput loadTorque;
    private final Friction friction;
    private final OverrunningLoad overrunning;
    private StateSlot omega;
    private StateSlot angle;
    private SignalHandle speedSignal;
    private SignalHandle qSignal;
    private SignalHandle torqueSignal;
    private SignalHandle powerSignal;
    private SignalHandle frictionSignal;
    private SignalHandle loadAngleSignal;
    private EnergyAccount work;
    private EnergyAccount loss;
    private EnergyAccount kinetic;
    private EnergyAccount potential;

    /**
     * A motor without friction torque or overrunning load.
     *
     * @param id element id
     * @param a inlet port for positive rotation
     * @param b outlet port
     * @param displacement m^3/rad
     * @param inertia shaft and load inertia, kg*m^2
     * @param viscousDamping N*m*s/rad
     * @param leakageConductance m^3/(s*Pa)
     * @param initialLoadTorque N*m
     */
    public Motor(String id, Node a, Node b, double displacement, double inertia, double viscousDamping,
                 double leakageConductance, double initialLoadTorque) {
        this(id, a, b, displacement, inertia, viscousDamping, leakageConductance, initialLoadTorque, null, null);
    }

    /**
     * @param id element id
     * @param a inlet port for positive rotation
     * @param b outlet port
     * @param displacement m^3/rad
     * @param inertia shaft and load inertia, kg*m^2
     * @param viscousDamping N*m*s/rad
     * @param leakageConductance m^3/(s*Pa)
     * @param initialLoadTorque N*m, opposing rotation from a to b (an active load: it always pushes one way)
     * @param friction friction with breakaway, or null
     * @param overrunning a weight on the shaft, or null
     */
    public Motor(String id, Node a, Node b, double displacement, double inertia, double viscousDamping,
                 double leakageConductance, double initialLoadTorque, Friction friction,
                 OverrunningLoad overrunning) {
        this.id = id;
        this.a = a;
        this.b = b;
        this.displacement = displacement;
        this.inertia = inertia;
        this.viscousDamping = viscousDamping;
        this.leakageConductance = leakageConductance;
        this.loadTorque = new ScheduledInput(id + ".loadTorque", Dimension.TORQUE, initialLoadTorque);
        this.friction = friction;
        this.overrunning = overrunning;
    }

    /** @return the load torque schedule, N*m (the scenario reader schedules it) */
    public ScheduledInput loadTorque() {
        return loadTorque;
    }

    /** @return displacement, m^3/rad */
    public double displacement() {
        return displacement;
    }

    /** @return the shaft speed signal's name, rad/s */
    public String speedSignal() {
        return id + ".speed";
    }

    /** @return the name of the signal of the torque the pressure difference applies to the shaft, N*m */
    public String torqueSignal() {
        return id + ".torque";
    }

    /** @return the name of the signal of the power that torque delivers to the shaft, W */
    public String powerSignal() {
        return id + ".power";
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(a, b);
    }

    @Override
    public void bind(Binder binder) {
        binder.input(loadTorque);
        omega = binder.state("shaft.speed", Dimension.ROTATIONAL_SPEED, 0.0, 10.0);
        speedSignal = binder.signal("speed", Dimension.ROTATIONAL_SPEED);
        qSignal = binder.signal("q", Dimension.VOLUME_FLOW);
        torqueSignal = binder.signal("torque", Dimension.TORQUE);
        powerSignal = binder.signal("power", Dimension.POWER);
        work = binder.account("load work", EnergyAccount.Kind.WORK);
        loss = binder.account("friction and leakage", EnergyAccount.Kind.LOSS);
        kinetic = binder.account("kinetic", EnergyAccount.Kind.STORED);
        if (friction != null) {
            frictionSignal = binder.signal("friction", Dimension.TORQUE);
        }
        if (overrunning != null) {
            angle = binder.state("shaft.angle", Dimension.ANGLE, 0.0, 2.0 * Math.PI);
            loadAngleSignal = binder.signal("load.angle", Dimension.ANGLE);
            potential = binder.account("load height", EnergyAccount.Kind.STORED);
        }
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double w = e.value(omega);
        double dp = e.pressure(a) - e.pressure(b);
        double leak = leakageConductance * dp;
        double q = displacement * w + leak;
        e.flow(a, b, q, leakageConductance, -leakageConductance);
        double tl = e.input(loadTorque);
        double tf = friction == null ? 0.0 : friction.torque(w);
        double theta = overrunning == null ? 0.0 : e.value(angle);
        double tg = overrunning == null ? 0.0 : overrunning.torque(theta);
        double hydraulicTorque = displacement * dp;
        double accel = (hydraulicTorque - viscousDamping * w - tf - tl - tg) / inertia;
        e.derivative(omega, accel);
        if (overrunning != null) {
            e.derivative(angle, w);
        }
        if (e.partials()) {
            e.flowPartial(a, b, omega, displacement);
            e.derivativePartial(omega, a, displacement / inertia);
            e.derivativePartial(omega, b, -displacement / inertia);
            double slope = viscousDamping + (friction == null ? 0.0 : friction.slope(w));
            e.derivativePartial(omega, omega, -slope / inertia);
            if (overrunning != null) {
                double dtg = overrunning.maxTorque() * Math.cos(overrunning.loadAngle(theta)) / overrunning.ratio();
                e.derivativePartial(omega, angle, -dtg / inertia);
                e.derivativePartial(angle, omega, 1.0);
            }
        }
        if (e.recording()) {
            e.signal(speedSignal, w);
            e.signal(qSignal, q);
            e.signal(torqueSignal, hydraulicTorque);
            e.signal(powerSignal, hydraulicTorque * w);
            e.power(work, tl * w);
            e.power(loss, viscousDamping * w * w + tf * w + leak * dp);
            e.power(kinetic, inertia * w * accel);
            if (friction != null) {
                e.signal(frictionSignal, tf);
            }
            if (overrunning != null) {
                e.signal(loadAngleSignal, overrunning.loadAngle(theta));
                e.power(potential, tg * w);
            }
        }
    }
}
