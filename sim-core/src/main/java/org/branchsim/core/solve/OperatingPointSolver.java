package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.Member.Mode;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.results.SimulationResult;

/**
 * Finds an operating point of a circuit model at a fixed time t: a state y with f(t, y) = 0 over the free
 * states, scheduled inputs frozen at their values at t, members held at a seat or stop kept there. No time is
 * simulated, so a variant's model (the same topology) can be solved from another model's operating point.
 * <p>
 * <b>Newton solve.</b> A damped Newton method over the free states in scaled unknowns y_j / s_j (s_j the
 * state's typical magnitude), LU of the scaled finite-difference {@link Linearisation} (a minimum-norm
 * least-squares step when it is singular, e.g. a volume trapped behind closed valves), backtracking on the
 * scaled residual norm, at most {@link #MAX_ITERATIONS} iterations per held set.
 * <p>
 * <b>Convergence.</b> The last accepted scaled step max_j |dy_j| / s_j is at most {@link #STEP_TOLERANCE}
 * and the scaled residual max_i |f_i| / s_i is at most {@link #RESIDUAL_TOLERANCE} times the infinity norm of
 * the scaled Jacobian (a residual that small next to the circuit's fastest rates is round-off).
 * <p>
 * <b>Active set.</b> After a converged Newton solve, a free member whose position lies beyond a stop (by more
 * than {@link Member#STOP_TOLERANCE} of its travel) is held at that stop, and a held member whose
 * net force pulls it off its stop (the release rule of the stop events, {@link Member#pulledOffStop})
 * is released. After a failed solve the iterate's positions mean little, so the members are judged at the
 * state the solve started from: held members are released by the same rule, and a free member still pushed
 * by a net force is held at the stop the force points to (no equilibrium within its travel; its position
 * barely enters the equations, so Newton cannot carry it there). Then the solve is repeated, at most
 * {@link #MAX_SWITCHES} times; a held set met twice (a member switching back and forth) ends it. A member in
 * transit at the start ({@link OperatingPointStart#moving()}) is never brought to rest at a stop: the solve
 * fails instead.
 * <p>
 * The solve holds its members' modes in an engine of its own: the model is only read, and the held set found is
 * part of the {@link OperatingPoint}, which a mode analysis linearises with.
 */
public final class OperatingPointSolver {

    /** Largest scaled Newton step, max_j |dy_j| / s_j, of a converged solve. */
    public static final double STEP_TOLERANCE = 1e-9;
    /** Largest scaled residual of a converged solve, relative to the scaled Jacobian's infinity norm. */
    public static final double RESIDUAL_TOLERANCE = 1e-10;
    /** Newton iterations allowed per held set. */
    public static final int MAX_ITERATIONS = 50;
    /** Active-set changes allowed. */
    public static final int MAX_SWITCHES = 12;
    /**
     * A velocity counts as moving above this fraction of its state's typical magnitude (0.1 mm/s for a piston
     * with a 0.1 m/s scale).
     */
    public static final double MOVING_FRACTION = 1e-3;
    /** States named in a failure message. */
    public static final int REPORTED_STATES = 3;

    private OperatingPointSolver() {
    }

    /**
     * The usual start from a run: see {@link OperatingPointStart#fromRun}.
     *
     * @param result a finished run
     * @param from start of the averaging window, s
     * @param to end of the averaging window, s
     * @return the mean state over the window, the run's held members, the members in transit
     */
    public static OperatingPointStart startFrom(SimulationResult result, double from, double to) {
        return OperatingPointStart.fromRun(result, from, to);
    }

    /**
     * @param circuit the model (not changed)
     * @param t time, s
     * @param start start state, held set and members in transit
     * @return the converged operating point
     * @throws BranchsimException NO_OPERATING_POINT when none is found, naming the time, the states changing
     *         most and anything still moving
     */
    public static OperatingPoint solve(CircuitModel circuit, double t, OperatingPointStart start) {
        Attempt a = run(circuit, t, start);
        if (!a.point().converged()) {
            throw new BranchsimException(ErrorKey.NO_OPERATING_POINT, a.arguments());
        }
        return a.point();
    }

