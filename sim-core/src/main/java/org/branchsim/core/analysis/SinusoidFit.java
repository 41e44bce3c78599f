package org.branchsim.core.analysis;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * Linear least-squares fits of sinusoids of given frequencies together with a straight line to a stretch of
 * uniformly sampled signal, by the normal equations solved with a QR decomposition. Sines and cosines are
 * advanced sample to sample by a rotation and recomputed exactly every {@link #RESEED} samples, so the
 * samples must be uniformly spaced.
 */
final class SinusoidFit {

    /** Samples between exact recomputations of the sines and cosines. */
    static final int RESEED = 64;

    private SinusoidFit() {
    }

    /**
     * Amplitudes of sinusoids at the given frequencies fitted jointly with a straight line.
     *
     * @param t sample times, s (uniform)
     * @param x samples, SI
     * @param a first sample of the stretch
     * @param b last sample of the stretch (inclusive)
     * @param frequencies frequencies, Hz
     * @return the amplitude sqrt(s^2 + c^2) of the sine s*sin + c*cos at each frequency, SI
     */
    static double[] amplitudes(double[] t, double[] x, int a, int b, double[] frequencies) {
        double[] coefficients = solve(t, x, a, b, frequencies).coefficients();
        double[] out = new double[frequencies.length];
        for (int j = 0; j < frequencies.length; j++) {
            out[j] = Math.hypot(coefficients[2 + 2 * j], coefficients[3 + 2 * j]);
        }
        return out;
    }

    /**
     * Sum of squares of the signal explained by a sine and cosine at one frequency together with a straight
     * line (b^T c of the normal equations); as a function of the frequency its maximum is the least-squares
     * estimate of the frequency of a single sinusoid.
     *
     * @param t sample times, s (uniform)
     * @param x samples, SI
     * @param a first sample
     * @param b last sample (inclusive)
     * @param frequency frequency, Hz
     * @return the explained sum of squares, SI^2
     */
    static double explained(double[] t, double[] x, int a, int b, double frequency) {
        Solution solution = solve(t, x, a, b, new double[] {frequency});
        double[] c = solution.coefficients();
        double[] v = solution.rightHandSide();
        double s = 0.0;
        for (int i = 0; i < c.length; i++) {
            s += v[i] * c[i];
        }
        return s;
    }

    /** Coefficients of line and sinusoids (1, scaled time, then sine and cosine per frequency) and the normal equations' right-hand side. */
    private record Solution(double[] coefficients, double[] rightHandSide) {
    }

    /** Builds and solves the normal equations. */
    private static Solution solve(double[] t, double[] x, int a, int b, double[] f) {
        int m = f.length;
        int p = 2 + 2 * m;
        double[][] g = new double[p][p];
        double[] v = new double[p];
        double[] phi = new double[p];
        double t0 = t[a];
        double mid = 0.5 * (t[a] + t[b]);
        double half = b > a ? 0.5 * (t[b] - t[a]) : 1.0;
        double h = b > a ? (t[b] - t[a]) / (b - a) : 0.0;
        double[] sin = new double[m];
        double[] cos = new double[m];
        double[] stepSin = new double[m];
        double[] stepCos = new double[m];
        for (int j = 0; j < m; j++) {
            stepSin[j] = Math.sin(2.0 * Math.PI * f[j] * h);
            stepCos[j] = Math.cos(2.0 * Math.PI * f[j] * h);
        }
        for (int k = a; k <= b; k++) {
            if ((k - a) % RESEED == 0) {
                for (int j = 0; j < m; j++) {
                    double angle = 2.0 * Math.PI * f[j] * (t[k] - t0);
                    sin[j] = Math.sin(angle);
                    cos[j] = Math.cos(angle);
                }
            }
            phi[0] = 1.0;
            phi[1] = (t[k] - mid) / half;
            for (int j = 0; j < m; j++) {
                phi[2 + 2 * j] = sin[j];
                phi[3 + 2 * j] = cos[j];
            }
            double xk = x[k];
            for (int i = 0; i < p; i++) {
                double pi = phi[i];
                v[i] += pi * xk;
                double[] gi = g[i];
                for (int j = i; j < p; j++) {
                    gi[j] += pi * phi[j];
                }
            }
            for (int j = 0; j < m; j++) {
                double s = sin[j] * stepCos[j] + cos[j] * stepSin[j];
                cos[j] = cos[j] * stepCos[j] - sin[j] * stepSin[j];
                sin[j] = s;
            }
        }
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < i; j++) {
                g[i][j] = g[j][i];
            }
        }
        RealVector solution = new QRDecomposition(new Array2DRowRealMatrix(g, false)).getSolver()
                .solve(new ArrayRealVector(v, false));
        return new Solution(solution.toArray(), v);
    }
}
