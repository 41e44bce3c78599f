package org.branchsim.plots;

import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A few cycles of an oscillation, one signal from one or more runs on one axis (as {@link TraceCharts#compare}),
 * with the seat and stop impacts of each run marked as short vertical ticks on its curve in its colour (labelled
 * once per run in the legend) and a subtitle saying how far apart the samples are. Values in the display unit of
 * the signal's dimension, time in s. Carries the simulation caution.
 */
public final class CycleChart {

    /** Half-height of an impact tick, px. */
    static final double TICK_HALF_HEIGHT = 7.0;

    private CycleChart() {
    }

    /**
     * One run drawn, with the times its members struck a seat or stop.
     *
     * @param run the labelled trace
     * @param impacts times of the impacts, s (any order; those outside the window are left out)
     * @param impactLabel legend label of its impact ticks, e.g. "seat/stop impacts, as is (reducer.pilot)"
     */
    public record Run(TraceCharts.Labelled run, List<Double> impacts, String impactLabel) {
    }

    /**
     * What one figure shows.
     *
     * @param runs the runs (at least one, each with the signal)
     * @param signal signal name
     * @param title figure title
     * @param sampling the subtitle saying the sample spacing drawn, e.g. "samples every 47.4 us"
     * @param units unit system of the value axis
     * @param from first time drawn, s
     * @param to last time drawn, s
     */
    public record Figure(List<Run> runs, String signal, String title, String sampling, UnitSystem units, double from,
                         double to) {

        /** @return the chart {@link #save} draws ({@link CycleChart#chart}) */
        public JFreeChart chart() {
            return CycleChart.chart(runs, signal, title, sampling, units, from, to);
        }

        /**
         * Writes the figure as PNG.
         *
         * @param file the PNG
         * @throws IOException when the file cannot be written
         */
        public void save(Path file) throws IOException {
            ChartUtils.saveChartAsPNG(file.toFile(), chart(), TraceCharts.WIDTH, TraceCharts.PANEL_HEIGHT + 180);
        }
    }

    /**
     * @param runs the runs (at least one, each with the signal)
     * @param signal signal name
     * @param title figure title
     * @param sampling the subtitle saying the sample spacing drawn, e.g. "samples every 47.4 us"
     * @param units unit system of the value axis
     * @param from first time drawn, s
     * @param to last time drawn, s
     * @return the chart, with its caution: dataset 0 holds one series per run, dataset 1 one series of impact
     *         ticks per run (empty when it has none in the window)
     */
    public static JFreeChart chart(List<Run> runs, String signal, String title, String sampling, UnitSystem units,
                                   double from, double to) {
        JFreeChart chart = TraceCharts.compareChart(runs.stream().map(Run::run).toList(), signal, title, units, from,
                to);
        XYPlot plot = chart.getXYPlot();
        ((NumberAxis) plot.getDomainAxis()).setRange(from, to);
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer();
        XYSeriesCollection ticks = new XYSeriesCollection();
        XYLineAndShapeRenderer marks = new XYLineAndShapeRenderer(false, true);
        Rectangle2D tick = new Rectangle2D.Double(-1.0, -TICK_HALF_HEIGHT, 2.0, 2 * TICK_HALF_HEIGHT);
        for (int k = 0; k < runs.size(); k++) {
            Run r = runs.get(k);
            Trace trace = r.run().trace();
            int i = trace.indexOf(signal);
            Unit u = units.displayUnit(trace.columns().get(i).dimension());
            XYSeries s = new XYSeries(r.impactLabel(), true, true);
            double[] t = trace.times();
            double[] v = trace.series(i);
            for (double at : r.impacts()) {
                if (at >= from && at <= to) {
                    s.add(at, u.fromSi(valueAt(t, v, at)));
                }
            }
            ticks.addSeries(s);
            marks.setSeriesPaint(k, lines.lookupSeriesPaint(k));
            marks.setSeriesShape(k, tick);
            marks.setSeriesVisibleInLegend(k, s.getItemCount() > 0);
        }
        plot.setDataset(1, ticks);
        plot.setRenderer(1, marks);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        chart.addSubtitle(new TextTitle(sampling, new Font(Font.SANS_SERIF, Font.PLAIN, 12)));
        return chart;
    }

    /** @return the samples linearly interpolated at time {@code at} (held at the ends) */
    static double valueAt(double[] t, double[] v, double at) {
        int k = Arrays.binarySearch(t, at);
        if (k >= 0) {
            return v[k];
        }
        int after = -k - 1;
        if (after == 0) {
            return v[0];
        }
        if (after >= t.length) {
            return v[t.length - 1];
        }
        double w = (at - t[after - 1]) / (t[after] - t[after - 1]);
        return v[after - 1] + w * (v[after] - v[after - 1]);
    }
}
