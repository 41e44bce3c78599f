package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.Range;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The figures' data and axes, read from the JFreeChart objects before they are drawn: every sample of every
 * signal is plotted at its time in the display unit of the chosen unit system (bar = 1e5 Pa, psi =
 * 6894.757293168 Pa, mm = 1e-3 m, L/min = 1e-3/60 m^3/s: NIST Special Publication 811, 2008, Appendix B), the axes
 * span the data and name their units, each figure has as many series as it draws signals or runs, and every figure
 * carries the simulation caution.
 */
class TraceChartsTest {

    private static final double DT = 1e-3;
    private static final int SAMPLES = 101;
    private static final double PSI = 6894.757293168;

    private static double pressureA(double t) {
        return 50e5 + 10e5 * Math.sin(2 * Math.PI * 10 * t);
    }

    private static double pressureB(double t) {
        return 20e5 + 100e5 * t;
    }

    /** 0.1 s of two pressures, a position and a flow that stays zero. */
    private static Trace trace(double scale) {
        Trace t = new Trace(List.of(new Trace.Column("a.p", Dimension.PRESSURE), new Trace.Column("b.p", Dimension.PRESSURE),
                new Trace.Column("s.x", Dimension.LENGTH), new Trace.Column("z.q", Dimension.VOLUME_FLOW)));
        for (int k = 0; k < SAMPLES; k++) {
            double time = k * DT;
            t.add(time, new double[] {scale * pressureA(time), pressureB(time), 2e-3 * time / 0.1, 0.0});
        }
        return t;
    }

    private static XYPlot plot(JFreeChart chart) {
        return (XYPlot) chart.getPlot();
    }

