package org.branchsim.core.solve.stiff;

import java.util.function.IntToDoubleFunction;

/**
 * Finite-difference estimate of the Jacobian df/dy of dy/dt = f(y) at a fixed time, column by column: the one
 * implementation behind the implicit integrator's Jacobian and the linearisation used for modes and
 * operating points. Column j is perturbed by h_j = r * max(|y_j|, s_j) (r the relative step, s_j the state's
 * typical magnitude; h_j = r when that is zero or not finite). Columns that share no non-zero row may be
 * perturbed together, one evaluation serving a whole group (Curtis, Powell and Reid, J. Inst. Maths Applics 13,
 * 1974). Forward differences, (f(y + d_j) - f(y)) / d_j with d_j the step as represented after the addition,
 * cost one evaluation per group; central differences, (f(y + h_j) - f(y - h_j)) / (2 h_j), cost two and are
 * second-order accurate (Dennis and Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear
 * Equations, 1983, ch. 5, finite-difference derivatives).
 */
public final class DifferenceJacobian {

    /** Difference scheme. */
    public enum Scheme {
        /** One-sided: (f(y + d) - f(y)) / d. */
        FORWARD,
        /** Two-sided: (f(y + h) - f(y - h)) / (2 h). */
        CENTRAL
    }

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

    private final Scheme scheme;
    private final double relativeStep;
    private final double[] typical;
    private final int[][] groups;

    /**
     * @param scheme forward or central differences
     * @param relativeStep r, the step relative to max(|y_j|, s_j)
     * @param typical s_j, the typical magnitude of each state, SI
     * @param groups column groups that share no non-zero row (single columns when nothing is known)
     */
    public DifferenceJacobian(Scheme scheme, double relativeStep, double[] typical, int[][] groups) {
        this.scheme = scheme;
        this.relativeStep = relativeStep;
        this.typical = typical.clone();
        this.groups = new int[groups.length][];
        for (int g = 0; g < groups.length; g++) {
            this.groups[g] = groups[g].clone();
        }
    }

    /** @return groups of one column each, in the given order */
    public static int[][] singleColumns(int[] columns) {
        int[][] out = new int[columns.length][];
        for (int k = 0; k < columns.length; k++) {
            out[k] = new int[] {columns[k]};
        }
        return out;
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
     * @param f0 f(y) (used by forward differences; may be null for central ones)
     * @param column receives each column
     */
    public void estimate(Rates f, double[] y, double[] f0, Column column) {
        double[] yp = y.clone();
        double[] delta = new double[y.length];
        for (int[] group : groups) {
            if (scheme == Scheme.FORWARD) {
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
            } else {
                for (int j : group) {
                    delta[j] = step(y, j);
                    yp[j] = y[j] + delta[j];
                }
                double[] fp = f.at(yp);
                for (int j : group) {
                    yp[j] = y[j] - delta[j];
                }
                double[] fm = f.at(yp);
                for (int j : group) {
                    double hj = delta[j];
                    column.accept(j, i -> (fp[i] - fm[i]) / (2 * hj));
                    yp[j] = y[j];
                }
            }
        }
    }
}