    /**
     * Solves a model from a given state, e.g. a variant's model from another model's operating point
     * ({@code solve(variant, op.time(), op.state(), op.held())}); members moving in the start state count as in
     * transit ({@link OperatingPointStart#fromState}).
     *
     * @param circuit the model (not changed)
     * @param t time, s
     * @param start start state, SI, in the order of the model's states
     * @param held members held at the start: member id to its stop
     * @return the converged operating point
     * @throws BranchsimException NO_OPERATING_POINT when none is found
     */
    public static OperatingPoint solve(CircuitModel circuit, double t, double[] start, Map<String, Mode> held) {
        return solve(circuit, t, OperatingPointStart.fromState(circuit, start, held));
    }

    /**
     * As {@link #solve(Circuit, double, OperatingPointStart)}, but returns the last iterate, unconverged,
     * instead of throwing; {@link OperatingPoint#failure()} then holds the message the exception would carry.
     */
    public static OperatingPoint attempt(CircuitModel circuit, double t, OperatingPointStart start) {
        return run(circuit, t, start).point();
    }

    private record Attempt(OperatingPoint point, Object[] arguments) {
    }

    private static Attempt run(CircuitModel circuit, double t, OperatingPointStart start) {
        double[] y = start.state();
        if (y.length != circuit.dimension() || !Double.isFinite(t)) {
            throw new BranchsimException(ErrorKey.START_STATE_MISMATCH, String.valueOf(circuit.dimension()),
                    String.valueOf(y.length), String.valueOf(t));
        }
        RunEngine engine = new RunEngine(circuit);
        List<Member> members = circuit.members();
        Map<String, Mode> held = new TreeMap<>(start.held());
        Set<Map<String, Mode>> tried = new HashSet<>();
        int iterations = 0;
        int switches = 0;
        String reason;
        while (true) {
            tried.add(held);
            engine.hold(held);
            for (Member m : members) {
                Mode stop = held.get(m.id());
                if (stop != null) {
                    y[engine.position(m.positionSlot())] = m.stopPosition(stop);
                    y[engine.position(m.velocitySlot())] = 0.0;
                }
            }
            double[] solveStart = y.clone();
            DampedNewton.Outcome out = DampedNewton.solve(engine, t, y, MAX_ITERATIONS);
            iterations += out.iterations();
            y = out.state();
            Map<String, Mode> next = new TreeMap<>(held);
            String transit = out.converged() ? settle(engine, start, engine.view(t, y), y, next)
                    : push(engine, start, engine.view(t, solveStart), next);
            if (transit != null) {
                reason = transit;
                break;
            }
            if (next.equals(held)) {
                reason = out.reason();
                break;
            }
            if (tried.contains(next)) {
                reason = "the held set cycles (" + changed(held, next) + ")";
                break;
            }
            if (switches == MAX_SWITCHES) {
                reason = "no consistent held set after " + MAX_SWITCHES + " changes";
                break;
            }
            switches++;
            held = next;
            if (!out.converged()) {
                y = solveStart;
            }
        }
        engine.hold(held);
        List<StateSlot> free = Linearisation.freeStates(engine);
        double[] f = new double[y.length];
        engine.derivatives(t, y, f);
        StateSlot worst = null;
        double residual = 0.0;
        for (StateSlot s : free) {
            double r = Math.abs(f[engine.position(s)]) / s.absoluteScale();
            if (worst == null || r > residual) {
                residual = r;
                worst = s;
            }
        }
        boolean converged = reason.isEmpty();
        Object[] args = null;
        String failure = "";
        if (!converged) {
            args = NoOperatingPointReport.arguments(engine, t, reason + " (" + iterations + " Newton iterations, "
                    + switches + " held-set changes)", start, y);
            failure = NoOperatingPointReport.message(args);
        }
        List<String> names = circuit.states().stream().map(StateSlot::name).toList();
        OperatingPoint op = new OperatingPoint(t, y, names, held, iterations, switches, residual,
                worst == null ? "" : worst.name(), worst == null ? 0.0 : f[engine.position(worst)], converged, failure);
        return new Attempt(op, args);
    }

