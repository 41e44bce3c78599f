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
     * evaluation records, its signals and powers. Time enters only through the scheduled inputs the element
     * declared when bound and the pressures of tanks at its ports: the model's time derivative df/dt differences
     * only the elements reading an input that ramps (CircuitModel#jacobian).
     */
    void evaluate(Evaluation evaluation);

    /**
     * Whether this element adds the partial derivatives of everything it adds (flows, inflows, volumes, its
     * states' derivatives) with respect to every state and node pressure they depend on, when the evaluation
     * collects them ({@link Evaluation#partials()}), through the evaluation's partial adders. Partials with
     * respect to time are not asked for. An element that does not (the default) has its block of the Jacobian
     * estimated by central differences of its own contributions, perturbing only its own states and its ports'
     * pressures and evaluating only itself.
     *
     * @return true when {@link #evaluate} adds every partial derivative in closed form
     */
    default boolean suppliesPartials() {
        return false;
    }
}
