package org.branchsim.core.solve.stiff;

import java.util.function.IntToDoubleFunction;

/**
 * Forward-difference estimate of the Jacobian df/dy of dy/dt = f(y) at a fixed time, column by column, for the
 * implicit integrator when its equations supply no Jacobian of their own (circuits assemble theirs from the
 * elements' closed-form partials). Column j is perturbed by h_j = r * max(|y_j|, s_j) (r the relative step, s_j
 * the state's typical magnitude; h_j = r when that is zero or not finite). Columns that share no non-zero row may
 * be perturbed together, one evaluation serving a whole group (Curtis, Powell and Reid, J. Inst. Maths Applics 13,
 * 1974). The quotient is (f(y + d_j) - f(y)) / d_j with d_j the step as represented after the addition, one
 * evaluation per group (Dennis and Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear
 * Equations, 1983, ch. 5, finite-difference derivatives).
 */
public final class DifferenceJacobian {

    /** The right-hand side at the fixed time: a fresh array of rates, SI per second, for a state y. */
    @FunctionalInterface
    public interface Rates {
        /** @return f(y); the caller may keep the array */
        double[] at(double[] y);
    }

    /** Receives one column: its index and the difference quotient of each row. */
    @FunctionalInterface
    public interface Column {
        /**
         * @param column the column j
         * @param quotient row i to the estimate of df_i/dy_j
         */
        void accept(int column, IntToDoubleFunction quotient);
    }

    private final double relativeStep;
    private final double[] typical;
    private final int[][] groups;

    /**
     * @param relativeStep r, the step relative to max(|y_j|, s_j)
     * @param typical s_j, the typical magnitude of each state, SI
     * @param groups column groups that share no non-zero row (single columns when nothing is known)
     */
    public DifferenceJacobian(double relativeStep, double[] typical, int[][] groups) {
        this.relativeStep = relativeStep;
        this.typical = typical.clone();
        this.groups = new int[groups.length][];
        for (int g = 0; g < groups.length; g++) {
            this.groups[g] = groups[g].clone();
        }
    }

    /** @return the step h_j for column j at state y */
    private double step(double[] y, int j) {
        double d = relativeStep * Math.max(Math.abs(y[j]), typical[j]);
        return d == 0.0 || !Double.isFinite(d) ? relativeStep : d;
    }

    /**
     * Estimates the columns of the groups, handing each to {@code column}.
     *
     * @param f the rates
     * @param y the state, SI (not changed)
     * @param f0 f(y)
     * @param column receives each column
     */
    public void estimate(Rates f, double[] y, double[] f0, Column column) {
        double[] yp = y.clone();
        double[] delta = new double[y.length];
        for (int[] group : groups) {
            for (int j : group) {
                double perturbed = y[j] + step(y, j);
                delta[j] = perturbed - y[j];
                yp[j] = perturbed;
            }
            double[] fp = f.at(yp);
            for (int j : group) {
                double dj = delta[j];
                column.accept(j, i -> (fp[i] - f0[i]) / dj);
                yp[j] = y[j];
            }
        }
    }
}
