package org.branchsim.core.parts;

/**
 * The forces on a moving member, each signed along its axis (N, positive towards the upper stop), kept apart
 * so the energy balance can book each one: hydraulic (pressure on areas), spring, viscous damping, steady
 * flow force, and external (load, friction, contact) forces that the element books itself.
 *
 * @param hydraulic pressure forces, N
 * @param spring spring force (preload and rate), N
 * @param damping viscous damping force, N
 * @param flow steady flow force, N
 * @param external everything else (load, friction, contact), N
 */
public record Forces(double hydraulic, double spring, double damping, double flow, double external) {

    /** @return the sum of all forces, N */
    public double net() {
        return hydraulic + spring + damping + flow + external;
    }
}
