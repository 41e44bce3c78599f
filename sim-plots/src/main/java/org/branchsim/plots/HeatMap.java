package org.branchsim.plots;

import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.data.xy.DefaultXYZDataset;

/**
 * A metric over a two-parameter sweep grid as a heat map: one cell per grid point, coloured by the metric from a
 * sequential {@link ColourMap} (lowest darkest; a failed point, NaN, grey), with a colour bar naming the metric
 * and its unit, each cell labelled with its value. The axes are the grid's indices labelled with the parameter values as written in the study, so
 * uneven or logarithmic grids get cells of one size. Carries the simulation caution.
 */
public final class HeatMap {

    /** Figure height, px. */
    public static final int HEIGHT = 620;

    private HeatMap() {
    }

    /**
     * @param xValues labels of the first parameter's values (columns)
     * @param yValues labels of the second parameter's values (rows)
     * @param metric metric at [i][j] = (xValues[i], yValues[j]); NaN for a failed point
     * @param xLabel first parameter with its unit
     * @param yLabel second parameter with its unit
     * @param metricLabel metric with its unit (colour bar)
     * @param title figure title
     * @param file the PNG
     * @throws IOException when the file cannot be written
     */
    public static void save(List<String> xValues, List<String> yValues, double[][] metric, String xLabel,
                            String yLabel, String metricLabel, String title, Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart(xValues, yValues, metric, xLabel, yLabel, metricLabel, title),
                TraceCharts.WIDTH, HEIGHT);
    }

    /** @return the heat map before it is saved */
    static JFreeChart chart(List<String> xValues, List<String> yValues, double[][] metric, String xLabel,
                            String yLabel, String metricLabel, String title) {
        int nx = xValues.size();
        int ny = yValues.size();
        if (metric.length != nx) {
            throw new IllegalArgumentException(metric.length + " columns of values for " + nx + " grid columns");
        }
        double[][] series = new double[3][nx * ny];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < nx; i++) {
            if (metric[i].length != ny) {
                throw new IllegalArgumentException(metric[i].length + " values for " + ny + " grid rows");
            }
            for (int j = 0; j < ny; j++) {
                int k = i * ny + j;
                series[0][k] = i;
                series[1][k] = j;
                series[2][k] = metric[i][j];
                if (Double.isFinite(metric[i][j])) {
                    lo = Math.min(lo, metric[i][j]);
                    hi = Math.max(hi, metric[i][j]);
                }
            }
        }
        if (lo > hi) {
            lo = 0;
            hi = 0;
        }
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries(metricLabel, series);
        ColourMap map = new ColourMap(lo, hi);
        XYBlockRenderer renderer = new XYBlockRenderer();
        renderer.setPaintScale(map);
        renderer.setBlockWidth(1);
        renderer.setBlockHeight(1);
        SymbolAxis x = new SymbolAxis(xLabel, xValues.toArray(new String[0]));
        SymbolAxis y = new SymbolAxis(yLabel, yValues.toArray(new String[0]));
        x.setGridBandsVisible(false);
        y.setGridBandsVisible(false);
        x.setRange(-0.5, nx - 0.5);
        y.setRange(-0.5, ny - 0.5);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        Font font = new Font(Font.SANS_SERIF, Font.PLAIN, nx * ny > 100 ? 9 : 12);
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                double v = metric[i][j];
                XYTextAnnotation label = new XYTextAnnotation(Double.isFinite(v)
                        ? String.format(Locale.ROOT, "%.3g", v) : "failed", i, j);
                label.setFont(font);
                // dark text on the light end of the map, white on the dark end (lightness rises along the map)
                label.setPaint(!Double.isFinite(v) || hi == lo || (v - lo) / (hi - lo) > 0.55 ? Color.BLACK
                        : Color.WHITE);
                plot.addAnnotation(label);
            }
        }
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, false);
        chart.addSubtitle(SweepOverlay.colourBar(map, metricLabel));
        return TraceCharts.withCaution(chart);
    }
}
