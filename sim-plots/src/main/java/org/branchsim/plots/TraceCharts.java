package org.branchsim.plots;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Draws time histories of a trace as PNG figures: several signals of one dimension overlaid on one axis, or
 * stacked on panels with a shared time axis when their scales differ (positions of a poppet and a piston).
 * Axes carry the display unit of the chosen unit system; every figure carries the simulation caution.
 */
public final class TraceCharts {

    /** Footnote on every figure. */
    public static final String CAUTION =
            "Simulation result, not a measurement: verify on the machine by test (ISO 4413).";
    /** Figure width, px. */
    public static final int WIDTH = 1100;
    /** Height of one panel, px. */
    public static final int PANEL_HEIGHT = 360;

    /**
     * Eight colours told apart also by readers with a colour-vision deficiency (after Okabe and Ito, "Color
     * Universal Design", 2008, with their yellow, weak on white, replaced by a brown); at most eight series share
     * a panel, so within a panel every series has its own colour.
     */
    private static final Color[] PALETTE = {
        new Color(0x0072b2), new Color(0xd55e00), new Color(0x009e73), new Color(0xe69f00),
        new Color(0xcc79a7), new Color(0x56b4e9), new Color(0x000000), new Color(0x8b5a2b)
    };
    /** Dash patterns cycled beside the colours (solid, dashed, dotted, dash-dot), px. */
    private static final float[][] DASHES = {null, {7f, 4f}, {2f, 3f}, {8f, 3f, 2f, 3f}};

    /** @return palette colour k */
    static Color colour(int k) {
        return PALETTE[k % PALETTE.length];
    }

    /**
     * Line style of series k: palette colour k, and a dash pattern that changes from one series to the next and
     * between passes through the palette, so that the first 32 series differ in colour or dash.
     */
    static void style(XYLineAndShapeRenderer renderer, int k, float width) {
        style(renderer, k, k, width);
    }

