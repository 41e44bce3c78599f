package org.branchsim.core.scenario;

import java.util.Arrays;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.settings.Method;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.units.Dimension;

/**
 * The {@code solver} section: end time, output grid, tolerances, step limits and the integration method, read
 * into {@link SolverSettings} (which lives in {@code solve}: this is the one place the scenario reader names
 * the solver's settings). An output grid beyond the solver's limits is refused before any run.
 */
final class SolverSection {

    static final BlockSpec SPEC = BlockSpec.of("solver",
            FieldSpec.positive("endTime", Dimension.TIME).meaning("simulated time span"),
            FieldSpec.positive("outputInterval", Dimension.TIME).computedDefault(Double.NaN, "endTime/1000")
                    .meaning("spacing of the output grid"),
            FieldSpec.number("relativeTolerance", 1e-12, 1e-2, SolverSettings.DEFAULT_RELATIVE_TOLERANCE)
                    .meaning("relative error tolerance of the integrator"),
            FieldSpec.positive("maxStep", Dimension.TIME).computedDefault(Double.NaN, "max(outputInterval, endTime/100)")
                    .meaning("longest integration step"),
            FieldSpec.positive("minStep", Dimension.TIME).byDefault(FieldSpec.plain(SolverSettings.DEFAULT_MIN_STEP) + " s")
                    .meaning("a smaller step needed means failure (exit code 1)"),
            FieldSpec.positive("eventTolerance", Dimension.TIME)
                    .byDefault(FieldSpec.plain(SolverSettings.DEFAULT_EVENT_TOLERANCE) + " s")
                    .meaning("accuracy of event times"),
            FieldSpec.number("maxEvaluations", 1000, 1e10, SolverSettings.DEFAULT_MAX_EVALUATIONS)
                    .meaning("derivative evaluations allowed"),
            FieldSpec.choice("method", Arrays.stream(Method.values())
                            .map(m -> FieldSpec.word(m.word())).toArray(FieldSpec.Word[]::new))
                    .byDefault(SolverSettings.DEFAULT_METHOD.word())
                    .meaning("\"implicit\" (Rosenbrock RODAS, order 4, for stiff circuits: the default), "
                            + "\"implicit-order3\" (Rosenbrock RODAS3, the implicit method before RODAS), \"explicit\" "
                            + "(Dormand–Prince 5(4)) or \"reference\" (Dormand–Prince 8(5,3), for tight-tolerance checks)"))
            .with(SolverSection::intervalWithinEnd);

    private SolverSection() {
    }

    private static void intervalWithinEnd(Reading r) {
        if (r.has("outputInterval") && r.valid("endTime", "outputInterval")
                && r.si("outputInterval") > r.si("endTime")) {
            r.problem("outputInterval", "an interval no longer than the end time", r.raw("outputInterval").describe());
        }
    }

    /**
     * @param root the document's top level
     * @param circuit the circuit when it was built (its signal count limits the output grid), else null
     * @return the settings, or null after recording a problem
     */
    static SolverSettings read(Fields root, CircuitModel circuit) {
        Fields f = root.object("solver");
        if (f == null) {
            root.problem("solver", "a \"solver\" block with at least \"endTime\"", "none");
            return null;
        }
        Reading r = BlockReader.read(f, SPEC);
        f.finish();
        double end = r.si("endTime");
        double dt = r.has("outputInterval") ? r.si("outputInterval") : Double.isNaN(end) ? 1e-3 : end / 1000.0;
        double maxStep = r.has("maxStep") ? r.si("maxStep") : Geometry.ok(end, dt) ? Math.max(dt, end / 100.0) : 1e-3;
        String methodName = r.text("method");
        Method method = Method.named(methodName);
        if (!Geometry.ok(end, dt, r.si("relativeTolerance"), maxStep, r.si("minStep"), r.si("eventTolerance"),
                r.si("maxEvaluations")) || method == null) {
            return null;
        }
        if (SolverSettings.outputGridProblem(end, dt, 0) != null) {
            checkOutputGrid(f, end, dt, 0);
            return null;
        }
        SolverSettings s = new SolverSettings(method, end, dt, r.si("relativeTolerance"), r.si("minStep"), maxStep,
                r.si("eventTolerance"), (long) r.si("maxEvaluations"));
        if (circuit != null) {
            checkOutputGrid(f, end, dt, circuit.signals().size());
        }
        return s;
    }

    /** Refuses, before any run, an output grid beyond {@link SolverSettings#MAX_OUTPUT_VALUES}. */
    private static void checkOutputGrid(Fields f, double end, double dt, int signals) {
        String problem = SolverSettings.outputGridProblem(end, dt, signals);
        if (problem != null) {
            f.problem(f.has("outputInterval") ? "outputInterval" : "endTime", problem,
                    SolverSettings.outputGrid(end, dt, signals));
        }
    }
}
