package org.branchsim.core.settings;

import java.util.Locale;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Units;

/**
 * How to integrate one run. Times in s.
 *
 * @param method integration method
 * @param endTime simulated time span, s (positive)
 * @param outputInterval spacing of the output grid, s (positive)
 * @param relativeTolerance relative error tolerance per step
 * @param minStep smallest step allowed before the run fails, s
 * @param maxStep largest step allowed, s
 * @param eventTolerance accuracy of event times, s
 * @param maxEvaluations derivative evaluations allowed before the run fails
 */
public record SolverSettings(Method method, double endTime, double outputInterval, double relativeTolerance,
                             double minStep, double maxStep, double eventTolerance, long maxEvaluations) {

    /**
     * Most samples an output grid may have (a sample per output interval from 0 to the end time): beyond it a
     * run is refused before it starts. A million samples is a 1 ms grid over 1000 s.
     */
    public static final long MAX_OUTPUT_SAMPLES = 1_000_000L;
    /**
     * Most values (samples times signals plus time) a run may keep: 20 million doubles are 160 MB in memory
     * and about 300 MB of trace.csv.
     */
    public static final long MAX_OUTPUT_VALUES = 20_000_000L;

    /**
     * Checks what every run needs: a method, a finite positive end time and output interval, and an output
     * grid within {@link #MAX_OUTPUT_SAMPLES}.
     *
     * @throws BranchsimException NO_INTEGRATION_METHOD, VALUE_NOT_FINITE or OUTPUT_GRID_TOO_LARGE when a value cannot give a run
     */
    public SolverSettings {
        if (method == null) {
            throw new BranchsimException(ErrorKey.NO_INTEGRATION_METHOD);
        }
        if (!(endTime > 0.0) || !Double.isFinite(endTime)) {
            throw new BranchsimException(ErrorKey.VALUE_NOT_FINITE, "end time", endTime + " s");
        }
        if (!(outputInterval > 0.0) || !Double.isFinite(outputInterval)) {
            throw new BranchsimException(ErrorKey.VALUE_NOT_FINITE, "output interval", outputInterval + " s");
        }
        String grid = outputGridProblem(endTime, outputInterval, 0);
        if (grid != null) {
            throw new BranchsimException(ErrorKey.OUTPUT_GRID_TOO_LARGE, grid, outputGrid(endTime, outputInterval, 0));
        }
    }

    /** @return the number of samples on the output grid from 0 to {@code endTime} every {@code interval} */
    public static double outputSamples(double endTime, double interval) {
        return Math.floor(endTime / interval + 0.5) + 1.0;
    }

    /**
     * @param endTime end time, s
     * @param interval output interval, s
     * @param signals signals recorded per sample (0 when not known yet)
     * @return null when the grid is within {@link #MAX_OUTPUT_SAMPLES} and {@link #MAX_OUTPUT_VALUES};
     *         otherwise what is expected, with the output interval or end time that would fit
     */
    public static String outputGridProblem(double endTime, double interval, int signals) {
        double samples = outputSamples(endTime, interval);
        double perSample = signals + 1.0;
        long most = (long) Math.min(MAX_OUTPUT_SAMPLES, Math.floor(MAX_OUTPUT_VALUES / perSample));
        if (samples <= most) {
            return null;
        }
        return String.format(Locale.ROOT, "an output grid of at most %d samples%s; coarsen outputInterval to at "
                        + "least %s s or shorten endTime to at most %s s", most,
                signals > 0 ? String.format(Locale.ROOT, " (%d values at %d signals per sample)", MAX_OUTPUT_VALUES,
                        signals) : "",
                Units.plain(endTime / (most - 1)), Units.plain(interval * (most - 1)));
    }

    /** @return the grid as found, for messages, e.g. {@code endTime 1e+06 s / outputInterval 0.001 s = 1e+09 samples} */
    public static String outputGrid(double endTime, double interval, int signals) {
        return String.format(Locale.ROOT, "endTime %s s / outputInterval %s s = %s samples%s", Units.plain(endTime),
                Units.plain(interval), Units.plain(outputSamples(endTime, interval)),
                signals > 0 ? " of " + (signals + 1) + " values" : "");
    }

    /**
     * Default method: the implicit Rosenbrock method, 12 to 136 times fewer derivative evaluations than
     * Dormand-Prince 5(4) on the demos at equal tolerance, and more accurate (docs/performance.md).
     */
    public static final Method DEFAULT_METHOD = Method.IMPLICIT;
    /** Default relative tolerance. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-6;
    /** Default smallest step, s. */
    public static final double DEFAULT_MIN_STEP = 1e-13;
    /** Default accuracy of event times, s. */
    public static final double DEFAULT_EVENT_TOLERANCE = 1e-9;
    /** Default cap on derivative evaluations. */
    public static final long DEFAULT_MAX_EVALUATIONS = 50_000_000L;

    /** @return settings with defaults for everything but the span and output interval */
    public static SolverSettings defaults(double endTime, double outputInterval) {
        return new SolverSettings(DEFAULT_METHOD, endTime, outputInterval, DEFAULT_RELATIVE_TOLERANCE,
                DEFAULT_MIN_STEP, Math.max(outputInterval, endTime / 100.0), DEFAULT_EVENT_TOLERANCE,
                DEFAULT_MAX_EVALUATIONS);
    }

    /** @return a copy with another method */
    public SolverSettings withMethod(Method m) {
        return new SolverSettings(m, endTime, outputInterval, relativeTolerance, minStep, maxStep, eventTolerance,
                maxEvaluations);
    }

    /** @return a copy with another relative tolerance */
    public SolverSettings withRelativeTolerance(double rtol) {
        return new SolverSettings(method, endTime, outputInterval, rtol, minStep, maxStep, eventTolerance,
                maxEvaluations);
    }

    /** @return a copy with another end time, s */
    public SolverSettings withEndTime(double t) {
        return new SolverSettings(method, t, outputInterval, relativeTolerance, minStep, maxStep, eventTolerance,
                maxEvaluations);
    }

    /** @return a copy with another output interval, s (the largest step is kept) */
    public SolverSettings withOutputInterval(double dt) {
        return new SolverSettings(method, endTime, dt, relativeTolerance, minStep, maxStep, eventTolerance,
                maxEvaluations);
    }
}
