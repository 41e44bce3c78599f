package org.branchsim.core.estimate;

/**
 * One requirement of a specification: a metric held below (max) or above (min) a limit, with a weight.
 * Its normalised violation is g = (value - limit) / scale for a maximum, (limit - value) / scale for a minimum,
 * scale = |limit| (1 when the limit is 0): g <= 0 means met, and -g scale is the margin in the metric's unit.
 *
 * @param metric the metric
 * @param maximum true for "at most", false for "at least"
 * @param limit the limit, SI (or % for percentages)
 * @param weight importance, positive (a violation counts weight times)
 * @param written the limit as the file writes it, for reports
 */
public record Spec(SpecMetric metric, boolean maximum, double limit, double weight, String written) {

    /** @return the normalised violation of a value (positive: violated) */
    public double violation(double value) {
        double scale = limit == 0 ? 1.0 : Math.abs(limit);
        double g = maximum ? (value - limit) / scale : (limit - value) / scale;
        return Double.isNaN(g) ? Double.POSITIVE_INFINITY : g;
    }

    /** @return the margin of a value in the metric's unit (SI or %): positive when met */
    public double margin(double value) {
        return maximum ? limit - value : value - limit;
    }

    /** @return e.g. "overshoot <= 15 %" */
    public String describe() {
        return metric.key() + (maximum ? " <= " : " >= ") + written;
    }
}
