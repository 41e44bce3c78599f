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
 * J omega' = D (p_a - p_b) - B omega - T_load(t). Shaft speed omega, rad/s, positive when a is the inlet.
 * Partials: dQ/dp_a = -dQ/dp_b = K_L, dQ/domega = D; d(omega')/dp_a = -d(omega')/dp_b = D/J, d(omega')/domega = -B/J.
 */
public final class Motor implements Element {
    private final String id;
    private final Node a;
    private final Node b;
    private final double displacement;
    private final double inertia;
    private final double viscousDamping;
    private final double leakageConductance;
    private final ScheduledInput loadTorque;
    private StateSlot omega;
    private SignalHandle speedSignal;
    private SignalHandle qSignal;
    private EnergyAccount work;
    private EnergyAccount loss;
    private EnergyAccount kinetic;

    /**
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
        this.id = id;
        this.a = a;
        this.b = b;
        this.displacement = displacement;
        this.inertia = inertia;
        this.viscousDamping = viscousDamping;
        this.leakageConductance = leakageConductance;
        this.loadTorque = new ScheduledInput(id + ".loadTorque", Dimension.TORQUE, initialLoadTorque);
    }

    /** @return the load torque schedule, N*m (the scenario reader schedules it) */
    public ScheduledInput loadTorque() {
        return loadTorque;
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
        work = binder.account("load work", EnergyAccount.Kind.WORK);
        loss = binder.account("friction and leakage", EnergyAccount.Kind.LOSS);
        kinetic = binder.account("kinetic", EnergyAccount.Kind.STORED);
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
        double accel = (displacement * dp - viscousDamping * w - tl) / inertia;
        e.derivative(omega, accel);
        if (e.partials()) {
            e.flowPartial(a, b, omega, displacement);
            e.derivativePartial(omega, a, displacement / inertia);
            e.derivativePartial(omega, b, -displacement / inertia);
            e.derivativePartial(omega, omega, -viscousDamping / inertia);
        }
        if (e.recording()) {
            e.signal(speedSignal, w);
            e.signal(qSignal, q);
            e.power(work, tl * w);
            e.power(loss, viscousDamping * w * w + leak * dp);
            e.power(kinetic, inertia * w * accel);
        }
    }
}
