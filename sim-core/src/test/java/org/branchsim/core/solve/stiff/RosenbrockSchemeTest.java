package org.branchsim.core.solve.stiff;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The Rosenbrock tableaus checked against the order conditions of Hairer and Wanner, Solving Ordinary
 * Differential Equations II, 2nd ed., 1996, sec. IV.7, Table 7.1 (conditions up to order 4 in the original
 * coefficients alpha_ij, gamma_ij, b_i, with beta_ij = alpha_ij + gamma_ij). The schemes are stored in the
 * transformed form of eq. (7.25); the original form is recovered here by the inverse transformation
 * Gamma^-1 = I/gamma - C, alpha = A Gamma, b^T = m^T Gamma (same section). The RODAS coefficients were
 * written from memory, so these checks are what vouches for them.
 */
class RosenbrockSchemeTest {

    /** The coefficients carry 16 significant digits; sums of products of size up to about 30 lose 2-3. */
    private static final double CONDITION_TOLERANCE = 1e-11;

    /** The original-form tableau of a scheme. */
    private static final class Original {
        final int s;
        final double gamma;
        final double[][] alpha;
        final double[][] big;
        final double[][] beta;

        Original(RosenbrockScheme scheme) {
            s = scheme.stages();
            gamma = scheme.gamma();
            double[][] inv = new double[s][s];
            double[][] aT = new double[s][s];
            for (int i = 0; i < s; i++) {
                inv[i][i] = 1.0 / gamma;
                for (int j = 0; j < i; j++) {
                    inv[i][j] = -scheme.c(i, j);
                    aT[i][j] = scheme.a(i, j);
                }
            }
            big = lowerInverse(inv);
            alpha = multiply(aT, big);
            beta = new double[s][s];
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < i; j++) {
                    beta[i][j] = alpha[i][j] + big[i][j];
                }
            }
        }

        double[] weights(java.util.function.IntToDoubleFunction m) {
            double[] b = new double[s];
            for (int j = 0; j < s; j++) {
                for (int i = j; i < s; i++) {
                    b[j] += m.applyAsDouble(i) * big[i][j];
                }
            }
            return b;
        }

        double alphaSum(int i) {
            double v = 0;
            for (int j = 0; j < i; j++) {
                v += alpha[i][j];
            }
            return v;
        }

        double betaSum(int i) {
            double v = 0;
            for (int j = 0; j < i; j++) {
                v += beta[i][j];
            }
            return v;
        }
    }

    private static double[][] lowerInverse(double[][] l) {
        int n = l.length;
        double[][] x = new double[n][n];
        for (int col = 0; col < n; col++) {
            for (int i = col; i < n; i++) {
                double v = i == col ? 1.0 : 0.0;
                for (int k = col; k < i; k++) {
                    v -= l[i][k] * x[k][col];
                }
                x[i][col] = v / l[i][i];
            }
        }
        return x;
    }

    private static double[][] multiply(double[][] p, double[][] q) {
        int n = p.length;
        double[][] r = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                for (int j = 0; j < n; j++) {
                    r[i][j] += p[i][k] * q[k][j];
                }
            }
        }
        return r;
    }

    /** Table 7.1 conditions 1..n (n = 1, 2, 4, 8 for orders 1..4): residuals, which must vanish. */
    private static double[] residuals(Original o, double[] b, int order) {
        int s = o.s;
        double g = o.gamma;
        double c1 = 0;
        double c2 = 0;
        double c3 = 0;
        double c4 = 0;
        double c5 = 0;
        double c6 = 0;
        double c7 = 0;
        double c8 = 0;
        for (int j = 0; j < s; j++) {
            double aj = o.alphaSum(j);
            c1 += b[j];
            c2 += b[j] * o.betaSum(j);
            c3 += b[j] * aj * aj;
            c5 += b[j] * aj * aj * aj;
            for (int k = 0; k < j; k++) {
                double ak = o.alphaSum(k);
                c4 += b[j] * o.beta[j][k] * o.betaSum(k);
                c6 += b[j] * aj * o.alpha[j][k] * o.betaSum(k);
                c7 += b[j] * o.beta[j][k] * ak * ak;
                for (int l = 0; l < k; l++) {
                    c8 += b[j] * o.beta[j][k] * o.beta[k][l] * o.betaSum(l);
                }
            }
        }
        double[] all = {c1 - 1.0, c2 - (0.5 - g), c3 - 1.0 / 3.0, c4 - (1.0 / 6.0 - g + g * g), c5 - 0.25,
            c6 - (1.0 / 8.0 - g / 3.0), c7 - (1.0 / 12.0 - g / 3.0),
            c8 - (1.0 / 24.0 - g / 2.0 + 1.5 * g * g - g * g * g)};
        int count = order == 1 ? 1 : order == 2 ? 2 : order == 3 ? 4 : 8;
        return java.util.Arrays.copyOf(all, count);
    }

    private static void assertConditions(RosenbrockScheme scheme, double[] b, int order, String what) {
        double[] r = residuals(new Original(scheme), b, order);
        for (int k = 0; k < r.length; k++) {
            assertEquals(0.0, r[k], CONDITION_TOLERANCE, what + ": Table 7.1 condition " + (k + 1));
        }
    }

    @Test
    void rodasSolutionSatisfiesTheOrderConditionsUpToOrderFour() {
        RosenbrockScheme s = RosenbrockScheme.RODAS4;
        Original o = new Original(s);
        assertConditions(s, o.weights(s::m), 4, "RODAS solution");
    }

    @Test
    void rodasEmbeddedSolutionHasOrderThreeButNotFour() {
        RosenbrockScheme s = RosenbrockScheme.RODAS4;
        Original o = new Original(s);
        double[] bHat = o.weights(s::mHat);
        assertConditions(s, bHat, 3, "RODAS embedded solution");
        double[] r = residuals(o, bHat, 4);
        double worst = 0;
        for (int k = 4; k < 8; k++) {
            worst = Math.max(worst, Math.abs(r[k]));
        }
        // an embedded solution of order 4 would estimate no error at all
        assertEquals(true, worst > 1e-4, "some fourth-order condition fails for the embedded solution: " + worst);
    }

    /**
     * Stiff accuracy (Hairer and Wanner IV.7 and VI.3): the solution is the last stage, b_i = beta_si with
     * alpha_s = 1, for the solution (stage 6) and the embedded one (stage 5).
     */
    @Test
    void rodasIsStifflyAccurate() {
        RosenbrockScheme s = RosenbrockScheme.RODAS4;
        Original o = new Original(s);
        double[] b = o.weights(s::m);
        double[] bHat = o.weights(s::mHat);
        int last = o.s - 1;
        for (int j = 0; j < o.s; j++) {
            double row = j < last ? o.beta[last][j] : o.gamma;
            assertEquals(row, b[j], 1e-12, "b_" + (j + 1));
            double row5 = j < last - 1 ? o.beta[last - 1][j] : j == last - 1 ? o.gamma : 0.0;
            assertEquals(row5, bHat[j], 1e-12, "bHat_" + (j + 1));
        }
        assertEquals(1.0, o.alphaSum(last), 1e-12);
        assertEquals(1.0, o.alphaSum(last - 1), 1e-12);
    }

    /**
     * The stage times alpha_i and the f_t coefficients gamma_i the integrator uses are the row sums of the
     * original alpha and Gamma (Hairer and Wanner IV.7, eq. (7.4')).
     */
    @Test
    void stageTimesAndTimeDerivativeWeightsAreTheRowSums() {
        for (RosenbrockScheme s : new RosenbrockScheme[] {RosenbrockScheme.RODAS4, RosenbrockScheme.RODAS3}) {
            Original o = new Original(s);
            for (int i = 0; i < o.s; i++) {
                double g = 0;
                for (int j = 0; j <= i; j++) {
                    g += o.big[i][j];
                }
                assertEquals(s.alpha(i), o.alphaSum(i), 1e-12, s.name() + " alpha_" + (i + 1));
                assertEquals(s.gammaSum(i), g, 1e-12, s.name() + " gamma_" + (i + 1));
            }
        }
    }

    @Test
    void rodas3SatisfiesTheOrderConditionsUpToOrderThree() {
        RosenbrockScheme s = RosenbrockScheme.RODAS3;
        Original o = new Original(s);
        assertConditions(s, o.weights(s::m), 3, "RODAS3 solution");
        assertConditions(s, o.weights(s::mHat), 2, "RODAS3 embedded solution");
    }
}
