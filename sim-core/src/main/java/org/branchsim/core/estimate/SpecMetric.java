package org.branchsim.core.estimate;

import java.util.Locale;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.units.Dimension;

/**
 * The metrics of a reducing valve that a specification may limit, each read from the valve's
 * {@link ReducingValveMetrics} over the scenario's metrics window. Percentages are of the setting.
 */
public enum SpecMetric {
    /** Peak minus steady outlet pressure, % of the setting. */
    OVERSHOOT("overshoot", null),
    /** |steady outlet pressure - setting|, % of the setting. */
    DEVIATION("deviation", null),
    /** Settling time into +-2 % of the setting after the landing, s (unsettled: infinite). */
    SETTLING_TIME("settlingTime", Dimension.TIME),
    /** Peak outlet pressure, Pa. */
    PEAK("peak", Dimension.PRESSURE),
    /** Steady pilot drain flow, m^3/s. */
    DRAIN_FLOW("drainFlow", Dimension.VOLUME_FLOW),
    /**
     * Smallest damping ratio of the linearised circuit's modes in which the valve's parts take part (dimensionless),
     * at the operating point at the end of the metrics window ({@link org.branchsim.core.study.ValveDamping}).
     */
    DAMPING_RATIO("dampingRatio", null);

    private final String key;
    private final Dimension dimension;

    SpecMetric(String key, Dimension dimension) {
        this.key = key;
        this.dimension = dimension;
    }

    /** @return the name a specification file uses */
    public String key() {
        return key;
    }

    /** @return the dimension of its limit, or null for a percentage of the setting or a plain number */
    public Dimension dimension() {
        return dimension;
    }

    /** @return true when the limit is a plain number (a damping ratio), not a percentage or a quantity */
    public boolean plainNumber() {
        return this == DAMPING_RATIO;
    }

    /** @return true when the metric needs the modes at the operating point, not only the run's metrics */
    public boolean needsModes() {
        return this == DAMPING_RATIO;
    }

    /**
     * @param m the valve's metrics over the run
     * @param dampingRatio the valve's damping ratio ({@link #DAMPING_RATIO}; NaN when there is no operating point)
     * @return the metric's value for a valve: SI, % for percentages, a plain number for a damping ratio; +infinity
     *         when undefined (a damping ratio that is undefined stays NaN, which violates any limit)
     */
    public double of(ReducingValveMetrics m, double dampingRatio) {
        if (this == DAMPING_RATIO) {
            return dampingRatio;
        }
        double v = switch (this) {
            case OVERSHOOT -> m.overshootPercent();
            case DEVIATION -> Math.abs(m.deviationPercent());
            case SETTLING_TIME -> m.settled() ? m.settlingTime() : Double.POSITIVE_INFINITY;
            case PEAK -> m.peak();
            case DRAIN_FLOW -> m.drainFlow();
            case DAMPING_RATIO -> dampingRatio;
        };
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    /** @return the metric with that name (any case), or null */
    public static SpecMetric find(String name) {
        for (SpecMetric s : values()) {
            if (s.key.toLowerCase(Locale.ROOT).equals(name.toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        return null;
    }
}
