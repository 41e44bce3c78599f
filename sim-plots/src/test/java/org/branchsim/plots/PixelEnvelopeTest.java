package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The pixel envelope is the M4 aggregation (U. Jugel et al., "M4: A Visualization-Oriented Time Series Data
 * Aggregation", Proc. VLDB Endowment 7(10), 2014, section 4): per pixel column the first, last, smallest and
 * largest sample. The checks compare with that definition applied by brute force here, on a signal whose peaks
 * are placed by the test: single-sample spikes that a line chart must show.
 */
class PixelEnvelopeTest {

    private static final int SAMPLES = 350_001;
    private static final double DT = 1e-3;
    private static final int COLUMNS = 1100;
    /** Sample indices of single-sample spikes, up and down (chosen here, spread over the run). */
    private static final int[] SPIKES = {1_234, 77_777, 150_000, 233_333, 349_999};

    private static double[] times() {
        double[] t = new double[SAMPLES];
        for (int k = 0; k < SAMPLES; k++) {
            t[k] = k * DT;
        }
        return t;
    }

    /** A 0.3 Hz sine of amplitude 1 with noise of 0.01 and spikes of +-5 at {@link #SPIKES}. */
    private static double[] values() {
        Random random = new Random(11);
        double[] v = new double[SAMPLES];
        for (int k = 0; k < SAMPLES; k++) {
            v[k] = Math.sin(2 * Math.PI * 0.3 * k * DT) + 0.01 * random.nextGaussian();
        }
        for (int j = 0; j < SPIKES.length; j++) {
            v[SPIKES[j]] += j % 2 == 0 ? 5.0 : -5.0;
        }
        return v;
    }

    @Test
    void theEnvelopeKeepsEveryColumnsExtremesAndEndsAndIsBoundedByTheWidth() {
        double[] t = times();
        double[] v = values();
        int[] kept = PixelEnvelope.indices(t, v, t[0], t[SAMPLES - 1], COLUMNS);

        // bounded: at most four samples per pixel column, whatever the number of samples
        assertTrue(kept.length <= 4 * COLUMNS, kept.length + " samples kept");
        assertTrue(kept.length >= 2 * COLUMNS, "at least the lowest and highest of each column");
        for (int j = 1; j < kept.length; j++) {
            assertTrue(kept[j] > kept[j - 1], "in time order, each once");
        }
        assertEquals(0, kept[0]);
        assertEquals(SAMPLES - 1, kept[kept.length - 1]);
        // every spike is kept
        for (int s : SPIKES) {
            assertTrue(Arrays.binarySearch(kept, s) >= 0, "spike at sample " + s + " kept");
        }
        // per column, the kept samples reach the column's true smallest and largest value (brute force here)
        double width = (t[SAMPLES - 1] - t[0]) / COLUMNS;
        double[] trueMax = new double[COLUMNS];
        double[] trueMin = new double[COLUMNS];
        double[] keptMax = new double[COLUMNS];
        double[] keptMin = new double[COLUMNS];
        Arrays.fill(trueMax, Double.NEGATIVE_INFINITY);
        Arrays.fill(keptMax, Double.NEGATIVE_INFINITY);
        Arrays.fill(trueMin, Double.POSITIVE_INFINITY);
        Arrays.fill(keptMin, Double.POSITIVE_INFINITY);
        for (int k = 0; k < SAMPLES; k++) {
            int c = Math.min(COLUMNS - 1, (int) ((t[k] - t[0]) / width));
            trueMax[c] = Math.max(trueMax[c], v[k]);
            trueMin[c] = Math.min(trueMin[c], v[k]);
        }
        for (int k : kept) {
            int c = Math.min(COLUMNS - 1, (int) ((t[k] - t[0]) / width));
            keptMax[c] = Math.max(keptMax[c], v[k]);
            keptMin[c] = Math.min(keptMin[c], v[k]);
        }
        assertArrayEquals(trueMax, keptMax);
        assertArrayEquals(trueMin, keptMin);
    }

    @Test
    void fewSamplesAreKeptAllAndOnlyThoseInsideTheWindow() {
        double[] t = {0.0, 0.1, 0.2, 0.3, 0.4, 0.5};
        double[] v = {1, 5, 2, 8, 3, 9};
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5}, PixelEnvelope.indices(t, v, 0.0, 0.5, 10));
        assertArrayEquals(new int[] {1, 2, 3}, PixelEnvelope.indices(t, v, 0.05, 0.35, 10));
        assertArrayEquals(new int[0], PixelEnvelope.indices(t, v, 0.6, 0.9, 10));
        // one column of six samples: first (0), lowest (0), highest (5), last (5)
        assertArrayEquals(new int[] {0, 5}, PixelEnvelope.indices(t, v, 0.0, 0.5, 1));
    }

    @Test
    void aPanelFigureOfALongTraceHoldsBoundedSeriesThatReachEveryPeak() {
        double[] v = values();
        Trace trace = new Trace(List.of(new Trace.Column("a.p", Dimension.PRESSURE)));
        for (int k = 0; k < SAMPLES; k++) {
            trace.add(k * DT, new double[] {1e5 * (50 + v[k])});
        }
        JFreeChart chart = TraceCharts.panelsChart(trace, List.of(List.of(new SignalPanels.Drawn("a.p", "a.p"))),
                "long", UnitSystem.METRIC, 0.0);
        XYPlot panel = (XYPlot) ((CombinedDomainXYPlot) chart.getXYPlot()).getSubplots().get(0);
        XYDataset data = panel.getDataset();
        int n = data.getItemCount(0);
        assertTrue(n <= 4 * TraceCharts.WIDTH, n + " points drawn");
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (int k = 0; k < n; k++) {
            max = Math.max(max, data.getYValue(0, k));
            min = Math.min(min, data.getYValue(0, k));
        }
        double trueMax = Arrays.stream(v).max().orElseThrow();
        double trueMin = Arrays.stream(v).min().orElseThrow();
        // bar = 1e5 Pa (NIST Special Publication 811, 2008, Appendix B)
        assertEquals(50 + trueMax, max, 1e-9);
        assertEquals(50 + trueMin, min, 1e-9);
        assertEquals(50 + v[SPIKES[0]], max, 1e-9, "the highest drawn point is the first spike");
    }
}
