package org.branchsim.core.parts;

import org.branchsim.core.model.StateView;

/** The net force on a moving member along its axis, N, positive towards its upper stop. */
@FunctionalInterface
public interface NetForce {
    /** @return the net force at the given state, N */
    double at(StateView state);
}
