package org.branchsim.core.solve;

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
}
