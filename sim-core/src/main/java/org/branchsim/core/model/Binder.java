package org.branchsim.core.model;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.units.Dimension;

/**
 * What an element may declare when it joins a circuit. Names are given relative to the element
 * ({@code "spool.x"}); the binder prefixes the element id.
 */
public interface Binder {

    /** @return the circuit's fluid */
    Fluid fluid();

    /**
     * Declares a state variable.
     *
     * @param name relative name, e.g. "spool.x"
     * @param dimension dimension
     * @param initial initial value, SI
     * @param absoluteScale typical magnitude, SI; absolute tolerance = relative tolerance * this
     * @return the handle
     */
    StateSlot state(String name, Dimension dimension, double initial, double absoluteScale);

    /** Declares an output signal with a relative name, e.g. "q". */
    SignalHandle signal(String name, Dimension dimension);

    /** Declares an energy account with a relative name, e.g. "loss". */
    EnergyAccount account(String name, EnergyAccount.Kind kind);

    /** Registers a scheduled input (its name is already absolute). */
    void input(ScheduledInput input);

    /**
     * Registers a moving member that seats or stops can hold.
     *
     * @param member the member (its position and velocity states already declared)
     * @return the handle of its mode in each run
     */
    ModeSlot member(Member member);

    /** Registers a discontinuity for the solver to watch. */
    void discontinuity(Discontinuity discontinuity);

    /**
     * Declares that these states may depend on each other (a block of the Jacobian's structure). An element
     * that declares no block is taken as one block of all its states and its ports' pressures; declaring
     * finer blocks lets the implicit solver estimate the Jacobian with fewer evaluations. Tank ports (null
     * slots) are ignored.
     */
    void couple(StateSlot... states);

    /** @return the pressure state of a port's node, or null for a tank */
    StateSlot pressureOf(Node node);
}
