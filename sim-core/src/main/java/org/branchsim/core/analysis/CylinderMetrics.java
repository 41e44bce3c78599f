package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.model.Element;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;

/**
 * The forces a cylinder delivers, N, from a run's output samples. The cylinder force is the hydraulic force on the
 * piston, p_cap A_cap - p_rod A_rod (signal {@code <id>.force}, positive extending); the clamp force is the force
 * the piston presses on its work-piece (signal {@code <id>.contact}; only a cylinder with a work-piece has one).
 * Each gives its peak (and when), its final value and its mean over the metrics window.
 *
 * @param id the cylinder's id
 * @param force the hydraulic force on the piston, N
 * @param clamp the clamp force on the work-piece, N (null without a work-piece)
 */
public record CylinderMetrics(String id, Figures force, Figures clamp) {

    /**
     * One force's figures.
     *
     * @param peak largest value, N
     * @param peakTime when, s
     * @param last value at the end of the run, N
     * @param windowMean mean over the metrics window, N (NaN when no sample falls in it)
     */
    public record Figures(double peak, double peakTime, double last, double windowMean) {
    }

    /**
     * @param result a run
     * @param from start of the metrics window, s
     * @param to end of the metrics window, s
     * @return the figures of every cylinder, in the model's element order
     */
    public static List<CylinderMetrics> of(SimulationResult result, double from, double to) {
        Trace trace = result.trace();
        double[] t = trace.times();
        List<CylinderMetrics> list = new ArrayList<>();
        for (Element e : result.model().elements()) {
            if (!(e instanceof Cylinder)) {
                continue;
            }
            int force = trace.indexOf(e.id() + ".force");
            int contact = trace.indexOf(e.id() + ".contact");
            if (force < 0) {
                continue;
            }
            list.add(new CylinderMetrics(e.id(), figures(t, trace.series(force), from, to),
                    contact < 0 ? null : figures(t, trace.series(contact), from, to)));
        }
        return List.copyOf(list);
    }

    static Figures figures(double[] t, double[] v, double from, double to) {
        double peak = Double.NEGATIVE_INFINITY;
        double peakTime = Double.NaN;
        double sum = 0.0;
        int count = 0;
        for (int k = 0; k < v.length; k++) {
            if (v[k] > peak) {
                peak = v[k];
                peakTime = t[k];
            }
            if (t[k] >= from && t[k] <= to) {
                sum += v[k];
                count++;
            }
        }
        return new Figures(peak, peakTime, v.length == 0 ? Double.NaN : v[v.length - 1],
                count == 0 ? Double.NaN : sum / count);
    }
}
