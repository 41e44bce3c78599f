package org.branchsim.core.model;

import java.util.Arrays;

/**
 * One evaluation of the circuit's equations at a time and state of one run: elements read pressures, states and
 * member modes from it and add flows, volumes, derivatives, signals and powers to it. Signals and powers are
 * only stored when the evaluation records (output sampling, energy quadrature), so the solver's many
 * evaluations stay cheap. It is a work buffer of one run: its member modes and impulse ledger are the run's
 * arrays, handed in by the run's engine ({@link CircuitModel#workspace}).
 *
 * <p>A Jacobian evaluation ({@link CircuitModel#jacobian}) also collects partial derivatives: an element that
 * {@link Element#suppliesPartials supplies them} adds, beside each flow, volume and derivative, its partials with
 * respect to the node pressures and states it depends on (the adders below named {@code ...Partial}, and the
 * {@link #flow(Node, Node, double, double, double)} form). Partials with respect to a tank's pressure are dropped
 * (a tank's pressure is imposed, not a state). Units: a flow's partial in m^3/s per SI unit of the variable, a
 * volume's in m^3 per unit, a derivative's in the state's SI unit per second per unit of the variable.
 */
public final class Evaluation implements StateEditor {

    private final Node[] nodes;
    private final Member.Mode[] modes;
    private final double[] impulses;
    private double t;
    private double[] y;
    private double[] yDot;
    private final double[] nodeInflow;
    private final double[] nodeExtraVolume;
    private final double[] nodePressure;
    private double[] signals;
    private double[] powers;
    /** df_i/dy_j of the elements' own states (rows) while collecting partials, else null. */
    private double[][] jac;
    /** The partial buffers while they are set aside for an element that supplies none. */
    private double[][] pausedJac;
    /** d(sum of inflows)/dy_j per node while collecting partials. */
    private double[][] inflowJac;
    /** d(extra volume)/dy_j per node while collecting partials. */
    private double[][] volumeJac;

    Evaluation(Node[] nodes, Member.Mode[] modes, double[] impulses) {
        this.nodes = nodes;
        this.modes = modes;
        this.impulses = impulses;
        nodeInflow = new double[nodes.length];
        nodeExtraVolume = new double[nodes.length];
        nodePressure = new double[nodes.length];
    }

    /**
     * Starts a Jacobian evaluation: as {@link #reset} without signals or powers, and collects partials into
     * {@code jacobian} (the elements' state rows) and the per-node buffers, all zeroed here.
     */
    void resetForPartials(double time, double[] state, double[] derivative, double[][] jacobian,
                          double[][] inflowPartials, double[][] volumePartials) {
        reset(time, state, derivative, null, null);
        this.jac = jacobian;
        this.inflowJac = inflowPartials;
        this.volumeJac = volumePartials;
        for (double[] row : jacobian) {
            Arrays.fill(row, 0.0);
        }
        for (double[] row : inflowPartials) {
            Arrays.fill(row, 0.0);
        }
        for (double[] row : volumePartials) {
            Arrays.fill(row, 0.0);
        }
    }

    void reset(double time, double[] state, double[] derivative, double[] signalOut, double[] powerOut) {
        this.t = time;
        this.y = state;
        this.yDot = derivative;
        this.signals = signalOut;
        this.powers = powerOut;
        this.jac = null;
        Arrays.fill(nodeInflow, 0.0);
        Arrays.fill(nodeExtraVolume, 0.0);
        for (Node n : nodes) {
            nodePressure[n.index()] = n.isTank() ? n.tankPressure().valueAt(time) : state[n.pressureSlot().index()];
        }
        if (derivative != null) {
            Arrays.fill(derivative, 0.0);
        }
        if (powerOut != null) {
            Arrays.fill(powerOut, 0.0);
        }
    }

    @Override
    public void impulse(EnergyAccount account, double joules) {
        impulses[account.index()] += joules;
    }

    @Override
    public Member.Mode mode(ModeSlot slot) {
        return modes[slot.index()];
    }

    @Override
    public void setMode(ModeSlot slot, Member.Mode mode) {
        modes[slot.index()] = mode;
    }

    @Override
    public double time() {
        return t;
    }

    @Override
    public double value(StateSlot slot) {
        return y[slot.index()];
    }

    @Override
    public double pressure(Node node) {
        return nodePressure[node.index()];
    }

    @Override
    public void set(StateSlot slot, double value) {
        y[slot.index()] = value;
    }

    /** Adds a flow from node {@code from} to node {@code to}, m^3/s (negative flows go the other way). */
    public void flow(Node from, Node to, double q) {
        nodeInflow[from.index()] -= q;
        nodeInflow[to.index()] += q;
    }

