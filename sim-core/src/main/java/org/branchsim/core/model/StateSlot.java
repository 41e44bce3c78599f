package org.branchsim.core.model;

import org.branchsim.core.units.Dimension;

/**
 * An opaque handle to one state variable of the circuit (a node pressure, a spool position, ...).
 * Elements read and write their states only through these handles, never through array positions.
 */
public final class StateSlot {
    private final int index;
    private final String name;
    private final Dimension dimension;
    private final double absoluteScale;

    StateSlot(int index, String name, Dimension dimension, double absoluteScale) {
        this.index = index;
        this.name = name;
        this.dimension = dimension;
        this.absoluteScale = absoluteScale;
    }

    int index() {
        return index;
    }

    /** @return the state's name, e.g. {@code clampLine.p} */
    public String name() {
        return name;
    }

    /** @return the state's dimension */
    public Dimension dimension() {
        return dimension;
    }

    /** @return typical magnitude of this state, SI; the absolute tolerance is the relative tolerance times this */
    public double absoluteScale() {
        return absoluteScale;
    }

    @Override
    public String toString() {
        return name;
    }
}
