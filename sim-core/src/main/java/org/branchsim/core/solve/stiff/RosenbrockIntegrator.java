package org.branchsim.core.solve.stiff;

import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.LocalizedODEFormats;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.hipparchus.ode.sampling.AbstractODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.util.FastMath;

/**
 * Linearly implicit Rosenbrock integrator with an embedded error estimate, for a {@link RosenbrockScheme}:
 * RODAS (order 4, Hairer and Wanner, Solving Ordinary Differential Equations II, 2nd ed., 1996, sec. IV.7)
 * with its own dense output from the stages, or RODAS3 (order 3, Sandu et al. 1997) with cubic Hermite dense
 * output. Each stage solves (I/(h gamma) - J) u_i = f(t + alpha_i h, y + sum a_ij u_j) + sum (c_ij/h) u_j
 * + h gamma_i f_t with one LU factorisation per step size.
 * <p>
 * Built on Hipparchus's {@link AdaptiveStepsizeIntegrator} so that event detectors, step handlers and
 * dense output work as for the explicit methods. The Jacobian is estimated by forward differences
 * ({@link DifferenceJacobian}, step sqrt(eps) relative to the larger of |y_j| and the state's absolute over
 * relative tolerance) grouped by a {@link SparsityPattern}, or taken from a {@link JacobianSource}; it is kept
 * while steps are accepted, and refreshed after a rejected step, after every event reset or known time, and
 * when it has served {@code maxJacobianAge} steps.
 * <p>
 * Step size: the standard controller h_new = h min(6, max(0.2, 0.9 err^(-1/q))) (q the order), never growing
 * right after a rejection (Hairer and Wanner IV.8 and the code RODAS); optionally combined with Gustafsson's
 * predictive controller (Hairer and Wanner IV.8, eq. (8.21)), taking the smaller of the two. Known times (the
 * corners of scheduled inputs, the end time) are landed on exactly: a step that would pass one is shortened
 * to end there, its stages at the corner see the time just before it, and after it the derivative is
 * recomputed at the corner and the Jacobian refreshed. Forward integration only.
 */
public final class RosenbrockIntegrator extends AdaptiveStepsizeIntegrator {

    /** Name of the default (RODAS3) scheme, kept for callers that named it. */
    public static final String METHOD_NAME = RosenbrockScheme.RODAS3.name();

    private static final double SAFETY = 0.9;
    private static final double MIN_FACTOR = 0.2;
    private static final double MAX_FACTOR = 6.0;
    /** Smallest error the predictive controller remembers (as the code RODAS). */
    private static final double MIN_REMEMBERED_ERROR = 1e-2;
    /** A step within this fraction of a known time is stretched to land on it. */
    private static final double STRETCH = 1.01;
    /** Relative finite-difference step, sqrt of the unit round-off. */
    private static final double SQRT_EPS = FastMath.sqrt(Math.ulp(1.0));

    private final RosenbrockScheme scheme;
    private final SparsityPattern pattern;
    private final int maxJacobianAge;
    private boolean predictive;
    private boolean interiorControl;
    private double[] knownTimes = new double[0];
    private java.util.function.DoubleConsumer knownTimeListener = t -> { };
    private java.util.function.DoublePredicate timeDependent = t -> true;
    private JacobianSource jacobianSource;
    private StepMatrixSolver linearSolver;
    private java.util.function.Consumer<ODEStateInterpolator> stepListener = step -> { };
    private Runnable solutionPointMarker = () -> { };
    /** The equations when they write dy/dt in place and are integrated alone, else null (set per integration). */
    private DerivativesInto inPlace;
    /** Where {@link #inPlace} writes a stage's derivative. */
    private double[] stageDerivative;
    /** True while q2, q3 of integrate hold the dense-output combinations of the step last tried. */
    private boolean combinationsReady;
    private long accepted;
    private long rejected;
    private long jacobians;
    private long factorisations;
    private int worstComponent = -1;

    /**
     * RODAS3 integrator (kept for callers that built one before the scheme could be chosen).
     *
     * @param minStep smallest step, s
     * @param maxStep largest step, s
     * @param absTol absolute tolerance per state
     * @param relTol relative tolerance per state
     * @param pattern Jacobian sparsity (use {@link SparsityPattern#dense} when unknown)
     * @param maxJacobianAge number of accepted steps a Jacobian may serve (1 = fresh every step)
     */
    public RosenbrockIntegrator(double minStep, double maxStep, double[] absTol, double[] relTol,
                                SparsityPattern pattern, int maxJacobianAge) {
        this(RosenbrockScheme.RODAS3, minStep, maxStep, absTol, relTol, pattern, maxJacobianAge);
    }

