package org.branchsim.core.solve.stiff;

import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.LocalizedODEFormats;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.hipparchus.util.FastMath;

/**
 * L-stable, linearly implicit Rosenbrock method of order 3 with an embedded order-2 error estimate: the
 * four-stage, stiffly accurate RODAS3 scheme (Sandu, Verwer, Blom, Spee, Carmichael, Potra, "Benchmarking
 * stiff ODE solvers for atmospheric chemistry problems II: Rosenbrock solvers", Atmospheric Environment
 * 31(20), 1997; form and theory: Hairer and Wanner, Solving Ordinary Differential Equations II, 2nd ed.,
 * 1996, sec. IV.7). Each stage solves (I/(h gamma) - J) K_i = f(t + alpha_i h, y + sum a_ij K_j)
 * + sum (c_ij/h) K_j + h gamma_i f_t with one LU factorisation per step size.
 * <p>
 * Built on Hipparchus's {@link AdaptiveStepsizeIntegrator} so that event detectors, step handlers and
 * dense output work as for the explicit methods. Dense output is cubic Hermite. The Jacobian is estimated
 * by forward differences ({@link DifferenceJacobian}, step sqrt(eps) relative to the larger of |y_j| and the
 * state's absolute over relative tolerance) grouped by a {@link SparsityPattern}, kept while steps are accepted, and refreshed
 * after a rejected step, after every event reset, and when it has served {@code maxJacobianAge} steps.
 * Forward integration only.
 */
public final class RosenbrockIntegrator extends AdaptiveStepsizeIntegrator {

    /** Method name. */
    public static final String METHOD_NAME = "Rosenbrock RODAS3 (order 3, L-stable)";

    private static final double GAMMA = 0.5;
    private static final double A31 = 2.0;
    private static final double A41 = 2.0;
    private static final double A43 = 1.0;
    private static final double C21 = 4.0;
    private static final double C31 = 1.0;
    private static final double C32 = -1.0;
    private static final double C41 = 1.0;
    private static final double C42 = -1.0;
    private static final double C43 = -8.0 / 3.0;
    private static final double G1 = 0.5;
    private static final double G2 = 1.5;
    private static final double M1 = 2.0;
    private static final double M3 = 1.0;
    private static final double M4 = 1.0;
    private static final double SAFETY = 0.9;
    private static final double MIN_FACTOR = 0.2;
    private static final double MAX_FACTOR = 6.0;
    private static final double ORDER = 3.0;
    /** Relative finite-difference step, sqrt of the unit round-off. */
    private static final double SQRT_EPS = FastMath.sqrt(Math.ulp(1.0));

    private final SparsityPattern pattern;
    private final int maxJacobianAge;
    private java.util.function.DoublePredicate timeDependent = t -> true;
    private JacobianSource jacobianSource;
    private StepMatrixSolver linearSolver;
    private long accepted;
    private long rejected;
    private long jacobians;
    private long factorisations;
    private int worstComponent = -1;

    /**
     * @param minStep smallest step, s
     * @param maxStep largest step, s
     * @param absTol absolute tolerance per state
     * @param relTol relative tolerance per state
     * @param pattern Jacobian sparsity (use {@link SparsityPattern#dense} when unknown)
     * @param maxJacobianAge number of accepted steps a Jacobian may serve (1 = fresh every step)
     */
    public RosenbrockIntegrator(double minStep, double maxStep, double[] absTol, double[] relTol,
                                SparsityPattern pattern, int maxJacobianAge) {
        super(METHOD_NAME, minStep, maxStep, absTol, relTol);
        this.pattern = pattern;
        this.maxJacobianAge = Math.max(1, maxJacobianAge);
    }

    /**
     * Tells the integrator where the equations depend on time explicitly; elsewhere the time derivative f_t
     * is zero and its finite difference (one evaluation per Jacobian) is skipped. Default: everywhere.
     */
    public void setTimeDependence(java.util.function.DoublePredicate dependsOnTimeAt) {
        this.timeDependent = dependsOnTimeAt;
    }

    /**
     * Takes the Jacobian from {@code source} instead of estimating it by finite differences (null restores the
     * differences). The time derivative f_t is still estimated by one difference where the equations depend on
     * time.
     */
    public void setJacobianSource(JacobianSource source) {
        this.jacobianSource = source;
    }

    /**
     * Solves the stages' linear systems with {@code solver} (sized for this integrator's equations) instead of
     * dense LU; null restores dense LU.
     */
    public void setLinearSolver(StepMatrixSolver solver) {
        this.linearSolver = solver;
    }

