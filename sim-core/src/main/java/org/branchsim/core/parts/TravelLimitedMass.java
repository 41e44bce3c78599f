package org.branchsim.core.parts;

import java.util.Locale;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateEditor;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.units.Dimension;

/**
 * A rigid member (spool, poppet, piston) of mass m moving along one axis between a lower and an upper stop:
 * m dv/dt = F, dx/dt = v. Reaching a stop is an event: the member stops dead (plastic impact; its kinetic
 * energy is booked as an impact loss) and is held there until the net force pulls it away, which is a
 * second event. While held its position and velocity do not change. States: {@code <name>.x} (m),
 * {@code <name>.v} (m/s).
 */
public final class TravelLimitedMass {

    /** Where the member is. */
    public enum Mode { FREE, AT_LOWER_STOP, AT_UPPER_STOP }

    /**
     * Net force, N, that must pull a held member off its stop. A force balanced to exactly zero (a piston
     * with no pressure and no load) keeps it held, and the switching function is never identically zero.
     */
    public static final double RELEASE_FORCE = 1e-3;

    /**
     * Penetration, as a fraction of the travel, a free member may show before reaching a stop counts as an
     * impact. It keeps round-off and the implicit method's tiny excursions right after a release (a member
     * leaving its stop with almost no force) from being taken for impacts; the reset puts it back on the stop.
     */
    public static final double STOP_TOLERANCE = 1e-6;

    private final String owner;
    private final String name;
    private final double mass;
    private final double lower;
    private final double upper;
    private final double initialPosition;
    private final String lowerStopName;
    private final String upperStopName;
    private StateSlot x;
    private StateSlot v;
    private SignalHandle xSignal;
    private SignalHandle vSignal;
    private EnergyAccount kinetic;
    private EnergyAccount spring;
    private EnergyAccount damping;
    private EnergyAccount flowForce;
    private EnergyAccount impact;
    private NetForce netForce;
    private Mode mode = Mode.FREE;

    /**
     * @param owner id of the element it belongs to
     * @param name member name inside the element, e.g. "spool"
     * @param mass moving mass, kg
     * @param lower lower stop position, m
     * @param upper upper stop position, m
     * @param initialPosition position at t = 0, m
     * @param lowerStopName what the lower stop is, e.g. "seat"
     * @param upperStopName what the upper stop is, e.g. "full-lift stop"
     */
    public TravelLimitedMass(String owner, String name, double mass, double lower, double upper,
                             double initialPosition, String lowerStopName, String upperStopName) {
        this.owner = owner;
        this.name = name;
        this.mass = mass;
        this.lower = lower;
        this.upper = upper;
        this.initialPosition = Math.max(lower, Math.min(upper, initialPosition));
        this.lowerStopName = lowerStopName;
        this.upperStopName = upperStopName;
    }

    /**
     * Declares the member's states, signals, energy accounts and its two stop events.
     *
     * @param binder the element's binder
     * @param force the net force function, used to decide when a held member leaves its stop
     * @param velocityScale typical velocity magnitude, m/s (absolute tolerance = relative tolerance * this)
     */
    public void bind(Binder binder, NetForce force, double velocityScale) {
        this.netForce = force;
        double travel = upper - lower;
        x = binder.state(name + ".x", Dimension.LENGTH, initialPosition, Math.max(travel, 1e-9));
        v = binder.state(name + ".v", Dimension.VELOCITY, 0.0, velocityScale);
        xSignal = binder.signal(name + ".x", Dimension.LENGTH);
        vSignal = binder.signal(name + ".v", Dimension.VELOCITY);
        kinetic = binder.account(name + ".kinetic", EnergyAccount.Kind.STORED);
        spring = binder.account(name + ".spring", EnergyAccount.Kind.STORED);
        damping = binder.account(name + ".damping", EnergyAccount.Kind.LOSS);
        flowForce = binder.account(name + ".flow force", EnergyAccount.Kind.FLOW_FORCE);
        impact = binder.account(name + ".impacts", EnergyAccount.Kind.LOSS);
        binder.discontinuity(new Stop(true));
        binder.discontinuity(new Stop(false));
    }

    /** @return position, m */
    public double position(StateView s) {
        return s.value(x);
    }

    /** @return velocity, m/s */
    public double velocity(StateView s) {
        return s.value(v);
    }

    /** @return the lower stop position, m */
    public double lower() {
        return lower;
    }

    /** @return the upper stop position, m */
    public double upper() {
        return upper;
    }

    /** @return the moving mass, kg */
    public double mass() {
        return mass;
    }

    /** @return the current mode */
    public Mode mode() {
        return mode;
    }

    /** @return the position state (for diagnostics) */
    public StateSlot positionSlot() {
        return x;
    }

