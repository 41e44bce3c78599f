package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The single-frequency entry of the oscillation detector (the strongest component's fundamental) on synthetic
 * signals whose frequency, amplitude and envelope are known in closed form.
 */
class OscillationDetectorTest {

    private static final double ACCURACY = 0.01;
    private static final double DT = 1e-4;

    private static double[] times(double end) {
        int n = (int) Math.round(end / DT) + 1;
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * DT;
        }
        return t;
    }

    @Test
    void pureSine() {
        double[] t = times(1.0);
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            x[k] = 50e5 + 2e5 * Math.sin(2 * Math.PI * 87.0 * t[k] + 0.3);
        }
        Oscillation o = OscillationDetector.detect("p", t, x, 0.0, 1.0, 1e3);
        assertNotNull(o);
        // analytic: the signal is defined as a 87 Hz sine of amplitude 2e5 Pa with a constant envelope
        assertEquals(87.0, o.frequency(), 87.0 * ACCURACY);
        assertEquals(2e5, o.amplitude(), 2e5 * ACCURACY);
        assertEquals(Oscillation.Trend.LIMIT_CYCLE, o.trend());
    }

    @Test
    void decayingSine() {
        double sigma = -1.5;
        double[] t = times(1.0);
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            x[k] = 1e-3 + 2e-4 * Math.exp(sigma * t[k]) * Math.sin(2 * Math.PI * 40.0 * t[k]);
        }
        Oscillation o = OscillationDetector.detect("x", t, x, 0.0, 1.0, 1e-6);
        assertNotNull(o);
        // analytic: envelope 2e-4 e^{sigma t}, so amplitude 2e-4 at the window start and growth rate sigma
        assertEquals(40.0, o.frequency(), 40.0 * ACCURACY);
        assertEquals(2e-4, o.amplitude(), 2e-4 * ACCURACY);
        assertEquals(sigma, o.growthRate(), Math.abs(sigma) * 0.05);
        assertEquals(Oscillation.Trend.DECAYING, o.trend());
    }

    @Test
    void sineWithNoiseOnARamp() {
        Random random = new Random(7);
        double[] t = times(2.0);
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            x[k] = 30e5 + 10e5 * t[k] + 1e5 * Math.sin(2 * Math.PI * 23.0 * t[k]) + 0.1e5 * random.nextGaussian();
        }
        Oscillation o = OscillationDetector.detect("p", t, x, 0.0, 2.0, 1e3);
        assertNotNull(o);
        // analytic: a 23 Hz sine of amplitude 1e5 Pa on a straight ramp (removed by the detector) in white noise
        assertEquals(23.0, o.frequency(), 23.0 * ACCURACY);
        assertEquals(1e5, o.amplitude(), 1e5 * ACCURACY);
    }

    @Test
    void growingSineIsGrowing() {
        double[] t = times(1.0);
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            x[k] = 1e5 * Math.exp(2.0 * t[k]) * Math.sin(2 * Math.PI * 60.0 * t[k]);
        }
        Oscillation o = OscillationDetector.detect("p", t, x, 0.0, 1.0, 1e3);
        assertNotNull(o);
        // analytic: envelope 1e5 e^{2 t}, growth rate 2 1/s
        assertEquals(Oscillation.Trend.GROWING, o.trend());
        assertEquals(2.0, o.growthRate(), 0.1);
    }

    @Test
    void settledStepResponseHasNoOscillation() {
        // second-order step response, damping ratio 0.3, 20 Hz (Ogata, Modern Control Engineering, step response
        // of the underdamped standard second-order system): rings, then settles long before the window
        double wn = 2 * Math.PI * 20;
        double zeta = 0.3;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        double[] t = times(2.0);
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            double e = Math.exp(-zeta * wn * t[k]);
            x[k] = 45e5 * (1 - e * (Math.cos(wd * t[k]) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * t[k])));
        }
        assertNull(OscillationDetector.detect("p", t, x, 1.0, 2.0, 0.01e5));
        // first-order step response (time constant 50 ms): no oscillation at all, only a transient whose
        // windowed spectrum has side lobes but no peak
        double[] first = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            first[k] = 45e5 * (1 - Math.exp(-t[k] / 0.05));
        }
        assertNull(OscillationDetector.detect("p", t, first, 0.0, 2.0, 0.01e5));
    }
}
