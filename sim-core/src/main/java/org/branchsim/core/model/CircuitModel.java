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
    private final List<Member> members;
    private final List<Discontinuity> discontinuities;
    private final double[] initialState;
    private final EnergyAccount compressionAccount;
    private final EnergyAccount[] tankAccounts;
    private final List<int[]> couplings;

    CircuitModel(String name, Fluid fluid, List<Node> nodes, List<Element> elements, List<StateSlot> states,
                 double[] initialState, List<SignalHandle> signals, List<EnergyAccount> accounts,
                 List<ScheduledInput> inputs, List<Member> members, List<Discontinuity> discontinuities,
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
        if (modes.length != members.size() || impulses.length != accounts.size()) {
            throw new IllegalArgumentException("a run of " + name + " needs " + members.size() + " member modes and "
                    + accounts.size() + " impulse accounts, found " + modes.length + " and " + impulses.length);
        }
        return new Evaluation(nodes, modes, impulses);
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
