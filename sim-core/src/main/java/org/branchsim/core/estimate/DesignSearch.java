package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.InitialGuess;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.SimpleBounds;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.nonlinear.scalar.ObjectiveFunction;
import org.hipparchus.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;

/**
 * Derivative-free search for the minimum of an objective over the unit box [0, 1]^p: a coarse design of
 * experiments (the centre and Halton points, evaluated as one parallel batch), then BOBYQA (M. J. D. Powell, "The
 * BOBYQA algorithm for bound constrained optimization without derivatives", Cambridge report DAMTP 2009/NA06,
 * 2009; Hipparchus's implementation, 2p + 1 interpolation points) from the best few points of the design, each
 * descent on its own thread; for one parameter Brent's method (R. P. Brent, Algorithms for Minimization without
 * Derivatives, 1973) instead. All descents share one budget of objective evaluations. A failed evaluation counts
 * as +infinity (BOBYQA then sees a large finite value).
 */
public final class DesignSearch {

    /** Objective value given to the optimiser for a failed evaluation. */
    static final double FAILED = 1e30;
    /** Initial trust-region radius of BOBYQA in the unit box. */
    public static final double INITIAL_RADIUS = 0.15;
    /** Final trust-region radius of BOBYQA in the unit box. */
    public static final double STOPPING_RADIUS = 1e-3;

    /** One evaluated design. @param run 1-based order of evaluation @param u point @param value objective @param source what proposed it */
    public record Point(int run, double[] u, double value, String source) {
    }

    /** The search's outcome. @param points every design evaluated, in evaluation order @param best the lowest */
    public record Result(List<Point> points, Point best) {

        /** @return the designs ranked by objective, lowest first (ties by run) */
        public List<Point> ranked() {
            List<Point> r = new ArrayList<>(points);
            r.sort(Comparator.comparingDouble(Point::value).thenComparingInt(Point::run));
            return r;
        }
    }

    private DesignSearch() {
    }

    /**
     * @param objective evaluates a batch of points (in parallel if it likes); NaN for a failed evaluation
     * @param p number of parameters (at least 1)
     * @param designPoints points of the design of experiments (at least 1: the centre; then Halton points)
     * @param descents number of local descents from the best design points
     * @param maxRuns budget of evaluations, design included
     * @param threads threads for the descents
     * @return every point evaluated and the best
     */
    public static Result minimise(Function<List<double[]>, double[]> objective, int p, int designPoints, int descents,
                                  int maxRuns, int threads) {
        return minimise(objective, p, designPoints, descents, maxRuns, threads, STOPPING_RADIUS);
    }

