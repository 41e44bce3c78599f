package org.branchsim.core.model;

/**
 * Read access to one run's state at one instant: time, states, node pressures, scheduled inputs and the modes
 * of moving members.
 */
public interface StateView {

    /** @return simulated time, s */
    double time();

    /** @return the value of a state, SI */
    double value(StateSlot slot);

    /** @return the pressure of a node, Pa gauge */
    double pressure(Node node);

    /** @return the mode of a moving member */
    Member.Mode mode(ModeSlot slot);

    /** @return the value of a scheduled input at the current time, SI */
    default double input(ScheduledInput input) {
        return input.valueAt(time());
    }
}
