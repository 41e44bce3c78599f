package org.branchsim.core.model;

/**
 * A hydraulic node: a lumped volume of fluid at one pressure (gauge, Pa), or a tank whose pressure is imposed
 * (fixed, or following a schedule as an ideal pressure source).
 * The volume's pressure obeys dp/dt = beta_e(p) / V * (sum of inflows - dV/dt) (Merritt 1967, ch. 2);
 * moving boundaries (cylinder chambers, spool ends) add their volume and their displacement flow.
 */
public final class Node {
    private final String id;
    private final double volume;
    private final double wallBulkModulus;
    private final double initialPressure;
    private final boolean tank;
    private final ScheduledInput tankPressure;
    private int index = -1;
    private StateSlot pressureSlot;
    private SignalHandle pressureSignal;

    private Node(String id, double volume, double wallBulkModulus, double initialPressure, boolean tank) {
        this.id = id;
        this.volume = volume;
        this.wallBulkModulus = wallBulkModulus;
        this.initialPressure = initialPressure;
        this.tank = tank;
        this.tankPressure = tank ? new ScheduledInput(id + ".pressure", org.branchsim.core.units.Dimension.PRESSURE,
                initialPressure) : null;
    }

    /**
     * @param id node name
     * @param volume fixed fluid volume, m^3 (moving boundaries add to it)
     * @param wallBulkModulus bulk modulus of the wall, Pa (Double.POSITIVE_INFINITY for rigid)
     * @param initialPressure pressure at t = 0, Pa gauge
     * @return a volume node
     */
    public static Node volume(String id, double volume, double wallBulkModulus, double initialPressure) {
        return new Node(id, volume, wallBulkModulus, initialPressure, false);
    }

    /**
     * @param id node name
     * @param pressure pressure, Pa gauge (0 for a vented tank); it may follow a schedule, which makes the
     *        tank an ideal pressure source
     * @return a tank node
     */
    public static Node tank(String id, double pressure) {
        return new Node(id, 0.0, Double.POSITIVE_INFINITY, pressure, true);
    }

    void bind(int nodeIndex, StateSlot slot, SignalHandle signal) {
        this.index = nodeIndex;
        this.pressureSlot = slot;
        this.pressureSignal = signal;
    }

    int index() {
        return index;
    }

    StateSlot pressureSlot() {
        return pressureSlot;
    }

    SignalHandle pressureSignal() {
        return pressureSignal;
    }

    /** @return the node's name */
    public String id() {
        return id;
    }

    /** @return fixed fluid volume, m^3 (0 for a tank) */
    public double volume() {
        return volume;
    }

    /** @return wall bulk modulus, Pa */
    public double wallBulkModulus() {
        return wallBulkModulus;
    }

    /** @return initial (or, for a tank, fixed) pressure, Pa gauge */
    public double initialPressure() {
        return initialPressure;
    }

    /** @return the tank's pressure schedule, Pa (null for a volume node) */
    public ScheduledInput tankPressure() {
        return tankPressure;
    }

    /** @return true for a tank (imposed pressure, no state) */
    public boolean isTank() {
        return tank;
    }

    @Override
    public String toString() {
        return id;
    }
}