    /**
     * As {@link #minimise(Function, int, int, int, int, int)} with a final trust-region radius of one's own.
     *
     * @param objective evaluates a batch of points; NaN for a failed evaluation
     * @param p number of parameters (at least 1)
     * @param designPoints points of the design of experiments (at least 1)
     * @param descents number of local descents from the best design points
     * @param maxRuns budget of evaluations, design included
     * @param threads threads for the descents
     * @param stoppingRadius final trust-region radius in the unit box (resolution of the answer)
     * @return every point evaluated and the best
     */
    public static Result minimise(Function<List<double[]>, double[]> objective, int p, int designPoints, int descents,
                                  int maxRuns, int threads, double stoppingRadius) {
        List<Point> log = Collections.synchronizedList(new ArrayList<>());
        AtomicInteger counter = new AtomicInteger();
        List<double[]> design = new ArrayList<>();
        double[] centre = new double[p];
        Arrays.fill(centre, 0.5);
        design.add(centre);
        for (int i = 1; i < Math.min(designPoints, maxRuns); i++) {
            design.add(DesignOfExperiments.halton(i, p));
        }
        double[] values = objective.apply(design);
        for (int i = 0; i < design.size(); i++) {
            log.add(new Point(counter.incrementAndGet(), design.get(i), finite(values[i]), "design"));
        }
        List<Point> seeds = new ArrayList<>(log);
        seeds.sort(Comparator.comparingDouble(Point::value).thenComparingInt(Point::run));
        int k = Math.min(Math.max(1, descents), seeds.size());
        int left = maxRuns - counter.get();
        if (left > 0) {
            ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, k)), r -> {
                Thread t = new Thread(r, "branchsim-descent");
                t.setDaemon(true);
                return t;
            });
            try {
                List<Future<?>> futures = new ArrayList<>();
                for (int d = 0; d < k; d++) {
                    double[] start = seeds.get(d).u();
                    String source = "descent " + (d + 1);
                    int budget = left / k + (d < left % k ? 1 : 0);
                    futures.add(pool.submit(() -> descend(objective, start, budget, source, log, counter,
                            stoppingRadius)));
                }
                for (Future<?> f : futures) {
                    f.get();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted during the design search", e);
            } catch (ExecutionException e) {
                throw new IllegalStateException("a descent failed unexpectedly", e.getCause());
            } finally {
                pool.shutdownNow();
            }
        }
        List<Point> all;
        synchronized (log) {
            all = new ArrayList<>(log);
        }
        all.sort(Comparator.comparingInt(Point::run));
        Point best = all.stream().min(Comparator.comparingDouble(Point::value).thenComparingInt(Point::run))
                .orElseThrow();
        return new Result(all, best);
    }

    private static double finite(double v) {
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    /** Thrown inside the optimiser when a descent's budget is spent. */
    private static final class BudgetSpent extends RuntimeException {
        private static final long serialVersionUID = 1L;

        BudgetSpent() {
            super(null, null, false, false);
        }
    }

    private static void descend(Function<List<double[]>, double[]> objective, double[] start, int budget,
                                String source, List<Point> log, AtomicInteger counter, double stoppingRadius) {
        int p = start.length;
        AtomicInteger used = new AtomicInteger();
        java.util.function.ToDoubleFunction<double[]> f = u -> {
            if (used.incrementAndGet() > budget) {
                throw new BudgetSpent();
            }
            double[] x = u.clone();
            for (int i = 0; i < p; i++) {
                x[i] = Math.max(0.0, Math.min(1.0, x[i]));
            }
            double v = finite(objective.apply(List.of(x))[0]);
            log.add(new Point(counter.incrementAndGet(), x, v, source));
            return Double.isFinite(v) ? v : FAILED;
        };
        try {
            if (p == 1) {
                new BrentOptimizer(1e-4, stoppingRadius).optimize(new MaxEval(Math.max(budget + 1, 2)),
                        new UnivariateObjectiveFunction(x -> f.applyAsDouble(new double[] {x})), GoalType.MINIMIZE,
                        new SearchInterval(0.0, 1.0, start[0]));
            } else {
                double[] s = start.clone();
                for (int i = 0; i < p; i++) {
                    // BOBYQA needs the start at least the initial radius inside the box or on its bound
                    if (s[i] > 0 && s[i] < INITIAL_RADIUS) {
                        s[i] = Math.min(INITIAL_RADIUS, 1.0);
                    } else if (s[i] < 1 && s[i] > 1 - INITIAL_RADIUS) {
                        s[i] = 1 - INITIAL_RADIUS;
                    }
                }
                double[] lo = new double[p];
                double[] hi = new double[p];
                Arrays.fill(hi, 1.0);
                new BOBYQAOptimizer(2 * p + 1, INITIAL_RADIUS, stoppingRadius).optimize(new MaxEval(Math.max(budget + 1,
                        2 * p + 2)), new ObjectiveFunction(f::applyAsDouble), GoalType.MINIMIZE, new InitialGuess(s),
                        new SimpleBounds(lo, hi));
            }
        } catch (BudgetSpent | MathIllegalStateException e) {
            // the budget is spent or the optimiser gave up: the points it evaluated are logged
        }
    }
}