    /**
     * Gives series {@code index} of a panel the line style of series k of a figure: colour k, and a dash pattern
     * set by the index on the panel (the first series of a panel is solid) and the pass through the palette.
     */
    static void style(XYLineAndShapeRenderer renderer, int index, int k, float width) {
        renderer.setSeriesPaint(index, colour(k));
        float[] dash = DASHES[(index + k / PALETTE.length) % DASHES.length];
        renderer.setSeriesStroke(index, dash == null ? new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND)
                : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f));
        // one stroked path per series instead of one per segment: several times faster to draw, and dashes run on
        // along the curve instead of restarting at every sample
        renderer.setDrawSeriesLineAsPath(true);
    }

    /** White background, light grid. */
    static void grid(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xd0d0d0));
        plot.setRangeGridlinePaint(new Color(0xd0d0d0));
    }

    /**
     * @return one signal's samples in [from, to] in a display unit, keyed by a label, cut to the
     *         {@link PixelEnvelope} of the figure's width
     */
    static XYSeries series(Trace trace, String signal, String label, Unit unit, double from, double to) {
        return decimated(label, trace.times(), trace.series(trace.indexOf(signal)), unit, from, to);
    }

    /**
     * @param label series key
     * @param t sample times, s
     * @param v samples, SI
     * @param unit display unit (its conversion from SI increases with the value, so the envelope of the SI
     *        samples is the envelope of the shown ones)
     * @param from first time drawn, s
     * @param to last time drawn, s
     * @return the samples in [from, to] that the {@link PixelEnvelope} of a {@link #WIDTH} px figure keeps
     */
    static XYSeries decimated(String label, double[] t, double[] v, Unit unit, double from, double to) {
        XYSeries s = new XYSeries(label, false, true);
        for (int k : PixelEnvelope.indices(t, v, from, to, WIDTH)) {
            s.add(t[k], unit.fromSi(v[k]), false);
        }
        return s;
    }

    private TraceCharts() {
    }

    /**
     * Draws signals overlaid on one axis; all must share one dimension.
     *
     * @param trace the trace
     * @param signals signal names
     * @param title figure title
     * @param units unit system for the axis
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void overlay(Trace trace, List<String> signals, String title, UnitSystem units, Path file)
            throws IOException {
        save(overlayChart(trace, signals, title, units), file, PANEL_HEIGHT + 120);
    }

    /** @return the chart {@link #overlay} draws, with its caution, before it is saved */
    static JFreeChart overlayChart(Trace trace, List<String> signals, String title, UnitSystem units) {
        requireSignals(trace, signals);
        Dimension d = trace.columns().get(trace.indexOf(signals.get(0))).dimension();
        XYPlot plot = panel(trace, signals, units, axisLabel(signals.size() == 1 ? signals.get(0) : null, d, units));
        return withCaution(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true));
    }

    /**
     * Draws each signal on its own panel with a shared time axis.
     *
     * @param trace the trace
     * @param signals signal names
     * @param title figure title
     * @param units unit system for the axes
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void stacked(Trace trace, List<String> signals, String title, UnitSystem units, Path file)
            throws IOException {
        save(stackedChart(trace, signals, title, units), file, Math.max(PANEL_HEIGHT, 60 + 190 * signals.size()));
    }

    /** @return the chart {@link #stacked} draws, with its caution, before it is saved */
    static JFreeChart stackedChart(Trace trace, List<String> signals, String title, UnitSystem units) {
        requireSignals(trace, signals);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(timeAxis(trace));
        combined.setGap(8.0);
        int k = 0;
        for (String s : signals) {
            Dimension d = trace.columns().get(trace.indexOf(s)).dimension();
            XYPlot p = panel(trace, List.of(s), units, axisLabel(s, d, units));
            p.getRenderer().setSeriesPaint(0, PALETTE[k++ % PALETTE.length]);
            combined.add(p, 1);
        }
        return withCaution(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, combined, false));
    }

    private static void requireSignals(Trace trace, List<String> signals) {
        if (signals.isEmpty()) {
            throw new IllegalArgumentException("no signals to draw");
        }
        for (String s : signals) {
            if (trace.indexOf(s) < 0) {
                throw new IllegalArgumentException("the trace has no signal " + s);
            }
        }
    }

    private static String axisLabel(String signal, Dimension d, UnitSystem units) {
        Unit u = units.displayUnit(d);
        String what = signal != null ? signal : d.humanName();
        return what + " [" + u.symbol() + "]";
    }

    private static NumberAxis timeAxis() {
        NumberAxis t = new NumberAxis("time [s]");
        t.setAutoRangeIncludesZero(false);
        return t;
    }

    private static XYPlot panel(Trace trace, List<String> signals, UnitSystem units, String label) {
        XYSeriesCollection data = new XYSeriesCollection();
        double[] times = trace.times();
        for (String s : signals) {
            int i = trace.indexOf(s);
            Unit u = units.displayUnit(trace.columns().get(i).dimension());
            data.addSeries(decimated(s, times, trace.series(i), u, Double.NEGATIVE_INFINITY,
                    Double.POSITIVE_INFINITY));
        }
        NumberAxis y = new NumberAxis(label);
        y.setAutoRangeIncludesZero(false);
        y.setAutoRangeMinimumSize(1e-9);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int k = 0; k < signals.size(); k++) {
            style(renderer, k, 1.6f);
        }
        XYPlot plot = new XYPlot(data, timeAxis(trace), y, renderer);
        grid(plot);
        return plot;
    }

    /** @return a time axis from the first to the last sample of the trace, no margin past the end time */
    private static NumberAxis timeAxis(Trace trace) {
        NumberAxis t = timeAxis();
        double[] times = trace.times();
        if (times.length > 1 && times[times.length - 1] > times[0]) {
            t.setAutoRange(false);
            t.setRange(times[0], times[times.length - 1]);
        }
        return t;
    }

    /** Adds the white background and the caution footnote every figure carries. */
    static JFreeChart withCaution(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        TextTitle note = new TextTitle(CAUTION, new Font(Font.SANS_SERIF, Font.ITALIC, 11));
        note.setPosition(RectangleEdge.BOTTOM);
        note.setPaint(new Color(0x555555));
        chart.addSubtitle(note);
        return chart;
    }

    /**
     * Loads and initialises what drawing a figure needs (fonts, the rasteriser, the chart classes, the PNG encoder)
     * by drawing one small chart in memory and discarding it. Run on a spare thread while a simulation computes, it
     * takes that one-time cost off the path to the first figure. Never throws.
     */
    public static void warmUp() {
        try {
            XYSeries a = new XYSeries("a", false, true);
            XYSeries b = new XYSeries("b", false, true);
            for (int k = 0; k < 64; k++) {
                a.add(k, Math.sin(0.2 * k));
                b.add(k, Math.cos(0.2 * k));
            }
            XYSeriesCollection data = new XYSeriesCollection();
            data.addSeries(a);
            data.addSeries(b);
            XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
            style(renderer, 0, 1.6f);
            style(renderer, 1, 1.6f);
            XYPlot plot = new XYPlot(data, timeAxis(), new NumberAxis("value"), renderer);
            grid(plot);
            JFreeChart chart = withCaution(new JFreeChart("warm-up", plot));
            ChartUtils.writeChartAsPNG(java.io.OutputStream.nullOutputStream(), chart, 240, 160);
        } catch (IOException | RuntimeException e) {
            // only a warm-up: the figures themselves report any real failure
        }
    }

    private static void save(JFreeChart chart, Path file, int height) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart, WIDTH, height);
    }

    /**
     * Draws groups of signals on panels stacked over one time axis that ends at the trace's end time; each panel's
     * value axis is fitted to its signals from {@code fitFrom} on (after start-up), and a note under the title
     * names every panel whose start-up values fall outside its axis (clipped), with the extreme value and its time.
     *
     * @param trace the trace
     * @param panels groups of signals, one group per panel; the signals of a group share one dimension
     * @param title figure title
     * @param units unit system for the axes
     * @param fitFrom end of start-up, s (use the trace's start time to fit to all samples)
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void panels(Trace trace, List<List<SignalPanels.Drawn>> panels, String title, UnitSystem units,
                              double fitFrom, Path file) throws IOException {
        save(panelsChart(trace, panels, title, units, fitFrom), file,
                Math.max(PANEL_HEIGHT + 120, 110 + (panels.size() == 1 ? PANEL_HEIGHT : 230 * panels.size())));
    }

    /** @return the chart {@link #panels} draws, with its caution, before it is saved */
    static JFreeChart panelsChart(Trace trace, List<List<SignalPanels.Drawn>> panels, String title, UnitSystem units,
                                  double fitFrom) {
        if (panels.isEmpty() || panels.stream().anyMatch(List::isEmpty)) {
            throw new IllegalArgumentException("no signals to draw");
        }
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(timeAxis(trace));
        combined.setGap(10.0);
        List<String> clipped = new ArrayList<>();
        int k = 0;
        double[] t = trace.times();
        for (List<SignalPanels.Drawn> group : panels) {
            for (SignalPanels.Drawn d : group) {
                requireSignals(trace, List.of(d.signal()));
            }
            Dimension dim = trace.columns().get(trace.indexOf(group.get(0).signal())).dimension();
            Unit u = units.displayUnit(dim);
            XYSeriesCollection data = new XYSeriesCollection();
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
            for (int i = 0; i < group.size(); i++) {
                SignalPanels.Drawn d = group.get(i);
                data.addSeries(decimated(d.label(), t, trace.series(trace.indexOf(d.signal())), u, t[0],
                        t[t.length - 1]));
                style(r, i, k++, 1.5f);
            }
            // the axis is fitted to every sample, not to the envelope: each signal is read again, one at a time
            FittedRange range = FittedRange.of(t, group.size(), j -> {
                double[] shown = trace.series(trace.indexOf(group.get(j).signal()));
                for (int n = 0; n < shown.length; n++) {
                    shown[n] = u.fromSi(shown[n]);
                }
                return shown;
            }, fitFrom);
            String label = group.size() == 1 ? group.get(0).label() : dim.humanName();
            NumberAxis y = new NumberAxis(label + " [" + u.symbol() + "]");
            y.setAutoRange(false);
            y.setRange(range.low(), range.high());
            XYPlot p = new XYPlot(data, null, y, r);
            grid(p);
            combined.add(p, 1);
            if (range.clips()) {
                String which = panels.size() > 1
                        ? String.format(Locale.ROOT, "panel %d (%s)", combined.getSubplots().size(), label) : label;
                clipped.add(String.format(Locale.ROOT, "%s axis fitted to the signals from %.3g s on: %s %.4g %s "
                        + "at %.3f s is off the axis (clipped)", which, Math.max(fitFrom, t[0]),
                        range.clippedTime() < fitFrom ? "start-up value" : "short spike", range.clippedValue(),
                        u.symbol(), range.clippedTime()));
            }
        }
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, combined, true);
        for (String note : clipped) {
            TextTitle n = new TextTitle(note, new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            n.setPaint(new Color(0x8b0000));
            chart.addSubtitle(n);
        }
        return withCaution(chart);
    }

    /** A trace with the label it carries in a comparison. @param label legend label @param trace the trace */
    public record Labelled(String label, Trace trace) {
    }

    /**
     * Draws one signal from several runs on one axis (sweep overlays, before/after comparisons).
     *
     * @param runs labelled traces (at least one; every one must have the signal)
     * @param signal signal name
     * @param title figure title
     * @param units unit system for the axis
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void compare(List<Labelled> runs, String signal, String title, UnitSystem units, Path file)
            throws IOException {
        compare(runs, signal, title, units, file, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /**
     * Draws one signal from several runs on one axis over a stretch of time only (a zoom on a few cycles).
     *
     * @param runs labelled traces (at least one; every one must have the signal)
     * @param signal signal name
     * @param title figure title
     * @param units unit system for the axis
     * @param file PNG to write
     * @param from first time drawn, s
     * @param to last time drawn, s
     * @throws IOException when the file cannot be written
     */
    public static void compare(List<Labelled> runs, String signal, String title, UnitSystem units, Path file,
                               double from, double to) throws IOException {
        save(compareChart(runs, signal, title, units, from, to), file, PANEL_HEIGHT + 160);
    }

    /** @return the chart {@link #compare} draws, with its caution, before it is saved */
    static JFreeChart compareChart(List<Labelled> runs, String signal, String title, UnitSystem units, double from,
                                   double to) {
        if (runs.isEmpty()) {
            throw new IllegalArgumentException("no runs to compare");
        }
        XYSeriesCollection data = new XYSeriesCollection();
        Dimension d = null;
        for (Labelled r : runs) {
            int i = r.trace().indexOf(signal);
            if (i < 0) {
                throw new IllegalArgumentException("run " + r.label() + " has no signal " + signal);
            }
            d = r.trace().columns().get(i).dimension();
            Unit u = units.displayUnit(d);
            data.addSeries(decimated(r.label(), r.trace().times(), r.trace().series(i), u, from, to));
        }
        NumberAxis y = new NumberAxis(axisLabel(signal, d, units));
        y.setAutoRangeIncludesZero(false);
        y.setAutoRangeMinimumSize(1e-9);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int k = 0; k < runs.size(); k++) {
            style(renderer, k, 1.4f);
        }
        // the time axis spans the samples drawn, no margin past them (nor past the end time)
        NumberAxis t = timeAxis();
        double first = data.getDomainLowerBound(false);
        double last = data.getDomainUpperBound(false);
        if (last > first) {
            t.setAutoRange(false);
            t.setRange(first, last);
        }
        XYPlot plot = new XYPlot(data, t, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xd0d0d0));
        plot.setRangeGridlinePaint(new Color(0xd0d0d0));
        plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
        return withCaution(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, runs.size() <= 16));
    }

    /** @return the names of a trace's signals of one dimension that are not zero throughout, in trace order */
    public static List<String> signalsOf(Trace trace, Dimension d) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < trace.columns().size(); i++) {
            Trace.Column c = trace.columns().get(i);
            if (c.dimension() == d && !allZero(trace.series(i))) {
                out.add(c.name());
            }
        }
        return out;
    }

    private static boolean allZero(double[] values) {
        for (double v : values) {
            if (v != 0.0) {
                return false;
            }
        }
        return true;
    }
}
