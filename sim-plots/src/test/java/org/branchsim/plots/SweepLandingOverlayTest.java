package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.Layer;
import org.jfree.data.Range;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The sweep overlay zoomed on the landing, drawn for synthetic landings: variant k lands at t0 = 0.30 + 0.02 k s
 * and then follows the unit-step response of an under-damped second-order system (zeta 0.3, 20 Hz) scaled to its
 * setting (Ogata, Modern Control Engineering, 5th ed., Prentice Hall 2010, section 5-3, eq. 5-19), so its peak lies
 * at t0 + pi / omega_d with the value setting (1 + exp(-zeta pi / sqrt(1 - zeta^2))) (eqs. 5-20 and 5-21). Before
 * the landing the trace holds a start-up stretch at the setting and a fall to 20 % of it (the load moving). Values
 * in bar (1 bar = 1e5 Pa, NIST SP 811, 2008, Appendix B).
 */
class SweepLandingOverlayTest {

    private static final double BAR = 1e5;
    private static final double SETTING = 45 * BAR;
    private static final double ZETA = 0.3;
    private static final double HZ = 20;
    private static final double DT = 1e-4;
    private static final double END = 1.5;

    private static double t0(int k) {
        return 0.30 + 0.02 * k;
    }

    private static double peakTime(int k) {
        return t0(k) + Math.PI / (2 * Math.PI * HZ * Math.sqrt(1 - ZETA * ZETA));
    }

    private static double peakValue(double setting) {
        return setting * (1 + Math.exp(-ZETA * Math.PI / Math.sqrt(1 - ZETA * ZETA)));
    }

    private static Trace trace(double t0, double setting) {
        Trace tr = new Trace(List.of(new Trace.Column("prv.p.out", Dimension.PRESSURE)));
        double wn = 2 * Math.PI * HZ;
        double wd = wn * Math.sqrt(1 - ZETA * ZETA);
        for (int k = 0; k * DT <= END + 1e-12; k++) {
            double t = k * DT;
            double s = t - t0;
            double p = t < 0.1 ? setting : s <= 0 ? 0.2 * setting : setting * (1 - Math.exp(-ZETA * wn * s)
                    * (Math.cos(wd * s) + ZETA / Math.sqrt(1 - ZETA * ZETA) * Math.sin(wd * s)));
            tr.add(t, new double[] {p});
        }
        return tr;
    }

