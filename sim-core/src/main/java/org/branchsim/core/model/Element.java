package org.branchsim.core.model;

import java.util.List;

/**
 * A physical device of the circuit (pump, valve, actuator...). An element declares its states, signals,
 * scheduled inputs, energy accounts, moving members and discontinuities when bound, and on each evaluation
 * adds its flows to the nodes it connects and sets the derivatives of its own states. It never sees the state
 * array.
 */
public interface Element {

    /** @return the element's unique name in the circuit */
    String id();

    /** @return the nodes this element's ports connect to */
    List<Node> ports();

    /**
     * Declares states, signals, inputs, accounts, members and discontinuities. Called once, when the model is
     * built; afterwards the element holds no state of any run, so one element serves many runs at once.
     */
    void bind(Binder binder);

    /**
     * Adds this element's flows and volumes to its nodes, sets its state derivatives and, when the
     * evaluation records, its signals and powers.
     */
    void evaluate(Evaluation evaluation);
}
