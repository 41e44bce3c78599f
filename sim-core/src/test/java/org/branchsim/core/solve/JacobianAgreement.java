package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.Map;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.StateSlot;

/**
 * Compares the Jacobian a model assembles from its elements' partials with central differences of the whole
 * right-hand side, (f(y + h e_j) - f(y - h e_j)) / (2 h), h = eps^(1/3) max(|y_j|, s_j) (Dennis and Schnabel,
 * Numerical Methods for Unconstrained Optimization and Nonlinear Equations, 1983, ch. 5, sec. 5.6: central
 * differences, error bounded by h^2 / 6 |f'''| + eps |f| / h, smallest for h of order eps^(1/3), about 6e-6
 * relative: both terms of order 1e-11 relative to the entry's natural size), swept over smaller steps where
 * the function varies on a finer scale than the state's typical magnitude (see {@code centralDifferences}).
 *
 * <p>The comparison is on the scaled matrix A_s[i][j] = J[i][j] s_j / s_i (1/s, s the states' typical
 * magnitudes), whose eigenvalues are J's: an entry agrees when
 * |A_s,analytic - A_s,differences| <= TOLERANCE max(|A_s,analytic|, |A_s,differences|) + ROW_FLOOR max_j |A_s[i][j]|.
 * TOLERANCE = 1e-5 leaves some six orders of magnitude above the bound's 1e-11 for third derivatives much larger
 * than the entries themselves (the laminar-turbulent blend near dp = 0, areas near their corners), and is still
 * far below what a wrong term gives (a missing or mis-signed partial is off by 100 %, a partial missing one factor
 * of a product by its size). ROW_FLOOR = 1e-6: a small entry of a row whose largest terms are a million times
 * larger carries the round-off of those terms in its difference quotient; an error below a millionth of the
 * row's largest entry changes the step matrix I - h gamma J of an implicit method by less than the relative
 * accuracy the solver asks of a step (rtol 1e-6), so it is not worth resolving.
 *
 * <p>Rows of held members are compared (both zero: position and velocity do not change while held); their
 * columns are not: a held member's position cannot change, and at a seat the flow area has a corner, where a
 * central difference gives the mean of the two one-sided slopes, which is neither.
 */
public final class JacobianAgreement {

    /** Agreement asked, relative to the entry (or a ten-millionth of its row's largest entry). */
    public static final double TOLERANCE = 1e-5;
    /** Absolute slack, as a fraction of the row's largest entry. */
    static final double ROW_FLOOR = 1e-6;

    private JacobianAgreement() {
    }

    /**
     * @param model the model
     * @param held members held at a stop (member id to stop)
     * @param t time, s
     * @param y state, SI
     * @param where a description of the state for failure messages
     * @return the largest disagreement found, relative as in the class comment
     */
    public static double check(CircuitModel model, Map<String, Member.Mode> held, double t, double[] y, String where) {
        return check(model, held, t, y, where, TOLERANCE);
    }

