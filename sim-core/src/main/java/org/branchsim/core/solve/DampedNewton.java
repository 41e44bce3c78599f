package org.branchsim.core.solve;

import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Damped Newton solve of f(t, y) = 0 over the free states for one fixed set of held members, in scaled
 * unknowns u_j = y_j / s_j and scaled residuals r_i = f_i / s_i (1/s). Each iteration solves A_s du = -r with
 * the {@link Linearisation} A_s (rows equilibrated, LU with partial pivoting; the minimum-norm least-squares
 * step when A_s is singular), then backtracks the step by
 * halving until the merit phi = |r|^2 / 2 falls by the Armijo condition phi(u + a du) <= (1 - 2 c a) phi(u),
 * c = 1e-4 (Dennis and Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations,
 * 1983, ch. 6). A trial state that is not finite is refused like one that does not
 * reduce the merit, and so is one with a pressure below {@link #VACUUM_FLOOR} or a member farther beyond a
 * stop than its own travel. Convergence: see {@link OperatingPointSolver}.
 */
final class DampedNewton {

    /**
     * Lowest gauge pressure an iterate may take, Pa: {@link Fluid#CAVITATION_SCALE} above absolute zero. Below it
     * the fluid model's vacuum guard, not physics, sets the bulk modulus, and driving a node's bulk modulus to
     * zero would zero its pressure rate without balancing its flows (a spurious operating point).
     */
    static final double VACUUM_FLOOR = Fluid.CAVITATION_SCALE - Units.ATMOSPHERE;
    private static final double ARMIJO = 1e-4;
    private static final int MAX_HALVINGS = 30;
    private static final double PIVOT_THRESHOLD = 1e-11;
    /** Singular values below this fraction of the largest count as zero in the least-squares step. */
    static final double SINGULAR_CUTOFF = 1e-10;
    private static final String SINGULAR = "the Jacobian over the free states is singular and the residual does not "
            + "vanish (some rate cannot be brought to zero by any state)";

    /**
     * @param state the last (best) iterate, SI
     * @param converged true when the convergence rule held
     * @param iterations Newton iterations taken
     * @param reason why it stopped without converging (empty when converged)
     */
    record Outcome(double[] state, boolean converged, int iterations, String reason) {
    }

    private DampedNewton() {
    }

    /**
     * @param engine engine with its member modes set to the held set
     * @param t time, s
     * @param start start state, SI (held members already at their stops)
     * @param maxIterations bound on the iterations
     * @return the outcome
     */
    static Outcome solve(RunEngine engine, double t, double[] start, int maxIterations) {
        double[] y = start.clone();
        List<StateSlot> free = Linearisation.freeStates(engine);
        int n = free.size();
        double[] r = residual(engine, t, y, free);
        if (r == null) {
            return new Outcome(y, false, 0, "the start state is not finite or has a pressure within "
                    + Fluid.CAVITATION_SCALE + " Pa of absolute zero");
        }
        if (n == 0) {
            return new Outcome(y, true, 0, "");
        }
        boolean singular = false;
        for (int it = 1; it <= maxIterations; it++) {
            Linearisation lin = Linearisation.of(engine, t, y);
            Step newton = newtonStep(lin, r);
            if (newton == null) {
                return new Outcome(y, false, it - 1, "the Newton step is not finite");
            }
            double[] du = newton.du();
            singular = newton.singular();
            double stepSize = maxAbs(du);
            boolean small = stepSize <= OperatingPointSolver.STEP_TOLERANCE;
            double phi = merit(r);
            double a = 1.0;
            double[] trial = null;
            double[] rTrial = null;
            for (int h = 0; h <= MAX_HALVINGS; h++) {
                trial = step(engine, y, du, a, free);
                rTrial = residual(engine, t, trial, free);
                if (rTrial != null && (merit(rTrial) <= (1 - 2 * ARMIJO * a) * phi || small)) {
                    break;
                }
                rTrial = null;
                a *= 0.5;
            }
            if (rTrial == null) {
                return new Outcome(y, false, it, singular ? SINGULAR : "the line search could not reduce the residual "
                        + "(a local minimum of |f|, not a zero of f)");
            }
            y = trial;
            r = rTrial;
            if (a * stepSize <= OperatingPointSolver.STEP_TOLERANCE
                    && maxAbs(r) <= OperatingPointSolver.RESIDUAL_TOLERANCE * lin.norm()) {
                return new Outcome(y, true, it, "");
            }
        }
        return new Outcome(y, false, maxIterations, singular ? SINGULAR : "the Newton iterations did not converge "
                + "within " + maxIterations + " per held set");
    }

    /**
     * @return the scaled residual f_i / s_i over the free states, 1/s, or null when a state is not finite, a
     *         pressure is below {@link #VACUUM_FLOOR}, a member lies beyond a stop by more than its travel
     *         (far outside, volumes and forces lose their meaning), or a residual is not finite
     */
    static double[] residual(RunEngine engine, double t, double[] y, List<StateSlot> free) {
        for (StateSlot s : engine.model().states()) {
            double v = y[engine.position(s)];
            if (!Double.isFinite(v) || s.dimension() == Dimension.PRESSURE && v < VACUUM_FLOOR) {
                return null;
            }
        }
        for (Member m : engine.model().members()) {
            double x = y[engine.position(m.positionSlot())];
            double travel = m.upper() - m.lower();
            if (x < m.lower() - travel || x > m.upper() + travel) {
                return null;
            }
        }
        double[] f = new double[y.length];
        engine.derivatives(t, y, f);
        double[] r = new double[free.size()];
        for (int k = 0; k < r.length; k++) {
            StateSlot s = free.get(k);
            r[k] = f[engine.position(s)] / s.absoluteScale();
            if (!Double.isFinite(r[k])) {
                return null;
            }
        }
        return r;
    }

    /**
     * Solves A_s du = -r with rows equilibrated: LU with partial pivoting, or, when the matrix is singular (a
     * trapped volume behind closed valves, a state nothing acts on), the minimum-norm least-squares step from the
     * singular value decomposition, singular values below {@link #SINGULAR_CUTOFF} of the largest taken as zero:
     * neutral directions then keep their start values.
     *
     * @return the step and whether the matrix was singular, or null when no finite step exists
     */
    private static Step newtonStep(Linearisation lin, double[] r) {
        double[][] a = lin.scaledMatrix();
        double[] rhs = new double[r.length];
        for (int i = 0; i < a.length; i++) {
            double rowMax = maxAbs(a[i]);
            double d = rowMax > 0.0 ? rowMax : 1.0;
            for (int j = 0; j < a[i].length; j++) {
                a[i][j] /= d;
            }
            rhs[i] = -r[i] / d;
        }
        RealMatrix m = new Array2DRowRealMatrix(a, false);
        DecompositionSolver lu = new LUDecomposition(m, PIVOT_THRESHOLD).getSolver();
        boolean singular = !lu.isNonSingular();
        double[] du;
        if (!singular) {
            du = lu.solve(new ArrayRealVector(rhs, false)).toArray();
        } else {
            SingularValueDecomposition svd = new SingularValueDecomposition(m);
            double[] sv = svd.getSingularValues();
            double cut = SINGULAR_CUTOFF * (sv.length == 0 ? 0.0 : sv[0]);
            RealVector ub = svd.getUT().operate(new ArrayRealVector(rhs, false));
            for (int k = 0; k < sv.length; k++) {
                ub.setEntry(k, sv[k] > cut ? ub.getEntry(k) / sv[k] : 0.0);
            }
            du = svd.getV().operate(ub).toArray();
        }
        for (double d : du) {
            if (!Double.isFinite(d)) {
                return null;
            }
        }
        return new Step(du, singular);
    }

    private record Step(double[] du, boolean singular) {
    }

    private static double[] step(RunEngine engine, double[] y, double[] du, double a, List<StateSlot> free) {
        double[] out = y.clone();
        for (int k = 0; k < du.length; k++) {
            StateSlot s = free.get(k);
            out[engine.position(s)] += a * du[k] * s.absoluteScale();
        }
        return out;
    }

    private static double merit(double[] r) {
        double sum = 0.0;
        for (double v : r) {
            sum += v * v;
        }
        return 0.5 * sum;
    }

    static double maxAbs(double[] v) {
        double m = 0.0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }
}
