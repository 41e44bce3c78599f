package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The landing figure drawn for an analytic landing: the outlet pressure follows the unit-step response of an
 * under-damped second-order system scaled to the setting, starting at t0. Its first peak lies at
 * t_p = pi / omega_d with overshoot exp(-zeta pi / sqrt(1 - zeta^2)) (Ogata, Modern Control Engineering, 5th ed.,
 * Prentice Hall 2010, section 5-3, eqs 5-20 and 5-21), so the figure must show the sample of that height at that
 * time inside its window, the setting line and the band of +-2 % of the setting about it (the 2 % settling
 * criterion of the same section), and the markers at the stated times, in bar (1 bar = 1e5 Pa, NIST SP 811, 2008,
 * Appendix B).
 */
class LandingChartTest {

    private static final double SETTING = 45e5;
    private static final double ZETA = 0.3;
    private static final double OMEGA_N = 2 * Math.PI * 20;
    private static final double T0 = 0.3;
    private static final double DT = 1e-4;
    private static final double END = 1.0;

    private static double omegaD() {
        return OMEGA_N * Math.sqrt(1 - ZETA * ZETA);
    }

    /** Ogata 2010, eq. 5-19: c(t) = 1 - e^(-zeta wn t) (cos wd t + zeta / sqrt(1 - zeta^2) sin wd t). */
    private static double step(double t) {
        if (t <= 0) {
            return 0.0;
        }
        double wd = omegaD();
        return 1 - Math.exp(-ZETA * OMEGA_N * t)
                * (Math.cos(wd * t) + ZETA / Math.sqrt(1 - ZETA * ZETA) * Math.sin(wd * t));
    }

    private static Trace trace() {
        Trace tr = new Trace(List.of(new Trace.Column("prv.p.out", Dimension.PRESSURE),
                new Trace.Column("prv.spool.x", Dimension.LENGTH), new Trace.Column("prv.pilot.x", Dimension.LENGTH)));
        for (int k = 0; k * DT <= END + 1e-12; k++) {
            double t = k * DT;
            double c = step(t - T0);
            tr.add(t, new double[] {SETTING * c, 2e-3 * c, 0.1e-3 * Math.max(0, c - 1)});
        }
        return tr;
    }

    /** Metrics as the analytic response gives them (peak time and height from Ogata eqs 5-20, 5-21). */
    private static ReducingValveMetrics metrics() {
        double tp = T0 + Math.PI / omegaD();
        double mp = Math.exp(-ZETA * Math.PI / Math.sqrt(1 - ZETA * ZETA));
        double settled = T0 + 4 / (ZETA * OMEGA_N); // 2 % criterion settling time 4 / (zeta wn), Ogata eq. 5-25
        double rise = 0.35; // any time on the way up: the figure draws what it is given
        return new ReducingValveMetrics("prv", SETTING, SETTING * (1 + mp), tp, SETTING, SETTING * mp, 0.0, rise,
                settled, settled - rise, true, Double.NaN, 0.0, 0.0, 0.0);
    }

