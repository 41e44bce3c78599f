package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.model.ScheduledInput;

/**
 * A stretch of a run in which the oscillation scan looks for sustained oscillations (times in s).
 * <p>
 * The run is cut at every scheduled change (a ramp or step of any scheduled input, overlapping ramps merged into
 * one change). Each quiet interval, from the end of one change to the start of the next (or to the end of the
 * run), is given over to the circuit's response to that change for its first {@link #SETTLE_FRACTION}; the rest
 * is scanned. A transient that is still ringing at an amplitude above the noise threshold after half the interval
 * is lightly damped enough to report. The user may override this with one window of their own.
 *
 * @param from start of the scanned stretch, s
 * @param to end of the scanned stretch, s
 * @param changeEnd end of the change that precedes it (0 for the start of the run), s
 * @param change what changed at {@code changeEnd}, in words ("start of the run", "schedule change at 0.3 s",
 *        "window given by the user")
 */
public record ScanWindow(double from, double to, double changeEnd, String change) {

    /** Share of each quiet interval left to the response to the change before it (common practice, no source). */
    public static final double SETTLE_FRACTION = 0.5;

    /** Quiet intervals shorter than this are not scanned, s (too short to hold a sustained oscillation). */
    public static final double SHORTEST_INTERVAL = 1e-3;

    /** @return window length, s */
    public double length() {
        return to - from;
    }

    /** @return true when time t lies in the window (ends included) */
    public boolean contains(double t) {
        return t >= from && t <= to;
    }

    /**
     * @param inputs the circuit's scheduled inputs
     * @param endTime end of the run, s
     * @return the scanned windows in time order, one per quiet interval
     */
    public static List<ScanWindow> between(List<ScheduledInput> inputs, double endTime) {
        List<double[]> changes = new ArrayList<>();
        for (ScheduledInput in : inputs) {
            for (ScheduledInput.Ramp r : in.ramps()) {
                if (r.start() < endTime) {
                    changes.add(new double[] {r.start(), Math.min(endTime, r.start() + r.duration())});
                }
            }
        }
        changes.sort((a, b) -> Double.compare(a[0], b[0]));
        List<double[]> merged = new ArrayList<>();
        for (double[] c : changes) {
            double[] last = merged.isEmpty() ? null : merged.get(merged.size() - 1);
            if (last != null && c[0] <= last[1]) {
                last[1] = Math.max(last[1], c[1]);
            } else {
                merged.add(c.clone());
            }
        }
        List<ScanWindow> out = new ArrayList<>();
        double quietStart = 0.0;
        String change = "start of the run";
        for (double[] c : merged) {
            add(out, quietStart, c[0], change);
            quietStart = c[1];
            change = "schedule change at " + new java.math.BigDecimal(c[0]).round(new java.math.MathContext(6))
                    .stripTrailingZeros().toPlainString() + " s";
        }
        add(out, quietStart, endTime, change);
        return out;
    }

    /**
     * @param from start, s
     * @param to end, s
     * @return one window chosen by the user, scanned whole
     */
    public static ScanWindow given(double from, double to) {
        return new ScanWindow(from, to, from, "window given by the user");
    }

    private static void add(List<ScanWindow> out, double start, double end, String change) {
        if (end - start < SHORTEST_INTERVAL) {
            return;
        }
        out.add(new ScanWindow(start + SETTLE_FRACTION * (end - start), end, start, change));
    }
}
