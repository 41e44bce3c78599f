package org.branchsim.plots;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.util.ShapeUtils;
import org.jfree.data.general.DatasetUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * One signal of every variant of a sweep on one axis. Up to {@link #MAX_LEGEND} variants are told apart by the
 * distinct colours and dashes of {@link TraceCharts#compare} and a legend; past that, a legend grows too long to
 * read, so the curves are ordered by the varied value and coloured from a sequential {@link ColourMap} (lowest
 * value darkest) with a colour bar on the right, labelled with the varied parameter and its unit, in place of the
 * legend. Past {@link #MAX_DRAWN} variants, that many are drawn, evenly spaced in the order of the varied value
 * (the lowest and the highest always among them), and a subtitle says how many of how many: a thousand curves
 * would hide each other and cost some hundred megabytes of chart data. Carries the simulation caution. The
 * landing overlay ({@link #saveLanding}) draws the same curves, colours and colour bar zoomed on the landing of a
 * reducing valve's outlet pressure, with each variant's peak and the setting marked. Pressures in the display unit
 * of the unit system, time in s.
 */
public final class SweepOverlay {

    /** Most variants drawn with a legend. */
    public static final int MAX_LEGEND = 6;
    /** Most variants drawn in one colour-mapped overlay. */
    public static final int MAX_DRAWN = 100;

    private SweepOverlay() {
    }

    /**
     * A run with the value of the varied parameter it was run with.
     *
     * @param run the labelled trace
     * @param value the varied value in the unit of the colour bar (NaN when it is not a number)
     */
    public record Variant(TraceCharts.Labelled run, double value) {
    }

    /**
     * Writes the overlay as PNG.
     *
     * @param variants the runs (at least one, each with the signal)
     * @param signal signal name
     * @param varied colour bar label: the varied parameter with its unit, e.g. "dampingOrifice.diameter [mm]"
     * @param title figure title
     * @param units unit system of the value axis
     * @param file the PNG
     * @throws IOException when the file cannot be written
     */
    public static void save(List<Variant> variants, String signal, String varied, String title, UnitSystem units,
                            Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart(variants, signal, varied, title, units), TraceCharts.WIDTH,
                TraceCharts.PANEL_HEIGHT + 160);
    }

    /** @return the overlay chart before it is saved */
    static JFreeChart chart(List<Variant> variants, String signal, String varied, String title, UnitSystem units) {
        return drawn(variants, signal, varied, title, units, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY)
                .chart();
    }

    /** An overlay chart with the variants in the order of its series (series k is order.get(k)). */
    private record Drawn(JFreeChart chart, List<Variant> order) {
    }

    /** @return the overlay of the samples in [from, to], its series in the order returned */
    private static Drawn drawn(List<Variant> variants, String signal, String varied, String title, UnitSystem units,
                               double from, double to) {
        boolean numeric = variants.stream().allMatch(v -> Double.isFinite(v.value()));
        if (variants.size() <= MAX_LEGEND || !numeric) {
            return new Drawn(TraceCharts.compareChart(variants.stream().map(Variant::run).toList(), signal, title,
                    units, from, to), variants);
        }
        List<Variant> all = new ArrayList<>(variants);
        all.sort(Comparator.comparingDouble(Variant::value));
        List<Variant> sorted = evenlySpaced(all, MAX_DRAWN);
        JFreeChart chart = TraceCharts.compareChart(sorted.stream().map(Variant::run).toList(), signal, title, units,
                from, to);
        chart.removeLegend();
        double lo = sorted.get(0).value();
        double hi = sorted.get(sorted.size() - 1).value();
        ColourMap map = new ColourMap(lo, hi);
        XYPlot plot = chart.getXYPlot();
        XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) plot.getRenderer();
        BasicStroke solid = new BasicStroke(1.4f);
        for (int k = 0; k < sorted.size(); k++) {
            r.setSeriesPaint(k, map.getPaint(sorted.get(k).value()));
            r.setSeriesStroke(k, solid);
        }
        chart.addSubtitle(colourBar(map, varied));
        if (sorted.size() < all.size()) {
            chart.addSubtitle(new TextTitle(sorted.size() + " of " + all.size()
                    + " variants drawn, evenly spaced by " + varied, new Font(Font.SANS_SERIF, Font.PLAIN, 11)));
        }
        return new Drawn(chart, sorted);
    }

    /**
     * A variant of a sweep with what its landing is found from.
     *
     * @param variant the run and its varied value
     * @param setting the variant's setting of the valve whose outlet is drawn, Pa (a variant may change it)
     * @param peak the peak outlet pressure the variant's metrics report (over the metrics window), Pa; NaN to take
     *        the largest sample of the trace
     */
    public record Landed(Variant variant, double setting, double peak) {
    }

    /**
     * Writes the overlay zoomed on the landing ({@link LandingWindow}) as PNG: every variant's outlet pressure from
     * shortly before the earliest rise to shortly after the latest settling, the value axis fitted to the samples
     * shown, each variant's peak marked by a small triangle in its colour, and the setting line (with the settling
     * band when every variant has the same setting; one line per setting otherwise).
     *
     * @param variants the runs (at least one, each with the signal)
     * @param signal a reducing valve's outlet pressure signal
     * @param varied colour bar label: the varied parameter with its unit
     * @param title figure title
     * @param units unit system of the value axis
     * @param file the PNG
     * @throws IOException when the file cannot be written
     */
    public static void saveLanding(List<Landed> variants, String signal, String varied, String title,
                                   UnitSystem units, Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), landingChart(variants, signal, varied, title, units),
                TraceCharts.WIDTH, TraceCharts.PANEL_HEIGHT + 180);
    }

    /** Most distinct settings drawn as lines when the variants' settings differ. */
    static final int MAX_SETTING_LINES = 6;

    /** @return the landing overlay before it is saved */
    static JFreeChart landingChart(List<Landed> variants, String signal, String varied, String title,
                                   UnitSystem units) {
        if (variants.isEmpty()) {
            throw new IllegalArgumentException("no variants to draw");
        }
        Map<Variant, LandingWindow.Landing> landings = new IdentityHashMap<>();
        List<Double> settings = new ArrayList<>();
        double first = Double.POSITIVE_INFINITY;
        double last = Double.NEGATIVE_INFINITY;
        for (Landed v : variants) {
            Trace trace = v.variant().run().trace();
            int i = trace.indexOf(signal);
            if (i < 0) {
                throw new IllegalArgumentException("run " + v.variant().run().label() + " has no signal " + signal);
            }
            double[] t = trace.times();
            landings.put(v.variant(), LandingWindow.of(t, trace.series(i), v.setting(), v.peak()));
            first = Math.min(first, t[0]);
            last = Math.max(last, t[t.length - 1]);
            if (settings.stream().noneMatch(s -> sameSetting(s, v.setting()))) {
                settings.add(v.setting());
            }
        }
        double[] w = LandingWindow.of(List.copyOf(landings.values()), first, last);
        Drawn d = drawn(variants.stream().map(Landed::variant).toList(), signal, varied, title, units, w[0], w[1]);
        JFreeChart chart = d.chart();
        XYPlot plot = chart.getXYPlot();
        ((NumberAxis) plot.getDomainAxis()).setRange(w[0], w[1]);
        Unit pu = units.displayUnit(Dimension.PRESSURE);
        XYSeriesCollection peaks = new XYSeriesCollection();
        XYLineAndShapeRenderer marks = new XYLineAndShapeRenderer(false, true);
        marks.setDefaultSeriesVisibleInLegend(false);
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer();
        double lowPeak = Double.POSITIVE_INFINITY;
        double highPeak = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < d.order().size(); k++) {
            LandingWindow.Landing l = landings.get(d.order().get(k));
            XYSeries s = new XYSeries("peak " + k, false, true);
            if (l.peakTime() >= w[0] && l.peakTime() <= w[1]) {
                s.add(l.peakTime(), pu.fromSi(l.peak()));
            }
            peaks.addSeries(s);
            marks.setSeriesPaint(k, lines.lookupSeriesPaint(k));
            marks.setSeriesShape(k, ShapeUtils.createDownTriangle(4.5f));
            lowPeak = Math.min(lowPeak, pu.fromSi(l.peak()));
            highPeak = Math.max(highPeak, pu.fromSi(l.peak()));
        }
        plot.setDataset(1, peaks);
        plot.setRenderer(1, marks);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        double low = DatasetUtils.findMinimumRangeValue(plot.getDataset(0)).doubleValue();
        double high = Math.max(DatasetUtils.findMaximumRangeValue(plot.getDataset(0)).doubleValue(), highPeak);
        boolean common = settings.size() == 1;
        if (common) {
            double setting = settings.get(0);
            double bandLow = pu.fromSi(setting * (1 - ReducingValveMetrics.BAND));
            double bandHigh = pu.fromSi(setting * (1 + ReducingValveMetrics.BAND));
            low = Math.min(low, bandLow);
            high = Math.max(high, bandHigh);
            IntervalMarker band = new IntervalMarker(bandLow, bandHigh, SETTING_COLOUR, new BasicStroke(0.5f),
                    null, null, 0.18f);
            band.setLabel(String.format(Locale.ROOT, "settling band +-%.0f %% of the setting",
                    100 * ReducingValveMetrics.BAND));
            band.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            band.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
            band.setLabelFont(SMALL);
            plot.addRangeMarker(band, Layer.BACKGROUND);
            plot.addRangeMarker(settingLine(pu.fromSi(setting), pu), Layer.FOREGROUND);
        } else {
            settings.sort(Comparator.naturalOrder());
            for (double s : evenlySpacedValues(settings, MAX_SETTING_LINES)) {
                plot.addRangeMarker(settingLine(pu.fromSi(s), pu), Layer.FOREGROUND);
            }
        }
        NumberAxis y = (NumberAxis) plot.getRangeAxis();
        double pad = high > low ? high - low : Math.max(Math.abs(high) * 0.05, 1e-9);
        y.setAutoRange(false);
        y.setRange(low - 0.06 * pad, high + 0.12 * pad);
        chart.addSubtitle(new TextTitle(String.format(Locale.ROOT, "triangles mark each variant's peak (%.2f to "
                + "%.2f %s); from %.3f s, before the earliest rise through %.0f %% of the setting, to %.3f s, after "
                + "the latest settling into +-%.0f %% of it%s", lowPeak, highPeak, pu.symbol(), w[0],
                100 * ReducingValveMetrics.RISE_FRACTION, w[1], 100 * ReducingValveMetrics.BAND,
                common ? "" : " (settings differ: one line per setting, no band)"), SMALL));
        return chart;
    }

    private static final Color SETTING_COLOUR = new Color(0x2e8b57);
    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    /** @return true when two settings (Pa) are the same to within rounding */
    private static boolean sameSetting(double a, double b) {
        return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
    }

    private static ValueMarker settingLine(double setting, Unit pu) {
        ValueMarker line = new ValueMarker(setting, SETTING_COLOUR, new BasicStroke(1.4f));
        line.setLabel(String.format(Locale.ROOT, "setting %.2f %s", setting, pu.symbol()));
        line.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        line.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        line.setLabelFont(SMALL);
        return line;
    }

    /** @return at most {@code most} of the sorted values, evenly spaced, the first and last included */
    private static List<Double> evenlySpacedValues(List<Double> sorted, int most) {
        int n = sorted.size();
        if (n <= most) {
            return sorted;
        }
        List<Double> out = new ArrayList<>(most);
        for (int k = 0; k < most; k++) {
            out.add(sorted.get((int) Math.round(k * (n - 1.0) / (most - 1.0))));
        }
        return out;
    }

    /**
     * @param sorted variants in order of their value
     * @param most the most to keep
     * @return all of them when there are no more than {@code most}; else {@code most} of them at evenly spaced
     *         positions, the first and the last included
     */
    static List<Variant> evenlySpaced(List<Variant> sorted, int most) {
        int n = sorted.size();
        if (n <= most) {
            return sorted;
        }
        List<Variant> out = new ArrayList<>(most);
        for (int k = 0; k < most; k++) {
            out.add(sorted.get((int) Math.round(k * (n - 1.0) / (most - 1.0))));
        }
        return out;
    }

    /** @return a vertical colour bar on the right of the plot, its axis labelled with the quantity it maps */
    static PaintScaleLegend colourBar(ColourMap map, String label) {
        NumberAxis axis = new NumberAxis(label);
        axis.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        double span = map.getUpperBound() - map.getLowerBound();
        double pad = span > 0 ? 0 : Math.max(Math.abs(map.getLowerBound()) * 0.05, 1e-12);
        axis.setRange(map.getLowerBound() - pad, map.getUpperBound() + pad);
        PaintScaleLegend legend = new PaintScaleLegend(map, axis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(org.jfree.chart.axis.AxisLocation.BOTTOM_OR_RIGHT);
        legend.setStripWidth(14);
        legend.setSubdivisionCount(128);
        legend.setMargin(new RectangleInsets(8, 6, 8, 6));
        return legend;
    }
}
