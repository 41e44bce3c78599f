package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Units;

/**
 * A node whose pressure fell below the fluid's air-release pressure (the cavitation threshold, Pa gauge) during a
 * run, measured on the run's output grid: when it first did (s), for how long in all (s, with each crossing placed
 * by linear interpolation between samples), and the lowest absolute pressure it reached (Pa absolute) and when.
 * While a node is below the threshold air comes out of solution there; the model treats that release as instant
 * and reversible (docs/theory.md section 7.4), so the results at that node are uncertain.
 *
 * @param node node id
 * @param threshold the air-release pressure, Pa gauge
 * @param firstTime first time below the threshold, s
 * @param duration total time below the threshold, s
 * @param minimumAbsolute lowest pressure reached, Pa absolute
 * @param minimumTime when it was reached, s
 */
public record CavitationFinding(String node, double threshold, double firstTime, double duration,
                                double minimumAbsolute, double minimumTime) {

    /**
     * @param result a run
     * @return one finding per volume node that fell below the fluid's air-release pressure, in the model's node
     *         order; empty when none did
     */
    public static List<CavitationFinding> of(SimulationResult result) {
        double threshold = result.model().fluid().releasePressure();
        Trace trace = result.trace();
        double[] t = trace.times();
        List<CavitationFinding> found = new ArrayList<>();
        for (Node n : result.model().nodes()) {
            int column = trace.indexOf(n.id() + ".p");
            if (n.isTank() || column < 0) {
                continue;
            }
            CavitationFinding f = scan(n.id(), t, trace.series(column), threshold);
            if (f != null) {
                found.add(f);
            }
        }
        return List.copyOf(found);
    }

    /**
     * @param node node id
     * @param t sample times, s, rising
     * @param p pressures at those times, Pa gauge
     * @param threshold the air-release pressure, Pa gauge
     * @return the finding, or null when no sample lies below the threshold
     */
    static CavitationFinding scan(String node, double[] t, double[] p, double threshold) {
        double first = Double.NaN;
        double duration = 0.0;
        double minimum = Double.POSITIVE_INFINITY;
        double minimumTime = Double.NaN;
        for (int k = 0; k < p.length; k++) {
            if (p[k] < threshold && Double.isNaN(first)) {
                first = k == 0 || p[k - 1] < threshold ? t[k] : crossing(t[k - 1], p[k - 1], t[k], p[k], threshold);
            }
            if (p[k] < minimum) {
                minimum = p[k];
                minimumTime = t[k];
            }
            if (k > 0) {
                duration += timeBelow(t[k - 1], p[k - 1], t[k], p[k], threshold);
            }
        }
        if (Double.isNaN(first)) {
            return null;
        }
        return new CavitationFinding(node, threshold, first, duration, minimum + Units.ATMOSPHERE, minimumTime);
    }

    private static double crossing(double t0, double p0, double t1, double p1, double level) {
        return t0 + (t1 - t0) * (p0 - level) / (p0 - p1);
    }

    /** @return the part of [t0, t1] with the linearly interpolated pressure below the level, s */
    private static double timeBelow(double t0, double p0, double t1, double p1, double level) {
        boolean below0 = p0 < level;
        boolean below1 = p1 < level;
        if (below0 && below1) {
            return t1 - t0;
        } else if (below0) {
            return crossing(t0, p0, t1, p1, level) - t0;
        } else if (below1) {
            return t1 - crossing(t0, p0, t1, p1, level);
        }
        return 0.0;
    }
}
