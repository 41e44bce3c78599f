package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;

/**
 * A hydraulic circuit ready to simulate, built once by {@link CircuitBuilder} and never changed afterwards:
 * nodes, elements, the state layout they declared (SI values, node pressures first), their signals, scheduled
 * inputs with their fixed schedules, energy accounts, moving members and discontinuities. It holds no state of
 * any run: a run's member modes, impulse ledger and work buffers belong to the solver's per-run engine, which
 * evaluates dy/dt = f(t, y) through {@link #evaluate}. So one model may be run many times, and on many threads
 * at once.
 */
public final class CircuitModel {

    private final String name;
    private final Fluid fluid;
    private final Node[] nodes;
    private final Element[] elements;
    private final List<StateSlot> states;
    private final List<SignalHandle> signals;
    private final List<EnergyAccount> accounts;
    private final List<ScheduledInput> inputs;
    /** Per element, the scheduled inputs it reads: its own and the pressures of the tanks at its ports. */
    private final ScheduledInput[][] inputsRead;
    private final List<Member> members;
    private final List<Discontinuity> discontinuities;
    private final double[] initialState;
    private final EnergyAccount compressionAccount;
    private final EnergyAccount[] tankAccounts;
    private final List<int[]> couplings;
    /** Per element: its own states and its ports' pressure states (positions in the state vector). */
    private final int[][] elementColumns;
    /** Per element: its own states. */
    private final int[][] elementRows;
    /** Typical magnitude of each state, SI. */
    private final double[] typical;

    CircuitModel(String name, Fluid fluid, List<Node> nodes, List<Element> elements, List<StateSlot> states,
                 double[] initialState, List<SignalHandle> signals, List<EnergyAccount> accounts,
                 List<ScheduledInput> inputs, List<List<ScheduledInput>> elementInputs, List<Member> members,
                 List<Discontinuity> discontinuities,
                 EnergyAccount compressionAccount, EnergyAccount[] tankAccounts, List<int[]> couplings) {
        this.name = name;
        this.fluid = fluid;
        this.nodes = nodes.toArray(new Node[0]);
        this.elements = elements.toArray(new Element[0]);
        this.states = List.copyOf(states);
        this.initialState = initialState.clone();
        this.signals = List.copyOf(signals);
        this.accounts = List.copyOf(accounts);
        this.inputs = List.copyOf(inputs);
        this.inputsRead = new ScheduledInput[this.elements.length][];
        for (int k = 0; k < this.elements.length; k++) {
            List<ScheduledInput> read = new ArrayList<>(elementInputs.get(k));
            for (Node port : this.elements[k].ports()) {
                if (port.isTank() && !read.contains(port.tankPressure())) {
                    read.add(port.tankPressure());
                }
            }
            inputsRead[k] = read.toArray(new ScheduledInput[0]);
        }
        this.members = List.copyOf(members);
        List<Discontinuity> all = new ArrayList<>(discontinuities);
        for (ScheduledInput in : this.inputs) {
            for (double corner : in.corners()) {
                all.add(new ScheduleCorner(in.name(), corner));
            }
        }
        this.discontinuities = Collections.unmodifiableList(all);
        this.compressionAccount = compressionAccount;
        this.tankAccounts = tankAccounts.clone();
        List<int[]> blocks = new ArrayList<>();
        for (int[] block : couplings) {
            blocks.add(block.clone());
        }
        this.couplings = Collections.unmodifiableList(blocks);
        this.elementRows = new int[this.elements.length][];
        this.elementColumns = new int[this.elements.length][];
        ownStates();
        this.typical = new double[this.states.size()];
        for (int i = 0; i < typical.length; i++) {
            typical[i] = this.states.get(i).absoluteScale();
        }
    }

    /**
     * Finds each element's own states: binding declares them contiguously, element by element, after the node
     * pressures, each named with the element's id as prefix.
     */
    private void ownStates() {
        int cursor = 0;
        while (cursor < states.size() && cursor < nodes.length && isNodePressure(states.get(cursor))) {
            cursor++;
        }
        for (int k = 0; k < elements.length; k++) {
            String prefix = elements[k].id() + ".";
            int first = cursor;
            while (cursor < states.size() && states.get(cursor).name().startsWith(prefix)) {
                cursor++;
            }
            int[] rows = new int[cursor - first];
            for (int i = 0; i < rows.length; i++) {
                rows[i] = first + i;
            }
            List<Integer> columns = new ArrayList<>();
            for (Node port : elements[k].ports()) {
                if (!port.isTank() && !columns.contains(port.pressureSlot().index())) {
                    columns.add(port.pressureSlot().index());
                }
            }
            for (int r : rows) {
                columns.add(r);
            }
            elementRows[k] = rows;
            elementColumns[k] = columns.stream().mapToInt(Integer::intValue).toArray();
        }
    }

