package org.branchsim.core.model;

import org.branchsim.core.laws.KinematicRipple;

/**
 * An element that drives the circuit at a frequency of its own, tied to a shaft's speed: a pump's flow ripple
 * repeats a fixed number of times per shaft turn. An oscillation of the circuit at that frequency (or a small
 * multiple of it) is a forced response, not a self-sustained one.
 */
public interface PeriodicDrive {

    /** @return the element's id */
    String id();

    /** @return the kinematic flow ripple that drives, or null when the element delivers steadily */
    KinematicRipple ripple();

    /**
     * @return the state that carries the drive's phase (a shaft angle, rad), or null when there is none. Its rate
     *         is the shaft speed whatever the circuit does, so it never comes to rest: an operating point holds it
     *         at its value (the drive's factor frozen there) instead of solving for it, and a linearisation leaves
     *         it out of the modes
     */
    StateSlot drivePhase();

    /** @return periods of the drive per shaft turn; 0 when it drives nothing (e.g. a pump without ripple) */
    default int drivePeriodsPerTurn() {
        return ripple() == null ? 0 : ripple().periodsPerTurn();
    }

    /** @return the name of the signal that carries the shaft speed, rad/s */
    default String driveSpeedSignal() {
        return id() + ".speed";
    }

    /** @return what drives, in words, e.g. "flow ripple of pump (axial piston, 9 pistons: 18 periods a turn)" */
    default String driveDescription() {
        return ripple() == null ? "" : ripple().describe(id());
    }
}
