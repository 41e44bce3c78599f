package org.branchsim.plots;

import java.util.Arrays;
import java.util.function.IntFunction;

/**
 * The value at a given rank of the samples of several signals pooled together (what sorting all of them into one
 * array and indexing it would give), found without holding more than one signal at a time: repeated passes
 * narrow a value interval that holds the rank, by a histogram of {@link #BINS} bins over the interval's own
 * smallest and largest value, until the interval holds at most {@link #GATHERED} samples (these are then sorted)
 * or a single value. The bin of a value is monotone in the value, and the interval's extremes fall in the first
 * and last bins, so every pass leaves fewer samples in play. Values in any unit; NaN is not expected.
 */
final class PooledRank {

    /** Bins per pass. */
    static final int BINS = 1024;
    /** Samples gathered and sorted once the interval holds no more. */
    static final int GATHERED = 1 << 16;

    private final IntFunction<double[]> signal;
    private final int count;
    private final int first;

    /**
     * @param signal signal j's samples (read again at every pass)
     * @param count number of signals
     * @param first index of the first sample of each signal that is pooled
     */
    PooledRank(IntFunction<double[]> signal, int count, int first) {
        this.signal = signal;
        this.count = count;
        this.first = first;
    }

    /**
     * @param rank 0 for the smallest pooled sample
     * @return the pooled sample at that rank
     */
    double at(long rank) {
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        long below = 0;
        long inside = Long.MAX_VALUE;
        while (true) {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            if (inside <= GATHERED) {
                double[] gathered = new double[(int) inside];
                int n = 0;
                for (int j = 0; j < count; j++) {
                    double[] v = signal.apply(j);
                    for (int k = first; k < v.length; k++) {
                        if (v[k] >= lo && v[k] <= hi) {
                            gathered[n++] = v[k];
                        }
                    }
                }
                Arrays.sort(gathered, 0, n);
                return gathered[(int) (rank - below)];
            }
            if (inside == Long.MAX_VALUE) {
                inside = 0;
                for (int j = 0; j < count; j++) {
                    double[] v = signal.apply(j);
                    for (int k = first; k < v.length; k++) {
                        min = Math.min(min, v[k]);
                        max = Math.max(max, v[k]);
                        inside++;
                    }
                }
                if (rank < 0 || rank >= inside) {
                    throw new IllegalArgumentException("rank " + rank + " of " + inside + " samples");
                }
                lo = min;
                hi = max;
                continue;
            }
            if (lo == hi) {
                return lo;
            }
            long[] counts = new long[BINS];
            double[] binMin = new double[BINS];
            double[] binMax = new double[BINS];
            Arrays.fill(binMin, Double.POSITIVE_INFINITY);
            Arrays.fill(binMax, Double.NEGATIVE_INFINITY);
            for (int j = 0; j < count; j++) {
                double[] v = signal.apply(j);
                for (int k = first; k < v.length; k++) {
                    if (v[k] >= lo && v[k] <= hi) {
                        int b = bin(v[k], lo, hi);
                        counts[b]++;
                        binMin[b] = Math.min(binMin[b], v[k]);
                        binMax[b] = Math.max(binMax[b], v[k]);
                    }
                }
            }
            int b = 0;
            while (below + counts[b] <= rank) {
                below += counts[b];
                b++;
            }
            lo = binMin[b];
            hi = binMax[b];
            inside = counts[b];
        }
    }

    private static int bin(double v, double lo, double hi) {
        return Math.min(BINS - 1, (int) ((v - lo) / (hi - lo) * BINS));
    }
}