    private boolean isNodePressure(StateSlot slot) {
        for (Node n : nodes) {
            if (!n.isTank() && n.pressureSlot() == slot) {
                return true;
            }
        }
        return false;
    }

    /** @return the circuit's (scenario's) name */
    public String name() {
        return name;
    }

    /** @return the fluid */
    public Fluid fluid() {
        return fluid;
    }

    /**
     * @return for each element, the positions in the state vector of the states it reads or writes (its own
     *         states and the pressures of its ports): states in one block may depend on each other, states in no
     *         common block do not (the structure of the Jacobian). For the solver layer; the arrays are copies.
     */
    public List<int[]> couplings() {
        List<int[]> copy = new ArrayList<>();
        for (int[] block : couplings) {
            copy.add(block.clone());
        }
        return copy;
    }

    /** @return the number of states */
    public int dimension() {
        return states.size();
    }

    /** @return the states in the order of the state vector */
    public List<StateSlot> states() {
        return states;
    }

    /** @return a copy of the initial state vector, SI */
    public double[] initialState() {
        return initialState.clone();
    }

    /** @return the nodes */
    public List<Node> nodes() {
        return List.of(nodes);
    }

    /** @return the elements */
    public List<Element> elements() {
        return List.of(elements);
    }

    /** @return every output signal, node pressures first */
    public List<SignalHandle> signals() {
        return signals;
    }

    /** @return the energy accounts */
    public List<EnergyAccount> accounts() {
        return accounts;
    }

    /** @return the scheduled inputs, their schedules fixed */
    public List<ScheduledInput> inputs() {
        return inputs;
    }

    /** @return the moving members that seats or stops can hold, in the order of a run's mode vector */
    public List<Member> members() {
        return members;
    }

    /**
     * @return the discontinuities the solver must watch: the elements' own, and one per corner of every
     *         scheduled input
     */
    public List<Discontinuity> discontinuities() {
        return discontinuities;
    }

    /**
     * @return true when some scheduled input is ramping at time t, i.e. when the equations depend on time
     *         explicitly there (between ramps they are autonomous)
     */
    public boolean timeDependentAt(double t) {
        for (ScheduledInput in : inputs) {
            if (in.rampingAt(t)) {
                return true;
            }
        }
        return false;
    }

    /** @return the signal with that name, or null */
    public SignalHandle signal(String signalName) {
        for (SignalHandle h : signals) {
            if (h.name().equals(signalName)) {
                return h;
            }
        }
        return null;
    }

    /** @return the element with that id, or null */
    public Element element(String id) {
        for (Element e : elements) {
            if (e.id().equals(id)) {
                return e;
            }
        }
        return null;
    }

    /** @return the node with that id, or null */
    public Node node(String id) {
        for (Node n : nodes) {
            if (n.id().equals(id)) {
                return n;
            }
        }
        return null;
    }

    /**
     * A work buffer for one run (the solver's per-run engine holds it): it reads member modes from, writes them
     * to, and books impulse energies into the run's own arrays.
     *
     * @param modes the run's member modes, in {@link #members()} order
     * @param impulses the run's impulse ledger, J, in {@link #accounts()} order
     * @return the work buffer
     */
    public Evaluation workspace(Member.Mode[] modes, double[] impulses) {
        checkRunArrays(modes, impulses);
        return new Evaluation(nodes, modes, impulses);
    }

    private void checkRunArrays(Member.Mode[] modes, double[] impulses) {
        if (modes.length != members.size() || impulses.length != accounts.size()) {
            throw new IllegalArgumentException("a run of " + name + " needs " + members.size() + " member modes and "
                    + accounts.size() + " impulse accounts, found " + modes.length + " and " + impulses.length);
        }
    }

    /**
     * The Jacobian work buffers of one run (the solver's per-run engine holds them), sharing the run's member
     * modes and impulse ledger like {@link #workspace}.
     */
    public JacobianWorkspace jacobianWorkspace(Member.Mode[] modes, double[] impulses) {
        checkRunArrays(modes, impulses);
        return new JacobianWorkspace(nodes, modes, impulses, typical);
    }

    /**
     * The Jacobian df/dy of the equations at (t, y), with the run's member modes, assembled from the elements'
     * closed-form partials (finite differences of an element's own contributions for an element that does not
     * supply them, {@link JacobianWorkspace}) and the nodes' equation
     * dp/dt = beta_e(p) / V * Q, V = V_0 + sum of boundary volumes, Q = sum of inflows:
     * d(dp/dt)/dy_j = beta_e / V * dQ/dy_j - beta_e Q / V^2 * dV/dy_j, plus beta_e'(p) Q / V on the diagonal
     * ({@link Fluid#bulkModulusSlope}). Held members' rows are zero (their position and velocity are fixed while
     * held). Allocates nothing.
     *
     * @param w the run's Jacobian work buffers
     * @param t time, s
     * @param y state, SI (not changed)
     * @param jac output, n x n: jac[i][j] = df_i/dy_j, row i in state i's SI unit per second, column j per SI
     *        unit of state j; every entry is written
     */
    public void jacobian(JacobianWorkspace w, double t, double[] y, double[][] jac) {
        jacobian(w, t, y, jac, 0.0, null);
    }

