package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Welch's averaged periodogram against Parseval's theorem and the level of white noise. */
class WelchSpectrumTest {

    private static final double DT = 1e-4;
    private static final int N = 20_000;

    @Test
    void sineHasItsMeanSquareUnderItsPeakAndItsFrequencyAtThePeak() {
        double f = 123.4;
        double amplitude = 3.0;
        double[] x = new double[N];
        for (int k = 0; k < N; k++) {
            x[k] = amplitude * Math.sin(2 * Math.PI * f * k * DT + 0.7);
        }
        WelchSpectrum s = WelchSpectrum.estimate(x, DT, N / 2, 4);
        assertEquals(3, s.segments());
        int peak = 1;
        double integral = 0.0;
        for (int k = 1; k < s.size() - 1; k++) {
            integral += s.density(k) * s.gridSpacing();
            if (s.density(k) > s.density(peak)) {
                peak = k;
            }
        }
        // Parseval's theorem: the one-sided density integrates to the mean square A^2/2 of a sine
        // (Welch 1967, eq. for the modified periodogram normalised by the window power)
        assertEquals(amplitude * amplitude / 2, integral, 0.01 * amplitude * amplitude / 2);
        assertTrue(s.isPeak(peak, OscillationDetector.PEAK_HALF_WIDTH));
        // the sine's frequency is defined by the signal itself; quadratic interpolation of the log density
        // (Smith and Serra 1987, from memory) places it within 0.1 % without any least-squares step
        assertEquals(f, s.interpolatedFrequency(peak), 0.001 * f);
        // the main lobe of a Hann window is +-2 segment bins wide (Harris, Proc. IEEE 66(1), 1978, table I):
        // 3 bins away the density has fallen by more than 30 dB (first side lobe -31.5 dB)
        int threeBins = (int) Math.round(3 * s.resolution() / s.gridSpacing());
        assertTrue(s.density(peak + threeBins) < 1e-3 * s.density(peak));
    }

    @Test
    void whiteNoiseHasFlatDensityTwoSigmaSquaredOverSampleRate() {
        Random random = new Random(11);
        double sigma = 2.0;
        double[] x = new double[N];
        for (int k = 0; k < N; k++) {
            x[k] = sigma * random.nextGaussian();
        }
        WelchSpectrum s = WelchSpectrum.estimate(x, DT, N / 2, 4);
        double mean = 0.0;
        int count = 0;
        for (int k = s.size() / 10; k < s.size() - 1; k++) {
            mean += s.density(k);
            count++;
        }
        mean /= count;
        // one-sided density of white noise of variance sigma^2 sampled at fs: 2 sigma^2 / fs
        // (definition of the one-sided power spectral density; Welch 1967)
        double expected = 2 * sigma * sigma * DT;
        assertEquals(expected, mean, 0.05 * expected);
        // the median of a chi-square variable with 6 degrees of freedom (3 averaged segments) is 0.89 of its
        // mean (chi-square tables); overlap makes the segments slightly dependent, hence the wide band
        double median = s.medianDensity(0.1 * s.frequency(s.size() - 1));
        assertTrue(median > 0.8 * expected && median < 1.0 * expected, "median " + median / expected);
    }
}
