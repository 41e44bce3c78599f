package org.branchsim.core.estimate;

import org.branchsim.core.study.ValueText;

/**
 * A parameter left free for a fit or a design search: its path in the scenario and its bounds, written in one
 * unit (the scenario's own unit for the value). Searches work on u in [0, 1]: value = low + u (high - low).
 *
 * @param path the parameter path, e.g. {@code elements.reducer.dampingOrifice.diameter}
 * @param low lower bound, in {@code unit}
 * @param high upper bound, in {@code unit} (above low)
 * @param unit the unit symbol of the bounds and values, empty for a dimensionless value
 * @param siFactor SI value of one {@code unit} (1 when dimensionless)
 */
public record FreeParameter(String path, double low, double high, String unit, double siFactor) {

    /** Checks the bounds. */
    public FreeParameter {
        if (!(high > low) || !Double.isFinite(low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException("bounds of " + path + " must be finite with low < high: " + low
                    + " .. " + high);
        }
    }

    /** @return the value at u, in {@code unit} */
    public double value(double u) {
        return low + u * (high - low);
    }

    /** @return u of a value in {@code unit} */
    public double scaled(double value) {
        return (value - low) / (high - low);
    }

    /** @return the width of the bounds, in {@code unit} */
    public double range() {
        return high - low;
    }

    /** @return the value at u as a scenario writes it, e.g. "0.62 mm" (a bare number when dimensionless) */
    public Object text(double u) {
        return unit.isEmpty() ? (Object) value(u) : ValueText.format(value(u)) + " " + unit;
    }
}
