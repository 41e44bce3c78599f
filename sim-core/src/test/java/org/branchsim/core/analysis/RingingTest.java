package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * A hunting-kind finding that decays over its window is a ringing, and its damping ratio is read from the decay.
 * The signal is the free response of an underdamped second-order system, x = e^(-zeta omega_n t) cos(omega_d t),
 * omega_d = omega_n sqrt(1 - zeta^2) (K. Ogata, Modern Control Engineering, 5th ed., 2010, sec. 5-3), with
 * zeta = 0.02 and f_n = 100 Hz, sampled every 0.1 ms over 0.3 s.
 */
class RingingTest {

    private static OscillationFinding finding(double zeta) {
        double fn = 100.0;
        double wn = 2 * Math.PI * fn;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        int n = 3001;
        double[] t = new double[n];
        double[] x = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * 1e-4;
            x[k] = Math.exp(-zeta * wn * t[k]) * Math.cos(wd * t[k]);
        }
        List<SignalOscillation> found = OscillationDetector.components(t,
                new SignalSamples("x", Dimension.DIMENSIONLESS, x, 1e-4), 0.0, 0.3);
        assertTrue(!found.isEmpty(), "the ringing is seen");
        SignalOscillation s = found.get(0);
        ScanWindow w = new ScanWindow(0.0, 0.3, 0.0, "start of the run");
        return new OscillationFinding(OscillationFinding.Kind.HUNTING, s.frequency(), s.trend(), s.growthRate(), w,
                List.of(w), List.of(s), List.of("x"), Map.of(), List.of(), null);
    }

    @Test
    void aDecayingOscillationIsARingingWithTheDampingRatioOfItsDecay() {
        OscillationFinding f = finding(0.02);
        assertEquals(Oscillation.Trend.DECAYING, f.trend());
        assertEquals("ringing", f.label());
        // the decay rate is read from the first and last quarters' amplitudes: within 2 % of zeta
        assertEquals(0.02, f.dampingRatioFromDecay(), 0.02 * 0.02);
    }

    @Test
    void aHeldOscillationIsStillHunting() {
        OscillationFinding f = finding(0.0);
        assertEquals(Oscillation.Trend.LIMIT_CYCLE, f.trend());
        assertEquals("hunting", f.label());
        assertTrue(Double.isNaN(f.dampingRatioFromDecay()));
    }
}
