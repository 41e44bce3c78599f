package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.units.Tolerance;

/**
 * Monte Carlo over the values a scenario writes with a tolerance: each run draws every toleranced value
 * independently and uniformly between its limits (a uniform draw is the conservative reading of a
 * tolerance band when nothing is known of the spread; common practice, no source). The draws come from one
 * seeded generator in variant order, so the same seed gives the same variants and the same numbers on any
 * number of threads.
 */
public final class ToleranceStudy {

    /** A toleranced value found in a document. @param path its path @param tolerance its limits */
    public record Parameter(String path, Tolerance tolerance) {
    }

    /** Statistics of one metric over the runs. */
    public record Statistics(String metric, int count, double mean, double p5, double p95, double min, double max) {
    }

    private ToleranceStudy() {
    }

    /** @return every value written with a tolerance, by path, in document order */
    public static List<Parameter> parameters(Located document) {
        List<Parameter> out = new ArrayList<>();
        walk(document, "", out);
        return out;
    }

    private static void walk(Located here, String path, List<Parameter> out) {
        if (here instanceof Located.Obj o) {
            for (String key : o.keys()) {
                walk(o.get(key), path.isEmpty() ? key : path + "." + key, out);
            }
        } else if (here instanceof Located.Arr a) {
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s && s.value() instanceof String id) {
                    walk(item, path + "." + id, out);
                }
            }
        } else if (here instanceof Located.Scalar s && s.value() instanceof String text) {
            Tolerance t;
            try {
                t = Tolerance.parse(text);
            } catch (IllegalArgumentException e) {
                return; // the scenario reader reports it
            }
            if (t != null) {
                out.add(new Parameter(path, t));
            }
        }
    }

    /**
     * @param parameters toleranced values
     * @param runs number of runs
     * @param seed generator seed
     * @return the variants, each with a value drawn for every parameter
     */
    public static List<Variant> draw(List<Parameter> parameters, int runs, long seed) {
        Random random = new Random(seed);
        List<Variant> out = new ArrayList<>();
        for (int i = 0; i < runs; i++) {
            Map<String, Object> values = new LinkedHashMap<>();
            for (Parameter p : parameters) {
                values.put(p.path(), p.tolerance().at(random.nextDouble()));
            }
            out.add(new Variant(i, values));
        }
        return out;
    }

    /**
     * @param metric name
     * @param values values of the successful runs (NaN values are left out)
     * @return mean, 5th and 95th percentiles (linear interpolation between order statistics), extremes
     */
    public static Statistics statistics(String metric, double[] values) {
        double[] v = Arrays.stream(values).filter(Double::isFinite).sorted().toArray();
        if (v.length == 0) {
            return new Statistics(metric, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double mean = Arrays.stream(v).average().orElse(Double.NaN);
        return new Statistics(metric, v.length, mean, percentile(v, 0.05), percentile(v, 0.95), v[0], v[v.length - 1]);
    }

    static double percentile(double[] sorted, double q) {
        double pos = q * (sorted.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
    }
}
