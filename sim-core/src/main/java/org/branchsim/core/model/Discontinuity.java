package org.branchsim.core.model;

/**
 * A place where the circuit's equations change abruptly: a member reaching a seat or a stop, a contact
 * starting, a corner of a schedule or of a flow-area curve. It is located by the sign change of a
 * continuous switching function {@link #g(StateView)}; the solver turns it into an event.
 */
public interface Discontinuity {

    /** What the solver must do after a crossing. */
    enum Response {
        /** Nothing changes; continue. */
        CONTINUE,
        /** The equations changed (a mode or a corner): recompute derivatives from the event state. */
        RECOMPUTE,
        /** The state was edited (e.g. velocity set to zero): restart from the edited state. */
        STATE_CHANGED
    }

    /** @return what this discontinuity is, for reports, e.g. {@code relief.poppet reaches seat} */
    String description();

    /** @return a short category used to count events: "seat", "stop", "contact", "corner", "schedule" */
    String kind();

    /** @return the element or node id it belongs to */
    String owner();

    /**
     * @return the switching function; a sign change marks the event. It must not stay at exactly zero over
     *         an interval (Hipparchus then cannot tell its sign): offset thresholds by a negligible amount.
     */
    double g(StateView state);

    /**
     * Called at the located crossing.
     *
     * @param increasing true when g went from negative to positive
     * @param state the state at the crossing, editable
     * @return what the solver must do next
     */
    Response onCrossing(boolean increasing, StateEditor state);
}
