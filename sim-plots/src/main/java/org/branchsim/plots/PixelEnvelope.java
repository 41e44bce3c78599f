package org.branchsim.plots;

import java.util.Arrays;

/**
 * Cuts a sampled signal down to what a line chart of a given width can show: the time span is split into one
 * bucket per pixel column, and of each bucket only the first and last samples and those with the smallest and
 * largest value are kept, in time order (the M4 aggregation of U. Jugel, Z. Jerzak, G. Hackenbroich and V. Markl,
 * "M4: A Visualization-Oriented Time Series Data Aggregation", Proc. VLDB Endowment 7(10), 2014, section 4). A
 * line through the kept samples covers the same pixels as a line through all of them, so every peak and dip stays
 * on the figure, while a figure of 350 000 samples holds at most four points per pixel column. Works on indices,
 * so times and values keep whatever units they have.
 */
public final class PixelEnvelope {

    /** Most samples kept per pixel column. */
    public static final int PER_COLUMN = 4;

    private PixelEnvelope() {
    }

    /**
     * @param t sample times, s, non-decreasing
     * @param v sample values, one per time
     * @param from first time drawn, s
     * @param to last time drawn, s
     * @param columns pixel columns across [from, to] (at least 1)
     * @return indices of the samples to draw, increasing: all samples in [from, to] when they are no more than
     *         {@link #PER_COLUMN} per column, else per column its first, lowest, highest and last sample
     */
    public static int[] indices(double[] t, double[] v, double from, double to, int columns) {
        if (t.length != v.length) {
            throw new IllegalArgumentException(v.length + " values for " + t.length + " times");
        }
        if (columns < 1) {
            throw new IllegalArgumentException("at least one pixel column, not " + columns);
        }
        int first = 0;
        while (first < t.length && t[first] < from) {
            first++;
        }
        int last = t.length - 1;
        while (last >= first && t[last] > to) {
            last--;
        }
        int n = last - first + 1;
        if (n <= 0) {
            return new int[0];
        }
        double lo = Math.max(from, t[first]);
        double hi = Math.min(to, t[last]);
        if (n <= (long) PER_COLUMN * columns || !(hi > lo)) {
            int[] all = new int[n];
            for (int k = 0; k < n; k++) {
                all[k] = first + k;
            }
            return all;
        }
        int[] out = new int[PER_COLUMN * columns];
        int m = 0;
        double width = (hi - lo) / columns;
        int k = first;
        while (k <= last) {
            int column = Math.min(columns - 1, (int) ((t[k] - lo) / width));
            int start = k;
            int low = k;
            int high = k;
            while (k <= last && Math.min(columns - 1, (int) ((t[k] - lo) / width)) == column) {
                if (v[k] < v[low]) {
                    low = k;
                }
                if (v[k] > v[high]) {
                    high = k;
                }
                k++;
            }
            int end = k - 1;
            int[] kept = {start, low, high, end};
            Arrays.sort(kept);
            for (int j = 0; j < kept.length; j++) {
                if (j == 0 || kept[j] != kept[j - 1]) {
                    out[m++] = kept[j];
                }
            }
        }
        return Arrays.copyOf(out, m);
    }
}
