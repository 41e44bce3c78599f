package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.analysis.ScanWindow;
import org.branchsim.core.study.Diagnosis;
import org.branchsim.core.study.DriveResonance;
import org.junit.jupiter.api.Test;

/**
 * The mobile-arm demo's pump is an axial-piston pump with 9 pistons at 1800 rpm. An odd piston count makes the
 * flow ripple repeat 2 z = 18 times a turn (Ivantysyn and Ivantysynova, Hydrostatic Pumps and Motors, 2001, kinematic
 * flow pulsation; from memory, as in docs/theory.md 6.1), so the ripple's fundamental is 18 x 1800 / 60 = 540 Hz.
 * The oscillation the scan finds in the pump's control chamber at that frequency is the ripple's forced response,
 * not hunting; the other findings of the run, at frequencies unrelated to the ripple, are not tied to it.
 */
class ForcedResponseTest {

    @Test
    void anOscillationAtThePumpRippleFrequencyIsAForcedResponse() {
        Scenario s = ScenarioLoader.load(DemoRuns.scenario("mobile-arm"));
        List<OscillationFinding> found = OscillationScan.scan(Simulator.run(s.circuit(), s.solver().withEndTime(1.5)));
        double ripple = 2 * 9 * 1800.0 / 60.0;
        OscillationFinding atRipple = found.stream()
                .filter(f -> Math.abs(f.frequency() - ripple) < 0.02 * ripple).findFirst().orElse(null);
        assertNotNull(atRipple, "an oscillation at the ripple frequency: " + found.stream()
                .map(f -> f.frequency() + " Hz").toList());
        assertNotNull(atRipple.drivenBy());
        assertTrue(atRipple.drivenBy().contains("flow ripple of pump"), atRipple.drivenBy());
        assertTrue(atRipple.drivenBy().contains("540.0 Hz"), atRipple.drivenBy());
        assertEquals("forced response", atRipple.label());
        for (OscillationFinding f : found) {
            boolean nearMultiple = false;
            for (int m = 1; m <= OscillationFinding.DRIVE_MULTIPLES; m++) {
                nearMultiple |= Math.abs(f.frequency() - m * ripple) <= 0.02 * ripple;
            }
            if (!nearMultiple) {
                assertNull(f.drivenBy(), f.frequency() + " Hz is not the ripple's");
            }
        }
    }

    /**
     * A forced response is not diagnosed as an instability: no damping change can remove it, so no remedy is
     * searched or run; the nearest mode to the drive and the drive's magnification there are given instead.
     */
    @Test
    void theDiagnosisOfAForcedResponseSearchesNoRemedyAndNamesTheNearestMode() {
        Scenario s = ScenarioLoader.load(DemoRuns.scenario("mobile-arm"));
        Diagnosis.Report r = Diagnosis.run(s, new Diagnosis.Options(0.05, ScanWindow.given(1.1, 1.5), true, 1), n -> { });
        Diagnosis.FindingDiagnosis forced = r.diagnosed().stream().filter(Diagnosis.FindingDiagnosis::forced)
                .findFirst().orElse(null);
        assertNotNull(forced, "the ripple's forced response is diagnosed: " + r.findings());
        assertTrue(forced.linear().isEmpty() && forced.trials().isEmpty() && forced.recommended() == null);
        DriveResonance res = forced.resonance();
        assertNotNull(res, "modes about the trajectory are known (--on-trajectory)");
        assertEquals(forced.finding().frequency() / res.mode().naturalFrequency(), res.ratio(), 1e-12);
        assertEquals(DriveResonance.magnification(res.ratio(), Math.max(0.0, res.mode().dampingRatio())),
                res.magnification(), 1e-12);
    }
}
