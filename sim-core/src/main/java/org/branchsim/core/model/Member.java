package org.branchsim.core.model;

/**
 * A rigid moving member of an element (spool, poppet, piston) travelling along one axis between a lower and an
 * upper stop (positions in m, forces in N, positive towards the upper stop). A member is free or held at one of
 * its stops; which one is a discrete state of each run ({@link Mode}, read through {@link StateView#mode} and
 * changed only by the member's own stop events during a run), never a field of the member, so one model serves
 * many runs at once. The solver layer reads this contract to hold members for operating points and modes.
 */
public interface Member {

    /** Where a member is: free, or held at its lower or upper stop. */
    enum Mode { FREE, AT_LOWER_STOP, AT_UPPER_STOP }

    /**
     * Net force, N, that must pull a held member off its stop. A force balanced to exactly zero (a piston
     * with no pressure and no load) keeps it held, and the switching function is never identically zero.
     */
    double RELEASE_FORCE = 1e-3;

    /**
     * Penetration, as a fraction of the travel, a free member may show before reaching a stop counts as an
     * impact. It keeps round-off and the implicit method's tiny excursions right after a release (a member
     * leaving its stop with almost no force) from being taken for impacts; the reset puts it back on the stop.
     */
    double STOP_TOLERANCE = 1e-6;

    /** @return the member's id, {@code <element>.<member>}, e.g. {@code reducer.spool} (the prefix of its states) */
    String id();

    /** @return the handle of the member's mode in a run's discrete state */
    ModeSlot modeSlot();

    /** @return the position state, m */
    StateSlot positionSlot();

    /** @return the velocity state, m/s */
    StateSlot velocitySlot();

    /** @return the lower stop position, m */
    double lower();

    /** @return the upper stop position, m */
    double upper();

    /** @return the position of the stop a mode holds the member at, m (NaN for {@link Mode#FREE}) */
    default double stopPosition(Mode held) {
        return switch (held) {
            case AT_LOWER_STOP -> lower();
            case AT_UPPER_STOP -> upper();
            case FREE -> Double.NaN;
        };
    }

    /** @return the net force on the member at {@code s}, N, positive towards the upper stop */
    double netForce(StateView s);

    /**
     * The release rule of the stop events: a member held at its lower stop leaves it when the net force
     * exceeds {@link #RELEASE_FORCE}, one at its upper stop when the net force is below minus that.
     *
     * @param s state, whose modes say whether the member is held
     * @return true when the member is held and the net force at {@code s} pulls it off its stop
     */
    default boolean pulledOffStop(StateView s) {
        Mode mode = s.mode(modeSlot());
        double f = netForce(s);
        return mode == Mode.AT_LOWER_STOP && f > RELEASE_FORCE || mode == Mode.AT_UPPER_STOP && -f > RELEASE_FORCE;
    }

    /**
     * The period of the member's free oscillation on its restoring stiffness, 2 pi sqrt(m/k), which sets how
     * often the solver checks its stop events inside a step.
     *
     * @param s the state at which the stiffness k = -dF/dx is taken
     * @return the natural period, s, or NaN when the member has no restoring stiffness there (the default)
     */
    default double naturalPeriod(StateView s) {
        return Double.NaN;
    }

    /** @return the mode at the start of a run: held at a stop when it starts there and the net force presses it on */
    default Mode initialMode(StateView s) {
        double pos = s.value(positionSlot());
        double f = netForce(s);
        if (pos <= lower() && f <= RELEASE_FORCE) {
            return Mode.AT_LOWER_STOP;
        } else if (pos >= upper() && f >= -RELEASE_FORCE) {
            return Mode.AT_UPPER_STOP;
        }
        return Mode.FREE;
    }
}
