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
    DRAIN_FLOW("drainFlow", Dimension.VOLUME_FLOW);

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

    /** @return the dimension of its limit, or null for a percentage of the setting */
    public Dimension dimension() {
        return dimension;
    }

    /** @return the metric's value for a valve: SI, or % for percentages; +infinity when undefined */
    public double of(ReducingValveMetrics m) {
        double v = switch (this) {
            case OVERSHOOT -> m.overshootPercent();
            case DEVIATION -> Math.abs(m.deviationPercent());
            case SETTLING_TIME -> m.settled() ? m.settlingTime() : Double.POSITIVE_INFINITY;
            case PEAK -> m.peak();
            case DRAIN_FLOW -> m.drainFlow();
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
