package org.branchsim.core.units;

/**
 * A unit of measure: {@code si = value * factor + offset}. Only temperatures have a non-zero offset.
 *
 * @param symbol the canonical symbol as written in scenarios and output headers, e.g. "bar"
 * @param dimension the dimension measured
 * @param factor multiplier to SI
 * @param offset additive term to SI (K for temperatures)
 */
public record Unit(String symbol, Dimension dimension, double factor, double offset) {

    /** @return the SI value of {@code value} expressed in this unit */
    public double toSi(double value) {
        return value * factor + offset;
    }

    /** @return the value in this unit of the SI value {@code si} */
    public double fromSi(double si) {
        return (si - offset) / factor;
    }
}
