package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.Range;
import org.junit.jupiter.api.Test;

/**
 * Readable standard figures (the requirements of issue 13, item 3; the layout rules themselves are our choice,
 * common practice, no source): identical signals drawn once, flows below a tenth of the largest on their own panel,
 * at most eight series per panel each with its own colour and dash, value axes fitted to the signals after
 * start-up with clipped start-up values named, and the time axis ending at the end time. Signals are analytic
 * (constants, a sine whose extremes are its mean +- amplitude), converted to display units by the exact factors of
 * NIST Special Publication 811 (2008), Appendix B: 1 bar = 1e5 Pa, 1 L/min = 1e-3/60 m^3/s.
 */
class SignalPanelsTest {

    private static final double DT = 1e-3;
    private static final int SAMPLES = 1001;
    private static final double LPM = 1e-3 / 60;
    private static final double FIT_FROM = 0.2;

    private static double sine(double t) {
        return 50e5 + 10e5 * Math.sin(2 * Math.PI * 5 * t);
    }

    /**
     * 1 s: a node pressure (a sine, with a 150 bar start-up spike at 10 ms), a valve port pressure identical to it,
     * another pressure, a 20 L/min main flow, a 0.3 L/min drain flow with a 2 ms spike of 5 L/min at 0.5 s after
     * start-up, and a 0.01 L/min leakage.
     */
    private static Trace trace() {
        Trace tr = new Trace(List.of(new Trace.Column("line.p", Dimension.PRESSURE),
                new Trace.Column("prv.p.in", Dimension.PRESSURE), new Trace.Column("out.p", Dimension.PRESSURE),
                new Trace.Column("main.q", Dimension.VOLUME_FLOW), new Trace.Column("prv.drain.q", Dimension.VOLUME_FLOW),
                new Trace.Column("cyl.leak", Dimension.VOLUME_FLOW)));
        for (int k = 0; k < SAMPLES; k++) {
            double t = k * DT;
            double p = k == 10 ? 150e5 : sine(t);
            double drain = (k == 500 || k == 501) ? 5 * LPM : 0.3 * LPM;
            tr.add(t, new double[] {p, p, 30e5, 20 * LPM, drain, 0.01 * LPM});
        }
        return tr;
    }

    @Test
    void identicalSignalsAreDrawnOnceUnderBothNames() {
        List<SignalPanels.Drawn> drawn = SignalPanels.distinct(trace(), List.of("line.p", "prv.p.in", "out.p"));
        assertEquals(List.of(new SignalPanels.Drawn("line.p", "line.p = prv.p.in"),
                new SignalPanels.Drawn("out.p", "out.p")), drawn);
    }

    @Test
    void flowsBelowATenthOfTheLargestGetTheirOwnPanelEvenWithAShortSpike() {
        Trace tr = trace();
        List<SignalPanels.Drawn> flows = SignalPanels.distinct(tr, List.of("main.q", "prv.drain.q", "cyl.leak"));
        List<List<SignalPanels.Drawn>> panels = SignalPanels.bySize(tr, flows, FIT_FROM);
        assertEquals(2, panels.size());
        assertEquals(List.of("main.q"), panels.get(0).stream().map(SignalPanels.Drawn::signal).toList());
        assertEquals(List.of("prv.drain.q", "cyl.leak"), panels.get(1).stream().map(SignalPanels.Drawn::signal).toList());
    }

    @Test
    void noPanelCarriesMoreThanEightSeries() {
        List<SignalPanels.Drawn> many = new ArrayList<>();
        for (int i = 0; i < 17; i++) {
            many.add(new SignalPanels.Drawn("s" + i, "s" + i));
        }
        List<List<SignalPanels.Drawn>> groups = SignalPanels.limited(many);
        assertEquals(3, groups.size(), "17 series need three panels of at most 8");
        assertEquals(17, groups.stream().mapToInt(List::size).sum());
        assertTrue(groups.stream().allMatch(g -> g.size() <= 8 && g.size() >= 5), "spread evenly");
        assertEquals(many.get(0), groups.get(0).get(0));
        assertEquals(many.get(16), groups.get(2).get(groups.get(2).size() - 1));
    }