    private static boolean hasCaution(JFreeChart chart) {
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof TextTitle tt && tt.getText().equals(TraceCharts.CAUTION)) {
                return true;
            }
        }
        return false;
    }

    private static void assertSpans(Range range, double low, double high, String what) {
        assertTrue(range.getLowerBound() <= low && range.getUpperBound() >= high, what + " " + range);
        double span = high - low;
        assertTrue(range.getLowerBound() > low - 0.1 * span && range.getUpperBound() < high + 0.1 * span,
                what + " hugs its data: " + range);
    }

    @Test
    void overlayPlotsEverySampleInBarOnAnAxisThatSpansTheData() {
        JFreeChart chart = TraceCharts.overlayChart(trace(1.0), List.of("a.p", "b.p"), "pressures", UnitSystem.METRIC);
        XYDataset data = plot(chart).getDataset();
        assertEquals(2, data.getSeriesCount());
        assertEquals("a.p", data.getSeriesKey(0));
        assertEquals("b.p", data.getSeriesKey(1));
        for (int k = 0; k < SAMPLES; k++) {
            double time = k * DT;
            assertEquals(time, data.getXValue(0, k), 1e-15);
            assertEquals(pressureA(time) / 1e5, data.getYValue(0, k), 1e-9);
            assertEquals(pressureB(time) / 1e5, data.getYValue(1, k), 1e-9);
        }
        assertEquals("pressure [bar]", plot(chart).getRangeAxis().getLabel());
        assertEquals("time [s]", plot(chart).getDomainAxis().getLabel());
        assertSpans(plot(chart).getRangeAxis().getRange(), 20.0, 60.0, "pressure axis");
        assertSpans(plot(chart).getDomainAxis().getRange(), 0.0, 0.1, "time axis");
        assertNotNull(chart.getLegend());
        assertTrue(hasCaution(chart));
        assertEquals("pressures", chart.getTitle().getText());
    }

    @Test
    void usCustomaryUnitsConvertByTheExactPsi() {
        JFreeChart chart = TraceCharts.overlayChart(trace(1.0), List.of("a.p"), "one", UnitSystem.US);
        XYDataset data = plot(chart).getDataset();
        assertEquals(1, data.getSeriesCount());
        assertEquals(pressureA(0.05) / PSI, data.getYValue(0, 50), 1e-9);
        assertEquals("a.p [psi]", plot(chart).getRangeAxis().getLabel());
    }

    @Test
    void stackedDrawsOnePanelPerSignalOnOneTimeAxis() {
        JFreeChart chart = TraceCharts.stackedChart(trace(1.0), List.of("a.p", "s.x"), "members", UnitSystem.METRIC);
        CombinedDomainXYPlot combined = (CombinedDomainXYPlot) chart.getPlot();
        List<XYPlot> panels = combined.getSubplots();
        assertEquals(2, panels.size());
        assertEquals("a.p [bar]", panels.get(0).getRangeAxis().getLabel());
        assertEquals("s.x [mm]", panels.get(1).getRangeAxis().getLabel());
        for (XYPlot p : panels) {
            assertEquals(1, p.getDataset().getSeriesCount());
            assertEquals(SAMPLES, p.getDataset().getItemCount(0));
        }
        assertEquals(2.0 * 0.05 / 0.1, panels.get(1).getDataset().getYValue(0, 50), 1e-12, "mm");
        assertSpans(panels.get(1).getRangeAxis().getRange(), 0.0, 2.0, "position axis");
        assertEquals("time [s]", combined.getDomainAxis().getLabel());
        assertNull(chart.getLegend(), "each panel names its signal on its axis");
        assertTrue(hasCaution(chart));
    }

    @Test
    void comparisonDrawsOneSeriesPerRunInsideTheWindow() {
        List<TraceCharts.Labelled> runs = List.of(new TraceCharts.Labelled("as is", trace(1.0)),
                new TraceCharts.Labelled("changed", trace(0.5)));
        JFreeChart chart = TraceCharts.compareChart(runs, "a.p", "before and after", UnitSystem.METRIC, 0.0205, 0.0505);
        XYDataset data = plot(chart).getDataset();
        assertEquals(2, data.getSeriesCount());
        assertEquals("changed", data.getSeriesKey(1));
        for (int s = 0; s < 2; s++) {
            assertEquals(30, data.getItemCount(s), "samples 21 to 50 ms");
            assertEquals(0.021, data.getXValue(s, 0), 1e-12);
            assertEquals(0.050, data.getXValue(s, 29), 1e-12);
        }
        assertEquals(0.5 * pressureA(0.03) / 1e5, data.getYValue(1, 9), 1e-9);
        // the time axis spans the samples drawn and no more (issue 13 item 3: no axis past the end time)
        assertEquals(0.021, plot(chart).getDomainAxis().getLowerBound(), 1e-12);
        assertEquals(0.050, plot(chart).getDomainAxis().getUpperBound(), 1e-12);
        assertEquals("a.p [bar]", plot(chart).getRangeAxis().getLabel());
        assertNotNull(chart.getLegend());
        assertTrue(hasCaution(chart));
        List<TraceCharts.Labelled> many = new ArrayList<>();
        for (int i = 0; i < 17; i++) {
            many.add(new TraceCharts.Labelled("run " + i, trace(1.0)));
        }
        JFreeChart crowded = TraceCharts.compareChart(many, "a.p", "sweep", UnitSystem.METRIC, 0.0, 0.1);
        assertEquals(17, plot(crowded).getDataset().getSeriesCount());
        assertNull(crowded.getLegend(), "no legend beyond 16 runs");
    }

    @Test
    void missingSignalsAndRunsAreRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> TraceCharts.overlayChart(trace(1.0), List.of("nothing.p"), "x", UnitSystem.METRIC));
        assertThrows(IllegalArgumentException.class,
                () -> TraceCharts.stackedChart(trace(1.0), List.of(), "x", UnitSystem.METRIC));
        assertThrows(IllegalArgumentException.class,
                () -> TraceCharts.compareChart(List.of(), "a.p", "x", UnitSystem.METRIC, 0.0, 1.0));
    }

    @Test
    void signalsOfADimensionLeaveOutThoseThatStayZero() {
        assertEquals(List.of("a.p", "b.p"), TraceCharts.signalsOf(trace(1.0), Dimension.PRESSURE));
        assertEquals(List.of(), TraceCharts.signalsOf(trace(1.0), Dimension.VOLUME_FLOW));
    }

    @Test
    void histogramCountsTheValuesInEqualBinsFromTheSmallestToTheLargest() {
        // a histogram counts the values falling in each of equal-width bins (its definition); here 1, 2, 3 in three
        // bins over [1, 3]: counts 1, 2, 3
        JFreeChart chart = HistogramChart.chart(new double[] {1, 2, 2, 3, 3, 3}, 3, "spread", "overshoot [%]");
        HistogramDataset data = (HistogramDataset) plot(chart).getDataset();
        assertEquals(1, data.getSeriesCount());
        assertEquals(3, data.getItemCount(0));
        for (int bin = 0; bin < 3; bin++) {
            assertEquals(bin + 1.0, data.getYValue(0, bin), 0.0, "bin " + bin);
            assertEquals(1.0 + 2.0 / 3.0 * bin, data.getStartXValue(0, bin), 1e-12);
        }
        assertEquals("overshoot [%]", plot(chart).getDomainAxis().getLabel());
        assertEquals("runs", plot(chart).getRangeAxis().getLabel());
        assertTrue(hasCaution(chart));
        assertThrows(IllegalArgumentException.class, () -> HistogramChart.chart(new double[0], 3, "x", "y"));
    }

    @Test
    void figuresAreWrittenAsPngOfTheStatedSize(@TempDir Path dir) throws IOException {
        Path overlay = dir.resolve("overlay.png");
        TraceCharts.overlay(trace(1.0), List.of("a.p", "b.p"), "pressures", UnitSystem.METRIC, overlay);
        BufferedImage img = ImageIO.read(overlay.toFile());
        assertNotNull(img);
        assertEquals(TraceCharts.WIDTH, img.getWidth());
        assertEquals(TraceCharts.PANEL_HEIGHT + 120, img.getHeight());
        Path histogram = dir.resolve("histogram.png");
        HistogramChart.save(new double[] {1, 2, 2, 3}, 2, "spread", "overshoot [%]", histogram);
        assertFalse(ImageIO.read(histogram.toFile()) == null, "decodes");
    }
}
