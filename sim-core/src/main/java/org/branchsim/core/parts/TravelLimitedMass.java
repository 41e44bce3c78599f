package org.branchsim.core.parts;

import java.util.Locale;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.ModeSlot;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateEditor;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.units.Dimension;

/**
 * A rigid member (spool, poppet, piston) of mass m moving along one axis between a lower and an upper stop:
 * m dv/dt = F, dx/dt = v. Reaching a stop is an event. With the default coefficient of restitution e = 0 the
 * member stops dead (plastic impact; its kinetic energy is booked as an impact loss) and is held there until the
 * net force pulls it away, which is a second event. With 0 &lt; e &lt;= 1 it rebounds with -e times its impact
 * velocity (Newton's experimental law of impact; Goldsmith, Impact, 1960, ch. 1), the lost fraction 1 - e^2 of
 * its kinetic energy booked as the impact loss; a rebound too small to carry it clear of the stop against the
 * net force that presses it on (rebound travel (e v)^2 m / (2 |F|) below {@link #CAPTURE_TRAVEL} of its travel)
 * ends the bouncing: the member is then held, so the bounces never pile up without end. While held its position and velocity do not change. States: {@code <name>.x} (m),
 * {@code <name>.v} (m/s); its mode (free or held, {@link Member.Mode}) is a discrete state of each run, read
 * and set through the run's state views, so the member itself holds nothing of any run.
 */
public final class TravelLimitedMass implements Member {

    /**
     * Rebound travel, as a fraction of the member's travel, below which a rebounding member is captured by its
     * stop (held) instead of bouncing again: 100 times {@link Member#STOP_TOLERANCE}, so a rebound always clears
     * the slack of the stop events (numerical choice, no source).
     */
    public static final double CAPTURE_TRAVEL = 100 * STOP_TOLERANCE;

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
    private ModeSlot modeSlot;
    private double restitution;

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
     * Sets the coefficient of restitution at both stops; part of building the circuit, before it is bound.
     *
     * @param e coefficient of restitution, 0 (dead stop, the default) to 1 (elastic rebound)
     * @return this member
     */
    public TravelLimitedMass withRestitution(double e) {
        if (!(e >= 0.0 && e <= 1.0)) {
            throw new IllegalArgumentException("a coefficient of restitution from 0 to 1, not " + e);
        }
        if (modeSlot != null) {
            throw new IllegalStateException(id() + " is bound already");
        }
        this.restitution = e;
        return this;
    }

