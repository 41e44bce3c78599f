package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;

/**
 * Finds sustained oscillations in uniformly sampled signals by their spectrum, tells harmonics from separate
 * oscillations, and groups the signals that take part in one oscillation.
 * <p>
 * Per signal, over the window [from, to] of duration T:
 * <ol>
 *   <li>the least-squares straight line is removed;</li>
 *   <li>the power spectral density is estimated by Welch's averaged periodogram ({@link WelchSpectrum}) with
 *       segments of half the window overlapping by half (three segments), so that the lowest reportable
 *       frequency, {@link #MIN_CYCLES} / T, lies {@link #MIN_CYCLES} / 2 = 4 segment bins above zero, clear of
 *       the Hann main lobe at zero frequency (2 bins wide); segments are zero padded {@link #PADDING} times;</li>
 *   <li>a peak is a point of the density, at least one segment bin below the Nyquist frequency, that is the
 *       largest within +-{@link #PEAK_HALF_WIDTH} segment bins
 *       (the Hann main lobe of a sinusoid is +-2 bins wide, while the side lobes of a windowed transient are
 *       one bin apart, so side lobes are not peaks); its frequency is refined by quadratic interpolation of
 *       the log density and then by least squares: the frequency within +-half a segment bin that maximises
 *       the power explained by a sine, cosine and straight line fitted to the whole window (the
 *       maximum-likelihood frequency of one tone in white noise: D. C. Rife and R. R. Boorstyn, "Single-tone
 *       parameter estimation from discrete-time observations", IEEE Trans. Inf. Theory IT-20(5), 1974, from
 *       memory); two peaks closer than one segment bin count as one (the stronger);</li>
 *   <li>a peak is significant when (a) its density is at least {@link #FLOOR_FACTOR} times the spectral floor,
 *       the median density from {@link #MIN_CYCLES} / T up to the Nyquist frequency, (b) its amplitude over
 *       the last quarter of the window (least squares, all peaks and a straight line fitted together) is at
 *       least the caller's threshold, so a ringing that has died away by the end of the window does not count,
 *       and (c) at least {@link #MIN_CYCLES} of its cycles fit in the window; to save work only the
 *       {@link #MAX_PEAKS} densest peaks are examined and those whose density implies an amplitude below
 *       {@link #PRESCREEN} times the threshold are skipped;</li>
 *   <li>significant peaks are taken from the lowest frequency up; a peak within {@link #HARMONIC_TOLERANCE}
 *       of the fundamental from an integer multiple (2 or more) of a lower fundamental is a harmonic of it,
 *       otherwise it is the fundamental of a new component. Taking peaks from the lowest up means that before
 *       a peak at f is called a fundamental, significant peaks at f/2 and f/3 have already claimed it, so a
 *       strong second harmonic is never reported as an oscillation of its own;</li>
 *   <li>for each component: the fundamental's amplitude over the whole window and over the first and last
 *       quarters (least squares), the growth rate ln(a_last / a_first) / (time between the quarter centres),
 *       and the trend: held (limit cycle) when |growth rate| / frequency is below
 *       {@link #HOLD_RATE_PER_CYCLE}.</li>
 * </ol>
 * Across signals, {@link OscillationGrouping} gathers the components of one physical oscillation.
 * Limitation: an unrelated oscillation whose frequency happens to be an integer multiple of another's (within
 * the tolerance) is taken for its harmonic.
 */
public final class OscillationDetector {

