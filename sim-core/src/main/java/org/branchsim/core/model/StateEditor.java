package org.branchsim.core.model;

/**
 * Write access to one run's state at an event, used by discontinuities that reset a state (a spool stopping at
 * its seat sets its velocity to zero and becomes held).
 */
public interface StateEditor extends StateView {

    /** Sets a state value, SI. */
    void set(StateSlot slot, double value);

    /** Sets the mode of a moving member. */
    void setMode(ModeSlot slot, Member.Mode mode);

    /** Books energy lost instantly at the event (a mass stopped at a seat), J. */
    void impulse(EnergyAccount account, double joules);
}
