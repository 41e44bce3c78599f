package org.branchsim.core.solve;

import java.util.Arrays;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.JacobianWorkspace;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.StateEditor;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;

/**
 * Everything one run of a {@link CircuitModel} changes, kept apart from the model: the members' modes (free or
 * held at a stop), the ledger of energy booked instantly at events (J per account), and the work buffers of the
 * evaluations (derivatives, views for switching functions, editors for events). Created per run, per operating
 * point solve and per linearisation, and used by one thread; the model itself is only read, so many engines
 * may run one model at once.
 */
final class RunEngine {

    private final CircuitModel model;
    private final List<Member> members;
    private final Member.Mode[] modes;
    private final double[] impulses;
    private final Evaluation work;
    private final Evaluation viewWork;
    private final Evaluation editWork;
    private final Map<StateSlot, Integer> positions;
    private JacobianWorkspace jacobianWork;
    private RecentPowers recentPowers;
    private boolean onlyMarkedPoints;
    private boolean solutionPointNext;
    private long evaluations;

    /** @param model the model to run; every member starts free, the impulse ledger empty */
    RunEngine(CircuitModel model) {
        this.model = model;
        this.members = model.members();
        this.modes = new Member.Mode[members.size()];
        Arrays.fill(modes, Member.Mode.FREE);
        this.impulses = new double[model.accounts().size()];
        this.work = model.workspace(modes, impulses);
        this.viewWork = model.workspace(modes, impulses);
        this.editWork = model.workspace(modes, impulses);
        this.positions = positions(model);
    }

    /** @return the position of every state in the state vector */
    static Map<StateSlot, Integer> positions(CircuitModel model) {
        Map<StateSlot, Integer> out = new IdentityHashMap<>();
        List<StateSlot> states = model.states();
        for (int i = 0; i < states.size(); i++) {
            out.put(states.get(i), i);
        }
        return out;
    }

    /** @return the model run */
    CircuitModel model() {
        return model;
    }

    /** @return the position of a state in the state vector */
    int position(StateSlot slot) {
        return positions.get(slot);
    }

    /**
     * Computes dy/dt with the run's member modes.
     *
     * @param t time, s
     * @param y state, SI
     * @param yDot output: derivative, SI per second
     */
    void derivatives(double t, double[] y, double[] yDot) {
        evaluations++;
        boolean record = recentPowers != null && (!onlyMarkedPoints || solutionPointNext);
        solutionPointNext = false;
        model.evaluate(work, t, y, yDot, null, record ? recentPowers.next(t, y) : null);
    }

    /**
     * From now on remembers the powers of marked evaluations only (see {@link #markSolutionPoint}): for an
     * integrator that marks every evaluation on its solution, the powers of its stages are never asked for.
     */
    void rememberMarkedPointsOnly() {
        onlyMarkedPoints = true;
    }

    /** The next derivative evaluation is at a point of the solution: its powers are remembered. */
    void markSolutionPoint() {
        solutionPointNext = true;
    }

    /**
     * From now on remembers the energy accounts' powers of the latest derivative evaluations (see
     * {@link #powersAt}; all of them, or the marked ones after {@link #rememberMarkedPointsOnly}); costs a copy
     * of the state per evaluation remembered.
     */
    void rememberPowers() {
        if (recentPowers == null) {
            double[] scale = new double[model.dimension()];
            List<StateSlot> slots = model.states();
            for (int i = 0; i < scale.length; i++) {
                scale[i] = slots.get(i).absoluteScale();
            }
            recentPowers = new RecentPowers(scale.length, model.accounts().size(), scale);
        }
    }

    /**
     * The power flowing into each energy account at (t, y), W, in the model's account order: taken from a
     * remembered derivative evaluation at that instant and state when there is one (no new evaluation),
     * otherwise evaluated (and counted).
     *
     * @param timeTolerance largest time difference still taken as the same instant, s
     */
    double[] powersAt(double t, double[] y, double timeTolerance) {
        double[] found = recentPowers == null ? null : recentPowers.find(t, y, timeTolerance);
        return found != null ? found : samplePowers(t, y);
    }

