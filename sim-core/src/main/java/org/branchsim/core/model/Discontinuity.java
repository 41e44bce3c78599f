package org.branchsim.core.model;

/**
 * A place where the circuit's equations change abruptly: a member reaching a seat or a stop, a contact
 * starting, a corner of a schedule or of a flow-area curve. It is located by the sign change of a
 * continuous switching function {@link #g(StateView)}; the solver turns it into an event.
 * <p>
 * <b>Sign-continuity rule.</b> While the discrete modes of the run (members free or held) do not change,
 * g must be a continuous function of the time and the states, so that the solver may sample it at any
 * instant inside a step (it is checked at intervals, not only at step ends) and interpolate between samples:
 * its sign change, and only that, defines the event. g may jump only where the mode it reads changes, i.e.
 * at an event, and then it must restart on the side that does not immediately trigger again (e.g. a member
 * held at its seat switches from g = x - x_seat to g = net force - release force, positive only once the
 * force pulls it off). A discontinuity whose time is known in advance says so by {@link #knownTime()}; the
 * implicit solver then lands on that time instead of searching for the sign change.
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
     * @return the time, s, at which this discontinuity happens when it is known before the run (a corner of a
     *         scheduled input), else NaN (the default). Such a discontinuity only changes the equations: its
     *         crossing answers {@link Response#RECOMPUTE} and edits no state, so a solver that lands on the
     *         time exactly may record it without calling {@link #onCrossing}.
     */
    default double knownTime() {
        return Double.NaN;
    }

    /**
     * Called at the located crossing.
     *
     * @param increasing true when g went from negative to positive
     * @param state the state at the crossing, editable
     * @return what the solver must do next
     */
    Response onCrossing(boolean increasing, StateEditor state);
}
