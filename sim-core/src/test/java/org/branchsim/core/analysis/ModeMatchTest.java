package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Map;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The matching rule of docs/theory.md section 8.3 step 2 on hand-made modes: a sustained oscillation of a
 * time-invariant circuit grows out of a mode that is not damped at the operating point (an equilibrium whose modes
 * all decay attracts nearby states; Lyapunov's indirect method, any nonlinear systems text, e.g. Khalil,
 * Nonlinear Systems, 2002, thm 4.7), so such a mode is preferred to a well-damped one nearer in frequency.
 */
class ModeMatchTest {

    private static Mode mode(double hz, double zeta, Map<String, Double> parts) {
        double w = 2 * Math.PI * hz;
        List<Mode.Share> shares = parts.entrySet().stream().map(e -> new Mode.Share(e.getKey(), e.getValue()))
                .sorted((a, b) -> Double.compare(b.share(), a.share())).toList();
        return new Mode(-zeta * w, w * Math.sqrt(1 - zeta * zeta), hz, zeta, "m", shares, shares, shares, shares);
    }

    private static OscillationFinding finding(double hz, String... signals) {
        List<SignalOscillation> s = java.util.Arrays.stream(signals).map(name -> new SignalOscillation(name,
                Dimension.PRESSURE, hz, 1e4, 1e4, List.of(), 1e4, 1e4, 0.0, Oscillation.Trend.LIMIT_CYCLE, 40, 1e3,
                100.0)).toList();
        ScanWindow w = new ScanWindow(0.5, 1.0, 0.0, "start of the run");
        return new OscillationFinding(OscillationFinding.Kind.CHATTER, hz, Oscillation.Trend.LIMIT_CYCLE, 0.0, w,
                List.of(w), s, List.of("v.pilot", "v.chamber"), Map.of("v.pilot", 1.0), List.of(), null);
    }

    @Test
    void anUnstableModePrevailsOverAWellDampedOneNearerInFrequency() {
        Mode damped = mode(237.0, 0.52, Map.of("v.spool", 0.42, "v.pilot", 0.3, "v.chamber", 0.28));
        Mode unstable = mode(490.0, -0.077, Map.of("v.pilot", 0.85, "v.chamber", 0.1, "v.spool", 0.05));
        ModeMatch m = ModeMatch.find(finding(263.0, "v.pilot.x", "v.chamber.p"), List.of(damped, unstable), 0.05);
        assertEquals(unstable, m.mode());
        assertEquals(490.0 * Math.sqrt(1 - 0.077 * 0.077) / 263.0, m.frequencyRatio(), 1e-9);
        assertEquals(0.95, m.overlap(), 1e-9);
    }

    @Test
    void amongDampedModesTheNearestWithTheSameShapeWins() {
        Mode near = mode(250.0, 0.3, Map.of("v.pilot", 0.6, "v.chamber", 0.4));
        Mode far = mode(450.0, 0.3, Map.of("v.pilot", 0.6, "v.chamber", 0.4));
        Mode elsewhere = mode(263.0, 0.3, Map.of("pump", 0.9, "line", 0.1));
        ModeMatch m = ModeMatch.find(finding(263.0, "v.pilot.x", "v.chamber.p"), List.of(far, elsewhere, near), 0.05);
        assertEquals(near, m.mode());
    }

    @Test
    void noModeWithinAnOctaveMeansNoMatch() {
        Mode slow = mode(100.0, -0.1, Map.of("v.pilot", 1.0));
        assertNull(ModeMatch.find(finding(263.0, "v.pilot.x"), List.of(slow), 0.05));
    }
}