    /**
     * @param scheme the method's coefficients
     * @param minStep smallest step, s
     * @param maxStep largest step, s
     * @param absTol absolute tolerance per state
     * @param relTol relative tolerance per state
     * @param pattern Jacobian sparsity (use {@link SparsityPattern#dense} when unknown)
     * @param maxJacobianAge number of accepted steps a Jacobian may serve (1 = fresh every step)
     */
    public RosenbrockIntegrator(RosenbrockScheme scheme, double minStep, double maxStep, double[] absTol,
                                double[] relTol, SparsityPattern pattern, int maxJacobianAge) {
        super(scheme.name(), minStep, maxStep, absTol, relTol);
        this.scheme = scheme;
        this.pattern = pattern;
        this.maxJacobianAge = Math.max(1, maxJacobianAge);
    }

    /** @return the scheme this integrator runs */
    public RosenbrockScheme scheme() {
        return scheme;
    }

    /** Switches Gustafsson's predictive step-size controller on or off (default off). */
    public void setPredictiveControl(boolean on) {
        this.predictive = on;
    }

    /**
     * Switches the control of the dense output's error inside steps on or off (default off; only for schemes
     * with their own dense output). When on, each step also estimates the error of the dense output at a
     * third of the step (where both a symmetric and an antisymmetric error shape over the step reach about
     * 3/4 of their peak) from the defect d = y'(t_m) - f(t_m, y(t_m)) of the continuous extension there, as
     * e = (I/(h gamma) - J)^-1 d (for a stiff component this is d / lambda, the distance to its slow
     * manifold; for a non-stiff one about h gamma d), and accepts the step only when both this and the
     * step-end estimate are within tolerance. Costs one evaluation and one solve per step.
     */
    public void setInteriorErrorControl(boolean on) {
        this.interiorControl = on;
    }

