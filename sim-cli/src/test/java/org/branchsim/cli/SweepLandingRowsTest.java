package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.branchsim.core.results.Trace;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.plots.SweepOverlay;
import org.branchsim.plots.TraceCharts;
import org.junit.jupiter.api.Test;

/**
 * What a sweep's landing overlay is drawn from: each variant's setting follows from its own metrics, since the
 * deviation is the steady outlet pressure minus the setting as a percentage of the setting (setting = steady /
 * (1 + deviation / 100), arithmetic); the peak is the one its metrics report. 1 bar = 1e5 Pa (NIST SP 811, 2008,
 * Appendix B).
 */
class SweepLandingRowsTest {

    private static StudyTable.Row row(int index, double steadyBar, double deviationPercent, double peakBar) {
        Trace t = new Trace(List.of(new Trace.Column("reducer.p.out", Dimension.PRESSURE)));
        t.add(0.0, new double[] {0.0});
        t.add(0.1, new double[] {steadyBar * 1e5});
        return new StudyTable.Row(new Variant(index, Map.of("elements.reducer.setting", index)), null,
                Map.of("reducer.steadyOutlet [bar]", steadyBar, "reducer.deviation [%]", deviationPercent,
                        "reducer.peakOutlet [bar]", peakBar), t);
    }

    private static List<SweepOverlay.Variant> runs(List<StudyTable.Row> rows) {
        List<SweepOverlay.Variant> out = new ArrayList<>();
        for (StudyTable.Row r : rows) {
            out.add(new SweepOverlay.Variant(new TraceCharts.Labelled("v" + r.variant().index(), r.overlay()),
                    r.variant().index()));
        }
        return out;
    }

    @Test
    void eachVariantGetsTheSettingAndPeakOfItsOwnMetrics() {
        // 44.1 bar at -2 % is a 45 bar setting; 51.5 bar at +3 % a 50 bar one
        List<StudyTable.Row> rows = List.of(row(0, 44.1, -2.0, 65.0), row(1, 51.5, 3.0, 70.0));
        List<SweepOverlay.Landed> landed = SweepReport.landed("reducer.p.out", rows, runs(rows), UnitSystem.METRIC);
        assertEquals(2, landed.size());
        assertEquals(45e5, landed.get(0).setting(), 1e-6);
        assertEquals(50e5, landed.get(1).setting(), 1e-6);
        assertEquals(65e5, landed.get(0).peak(), 1e-6);
        assertEquals(70e5, landed.get(1).peak(), 1e-6);
        assertEquals("overlay-reducer-p-out-landing.png", SweepReport.landingFile("reducer.p.out"));
    }

    @Test
    void aSignalThatIsNoValvesOutletGetsNoLandingOverlay() {
        List<StudyTable.Row> rows = List.of(row(0, 44.1, -2.0, 65.0));
        assertTrue(SweepReport.landed("clampLine.p", rows, runs(rows), UnitSystem.METRIC).isEmpty());
        assertTrue(SweepReport.landed("other.p.out", rows, runs(rows), UnitSystem.METRIC).isEmpty(),
                "no metrics of a valve called other");
    }
}
