package org.branchsim.core.error;

/**
 * Message keys of every failure branchsim reports, with their message pattern and whether the failure is
 * the user's input (exit code 2) or a run-time failure of the simulation (exit code 1).
 * Placeholders follow {@link java.text.MessageFormat}: {0}, {1}, ...
 */
public enum ErrorKey {
    /** The scenario has one or more problems; the problem list carries the details. */
    SCENARIO_INVALID(true, "scenario {0} has {1} problem(s)"),
    /** The scenario file cannot be read at all. */
    SCENARIO_UNREADABLE(true, "cannot read scenario {0}: {1}"),
    /** A value given on the command line or through the API is not acceptable. */
    BAD_ARGUMENT(true, "{0}"),
    /** The integrator produced NaN or infinity in a state. */
    NAN_IN_STATE(false, "the solution became non-finite at t = {0} s in state {1} (value {2}); last good states: {3}"),
    /** The integrator could not keep the error below tolerance with the smallest allowed step. */
    STEP_UNDERFLOW(false, "the step size fell below the minimum {0} s at t = {1} s; {2}"),
    /** The integrator exceeded the allowed number of derivative evaluations. */
    TOO_MANY_EVALUATIONS(false, "more than {0} derivative evaluations were needed; stopped at t = {1} s; states: {2}"),
    /** Any other failure of the solver library, with its own message. */
    SOLVER_FAILED(false, "the solver failed at t = {0} s: {1}; states: {2}"),
    /**
     * No operating point (f(y) = 0 with members held where they are held) was found at a time: the circuit is
     * still moving there, or the Newton solve did not converge. A property of the circuit at that time, so a
     * run-time failure (exit code 1), not an input error.
     */
    NO_OPERATING_POINT(false, "no operating point at t = {0} s: {1}; states changing most {2}{3}"),
    /** The eigenvalues of a linearised circuit could not be computed (the QR iteration did not converge). */
    MODES_FAILED(false, "the modes of the circuit linearised at t = {0} s could not be computed: {1}"),
    /** Writing an output file failed. */
    OUTPUT_FAILED(false, "cannot write output {0}: {1}"),
    /** Every variant of a study failed, so the study has no result (nothing is written). */
    STUDY_FAILED(false, "all {0} variants failed, nothing written; the first failure (variant {1}): {2}");

    private final boolean inputError;
    private final String pattern;

    ErrorKey(boolean inputError, String pattern) {
        this.inputError = inputError;
        this.pattern = pattern;
    }

    /** @return true when the failure is caused by the user's input (exit code 2). */
    public boolean isInputError() {
        return inputError;
    }

    /** @return the message pattern with {0}-style placeholders. */
    public String pattern() {
        return pattern;
    }
}
