package org.branchsim.plots;

import java.util.List;
import org.branchsim.core.analysis.ReducingValveMetrics;

/**
 * The stretch of time that shows the landing of every variant of a sweep: from shortly before the earliest
 * variant's rise to shortly after the latest variant's settling. Each variant's landing is found from its own
 * outlet pressure samples and its own setting, by the definitions of {@link ReducingValveMetrics}: the rise is the
 * last upward crossing of {@link ReducingValveMetrics#RISE_FRACTION} of the setting before the peak, the settling
 * the time after which the outlet stays inside +-{@link ReducingValveMetrics#BAND} of the setting to the end of
 * the trace. A variant that never settles extends the window {@link #PEAK_WIDTHS} peak widths (its rise-to-peak
 * time) past its peak. Times in s, pressures in Pa.
 */
public final class LandingWindow {

    /** Time drawn before the earliest rise, as a fraction of the span from that rise to the latest end. */
    static final double LEAD = 0.2;
    /** Time drawn after the latest end, as a fraction of the same span. */
    static final double TRAIL = 0.3;
    /** Peak widths drawn past the peak of a variant that never settles. */
    static final double PEAK_WIDTHS = 4.0;
    /** Shortest window and peak width when none can be measured, as a fraction of the trace's duration. */
    static final double MINIMUM_FRACTION = 0.02;

    private LandingWindow() {
    }

    /**
     * One variant's landing.
     *
     * @param riseTime last upward crossing of the rise fraction of the setting before the peak, s (NaN when none)
     * @param peakTime time of the peak, s
     * @param peak the peak, Pa
     * @param settledAt time from which the outlet stays inside the band to the end of the trace, s (NaN when it is
     *        outside the band at the end)
     */
    public record Landing(double riseTime, double peakTime, double peak, double settledAt) {

        /** @return true when the outlet ends inside the band */
        public boolean settles() {
            return Double.isFinite(settledAt);
        }
    }

    /**
     * Finds one variant's landing.
     *
     * @param t sample times, s, increasing
     * @param p outlet pressure samples, Pa
     * @param setting the variant's setting, Pa
     * @param peak the peak the variant's metrics report (the largest outlet pressure over the scenario's metrics
     *        window, which leaves start-up out), Pa: the sample nearest it (the later one on a tie) is taken as
     *        the peak; NaN to take the largest sample of the whole trace
     * @return the landing
     */
    public static Landing of(double[] t, double[] p, double setting, double peak) {
        if (t.length == 0 || t.length != p.length) {
            throw new IllegalArgumentException("a landing needs samples, as many times as values");
        }
        int iPeak = 0;
        for (int k = 1; k < p.length; k++) {
            boolean nearer = Double.isNaN(peak) ? p[k] > p[iPeak]
                    : Math.abs(p[k] - peak) <= Math.abs(p[iPeak] - peak);
            if (nearer) {
                iPeak = k;
            }
        }
        double rise = Double.NaN;
        double level = ReducingValveMetrics.RISE_FRACTION * setting;
        for (int k = iPeak; k >= 1; k--) {
            if (p[k - 1] < level && p[k] >= level) {
                rise = t[k];
                break;
            }
        }
        double band = ReducingValveMetrics.BAND * setting;
        int lastOutside = -1;
        for (int k = 0; k < p.length; k++) {
            if (Math.abs(p[k] - setting) > band) {
                lastOutside = k;
            }
        }
        double settledAt = lastOutside == p.length - 1 ? Double.NaN : t[lastOutside + 1];
        return new Landing(rise, t[iPeak], p[iPeak], settledAt);
    }

    /**
     * @param landings every variant's landing (at least one)
     * @param first the traces' first time, s
     * @param last the traces' last time, s
     * @return {from, to} in s, inside [first, last], containing every variant's rise and peak, and its settling
     */
    public static double[] of(List<Landing> landings, double first, double last) {
        if (landings.isEmpty()) {
            throw new IllegalArgumentException("no landings");
        }
        double minimum = MINIMUM_FRACTION * (last - first);
        double start = Double.POSITIVE_INFINITY;
        double end = Double.NEGATIVE_INFINITY;
        for (Landing l : landings) {
            boolean rose = Double.isFinite(l.riseTime());
            start = Math.min(start, rose ? l.riseTime() : l.peakTime());
            double width = rose && l.peakTime() > l.riseTime() ? l.peakTime() - l.riseTime() : minimum;
            end = Math.max(end, l.settles() ? Math.max(l.settledAt(), l.peakTime())
                    : l.peakTime() + PEAK_WIDTHS * width);
        }
        double span = end - start;
        if (span < minimum) {
            double centre = 0.5 * (start + end);
            start = centre - 0.5 * minimum;
            end = centre + 0.5 * minimum;
            span = minimum;
        }
        return new double[] {Math.max(first, start - LEAD * span), Math.min(last, end + TRAIL * span)};
    }
}
