package org.branchsim.core.analysis;

import java.util.List;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;

/** Compares two runs of one scenario sampled on the same grid (a method against a reference). */
public final class TraceComparison {

    private TraceComparison() {
    }

    /**
     * @param a the run checked
     * @param b the reference run
     * @param dimension which signals to compare
     * @return the largest |a - b| of any signal of that dimension, relative to the reference signal's range
     *         (signals that do not vary are skipped)
     */
    public static double maxErrorOverRange(Trace a, Trace b, Dimension dimension) {
        double worst = 0.0;
        for (int i = 0; i < a.columns().size(); i++) {
            if (a.columns().get(i).dimension() != dimension) {
                continue;
            }
            double[] x = a.series(i);
            double[] y = b.series(i);
            double lo = Double.MAX_VALUE;
            double hi = -Double.MAX_VALUE;
            double e = 0.0;
            for (int k = 0; k < Math.min(x.length, y.length); k++) {
                lo = Math.min(lo, y[k]);
                hi = Math.max(hi, y[k]);
                e = Math.max(e, Math.abs(x[k] - y[k]));
            }
            if (hi > lo) {
                worst = Math.max(worst, e / (hi - lo));
            }
        }
        return worst;
    }

    /**
     * @return the largest difference of event times, s, when both runs have the same events in the same order;
     *         infinity otherwise
     */
    public static double eventTimeDifference(List<EventRecord> a, List<EventRecord> b) {
        if (a.size() != b.size()) {
            return Double.POSITIVE_INFINITY;
        }
        double worst = 0.0;
        for (int k = 0; k < a.size(); k++) {
            if (!a.get(k).description().equals(b.get(k).description())) {
                return Double.POSITIVE_INFINITY;
            }
            worst = Math.max(worst, Math.abs(a.get(k).time() - b.get(k).time()));
        }
        return worst;
    }
}