    private static List<SweepOverlay.Landed> variants(int n, boolean sameSetting) {
        List<SweepOverlay.Landed> list = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double setting = sameSetting ? SETTING : SETTING + k * 2 * BAR;
            double d = 0.4 + 0.05 * k;
            list.add(new SweepOverlay.Landed(new SweepOverlay.Variant(new TraceCharts.Labelled("d=" + d,
                    trace(t0(k), setting)), d), setting, peakValue(setting)));
        }
        return list;
    }

    private static Collection<?> rangeMarkers(XYPlot plot, Layer layer) {
        Collection<?> m = plot.getRangeMarkers(layer);
        return m == null ? List.of() : m;
    }

    @Test
    void threeVariantsEachWithItsPeakMarkedInsideTheZoomAndTheSettingBand() {
        int n = 3;
        JFreeChart chart = SweepOverlay.landingChart(variants(n, true), "prv.p.out", "d [mm]", "landing",
                UnitSystem.METRIC);
        XYPlot plot = chart.getXYPlot();
        assertEquals(n, plot.getDataset(0).getSeriesCount(), "one curve per variant");
        assertNotNull(chart.getLegend(), "six or fewer variants keep their legend");
        Range time = plot.getDomainAxis().getRange();
        // the zoom: from after the start-up (0.1 s) to well before the end (1.5 s)
        assertTrue(time.getLowerBound() > 0.1 && time.getLowerBound() < t0(0), time.toString());
        assertTrue(time.getUpperBound() < 1.0, time.toString());
        XYDataset peaks = plot.getDataset(1);
        assertEquals(n, peaks.getSeriesCount());
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer(0);
        XYLineAndShapeRenderer marks = (XYLineAndShapeRenderer) plot.getRenderer(1);
        for (int k = 0; k < n; k++) {
            assertEquals(1, peaks.getItemCount(k), "one peak marker per variant");
            assertEquals(peakTime(k), peaks.getXValue(k, 0), DT, "Ogata eq. 5-20");
            assertEquals(peakValue(SETTING) / BAR, peaks.getYValue(k, 0), 1e-3 * peakValue(SETTING) / BAR,
                    "Ogata eq. 5-21");
            assertTrue(time.contains(peaks.getXValue(k, 0)));
            assertEquals(lines.lookupSeriesPaint(k), marks.lookupSeriesPaint(k), "marker in its curve's colour");
            // every sample drawn lies inside the zoom
            assertTrue(plot.getDataset(0).getXValue(k, 0) >= time.getLowerBound());
        }
        // the value axis is fitted to the zoomed data: from the landing's start (0 bar, c(0) = 0) to the peak
        // (about 66 bar), with a margin of at most a few bar
        Range y = plot.getRangeAxis().getRange();
        double peak = peakValue(SETTING) / BAR;
        assertTrue(y.contains(0.0) && y.contains(peak), y.toString());
        assertTrue(y.getLowerBound() > -0.1 * peak && y.getUpperBound() < 1.2 * peak, y.toString());
        boolean band = rangeMarkers(plot, Layer.BACKGROUND).stream().anyMatch(m -> m instanceof IntervalMarker i
                && Math.abs(i.getStartValue() - 0.98 * 45) < 1e-9 && Math.abs(i.getEndValue() - 1.02 * 45) < 1e-9);
        assertTrue(band, "the +-2 % band about 45 bar");
        assertEquals(1, rangeMarkers(plot, Layer.FOREGROUND).size(), "one setting line");
    }

    @Test
    void nineVariantsKeepTheColourMapAndBarAndMarkEveryPeak() {
        int n = 9;
        JFreeChart chart = SweepOverlay.landingChart(variants(n, true), "prv.p.out", "d [mm]", "nine",
                UnitSystem.METRIC);
        XYPlot plot = chart.getXYPlot();
        assertNull(chart.getLegend(), "no legend past six variants");
        boolean bar = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            bar |= chart.getSubtitle(i) instanceof PaintScaleLegend;
        }
        assertTrue(bar, "the colour bar of the full overlay");
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer(0);
        XYLineAndShapeRenderer marks = (XYLineAndShapeRenderer) plot.getRenderer(1);
        Range time = plot.getDomainAxis().getRange();
        for (int k = 0; k < n; k++) {
            // variants are given in order of their value, so series k is variant k, coloured by its value on the
            // map from the lowest (0.4) to the highest value (0.8) as in the full overlay
            assertEquals(new ColourMap(0.4, 0.4 + 0.05 * (n - 1)).getPaint(0.4 + 0.05 * k), lines.lookupSeriesPaint(k));
            assertEquals(lines.lookupSeriesPaint(k), marks.lookupSeriesPaint(k));
            assertEquals(peakTime(k), plot.getDataset(1).getXValue(k, 0), DT);
            assertTrue(time.contains(peakTime(k)));
        }
    }

    @Test
    void differentSettingsGetOneLineEachAndNoBand() {
        JFreeChart chart = SweepOverlay.landingChart(variants(3, false), "prv.p.out", "d [mm]", "settings",
                UnitSystem.METRIC);
        XYPlot plot = chart.getXYPlot();
        assertTrue(rangeMarkers(plot, Layer.BACKGROUND).isEmpty(), "no band when the settings differ");
        List<Double> lines = new ArrayList<>();
        for (Object m : rangeMarkers(plot, Layer.FOREGROUND)) {
            lines.add(((ValueMarker) m).getValue());
        }
        assertEquals(List.of(45.0, 47.0, 49.0), lines.stream().sorted().toList());
        for (int k = 0; k < 3; k++) {
            double setting = SETTING + k * 2 * BAR;
            assertEquals(peakValue(setting) / BAR, plot.getDataset(1).getYValue(k, 0), 1e-3 * peakValue(setting) / BAR);
        }
        Marker any = (Marker) rangeMarkers(plot, Layer.FOREGROUND).iterator().next();
        assertTrue(any.getLabel().startsWith("setting "));
    }
}
