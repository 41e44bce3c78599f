package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;

/**
 * A hydraulic circuit ready to simulate: nodes, elements, the state layout they declared, their signals,
 * scheduled inputs, energy accounts and discontinuities. It evaluates dy/dt = f(t, y). A circuit holds the
 * modes of its moving members, so one instance serves one run at a time.
 */
public final class Circuit {

    private final String name;
    private final Fluid fluid;
    private final Node[] nodes;
    private final Element[] elements;
    private final List<StateSlot> states;
    private final List<SignalHandle> signals;
    private final List<EnergyAccount> accounts;
    private final List<ScheduledInput> inputs;
    private final List<Discontinuity> discontinuities;
    private final double[] initialState;
    private final EnergyAccount compressionAccount;
    private final EnergyAccount[] tankAccounts;
    private final Evaluation work;
    private final double[] impulses;
    private final Evaluation viewWork;
    private final List<int[]> couplings;

    Circuit(String name, Fluid fluid, List<Node> nodes, List<Element> elements, List<StateSlot> states,
            double[] initialState, List<SignalHandle> signals, List<EnergyAccount> accounts,
            List<ScheduledInput> inputs, List<Discontinuity> discontinuities, EnergyAccount compressionAccount,
            EnergyAccount[] tankAccounts, List<int[]> couplings) {
        this.name = name;
        this.fluid = fluid;
        this.nodes = nodes.toArray(new Node[0]);
        this.elements = elements.toArray(new Element[0]);
        this.states = List.copyOf(states);
        this.initialState = initialState.clone();
        this.signals = List.copyOf(signals);
        this.accounts = List.copyOf(accounts);
        this.inputs = List.copyOf(inputs);
        this.discontinuities = List.copyOf(discontinuities);
        this.compressionAccount = compressionAccount;
        this.tankAccounts = tankAccounts.clone();
        this.work = new Evaluation(this.nodes.length);
        this.impulses = new double[this.accounts.size()];
        this.viewWork = new Evaluation(this.nodes.length);
        this.couplings = List.copyOf(couplings);
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
     * @return for each element, the solver indices of the states it reads or writes (its own states and the
     *         pressures of its ports): states in one block may depend on each other, states in no common block
     *         do not (the structure of the Jacobian)
     */
    public List<int[]> couplings() {
        return couplings;
    }

    /** @return the number of states */
    public int dimension() {
        return states.size();
    }

    /** @return the states in solver order */
    public List<StateSlot> states() {
        return states;
    }

    /** @return a copy of the initial state vector */
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

    /** @return the scheduled inputs */
    public List<ScheduledInput> inputs() {
        return inputs;
    }

    /**
     * @return the discontinuities the solver must watch: the elements' own, and one per corner of every
     *         scheduled input as the schedule stands now
     */
    public List<Discontinuity> discontinuities() {
        List<Discontinuity> all = new ArrayList<>(discontinuities);
        for (ScheduledInput in : inputs) {
            for (double corner : in.corners()) {
                all.add(new ScheduleCorner(in.name(), corner));
            }
        }
        return Collections.unmodifiableList(all);
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

    /**
     * Computes dy/dt.
     *
     * @param t time, s
     * @param y state, SI
     * @param yDot output: derivative, SI per second
     */
    public void derivatives(double t, double[] y, double[] yDot) {
        evaluate(t, y, yDot, null, null);
    }

    /** @return the values of all signals at (t, y), SI, in {@link #signals()} order */
    public double[] sampleSignals(double t, double[] y) {
        double[] out = new double[signals.size()];
        evaluate(t, y, new double[y.length], out, null);
        return out;
    }

    /** @return the power flowing into each energy account at (t, y), W, in {@link #accounts()} order */
    public double[] samplePowers(double t, double[] y) {
        double[] out = new double[accounts.size()];
        evaluate(t, y, new double[y.length], null, out);
        return out;
    }

    private void evaluate(double t, double[] y, double[] yDot, double[] signalOut, double[] powerOut) {
        Evaluation e = work;
        e.reset(t, y, yDot, signalOut, powerOut, nodes);
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

    /** @return a read-only view of (t, y) for switching functions; valid until the next call on this circuit */
    public StateView view(double t, double[] y) {
        viewWork.reset(t, y, null, null, null, nodes);
        return viewWork;
    }

    /** @return an editable view of (t, y); edits write into {@code y} */
    public StateEditor editor(double t, double[] y) {
        Evaluation e = new Evaluation(nodes.length);
        e.reset(t, y, null, null, null, nodes);
        e.impulses(impulses);
        return e;
    }

    /** @return energy booked instantly at events so far, J, per account in {@link #accounts()} order */
    public double[] impulses() {
        return impulses.clone();
    }

    /** Clears the impulse energies booked at events (start of a run). */
    public void clearImpulses() {
        java.util.Arrays.fill(impulses, 0.0);
    }

    /** Sets the initial modes of members that start against seats or stops. */
    public void initialiseModes(double t, double[] y) {
        StateView v = view(t, y);
        for (Element element : elements) {
            element.initialiseModes(v);
        }
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
}
