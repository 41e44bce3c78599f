package org.branchsim.core.error;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.text.MessageFormat;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.branchsim.core.TestFluids;
import org.branchsim.core.analysis.OscillationDetector;
import org.branchsim.core.analysis.SignalSamples;
import org.branchsim.core.analysis.WelchSpectrum;
import org.branchsim.core.elements.Orifice;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.Method;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.units.Dimension;
import org.hipparchus.exception.LocalizedCoreFormats;
import org.hipparchus.exception.MathIllegalStateException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every error key: its pattern is a valid {@link MessageFormat} with placeholders {0}..{n-1}, it has a test that
 * raises it (here for the core's keys, in sim-cli's ErrorKeysTest for the command line's), and each core key below
 * is raised by the mistake it names. The expected texts are the keys' own definitions (what was expected, what
 * was found), not the code's output.
 */
class ErrorKeyTest {

    private static final Pattern PLACEHOLDER = Pattern.compile("\\{(\\d+)}");
    private static final Path[] TEST_SOURCES = {Path.of("src", "test", "java"), Path.of("..", "sim-cli", "src", "test", "java")};

    private static BranchsimException thrown(ErrorKey key, org.junit.jupiter.api.function.Executable call) {
        BranchsimException e = assertThrows(BranchsimException.class, call);
        assertSame(key, e.key(), e.getMessage());
        assertFalse(e.getMessage().contains("{"), "every placeholder filled: " + e.getMessage());
        return e;
    }

    @Test
    void everyPatternIsAMessageFormatWithConsecutivePlaceholders() {
        for (ErrorKey key : ErrorKey.values()) {
            new MessageFormat(key.pattern(), Locale.ROOT);
            Matcher m = PLACEHOLDER.matcher(key.pattern());
            int highest = -1;
            List<Integer> seen = new ArrayList<>();
            while (m.find()) {
                int i = Integer.parseInt(m.group(1));
                seen.add(i);
                highest = Math.max(highest, i);
            }
            for (int i = 0; i <= highest; i++) {
                assertTrue(seen.contains(i), key + " lacks {" + i + "}");
            }
            assertFalse(key.pattern().contains("'"), key + ": a single quote would be eaten by MessageFormat");
        }
    }

