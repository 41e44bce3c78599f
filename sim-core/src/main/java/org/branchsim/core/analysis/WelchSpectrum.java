package org.branchsim.core.analysis;

import java.util.Arrays;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.hipparchus.transform.DftNormalization;
import org.hipparchus.transform.FastFourierTransformer;
import org.hipparchus.transform.TransformType;

/**
 * One-sided power spectral density of a uniformly sampled signal by Welch's averaged periodogram
 * (P. D. Welch, "The use of fast Fourier transform for the estimation of power spectra: a method based on time
 * averaging over short, modified periodograms", IEEE Trans. Audio Electroacoust. AU-15(2), 70-73, 1967):
 * the signal is cut into segments that overlap by half, each segment has its least-squares straight line
 * removed (common practice, no source), is multiplied by a periodic Hann window (F. J. Harris, "On the use of
 * windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66(1), 1978) and zero padded
 * to a power of two, and the squared magnitudes of the segments' discrete Fourier transforms are averaged.
 * <p>
 * Scaling: density(k) = 2 |X_k|^2 / (fs * sum w^2) for 0 &lt; k &lt; N/2 (|X_k|^2 / (fs * sum w^2) at 0 and
 * N/2), averaged over segments, so that the density integrates over frequency to the mean square of the signal
 * (Parseval). Units: the square of the signal's SI unit per Hz.
 */
public final class WelchSpectrum {

    private final double[] density;
    private final double gridSpacing;
    private final double resolution;
    private final double noiseBandwidth;
    private final int segments;

    private WelchSpectrum(double[] density, double gridSpacing, double resolution, double noiseBandwidth,
                          int segments) {
        this.density = density;
        this.gridSpacing = gridSpacing;
        this.resolution = resolution;
        this.noiseBandwidth = noiseBandwidth;
        this.segments = segments;
    }

    /**
     * Estimates the density.
     *
     * @param x samples, SI (not modified)
     * @param sampleInterval time between samples, s
     * @param segmentLength samples per segment, at least 8 and at most x.length
     * @param padding zero padding factor: the transform length is the smallest power of two at least
     *                padding * segmentLength; at least 1
     * @return the spectrum
     */
    public static WelchSpectrum estimate(double[] x, double sampleInterval, int segmentLength, int padding) {
        if (segmentLength < 8 || segmentLength > x.length || padding < 1 || !(sampleInterval > 0)) {
            throw new BranchsimException(ErrorKey.SPECTRUM_SETTINGS_INVALID, String.valueOf(x.length),
                    String.valueOf(segmentLength), String.valueOf(padding), String.valueOf(sampleInterval));
        }
        int fftLength = Integer.highestOneBit(Math.max(1, padding * segmentLength - 1)) << 1;
        int hop = segmentLength / 2;
        int count = 1 + (x.length - segmentLength) / hop;
        double[] window = new double[segmentLength];
        double windowPower = 0.0;
        double windowSum = 0.0;
        for (int j = 0; j < segmentLength; j++) {
            window[j] = 0.5 * (1.0 - Math.cos(2.0 * Math.PI * j / segmentLength));
            windowPower += window[j] * window[j];
            windowSum += window[j];
        }
        double fs = 1.0 / sampleInterval;
        double[] sum = new double[fftLength / 2 + 1];
        double[][] data = new double[2][fftLength];
        for (int s = 0; s < count; s++) {
            Arrays.fill(data[0], 0.0);
            Arrays.fill(data[1], 0.0);
            double[] segment = Arrays.copyOfRange(x, s * hop, s * hop + segmentLength);
            removeLine(segment);
            for (int j = 0; j < segmentLength; j++) {
                data[0][j] = segment[j] * window[j];
            }
            FastFourierTransformer.transformInPlace(data, DftNormalization.STANDARD, TransformType.FORWARD);
            for (int k = 0; k < sum.length; k++) {
                double p = data[0][k] * data[0][k] + data[1][k] * data[1][k];
                sum[k] += (k == 0 || k == fftLength / 2 ? 1.0 : 2.0) * p / (fs * windowPower);
            }
        }
        for (int k = 0; k < sum.length; k++) {
            sum[k] /= count;
        }
        double noiseBandwidth = fs * windowPower / (windowSum * windowSum);
        return new WelchSpectrum(sum, fs / fftLength, fs / segmentLength, noiseBandwidth, count);
    }

