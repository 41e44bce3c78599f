package org.branchsim.core.estimate;

import java.util.List;

/**
 * A design run against a specification: the metric values, each spec's normalised violation and margin, the
 * objective (the largest weighted violation, so that minimising it maximises the worst weighted margin: the
 * minimax form of goal attainment, F. W. Gembicki, PhD thesis, Case Western Reserve University, 1974, from memory)
 * and the spec that binds (attains that largest value).
 *
 * @param values metric value per spec, SI or % (infinite when undefined)
 * @param violations normalised violation per spec (positive: violated)
 * @param objective max over specs of weight x violation (+infinity when the run failed)
 * @param binding index of the spec that binds (-1 when the run failed)
 * @param error why the run failed, or null
 */
public record DesignEvaluation(double[] values, double[] violations, double objective, int binding, String error) {

    /** @return true when the run succeeded and every spec is met */
    public boolean feasible() {
        return error == null && objective <= 0;
    }

    /**
     * @param specs the specs
     * @param values metric value per spec
     * @return the evaluation
     */
    public static DesignEvaluation of(List<Spec> specs, double[] values) {
        double[] g = new double[specs.size()];
        double worst = Double.NEGATIVE_INFINITY;
        int binding = -1;
        for (int i = 0; i < g.length; i++) {
            g[i] = specs.get(i).violation(values[i]);
            double w = specs.get(i).weight() * g[i];
            if (w > worst) {
                worst = w;
                binding = i;
            }
        }
        return new DesignEvaluation(values.clone(), g, worst, binding, null);
    }

    /** @return a failed run's evaluation */
    public static DesignEvaluation failed(int specs, String error) {
        double[] nan = new double[specs];
        java.util.Arrays.fill(nan, Double.NaN);
        return new DesignEvaluation(nan, nan.clone(), Double.POSITIVE_INFINITY, -1, error);
    }
}