    /**
     * After a converged solve: a free member whose position lies beyond a stop is held there, unless it is in
     * transit; a held member whose net force pulls it off its stop is released.
     *
     * @return why the solve must stop (a member in transit beyond a stop), or null
     */
    private static String settle(RunEngine engine, OperatingPointStart start, StateView view, double[] y,
                                 Map<String, Mode> next) {
        for (Member m : engine.model().members()) {
            if (view.mode(m.modeSlot()) != Mode.FREE) {
                if (m.pulledOffStop(view)) {
                    next.remove(m.id());
                }
                continue;
            }
            Mode stop = beyond(m, y[engine.position(m.positionSlot())]);
            if (stop != Mode.FREE && start.moving().containsKey(m.id())) {
                return String.format(Locale.ROOT, "the equilibrium found has %s, in transit at %.4g m/s at the start, "
                        + "beyond its %s (an equilibrium there is where a motion ends, not the state at this time)",
                        m.id(), start.moving().get(m.id()), stop == Mode.AT_LOWER_STOP ? "lower stop" : "upper stop");
            }
            if (stop != Mode.FREE) {
                next.put(m.id(), stop);
            }
        }
        return null;
    }

    /**
     * After a failed solve, where the iterate's positions mean little: judged at the state the solve started
     * from, a held member whose net force pulls it off its stop is released, and a free member (not in
     * transit) on which a net force beyond {@link Member#RELEASE_FORCE} acts is held at the stop the
     * force pushes it to: it has no equilibrium within its travel (its position barely enters the equations,
     * so Newton cannot carry it to the stop).
     *
     * @return null (a failed solve is never the transit case: that needs an equilibrium beyond a stop)
     */
    private static String push(RunEngine engine, OperatingPointStart start, StateView view, Map<String, Mode> next) {
        for (Member m : engine.model().members()) {
            if (view.mode(m.modeSlot()) != Mode.FREE) {
                if (m.pulledOffStop(view)) {
                    next.remove(m.id());
                }
            } else if (!start.moving().containsKey(m.id())) {
                double force = m.netForce(view);
                if (Math.abs(force) > Member.RELEASE_FORCE) {
                    next.put(m.id(), force > 0 ? Mode.AT_UPPER_STOP : Mode.AT_LOWER_STOP);
                }
            }
        }
        return null;
    }

    /** @return the stop a free member's position lies beyond (by more than the stop tolerance), or FREE */
    private static Mode beyond(Member m, double x) {
        double slack = Member.STOP_TOLERANCE * (m.upper() - m.lower());
        if (x < m.lower() - slack) {
            return Mode.AT_LOWER_STOP;
        }
        return x > m.upper() + slack ? Mode.AT_UPPER_STOP : Mode.FREE;
    }

    private static String changed(Map<String, Mode> from, Map<String, Mode> to) {
        Set<String> ids = new TreeSet<>(from.keySet());
        ids.addAll(to.keySet());
        List<String> out = new ArrayList<>();
        for (String id : ids) {
            Mode a = from.getOrDefault(id, Mode.FREE);
            Mode b = to.getOrDefault(id, Mode.FREE);
            if (a != b) {
                out.add(id + " " + describe(a) + " -> " + describe(b));
            }
        }
        return String.join(", ", out);
    }

    private static String describe(Mode m) {
        return switch (m) {
            case FREE -> "free";
            case AT_LOWER_STOP -> "held at its lower stop";
            case AT_UPPER_STOP -> "held at its upper stop";
        };
    }
}
