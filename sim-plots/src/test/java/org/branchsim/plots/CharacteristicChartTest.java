package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The characteristic figure drawn from an analytic trace: during the demand ramps the outlet pressure falls on a
 * straight line p = p_s - K q, so the least-squares slope must be -K exactly (normal equations, Montgomery and
 * Runger, Applied Statistics and Probability for Engineers, 6th ed., 2014, section 11-2); during the supply ramp the
 * outlet pressure rises linearly by a known amount, which is the regulation deviation. Values are drawn in display
 * units: 1 bar = 1e5 Pa, 1 L/min = 1e-3 / 60 m^3/s, 1 psi = 6.894757e3 Pa, 1 gal/min = 6.309020e-5 m^3/s (NIST SP
 * 811, 2008, Appendix B.8; the exact definitions are used below).
 */
class CharacteristicChartTest {

    private static final double SETTING = 72e5;
    private static final double K = 1.2e10;
    private static final double DT = 0.01;
    private static final double LPM = 1e-3 / 60;
    /** 1 psi = 1 lbf / in^2 with 1 lbf = 4.4482216152605 N and 1 in = 0.0254 m exactly (NIST SP 811, B.8). */
    private static final double PSI = 4.4482216152605 / (0.0254 * 0.0254);
    /** 1 US gal = 231 in^3 exactly (NIST SP 811, B.8), per minute. */
    private static final double GPM = 231 * 0.0254 * 0.0254 * 0.0254 / 60;

    private static final ReducingValve VALVE = new ReducingValve() {
        @Override
        public String id() {
            return "v";
        }

        @Override
        public double setting() {
            return SETTING;
        }
    };

    /** Demand rises over 1..2 s and falls over 2.5..3 s; supply rises over 3.5..4.5 s; quiet elsewhere. */
    private static Trace trace() {
        Trace t = new Trace(List.of(new Trace.Column("v.q", Dimension.VOLUME_FLOW),
                new Trace.Column("v.p.out", Dimension.PRESSURE), new Trace.Column("v.drain.q", Dimension.VOLUME_FLOW)));
        for (int k = 0; k <= 500; k++) {
            double time = k * DT;
            double q = time < 1 ? 0 : time < 2 ? 10 * LPM * (time - 1) : time < 2.5 ? 10 * LPM
                    : time < 3 ? 10 * LPM * (1 - 2 * (time - 2.5)) : 0;
            double p = SETTING - K * q + (time > 3.5 ? 0.5e5 * Math.min(1, time - 3.5) : 0);
            t.add(time, new double[] {q, p, 0.3 * LPM + 1e-12 * p});
        }
        return t;
    }

    private static double[] inlet(Trace t) {
        double[] p = new double[t.size()];
        for (int k = 0; k < p.length; k++) {
            p[k] = 80e5 + 100e5 * Math.max(0, Math.min(1, t.time(k) - 3.5));
        }
        return p;
    }

    private static ValveCharacteristic characteristic() {
        Trace t = trace();
        return ValveCharacteristic.of(t, VALVE, inlet(t), List.of(
                new ValveCharacteristic.Stretch(1, 2, ValveCharacteristic.Drive.DEMAND, true),
                new ValveCharacteristic.Stretch(2.5, 3, ValveCharacteristic.Drive.DEMAND, false),
                new ValveCharacteristic.Stretch(3.5, 4.5, ValveCharacteristic.Drive.SUPPLY, true)));
    }

    @Test
    void droopAndDeviationFromTheClosedForm() {
        ValveCharacteristic c = characteristic();
        assertEquals(-K, c.droop(), 1e-6 * K);
        // the outlet pressure rises by 0.5 bar over the supply ramp (its definition in the trace)
        assertEquals(0.5e5, c.deviation(), 1e-6);
        assertEquals(80e5, c.inletRange()[0], 1e-6);
        assertEquals(180e5, c.inletRange()[1], 1e-6);
        // -K Pa per m^3/s in bar per L/min and in psi per gal/min (NIST factors above)
        assertEquals(-K * LPM / 1e5, CharacteristicChart.droopInDisplayUnits(c, UnitSystem.METRIC), 1e-9);
        assertEquals(-K * GPM / PSI, CharacteristicChart.droopInDisplayUnits(c, UnitSystem.US), 1e-6 * K * GPM / PSI);
    }

