package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.hipparchus.distribution.continuous.TDistribution;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.linear.SingularValueDecomposition;
import org.hipparchus.optim.nonlinear.vector.leastsquares.AbstractEvaluation;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * Weighted least squares by Levenberg-Marquardt (J. J. Moré, "The Levenberg-Marquardt algorithm: implementation
 * and theory", Lecture Notes in Mathematics 630, 1978; Hipparchus's implementation) on parameters scaled to
 * their bounds, u in [0, 1]; a trial point outside is put back on the bound (projection). The Jacobian is by
 * central differences of +-{@link #STEP} in u (one-sided at a bound), its 2p + 1 model runs in one batch.
 * Several starts; the lowest cost wins.
 * <p>
 * At the optimum, with n residuals and p parameters: s^2 = S / (n - p), the covariance of the estimates
 * approximately s^2 (J^T J)^-1 and the 95 % confidence interval u +- t(0.975, n - p) sqrt(cov_ii) (D. M. Bates
 * and D. G. Watts, Nonlinear Regression Analysis and Its Applications, Wiley 1988, sect. 2.3; G. A. F. Seber and
 * C. J. Wild, Nonlinear Regression, Wiley 1989, sect. 2.2.3). The inverse is taken through the singular value
 * decomposition of J. Identifiability (D. A. Belsley, E. Kuh and R. E. Welsch, Regression Diagnostics, Wiley
 * 1980, ch. 3, from memory): the columns of J are scaled to unit length and decomposed; a parameter whose column
 * is (nearly) zero has no effect on the channels; a singular value below 1 / {@link #CONDITION_LIMIT} of the
 * largest marks a near-dependence, and the parameters with a share of at least {@link #SHARE} in its right
 * singular vector are not identifiable from the given channels (only a combination of them is).
 */
public final class LeastSquaresFit {

    /** Central-difference half-step in u. */
    public static final double STEP = 0.003;
    /**
     * Condition index (largest over smallest singular value of the column-scaled Jacobian) above which the
     * parameters in the weakest direction are called not identifiable. Belsley, Kuh and Welsch call indices
     * above 30 moderate to strong dependencies (from memory); 1000 flags only those where J^T J is near-singular
     * (condition number 1e6).
     */
    public static final double CONDITION_LIMIT = 1000.0;
    /** Least share (squared component) of a parameter in the weakest singular vector to be named in it. */
    public static final double SHARE = 0.1;
    /** A column of the scaled Jacobian shorter than this fraction of the longest counts as zero. */
    public static final double NO_EFFECT = 1e-6;
    /** Residual assigned to every observation when the model fails at a trial point (rejects the step). */
    static final double FAILED_RESIDUAL = 1e6;

    private LeastSquaresFit() {
    }

    /**
     * Screens candidate starts by their cost (one batch of runs), then runs Levenberg-Marquardt from the
     * {@code descents} cheapest: a coarse look over the box keeps the descent out of the basins of poor local
     * minima, which the phase of a ringing landing makes common.
     *
     * @param model the residual model
     * @param candidates candidate start points in [0, 1]^p (at least one; the first is reported as "before")
     * @param descents how many of the cheapest candidates to descend from (at least 1)
     * @param maxIterations Levenberg-Marquardt iterations per descent
     * @param names parameter names, for the identifiability notes
     * @return the best fit
     * @throws BranchsimException ESTIMATION_FAILED when the model fails at every candidate
     */
    public static FitResult fit(ResidualModel model, List<double[]> candidates, int descents, int maxIterations,
                                List<String> names) {
        List<double[]> clipped = candidates.stream().map(LeastSquaresFit::clip).toList();
        List<double[]> r = model.residuals(clipped);
        double[] cost = new double[r.size()];
        Integer[] order = new Integer[r.size()];
        for (int i = 0; i < cost.length; i++) {
            order[i] = i;
            cost[i] = Double.POSITIVE_INFINITY;
            if (r.get(i) != null) {
                cost[i] = 0;
                for (double x : r.get(i)) {
                    cost[i] += x * x;
                }
            }
        }
        if (!Double.isFinite(cost[0]) && Arrays.stream(cost).noneMatch(Double::isFinite)) {
            throw new BranchsimException(ErrorKey.ESTIMATION_FAILED, "fit", "the model failed at every start");
        }
        Arrays.sort(order, (a, b) -> Double.compare(cost[a], cost[b]));
        List<double[]> chosen = new ArrayList<>();
        for (int i = 0; i < Math.min(Math.max(1, descents), order.length); i++) {
            chosen.add(clipped.get(order[i]));
        }
        FitResult f = fit(model, chosen, maxIterations, names);
        List<double[]> tried = new ArrayList<>();
        for (int i = 0; i < clipped.size(); i++) {
            double[] row = Arrays.copyOf(clipped.get(i), clipped.get(i).length + 1);
            row[row.length - 1] = cost[i];
            tried.add(row);
        }
        tried.addAll(f.startsTried());
        return new FitResult(f.start(), f.optimum(), cost[0], f.costAfter(), f.observations(), f.variance(),
                f.tQuantile(), f.covariance(), f.halfWidth(), f.correlation(), f.identifiability(), f.conditionIndex(),
                f.iterations(), f.modelRuns() + clipped.size(), tried);
    }

    /**
     * @param model the residual model
     * @param starts start points in [0, 1]^p (at least one)
     * @param maxIterations Levenberg-Marquardt iterations per start
     * @param names parameter names, for the identifiability notes
     * @return the best fit
     * @throws BranchsimException ESTIMATION_FAILED when the model fails at every start
     */
    public static FitResult fit(ResidualModel model, List<double[]> starts, int maxIterations, List<String> names) {
        int p = model.parameters();
        AtomicInteger runs = new AtomicInteger();
        LeastSquaresOptimizer.Optimum best = null;
        double[] bestStart = null;
        double costBefore = Double.NaN;
        List<double[]> tried = new ArrayList<>();
        String firstFailure = null;
        for (double[] s : starts) {
            double[] start = clip(s);
            Run run = new Run(model, runs);
            LeastSquaresOptimizer.Optimum o = null;
            try {
                o = new LevenbergMarquardtOptimizer().withCostRelativeTolerance(1e-8).withParameterRelativeTolerance(1e-6)
                        .optimize(new LeastSquaresBuilder().model(run::evaluate).target(new double[run.size(start)])
                                .start(start).parameterValidator(v -> clip(v)).maxIterations(maxIterations)
                                .maxEvaluations(maxIterations * 4)
                                .build());
            } catch (MathIllegalStateException e) {
                o = run.bestSeen(); // iterations ran out: keep the best point it reached
            } catch (BranchsimException e) {
                firstFailure = firstFailure == null ? e.getMessage() : firstFailure;
            }
            if (Double.isNaN(costBefore) && run.firstCost() >= 0) {
                costBefore = run.firstCost();
            }
            double cost = o == null ? Double.NaN : o.getCost() * o.getCost();
            double[] row = Arrays.copyOf(start, p + 1);
            row[p] = cost;
            tried.add(row);
            if (o != null && (best == null || cost < best.getCost() * best.getCost())) {
                best = o;
                bestStart = start;
            }
        }
        if (best == null) {
            throw new BranchsimException(ErrorKey.ESTIMATION_FAILED, "fit", firstFailure == null ? "no start" : firstFailure);
        }
        return summarise(best, bestStart, costBefore, names, runs.get(), tried);
    }

    /**
     * Start points: the given one (or the middle of the bounds when null), then points of the Halton sequence
     * in bases 2, 3, 5, ... (J. H. Halton, Numer. Math. 2, 1960), which spread evenly over the box.
     *
     * @param p number of parameters
     * @param count number of starts (at least 1)
     * @param first the first start, or null for the middle of the bounds
     * @return the starts
     */
    public static List<double[]> starts(int p, int count, double[] first) {
        List<double[]> out = new ArrayList<>();
        double[] centre = new double[p];
        Arrays.fill(centre, 0.5);
        out.add(first == null ? centre : clip(first));
        for (int i = 1; i < count; i++) {
            out.add(DesignOfExperiments.halton(i, p));
        }
        return out;
    }

    /**
     * The statistics of a fit taken at a given point (its confidence intervals and identifiability), without
     * searching: one batch of 2p + 1 model runs.
     *
     * @param model the residual model
     * @param u the point, in [0, 1]^p
     * @param names parameter names
     * @return the fit's statistics at u
     */
    public static FitResult at(ResidualModel model, double[] u, List<String> names) {
        AtomicInteger runs = new AtomicInteger();
        Run run = new Run(model, runs);
        run.evaluate(new ArrayRealVector(clip(u)));
        return summarise(run.bestSeen(), clip(u), run.firstCost(), names, runs.get(), List.of());
    }

    private static FitResult summarise(LeastSquaresOptimizer.Optimum o, double[] start, double costBefore,
                                       List<String> names, int runs, List<double[]> tried) {
        RealMatrix j = o.getJacobian();
        int n = j.getRowDimension();
        int p = j.getColumnDimension();
        double cost = o.getCost() * o.getCost();
        int dof = Math.max(1, n - p);
        double s2 = cost / dof;
        double t = new TDistribution(dof).inverseCumulativeProbability(0.975);
        SingularValueDecomposition svd = new SingularValueDecomposition(j);
        double[] sv = svd.getSingularValues();
        RealMatrix v = svd.getV();
        double tiny = sv.length == 0 ? 0 : sv[0] * 1e-12;
        double[][] cov = new double[p][p];
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                double sum = 0;
                boolean undetermined = false;
                for (int k = 0; k < sv.length; k++) {
                    double term = v.getEntry(a, k) * v.getEntry(b, k);
                    if (sv[k] <= tiny) {
                        undetermined |= Math.abs(term) > 0;
                    } else {
                        sum += term / (sv[k] * sv[k]);
                    }
                }
                cov[a][b] = undetermined ? Double.NaN : s2 * sum;
            }
        }
        double[] half = new double[p];
        double[][] corr = new double[p][p];
        for (int a = 0; a < p; a++) {
            half[a] = t * Math.sqrt(cov[a][a]);
            for (int b = 0; b < p; b++) {
                corr[a][b] = cov[a][b] / Math.sqrt(cov[a][a] * cov[b][b]);
            }
        }
        List<String> notes = new ArrayList<>();
        double conditionIndex = identifiability(j, names, notes);
        return new FitResult(start, o.getPoint().toArray(), costBefore, cost, n, s2, t, cov, half, corr, notes,
                conditionIndex, o.getIterations(), runs, tried);
    }

    /** Fills one note per parameter (null when identifiable) and returns the condition index. */
    static double identifiability(RealMatrix j, List<String> names, List<String> notes) {
        int p = j.getColumnDimension();
        double[] norms = new double[p];
        double longest = 0;
        for (int c = 0; c < p; c++) {
            norms[c] = j.getColumnVector(c).getNorm();
            longest = Math.max(longest, norms[c]);
        }
        String[] out = new String[p];
        RealMatrix scaled = j.copy();
        for (int c = 0; c < p; c++) {
            if (!(norms[c] > NO_EFFECT * longest)) {
                out[c] = "not identifiable: it has no effect on the fitted channels";
                scaled.setColumnVector(c, new ArrayRealVector(j.getRowDimension()));
            } else {
                scaled.setColumnVector(c, j.getColumnVector(c).mapDivide(norms[c]));
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(scaled);
        double[] sv = svd.getSingularValues();
        RealMatrix v = svd.getV();
        double smallestNonZero = Double.POSITIVE_INFINITY;
        for (double s : sv) {
            if (s > 0) {
                smallestNonZero = Math.min(smallestNonZero, s);
            }
        }
        double index = sv.length == 0 || sv[0] == 0 ? Double.POSITIVE_INFINITY : sv[0] / smallestNonZero;
        for (int k = 0; k < sv.length; k++) {
            if (sv[k] > 0 && sv[0] / sv[k] > CONDITION_LIMIT) {
                List<String> involved = new ArrayList<>();
                for (int c = 0; c < p; c++) {
                    if (out[c] == null && v.getEntry(c, k) * v.getEntry(c, k) >= SHARE) {
                        involved.add(names.get(c));
                    }
                }
                for (int c = 0; c < p; c++) {
                    if (out[c] == null && v.getEntry(c, k) * v.getEntry(c, k) >= SHARE) {
                        List<String> others = new ArrayList<>(involved);
                        others.remove(names.get(c));
                        out[c] = String.format(java.util.Locale.ROOT, "not identifiable from these channels: J^T J "
                                + "is near-singular (condition index %.3g > %.0f)%s", sv[0] / sv[k], CONDITION_LIMIT,
                                others.isEmpty() ? "" : "; only a combination with " + String.join(", ", others)
                                        + " is determined");
                    }
                }
            }
        }
        notes.addAll(Arrays.asList(out));
        return index;
    }

    private static double[] clip(double[] u) {
        double[] c = u.clone();
        for (int k = 0; k < c.length; k++) {
            c[k] = Math.max(0.0, Math.min(1.0, c[k]));
        }
        return c;
    }

    private static RealVector clip(RealVector u) {
        return new ArrayRealVector(clip(u.toArray()), false);
    }

    /** One start's evaluations: value and forward-difference Jacobian in one batch; remembers the best point. */
    private static final class Run {
        private final ResidualModel model;
        private final AtomicInteger runs;
        private int size = -1;
        private double firstCost = -1;
        private double bestCost = Double.POSITIVE_INFINITY;
        private LeastSquaresOptimizer.Optimum bestSeen;
        private int evaluations;

        Run(ResidualModel model, AtomicInteger runs) {
            this.model = model;
            this.runs = runs;
        }

        int size(double[] start) {
            if (size < 0) {
                evaluate(new ArrayRealVector(start));
            }
            return size;
        }

        double firstCost() {
            return firstCost;
        }

        LeastSquaresOptimizer.Optimum bestSeen() {
            return bestSeen;
        }

        Pair<RealVector, RealMatrix> evaluate(RealVector point) {
            double[] u = clip(point.toArray());
            int p = u.length;
            List<double[]> batch = new ArrayList<>();
            batch.add(u);
            double[] lo = new double[p];
            double[] hi = new double[p];
            for (int k = 0; k < p; k++) {
                hi[k] = Math.min(1.0, u[k] + STEP);
                lo[k] = Math.max(0.0, u[k] - STEP);
                double[] up = u.clone();
                up[k] = hi[k];
                batch.add(up);
                double[] down = u.clone();
                down[k] = lo[k];
                batch.add(down);
            }
            List<double[]> r = model.residuals(batch);
            runs.addAndGet(batch.size());
            evaluations++;
            double[] base = r.get(0);
            if (size < 0) {
                if (base == null) {
                    throw new BranchsimException(ErrorKey.ESTIMATION_FAILED, "fit",
                            "the model failed at the start " + Arrays.toString(u));
                }
                size = base.length;
            }
            RealMatrix jac = new Array2DRowRealMatrix(size, p);
            if (base == null) {
                double[] failed = new double[size];
                Arrays.fill(failed, FAILED_RESIDUAL);
                return new Pair<>(new ArrayRealVector(failed, false), jac);
            }
            for (int k = 0; k < p; k++) {
                double[] up = r.get(1 + 2 * k);
                double[] down = r.get(2 + 2 * k);
                double[] a = up != null ? up : base;
                double[] b = down != null ? down : base;
                double da = up != null ? hi[k] : u[k];
                double db = down != null ? lo[k] : u[k];
                if (da > db) {
                    for (int i = 0; i < size; i++) {
                        jac.setEntry(i, k, (a[i] - b[i]) / (da - db));
                    }
                }
            }
            double cost = 0;
            for (double x : base) {
                cost += x * x;
            }
            if (firstCost < 0) {
                firstCost = cost;
            }
            RealVector value = new ArrayRealVector(base, false);
            if (cost < bestCost) {
                bestCost = cost;
                RealVector residual = value.mapMultiply(-1.0);
                bestSeen = LeastSquaresOptimizer.Optimum.of(new Snapshot(new ArrayRealVector(u, false), residual,
                        jac.copy()), evaluations, evaluations);
            }
            return new Pair<>(value, jac);
        }
    }

    /** A model evaluation kept as it was: point, residuals (target minus value) and Jacobian of the value. */
    private static final class Snapshot extends AbstractEvaluation {
        private final RealVector point;
        private final RealVector residuals;
        private final RealMatrix jacobian;

        Snapshot(RealVector point, RealVector residuals, RealMatrix jacobian) {
            super(residuals.getDimension());
            this.point = point;
            this.residuals = residuals;
            this.jacobian = jacobian;
        }

        @Override
        public RealMatrix getJacobian() {
            return jacobian;
        }

        @Override
        public RealVector getPoint() {
            return point;
        }

        @Override
        public RealVector getResiduals() {
            return residuals;
        }
    }
}