    /**
     * Times the integrator lands on exactly instead of stepping over them (e.g. the corners of scheduled
     * inputs); after landing on one it calls {@code listener} with the time, then recomputes the derivative
     * there and refreshes the Jacobian. Times at or before the start, or at or after the end, are ignored.
     *
     * @param times times, s (any order, duplicates allowed)
     * @param listener told of each landing, once per distinct time, before the derivative is recomputed
     */
    public void setKnownTimes(double[] times, java.util.function.DoubleConsumer listener) {
        this.knownTimes = java.util.Arrays.stream(times).filter(Double::isFinite).sorted().distinct().toArray();
        this.knownTimeListener = listener;
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
     * Tells {@code listener} of every accepted step's dense output before the step's events are searched on it
     * (e.g. to choose where switching functions are checked inside the step). Null removes the listener.
     */
    public void setStepListener(java.util.function.Consumer<ODEStateInterpolator> listener) {
        this.stepListener = listener == null ? step -> { } : listener;
    }

    /**
     * Calls {@code marker} just before each evaluation of the equations at a point of the solution itself (the
     * interior error check on the dense output and the derivative at a step's end), not before the stages'
     * evaluations, whose arguments are intermediate values. A listener that needs quantities of the solution
     * (e.g. the energy accounts' powers) can then record only those evaluations. Null removes the marker.
     */
    public void setSolutionPointMarker(Runnable marker) {
        this.solutionPointMarker = marker == null ? () -> { } : marker;
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

    /** @return steps rejected by the error control (or a singular matrix, or a non-finite stage) in the last integration */
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
        int stages = scheme.stages();
        inPlace = mapper.getNumberOfEquations() == 1 && equations.getPrimary() instanceof DerivativesInto d ? d : null;
        stageDerivative = new double[n];
        double[][] jac = new double[n][n];
        double[] ft = new double[n];
        StepMatrixSolver lu = linearSolver != null ? linearSolver : new DenseLu(n);
        double[][] u = new double[stages][n];
        double[] yStage = new double[n];
        double[] q2 = new double[n];
        double[] q3 = new double[n];
        DifferenceJacobian differences = differences(n);
        int order = scheme.order();
        double exponent = 1.0 / order;

        double[] scale = new double[getStepSizeHelper().getMainSetDimension()];
        for (int i = 0; i < scale.length; i++) {
            scale[i] = getStepSizeHelper().getTolerance(i, FastMath.abs(getStepStart().getCompleteState()[i]));
        }
        double h = initializeStep(true, scheme.order(), scale, getStepStart());
        boolean jacobianFresh = false;
        int jacobianAge = Integer.MAX_VALUE;
        double previousStep = Double.NaN;
        double previousError = Double.NaN;
        int known = 0;
        setIsLastStep(false);
        do {
            ODEStateAndDerivative start = getStepStart();
            double t = start.getTime();
            while (known < knownTimes.length && knownTimes[known] <= t) {
                known++;
            }
            double next = known < knownTimes.length && knownTimes[known] < finalTime ? knownTimes[known] : finalTime;
            if (next < finalTime && next - t <= 4 * FastMath.ulp(next)) {
                // an event stopped the previous step a few ulps before the known time: it is reached
                setStepStart(land(mapper, start, next));
                known++;
                jacobianAge = Integer.MAX_VALUE;
                previousStep = Double.NaN;
                continue;
            }
            double[] y = start.getCompleteState();
            double[] f0 = start.getCompleteDerivative();
            if (jacobianAge >= maxJacobianAge) {
                estimateJacobian(differences, t, y, f0, h, jac, ft);
                jacobianFresh = true;
                jacobianAge = 0;
            }
            double error;
            double[] y1 = new double[n];
            double tEnd;
            boolean rejectedHere = false;
            while (true) {
                if (t + STRETCH * h >= next) {
                    tEnd = next;
                    h = next - t;
                } else {
                    tEnd = t + h;
                }
                double stageEnd = tEnd == next && next < finalTime ? FastMath.nextDown(tEnd) : tEnd;
                setStepSize(h);
                boolean ok = lu.factorise(1.0 / (h * scheme.gamma()), jac);
                factorisations++;
                if (ok) {
                    error = stages(t, stageEnd, y, f0, ft, h, lu, u, yStage, y1);
                    combinationsReady = false;
                    if (error <= 1.0 && interiorControl && scheme.dense() == RosenbrockScheme.DenseOutput.STAGES) {
                        denseCombinations(u, q2, q3);
                        combinationsReady = true;
                        error = FastMath.max(error, interiorError(t, h, y, y1, q2, q3, lu, yStage));
                    }
                } else {
                    error = Double.NaN;
                }
                if (error <= 1.0) {
                    break;
                }
                rejected++;
                rejectedHere = true;
                if (!jacobianFresh) {
                    estimateJacobian(differences, t, y, f0, h, jac, ft);
                    jacobianFresh = true;
                    jacobianAge = 0;
                }
                double factor = Double.isFinite(error)
                        ? FastMath.max(MIN_FACTOR, SAFETY * inverseRoot(error, order)) : 0.25;
                h = getStepSizeHelper().filterStep(h * factor, true, false);
            }
            boolean landing = tEnd == next && next < finalTime;
            solutionPointMarker.run();
            double[] f1 = computeDerivatives(landing ? FastMath.nextDown(tEnd) : tEnd, y1);
            ODEStateAndDerivative end = mapper.mapStateAndDerivative(tEnd, y1, f1);
            accepted++;
            jacobianAge++;
            jacobianFresh = false;
            AbstractODEStateInterpolator dense = interpolator(start, end, u, combinationsReady ? q2 : null,
                    combinationsReady ? q3 : null, mapper);
            stepListener.accept(dense);
            setStepStart(acceptStep(dense, finalTime));
            boolean reset = resetOccurred();
            if (reset) {
                jacobianAge = Integer.MAX_VALUE;
            }
            if (!isLastStep() && landing && getStepStart().getTime() == tEnd) {
                setStepStart(land(mapper, getStepStart(), tEnd));
                known++;
                jacobianAge = Integer.MAX_VALUE;
                reset = true;
            }
            if (!isLastStep()) {
                double errorSafe = FastMath.max(error, 1e-10);
                double factor = FastMath.min(MAX_FACTOR, FastMath.max(MIN_FACTOR,
                        SAFETY * inverseRoot(errorSafe, order)));
                if (predictive && !Double.isNaN(previousStep)) {
                    double gustafsson = SAFETY * (h / previousStep)
                            * FastMath.pow(previousError / (errorSafe * errorSafe), exponent);
                    factor = FastMath.min(factor, FastMath.min(MAX_FACTOR, FastMath.max(MIN_FACTOR, gustafsson)));
                }
                if (rejectedHere) {
                    factor = FastMath.min(factor, 1.0);
                }
                if (reset) {
                    previousStep = Double.NaN;
                } else {
                    previousStep = h;
                    previousError = FastMath.max(MIN_REMEMBERED_ERROR, error);
                }
                double nextStep = getStepSizeHelper().filterStep(h * factor, true, true);
                double remaining = finalTime - getStepStart().getTime();
                h = nextStep >= remaining ? remaining : nextStep;
                if (h <= 0.0) {
                    setIsLastStep(true);
                }
            }
        } while (!isLastStep());
        ODEStateAndDerivative finalState = getStepStart();
        resetInternalState();
        return finalState;
    }

    /** Tells the listener of a known time reached and returns the state there with its derivative recomputed. */
    private ODEStateAndDerivative land(EquationsMapper mapper, ODEStateAndDerivative state, double time) {
        knownTimeListener.accept(time);
        double[] y = state.getCompleteState();
        return mapper.mapStateAndDerivative(time, y, computeDerivatives(time, y));
    }

    /**
     * @param q2 the dense output's stage combinations of this step when already formed (copied), else null
     * @return the step's dense output (its own arrays: the stage buffers are reused by the next step)
     */
    private AbstractODEStateInterpolator interpolator(ODEStateAndDerivative start, ODEStateAndDerivative end,
                                                      double[][] u, double[] q2, double[] q3, EquationsMapper mapper) {
        if (scheme.dense() == RosenbrockScheme.DenseOutput.STAGES) {
            double[] d2;
            double[] d3;
            if (q2 != null) {
                d2 = q2.clone();
                d3 = q3.clone();
            } else {
                d2 = new double[u[0].length];
                d3 = new double[u[0].length];
                denseCombinations(u, d2, d3);
            }
            return new StageInterpolator(start, end, d2, d3, mapper);
        }
        return new HermiteInterpolator(true, start, end, start, end, mapper);
    }

    /** Fills q2, q3 with the stage combinations of the scheme's dense output. */
    private void denseCombinations(double[][] u, double[] q2, double[] q3) {
        int n = q2.length;
        java.util.Arrays.fill(q2, 0.0);
        java.util.Arrays.fill(q3, 0.0);
        for (int j = 0; j < scheme.stages(); j++) {
            double d2 = scheme.denseCoefficient(0, j);
            double d3 = scheme.denseCoefficient(1, j);
            if (d2 == 0.0 && d3 == 0.0) {
                continue;
            }
            double[] uj = u[j];
            for (int i = 0; i < n; i++) {
                q2[i] += d2 * uj[i];
                q3[i] += d3 * uj[i];
            }
        }
    }

    /**
     * @return the scaled error of the dense output at a third of the step, from its defect there (see
     *         {@link #setInteriorErrorControl}); NaN when the midpoint's derivative is not finite
     */
    private double interiorError(double t, double h, double[] y0, double[] y1, double[] q2, double[] q3,
                                 StepMatrixSolver lu, double[] work) {
        int n = y0.length;
        // theta = 1/3: y = (2 y0 + y1)/3 + 2 q2/9 + 2 q3/27; dy/dt = (y1 - y0 + q2/3 + q3/3)/h
        for (int i = 0; i < n; i++) {
            work[i] = (2.0 * y0[i] + y1[i]) / 3.0 + 2.0 * q2[i] / 9.0 + 2.0 * q3[i] / 27.0;
        }
        solutionPointMarker.run();
        double[] fm = stageDerivatives(t + h / 3.0, work);
        if (fm == null) {
            return Double.NaN;
        }
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = (y1[i] - y0[i] + (q2[i] + q3[i]) / 3.0) / h - fm[i];
        }
        lu.solve(e);
        double sum = 0.0;
        int main = getStepSizeHelper().getMainSetDimension();
        for (int i = 0; i < main; i++) {
            double tol = getStepSizeHelper().getTolerance(i, FastMath.max(FastMath.abs(y0[i]), FastMath.abs(y1[i])));
            double r = e[i] / tol;
            sum += r * r;
        }
        return FastMath.sqrt(sum / main);
    }

