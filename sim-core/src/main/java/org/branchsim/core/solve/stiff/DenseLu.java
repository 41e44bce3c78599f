package org.branchsim.core.solve.stiff;

/**
 * LU factorisation with partial pivoting of a small dense matrix, in place, for the repeated solves of a
 * linearly implicit method. Factorise once per step size, solve once per stage.
 */
final class DenseLu implements StepMatrixSolver {
    private final int n;
    private final double[][] lu;
    private final int[] pivot;

    DenseLu(int n) {
        this.n = n;
        this.lu = new double[n][n];
        this.pivot = new int[n];
    }

    /**
     * Factorises {@code diagonal * I - jacobian}.
     *
     * @return false when the matrix is singular to working precision
     */
    @Override
    public boolean factorise(double diagonal, double[][] jacobian) {
        for (int i = 0; i < n; i++) {
            double[] row = lu[i];
            double[] jr = jacobian[i];
            for (int j = 0; j < n; j++) {
                row[j] = -jr[j];
            }
            row[i] += diagonal;
        }
        for (int k = 0; k < n; k++) {
            int p = k;
            double max = Math.abs(lu[k][k]);
            for (int i = k + 1; i < n; i++) {
                double a = Math.abs(lu[i][k]);
                if (a > max) {
                    max = a;
                    p = i;
                }
            }
            if (max == 0.0 || !Double.isFinite(max)) {
                return false;
            }
            pivot[k] = p;
            if (p != k) {
                double[] tmp = lu[p];
                lu[p] = lu[k];
                lu[k] = tmp;
            }
            double[] rowK = lu[k];
            double inv = 1.0 / rowK[k];
            for (int i = k + 1; i < n; i++) {
                double[] rowI = lu[i];
                double f = rowI[k] * inv;
                if (f != 0.0) {
                    rowI[k] = f;
                    for (int j = k + 1; j < n; j++) {
                        rowI[j] -= f * rowK[j];
                    }
                } else {
                    rowI[k] = 0.0;
                }
            }
        }
        return true;
    }

    /** Solves in place: on return {@code b} holds x with (diagonal I - J) x = b. */
    @Override
    public void solve(double[] b) {
        for (int k = 0; k < n; k++) {
            int p = pivot[k];
            if (p != k) {
                double t = b[p];
                b[p] = b[k];
                b[k] = t;
            }
        }
        for (int i = 1; i < n; i++) {
            double[] row = lu[i];
            double s = b[i];
            for (int j = 0; j < i; j++) {
                s -= row[j] * b[j];
            }
            b[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double[] row = lu[i];
            double s = b[i];
            for (int j = i + 1; j < n; j++) {
                s -= row[j] * b[j];
            }
            b[i] = s / row[i];
        }
    }
}
