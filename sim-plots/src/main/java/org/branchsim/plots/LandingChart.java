package org.branchsim.plots;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The landing of a reducing valve, zoomed on the event: the outlet pressure over a window from shortly before its
 * rise through {@link ReducingValveMetrics#RISE_FRACTION} of the setting to well after it settles (or around the
 * peak when it did not rise in the window; the whole run when it neither rose nor settled), with the setting drawn as a line, the settling band of
 * +-{@link ReducingValveMetrics#BAND} of the setting shaded about it, the peak marked with its value and time and
 * the settling time marked; below, the spool travel (0 = fully open, the full stroke = closed) and the pilot lift
 * (0 = seated). Pressures and lengths in the display units of the unit system, time in s.
 */
public final class LandingChart {

    /** Height of the figure, px. */
    public static final int HEIGHT = 760;
    /** Time drawn before the rise, as a multiple of the rise-to-settled span. */
    static final double LEAD = 0.5;
    /** Time drawn after settling, as a multiple of the rise-to-settled span ("well after settling"). */
    static final double TRAIL = 1.5;
    /** Half-width of the window about the peak when no rise was found, as a fraction of the trace's duration. */
    static final double PEAK_HALF_WIDTH = 0.03;

    private LandingChart() {
    }

    /**
     * Writes the landing figure of one valve as PNG.
     *
     * @param trace the run's trace (must have the valve's outlet pressure)
     * @param m the valve's metrics
     * @param title figure title
     * @param units unit system for the axes
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void save(Trace trace, ReducingValveMetrics m, String title, UnitSystem units, Path file)
            throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart(trace, m, title, units), TraceCharts.WIDTH, HEIGHT);
    }

    /**
     * @param trace the run's trace
     * @param m the valve's metrics
     * @return the window drawn, {from, to} in s, inside the trace's time span
     */
    static double[] window(Trace trace, ReducingValveMetrics m) {
        double[] t = trace.times();
        double first = t[0];
        double last = t[t.length - 1];
        if (!Double.isFinite(m.riseTime()) && !m.settled() && !m.oscillating()) {
            return new double[] {first, last}; // no landing to zoom on: the whole run shows why it never settled
        }
        double start;
        double end;
        if (Double.isFinite(m.riseTime())) {
            start = Math.min(m.riseTime(), m.peakTime());
            end = Math.max(Double.isFinite(m.settledAt()) ? m.settledAt() : m.peakTime(), m.peakTime());
        } else {
            start = m.peakTime();
            end = m.peakTime();
        }
        double span = end - start;
        double minimum = 2 * PEAK_HALF_WIDTH * (last - first);
        double from;
        double to;
        if (span < minimum / (LEAD + TRAIL + 1)) {
            double centre = 0.5 * (start + end);
            from = centre - 0.5 * minimum;
            to = centre + 0.5 * minimum;
        } else {
            from = start - LEAD * span;
            to = end + TRAIL * span;
        }
        return new double[] {Math.max(first, from), Math.min(last, to)};
    }

    /**
     * @param trace the run's trace (must have the valve's outlet pressure)
     * @param m the valve's metrics
     * @param title figure title
     * @param units unit system for the axes
     * @return the chart {@link #save} draws, with its caution, before it is saved
     */
    public static JFreeChart chart(Trace trace, ReducingValveMetrics m, String title, UnitSystem units) {
        String outlet = m.id() + ".p.out";
        if (trace.indexOf(outlet) < 0) {
            throw new IllegalArgumentException("the trace has no signal " + outlet);
        }
        double[] w = window(trace, m);
        NumberAxis time = new NumberAxis("time [s]");
        time.setAutoRange(false);
        time.setRange(w[0], w[1]);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(time);
        combined.setGap(10.0);
        combined.add(pressurePanel(trace, m, outlet, units, w), 3);
        XYPlot members = memberPanel(trace, m, units, w);
        if (members != null) {
            combined.add(members, 2);
        }
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, combined, true);
        chart.addSubtitle(new TextTitle(verdict(m), new Font(Font.SANS_SERIF, Font.PLAIN, 12)));
        return TraceCharts.withCaution(chart);
    }

    /** @return the settling result in words, with what it is measured from */
    static String verdict(ReducingValveMetrics m) {
        if (m.oscillating()) {
            return String.format(Locale.ROOT, "does not settle: an oscillation of %.1f Hz persists at this valve",
                    m.oscillationFrequency());
        }
        if (!m.settled()) {
            return String.format(Locale.ROOT, "not inside +-%.0f %% of the setting at the end of the metrics window%s",
                    100 * ReducingValveMetrics.BAND, Double.isFinite(m.riseTime()) ? ""
                            : String.format(Locale.ROOT, " (no rise through %.0f %% of it in the metrics window: "
                            + "the whole run is shown)", 100 * ReducingValveMetrics.RISE_FRACTION));
        }
        if (Double.isNaN(m.settlingTime())) {
            return String.format(Locale.ROOT, "inside +-%.0f %% of the setting from %.3f s (no rise through %.0f %% "
                    + "of the setting in the metrics window)", 100 * ReducingValveMetrics.BAND, m.settledAt(),
                    100 * ReducingValveMetrics.RISE_FRACTION);
        }
        return String.format(Locale.ROOT, "settling time %.3f s: from the rise through %.0f %% of the setting at "
                + "%.3f s to staying inside +-%.0f %% of the setting from %.3f s", m.settlingTime(),
                100 * ReducingValveMetrics.RISE_FRACTION, m.riseTime(), 100 * ReducingValveMetrics.BAND,
                m.settledAt());
    }

    private static XYPlot pressurePanel(Trace trace, ReducingValveMetrics m, String outlet, UnitSystem units,
                                        double[] w) {
        Unit pu = units.displayUnit(Dimension.PRESSURE);
        XYSeries series = TraceCharts.series(trace, outlet, outlet, pu, w[0], w[1]);
        double setting = pu.fromSi(m.setting());
        double bandLow = pu.fromSi(m.setting() * (1 - ReducingValveMetrics.BAND));
        double bandHigh = pu.fromSi(m.setting() * (1 + ReducingValveMetrics.BAND));
        double low = Math.min(series.getMinY(), bandLow);
        double high = Math.max(Math.max(series.getMaxY(), bandHigh), pu.fromSi(m.peak()));
        NumberAxis y = new NumberAxis(outlet + " [" + pu.symbol() + "]");
        y.setAutoRange(false);
        y.setRange(low - 0.06 * (high - low), high + 0.12 * (high - low));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        TraceCharts.style(r, 0, 1.8f);
        XYPlot p = new XYPlot(new XYSeriesCollection(series), null, y, r);
        TraceCharts.grid(p);
        IntervalMarker band = new IntervalMarker(bandLow, bandHigh, new Color(0x2e8b57), new BasicStroke(0.5f),
                null, null, 0.18f);
        band.setLabel(String.format(Locale.ROOT, "settling band +-%.0f %% of the setting",
                100 * ReducingValveMetrics.BAND));
        band.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
        band.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
        band.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        p.addRangeMarker(band, Layer.BACKGROUND);
        ValueMarker line = new ValueMarker(setting, new Color(0x2e8b57), new BasicStroke(1.4f));
        line.setLabel(String.format(Locale.ROOT, "setting %.2f %s", setting, pu.symbol()));
        line.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        line.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        line.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        p.addRangeMarker(line, Layer.FOREGROUND);
        if (m.peakTime() >= w[0] && m.peakTime() <= w[1]) {
            XYPointerAnnotation peak = new XYPointerAnnotation(String.format(Locale.ROOT,
                    "peak %.2f %s at %.3f s (overshoot %.1f %% of the setting)", pu.fromSi(m.peak()), pu.symbol(),
                    m.peakTime(), m.overshootPercent()), m.peakTime(), pu.fromSi(m.peak()), -Math.PI / 8);
            peak.setTextAnchor(TextAnchor.BOTTOM_LEFT);
            peak.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
            peak.setArrowLength(14);
            peak.setBaseRadius(22);
            p.addAnnotation(peak);
        }
        if (Double.isFinite(m.riseTime())) {
            p.addDomainMarker(timeMarker(m.riseTime(), String.format(Locale.ROOT, "rise through %.0f %% at %.3f s",
                    100 * ReducingValveMetrics.RISE_FRACTION, m.riseTime()), new Color(0x777777),
                    TextAnchor.TOP_RIGHT));
        }
        if (Double.isFinite(m.settledAt())) {
            String text = Double.isFinite(m.settlingTime())
                    ? String.format(Locale.ROOT, "settled at %.3f s: settling time %.3f s", m.settledAt(),
                    m.settlingTime())
                    : String.format(Locale.ROOT, "inside the band from %.3f s", m.settledAt());
            p.addDomainMarker(timeMarker(m.settledAt(), text, new Color(0x1f5fa8), TextAnchor.TOP_LEFT));
        }
        return p;
    }

    private static ValueMarker timeMarker(double t, String text, Color colour, TextAnchor anchor) {
        ValueMarker v = new ValueMarker(t, colour, new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f));
        v.setLabel(text);
        v.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        v.setLabelAnchor(anchor == TextAnchor.TOP_LEFT ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.BOTTOM_LEFT);
        v.setLabelTextAnchor(anchor == TextAnchor.TOP_LEFT ? TextAnchor.BOTTOM_LEFT : TextAnchor.BOTTOM_RIGHT);
        return v;
    }

    /** @return spool travel and pilot lift (each on its own axis), or null when the trace has neither */
    private static XYPlot memberPanel(Trace trace, ReducingValveMetrics m, UnitSystem units, double[] w) {
        Unit lu = units.displayUnit(Dimension.LENGTH);
        String spool = m.id() + ".spool.x";
        String pilot = m.id() + ".pilot.x";
        XYPlot p = new XYPlot();
        TraceCharts.grid(p);
        int k = 0;
        if (trace.indexOf(spool) >= 0) {
            add(p, k++, TraceCharts.series(trace, spool, "spool travel (0 = fully open, full stroke = closed)", lu,
                    w[0], w[1]), spool + " [" + lu.symbol() + "]  closing ->", 2);
        }
        if (trace.indexOf(pilot) >= 0) {
            add(p, k++, TraceCharts.series(trace, pilot, "pilot lift (0 = seated, closed)", lu, w[0], w[1]),
                    pilot + " [" + lu.symbol() + "]  opening ->", 1);
        }
        return k == 0 ? null : p;
    }

    private static void add(XYPlot p, int k, XYSeries s, String label, int colour) {
        NumberAxis y = new NumberAxis(label);
        y.setAutoRangeIncludesZero(true);
        y.setAutoRangeMinimumSize(1e-9);
        y.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        TraceCharts.style(r, 0, 1.6f);
        r.setSeriesPaint(0, TraceCharts.colour(colour));
        p.setDataset(k, new XYSeriesCollection(s));
        p.setRangeAxis(k, y);
        p.mapDatasetToRangeAxis(k, k);
        p.setRenderer(k, r);
        y.setLabelPaint(TraceCharts.colour(colour));
    }
}