    @Test
    void theWindowShowsTheAnalyticPeakWithTheSettingBandAndTheMarkers() {
        ReducingValveMetrics m = metrics();
        JFreeChart chart = LandingChart.chart(trace(), m, "landing", UnitSystem.METRIC);
        CombinedDomainXYPlot combined = (CombinedDomainXYPlot) chart.getPlot();
        List<XYPlot> panels = combined.getSubplots();
        assertEquals(2, panels.size(), "pressure and members");
        XYPlot pressure = panels.get(0);
        XYDataset data = pressure.getDataset();
        assertEquals(1, data.getSeriesCount());
        double from = combined.getDomainAxis().getLowerBound();
        double to = combined.getDomainAxis().getUpperBound();
        assertTrue(from < m.riseTime() && to > m.settledAt(), "window holds rise and settling: " + from + " " + to);
        assertTrue(to - m.settledAt() >= m.settledAt() - m.riseTime(), "well after settling");
        assertTrue(to - from < 0.5 * END, "zoomed on the event, not the whole run");
        double max = Double.NEGATIVE_INFINITY;
        double tMax = Double.NaN;
        for (int i = 0; i < data.getItemCount(0); i++) {
            if (data.getYValue(0, i) > max) {
                max = data.getYValue(0, i);
                tMax = data.getXValue(0, i);
            }
        }
        double mp = Math.exp(-ZETA * Math.PI / Math.sqrt(1 - ZETA * ZETA));
        assertEquals(45.0 * (1 + mp), max, 45.0 * 1e-4, "peak height, bar (Ogata eq. 5-21)");
        assertEquals(T0 + Math.PI / omegaD(), tMax, DT, "peak time (Ogata eq. 5-20)");
        assertTrue(pressure.getRangeAxis().getRange().contains(max), "peak inside the axis");

        boolean settingLine = false;
        boolean band = false;
        for (Layer layer : new Layer[] {Layer.FOREGROUND, Layer.BACKGROUND}) {
            for (Object o : pressure.getRangeMarkers(layer)) {
                if (o instanceof ValueMarker v && Math.abs(v.getValue() - 45.0) < 1e-9) {
                    settingLine = true;
                }
                if (o instanceof IntervalMarker b) {
                    band = Math.abs(b.getStartValue() - 44.1) < 1e-9 && Math.abs(b.getEndValue() - 45.9) < 1e-9;
                }
            }
        }
        assertTrue(settingLine, "line at the setting, 45 bar");
        assertTrue(band, "band 44.1 to 45.9 bar: +-2 % of 45 bar");
        List<?> times = List.copyOf(pressure.getDomainMarkers(Layer.FOREGROUND));
        assertEquals(2, times.size(), "rise and settled");
        assertEquals(m.settledAt(), ((Marker) times.get(1) instanceof ValueMarker v ? v.getValue() : -1), 1e-12);
        XYPointerAnnotation peak = (XYPointerAnnotation) pressure.getAnnotations().get(0);
        assertEquals(m.peakTime(), peak.getX(), 1e-12);
        assertEquals(45.0 * (1 + mp), peak.getY(), 1e-9);
        assertTrue(peak.getText().startsWith(String.format(java.util.Locale.ROOT, "peak %.2f bar", 45.0 * (1 + mp))),
                peak.getText());

        XYPlot members = panels.get(1);
        assertEquals(2, members.getDatasetCount(), "spool and pilot, each on its own axis");
        assertTrue(members.getRangeAxis(0).getLabel().startsWith("prv.spool.x [mm]"));
        assertTrue(members.getRangeAxis(1).getLabel().startsWith("prv.pilot.x [mm]"));
        assertTrue(((String) members.getDataset(0).getSeriesKey(0)).contains("0 = fully open"));
        assertTrue(((String) members.getDataset(1).getSeriesKey(0)).contains("0 = seated"));
        assertNotNull(chart.getLegend());
        boolean caution = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            caution |= chart.getSubtitle(i) instanceof TextTitle tt && tt.getText().equals(TraceCharts.CAUTION);
        }
        assertTrue(caution);
        boolean verdict = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            verdict |= chart.getSubtitle(i) instanceof TextTitle tt && tt.getText().startsWith(String.format(
                    java.util.Locale.ROOT, "settling time %.3f s", m.settlingTime()));
        }
        assertTrue(verdict, "the settling time is stated");
        assertTrue(LandingChart.verdict(m.withPersistingOscillation(18.5)).contains("18.5 Hz"));
    }

    @Test
    void withoutARiseTheWindowCentresOnThePeak() {
        ReducingValveMetrics m = metrics();
        // inside the band from the start (no rise to find): the largest excursion is what there is to see
        ReducingValveMetrics noRise = new ReducingValveMetrics("prv", SETTING, m.peak(), m.peakTime(), SETTING,
                m.overshoot(), 0.0, Double.NaN, 0.0, Double.NaN, true, Double.NaN, 0.0, 0.0, 0.0);
        double[] w = LandingChart.window(trace(), noRise);
        assertEquals(m.peakTime(), 0.5 * (w[0] + w[1]), 1e-9);
        assertEquals(2 * LandingChart.PEAK_HALF_WIDTH * END, w[1] - w[0], 1e-9);
    }

    @Test
    void withoutARiseOrSettlingTheWholeRunIsShownAndSaidSo() {
        ReducingValveMetrics m = metrics();
        ReducingValveMetrics neither = new ReducingValveMetrics("prv", SETTING, m.peak(), m.peakTime(), SETTING,
                m.overshoot(), 0.0, Double.NaN, Double.NaN, Double.NaN, false, Double.NaN, 0.0, 0.0, 0.0);
        double[] t = trace().times();
        double[] w = LandingChart.window(trace(), neither);
        assertEquals(t[0], w[0], 0.0);
        assertEquals(t[t.length - 1], w[1], 0.0);
        assertTrue(LandingChart.verdict(neither).contains("the whole run is shown"), LandingChart.verdict(neither));
    }

    @Test
    void aTraceWithoutTheOutletIsRefused() {
        Trace empty = new Trace(List.of(new Trace.Column("x.p", Dimension.PRESSURE)));
        empty.add(0.0, new double[] {0.0});
        assertThrows(IllegalArgumentException.class,
                () -> LandingChart.chart(empty, metrics(), "landing", UnitSystem.METRIC));
    }
}