    /** Adds a flow into a node, m^3/s (a moving boundary's displacement flow, a pump's delivery). */
    public void inflow(Node node, double q) {
        nodeInflow[node.index()] += q;
    }

    /** Adds a volume a moving boundary contributes to a node, m^3. */
    public void volume(Node node, double v) {
        nodeExtraVolume[node.index()] += v;
    }

    /** Sets the time derivative of one of the element's states, SI per second. */
    public void derivative(StateSlot slot, double value) {
        if (yDot != null) {
            yDot[slot.index()] = value;
        }
    }

    /**
     * Sets partial collection aside, so that an element that does not supply partials (and is differenced
     * instead) adds none by way of a shared part, until {@link #resumePartials}.
     */
    void pausePartials() {
        pausedJac = jac;
        jac = null;
    }

    /** Resumes partial collection after {@link #pausePartials}. */
    void resumePartials() {
        jac = pausedJac;
        pausedJac = null;
    }

    /**
     * @return true while a Jacobian evaluation collects partial derivatives; an element that supplies partials
     *         computes them only then
     */
    public boolean partials() {
        return jac != null;
    }

    /**
     * Adds a flow from node {@code from} to node {@code to} with its partials with respect to the two pressures.
     *
     * @param q flow, m^3/s (negative flows go the other way)
     * @param dqdpFrom dq/dp_from, m^3/(s Pa)
     * @param dqdpTo dq/dp_to, m^3/(s Pa)
     */
    public void flow(Node from, Node to, double q, double dqdpFrom, double dqdpTo) {
        flow(from, to, q);
        if (jac != null) {
            addInflow(from, from.pressureSlot(), -dqdpFrom);
            addInflow(to, from.pressureSlot(), dqdpFrom);
            addInflow(from, to.pressureSlot(), -dqdpTo);
            addInflow(to, to.pressureSlot(), dqdpTo);
        }
    }

    /** Adds dq/d(state) of a flow from node {@code from} to node {@code to}, m^3/s per SI unit of the state. */
    public void flowPartial(Node from, Node to, StateSlot wrt, double dq) {
        if (jac != null) {
            addInflow(from, wrt, -dq);
            addInflow(to, wrt, dq);
        }
    }

    /** Adds d(inflow into a node)/d(state), m^3/s per SI unit of the state. */
    public void inflowPartial(Node node, StateSlot wrt, double dq) {
        if (jac != null) {
            addInflow(node, wrt, dq);
        }
    }

    /** Adds d(inflow into a node)/d(pressure of node {@code wrt}), m^3/(s Pa). */
    public void inflowPartial(Node node, Node wrt, double dq) {
        if (jac != null) {
            addInflow(node, wrt.pressureSlot(), dq);
        }
    }

    /** Adds d(volume a moving boundary contributes to a node)/d(state), m^3 per SI unit of the state. */
    public void volumePartial(Node node, StateSlot wrt, double dv) {
        if (jac != null && !node.isTank() && wrt != null) {
            volumeJac[node.index()][wrt.index()] += dv;
        }
    }

    /** Adds d(derivative of state {@code row})/d(state {@code wrt}), per second. */
    public void derivativePartial(StateSlot row, StateSlot wrt, double d) {
        if (jac != null && wrt != null) {
            jac[row.index()][wrt.index()] += d;
        }
    }

    /** Adds d(derivative of state {@code row})/d(pressure of node {@code wrt}), SI per second per Pa. */
    public void derivativePartial(StateSlot row, Node wrt, double d) {
        derivativePartial(row, wrt.pressureSlot(), d);
    }

    private void addInflow(Node node, StateSlot wrt, double dq) {
        if (wrt != null && !node.isTank()) {
            inflowJac[node.index()][wrt.index()] += dq;
        }
    }

    /** @return true when signals and powers are being stored; elements may skip work for them otherwise */
    public boolean recording() {
        return signals != null || powers != null;
    }

    /** Stores a signal value, SI (ignored unless recording). */
    public void signal(SignalHandle handle, double value) {
        if (signals != null) {
            signals[handle.index()] = value;
        }
    }

    /** Adds power to an energy account, W (ignored unless recording). */
    public void power(EnergyAccount account, double watts) {
        if (powers != null) {
            powers[account.index()] += watts;
        }
    }

    double inflowOf(Node node) {
        return nodeInflow[node.index()];
    }

    double extraVolumeOf(Node node) {
        return nodeExtraVolume[node.index()];
    }

    double inflowOf(int node) {
        return nodeInflow[node];
    }

    double extraVolumeOf(int node) {
        return nodeExtraVolume[node];
    }
}