    /**
     * The Jacobian as {@link #jacobian(JacobianWorkspace, double, double[], double[][])} and, when {@code ft} is
     * given, the partial derivative df/dt at (t, y) with the states held: only the elements reading a scheduled
     * input that ramps at t (their own inputs, or the pressure of a tank at a port) depend on time, so only they
     * are evaluated again at t + dt (a forward difference of their contributions, as a full difference of f would
     * take, without evaluating the rest of the circuit), and a node's row is
     * d(dp/dt)/dt = beta_e/V * dQ/dt - beta_e Q/V^2 * dV/dt (docs/theory.md section 10.1).
     *
     * @param dt time step of the forward difference, s (used when {@code ft} is given)
     * @param ft output, df/dt in each state's SI unit per second squared (or null)
     */
    public void jacobian(JacobianWorkspace w, double t, double[] y, double[][] jac, double dt, double[] ft) {
        Evaluation e = w.collecting;
        e.resetForPartials(t, y, w.rates, jac, w.inflowPartials, w.volumePartials);
        for (Element element : elements) {
            if (element.suppliesPartials()) {
                element.evaluate(e);
            } else {
                e.pausePartials();
                element.evaluate(e);
                e.resumePartials();
            }
        }
        for (int k = 0; k < elements.length; k++) {
            if (!elements[k].suppliesPartials()) {
                w.differences(elements[k], elementColumns[k], elementRows[k], t, y, jac);
            }
        }
        if (ft != null) {
            w.clearTimePartials(ft);
            for (int k = 0; k < elements.length; k++) {
                if (readsRampAt(k, t)) {
                    w.timeDifference(elements[k], elementRows[k], t, dt, y, ft);
                }
            }
        }
        for (Node n : nodes) {
            if (n.isTank()) {
                continue;
            }
            int k = n.index();
            int row = n.pressureSlot().index();
            double p = e.pressure(n);
            double inflow = e.inflowOf(k);
            double v = n.volume() + e.extraVolumeOf(k);
            double beta = fluid.effectiveBulkModulus(p, n.wallBulkModulus());
            double[] dq = w.inflowPartials[k];
            double[] dv = w.volumePartials[k];
            double[] out = jac[row];
            double betaOverV = beta / v;
            double volumeTerm = betaOverV * inflow / v;
            for (int j = 0; j < out.length; j++) {
                out[j] = betaOverV * dq[j] - volumeTerm * dv[j];
            }
            out[row] += fluid.bulkModulusSlope(p, n.wallBulkModulus()) / v * inflow;
            if (ft != null) {
                ft[row] = betaOverV * w.inflowRates[k] - volumeTerm * w.volumeRates[k];
            }
        }
    }

    /** @return true when element k reads a scheduled input that ramps at t */
    private boolean readsRampAt(int k, double t) {
        for (ScheduledInput in : inputsRead[k]) {
            if (in.rampingAt(t)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Evaluates the equations at (t, y) into a run's work buffer: every element, then the nodes'
     * dp/dt = beta_e(p) / V * (sum of inflows - dV/dt).
     *
     * @param work the run's work buffer
     * @param t time, s
     * @param y state, SI
     * @param yDot output: derivative, SI per second (or null)
     * @param signalOut output: every signal, SI, in {@link #signals()} order (or null)
     * @param powerOut output: the power into every account, W, in {@link #accounts()} order (or null)
     */
    public void evaluate(Evaluation work, double t, double[] y, double[] yDot, double[] signalOut,
                         double[] powerOut) {
        Evaluation e = work;
        e.reset(t, y, yDot, signalOut, powerOut);
        for (Element element : elements) {
            element.evaluate(e);
        }
        for (Node n : nodes) {
            double inflow = e.inflowOf(n);
            double p = e.pressure(n);
            if (n.isTank()) {
                e.power(tankAccounts[n.index()], p * -inflow);
                e.signal(n.pressureSignal(), p);
                continue;
            }
            double v = n.volume() + e.extraVolumeOf(n);
            double beta = fluid.effectiveBulkModulus(p, n.wallBulkModulus());
            e.derivative(n.pressureSlot(), Compressibility.pressureRate(beta, v, inflow));
            e.signal(n.pressureSignal(), p);
            e.power(compressionAccount, p * inflow);
        }
    }

    /**
     * Points a run's work buffer at (t, y) without evaluating anything, to read it (switching functions) or edit
     * it (events: edits write into {@code y}).
     *
     * @return the work buffer, as a view and editor of (t, y)
     */
    public StateEditor at(Evaluation work, double t, double[] y) {
        work.reset(t, y, null, null, null);
        return work;
    }
}
