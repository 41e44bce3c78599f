package org.branchsim.core.measured;

import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;

/**
 * Finds the logger's time of the simulation's zero (the offset to subtract from measured times), either from a
 * trigger, the first time a channel crosses a level in the given direction in both records (crossings
 * interpolated linearly between samples), or from the cross-correlation of a measured channel with its
 * simulated signal: the lag that maximises the Pearson correlation coefficient over the overlap of the two
 * records, both sampled on the simulation's grid, refined between grid points by a parabola through the best
 * lag and its neighbours (the usual sub-sample refinement of a correlation peak; common practice, no source).
 */
public final class Alignment {

    /** Least share of the shorter record that a lag's overlap must cover to be considered. */
    public static final double LEAST_OVERLAP = 0.5;

    private Alignment() {
    }

    /**
     * @param mt measured times, s
     * @param mx measured values
     * @param st simulated times, s
     * @param sx simulated values (same unit as the measured)
     * @param level trigger level (same unit)
     * @param rising true for an upward crossing, false for downward
     * @param what the trigger as written, for messages
     * @return the offset: the measured crossing time minus the simulated crossing time, s
     * @throws BranchsimException ALIGNMENT_FAILED when either record never crosses the level
     */
    public static double byTrigger(double[] mt, double[] mx, double[] st, double[] sx, double level, boolean rising,
                                   String what) {
        double tm = crossing(mt, mx, level, rising);
        double ts = crossing(st, sx, level, rising);
        if (Double.isNaN(tm) || Double.isNaN(ts)) {
            throw new BranchsimException(ErrorKey.ALIGNMENT_FAILED, "by trigger \"" + what + "\"",
                    "a crossing of the level in both the measured and the simulated record",
                    Double.isNaN(tm) ? "none in the measured record" : "none in the simulated record");
        }
        return tm - ts;
    }

    /** @return the first time x crosses the level in the direction given (linear between samples), or NaN */
    public static double crossing(double[] t, double[] x, double level, boolean rising) {
        for (int k = 1; k < x.length; k++) {
            boolean crosses = rising ? x[k - 1] < level && x[k] >= level : x[k - 1] > level && x[k] <= level;
            if (crosses) {
                double w = (level - x[k - 1]) / (x[k] - x[k - 1]);
                return t[k - 1] + w * (t[k] - t[k - 1]);
            }
        }
        return Double.NaN;
    }

    /**
     * @param mt measured times, s
     * @param mx measured values
     * @param st simulated times, s (uniform)
     * @param sx simulated values
     * @return the offset that best lines the measured record up with the simulated one, s
     * @throws BranchsimException ALIGNMENT_FAILED when no lag gives enough overlap or a record does not vary
     */
    public static double byCrossCorrelation(double[] mt, double[] mx, double[] st, double[] sx) {
        double dt = (st[st.length - 1] - st[0]) / (st.length - 1);
        double[] grid = Resampling.grid(mt[0], mt[mt.length - 1], dt);
        double[] m = Resampling.linear(mt, mx, grid);
        int n = sx.length;
        int least = Math.max(3, (int) Math.ceil(LEAST_OVERLAP * Math.min(n, m.length)));
        // lag L (in grid steps) pairs sx[i] with m[i + L - first], i.e. measured time st[i] + offset
        int first = (int) Math.round((grid[0] - st[0]) / dt);
        int lo = -(n - least) + first;
        int hi = first + m.length - least;
        double best = Double.NEGATIVE_INFINITY;
        int bestLag = Integer.MIN_VALUE;
        double[] r = new double[hi - lo + 1];
        for (int lag = lo; lag <= hi; lag++) {
            r[lag - lo] = correlation(sx, m, lag - first);
            if (r[lag - lo] > best) {
                best = r[lag - lo];
                bestLag = lag;
            }
        }
        if (bestLag == Integer.MIN_VALUE || !Double.isFinite(best)) {
            throw new BranchsimException(ErrorKey.ALIGNMENT_FAILED, "by cross-correlation",
                    "records that overlap by at least half the shorter one and vary",
                    "no lag with a finite correlation (a flat record, or records too short)");
        }
        double frac = 0.0;
        int j = bestLag - lo;
        if (j > 0 && j < r.length - 1 && Double.isFinite(r[j - 1]) && Double.isFinite(r[j + 1])) {
            double den = r[j - 1] - 2 * r[j] + r[j + 1];
            if (den < 0) {
                frac = Math.max(-0.5, Math.min(0.5, 0.5 * (r[j - 1] - r[j + 1]) / den));
            }
        }
        return grid[0] - first * dt + (bestLag + frac) * dt - st[0];
    }

    /** Pearson correlation of s[i] with m[i + shift] over the indices where both exist. */
    private static double correlation(double[] s, double[] m, int shift) {
        int from = Math.max(0, -shift);
        int to = Math.min(s.length, m.length - shift);
        int n = to - from;
        if (n < 3) {
            return Double.NaN;
        }
        double ms = 0;
        double mm = 0;
        for (int i = from; i < to; i++) {
            ms += s[i];
            mm += m[i + shift];
        }
        ms /= n;
        mm /= n;
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = from; i < to; i++) {
            double a = s[i] - ms;
            double b = m[i + shift] - mm;
            sxy += a * b;
            sxx += a * a;
            syy += b * b;
        }
        return sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : Double.NaN;
    }
}
