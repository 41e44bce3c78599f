package org.branchsim.core.study;

import java.util.List;
import org.branchsim.core.analysis.ReducingValveMetrics;

/**
 * What a change costs the job the reducing valves do, as one number for ranking cures: each valve's overshoot,
 * settling time, steady deviation from its setting and pilot drain flow, each divided by a value a clamping
 * specification commonly allows (common practice, no source): overshoot 15 % of the setting, settling 80 ms,
 * deviation 2 % of the setting, drain 0.5 L/min; a valve that does not settle adds {@link #NOT_SETTLED}. The cost
 * of the change itself (how far a part moves from its present size, in log) is added at {@link #CHANGE_WEIGHT}
 * per e-fold, so that of two equal cures the smaller change ranks first. Smaller is better; the unit is "one
 * allowance".
 */
public final class JobCost {

    /** Overshoot allowance, percent of the setting. */
    public static final double OVERSHOOT_PERCENT = 15.0;
    /** Settling-time allowance, s. */
    public static final double SETTLING = 0.08;
    /** Steady-deviation allowance, percent of the setting. */
    public static final double DEVIATION_PERCENT = 2.0;
    /** Pilot drain flow allowance, m^3/s (0.5 L/min). */
    public static final double DRAIN = 0.5e-3 / 60.0;
    /** Added for a valve that does not settle into its band. */
    public static final double NOT_SETTLED = 10.0;
    /** Weight of the size of the change per e-fold of the parameter. */
    public static final double CHANGE_WEIGHT = 0.1;

    private JobCost() {
    }

    /**
     * @param valves metrics of every reducing valve after the change
     * @param changeFactor new value over old value of the changed parameter (NaN when it was zero)
     * @return the cost, in allowances
     */
    public static double of(List<ReducingValveMetrics> valves, double changeFactor) {
        double cost = Double.isFinite(changeFactor) && changeFactor > 0 ? CHANGE_WEIGHT * Math.abs(Math.log(changeFactor))
                : CHANGE_WEIGHT;
        for (ReducingValveMetrics m : valves) {
            cost += Math.max(0.0, m.overshootPercent()) / OVERSHOOT_PERCENT;
            cost += Math.abs(m.deviationPercent()) / DEVIATION_PERCENT;
            cost += Math.max(0.0, m.drainFlow()) / DRAIN;
            cost += m.settled() && Double.isFinite(m.settlingTime()) ? m.settlingTime() / SETTLING
                    : m.settled() ? 0.0 : NOT_SETTLED;
        }
        return cost;
    }
}