    /**
     * The Jacobian df/dy at (t, y) with the run's member modes, from the elements' partials
     * ({@link CircuitModel#jacobian}); not counted as an evaluation. Its buffers are allocated on the first call.
     *
     * @param t time, s
     * @param y state, SI (not changed)
     * @param jac output, n x n, every entry written
     */
    void jacobian(double t, double[] y, double[][] jac) {
        jacobian(t, y, jac, 0.0, null);
    }

    /**
     * The Jacobian as {@link #jacobian(double, double[], double[][])} and df/dt at (t, y) by a forward difference
     * of step dt of the elements that read a ramping input ({@link CircuitModel#jacobian}; ft null: the Jacobian
     * only); not counted as an evaluation of the equations. Its buffers are allocated on the first call.
     */
    void jacobian(double t, double[] y, double[][] jac, double dt, double[] ft) {
        if (jacobianWork == null) {
            jacobianWork = model.jacobianWorkspace(modes, impulses);
        }
        model.jacobian(jacobianWork, t, y, jac, dt, ft);
    }

    /** @return the values of all signals at (t, y), SI, in the model's signal order */
    double[] sampleSignals(double t, double[] y) {
        double[] out = new double[model.signals().size()];
        evaluations++;
        model.evaluate(work, t, y, new double[y.length], out, null);
        return out;
    }

    /** @return the power flowing into each energy account at (t, y), W, in the model's account order */
    double[] samplePowers(double t, double[] y) {
        double[] out = new double[model.accounts().size()];
        evaluations++;
        model.evaluate(work, t, y, new double[y.length], null, out);
        return out;
    }

    /**
     * @return every full evaluation of the model's equations by this engine so far: derivatives for the
     *         integrator (steps, stages, Jacobian columns), signal samples for the output grid and power samples
     *         for the energy accounts (switching-function views evaluate no equations and are not counted)
     */
    long evaluations() {
        return evaluations;
    }

    /** @return a read-only view of (t, y) for switching functions; valid until the next call of this method */
    StateView view(double t, double[] y) {
        return model.at(viewWork, t, y);
    }

    /** @return an editable view of (t, y) for an event; edits write into {@code y}, modes and impulses */
    StateEditor editor(double t, double[] y) {
        return model.at(editWork, t, y);
    }

    /** @return energy booked instantly at events so far, J, per account in the model's account order */
    double[] impulses() {
        return impulses.clone();
    }

    /** Sets the modes at the start of a run: held where a member starts at a stop pressed onto it. */
    void initialiseModes(double t, double[] y) {
        StateView v = view(t, y);
        for (int k = 0; k < modes.length; k++) {
            modes[k] = members.get(k).initialMode(v);
        }
    }

    /** @return the mode of member k (in the model's member order) */
    Member.Mode mode(int k) {
        return modes[k];
    }

    /** @return the members held at a stop now: member id to its stop, sorted by id */
    Map<String, Member.Mode> heldMembers() {
        Map<String, Member.Mode> held = new TreeMap<>();
        for (int k = 0; k < modes.length; k++) {
            if (modes[k] != Member.Mode.FREE) {
                held.put(members.get(k).id(), modes[k]);
            }
        }
        return held;
    }

    /**
     * Sets every member's mode: held at the given stop when named, free otherwise (no state is touched). For
     * operating points and linearisations; during a run modes change only through the stop events.
     *
     * @param held member id to its stop
     * @throws BranchsimException BAD_ARGUMENT when an id names no member of the model
     */
    void hold(Map<String, Member.Mode> held) {
        Map<String, Member> byId = new LinkedHashMap<>();
        for (Member m : members) {
            byId.put(m.id(), m);
        }
        for (String id : held.keySet()) {
            if (!byId.containsKey(id)) {
                throw new BranchsimException(ErrorKey.UNKNOWN_MEMBER, id, model.name(),
                        String.join(", ", byId.keySet()));
            }
        }
        for (int k = 0; k < modes.length; k++) {
            modes[k] = held.getOrDefault(members.get(k).id(), Member.Mode.FREE);
        }
    }
}
