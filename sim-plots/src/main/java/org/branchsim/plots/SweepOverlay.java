package org.branchsim.plots;

import java.awt.BasicStroke;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * One signal of every variant of a sweep on one axis. Up to {@link #MAX_LEGEND} variants are told apart by the
 * distinct colours and dashes of {@link TraceCharts#compare} and a legend; past that, a legend grows too long to
 * read, so the curves are ordered by the varied value and coloured from a sequential {@link ColourMap} (lowest
 * value darkest) with a colour bar on the right, labelled with the varied parameter and its unit, in place of the
 * legend. Past {@link #MAX_DRAWN} variants, that many are drawn, evenly spaced in the order of the varied value
 * (the lowest and the highest always among them), and a subtitle says how many of how many: a thousand curves
 * would hide each other and cost some hundred megabytes of chart data. Carries the simulation caution.
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
        boolean numeric = variants.stream().allMatch(v -> Double.isFinite(v.value()));
        if (variants.size() <= MAX_LEGEND || !numeric) {
            return TraceCharts.compareChart(variants.stream().map(Variant::run).toList(), signal, title, units,
                    Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        }
        List<Variant> all = new ArrayList<>(variants);
        all.sort(Comparator.comparingDouble(Variant::value));
        List<Variant> sorted = evenlySpaced(all, MAX_DRAWN);
        JFreeChart chart = TraceCharts.compareChart(sorted.stream().map(Variant::run).toList(), signal, title, units,
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
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
            chart.addSubtitle(new org.jfree.chart.title.TextTitle(sorted.size() + " of " + all.size()
                    + " variants drawn, evenly spaced by " + varied, new Font(Font.SANS_SERIF, Font.PLAIN, 11)));
        }
        return chart;
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
