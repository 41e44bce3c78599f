package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The pooled rank is the order statistic: the value at that index of all pooled samples sorted ascending (its
 * definition; computed here with java.util.Arrays.sort, not with the code under test), also where many samples are
 * equal (a pressure held constant) and where the rank's neighbourhood holds more samples than are gathered at once.
 */
class PooledRankTest {

    @Test
    void everyRankIsTheSortedPoolsValueAtThatIndex() {
        Random random = new Random(5);
        List<double[]> signals = new ArrayList<>();
        int n = 120_000;
        double[] smooth = new double[n];
        double[] held = new double[n];
        double[] noisy = new double[n];
        for (int k = 0; k < n; k++) {
            smooth[k] = 45e5 + 2e5 * Math.sin(k * 1e-3);
            held[k] = k < n / 3 ? 1e5 * k / (n / 3.0) : 45e5;
            noisy[k] = 45e5 + 1e3 * random.nextGaussian();
        }
        signals.add(smooth);
        signals.add(held);
        signals.add(noisy);
        int first = 1000;
        double[] pooled = new double[3 * (n - first)];
        int m = 0;
        for (double[] s : signals) {
            System.arraycopy(s, first, pooled, m, n - first);
            m += n - first;
        }
        Arrays.sort(pooled);
        PooledRank rank = new PooledRank(signals::get, signals.size(), first);
        long[] ranks = {0, 1, 1788, (long) Math.floor(0.005 * (m - 1)), m / 3, m / 2, 2L * m / 3 + 17,
            (long) Math.ceil(0.995 * (m - 1)), m - 2, m - 1};
        for (long r : ranks) {
            assertEquals(pooled[(int) r], rank.at(r), "rank " + r);
        }
    }

    @Test
    void aFittedRangeFromColumnsReadOneAtATimeEqualsTheOneFromTheirList() {
        double[] t = new double[50_000];
        double[] a = new double[t.length];
        double[] b = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            t[k] = k * 1e-3;
            a[k] = k < 100 ? 160.0 : 45.0 + Math.sin(t[k]);
            b[k] = 44.0 + 0.5 * Math.cos(3 * t[k]);
        }
        // the list form sorts nothing itself either: both must give the axis the quantile definition gives;
        // here the start-up value 160 lies far outside the central range and is reported as clipped
        FittedRange viaList = FittedRange.of(t, List.of(a, b), 0.25);
        FittedRange viaColumns = FittedRange.of(t, 2, j -> j == 0 ? a.clone() : b.clone(), 0.25);
        assertEquals(viaList, viaColumns);
        assertEquals(160.0, viaColumns.clippedValue());
        assertEquals(0.0, viaColumns.clippedTime());
    }
}
