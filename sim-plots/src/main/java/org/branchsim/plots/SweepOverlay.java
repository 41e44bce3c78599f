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
 * legend. Carries the simulation caution.
 */
public final class SweepOverlay {

    /** Most variants drawn with a legend. */
    public static final int MAX_LEGEND = 6;

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
        List<Variant> sorted = new ArrayList<>(variants);
        sorted.sort(Comparator.comparingDouble(Variant::value));
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
        return chart;
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
