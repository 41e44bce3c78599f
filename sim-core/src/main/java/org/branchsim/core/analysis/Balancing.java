package org.branchsim.core.analysis;

/**
 * Balancing of a square matrix before an eigenvalue decomposition: a diagonal similarity B = D^-1 A D with D made
 * of powers of two (exact in floating point), chosen so that each row and the matching column of B have about the
 * same norm. The eigenvalues do not change and the QR iteration converges more reliably on B (Parlett &amp;
 * Reinsch, "Balancing a matrix for calculation of eigenvalues and eigenvectors", Numer. Math. 13, 1969; the
 * scaling step of LAPACK's xGEBAL, without its permutations).
 */
final class Balancing {

    private static final double RADIX = 2.0;
    private static final double CONVERGED = 0.95;
    private static final int MAX_SWEEPS = 100;

    private Balancing() {
    }

    /** @return the diagonal of D for matrix a (all ones when a is already balanced) */
    static double[] scales(double[][] a) {
        int n = a.length;
        double[] d = new double[n];
        java.util.Arrays.fill(d, 1.0);
        double[][] b = new double[n][];
        for (int i = 0; i < n; i++) {
            b[i] = a[i].clone();
        }
        boolean done = false;
        for (int sweep = 0; sweep < MAX_SWEEPS && !done; sweep++) {
            done = true;
            for (int i = 0; i < n; i++) {
                double c = 0.0;
                double r = 0.0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        c += Math.abs(b[j][i]);
                        r += Math.abs(b[i][j]);
                    }
                }
                if (c == 0.0 || r == 0.0 || !Double.isFinite(c) || !Double.isFinite(r)) {
                    continue;
                }
                double f = 1.0;
                double s = c + r;
                double g = r / RADIX;
                while (c < g) {
                    f *= RADIX;
                    c *= RADIX * RADIX;
                }
                g = r * RADIX;
                while (c > g) {
                    f /= RADIX;
                    c /= RADIX * RADIX;
                }
                // c now stands for the column sum times f^2: (c + r) / f is the row and column sum after scaling
                if ((c + r) / f < CONVERGED * s) {
                    done = false;
                    d[i] *= f;
                    for (int j = 0; j < n; j++) {
                        b[i][j] /= f;
                        b[j][i] *= f;
                    }
                }
            }
        }
        return d;
    }

    /** @return D^-1 a D for the diagonal d */
    static double[][] apply(double[][] a, double[] d) {
        int n = a.length;
        double[][] b = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                b[i][j] = a[i][j] * d[j] / d[i];
            }
        }
        return b;
    }
}
