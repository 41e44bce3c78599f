package org.branchsim.core.parts;

import java.util.function.ToDoubleFunction;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.StateEditor;
import org.branchsim.core.model.StateView;

/**
 * A corner in an element's law (a flow-area curve changing slope, a contact starting, a check valve
 * cracking): g changes sign there. The solver stops at the corner and restarts with fresh derivatives.
 */
public final class Corner implements Discontinuity {
    private final String owner;
    private final String description;
    private final String kind;
    private final ToDoubleFunction<StateView> g;

    /**
     * @param owner element id
     * @param description what happens at the corner
     * @param kind event category, e.g. "corner" or "contact"
     * @param g switching function, zero at the corner
     */
    public Corner(String owner, String description, String kind, ToDoubleFunction<StateView> g) {
        this.owner = owner;
        this.description = description;
        this.kind = kind;
        this.g = g;
    }

    @Override
    public String description() {
        return owner + ": " + description;
    }

    @Override
    public String kind() {
        return kind;
    }

    @Override
    public String owner() {
        return owner;
    }

    @Override
    public double g(StateView state) {
        return g.applyAsDouble(state);
    }

    @Override
    public Response onCrossing(boolean increasing, StateEditor state) {
        return Response.RECOMPUTE;
    }
}
