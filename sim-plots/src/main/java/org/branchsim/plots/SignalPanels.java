package org.branchsim.plots;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.branchsim.core.results.Trace;

/**
 * Sorts a trace's signals onto readable panels: a signal identical sample for sample to an earlier one (a valve's
 * port pressure that is its node's pressure) is drawn once under both names; small signals (whose size, the
 * {@link #SIZE_QUANTILE} quantile of the magnitude after start-up, is below {@link #SMALL_FRACTION} of the largest
 * size: pilot, drain and leakage flows beside a main flow)
 * get their own panel; no panel carries more than {@link #MAX_SERIES} series. Works on SI values; no units.
 */
public final class SignalPanels {

    /** Most series on one panel. */
    public static final int MAX_SERIES = 8;
    /** A signal whose largest magnitude after start-up is below this fraction of the largest is "small". */
    public static final double SMALL_FRACTION = 0.1;

    /** Quantile of a signal's magnitude taken as its size (so that a short spike does not make a flow large). */
    public static final double SIZE_QUANTILE = 0.99;

    /**
     * A signal as drawn.
     *
     * @param signal the trace signal whose samples are drawn
     * @param label legend label (its name, or its names joined by " = " when several signals are identical)
     */
    public record Drawn(String signal, String label) {
    }

    private SignalPanels() {
    }

    /**
     * @param trace the trace
     * @param signals signal names, in drawing order
     * @return the signals with exact duplicates merged into the first of them, in the same order
     */
    public static List<Drawn> distinct(Trace trace, List<String> signals) {
        List<String> kept = new ArrayList<>();
        List<StringBuilder> labels = new ArrayList<>();
        for (String s : signals) {
            int i = trace.indexOf(s);
            int same = -1;
            for (int k = 0; k < kept.size() && same < 0; k++) {
                if (trace.sameSeries(i, trace.indexOf(kept.get(k)))) {
                    same = k;
                }
            }
            if (same >= 0) {
                labels.get(same).append(" = ").append(s);
            } else {
                kept.add(s);
                labels.add(new StringBuilder(s));
            }
        }
        List<Drawn> out = new ArrayList<>();
        for (int k = 0; k < kept.size(); k++) {
            out.add(new Drawn(kept.get(k), labels.get(k).toString()));
        }
        return out;
    }

    /**
     * @param trace the trace
     * @param drawn signals to draw
     * @param from end of start-up, s: magnitudes are compared from here on
     * @return panels: the large signals, then the small ones, each split into groups of at most
     *         {@link #MAX_SERIES}; empty groups are left out
     */
    public static List<List<Drawn>> bySize(Trace trace, List<Drawn> drawn, double from) {
        double largest = 0.0;
        double[] size = new double[drawn.size()];
        for (int k = 0; k < drawn.size(); k++) {
            size[k] = size(trace, drawn.get(k).signal(), from);
            largest = Math.max(largest, size[k]);
        }
        List<Drawn> large = new ArrayList<>();
        List<Drawn> small = new ArrayList<>();
        for (int k = 0; k < drawn.size(); k++) {
            (size[k] < SMALL_FRACTION * largest ? small : large).add(drawn.get(k));
        }
        List<List<Drawn>> out = new ArrayList<>(limited(large));
        out.addAll(limited(small));
        return out;
    }

    /** @return the signals in groups of at most {@link #MAX_SERIES}, in order */
    public static List<List<Drawn>> limited(List<Drawn> drawn) {
        List<List<Drawn>> out = new ArrayList<>();
        int groups = (drawn.size() + MAX_SERIES - 1) / MAX_SERIES;
        for (int g = 0; g < groups; g++) {
            // spread evenly: 9 signals give 5 + 4, not 8 + 1
            int a = g * drawn.size() / groups;
            int b = (g + 1) * drawn.size() / groups;
            out.add(List.copyOf(drawn.subList(a, b)));
        }
        return out;
    }

    /** @return each signal on a panel of its own */
    public static List<List<Drawn>> single(List<Drawn> drawn) {
        return drawn.stream().map(List::of).toList();
    }

    /**
     * @return the {@link #SIZE_QUANTILE} quantile of a signal's magnitude from {@code from} on (all samples when
     *         the trace ends before it): a size that a spike lasting less than 1 % of that time does not set
     */
    static double size(Trace trace, String signal, double from) {
        double[] t = trace.times();
        double[] v = trace.series(trace.indexOf(signal));
        boolean all = t[t.length - 1] < from;
        double[] m = new double[v.length];
        int n = 0;
        for (int k = 0; k < v.length; k++) {
            if (all || t[k] >= from) {
                m[n++] = Math.abs(v[k]);
            }
        }
        if (n == 0) {
            return 0.0;
        }
        Arrays.sort(m, 0, n);
        return m[(int) Math.floor(SIZE_QUANTILE * (n - 1))];
    }
}
