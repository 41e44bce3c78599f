package org.branchsim.core.error;

/**
 * Message keys of every failure branchsim reports, with their message pattern and whether the failure is
 * the user's input (exit code 2) or a run-time failure of the simulation (exit code 1).
 * Placeholders follow {@link java.text.MessageFormat}: {0}, {1}, ...; pass them as text (a number would be
 * formatted with the locale's grouping), already in the units the message names. Each key has its own test.
 */
public enum ErrorKey {
    /** The scenario has one or more problems; the problem list carries the details. */
    SCENARIO_INVALID(true, "scenario {0} has {1} problem(s)"),
    /** The scenario file cannot be read at all. */
    SCENARIO_UNREADABLE(true, "cannot read scenario {0}: {1}"),
    /** A command-line option's number lies outside the option's limits. */
    OPTION_OUT_OF_RANGE(true, "{0}: expected {1}, found {2}"),
    /** A command-line option's text cannot be read as what the option takes (syntax, unknown word, no unit). */
    OPTION_UNREADABLE(true, "{0}: expected {1}, found {2}"),
    /** A command-line option names the same parameter or signal twice. */
    OPTION_REPEATED(true, "{0}: expected each {1} once, found {2}"),
    /** A parameter path (sweeps, timing) is not a row of names separated by single dots. */
    PARAMETER_PATH_MALFORMED(true, "parameter path \"{0}\": expected names separated by single dots, e.g. "
            + "elements.reducer.dampingOrifice.diameter"),
    /** A parameter path names nothing in the scenario; the last argument lists what is there. */
    UNKNOWN_PARAMETER_PATH(true, "parameter path \"{0}\": expected names the scenario has, found no \"{1}\" "
            + "in it{2}"),
    /**
     * A parameter path names a field the element or section does not declare (its descriptor has no such field);
     * the reason says where, and which fields are declared there.
     */
    UNDECLARED_PARAMETER_FIELD(true, "parameter path \"{0}\": expected a field the scenario format declares, "
            + "found {1}"),
    /** A parameter path names something other than a number (a name, a list, a block). */
    PARAMETER_NOT_NUMERIC(true, "{0}: expected the path of a number or of a value with its unit, found {1}"),
    /** A value a study would give a parameter is one the scenario reader refuses. */
    PARAMETER_VALUE_REFUSED(true, "{0}: expected values the scenario accepts ({1}), found \"{2}\""),
    /** A signal name the circuit does not have. */
    UNKNOWN_SIGNAL(true, "{0}: expected signals of this circuit such as {1}, found \"{2}\""),
    /** A metric name the study's table does not have. */
    UNKNOWN_METRIC(true, "{0}: expected a metric of summary.csv (unit optional, any case): {1}; found \"{2}\""),
    /** A moving member's id the circuit does not have. */
    UNKNOWN_MEMBER(true, "no member \"{0}\" in circuit {1}; members: {2}"),
    /** The output folder cannot be used (a file, the root, a folder holding other files or the input...). */
    OUTPUT_FOLDER_REFUSED(true, "{0}: expected {1}, found {2}"),
    /** A shard folder given to merge is not a shard of the study, is damaged, repeated, or a shard is missing. */
    SHARD_FOLDER_REFUSED(true, "SHARD_FOLDER {0}: expected {1}, found {2}"),
    /** A tolerance study of a scenario that writes no value with a tolerance; located at the document's start. */
    NO_TOLERANCED_VALUE(true, "{0}: no value is written with a tolerance; write e.g. \"diameter\": "
            + "\"0.8 mm \u00b1 0.02 mm\", \"springRate\": \"15 N/mm \u00b1 10 %\" or \"bulkModulus\": \"1.2 GPa .. 1.6 GPa\""),
    /** The demos the timing command measures by default are in none of the places looked at. */
    DEMOS_NOT_FOUND(true, "timing: expected the default demos ({0}) in ./scenarios or beside the program, found none "
            + "in {1}; pass scenario files: branchsim timing SCENARIO..."),
    /** A value that must be finite and above zero (a time, an interval, a threshold) is not. */
    VALUE_NOT_FINITE(true, "expected a finite {0} above zero, found {1}"),
    /** The output grid of a run would hold more samples or values than allowed; the message says what would fit. */
    OUTPUT_GRID_TOO_LARGE(true, "expected {0}, found {1}"),
    /** Solver settings were made without an integration method. */
    NO_INTEGRATION_METHOD(true, "solver settings need an integration method"),
    /** A spectrum was asked with a segment length, padding or sample interval it cannot have. */
    SPECTRUM_SETTINGS_INVALID(true, "Welch spectrum needs 8 <= segment length <= {0} samples, padding >= 1 and a "
            + "positive sample interval; got {1}, {2}, {3} s"),
    /** A signal's samples and the sample times differ in number. */
    SAMPLE_COUNT_MISMATCH(true, "signal {0} has {1} samples but there are {2} sample times"),
    /** Oscillation detection was given sample times that are not evenly spaced. */
    NON_UNIFORM_SAMPLES(true, "oscillation detection needs uniform sample times; interval {0} s at t = {1} s differs "
            + "from {2} s"),
    /** An operating-point start state does not fit the circuit, or its time is not finite. */
    START_STATE_MISMATCH(true, "an operating-point start needs {0} states and a finite time, found {1} states at t = {2}"),
    /** No output sample lies in the window an operating-point start is averaged over. */
    NO_SAMPLES_IN_WINDOW(true, "no output sample between {0} s and {1} s to average an operating-point start over"),
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
    STUDY_FAILED(false, "all {0} variants failed, nothing written; the first failure (variant {1}): {2}"),
    /** A characteristic was asked of a scenario that lacks what it needs (a reducing valve, a ramp). */
    NOTHING_TO_CHARACTERISE(true, "{0}: no characteristic can be drawn: {1}"),
    /** The spill space (a temporary file) that holds a long run's samples beyond the memory budget fails. */
    TRACE_STORE_FAILED(false, "cannot keep the samples of the run outside the heap, in {0}: {1}"),
    /** A measured (data-logger) file has a mistake at a place: file, line, column, the column's name. */
    MEASURED_FILE_INVALID(true, "{0}:{1}:{2}: column \"{3}\": expected {4}, found {5}"),
    /** Measured channels cannot be aligned with the simulation (no trigger crossing, no overlap). */
    ALIGNMENT_FAILED(true, "alignment {0}: expected {1}, found {2}"),
    /** A specification file (tune) has a mistake at a place. */
    SPEC_INVALID(true, "{0}:{1}:{2}: {3}: expected {4}, found {5}"),
    /** Every start of a fit or a design search failed to run the model; the first failure is given. */
    ESTIMATION_FAILED(false, "{0}: every model run failed; the first failure: {1}");

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