    @Test
    void theAxisFitsTheSineAfterStartUpAndNamesTheClippedSpike() {
        double[] t = new double[SAMPLES];
        double[] v = new double[SAMPLES];
        for (int k = 0; k < SAMPLES; k++) {
            t[k] = k * DT;
            v[k] = k == 10 ? 150.0 : sine(t[k]) / 1e5;
        }
        FittedRange r = FittedRange.of(t, List.of(v), FIT_FROM);
        // the sine spans 40 to 60 bar; the central 99 % of it spans nearly all of that
        assertTrue(r.low() < 40.0 && r.low() > 40.0 - 0.1 * 20.0, "low " + r.low());
        assertTrue(r.high() > 60.0 && r.high() < 60.0 + 0.1 * 20.0, "high " + r.high());
        assertTrue(r.clips());
        assertEquals(150.0, r.clippedValue(), 0.0);
        assertEquals(0.010, r.clippedTime(), 1e-12);
        // a genuine peak after start-up, within one central span of the range, stays on the axis
        v[600] = 75.0;
        FittedRange withPeak = FittedRange.of(t, List.of(v), FIT_FROM);
        assertTrue(withPeak.high() > 75.0, "peak on the axis: " + withPeak.high());
        assertThrows(IllegalArgumentException.class, () -> FittedRange.of(t, List.of(), FIT_FROM));
    }

    @Test
    void theFigureDrawsThePanelsWithFittedAxesDistinctStylesAndATimeAxisEndingAtTheEnd() {
        Trace tr = trace();
        List<List<SignalPanels.Drawn>> panels = new ArrayList<>(SignalPanels.limited(
                SignalPanels.distinct(tr, List.of("line.p", "prv.p.in", "out.p"))));
        JFreeChart chart = TraceCharts.panelsChart(tr, panels, "pressures", UnitSystem.METRIC, FIT_FROM);
        CombinedDomainXYPlot combined = (CombinedDomainXYPlot) chart.getPlot();
        Range time = combined.getDomainAxis().getRange();
        assertEquals(0.0, time.getLowerBound(), 0.0);
        assertEquals((SAMPLES - 1) * DT, time.getUpperBound(), 1e-12, "ends at the end time");
        List<XYPlot> plots = combined.getSubplots();
        assertEquals(1, plots.size());
        XYPlot p = plots.get(0);
        assertEquals(2, p.getDataset().getSeriesCount(), "the duplicate is drawn once");
        assertEquals("line.p = prv.p.in", p.getDataset().getSeriesKey(0));
        assertEquals(SAMPLES, p.getDataset().getItemCount(0));
        assertEquals(sine(0.3) / 1e5, p.getDataset().getYValue(0, 300), 1e-9);
        Range y = p.getRangeAxis().getRange();
        assertTrue(y.getUpperBound() < 70.0 && y.getUpperBound() > 60.0, "fitted, not stretched to 150 bar: " + y);
        assertTrue(y.getLowerBound() < 30.0 && y.getLowerBound() > 28.0, "holds out.p = 30 bar: " + y);
        assertEquals("pressure [bar]", p.getRangeAxis().getLabel());
        XYItemRenderer r = p.getRenderer();
        assertFalse(r.getSeriesPaint(0).equals(r.getSeriesPaint(1)), "colours differ");
        assertFalse(r.getSeriesStroke(0).equals(r.getSeriesStroke(1)), "dashes differ");
        boolean note = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof TextTitle tt && tt.getText().contains("start-up value 150.0 bar at 0.010 s")) {
                note = true;
            }
        }
        assertTrue(note, "the clipped start-up spike is named");
        assertThrows(IllegalArgumentException.class,
                () -> TraceCharts.panelsChart(tr, List.of(), "x", UnitSystem.METRIC, 0.0));
    }
}