    @Test
    void everyKeyHasATestThatRaisesIt() throws IOException {
        StringBuilder tests = new StringBuilder();
        for (Path root : TEST_SOURCES) {
            if (Files.isDirectory(root)) {
                try (Stream<Path> files = Files.walk(root)) {
                    for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                        tests.append(Files.readString(f));
                    }
                }
            }
        }
        String text = tests.toString();
        for (ErrorKey key : ErrorKey.values()) {
            assertTrue(text.contains("ErrorKey." + key.name()), key + " has no test that raises it");
        }
    }

    @Test
    void withinKeepsTheKeyAndArgumentsAndNamesWhereTheFailureWasMet() {
        BranchsimException e = new BranchsimException(ErrorKey.UNKNOWN_PARAMETER_PATH, "a.b", "b", "");
        BranchsimException seen = e.within("--vary");
        assertSame(ErrorKey.UNKNOWN_PARAMETER_PATH, seen.key());
        assertEquals("--vary: " + e.getMessage(), seen.getMessage());
        assertEquals(List.of(e.arguments()), List.of(seen.arguments()));
        assertSame(e, seen.getCause());
        assertTrue(seen.key().isInputError());
    }

    @Test
    void solverSettingsRefuseWhatCannotGiveARun() {
        assertTrue(thrown(ErrorKey.VALUE_NOT_FINITE, () -> new SolverSettings(Method.IMPLICIT, Double.NaN, 1e-3, 1e-6,
                1e-13, 1e-3, 1e-9, 1000)).getMessage().startsWith("expected a finite end time above zero, found NaN"));
        assertTrue(thrown(ErrorKey.VALUE_NOT_FINITE, () -> SolverSettings.defaults(1.0, 0.0)).getMessage()
                .contains("output interval"));
        assertTrue(thrown(ErrorKey.OUTPUT_GRID_TOO_LARGE, () -> SolverSettings.defaults(3600.0, 1e-6)).getMessage()
                .startsWith("expected "));
        thrown(ErrorKey.NO_INTEGRATION_METHOD, () -> new SolverSettings(null, 1.0, 1e-3, 1e-6, 1e-13, 1e-3, 1e-9, 1000));
    }

    @Test
    void spectralAnalysisRefusesSamplesItCannotUse() {
        thrown(ErrorKey.VALUE_NOT_FINITE, () -> new SignalSamples("p", Dimension.PRESSURE, new double[4], 0.0));
        thrown(ErrorKey.SPECTRUM_SETTINGS_INVALID, () -> WelchSpectrum.estimate(new double[100], 1e-3, 4, 1));
        double[] t = {0.0, 1e-3, 2e-3};
        assertTrue(thrown(ErrorKey.SAMPLE_COUNT_MISMATCH, () -> OscillationDetector.components(t,
                new SignalSamples("p", Dimension.PRESSURE, new double[2], 1.0), 0.0, 1.0)).getMessage()
                .equals("signal p has 2 samples but there are 3 sample times"));
        double[] uneven = new double[200];
        for (int k = 0; k < uneven.length; k++) {
            uneven[k] = k < 100 ? k * 1e-3 : 0.1 + (k - 100) * 2e-3;
        }
        thrown(ErrorKey.NON_UNIFORM_SAMPLES, () -> OscillationDetector.components(uneven,
                new SignalSamples("p", Dimension.PRESSURE, new double[200], 1.0), 0.0, 1.0));
    }

    /** Pump into a line guarded by a relief valve (one member, the poppet). */
    private static CircuitModel pumpAndRelief() {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 0.2e-3, Double.POSITIVE_INFINITY, 0.0);
        PoppetGeometry g = new PoppetGeometry(6e-3, Math.PI, 50e3, 50e5 * Math.PI * 9e-6, 0.02, 200.0, 2e-3, 0.61);
        return new CircuitBuilder("relief", TestFluids.referenceOil()).add(tank).add(line)
                .add(new Pump("pump", tank, line, 1e-7, 150.0, 1.0)).add(new ReliefValve("relief", line, tank, g)).build();
    }

    @Test
    void operatingPointsRefuseStartsThatDoNotFitTheCircuit() {
        CircuitModel c = pumpAndRelief();
        thrown(ErrorKey.START_STATE_MISMATCH, () -> OperatingPointSolver.solve(c, 0.0, new double[1], Map.of()));
        thrown(ErrorKey.UNKNOWN_MEMBER, () -> OperatingPointSolver.solve(c, 0.0, c.initialState(),
                Map.of("relief.spool", TravelLimitedMass.Mode.AT_LOWER_STOP)));
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(0.01, 1e-3));
        thrown(ErrorKey.NO_SAMPLES_IN_WINDOW, () -> OperatingPointSolver.startFrom(r, 0.5, 0.6));
    }

    @Test
    void parameterPathsAreCheckedAgainstTheScenario(@TempDir Path dir) throws IOException {
        thrown(ErrorKey.PARAMETER_PATH_MALFORMED, () -> ParameterPath.parse("elements..diameter"));
        Path file = dir.resolve("one.json");
        Files.writeString(file, """
            { "name": "one", "fluid": { "viscosity": "32 cSt", "density": "870 kg/m^3", "bulkModulus": "1.6 GPa" },
              "nodes": [ { "id": "tank", "type": "tank" }, { "id": "line", "volume": "1 L" } ],
              "elements": [ { "id": "vent", "type": "orifice", "ports": { "a": "line", "b": "tank" }, "diameter": "1 mm" } ],
              "solver": { "endTime": "0.01 s", "outputInterval": "1 ms" } }
            """);
        Scenario s = ScenarioLoader.load(file);
        String message = thrown(ErrorKey.UNDECLARED_PARAMETER_FIELD,
                () -> ParameterPath.parse("elements.vent.diametre").find(s.document())).getMessage();
        assertTrue(message.contains("found no \"diametre\"") && message.contains("diameter"), message);
        // a declared field the file leaves at its default can be set by a study, but not found
        String absent = thrown(ErrorKey.UNKNOWN_PARAMETER_PATH,
                () -> ParameterPath.parse("elements.vent.cd").find(s.document())).getMessage();
        assertTrue(absent.contains("found no \"cd\""), absent);
    }

    /** An element that pushes a flow into its node that becomes NaN, or fails inside the solver library, after 1 ms. */
    private record Faulty(Node node, boolean nan) implements Element {
        @Override
        public String id() {
            return "faulty";
        }

        @Override
        public List<Node> ports() {
            return List.of(node);
        }

        @Override
        public void bind(Binder binder) {
        }

        @Override
        public void evaluate(Evaluation e) {
            if (e.time() > 1e-3 && !nan) {
                throw new MathIllegalStateException(LocalizedCoreFormats.SIMPLE_MESSAGE, "a library failure");
            }
            e.inflow(node, e.time() > 1e-3 ? Double.NaN : 1e-5);
        }
    }

    private static CircuitModel faulty(boolean nan) {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 1e-3, Double.POSITIVE_INFINITY, 0.0);
        return new CircuitBuilder("faulty", TestFluids.referenceOil()).add(tank).add(line)
                .add(new Orifice("vent", line, tank, 1e-8, 0.61)).add(new Faulty(line, nan)).build();
    }

    @Test
    void solverFailuresNameTheTimeAndAreNotInputErrors() {
        BranchsimException nan = thrown(ErrorKey.NAN_IN_STATE,
                () -> Simulator.run(faulty(true), SolverSettings.defaults(0.01, 1e-3).withMethod(Method.EXPLICIT)));
        assertTrue(nan.getMessage().contains("line.p"), nan.getMessage());
        BranchsimException library = thrown(ErrorKey.SOLVER_FAILED,
                () -> Simulator.run(faulty(false), SolverSettings.defaults(0.01, 1e-3)));
        assertTrue(library.getMessage().contains("a library failure"), library.getMessage());
        assertFalse(nan.key().isInputError() || library.key().isInputError());
    }

    @Test
    void stepAndEvaluationLimitsStopARunWithTheirOwnKeys() {
        CircuitModel c = pumpAndRelief();
        thrown(ErrorKey.TOO_MANY_EVALUATIONS, () -> Simulator.run(c,
                new SolverSettings(Method.IMPLICIT, 0.2, 1e-3, 1e-6, 1e-13, 1e-3, 1e-9, 200)));
        thrown(ErrorKey.STEP_UNDERFLOW, () -> Simulator.run(pumpAndRelief(),
                new SolverSettings(Method.IMPLICIT, 0.2, 1e-3, 1e-9, 1e-3, 2e-3, 1e-9, 50_000_000L)));
    }

    @Test
    void modesOfANonFiniteLinearisationCannotBeComputed() {
        CircuitModel c = pumpAndRelief();
        double[] y = c.initialState();
        y[0] = Double.NaN;
        OperatingPoint nan = new OperatingPoint(0.0, y, c.states().stream().map(s -> s.name()).toList(), Map.of(), 0, 0,
                0.0, "", 0.0, true, "");
        thrown(ErrorKey.MODES_FAILED, () -> org.branchsim.core.analysis.ModeAnalysis.at(c, nan));
    }
}
