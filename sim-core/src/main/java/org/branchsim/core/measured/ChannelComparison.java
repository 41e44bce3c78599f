package org.branchsim.core.measured;

import java.util.List;
import org.branchsim.core.analysis.OscillationDetector;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.SignalOscillation;
import org.branchsim.core.analysis.SignalSamples;
import org.branchsim.core.units.Dimension;

/**
 * How well a simulated signal reproduces a measured channel over the window where both exist: the error
 * (simulated minus measured, the simulation interpolated linearly at the measured sample times) as its root mean
 * square and its largest magnitude with time, the {@link KeyEvents} of both records and their differences, and
 * the sustained oscillations the spectral detector finds in the measured channel itself (resampled to its mean
 * sample interval), so that a frequency in a log can be matched to the model's modes.
 *
 * @param signal the circuit signal
 * @param channel the measured channel's name
 * @param dimension the signal's dimension (values below in its SI unit)
 * @param from start of the compared window, s
 * @param to end of the compared window, s
 * @param samples measured samples compared
 * @param rmsError root mean square of the error, SI
 * @param peakError the error of largest magnitude (signed), SI
 * @param peakErrorTime its time, s
 * @param measured key events of the measured channel
 * @param simulated key events of the simulated signal
 * @param oscillations sustained oscillations in the measured channel, strongest first
 */
public record ChannelComparison(String signal, String channel, Dimension dimension, double from, double to,
                                int samples, double rmsError, double peakError, double peakErrorTime,
                                KeyEvents measured, KeyEvents simulated, List<SignalOscillation> oscillations) {

    /** Copies the list. */
    public ChannelComparison {
        oscillations = List.copyOf(oscillations);
    }

    /**
     * @param m the measured channel, aligned to the simulation's time
     * @param st simulated times, s
     * @param sx simulated values of the signal, SI
     * @param dimension the signal's dimension
     * @param from start of the window asked, s (clipped to the overlap)
     * @param to end of the window asked, s (clipped to the overlap)
     * @return the comparison
     */
    public static ChannelComparison of(Measurement m, double[] st, double[] sx, Dimension dimension, double from,
                                       double to) {
        double[] mt = m.time();
        double[] mx = m.values();
        double lo = Math.max(Math.max(from, st[0]), mt[0]);
        double hi = Math.min(Math.min(to, st[st.length - 1]), mt[mt.length - 1]);
        int a = 0;
        while (a < mt.length && mt[a] < lo) {
            a++;
        }
        int b = mt.length - 1;
        while (b >= 0 && mt[b] > hi) {
            b--;
        }
        int n = b - a + 1;
        double[] wt = new double[Math.max(n, 0)];
        double[] wx = new double[wt.length];
        System.arraycopy(mt, a, wt, 0, wt.length);
        System.arraycopy(mx, a, wx, 0, wx.length);
        double[] sim = Resampling.linear(st, sx, wt);
        double sum = 0;
        double peak = 0;
        double peakTime = Double.NaN;
        for (int k = 0; k < wt.length; k++) {
            double e = sim[k] - wx[k];
            sum += e * e;
            if (Math.abs(e) > Math.abs(peak)) {
                peak = e;
                peakTime = wt[k];
            }
        }
        double rms = n > 0 ? Math.sqrt(sum / n) : Double.NaN;
        KeyEvents measured = n >= 2 ? KeyEvents.of(wt, wx, lo, hi) : null;
        KeyEvents simulated = KeyEvents.of(st, sx, lo, hi);
        return new ChannelComparison(m.signal(), m.channel(), dimension, lo, hi, n, rms, peak, peakTime, measured,
                simulated, n >= OscillationDetector.MIN_SAMPLES ? oscillations(m.signal(), dimension, wt, wx) : List.of());
    }

    /** Oscillations of the measured window, on a uniform grid of its mean interval, thresholds as the run's scan. */
    private static List<SignalOscillation> oscillations(String signal, Dimension d, double[] t, double[] x) {
        double step = (t[t.length - 1] - t[0]) / (t.length - 1);
        double[] g = Resampling.grid(t[0], t[t.length - 1], step);
        double[] y = Resampling.linear(t, x, g);
        for (int k = 0; k < y.length; k++) {
            if (Double.isNaN(y[k])) {
                y[k] = x[x.length - 1];
            }
        }
        double threshold;
        if (d == Dimension.PRESSURE) {
            double mean = 0;
            for (double v : y) {
                mean += Math.abs(v);
            }
            mean /= y.length;
            threshold = Math.max(OscillationScan.PRESSURE_FLOOR, OscillationScan.PRESSURE_FRACTION * mean);
        } else {
            double max = 0;
            for (double v : y) {
                max = Math.max(max, Math.abs(v));
            }
            threshold = Math.max(OscillationScan.MOTION_FRACTION * max, Double.MIN_NORMAL);
        }
        return OscillationDetector.components(g, new SignalSamples(signal, d, y, threshold), g[0], g[g.length - 1]);
    }
}
