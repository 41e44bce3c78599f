package org.branchsim.core.model;

/**
 * One line of the run's energy balance: power flowing into it is integrated over the run (W in, J out).
 * Supply = losses + work + stored + residual.
 *
 * @param index position in the ledger (internal)
 * @param name what the line is, e.g. {@code relief.loss}
 * @param kind which side of the balance it is on
 */
public record EnergyAccount(int index, String name, Kind kind) {

    /** Side of the energy balance. */
    public enum Kind {
        /** Energy delivered to the fluid (pumps). */
        SUPPLY,
        /** Energy dissipated into heat (orifices, valves, leakage, friction, drains). */
        LOSS,
        /** Useful work done on external loads. */
        WORK,
        /** Energy stored (fluid compression, springs, moving masses); may be returned. */
        STORED,
        /** Work of the steady flow forces on valve members, which the lumped orifice loss does not include. */
        FLOW_FORCE
    }
}
