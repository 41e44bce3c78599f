package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.KinematicRipple;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.PeriodicDrive;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;

/**
 * Fixed-displacement pump driven at a scheduled shaft speed: Q = eta_v D omega from inlet to outlet, with
 * D in m^3/rad, omega in rad/s and eta_v the volumetric efficiency, taken as constant (the usual catalogue
 * figure at working pressure). Hydraulic power delivered: (p_out - p_in) Q. The delivery depends on no state, so
 * every partial derivative is zero. With a {@link KinematicRipple} the delivery is multiplied by the ripple factor
 * of the shaft angle theta (a state, theta' = omega, rad): Q = eta_v D omega f(theta), dQ/dtheta = eta_v D omega
 * f'(theta).
 */
public final class Pump implements Element, PeriodicDrive {
    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final double displacement;
    private final double volumetricEfficiency;
    private final ScheduledInput speed;
    private final KinematicRipple ripple;
    private StateSlot angle;
    private SignalHandle q;
    private SignalHandle speedSignal;
    private EnergyAccount supply;

    /**
     * @param id element id
     * @param inlet suction node (usually a tank)
     * @param outlet delivery node
     * @param displacement displacement, m^3/rad
     * @param speed shaft speed, rad/s (initial value)
     * @param volumetricEfficiency volumetric efficiency, 0..1
     */
    public Pump(String id, Node inlet, Node outlet, double displacement, double speed, double volumetricEfficiency) {
        this(id, inlet, outlet, displacement, speed, volumetricEfficiency, null);
    }

    /**
     * @param id element id
     * @param inlet suction node (usually a tank)
     * @param outlet delivery node
     * @param displacement displacement, m^3/rad
     * @param speed shaft speed, rad/s (initial value)
     * @param volumetricEfficiency volumetric efficiency, 0..1
     * @param ripple kinematic flow ripple, or null for a steady delivery
     */
    public Pump(String id, Node inlet, Node outlet, double displacement, double speed, double volumetricEfficiency,
                KinematicRipple ripple) {
        this.ripple = ripple;
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.displacement = displacement;
        this.volumetricEfficiency = volumetricEfficiency;
        this.speed = new ScheduledInput(id + ".speed", Dimension.ROTATIONAL_SPEED, speed);
    }

    /** @return the speed schedule, rad/s (the scenario reader schedules it) */
    public ScheduledInput speed() {
        return speed;
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
        b.input(speed);
        if (ripple != null) {
            angle = b.state("shaft.angle", Dimension.ANGLE, 0.0, 2.0 * Math.PI);
        }
        q = b.signal("q", Dimension.VOLUME_FLOW);
        speedSignal = b.signal("speed", Dimension.ROTATIONAL_SPEED);
        supply = b.account("delivered", EnergyAccount.Kind.SUPPLY);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double omega = e.input(speed);
        double mean = volumetricEfficiency * displacement * omega;
        double flow = mean;
        if (ripple != null) {
            double theta = e.value(angle);
            flow = mean * ripple.factor(theta);
            e.derivative(angle, omega);
            if (e.partials()) {
                e.flowPartial(inlet, outlet, angle, mean * ripple.slope(theta));
            }
        }
        e.flow(inlet, outlet, flow);
        if (e.recording()) {
            e.signal(q, flow);
            e.signal(speedSignal, omega);
            e.power(supply, (e.pressure(outlet) - e.pressure(inlet)) * flow);
        }
    }
}
