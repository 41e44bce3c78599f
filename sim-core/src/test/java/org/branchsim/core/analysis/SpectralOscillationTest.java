package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The spectral detector on synthetic signals whose Fourier series, frequencies and envelopes are known in
 * closed form.
 */
class SpectralOscillationTest {

    /** Frequency accuracy the detector promises on clean sines with at least 8 cycles in the window. */
    private static final double FREQUENCY_ACCURACY = 0.005;
    /** Amplitude accuracy of the least-squares fit on clean periodic signals. */
    private static final double AMPLITUDE_ACCURACY = 0.02;
    private static final double DT = 1e-4;

    private static double[] times(double end) {
        int n = (int) Math.round(end / DT) + 1;
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * DT;
        }
        return t;
    }

    private static double[] sample(double[] t, DoubleUnaryOperator signal) {
        double[] x = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            x[k] = signal.applyAsDouble(t[k]);
        }
        return x;
    }

    private static List<SignalOscillation> components(double[] t, DoubleUnaryOperator signal, double threshold) {
        return OscillationDetector.components(t,
                new SignalSamples("p", Dimension.PRESSURE, sample(t, signal), threshold), t[0], t[t.length - 1]);
    }

    @Test
    void sineWithSecondAndThirdHarmonicsIsOneComponentAtTheFundamental() {
        double f0 = 87.3;
        double w = 2 * Math.PI * f0;
        // a Fourier series with three terms (any textbook): fundamental 1.0, 2nd 0.5, 3rd 0.3
        List<SignalOscillation> c = components(times(1.0),
                t -> 10 + Math.sin(w * t) + 0.5 * Math.sin(2 * w * t + 0.4) + 0.3 * Math.sin(3 * w * t + 1.1), 0.05);
        assertEquals(1, c.size(), c.toString());
        assertEquals(f0, c.get(0).frequency(), FREQUENCY_ACCURACY * f0);
        assertEquals(1.0, c.get(0).amplitude(), AMPLITUDE_ACCURACY);
        assertEquals(List.of(2, 3), c.get(0).multiples());
        assertEquals(0.5, c.get(0).harmonics().get(0).amplitude(), AMPLITUDE_ACCURACY * 0.5);
        assertEquals(0.3, c.get(0).harmonics().get(1).amplitude(), AMPLITUDE_ACCURACY * 0.3);
        assertEquals(Oscillation.Trend.LIMIT_CYCLE, c.get(0).trend());
    }

    @Test
    void squareWaveIsOneComponentAtItsFundamental() {
        double f0 = 47.3;
        // square wave of amplitude 1: Fourier series (4/pi) sum over odd n of sin(n w t)/n (any textbook);
        // threshold 0.05 keeps harmonics up to the 25th, far below the Nyquist frequency (no aliases)
        List<SignalOscillation> c = components(times(0.5),
                t -> Math.signum(Math.sin(2 * Math.PI * f0 * t)), 0.05);
        assertEquals(1, c.size(), c.toString());
        assertEquals(f0, c.get(0).frequency(), FREQUENCY_ACCURACY * f0);
        assertEquals(4 / Math.PI, c.get(0).amplitude(), AMPLITUDE_ACCURACY * 4 / Math.PI);
        assertTrue(c.get(0).multiples().containsAll(List.of(3, 5, 7)), c.get(0).multiples().toString());
        // half peak-to-peak of a +-1 square wave is 1 (the line removed over 23.65 cycles is nearly flat)
        assertEquals(1.0, c.get(0).halfPeakToPeak(), 0.02);
    }

    @Test
    void halfWaveRectifiedSineIsAtItsFundamentalNotItsStrongSecondHarmonic() {
        double f0 = 263.0;
        double w = 2 * Math.PI * f0;
        // half-wave rectified sine: 1/pi + (1/2) sin wt - (2/pi) sum over even k of cos(k w t)/(k^2 - 1)
        // (Fourier series of a half-wave rectified sine, any textbook): fundamental 0.5, 2nd harmonic 2/(3 pi)
        List<SignalOscillation> c = components(times(0.5), t -> Math.max(0.0, Math.sin(w * t)), 0.02);
        assertEquals(1, c.size(), c.toString());
        assertEquals(f0, c.get(0).frequency(), FREQUENCY_ACCURACY * f0);
        assertEquals(0.5, c.get(0).amplitude(), AMPLITUDE_ACCURACY * 0.5);
        assertEquals(2, c.get(0).multiples().get(0));
        assertEquals(2 / (3 * Math.PI), c.get(0).harmonics().get(0).amplitude(), AMPLITUDE_ACCURACY * 2 / (3 * Math.PI));
    }

    @Test
    void strongestPeakAtTwiceTheFundamentalStillGivesTheFundamental() {
        double f0 = 263.0;
        double w = 2 * Math.PI * f0;
        // |sin wt| = 2/pi - (4/pi) sum over k >= 1 of cos(2k w t)/(4k^2 - 1) (Fourier series of a full-wave
        // rectified sine, any textbook): its 2f0 term, 4/(3 pi) = 0.42, is stronger than the added 0.3 sin wt
        List<SignalOscillation> c = components(times(0.5), t -> Math.abs(Math.sin(w * t)) + 0.3 * Math.sin(w * t), 0.02);
        assertEquals(1, c.size(), c.toString());
        assertEquals(f0, c.get(0).frequency(), FREQUENCY_ACCURACY * f0);
        assertEquals(0.3, c.get(0).amplitude(), AMPLITUDE_ACCURACY * 0.3);
        assertEquals(4 / (3 * Math.PI), c.get(0).harmonics().get(0).amplitude(), AMPLITUDE_ACCURACY * 4 / (3 * Math.PI));
        assertEquals(2, c.get(0).harmonics().get(0).multiple());
    }

    @Test
    void twoUnrelatedSinesInOneSignalAreTwoComponents() {
        // 263 / 37 = 7.11: within 1.5 % of the 7th multiple, but 4 Hz (11 % of 37 Hz) away from it
        List<SignalOscillation> c = components(times(1.0),
                t -> 2.0 * Math.sin(2 * Math.PI * 37.0 * t) + 1.0 * Math.sin(2 * Math.PI * 263.0 * t + 0.5), 0.05);
        assertEquals(2, c.size(), c.toString());
        // strongest first: strength = end amplitude / threshold
        assertEquals(37.0, c.get(0).frequency(), FREQUENCY_ACCURACY * 37.0);
        assertEquals(2.0, c.get(0).amplitude(), AMPLITUDE_ACCURACY * 2.0);
        assertEquals(263.0, c.get(1).frequency(), FREQUENCY_ACCURACY * 263.0);
        assertEquals(1.0, c.get(1).amplitude(), AMPLITUDE_ACCURACY);
        assertTrue(c.get(0).harmonics().isEmpty() && c.get(1).harmonics().isEmpty());
    }

    @Test
    void decayingSineDecaysAtItsRate() {
        double sigma = 3.0;
        // e^{-sigma t} sin(w t): amplitude envelope e^{-sigma t}, growth rate -sigma (analytic)
        List<SignalOscillation> c = components(times(1.0),
                t -> 2.0 * Math.exp(-sigma * t) * Math.sin(2 * Math.PI * 40.0 * t), 0.01);
        assertEquals(1, c.size(), c.toString());
        assertEquals(Oscillation.Trend.DECAYING, c.get(0).trend());
        assertEquals(-sigma, c.get(0).growthRate(), 0.05 * sigma);
        assertEquals(2.0, c.get(0).startAmplitude(), 0.05 * 2.0);
        assertEquals(2.0 * Math.exp(-sigma), c.get(0).endAmplitude(), 0.05 * 2.0 * Math.exp(-sigma));
    }

    @Test
    void growingSineGrowsAtItsRate() {
        double sigma = 2.0;
        // e^{+sigma t} sin(w t): growth rate +sigma (analytic)
        List<SignalOscillation> c = components(times(1.0),
                t -> 0.1 * Math.exp(sigma * t) * Math.sin(2 * Math.PI * 60.0 * t + 1.0), 0.01);
        assertEquals(1, c.size(), c.toString());
        assertEquals(Oscillation.Trend.GROWING, c.get(0).trend());
        assertEquals(sigma, c.get(0).growthRate(), 0.05 * sigma);
    }

    @Test
    void constantAmplitudeSineIsALimitCycle() {
        // constant envelope: growth rate 0 (analytic); held means |rate| / f below 0.005 (common practice)
        List<SignalOscillation> c = components(times(1.0), t -> 0.7 * Math.sin(2 * Math.PI * 19.7 * t), 0.01);
        assertEquals(1, c.size(), c.toString());
        assertEquals(Oscillation.Trend.LIMIT_CYCLE, c.get(0).trend());
        assertTrue(Math.abs(c.get(0).growthRate()) / 19.7 < OscillationDetector.HOLD_RATE_PER_CYCLE);
        assertEquals(0.7, c.get(0).startAmplitude(), AMPLITUDE_ACCURACY * 0.7);
        assertEquals(0.7, c.get(0).endAmplitude(), AMPLITUDE_ACCURACY * 0.7);
        assertEquals(19, c.get(0).cycles());
    }

    @Test
    void gaussianNoiseAloneIsNoOscillation() {
        Random random = new Random(42);
        // white noise has a flat spectrum (definition); a threshold far below its level leaves the spectral
        // floor test alone to reject it (false alarm about 1e-9 per point: chi-square, 6 degrees of freedom)
        double[] t = times(2.0);
        double[] x = new double[t.length];
        for (int k = 0; k < x.length; k++) {
            x[k] = random.nextGaussian();
        }
        assertEquals(List.of(), OscillationDetector.components(t,
                new SignalSamples("p", Dimension.PRESSURE, x, 0.01), 0.0, 2.0));
    }

    @Test
    void sineInNoiseCountsOnlyAboveTheThreshold() {
        Random random = new Random(5);
        double[] t = times(2.0);
        double[] x = new double[t.length];
        for (int k = 0; k < x.length; k++) {
            x[k] = 0.15 * Math.sin(2 * Math.PI * 120.0 * t[k]) + random.nextGaussian();
        }
        // density ratio of a sine of amplitude A in white noise of variance s^2 with Hann segments of L samples:
        // A^2 L / (6 s^2) = 37 here (Welch 1967 scaling; Harris 1978 Hann gains), above the floor factor 10,
        // so it is the caller's amplitude threshold that decides
        assertEquals(List.of(), OscillationDetector.components(t,
                new SignalSamples("p", Dimension.PRESSURE, x, 0.3), 0.0, 2.0));
        List<SignalOscillation> c = OscillationDetector.components(t,
                new SignalSamples("p", Dimension.PRESSURE, x, 0.08), 0.0, 2.0);
        assertEquals(1, c.size(), c.toString());
        assertEquals(120.0, c.get(0).frequency(), FREQUENCY_ACCURACY * 120.0);
    }

    @Test
    void stepAndKinkInsideTheWindowAreNoOscillation() {
        // a step and a ramp start have continuous spectra (Fourier transforms of the Heaviside step and of the
        // ramp fall as 1/f and 1/f^2, no spectral line), so they carry no oscillation however small the threshold
        assertEquals(List.of(), components(times(2.0), t -> t < 1.37 ? 40e5 : 45e5, 100.0));
        assertEquals(List.of(), components(times(2.0), t -> 40e5 + 5e5 * Math.max(0.0, t - 0.61), 100.0));
    }

    @Test
    void fewerThanMinimumCyclesIsNoOscillation() {
        // 6 cycles in a 1 s window: below MIN_CYCLES = 8 (common practice); 9 cycles: reported
        assertEquals(List.of(), components(times(1.0), t -> Math.sin(2 * Math.PI * 6.0 * t), 0.01));
        List<SignalOscillation> c = components(times(1.0), t -> Math.sin(2 * Math.PI * 9.0 * t), 0.01);
        assertEquals(1, c.size(), c.toString());
        assertEquals(9.0, c.get(0).frequency(), FREQUENCY_ACCURACY * 9.0);
    }

    @Test
    void frequencyWithinHalfAPercentOffTheBins() {
        // the frequencies are those of the synthetic sines; none falls on a bin of the 0.5 s segments (2 Hz)
        double[] t = times(1.0);
        for (double f : new double[] {8.7, 53.3, 263.7, 1234.5, 3001.9}) {
            List<SignalOscillation> c = components(t, s -> 1e5 * Math.sin(2 * Math.PI * f * s + 0.9), 100.0);
            assertEquals(1, c.size(), f + " Hz: " + c);
            assertEquals(f, c.get(0).frequency(), FREQUENCY_ACCURACY * f, f + " Hz");
            assertEquals(1e5, c.get(0).amplitude(), AMPLITUDE_ACCURACY * 1e5, f + " Hz");
        }
    }
}