    /**
     * Runs the stages; returns the scaled error norm (NaN or infinity when the step failed).
     *
     * @param stageEnd the time stages at the step's end are evaluated at (just before a known time landed on)
     */
    private double stages(double t, double stageEnd, double[] y, double[] f0, double[] ft, double h,
                          StepMatrixSolver lu, double[][] u, double[] yStage, double[] y1) {
        int n = y.length;
        int s = scheme.stages();
        for (int i = 0; i < s; i++) {
            double[] ui = u[i];
            double[] fi;
            if (scheme.stageAtStart(i)) {
                fi = f0;
            } else {
                System.arraycopy(y, 0, yStage, 0, n);
                for (int j = 0; j < i; j++) {
                    double aij = scheme.a(i, j);
                    if (aij != 0.0) {
                        double[] uj = u[j];
                        for (int k = 0; k < n; k++) {
                            yStage[k] += aij * uj[k];
                        }
                    }
                }
                double alpha = scheme.alpha(i);
                fi = stageDerivatives(alpha == 1.0 ? stageEnd : t + alpha * h, yStage);
                if (fi == null) {
                    return Double.NaN;
                }
            }
            double g = h * scheme.gammaSum(i);
            for (int k = 0; k < n; k++) {
                ui[k] = fi[k] + g * ft[k];
            }
            for (int j = 0; j < i; j++) {
                double cij = scheme.c(i, j) / h;
                if (cij != 0.0) {
                    double[] uj = u[j];
                    for (int k = 0; k < n; k++) {
                        ui[k] += cij * uj[k];
                    }
                }
            }
            lu.solve(ui);
        }
        double sum = 0.0;
        double worst = -1.0;
        int main = getStepSizeHelper().getMainSetDimension();
        for (int k = 0; k < n; k++) {
            double yk = y[k];
            double err = 0.0;
            for (int j = 0; j < s; j++) {
                yk += scheme.m(j) * u[j][k];
                err += scheme.e(j) * u[j][k];
            }
            y1[k] = yk;
            if (k < main) {
                double tol = getStepSizeHelper().getTolerance(k, FastMath.max(FastMath.abs(y[k]), FastMath.abs(yk)));
                double r = err / tol;
                sum += r * r;
                if (!(Math.abs(r) <= worst)) {
                    worst = Math.abs(r);
                    worstComponent = k;
                }
            }
        }
        double err = FastMath.sqrt(sum / main);
        return finite(y1) ? err : Double.NaN;
    }