    /** @return steps accepted in the last integration */
    public long acceptedSteps() {
        return accepted;
    }

    /** @return steps rejected by the error control in the last integration */
    public long rejectedSteps() {
        return rejected;
    }

    /** @return Jacobian evaluations in the last integration */
    public long jacobianEvaluations() {
        return jacobians;
    }

    /** @return index of the state with the largest scaled error in the last step tried (-1 before any) */
    public int worstComponent() {
        return worstComponent;
    }

    /** @return LU factorisations in the last integration */
    public long luFactorisations() {
        return factorisations;
    }

    @Override
    public ODEStateAndDerivative integrate(ExpandableODE equations, ODEState initialState, double finalTime)
            throws MathIllegalArgumentException, MathIllegalStateException {
        sanityChecks(initialState, finalTime);
        if (finalTime < initialState.getTime()) {
            throw new MathIllegalArgumentException(LocalizedODEFormats.PROPAGATION_DIRECTION_MISMATCH);
        }
        accepted = 0;
        rejected = 0;
        jacobians = 0;
        factorisations = 0;
        setStepStart(initIntegration(equations, initialState, finalTime));
        EquationsMapper mapper = equations.getMapper();
        int n = mapper.getTotalDimension();
        if (pattern.dimension() != n) {
            throw new MathIllegalArgumentException(org.hipparchus.exception.LocalizedCoreFormats.DIMENSIONS_MISMATCH, pattern.dimension(), n);
        }
        double[][] jac = new double[n][n];
        double[] ft = new double[n];
        StepMatrixSolver lu = linearSolver != null ? linearSolver : new DenseLu(n);
        double[] k1 = new double[n];
        double[] k2 = new double[n];
        double[] k3 = new double[n];
        double[] k4 = new double[n];
        double[] yStage = new double[n];
        DifferenceJacobian differences = differences(n);

        double[] scale = new double[getStepSizeHelper().getMainSetDimension()];
        for (int i = 0; i < scale.length; i++) {
            scale[i] = getStepSizeHelper().getTolerance(i, FastMath.abs(getStepStart().getCompleteState()[i]));
        }
        double h = initializeStep(true, 3, scale, getStepStart());
        boolean jacobianFresh = false;
        int jacobianAge = Integer.MAX_VALUE;
        setIsLastStep(false);
        do {
            ODEStateAndDerivative start = getStepStart();
            double t = start.getTime();
            double[] y = start.getCompleteState();
            double[] f0 = start.getCompleteDerivative();
            if (jacobianAge >= maxJacobianAge) {
                estimateJacobian(differences, t, y, f0, h, jac, ft);
                jacobianFresh = true;
                jacobianAge = 0;
            }
            double error;
            double[] y1 = new double[n];
            while (true) {
                if (t + h >= finalTime) {
                    h = finalTime - t;
                }
                setStepSize(h);
                boolean ok = lu.factorise(1.0 / (h * GAMMA), jac);
                factorisations++;
                if (ok) {
                    error = stages(t, y, f0, ft, h, lu, k1, k2, k3, k4, yStage, y1);
                } else {
                    error = Double.NaN;
                }
                if (error <= 1.0) {
                    break;
                }
                rejected++;
                if (!jacobianFresh) {
                    estimateJacobian(differences, t, y, f0, h, jac, ft);
                    jacobianFresh = true;
                    jacobianAge = 0;
                }
                double factor = Double.isFinite(error)
                        ? FastMath.max(MIN_FACTOR, SAFETY * FastMath.pow(error, -1.0 / ORDER)) : 0.25;
                h = getStepSizeHelper().filterStep(h * factor, true, false);
            }
            double tEnd = t + h;
            double[] f1 = computeDerivatives(tEnd, y1);
            ODEStateAndDerivative end = mapper.mapStateAndDerivative(tEnd, y1, f1);
            accepted++;
            jacobianAge++;
            jacobianFresh = false;
            HermiteInterpolator interpolator = new HermiteInterpolator(true, start, end, start, end, mapper);
            setStepStart(acceptStep(interpolator, finalTime));
            if (resetOccurred()) {
                jacobianAge = Integer.MAX_VALUE;
            }
            if (!isLastStep()) {
                double factor = FastMath.min(MAX_FACTOR, FastMath.max(MIN_FACTOR,
                        SAFETY * FastMath.pow(FastMath.max(error, 1e-10), -1.0 / ORDER)));
                double next = getStepSizeHelper().filterStep(h * factor, true, true);
                double remaining = finalTime - getStepStart().getTime();
                h = next >= remaining ? remaining : next;
                if (h <= 0.0) {
                    setIsLastStep(true);
                }
            }
        } while (!isLastStep());
        ODEStateAndDerivative finalState = getStepStart();
        resetInternalState();
        return finalState;
    }

