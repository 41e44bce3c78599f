package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The two-branch fixture demo: the feed runs to its end stop with the supply at relief pressure while the
 * clamp, landed on its part, stays at the reducing valve's setting (45 bar).
 */
class FixtureClampTest {

    private static final double SETTING = 45e5;
    private static final double RELIEF = 160e5;

    private static DemoRuns.Run run;

    @BeforeAll
    static void simulate() {
        run = DemoRuns.of("fixture-clamp");
    }

    @Test
    void fullPressureBranchReachesReliefWhileReducedBranchStaysAtSetting() {
        Trace t = run.result().trace();
        double end = run.scenario().solver().endTime();
        assertEquals(0.150, t.valueAt("feed.piston.x", end), 1e-6, "feed at its end stop");
        double pump = t.valueAt("pumpLine.p", end);
        assertTrue(pump >= RELIEF && pump < 1.1 * RELIEF, "supply at relief: " + pump / 1e5 + " bar");
        assertEquals(SETTING, t.valueAt("clampLine.p", end), 0.03 * SETTING, "clamp at its setting");
        // and while the feed is running (supply well above the clamp setting but below relief)
        double midFeed = 1.8;
        assertTrue(t.valueAt("pumpLine.p", midFeed) < RELIEF * 0.9);
        assertEquals(SETTING, t.valueAt("clampLine.p", midFeed), 0.03 * SETTING);
    }

    @Test
    void clampLandingOvershootDecaysIntoTheBandAndIsReported() {
        List<ReducingValveMetrics> metrics = ReducingValveMetrics.of(run.result(), run.scenario().metricsFrom(),
                run.scenario().metricsTo());
        assertEquals(1, metrics.size());
        ReducingValveMetrics m = metrics.get(0);
        assertEquals("reducer", m.id());
        assertEquals(SETTING, m.setting(), 1.0);
        double landing = run.result().events().stream().filter(e -> e.kind().equals("contact"))
                .mapToDouble(e -> e.time()).findFirst().orElseThrow();
        assertTrue(m.peakTime() >= landing && m.peakTime() < landing + 0.1, "peak follows landing at " + landing);
        assertTrue(m.overshoot() > 0.02 * SETTING, "overshoot " + m.overshootPercent() + " %");
        assertTrue(m.settled(), "settles into the +-2 % band");
        assertTrue(m.settledAt() > m.peakTime() && m.settledAt() < run.scenario().metricsTo(), "settled at " + m.settledAt());
        assertTrue(m.settlingTime() > 0.0);
        assertEquals(0.0, m.deviationPercent(), 3.0);
        assertTrue(m.drainFlow() > 0.0);
        assertTrue(m.meteringPower() > 0.0 && m.drainPower() > 0.0);
    }

    /**
     * The books are complete on both demos: the residual closes to round-off (docs/theory.md section 9 says why it
     * proves completeness and not accuracy; EnergyBalanceTest checks the energy figures against the state).
     */
    @Test
    void energyBalanceClosesOnBothDemos() {
        for (String demo : new String[] {"fixture-clamp", "regulation-characteristic"}) {
            SimulationResult r = DemoRuns.of(demo).result();
            assertTrue(r.energy().total(EnergyAccount.Kind.SUPPLY) > 1e3, demo + ": energy is supplied (pump or source)");
            assertTrue(r.energy().total(EnergyAccount.Kind.LOSS) > 0.5 * r.energy().total(EnergyAccount.Kind.SUPPLY),
                    demo + ": most of it is lost in valves and orifices");
            assertTrue(r.energy().relativeResidual() < 1e-9, demo + " residual " + r.energy().relativeResidual());
        }
    }
}