    /**
     * @return f at a stage state, or null when the stage state is not finite (the step is then rejected and
     *         retried smaller instead of failing the run); with equations that write in place, a buffer
     *         overwritten by the next call
     */
    private double[] stageDerivatives(double t, double[] yStage) {
        if (!finite(yStage)) {
            return null;
        }
        if (inPlace == null) {
            return computeDerivatives(t, yStage);
        }
        incrementEvaluations(1);
        inPlace.derivatives(t, yStage, stageDerivative);
        return stageDerivative;
    }

    /**
     * x^(-1/order), the step-size factor's power of the error norm: by square or cube roots for orders 4 and 3
     * (correctly rounded and cheap; Hipparchus' general power held about 2 % of a warm clamp run's CPU samples in
     * a JFR profile).
     */
    static double inverseRoot(double x, int order) {
        switch (order) {
            case 4:
                return 1.0 / Math.sqrt(Math.sqrt(x));
            case 3:
                return 1.0 / StrictMath.cbrt(x);
            case 2:
                return 1.0 / Math.sqrt(x);
            default:
                return StrictMath.pow(x, -1.0 / order);
        }
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
        return new DifferenceJacobian(SQRT_EPS, typical, pattern.groups());
    }

    /** Finite-difference Jacobian by column groups, and the time derivative f_t. */
    private void estimateJacobian(DifferenceJacobian differences, double t, double[] y, double[] f0, double h,
                                  double[][] jac, double[] ft) {
        int n = y.length;
        boolean timeDependentHere = timeDependent.test(t);
        double dt = SQRT_EPS * FastMath.max(FastMath.abs(t), FastMath.abs(h));
        boolean ftFilled = false;
        if (jacobianSource != null) {
            if (timeDependentHere) {
                ftFilled = jacobianSource.jacobianAndTimeDerivative(t, y, f0, jac, dt, ft);
            } else {
                jacobianSource.jacobian(t, y, f0, jac);
            }
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
        if (!timeDependentHere) {
            java.util.Arrays.fill(ft, 0.0);
        } else if (!ftFilled) {
            double[] fT = computeDerivatives(t + dt, y);
            for (int i = 0; i < n; i++) {
                ft[i] = (fT[i] - f0[i]) / dt;
            }
        }
        jacobians++;
    }
}