    /** @return the coefficient of restitution at its stops (0 = dead stop) */
    public double restitution() {
        return restitution;
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
        modeSlot = binder.member(this);
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

    /** @return true when the member is free (not held at a stop) in the run {@code s} belongs to */
    public boolean free(StateView s) {
        return s.mode(modeSlot) == Mode.FREE;
    }

    @Override
    public double lower() {
        return lower;
    }

    @Override
    public double upper() {
        return upper;
    }

    /** @return the moving mass, kg */
    public double mass() {
        return mass;
    }

    @Override
    public ModeSlot modeSlot() {
        return modeSlot;
    }

    @Override
    public StateSlot positionSlot() {
        return x;
    }

    @Override
    public StateSlot velocitySlot() {
        return v;
    }

    @Override
    public String id() {
        return owner + "." + name;
    }

    @Override
    public double netForce(StateView s) {
        return netForce.at(s);
    }

    /**
     * The natural period 2 pi sqrt(m/k) with the restoring stiffness k = -dF/dx of the net force taken by a
     * central difference over a thousandth of the travel at {@code s} (spring rate plus any position-dependent
     * force, e.g. a flow force).
     *
     * @return the period, s, or NaN when k is not positive (no spring: nothing pulls the member back)
     */
    @Override
    public double naturalPeriod(StateView s) {
        double dx = 1e-3 * (upper - lower);
        double x0 = s.value(x);
        double[] offset = new double[1];
        StateView shifted = new StateView() {
            @Override
            public double time() {
                return s.time();
            }

            @Override
            public double value(StateSlot slot) {
                return slot == x ? x0 + offset[0] : s.value(slot);
            }

            @Override
            public double pressure(org.branchsim.core.model.Node node) {
                return s.pressure(node);
            }

            @Override
            public Mode mode(ModeSlot slot) {
                return s.mode(slot);
            }

            @Override
            public double input(org.branchsim.core.model.ScheduledInput input) {
                return s.input(input);
            }
        };
        offset[0] = dx;
        double up = netForce.at(shifted);
        offset[0] = -dx;
        double down = netForce.at(shifted);
        double k = -(up - down) / (2 * dx);
        return k > 0 ? 2 * Math.PI * Math.sqrt(mass / k) : Double.NaN;
    }

    /**
     * Applies the forces: sets dx/dt and dv/dt (zero while held), records signals and books the power of
     * each force. {@code forces.external} is not booked here; its owner books it.
     */
    public void apply(Evaluation e, Forces forces) {
        double vel = e.value(v);
        if (e.mode(modeSlot) == Mode.FREE) {
            double a = forces.net() / mass;
            e.derivative(x, vel);
            e.derivative(v, a);
            if (e.recording()) {
                e.power(kinetic, mass * vel * a);
                e.power(spring, -forces.spring() * vel);
                e.power(damping, -forces.damping() * vel);
                e.power(flowForce, -forces.flow() * vel);
            }
            e.derivativePartial(x, v, 1.0);
        } else {
            e.derivative(x, 0.0);
            e.derivative(v, 0.0);
        }
        e.signal(xSignal, e.value(x));
        e.signal(vSignal, vel);
    }

    /**
     * Adds dF/d(state) of the net force to the Jacobian: d(dv/dt)/d(state) = (dF/d(state)) / m while free; nothing
     * while held (the rows of a held member are zero: its position and velocity do not change).
     *
     * @param e the evaluation (ignored unless it collects partials)
     * @param wrt the state
     * @param dForce dF/d(state), N per SI unit of the state
     */
    public void forcePartial(Evaluation e, StateSlot wrt, double dForce) {
        if (e.partials() && e.mode(modeSlot) == Mode.FREE) {
            e.derivativePartial(v, wrt, dForce / mass);
        }
    }

    /** As {@link #forcePartial(Evaluation, StateSlot, double)} with respect to a node's pressure, dF/dp in N/Pa. */
    public void forcePartial(Evaluation e, Node wrt, double dForce) {
        if (e.partials() && e.mode(modeSlot) == Mode.FREE) {
            e.derivativePartial(v, wrt, dForce / mass);
        }
    }

    /** The event of one stop: reaching it while free, or leaving it while held. */
    private final class Stop implements Discontinuity {
        private final boolean isLower;
        private final String description;

        Stop(boolean isLower) {
            this.isLower = isLower;
            this.description = String.format(Locale.ROOT, "%s.%s at %s", owner, name,
                    isLower ? lowerStopName : upperStopName);
        }

        @Override
        public String description() {
            return description;
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
            Mode mode = s.mode(modeSlot);
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

        /**
         * @return true when a member striking this stop at velocity {@code vel} rebounds: e &gt; 0, it moves into
         *         the stop, and its rebound clears {@link #CAPTURE_TRAVEL} against the net force pressing it on
         *         (evaluated on the stop at rest, so velocity-dependent forces do not count)
         */
        private boolean rebounds(StateView s, double vel) {
            if (restitution == 0.0 || (isLower ? vel >= 0.0 : vel <= 0.0)) {
                return false;
            }
            double rebound = restitution * Math.abs(vel);
            double pressing = isLower ? -netForce.at(s) : netForce.at(s);
            if (pressing <= 0.0) {
                return true;
            }
            return rebound * rebound * mass / (2.0 * pressing) > CAPTURE_TRAVEL * (upper - lower);
        }

        @Override
        public Response onCrossing(boolean increasing, StateEditor s) {
            Mode held = isLower ? Mode.AT_LOWER_STOP : Mode.AT_UPPER_STOP;
            Mode mode = s.mode(modeSlot);
            if (mode == Mode.FREE && !increasing) {
                double vel = s.value(v);
                double energy = 0.5 * mass * vel * vel;
                s.set(x, isLower ? lower : upper);
                s.set(v, 0.0);
                if (rebounds(s, vel)) {
                    double lost = (1.0 - restitution * restitution) * energy;
                    s.impulse(impact, lost);
                    s.impulse(kinetic, -lost);
                    s.set(v, -restitution * vel);
                    return Response.STATE_CHANGED;
                }
                s.impulse(impact, energy);
                s.impulse(kinetic, -energy);
                s.setMode(modeSlot, held);
                return Response.STATE_CHANGED;
            }
            if (mode == held && increasing) {
                s.setMode(modeSlot, Mode.FREE);
                return Response.RECOMPUTE;
            }
            return Response.CONTINUE;
        }
    }
}
