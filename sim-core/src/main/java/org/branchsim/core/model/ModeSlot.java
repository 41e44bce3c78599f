package org.branchsim.core.model;

/**
 * An opaque handle to one discrete state of a run: the {@link Member.Mode} of one moving member. Members read and
 * change their mode only through these handles ({@link StateView#mode}, {@link StateEditor#setMode}); the values
 * live in the run, not in the model.
 */
public final class ModeSlot {
    private final int index;
    private final String name;

    ModeSlot(int index, String name) {
        this.index = index;
        this.name = name;
    }

    int index() {
        return index;
    }

    /** @return the member's id, e.g. {@code reducer.spool} */
    public String name() {
        return name;
    }

    @Override
    public String toString() {
        return name;
    }
}
