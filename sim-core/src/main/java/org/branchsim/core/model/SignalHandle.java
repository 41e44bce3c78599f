package org.branchsim.core.model;

import org.branchsim.core.units.Dimension;

/**
 * A named output quantity of an element or node, {@code <id>.<quantity>}, with its dimension (SI inside).
 */
public final class SignalHandle {
    private final int index;
    private final String name;
    private final Dimension dimension;

    SignalHandle(int index, String name, Dimension dimension) {
        this.index = index;
        this.name = name;
        this.dimension = dimension;
    }

    int index() {
        return index;
    }

    /** @return the signal's name */
    public String name() {
        return name;
    }

    /** @return the signal's dimension */
    public Dimension dimension() {
        return dimension;
    }

    @Override
    public String toString() {
        return name;
    }
}