    /** Removes the least-squares straight line through equally spaced samples. */
    static void removeLine(double[] r) {
        int n = r.length;
        double mk = 0.5 * (n - 1);
        double mr = 0.0;
        for (double v : r) {
            mr += v;
        }
        mr /= n;
        double skk = 0.0;
        double skr = 0.0;
        for (int k = 0; k < n; k++) {
            skk += (k - mk) * (k - mk);
            skr += (k - mk) * (r[k] - mr);
        }
        double slope = skk > 0 ? skr / skk : 0.0;
        for (int k = 0; k < n; k++) {
            r[k] -= mr + slope * (k - mk);
        }
    }

    /** @return the number of frequency points, from 0 to the Nyquist frequency */
    public int size() {
        return density.length;
    }

    /** @return frequency of point k, Hz */
    public double frequency(int k) {
        return k * gridSpacing;
    }

    /** @return density at point k, (SI unit)^2/Hz */
    public double density(int k) {
        return density[k];
    }

    /** @return spacing of the (zero-padded) frequency grid, Hz */
    public double gridSpacing() {
        return gridSpacing;
    }

    /** @return the bin width of one unpadded segment, sample rate / segment length, Hz */
    public double resolution() {
        return resolution;
    }

    /**
     * @return the equivalent noise bandwidth of the window, fs * sum w^2 / (sum w)^2, Hz (1.5 segment bins for
     *         the Hann window: Harris, Proc. IEEE 66(1), 1978, table I)
     */
    public double noiseBandwidth() {
        return noiseBandwidth;
    }

    /**
     * Amplitude of the sine that would produce the density at point k if the point is the centre of its peak:
     * A = sqrt(2 * density * equivalent noise bandwidth) (a sine of amplitude A has mean square A^2/2, spread by
     * the window over its noise bandwidth). Off-centre points read low by the window's scalloping loss (below
     * 0.1 dB for the Hann window with padding 4 or more).
     *
     * @param k point index
     * @return the amplitude, SI
     */
    public double sineAmplitude(int k) {
        return Math.sqrt(2.0 * density[k] * noiseBandwidth);
    }

    /** @return the number of segments averaged */
    public int segments() {
        return segments;
    }

    /**
     * Median of the density over the points at or above a frequency: the spectral floor.
     *
     * @param from lowest frequency included, Hz
     * @return the median density, (SI unit)^2/Hz; 0 when no point is included
     */
    public double medianDensity(double from) {
        int k0 = Math.max(0, (int) Math.ceil(from / gridSpacing));
        if (k0 >= density.length) {
            return 0.0;
        }
        double[] band = Arrays.copyOfRange(density, k0, density.length);
        Arrays.sort(band);
        int m = band.length / 2;
        return band.length % 2 == 1 ? band[m] : 0.5 * (band[m - 1] + band[m]);
    }

    /**
     * Whether point k is a peak: the largest density within +-halfWidth segment bins
     * ({@link #resolution()}), the first of equal values winning.
     *
     * @param k point index, 0 &lt; k &lt; size() - 1
     * @param halfWidth half width of the neighbourhood, in segment bins
     * @return true when k is a peak
     */
    public boolean isPeak(int k, double halfWidth) {
        int h = Math.max(1, (int) Math.round(halfWidth * resolution / gridSpacing));
        if (k <= 0 || k >= density.length - 1 || !(density[k] > density[k - 1])) {
            return false;
        }
        for (int j = Math.max(0, k - h); j <= Math.min(density.length - 1, k + h); j++) {
            if (density[j] > density[k] || (density[j] == density[k] && j < k)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Frequency of a peak refined between grid points by a parabola through the logarithms of the density at
     * k - 1, k and k + 1 (quadratic interpolation of the log magnitude: J. O. Smith and X. Serra, "PARSHL: an
     * analysis/synthesis program for non-harmonic sounds based on a sinusoidal representation", Proc. ICMC 1987,
     * from memory).
     *
     * @param k a peak, 0 &lt; k &lt; size() - 1
     * @return the refined frequency, Hz
     */
    public double interpolatedFrequency(int k) {
        double a = Math.log(density[k - 1]);
        double b = Math.log(density[k]);
        double c = Math.log(density[k + 1]);
        double curvature = a - 2.0 * b + c;
        double offset = curvature < 0.0 ? 0.5 * (a - c) / curvature : 0.0;
        if (!Double.isFinite(offset) || Math.abs(offset) > 0.5) {
            offset = 0.0;
        }
        return (k + offset) * gridSpacing;
    }
}
