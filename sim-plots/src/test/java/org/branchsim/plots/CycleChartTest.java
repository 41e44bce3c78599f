package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The few-cycles figure on a synthetic chatter: a poppet lift that follows |sin(2 pi f t)| (a full-wave rectified
 * sine, touching zero, its seat, twice per period of the sine) sampled 100 times per period; the impacts are the
 * zeros, at t = k / (2 f). Lengths in mm (1 mm = 1e-3 m).
 */
class CycleChartTest {

    private static final double F = 500.0;
    private static final double DT = 1 / (100 * F);
    private static final double LIFT = 50e-6;

    private static Trace chatter(double end) {
        Trace tr = new Trace(List.of(new Trace.Column("v.pilot.x", Dimension.LENGTH)));
        for (int k = 0; k * DT <= end + 1e-12; k++) {
            double t = k * DT;
            tr.add(t, new double[] {LIFT * Math.abs(Math.sin(2 * Math.PI * F * t))});
        }
        return tr;
    }

    @Test
    void theImpactsInsideTheWindowAreTickedOnTheCurveAndTheSpacingIsStated() {
        double from = 0.0101;
        double to = 0.0221;
        List<Double> impacts = new ArrayList<>();
        for (int k = 0; k <= 30; k++) {
            impacts.add(k / (2 * F));
        }
        List<CycleChart.Run> runs = List.of(new CycleChart.Run(new TraceCharts.Labelled("as run", chatter(0.03)),
                impacts, "seat/stop impacts, as run"), new CycleChart.Run(new TraceCharts.Labelled("after",
                chatter(0.03)), List.of(), "seat/stop impacts, after"));
        JFreeChart chart = new CycleChart.Figure(runs, "v.pilot.x", "chatter", "samples every 20 us",
                UnitSystem.METRIC, from, to).chart();
        XYPlot plot = chart.getXYPlot();
        assertEquals(from, plot.getDomainAxis().getLowerBound(), 1e-12);
        assertEquals(to, plot.getDomainAxis().getUpperBound(), 1e-12);
        assertEquals(2, plot.getDataset(0).getSeriesCount(), "one curve per run");
        XYDataset ticks = plot.getDataset(1);
        // zeros of |sin| at k / 1000 s inside 10.1 ms .. 22.1 ms: k = 11 .. 22
        assertEquals(12, ticks.getItemCount(0));
        assertEquals(0, ticks.getItemCount(1));
        for (int i = 0; i < ticks.getItemCount(0); i++) {
            assertEquals((11 + i) / (2 * F), ticks.getXValue(0, i), 1e-12);
            assertEquals(0.0, ticks.getYValue(0, i), 1e-3 * LIFT * 1e3, "on the curve, at the seat");
        }
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer(0);
        XYLineAndShapeRenderer marks = (XYLineAndShapeRenderer) plot.getRenderer(1);
        assertEquals(lines.lookupSeriesPaint(0), marks.lookupSeriesPaint(0), "ticks in the run's colour");
        List<String> legend = new ArrayList<>();
        for (int i = 0; i < plot.getLegendItems().getItemCount(); i++) {
            legend.add(plot.getLegendItems().get(i).getLabel());
        }
        assertTrue(legend.contains("seat/stop impacts, as run"), legend.toString());
        assertFalse(legend.contains("seat/stop impacts, after"), "no legend entry for a run without impacts");
        boolean said = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            said |= chart.getSubtitle(i) instanceof TextTitle t && t.getText().equals("samples every 20 us");
        }
        assertTrue(said, "the sample spacing is stated");
    }

    @Test
    void valuesBetweenSamplesAreInterpolatedLinearly() {
        double[] t = {0.0, 1.0, 2.0};
        double[] v = {0.0, 10.0, 30.0};
        assertEquals(5.0, CycleChart.valueAt(t, v, 0.5), 1e-12);
        assertEquals(20.0, CycleChart.valueAt(t, v, 1.5), 1e-12);
        assertEquals(10.0, CycleChart.valueAt(t, v, 1.0), 1e-12);
        assertEquals(30.0, CycleChart.valueAt(t, v, 5.0), 1e-12, "held past the end");
    }
}
