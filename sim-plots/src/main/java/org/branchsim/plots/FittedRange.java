package org.branchsim.plots;

import java.util.List;
import java.util.function.IntFunction;

/**
 * A value axis range fitted to signals after start-up, robust against short spikes: the central
 * {@link #LOW_QUANTILE}..{@link #HIGH_QUANTILE} range of all samples from the fit start on, stretched to the true
 * extreme when that lies within {@link #SPIKE_ALLOWANCE} times that range of it (a real peak stays on the axis),
 * plus a margin of {@link #MARGIN} of the span on each side. Samples outside (start-up transients, short spikes)
 * are clipped; the one farthest outside is kept with its time so that the figure can say so. Values in whatever
 * unit they are given in.
 *
 * @param low lower axis bound
 * @param high upper axis bound
 * @param clippedValue the sample farthest outside the range (NaN when none is outside)
 * @param clippedTime its time, s (NaN when none)
 */
public record FittedRange(double low, double high, double clippedValue, double clippedTime) {

    /** Lower quantile of the central range. */
    public static final double LOW_QUANTILE = 0.005;
    /** Upper quantile of the central range. */
    public static final double HIGH_QUANTILE = 0.995;
    /** A true extreme this many central spans beyond the central range or less stays on the axis. */
    public static final double SPIKE_ALLOWANCE = 1.0;
    /** Share of the span added above and below. */
    public static final double MARGIN = 0.05;

    /** @return true when some sample lies outside the range */
    public boolean clips() {
        return !Double.isNaN(clippedValue);
    }

    /**
     * @param times sample times, s
     * @param signals sample values of each signal, one per time
     * @param fitFrom end of start-up, s (all samples are used when no sample is at or after it)
     * @return the fitted range
     */
    public static FittedRange of(double[] times, List<double[]> signals, double fitFrom) {
        return of(times, signals.size(), signals::get, fitFrom);
    }

    /**
     * The same range, reading the signals one at a time (a long run's columns are read again for each pass
     * rather than held together): the quantiles come from {@link PooledRank}, exactly as from sorting the
     * pooled samples.
     *
     * @param times sample times, s
     * @param count number of signals
     * @param signal sample values of signal j, one per time (may be read several times)
     * @param fitFrom end of start-up, s (all samples are used when no sample is at or after it)
     * @return the fitted range
     */
    public static FittedRange of(double[] times, int count, IntFunction<double[]> signal, double fitFrom) {
        if (count == 0 || times.length == 0) {
            throw new IllegalArgumentException("no samples to fit");
        }
        double start = fitFrom <= times[times.length - 1] ? fitFrom : times[0];
        int first = 0;
        while (times[first] < start) {
            first++;
        }
        long n = (long) (times.length - first) * count;
        PooledRank pooled = new PooledRank(signal, count, first);
        double lo = pooled.at((long) Math.floor(LOW_QUANTILE * (n - 1)));
        double hi = pooled.at((long) Math.ceil(HIGH_QUANTILE * (n - 1)));
        double central = hi - lo;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < count; j++) {
            double[] v = signal.apply(j);
            for (int k = first; k < v.length; k++) {
                min = Math.min(min, v[k]);
                max = Math.max(max, v[k]);
            }
        }
        if (min >= lo - SPIKE_ALLOWANCE * central) {
            lo = min;
        }
        if (max <= hi + SPIKE_ALLOWANCE * central) {
            hi = max;
        }
        double span = Math.max(hi - lo, 1e-9 * Math.max(1.0, Math.abs(hi)));
        double low = lo - MARGIN * span;
        double high = hi + MARGIN * span;
        double worst = Double.NaN;
        double worstAt = Double.NaN;
        double worstBy = 0.0;
        for (int j = 0; j < count; j++) {
            double[] v = signal.apply(j);
            for (int k = 0; k < v.length; k++) {
                double by = Math.max(v[k] - high, low - v[k]);
                if (by > worstBy) {
                    worstBy = by;
                    worst = v[k];
                    worstAt = times[k];
                }
            }
        }
        return new FittedRange(low, high, worst, worstAt);
    }
}
