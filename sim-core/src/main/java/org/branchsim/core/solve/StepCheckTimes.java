package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.sampling.ODEStateInterpolator;

/**
 * Where the switching functions are checked inside a step of the implicit method. Along a step, every switching
 * function g is represented by the cubic through its values on the step's dense output at theta = 0, 1/3, 2/3
 * and 1 (theta = (t - t0)/h). The dense output of the implicit method is itself a cubic in
 * theta (docs/theory.md §10), so for a g that is affine in the states (a free member's distance to its seat or
 * stop) that cubic is g along the step exactly; for a g that is a smooth function of the states (a held member's
 * net force) it is g's cubic interpolant. A cubic changes sign twice between two checks only around an interior
 * extremum, so g is checked at the step's end and at every interior extremum of its cubic whose value lies on
 * the other side of zero from either end of the step, or near zero (within a tenth of g's largest magnitude over
 * the step): between consecutive checks the cubic is then monotone and a crossing and re-crossing inside one
 * step cannot be missed. A step of a member that does not approach its stops costs no interior check at all.
 * <p>
 * Hipparchus places the next check at {@code done + remaining / ceil(remaining / interval)}, i.e. at or before
 * the time asked for; asking for the extremum's time again from there closes the gap quadratically, and an
 * extremum within {@link #REACHED} of a step's length is taken as checked (g then differs from its extremum value
 * by about 1e-8 of its change over the step). Steps shorter than a fifth of the fastest member's natural period
 * are only checked at their ends, as they always were: on a circuit that oscillates the method takes thousands
 * of such steps, and looking inside each cost about a tenth of the run. Times in s.
 */
final class StepCheckTimes implements AdaptableInterval {

    /** Fraction of the step within which an extremum counts as checked. */
    static final double REACHED = 1e-4;
    /** An extremum this close to zero, as a fraction of g's largest magnitude over the step, is checked. */
    static final double NEAR_ZERO = 0.1;

    private final List<ToDoubleFunction<ODEStateAndDerivative>> functions = new ArrayList<>();
    private final double shortStep;
    private double t0 = Double.NaN;
    private double t1 = Double.NaN;
    private double[] times = new double[8];
    private int count;
    private double[][] samples = new double[0][4];
    private long interiorChecks;

    /**
     * @param shortStep steps no longer than this, s, are checked at their ends only: a fifth of the fastest
     *        member's natural period ({@link CheckIntervals#shortest()}), too short for a swing out and back
     *        (common practice, no source); 0 to look inside every step
     */
    StepCheckTimes(double shortStep) {
        this.shortStep = shortStep;
    }

    /**
     * @param g a switching function to watch; its check times join those of the others (all detectors of a run
     *          share one set of check times, so their checks hit the dense output's cache of interpolated states)
     */
    void watch(ToDoubleFunction<ODEStateAndDerivative> g) {
        functions.add(g);
    }

    /**
     * Chooses the check times of one accepted step: to be called with the step's dense output before the
     * step's events are searched.
     *
     * @param step the step's dense output
     */
    void inspect(ODEStateInterpolator step) {
        ODEStateAndDerivative start = step.getPreviousState();
        ODEStateAndDerivative end = step.getCurrentState();
        t0 = start.getTime();
        t1 = end.getTime();
        count = 0;
        double h = t1 - t0;
        if (!(h > shortStep) || functions.isEmpty()) {
            return;
        }
        int m = functions.size();
        if (samples.length != m) {
            samples = new double[m][4];
        }
        ODEStateAndDerivative[] at = {start, step.getInterpolatedState(t0 + h / 3.0),
                step.getInterpolatedState(t0 + 2.0 * h / 3.0), end};
        // states outer, functions inner: detectors share one view per state
        for (int k = 0; k < 4; k++) {
            for (int i = 0; i < m; i++) {
                samples[i][k] = functions.get(i).applyAsDouble(at[k]);
            }
        }
        for (int i = 0; i < m; i++) {
            addExtrema(samples[i], h);
        }
        Arrays.sort(times, 0, count);
    }

    /** @return checks placed inside steps at extrema so far (a statistic for tests and the benchmark) */
    long interiorChecks() {
        return interiorChecks;
    }

    @Override
    public double currentInterval(ODEStateAndDerivative done, boolean isForward) {
        double t = done.getTime();
        double h = t1 - t0;
        if (!(t >= t0 && t < t1)) {
            // not the inspected step (none inspected yet): check at the step's end
            return Double.isFinite(h) && h > 0.0 ? h : Double.MAX_VALUE;
        }
        double reached = REACHED * h;
        for (int k = 0; k < count; k++) {
            if (times[k] > t + reached) {
                return times[k] - t;
            }
        }
        return h;
    }

    /** Adds the interior extrema of the cubic through g at theta = 0, 1/3, 2/3, 1 that could hide a crossing. */
    private void addExtrema(double[] g, double h) {
        // Newton forward differences in u = 3 theta: p(u) = g0 + d1 u + d2 u(u-1)/2 + d3 u(u-1)(u-2)/6
        double d1 = g[1] - g[0];
        double d2 = g[2] - 2.0 * g[1] + g[0];
        double d3 = g[3] - 3.0 * g[2] + 3.0 * g[1] - g[0];
        // p'(u) = a u^2 + b u + c
        double a = d3 / 2.0;
        double b = d2 - d3;
        double c = d1 - d2 / 2.0 + d3 / 3.0;
        double largest = Math.max(Math.max(Math.abs(g[0]), Math.abs(g[1])), Math.max(Math.abs(g[2]), Math.abs(g[3])));
        if (largest == 0.0) {
            return;
        }
        double scale = Math.abs(a) * 9.0 + Math.abs(b) * 3.0 + Math.abs(c);
        if (scale <= 1e-12 * largest) {
            return;
        }
        if (Math.abs(a) * 9.0 <= 1e-12 * scale) {
            if (b != 0.0) {
                consider(-c / b, g, d1, d2, d3, largest, h);
            }
            return;
        }
        double disc = b * b - 4.0 * a * c;
        if (disc < 0.0) {
            return;
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(disc), b));
        consider(q / a, g, d1, d2, d3, largest, h);
        if (q != 0.0) {
            consider(c / q, g, d1, d2, d3, largest, h);
        }
    }

    private void consider(double u, double[] g, double d1, double d2, double d3, double largest, double h) {
        if (!(u > 0.0 && u < 3.0)) {
            return;
        }
        double value = g[0] + d1 * u + d2 * u * (u - 1.0) / 2.0 + d3 * u * (u - 1.0) * (u - 2.0) / 6.0;
        boolean hides = value * g[0] <= 0.0 || value * g[3] <= 0.0 || Math.abs(value) < NEAR_ZERO * largest;
        if (!hides) {
            return;
        }
        if (count == times.length) {
            times = Arrays.copyOf(times, 2 * count);
        }
        times[count++] = t0 + u / 3.0 * h;
        interiorChecks++;
    }
}
