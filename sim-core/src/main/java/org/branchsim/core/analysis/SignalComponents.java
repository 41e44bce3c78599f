package org.branchsim.core.analysis;

import static org.branchsim.core.analysis.OscillationDetector.FLOOR_FACTOR;
import static org.branchsim.core.analysis.OscillationDetector.HARMONIC_TOLERANCE;
import static org.branchsim.core.analysis.OscillationDetector.HOLD_RATE_PER_CYCLE;
import static org.branchsim.core.analysis.OscillationDetector.MAX_PEAKS;
import static org.branchsim.core.analysis.OscillationDetector.MIN_CYCLES;
import static org.branchsim.core.analysis.OscillationDetector.PADDING;
import static org.branchsim.core.analysis.OscillationDetector.PEAK_HALF_WIDTH;
import static org.branchsim.core.analysis.OscillationDetector.PRESCREEN;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The spectral analysis of one detrended window of one signal, as described in {@link OscillationDetector}:
 * Welch spectrum, peaks, their least-squares refinement, significance, harmonic families and the component
 * records. Samples are uniformly spaced in time (s) and in the signal's SI unit.
 */
final class SignalComponents {

    /** A spectral peak: refined frequency (Hz), density ((SI unit)^2/Hz) and density over the floor. */
    private record Peak(double frequency, double density, double peakToFloor) {
    }

    /** Frequencies of the coarse scan before the golden-section search of the least-squares refinement. */
    private static final int COARSE_POINTS = 7;
    /** Golden-section steps: shrink the bracket of a quarter segment bin by 0.618^16, about 5e-4. */
    private static final int GOLDEN_ITERATIONS = 16;

    private final SignalSamples signal;
    private final double[] t;
    private final double[] r;
    private final double halfPeakToPeak;
    private final double duration;

    /**
     * @param signal the signal (name, dimension, threshold)
     * @param t the window's sample times, s (uniform)
     * @param r the window's samples with their least-squares line removed, SI
     * @param halfPeakToPeak half the peak-to-peak of r, SI
     */
    SignalComponents(SignalSamples signal, double[] t, double[] r, double halfPeakToPeak) {
        this.signal = signal;
        this.t = t;
        this.r = r;
        this.halfPeakToPeak = halfPeakToPeak;
        this.duration = t[t.length - 1] - t[0];
    }

    /** @return the components, strongest first (ties: lower frequency first) */
    List<SignalOscillation> components() {
        int n = r.length;
        WelchSpectrum spectrum = WelchSpectrum.estimate(r, duration / (n - 1), n / 2, PADDING);
        List<Peak> peaks = peaks(spectrum);
        if (peaks.isEmpty()) {
            return List.of();
        }
        double[] f = new double[peaks.size()];
        for (int j = 0; j < f.length; j++) {
            f[j] = peaks.get(j).frequency();
        }
        int q = n / 4;
        double[] whole = SinusoidFit.amplitudes(t, r, 0, n - 1, f);
        double[] first = SinusoidFit.amplitudes(t, r, 0, q - 1, f);
        double[] last = SinusoidFit.amplitudes(t, r, n - q, n - 1, f);
        double tMidFirst = 0.5 * (t[0] + t[q - 1]);
        double tMidLast = 0.5 * (t[n - q] + t[n - 1]);
        List<Integer> significant = new ArrayList<>();
        for (int j = 0; j < f.length; j++) {
            if (last[j] >= signal.threshold()) {
                significant.add(j);
            }
        }
        significant.sort(Comparator.comparingDouble(j -> f[j]));
        List<Integer> fundamentals = new ArrayList<>();
        List<List<Harmonic>> harmonics = new ArrayList<>();
        for (int j : significant) {
            int home = -1;
            int multiple = 0;
            double error = Double.POSITIVE_INFINITY;
            for (int c = 0; c < fundamentals.size(); c++) {
                double f0 = f[fundamentals.get(c)];
                int m = Harmonics.multiple(f[j], f0, HARMONIC_TOLERANCE);
                double e = Math.abs(f[j] - m * f0) / f0;
                if (m >= 2 && e < error) {
                    home = c;
                    multiple = m;
                    error = e;
                }
            }
            if (home < 0) {
                fundamentals.add(j);
                harmonics.add(new ArrayList<>());
            } else {
                harmonics.get(home).add(new Harmonic(multiple, f[j], whole[j]));
            }
        }
        List<SignalOscillation> out = new ArrayList<>();
        for (int c = 0; c < fundamentals.size(); c++) {
            int j = fundamentals.get(c);
            double a0 = Math.max(first[j], 1e-12 * last[j]);
            double a1 = last[j];
            double growth = Math.log(a1 / a0) / (tMidLast - tMidFirst);
            double start = a0 * Math.exp(-growth * (tMidFirst - t[0]));
            double end = a1 * Math.exp(growth * (t[n - 1] - tMidLast));
            Oscillation.Trend trend = Math.abs(growth) / f[j] < HOLD_RATE_PER_CYCLE ? Oscillation.Trend.LIMIT_CYCLE
                    : growth > 0 ? Oscillation.Trend.GROWING : Oscillation.Trend.DECAYING;
            List<Harmonic> hs = new ArrayList<>(harmonics.get(c));
            hs.sort(Comparator.comparingInt(Harmonic::multiple).thenComparingDouble(Harmonic::frequency));
            out.add(new SignalOscillation(signal.name(), signal.dimension(), f[j], whole[j], halfPeakToPeak, hs,
                    start, end, growth, trend, (int) Math.floor(f[j] * duration), signal.threshold(),
                    peaks.get(j).peakToFloor()));
        }
        out.sort(Comparator.comparingDouble(SignalOscillation::strength).reversed()
                .thenComparingDouble(SignalOscillation::frequency));
        return out;
    }

