package org.branchsim.core.model;

import java.util.Arrays;

/**
 * One evaluation of the circuit's equations at a time and state of one run: elements read pressures, states and
 * member modes from it and add flows, volumes, derivatives, signals and powers to it. Signals and powers are
 * only stored when the evaluation records (output sampling, energy quadrature), so the solver's many
 * evaluations stay cheap. It is a work buffer of one run: its member modes and impulse ledger are the run's
 * arrays, handed in by the run's engine ({@link CircuitModel#workspace}).
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

    Evaluation(Node[] nodes, Member.Mode[] modes, double[] impulses) {
        this.nodes = nodes;
        this.modes = modes;
        this.impulses = impulses;
        nodeInflow = new double[nodes.length];
        nodeExtraVolume = new double[nodes.length];
        nodePressure = new double[nodes.length];
    }

    void reset(double time, double[] state, double[] derivative, double[] signalOut, double[] powerOut) {
        this.t = time;
        this.y = state;
        this.yDot = derivative;
        this.signals = signalOut;
        this.powers = powerOut;
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
}
