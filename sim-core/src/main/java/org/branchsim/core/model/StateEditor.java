package org.branchsim.core.model;

/**
 * Write access to the state at an event, used by discontinuities that reset a state (a spool stopping at its
 * seat sets its velocity to zero).
 */
public interface StateEditor extends StateView {

    /** Sets a state value, SI. */
    void set(StateSlot slot, double value);

    /** Books energy lost instantly at the event (a mass stopped at a seat), J. */
    void impulse(EnergyAccount account, double joules);
}
