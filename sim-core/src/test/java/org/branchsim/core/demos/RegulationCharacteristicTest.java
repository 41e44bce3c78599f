package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.results.Trace;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The regulation bench demo: a pilot-operated and a direct-acting reducing valve, both set to 72 bar, on
 * one supply held at 80 bar, ramped to 250 bar (1 s to 3 s) at small demand, then, at 150 bar, each with its
 * demand valve opened to the same opening (4.5 s to 5 s).
 */
class RegulationCharacteristicTest {

    private static final double SETTING = 72e5;
    /** Common practice, no source: pilot-operated reducing valves hold within a few percent of setting. */
    private static final double PILOT_BAND = 0.03;
    private static final double LPM = 1e-3 / 60.0;

    private static Trace trace;

    @BeforeAll
    static void run() {
        trace = DemoRuns.of("regulation-characteristic").result().trace();
    }

    private static double supplyTime(double supplyBar) {
        return supplyBar == 80.0 ? 0.95 : 1.0 + (supplyBar - 80.0) / (250.0 - 80.0) * 2.0;
    }

    @Test
    void pilotOperatedValveHoldsWithinThreePercentFrom80To250Bar() {
        for (double supply : new double[] {80, 100, 130, 160, 200, 250}) {
            double t = supplyTime(supply);
            assertEquals(supply * 1e5, trace.valueAt("supply.p", t), 0.2e5, "supply schedule (1 ms grid, 85 bar/s ramp)");
            double p = trace.valueAt("pilotOut.p", t);
            assertEquals(SETTING, p, SETTING * PILOT_BAND, "outlet at supply " + supply + " bar");
        }
    }

    @Test
    void theDerivedPilotPreloadGivesTheSettingAtSmallDemand() {
        // docs/theory.md 6.5: the pilot preload is derived so that the outlet sits at the setting at small demand
        double p = trace.valueAt("pilotOut.p", 3.9);
        assertEquals(SETTING, p, SETTING * 0.005);
    }

    @Test
    void directActingValveDroopsMoreThanPilotOperatedAtEqualFlow() {
        double qPilot = trace.valueAt("pilotReducer.q", 4.95);
        double qDirect = trace.valueAt("directReducer.q", 4.95);
        assertEquals(qPilot, qDirect, 0.1 * qPilot, "equal demand flows");
        assertTrue(qPilot > 5 * LPM, "a real demand: " + qPilot / LPM + " L/min");
        double droopPilot = trace.valueAt("pilotOut.p", 3.95) - trace.valueAt("pilotOut.p", 4.95);
        double droopDirect = trace.valueAt("directOut.p", 3.95) - trace.valueAt("directOut.p", 4.95);
        assertTrue(droopPilot > 0 && droopDirect > 0, "both fall with flow");
        assertTrue(droopDirect > 1.5 * droopPilot,
                "direct-acting droop " + droopDirect / 1e5 + " bar vs pilot-operated " + droopPilot / 1e5 + " bar");
    }

    @Test
    void pilotDrainFlowIsPositiveAndOfTheUsualOrderWhileRegulating() {
        // common practice, no source: a fraction of a litre to a couple of litres per minute
        for (double t : new double[] {0.9, 2.0, 3.9, 4.95}) {
            double q = trace.valueAt("pilotReducer.drain.q", t);
            assertTrue(q > 0.1 * LPM && q < 3 * LPM, "drain flow " + q / LPM + " L/min at t = " + t);
        }
    }
}