    /**
     * Fewest cycles of a component in the window (common practice, no source: enough for the frequency to be
     * resolved by half-window segments and for the first and last quarters to hold two cycles each).
     */
    public static final int MIN_CYCLES = 8;
    /**
     * Growth rate per cycle below which the amplitude counts as held: |sigma| / f below this, i.e. less than
     * 0.5 % amplitude change per cycle (common practice, no source).
     */
    public static final double HOLD_RATE_PER_CYCLE = 0.005;
    /**
     * Factor by which a peak's density must exceed the spectral floor (median density of the band). Common
     * practice, no source. Rationale: for white Gaussian noise each point of a three-segment Welch density is
     * about chi-square with 6 degrees of freedom, whose median is 0.89 times its mean; it exceeds 10 times the
     * median with probability about 1e-9 (the overlap of the segments makes it a few times larger), so noise
     * alone does not make peaks.
     */
    public static final double FLOOR_FACTOR = 10.0;
    /**
     * Largest distance of a harmonic from the integer multiple of its fundamental, as a fraction of the
     * fundamental (common practice, no source: four times the 0.5 % frequency accuracy of the estimator).
     */
    public static final double HARMONIC_TOLERANCE = 0.02;
    /**
     * Most spectral peaks examined per signal, the strongest by density (fewer in short windows: a quarter of
     * the window must hold twice as many samples as the joint least-squares fit has unknowns).
     */
    public static final int MAX_PEAKS = 24;
    /** Half width, in segment bins, of the neighbourhood in which a peak must be the largest density. */
    public static final double PEAK_HALF_WIDTH = 1.5;
    /** Zero padding factor of the Welch segments. */
    public static final int PADDING = 4;
    /** Fewest samples in the window for any analysis. */
    public static final int MIN_SAMPLES = 64;
    /**
     * Fraction of the threshold that the amplitude implied by a peak's density ({@link WelchSpectrum#sineAmplitude},
     * an average over the window) must reach before the peak is refined and fitted. It only saves work; the
     * final test (b) is made on the last-quarter fit. An oscillation that grows so fast that its window average
     * falls far below its last-quarter amplitude, more than about a hundredfold within the last quarter, can be
     * missed.
     */
    public static final double PRESCREEN = 0.1;
    /** Largest relative deviation of a sample interval from the first one for the samples to count as uniform. */
    static final double UNIFORMITY = 1e-6;

    private OscillationDetector() {
    }

    /**
     * Detects and groups the oscillations of many signals sampled at the same times.
     *
     * @param t sample times, s (uniform)
     * @param signals the signals, each with its dimension and threshold
     * @param from start of the window, s
     * @param to end of the window, s
     * @return one group per physical oscillation, strongest first (see {@link OscillationGrouping#group})
     */
    public static List<OscillationGroup> detect(double[] t, List<SignalSamples> signals, double from, double to) {
        List<SignalOscillation> all = new ArrayList<>();
        for (SignalSamples s : signals) {
            all.addAll(components(t, s, from, to));
        }
        return OscillationGrouping.group(all);
    }

    /**
     * The oscillation components of one signal.
     *
     * @param t sample times, s (uniform)
     * @param signal the signal, its dimension and threshold
     * @param from start of the window, s
     * @param to end of the window, s
     * @return the components, strongest first (strength = end amplitude / threshold; ties: lower frequency first);
     *         empty when there is none
     */
    public static List<SignalOscillation> components(double[] t, SignalSamples signal, double from, double to) {
        double[] x = signal.samples();
        if (x.length != t.length) {
            throw new BranchsimException(ErrorKey.SAMPLE_COUNT_MISMATCH, signal.name(), String.valueOf(x.length),
                    String.valueOf(t.length));
        }
        int i0 = 0;
        while (i0 < t.length && t[i0] < from) {
            i0++;
        }
        int i1 = t.length - 1;
        while (i1 > i0 && t[i1] > to) {
            i1--;
        }
        if (i1 - i0 + 1 < MIN_SAMPLES) {
            return List.of();
        }
        double h = t[i0 + 1] - t[i0];
        if (Math.abs(t[i1] - t[i1 - 1] - h) > UNIFORMITY * h) {
            i1--;
        }
        int n = i1 - i0 + 1;
        double[] tt = new double[n];
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            tt[k] = t[i0 + k];
            r[k] = x[i0 + k];
            if (k > 0 && Math.abs(tt[k] - tt[k - 1] - h) > UNIFORMITY * h) {
                throw new BranchsimException(ErrorKey.NON_UNIFORM_SAMPLES, String.valueOf(tt[k] - tt[k - 1]),
                        String.valueOf(tt[k]), String.valueOf(h));
            }
        }
        WelchSpectrum.removeLine(r);
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (double v : r) {
            max = Math.max(max, v);
            min = Math.min(min, v);
        }
        if (!(Math.max(max, -min) >= signal.threshold())) {
            return List.of();
        }
        return new SignalComponents(signal, tt, r, 0.5 * (max - min)).components();
    }

    /**
     * Detects the strongest oscillation component of one signal, in the single-frequency form.
     *
     * @param name signal name
     * @param t sample times, s (uniform)
     * @param x samples, SI
     * @param from start of the window, s
     * @param to end of the window, s
     * @param threshold smallest end amplitude that counts, SI; positive
     * @return the strongest component's fundamental, or null when there is none
     */
    public static Oscillation detect(String name, double[] t, double[] x, double from, double to, double threshold) {
        List<SignalOscillation> found = components(t, new SignalSamples(name, Dimension.DIMENSIONLESS, x, threshold),
                from, to);
        return found.isEmpty() ? null : found.get(0).toOscillation();
    }
}
