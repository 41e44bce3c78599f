package org.branchsim.core.measured;

/**
 * The events of a pressure record that a practitioner reads off a landing, measured on a window [from, to]
 * (definitions as in the reducing-valve metrics of this project, applied to the record's own settled value
 * because a measured record carries no setting; common practice, no source):
 * <ul>
 *   <li>settled value: the mean over the last {@link #STEADY_FRACTION} of the window;</li>
 *   <li>peak: the largest value in the window and its time;</li>
 *   <li>landing time: the last rise through {@link #RISE_FRACTION} of the settled value before the peak;</li>
 *   <li>settling time: from the landing time to the time after which the record stays within
 *       +-{@link #BAND} of the settled value (NaN when it leaves the band in the last sample or never landed).</li>
 * </ul>
 *
 * @param settled settled value, SI
 * @param peak peak value, SI
 * @param peakTime time of the peak, s
 * @param landingTime landing time, s (NaN when there is no rise through the fraction before the peak)
 * @param settlingTime settling time, s (NaN when undefined)
 */
public record KeyEvents(double settled, double peak, double peakTime, double landingTime, double settlingTime) {

    /** Fraction of the window averaged for the settled value. */
    public static final double STEADY_FRACTION = 0.1;
    /** Fraction of the settled value whose upward crossing marks the landing. */
    public static final double RISE_FRACTION = 0.9;
    /** Half-width of the settling band, as a fraction of the settled value. */
    public static final double BAND = 0.02;

    /**
     * @param t sample times, s (increasing)
     * @param x samples, SI
     * @param from window start, s
     * @param to window end, s
     * @return the key events of the record in the window
     */
    public static KeyEvents of(double[] t, double[] x, double from, double to) {
        int start = 0;
        while (start < t.length - 1 && t[start] < from) {
            start++;
        }
        int end = t.length - 1;
        while (end > start + 1 && t[end] > to) {
            end--;
        }
        int steadyStart = Math.max(start, end - (int) Math.floor((end - start) * STEADY_FRACTION));
        double settled = 0;
        for (int k = steadyStart; k <= end; k++) {
            settled += x[k];
        }
        settled /= end - steadyStart + 1;
        int iPeak = start;
        for (int k = start; k <= end; k++) {
            if (x[k] > x[iPeak]) {
                iPeak = k;
            }
        }
        double landing = Double.NaN;
        double level = RISE_FRACTION * settled;
        for (int k = Math.max(start, 1); k <= iPeak; k++) {
            if (x[k - 1] < level && x[k] >= level) {
                landing = t[k - 1] + (level - x[k - 1]) / (x[k] - x[k - 1]) * (t[k] - t[k - 1]);
            }
        }
        int lastOutside = -1;
        for (int k = start; k <= end; k++) {
            if (Math.abs(x[k] - settled) > BAND * Math.abs(settled)) {
                lastOutside = k;
            }
        }
        double settling = Double.NaN;
        if (!Double.isNaN(landing) && lastOutside < end) {
            double inside = lastOutside < 0 ? t[start] : t[lastOutside + 1];
            settling = Math.max(0.0, inside - landing);
        }
        return new KeyEvents(settled, x[iPeak], t[iPeak], landing, settling);
    }
}
