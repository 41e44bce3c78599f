package org.branchsim.core.solve.stiff;

/**
 * The coefficients of a linearly implicit Rosenbrock method in the transformed form that needs no
 * matrix-vector product (Hairer and Wanner, Solving Ordinary Differential Equations II, 2nd ed., 1996,
 * sec. IV.7, eq. (7.25)): with d = 1/(h gamma),
 * <pre>
 *   (d I - J) u_i = f(t + alpha_i h, y0 + sum_j a_ij u_j) + sum_j (c_ij / h) u_j + h gammaSum_i f_t
 *   y1 = y0 + sum_j m_j u_j,   error estimate  sum_j (m_j - mHat_j) u_j
 * </pre>
 * (all sums over j &lt; i). Time is in s, the stage increments u_i in the states' SI units. A scheme also says
 * which dense output it supplies over a step.
 */
public final class RosenbrockScheme {

    /** The continuous extension a scheme supplies. */
    enum DenseOutput {
        /** Cubic Hermite from the states and derivatives at both step ends. */
        HERMITE,
        /** The method's own third-order extension from the stages (RODAS, coefficients {@code dense}). */
        STAGES
    }

    /**
     * RODAS3 (order 3, embedded order 2, four stages, L-stable and stiffly accurate): Sandu, Verwer, Blom,
     * Spee, Carmichael, Potra, "Benchmarking stiff ODE solvers for atmospheric chemistry problems II:
     * Rosenbrock solvers", Atmospheric Environment 31(20), 1997 (the coefficients branchsim has used since
     * its first implicit method). Dense output: cubic Hermite.
     */
    public static final RosenbrockScheme RODAS3 = new RosenbrockScheme(
            "Rosenbrock RODAS3 (order 3, L-stable)", 3, 0.5,
            new double[] {0.0, 0.0, 1.0, 1.0},
            new double[] {0.5, 1.5, 0.0, 0.0},
            new double[][] {{}, {0.0}, {2.0, 0.0}, {2.0, 0.0, 1.0}},
            new double[][] {{}, {4.0}, {1.0, -1.0}, {1.0, -1.0, -8.0 / 3.0}},
            new double[] {2.0, 0.0, 1.0, 1.0},
            new double[] {2.0, 0.0, 1.0, 0.0},
            DenseOutput.HERMITE, null);

    /**
     * RODAS (order 4, embedded order 3, six stages, L-stable, stiffly accurate in both solutions) with its own
     * continuous extension of order 3: Hairer and Wanner, Solving Ordinary Differential Equations II, 2nd ed.,
     * 1996, sec. IV.7 (Table 7.3 discusses the method), coefficients as in their Fortran code RODAS
     * (subroutine ROCOEF, METH = 1), written here FROM MEMORY; RosenbrockSchemeTest checks the order
     * conditions of Table 7.1 up to order 4, stiff accuracy and the gamma_i row sums from the tableau itself,
     * and the measured convergence order.
     */
    public static final RosenbrockScheme RODAS4 = new RosenbrockScheme(
            "Rosenbrock RODAS (order 4, L-stable, own dense output)", 4, 0.25,
            new double[] {0.0, 0.386, 0.21, 0.63, 1.0, 1.0},
            new double[] {0.25, -0.1043, 0.1035, -0.0362, 0.0, 0.0},
            new double[][] {
                {},
                {1.544},
                {0.9466785280815826, 0.2557011698983284},
                {3.314825187068521, 2.896124015972201, 0.9986419139977817},
                {1.221224509226641, 6.019134481288629, 12.53708332932087, -0.687886036105895},
                {1.221224509226641, 6.019134481288629, 12.53708332932087, -0.687886036105895, 1.0}},
            new double[][] {
                {},
                {-5.6688},
                {-2.430093356833875, -0.2063599157091915},
                {-0.1073529058151375, -9.594562251023355, -20.47028614809616},
                {7.496443313967647, -10.24680431464352, -33.99990352819905, 11.7089089320616},
                {8.083246795921522, -7.981132988064893, -31.52159432874371, 16.3193054312314,
                    -6.058818238834054}},
            new double[] {1.221224509226641, 6.019134481288629, 12.53708332932087, -0.687886036105895, 1.0, 1.0},
            new double[] {1.221224509226641, 6.019134481288629, 12.53708332932087, -0.687886036105895, 1.0, 0.0},
            DenseOutput.STAGES,
            new double[][] {
                {10.12623508344586, -7.487995877610167, -34.80091861555747, -7.992771707568823,
                    1.025137723295662, 0.0},
                {-0.6762803392801253, 6.087714651680015, 16.43084320892478, 24.76722511418386,
                    -6.594389125716872, 0.0}});

    private final String name;
    private final int order;
    private final double gamma;
    private final double[] alpha;
    private final double[] gammaSum;
    private final double[][] a;
    private final double[][] c;
    private final double[] m;
    private final double[] mHat;
    private final DenseOutput dense;
    private final double[][] denseCoefficients;

    private RosenbrockScheme(String name, int order, double gamma, double[] alpha, double[] gammaSum,
                             double[][] a, double[][] c, double[] m, double[] mHat, DenseOutput dense,
                             double[][] denseCoefficients) {
        this.name = name;
        this.order = order;
        this.gamma = gamma;
        this.alpha = alpha;
        this.gammaSum = gammaSum;
        this.a = a;
        this.c = c;
        this.m = m;
        this.mHat = mHat;
        this.dense = dense;
        this.denseCoefficients = denseCoefficients;
    }

    /** @return the method's name for reports */
    public String name() {
        return name;
    }

    /** @return the order of the solution (the error estimate has one order less) */
    public int order() {
        return order;
    }

    /** @return the diagonal coefficient gamma */
    public double gamma() {
        return gamma;
    }

    /** @return number of stages */
    public int stages() {
        return alpha.length;
    }

    /** @return the stage time fraction alpha_i (of the step) */
    double alpha(int i) {
        return alpha[i];
    }

    /** @return gamma_i, the coefficient of h f_t in stage i */
    double gammaSum(int i) {
        return gammaSum[i];
    }

    /** @return a_ij, j &lt; i, of the transformed stage values */
    double a(int i, int j) {
        return a[i][j];
    }

    /** @return c_ij, j &lt; i, of the transformed right-hand sides */
    double c(int i, int j) {
        return c[i][j];
    }

    /** @return weight m_j of the solution */
    double m(int j) {
        return m[j];
    }

    /** @return weight m_j minus that of the embedded solution: the error estimate's weight */
    double e(int j) {
        return m[j] - mHat[j];
    }

    /** @return weight of the embedded solution */
    double mHat(int j) {
        return mHat[j];
    }

    /** @return true when stage i's state is the step's start (a_ij all zero and alpha_i = 0): f0 serves it */
    boolean stageAtStart(int i) {
        if (alpha[i] != 0.0) {
            return false;
        }
        for (double v : a[i]) {
            if (v != 0.0) {
                return false;
            }
        }
        return true;
    }

    /** @return the dense output kind */
    DenseOutput dense() {
        return dense;
    }

    /** @return coefficient d_kj of the stages-based dense output (k = 0, 1 for the method's h2, h3), or 0 */
    double denseCoefficient(int k, int j) {
        return denseCoefficients == null ? 0.0 : denseCoefficients[k][j];
    }
}