    /** Runs the four stages; returns the scaled error norm (NaN or infinity when the step failed). */
    private double stages(double t, double[] y, double[] f0, double[] ft, double h, StepMatrixSolver lu,
                          double[] k1,
                          double[] k2, double[] k3, double[] k4, double[] yStage, double[] y1) {
        int n = y.length;
        for (int i = 0; i < n; i++) {
            k1[i] = f0[i] + h * G1 * ft[i];
        }
        lu.solve(k1);
        for (int i = 0; i < n; i++) {
            k2[i] = f0[i] + C21 * k1[i] / h + h * G2 * ft[i];
        }
        lu.solve(k2);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + A31 * k1[i];
        }
        double[] f3 = stageDerivatives(t + h, yStage);
        if (f3 == null) {
            return Double.NaN;
        }
        for (int i = 0; i < n; i++) {
            k3[i] = f3[i] + (C31 * k1[i] + C32 * k2[i]) / h;
        }
        lu.solve(k3);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + A41 * k1[i] + A43 * k3[i];
        }
        double[] f4 = stageDerivatives(t + h, yStage);
        if (f4 == null) {
            return Double.NaN;
        }
        for (int i = 0; i < n; i++) {
            k4[i] = f4[i] + (C41 * k1[i] + C42 * k2[i] + C43 * k3[i]) / h;
        }
        lu.solve(k4);
        double sum = 0.0;
        double worst = -1.0;
        int main = getStepSizeHelper().getMainSetDimension();
        for (int i = 0; i < n; i++) {
            y1[i] = y[i] + M1 * k1[i] + M3 * k3[i] + M4 * k4[i];
            if (i < main) {
                double tol = getStepSizeHelper().getTolerance(i, FastMath.max(FastMath.abs(y[i]), FastMath.abs(y1[i])));
                double r = k4[i] / tol;
                sum += r * r;
                if (!(Math.abs(r) <= worst)) {
                    worst = Math.abs(r);
                    worstComponent = i;
                }
            }
        }
        double err = FastMath.sqrt(sum / main);
        return finite(y1) ? err : Double.NaN;
    }

    /**
     * @return f at a stage state, or null when the stage state is not finite (the step is then rejected and
     *         retried smaller instead of failing the run)
     */
    private double[] stageDerivatives(double t, double[] yStage) {
        if (!finite(yStage)) {
            return null;
        }
        return computeDerivatives(t, yStage);
    }

    private static boolean finite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }

    /**
     * @return forward differences over the pattern's column groups, step sqrt(eps) relative to the larger of
     *         |y_j| and state j's typical magnitude (its absolute over its relative tolerance)
     */
    private DifferenceJacobian differences(int n) {
        double[] typical = new double[n];
        for (int j = 0; j < n; j++) {
            int k = Math.min(j, getStepSizeHelper().getMainSetDimension() - 1);
            typical[j] = getStepSizeHelper().getTolerance(k, 0.0) / getStepSizeHelper().getRelativeTolerance(k);
        }
        return new DifferenceJacobian(DifferenceJacobian.Scheme.FORWARD, SQRT_EPS, typical, pattern.groups());
    }

    /** Finite-difference Jacobian by column groups, and the time derivative f_t. */
    private void estimateJacobian(DifferenceJacobian differences, double t, double[] y, double[] f0, double h,
                                  double[][] jac, double[] ft) {
        int n = y.length;
        if (jacobianSource != null) {
            jacobianSource.jacobian(t, y, f0, jac);
        } else {
            differences.estimate(yp -> computeDerivatives(t, yp), y, f0, (j, quotient) -> {
                java.util.BitSet rows = pattern.rows(j);
                for (int i = 0; i < n; i++) {
                    jac[i][j] = 0.0;
                }
                for (int i = rows.nextSetBit(0); i >= 0; i = rows.nextSetBit(i + 1)) {
                    jac[i][j] = quotient.applyAsDouble(i);
                }
            });
        }
        if (timeDependent.test(t)) {
            double dt = SQRT_EPS * FastMath.max(FastMath.abs(t), FastMath.abs(h));
            double[] fT = computeDerivatives(t + dt, y);
            for (int i = 0; i < n; i++) {
                ft[i] = (fT[i] - f0[i]) / dt;
            }
        } else {
            java.util.Arrays.fill(ft, 0.0);
        }
        jacobians++;
    }
}
