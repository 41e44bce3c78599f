package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds a sustained oscillation in a uniformly sampled signal. The window's linear trend is removed; the
 * period comes from the times of zero crossings of the detrended signal (with hysteresis against noise,
 * crossing times interpolated linearly), averaged over all cycles; the amplitude is fitted by linear least
 * squares of a sine and cosine at that frequency plus the trend, separately over the first and last
 * quarters of the window, which also gives the growth rate. An oscillation is reported when at least
 * {@link #MIN_CYCLES} cycles are seen and the amplitude at the end of the window is above the threshold
 * given by the caller (what counts as noise for that signal).
 */
public final class OscillationDetector {

    /** Fewest full cycles that make an oscillation. */
    public static final int MIN_CYCLES = 4;
    /** Growth rate, in cycles, below which the amplitude counts as held: |sigma| / f below this. */
    public static final double HOLD_RATE_PER_CYCLE = 0.005;

    private OscillationDetector() {
    }

    /**
     * @param name signal name
     * @param t sample times, s (uniform)
     * @param x samples, SI
     * @param from start of the window, s
     * @param to end of the window, s
     * @param threshold smallest end amplitude that counts, SI
     * @return the oscillation, or null when there is none
     */
    public static Oscillation detect(String name, double[] t, double[] x, double from, double to, double threshold) {
        int i0 = 0;
        while (i0 < t.length && t[i0] < from) {
            i0++;
        }
        int i1 = t.length - 1;
        while (i1 > i0 && t[i1] > to) {
            i1--;
        }
        int n = i1 - i0 + 1;
        if (n < 16) {
            return null;
        }
        double[] tt = new double[n];
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            tt[k] = t[i0 + k];
            r[k] = x[i0 + k];
        }
        detrend(tt, r);
        double max = 0.0;
        for (double v : r) {
            max = Math.max(max, Math.abs(v));
        }
        if (max < threshold || max == 0.0) {
            return null;
        }
        List<Double> crossings = crossings(tt, r, 0.5 * rms(r));
        if (crossings.size() < 2 * MIN_CYCLES + 1) {
            return null;
        }
        double first = crossings.get(0);
        double last = crossings.get(crossings.size() - 1);
        int halfPeriods = crossings.size() - 1;
        double frequency = halfPeriods / (2.0 * (last - first));
        int quarter = n / 4;
        double a0 = fitAmplitude(t, x, i0, i0 + quarter, frequency);
        double a1 = fitAmplitude(t, x, i0 + n - 1 - quarter, i0 + n - 1, frequency);
        double tMid0 = t[i0 + quarter / 2];
        double tMid1 = t[i0 + n - 1 - quarter / 2];
        double growth = Math.log(a1 / a0) / (tMid1 - tMid0);
        if (!(a1 >= threshold)) {
            return null;
        }
        double startAmplitude = a0 * Math.exp(-growth * (tMid0 - tt[0]));
        double endAmplitude = a1 * Math.exp(growth * (tt[n - 1] - tMid1));
        Oscillation.Trend trend = Math.abs(growth) / frequency < HOLD_RATE_PER_CYCLE ? Oscillation.Trend.LIMIT_CYCLE
                : growth > 0 ? Oscillation.Trend.GROWING : Oscillation.Trend.DECAYING;
        return new Oscillation(name, frequency, startAmplitude, endAmplitude, growth, trend, halfPeriods / 2);
    }

    private static double rms(double[] r) {
        double s = 0.0;
        for (double v : r) {
            s += v * v;
        }
        return Math.sqrt(s / r.length);
    }

    /** Removes the least-squares straight line. */
    private static void detrend(double[] t, double[] r) {
        int n = t.length;
        double mt = 0;
        double mr = 0;
        for (int k = 0; k < n; k++) {
            mt += t[k];
            mr += r[k];
        }
        mt /= n;
        mr /= n;
        double stt = 0;
        double str = 0;
        for (int k = 0; k < n; k++) {
            stt += (t[k] - mt) * (t[k] - mt);
            str += (t[k] - mt) * (r[k] - mr);
        }
        double slope = stt > 0 ? str / stt : 0.0;
        for (int k = 0; k < n; k++) {
            r[k] -= mr + slope * (t[k] - mt);
        }
    }

    /** Zero-crossing times with hysteresis: a crossing counts once the signal has gone beyond +-band. */
    private static List<Double> crossings(double[] t, double[] r, double band) {
        List<Double> out = new ArrayList<>();
        int state = 0;
        int lastSignIndex = -1;
        for (int k = 0; k < r.length; k++) {
            int s = r[k] > band ? 1 : r[k] < -band ? -1 : 0;
            if (s != 0 && s != state) {
                if (state != 0) {
                    // find the last sign change of r between lastSignIndex and k
                    int j = k;
                    while (j > lastSignIndex + 1 && Math.signum(r[j - 1]) == Math.signum(r[k])) {
                        j--;
                    }
                    double ta = t[j - 1];
                    double tb = t[j];
                    double ra = r[j - 1];
                    double rb = r[j];
                    out.add(ra == rb ? ta : ta + (tb - ta) * ra / (ra - rb));
                }
                state = s;
            }
            if (s != 0) {
                lastSignIndex = k;
            }
        }
        return out;
    }

    /** Least-squares amplitude of a sine of frequency f plus a straight line over samples a..b (inclusive). */
    private static double fitAmplitude(double[] t, double[] x, int a, int b, double f) {
        double w = 2 * Math.PI * f;
        double[][] m = new double[4][4];
        double[] v = new double[4];
        double t0 = t[a];
        for (int k = a; k <= b; k++) {
            double[] phi = {Math.sin(w * t[k]), Math.cos(w * t[k]), 1.0, t[k] - t0};
            for (int i = 0; i < 4; i++) {
                v[i] += phi[i] * x[k];
                for (int j = 0; j < 4; j++) {
                    m[i][j] += phi[i] * phi[j];
                }
            }
        }
        double[] c = solve4(m, v);
        return Math.hypot(c[0], c[1]);
    }

    private static double[] solve4(double[][] m, double[] v) {
        int n = 4;
        for (int k = 0; k < n; k++) {
            int p = k;
            for (int i = k + 1; i < n; i++) {
                if (Math.abs(m[i][k]) > Math.abs(m[p][k])) {
                    p = i;
                }
            }
            double[] tmp = m[p];
            m[p] = m[k];
            m[k] = tmp;
            double tv = v[p];
            v[p] = v[k];
            v[k] = tv;
            for (int i = k + 1; i < n; i++) {
                double f = m[i][k] / m[k][k];
                for (int j = k; j < n; j++) {
                    m[i][j] -= f * m[k][j];
                }
                v[i] -= f * v[k];
            }
        }
        double[] x = new double[n];
        for (int i = n - 1; i >= 0; i--) {
            double s = v[i];
            for (int j = i + 1; j < n; j++) {
                s -= m[i][j] * x[j];
            }
            x[i] = s / m[i][i];
        }
        return x;
    }
}
