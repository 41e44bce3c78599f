package org.branchsim.plots;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.statistics.HistogramDataset;

/**
 * Draws the distribution of one metric over the runs of a tolerance study as a PNG histogram: equal bins from the
 * smallest to the largest value (in the metric's own unit), the number of runs in each.
 */
public final class HistogramChart {

    private HistogramChart() {
    }

    /**
     * @param values the metric's values (finite)
     * @param bins number of bins (at least 1)
     * @param title figure title
     * @param axisLabel metric name with its unit
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void save(double[] values, int bins, String title, String axisLabel, Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart(values, bins, title, axisLabel), TraceCharts.WIDTH,
                TraceCharts.PANEL_HEIGHT + 120);
    }

    /** @return the chart {@link #save} draws, with its caution, before it is saved */
    static JFreeChart chart(double[] values, int bins, String title, String axisLabel) {
        if (values.length == 0 || bins < 1) {
            throw new IllegalArgumentException("a histogram needs values and at least one bin");
        }
        HistogramDataset data = new HistogramDataset();
        double lo = Double.MAX_VALUE;
        double hi = -Double.MAX_VALUE;
        for (double v : values) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        if (hi <= lo) {
            double pad = Math.max(Math.abs(lo) * 1e-6, 1e-12);
            lo -= pad;
            hi += pad;
        }
        data.addSeries(axisLabel, values, bins, lo, hi);
        JFreeChart chart = ChartFactory.createHistogram(title, axisLabel, "runs", data, PlotOrientation.VERTICAL,
                false, false, false);
        XYPlot plot = (XYPlot) chart.getPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(new Color(0xd0d0d0));
        XYBarRenderer renderer = (XYBarRenderer) plot.getRenderer();
        renderer.setBarPainter(new StandardXYBarPainter());
        renderer.setSeriesPaint(0, new Color(0x1f5fa8));
        renderer.setShadowVisible(false);
        chart.setBackgroundPaint(Color.WHITE);
        TextTitle note = new TextTitle(TraceCharts.CAUTION);
        note.setPosition(RectangleEdge.BOTTOM);
        chart.addSubtitle(note);
        return chart;
    }
}