    /** @return the velocity state (for diagnostics) */
    public StateSlot velocitySlot() {
        return v;
    }

    /** @return the member's id, {@code <owner>.<name>}, e.g. {@code reducer.spool} (the prefix of its states) */
    public String id() {
        return owner + "." + name;
    }

    /** @return the position of the stop a mode holds the member at, m (NaN for {@link Mode#FREE}) */
    public double stopPosition(Mode held) {
        return switch (held) {
            case AT_LOWER_STOP -> lower;
            case AT_UPPER_STOP -> upper;
            case FREE -> Double.NaN;
        };
    }

    /**
     * Sets the mode directly, without an event. For operating-point solves only: the caller must put the
     * state at the stop ({@link #stopPosition}, velocity zero) when it holds the member. During a run the
     * mode changes only through the stop events.
     */
    public void hold(Mode newMode) {
        this.mode = newMode;
    }

    /**
     * The release rule of the stop events, for operating-point solves: a member held at its lower stop leaves
     * it when the net force exceeds {@link #RELEASE_FORCE}, one at its upper stop when the net force is below
     * minus that.
     *
     * @param s state
     * @return true when the member is held and the net force at {@code s} pulls it off its stop
     */
    public boolean pulledOffStop(StateView s) {
        double f = netForce.at(s);
        return mode == Mode.AT_LOWER_STOP && f > RELEASE_FORCE || mode == Mode.AT_UPPER_STOP && -f > RELEASE_FORCE;
    }

    /** @return the net force on the member at {@code s}, N, positive towards the upper stop */
    public double netForce(StateView s) {
        return netForce.at(s);
    }

    /**
     * Applies the forces: sets dx/dt and dv/dt (zero while held), records signals and books the power of
     * each force. {@code forces.external} is not booked here; its owner books it.
     */
    public void apply(Evaluation e, Forces forces) {
        double vel = e.value(v);
        if (mode == Mode.FREE) {
            double a = forces.net() / mass;
            e.derivative(x, vel);
            e.derivative(v, a);
            if (e.recording()) {
                e.power(kinetic, mass * vel * a);
                e.power(spring, -forces.spring() * vel);
                e.power(damping, -forces.damping() * vel);
                e.power(flowForce, -forces.flow() * vel);
            }
        } else {
            e.derivative(x, 0.0);
            e.derivative(v, 0.0);
        }
        e.signal(xSignal, e.value(x));
        e.signal(vSignal, vel);
    }

    /** Chooses the initial mode: held at a stop when it starts there and the net force presses it on. */
    public void initialise(StateView s) {
        double pos = s.value(x);
        double f = netForce.at(s);
        if (pos <= lower && f <= RELEASE_FORCE) {
            mode = Mode.AT_LOWER_STOP;
        } else if (pos >= upper && f >= -RELEASE_FORCE) {
            mode = Mode.AT_UPPER_STOP;
        } else {
            mode = Mode.FREE;
        }
    }

    /** The event of one stop: reaching it while free, or leaving it while held. */
    private final class Stop implements Discontinuity {
        private final boolean isLower;

        Stop(boolean isLower) {
            this.isLower = isLower;
        }

        @Override
        public String description() {
            return String.format(Locale.ROOT, "%s.%s at %s", owner, name, isLower ? lowerStopName : upperStopName);
        }

        @Override
        public String kind() {
            return isLower ? "seat" : "stop";
        }

        @Override
        public String owner() {
            return owner + "." + name;
        }

        @Override
        public double g(StateView s) {
            Mode held = isLower ? Mode.AT_LOWER_STOP : Mode.AT_UPPER_STOP;
            Mode other = isLower ? Mode.AT_UPPER_STOP : Mode.AT_LOWER_STOP;
            if (mode == Mode.FREE) {
                double slack = STOP_TOLERANCE * (upper - lower);
                return isLower ? s.value(x) - lower + slack : upper - s.value(x) + slack;
            } else if (mode == held) {
                double f = netForce.at(s);
                return (isLower ? f : -f) - RELEASE_FORCE;
            } else if (mode == other) {
                return upper - lower;
            }
            return upper - lower;
        }

        @Override
        public Response onCrossing(boolean increasing, StateEditor s) {
            Mode held = isLower ? Mode.AT_LOWER_STOP : Mode.AT_UPPER_STOP;
            if (mode == Mode.FREE && !increasing) {
                double vel = s.value(v);
                s.impulse(impact, 0.5 * mass * vel * vel);
                s.impulse(kinetic, -0.5 * mass * vel * vel);
                s.set(x, isLower ? lower : upper);
                s.set(v, 0.0);
                mode = held;
                return Response.STATE_CHANGED;
            }
            if (mode == held && increasing) {
                mode = Mode.FREE;
                return Response.RECOMPUTE;
            }
            return Response.CONTINUE;
        }
    }
}