    /**
     * Spectral peaks that pass the floor and cycle tests and the amplitude prescreen, refined,
     * strongest density first, one per segment bin.
     */
    private List<Peak> peaks(WelchSpectrum spectrum) {
        double fMin = MIN_CYCLES / duration;
        double floor = spectrum.medianDensity(fMin);
        List<Integer> bins = new ArrayList<>();
        double nyquist = spectrum.frequency(spectrum.size() - 1);
        for (int k = 1; k < spectrum.size() - 1; k++) {
            if (spectrum.frequency(k) + spectrum.resolution() >= fMin
                    && spectrum.frequency(k) <= nyquist - spectrum.resolution()
                    && spectrum.isPeak(k, PEAK_HALF_WIDTH)
                    && spectrum.density(k) >= FLOOR_FACTOR * floor) {
                bins.add(k);
            }
        }
        bins.sort(Comparator.comparingDouble((Integer k) -> spectrum.density(k)).reversed());
        // a quarter of the window must hold at least twice as many samples as the joint fit has unknowns
        int most = Math.min(MAX_PEAKS, (r.length / 4 - 4) / 4);
        List<Peak> out = new ArrayList<>();
        for (int k : bins.subList(0, Math.min(most, bins.size()))) {
            if (spectrum.sineAmplitude(k) < PRESCREEN * signal.threshold()) {
                continue;
            }
            double f = refine(spectrum.interpolatedFrequency(k), 0.5 * spectrum.resolution(),
                    nyquist - 0.5 * spectrum.resolution());
            boolean distinct = true;
            for (Peak p : out) {
                distinct &= Math.abs(p.frequency() - f) >= spectrum.resolution();
            }
            if (f * duration >= MIN_CYCLES && distinct) {
                out.add(new Peak(f, spectrum.density(k), spectrum.density(k) / floor));
            }
        }
        return out;
    }

    /**
     * The frequency within +-halfWidth of a first estimate (and below a ceiling) that maximises the power
     * explained by one sinusoid and a line over the whole window: a coarse scan, then golden-section search
     * around its best.
     */
    private double refine(double estimate, double halfWidth, double ceiling) {
        double lo = Math.max(estimate - halfWidth, 0.5 * estimate);
        double hi = Math.min(estimate + halfWidth, ceiling);
        double step = (hi - lo) / (COARSE_POINTS - 1);
        double best = estimate;
        double bestValue = explained(estimate);
        for (int i = 0; i < COARSE_POINTS; i++) {
            double f = lo + i * step;
            double v = explained(f);
            if (v > bestValue) {
                best = f;
                bestValue = v;
            }
        }
        double a = Math.max(lo, best - step);
        double b = Math.min(hi, best + step);
        double ratio = 0.5 * (Math.sqrt(5.0) - 1.0);
        double c = b - ratio * (b - a);
        double d = a + ratio * (b - a);
        double fc = explained(c);
        double fd = explained(d);
        for (int i = 0; i < GOLDEN_ITERATIONS; i++) {
            if (fc >= fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - ratio * (b - a);
                fc = explained(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + ratio * (b - a);
                fd = explained(d);
            }
        }
        double golden = 0.5 * (a + b);
        return explained(golden) >= bestValue ? golden : best;
    }

    private double explained(double f) {
        return SinusoidFit.explained(t, r, 0, r.length - 1, f);
    }
}