    /**
     * As {@link #check(CircuitModel, Map, double, double[], String)} with another tolerance in place of
     * {@link #TOLERANCE}, for Jacobians that are themselves difference estimates (the per-element fallback).
     *
     * @param tolerance the relative tolerance
     * @return the largest disagreement found
     */
    public static double check(CircuitModel model, Map<String, Member.Mode> held, double t, double[] y, String where,
                               double tolerance) {
        List<Member> members = model.members();
        Member.Mode[] modes = new Member.Mode[members.size()];
        for (int k = 0; k < modes.length; k++) {
            modes[k] = held.getOrDefault(members.get(k).id(), Member.Mode.FREE);
        }
        double[] impulses = new double[model.accounts().size()];
        Evaluation work = model.workspace(modes, impulses);
        int n = y.length;
        double[][] analytic = new double[n][n];
        model.jacobian(model.jacobianWorkspace(modes, impulses), t, y, analytic);
        Rates f = (yy, out) -> model.evaluate(work, t, yy, out, null, null);
        double[][][] sweep = sweep(f, model, y);
        double[][] differences = best(sweep);
        List<StateSlot> states = model.states();
        boolean[] heldColumn = new boolean[n];
        for (Member m : members) {
            if (held.containsKey(m.id())) {
                heldColumn[states.indexOf(m.positionSlot())] = true;
                heldColumn[states.indexOf(m.velocitySlot())] = true;
            }
        }
        double worst = 0.0;
        for (int i = 0; i < n; i++) {
            double si = states.get(i).absoluteScale();
            double rowMax = 0.0;
            for (int j = 0; j < n; j++) {
                double sj = states.get(j).absoluteScale();
                rowMax = Math.max(rowMax, Math.abs(differences[i][j] * sj / si));
                rowMax = Math.max(rowMax, Math.abs(analytic[i][j] * sj / si));
            }
            for (int j = 0; j < n; j++) {
                if (heldColumn[j]) {
                    continue;
                }
                double sj = states.get(j).absoluteScale();
                double a = analytic[i][j] * sj / si;
                double d = differences[i][j] * sj / si;
                double allowed = tolerance * Math.max(Math.abs(a), Math.abs(d)) + ROW_FLOOR * rowMax;
                double error = allowed == 0.0 ? 0.0 : tolerance * Math.abs(a - d) / allowed;
                worst = Math.max(worst, error);
                if (error > tolerance) {
                    StringBuilder estimates = new StringBuilder();
                    for (double[][] level : sweep) {
                        estimates.append(String.format(java.util.Locale.ROOT, " %.9g", level[i][j]));
                    }
                    fail(String.format(java.util.Locale.ROOT, "%s: d(%s)'/d(%s) at %s = %.9g: closed form %.9g, "
                            + "central differences %.9g (relative %.2g, row max %.3g; sweep%s)", where,
                            states.get(i).name(), states.get(j).name(), states.get(j).name(), y[j], analytic[i][j],
                            differences[i][j], error, rowMax, estimates));
                }
            }
        }
        return worst;
    }

    /**
     * Central differences at the steps h_k = h_0 / 10^k, k = 0..STEPS-1; for each entry the estimate that agrees
     * best with both its neighbours in the sweep (its truncation error falls as h^2 while its round-off grows as
     * 1/h, so where three consecutive estimates agree both are small; this finds the right step where the function varies
     * on a scale much smaller than the state's typical magnitude, e.g. within the laminar transition of an
     * orifice, a few Pa wide for a large opening).
     */
    private static double[][][] sweep(Rates f, CircuitModel model, double[] y) {
        double[][][] estimates = new double[STEPS][][];
        double h0 = Math.cbrt(Math.ulp(1.0));
        for (int k = 0; k < STEPS; k++) {
            estimates[k] = centralDifferences(f, model, y, h0 * Math.pow(10, -k));
        }
        return estimates;
    }

    private static double[][] best(double[][][] estimates) {
        int n = estimates[0].length;
        double[][] best = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double spread = Double.POSITIVE_INFINITY;
                for (int k = 1; k + 1 < STEPS; k++) {
                    double before = estimates[k - 1][i][j];
                    double here = estimates[k][i][j];
                    double after = estimates[k + 1][i][j];
                    double s = Math.max(Math.abs(before - here), Math.abs(here - after));
                    if (s < spread) {
                        spread = s;
                        best[i][j] = here;
                    }
                }
            }
        }
        return best;
    }

    /** Steps of the step sweep. */
    private static final int STEPS = 7;

    /** The right-hand side at the fixed time and modes. */
    private interface Rates {
        void at(double[] y, double[] out);
    }

    private static double[][] centralDifferences(Rates f, CircuitModel model, double[] y, double r) {
        int n = y.length;
        List<StateSlot> states = model.states();
        double[][] jac = new double[n][n];
        double[] yp = y.clone();
        double[] fp = new double[n];
        double[] fm = new double[n];
        for (int j = 0; j < n; j++) {
            double h = r * Math.max(Math.abs(y[j]), states.get(j).absoluteScale());
            yp[j] = y[j] + h;
            double hp = yp[j] - y[j];
            f.at(yp, fp);
            yp[j] = y[j] - h;
            double hm = y[j] - yp[j];
            f.at(yp, fm);
            yp[j] = y[j];
            for (int i = 0; i < n; i++) {
                jac[i][j] = (fp[i] - fm[i]) / (hp + hm);
            }
        }
        return jac;
    }
}