    @Test
    void panelsHoldTheTraceSamplesInDisplayUnits() {
        ValveCharacteristic c = characteristic();
        List<JFreeChart> panels = CharacteristicChart.panels(c, "test", UnitSystem.METRIC);
        assertEquals(3, panels.size());
        XYDataset a = panels.get(0).getXYPlot().getDataset();
        assertEquals(2, a.getSeriesCount(), "rising and falling demand");
        assertEquals("demand rising", a.getSeriesKey(0));
        assertEquals("demand falling", a.getSeriesKey(1));
        // samples at t = 1.00 .. 2.00 s (101) and 2.50 .. 3.00 s (51), inclusive ends
        assertEquals(101, a.getItemCount(0));
        assertEquals(51, a.getItemCount(1));
        Trace t = trace();
        int k = (int) Math.round(1.5 / DT);
        assertEquals(t.value(k, 0) / LPM, a.getXValue(0, 50), 1e-9);
        assertEquals(t.value(k, 1) / 1e5, a.getYValue(0, 50), 1e-9);
        XYDataset b = panels.get(1).getXYPlot().getDataset();
        assertEquals(1, b.getSeriesCount(), "only a rising supply ramp");
        assertEquals(101, b.getItemCount(0));
        assertEquals(130.0, b.getXValue(0, 50), 1e-9);
        XYDataset d = panels.get(2).getXYPlot().getDataset();
        assertEquals(2, d.getSeriesCount(), "drain flow during demand and during supply ramps");
        assertEquals(t.value(k, 1) / 1e5, d.getXValue(0, 50), 1e-9);
        assertEquals(t.value(k, 2) / LPM, d.getYValue(0, 50), 1e-9);
        // the setting (72 bar) lies inside the drawn outlet pressure range of panel (b)
        XYPlot pb = panels.get(1).getXYPlot();
        assertTrue(pb.getRangeAxis().getRange().contains(72.0), pb.getRangeAxis().getRange().toString());
        // US units: psi and gal/min (NIST factors above)
        XYDataset us = CharacteristicChart.panels(c, "test", UnitSystem.US).get(0).getXYPlot().getDataset();
        assertEquals(t.value(k, 0) / GPM, us.getXValue(0, 50), 1e-9 * us.getXValue(0, 50));
        assertEquals(t.value(k, 1) / PSI, us.getYValue(0, 50), 1e-9 * us.getYValue(0, 50));
    }

    @Test
    void subtitlesStateTheQuasiStaticLimitTheDroopAndTheCaution(@TempDir Path dir) throws Exception {
        List<JFreeChart> panels = CharacteristicChart.panels(characteristic(), "test", UnitSystem.METRIC);
        String first = text(panels.get(0));
        assertTrue(first.contains("slow compared with the valve's response"), first);
        assertTrue(first.contains("bar per L/min"), first);
        assertTrue(text(panels.get(1)).contains("regulation deviation 0.5000 bar"), text(panels.get(1)));
        assertTrue(text(panels.get(2)).contains(TraceCharts.CAUTION));
        Path png = dir.resolve("c.png");
        CharacteristicChart.save(characteristic(), "test", UnitSystem.METRIC, png);
        assertTrue(Files.size(png) > 0);
    }

    private static String text(JFreeChart chart) {
        StringBuilder s = new StringBuilder();
        for (int k = 0; k < chart.getSubtitleCount(); k++) {
            if (chart.getSubtitle(k) instanceof TextTitle tt) {
                s.append(tt.getText()).append('\n');
            }
        }
        return s.toString();
    }
}
