package org.branchsim.core.scenario;

import static org.branchsim.core.scenario.ScenarioProblemsTest.assertProblem;
import static org.branchsim.core.scenario.ScenarioProblemsTest.lineOf;
import static org.branchsim.core.scenario.ScenarioProblemsTest.minimal;
import static org.branchsim.core.scenario.ScenarioProblemsTest.onlyProblem;
import static org.branchsim.core.scenario.ScenarioProblemsTest.problems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import java.util.stream.Collectors;
import org.branchsim.core.error.Problem;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * Values that cannot describe a circuit are refused at check, located, with the bounds and the value found.
 * The bounds themselves are design limits stated in docs/scenario-format.md (common practice, no source);
 * what these tests check is that the stated limits are the ones applied.
 */
class ScenarioBoundsTest {

    private static Problem problemOf(String text, String path) {
        List<Problem> list = problems(text, false);
        return list.stream().filter(p -> p.path().equals(path)).findFirst()
                .orElseThrow(() -> new AssertionError(list.stream().map(Problem::describe).collect(Collectors.joining("\n"))));
    }

    @Test
    void numbersBeyondTheLargestDoubleAreRefused() throws IOException {
        // the largest finite IEEE 754 binary64 value is about 1.797e308 (IEEE 754-2008, table 3.5)
        String end = minimal().replace("\"endTime\": \"0.2 s\"", "\"endTime\": \"1e999 s\"");
        assertProblem(onlyProblem(end), "solver.endTime", lineOf(end, "1e999 s"), "a finite number", "\"1e999 s\"");
        String relief = minimal().replace("\"80 bar\"", "\"1e400 bar\"");
        assertProblem(onlyProblem(relief), "elements[1].setting", lineOf(relief, "1e400 bar"), "a finite number", "1e400 bar");
        String pump = minimal().replace("\"4 cm^3/rev\"", "\"1e999 cm^3/rev\"");
        assertProblem(onlyProblem(pump), "elements[0].displacement", lineOf(pump, "1e999"), "a finite number", "1e999");
        String number = minimal().replace("\"speed\": \"1500 rpm\"", "\"speed\": \"1500 rpm\", \"volumetricEfficiency\": 1e999");
        assertProblem(onlyProblem(number), "elements[0].volumetricEfficiency", lineOf(number, "1e999"), "a finite number", "");
    }

    @Test
    void aValueThatOverflowsInSiUnitsIsRefused() throws IOException {
        // 1e308 bar = 1e313 Pa (bar = 1e5 Pa exactly, NIST SP 811 (2008) B.8) is beyond the largest double
        String text = minimal().replace("\"80 bar\"", "\"1e308 bar\"");
        assertProblem(onlyProblem(text), "elements[1].setting", lineOf(text, "1e308 bar"), "stays finite in SI", "1e308 bar");
    }

    @Test
    void volumesDiametersAndTimesHaveStatedBounds() throws IOException {
        String volume = minimal().replace("\"volume\": \"0.2 L\"", "\"volume\": \"100 m^3\"");
        assertProblem(onlyProblem(volume), "nodes[1].volume", lineOf(volume, "100 m^3"),
                "a volume from 1e-12 m^3 to 10 m^3", "\"100 m^3\"");
        String tiny = minimal().replace("\"volume\": \"0.2 L\"", "\"volume\": \"1e-15 m^3\"");
        assertProblem(onlyProblem(tiny), "nodes[1].volume", lineOf(tiny, "1e-15"), "from 1e-12 m^3 to 10 m^3", "1e-15");
        String bore = minimal().replace("\"bore\": \"40 mm\"", "\"bore\": \"3 m\"");
        assertProblem(problemOf(bore, "elements[4].bore"), "elements[4].bore", lineOf(bore, "\"3 m\""),
                "a length from 1 um to 2 m", "\"3 m\"");
        String end = minimal().replace("\"endTime\": \"0.2 s\"", "\"endTime\": \"1e6 s\"");
        assertProblem(problemOf(end, "solver.endTime"), "solver.endTime", lineOf(end, "1e6 s"), "a time from 1 us to 24 h", "1e6 s");
        String dt = minimal().replace("\"outputInterval\": \"1 ms\"", "\"outputInterval\": \"1e-300 s\"");
        assertProblem(onlyProblem(dt), "solver.outputInterval", lineOf(dt, "1e-300 s"), "a time from 0.1 us to 24 h", "1e-300 s");
        String hot = minimal().replace("\"40 degC\"", "\"200 degC\"");
        assertProblem(onlyProblem(hot), "fluid.temperature", lineOf(hot, "200 degC"), "from -40 degC to 150 degC", "200 degC");
        String absoluteZero = minimal().replace("\"40 degC\"", "\"0 K\"");
        assertProblem(onlyProblem(absoluteZero), "fluid.temperature", lineOf(absoluteZero, "0 K"), "from -40 degC", "0 K");
    }

    @Test
    void zeroIsStillAllowedWhereTheFieldAllowsIt() throws IOException {
        String text = minimal().replace("\"stroke\": \"100 mm\"", "\"stroke\": \"100 mm\", \"deadVolumeCap\": \"0 L\"");
        ScenarioLoader.build("ok.json", DocumentParser.parse("ok.json", text, false));
    }

    @Test
    void aToleranceBandMustStayWithinTheBounds() throws IOException {
        String text = minimal().replace("\"bore\": \"40 mm\"", "\"bore\": \"40 mm ± 50 mm\"");
        assertProblem(problemOf(text, "elements[4].bore"), "elements[4].bore", lineOf(text, "± 50 mm"),
                "greater than zero over the whole tolerance band", "40 mm");
    }

    @Test
    void anOutputGridBeyondTheLimitIsRefusedWithAFix() throws IOException {
        Scenario ok = ScenarioLoader.build("minimal.json", DocumentParser.parse("minimal.json", minimal(), false));
        int signals = ok.circuit().signals().size();
        // the rule as stated in docs/scenario-format.md: at most 1e6 samples and 2e7 values per run
        long most = Math.min(SolverSettings.MAX_OUTPUT_SAMPLES, SolverSettings.MAX_OUTPUT_VALUES / (signals + 1));
        String over = minimal().replace("\"endTime\": \"0.2 s\"", "\"endTime\": \"" + (most + 5) + " ms\"");
        Problem p = onlyProblem(over);
        assertProblem(p, "solver.outputInterval", lineOf(over, "\"outputInterval\""), "coarsen outputInterval", "samples");
        assertTrue(p.expected().contains("shorten endTime"), p.describe());
        String under = minimal().replace("\"endTime\": \"0.2 s\"", "\"endTime\": \"" + (most - 5) + " ms\"");
        ScenarioLoader.build("under.json", DocumentParser.parse("under.json", under, false));
    }

    @Test
    void hugeIntegerLiteralsAreReadAsNumbers() throws IOException {
        String text = minimal().replace("\"speed\": \"1500 rpm\"", "\"speed\": \"1500 rpm\", \"volumetricEfficiency\": 100000000000000000000000");
        assertProblem(onlyProblem(text), "elements[0].volumetricEfficiency", lineOf(text, "1000000000000"),
                "a number from 0.01 to 1", "");
    }

    @Test
    void aPlotGroupNamesEachSignalOnce() throws IOException {
        String text = minimal().replace("\"outputInterval\": \"1 ms\" }",
                "\"outputInterval\": \"1 ms\" },\n  \"outputs\": { \"plots\": [ { \"title\": \"Supply\",\n"
                        + "    \"signals\": [\"supply.p\", \"capSide.p\",\n \"supply.p\"] } ] }");
        assertProblem(onlyProblem(text), "outputs.plots[0].signals[2]", lineOf(text, " \"supply.p\"] }"),
                "each signal once in a plot group", "\"supply.p\" again");
    }

    @Test
    void aBadSeatDiameterGivesOneProblemOnly() throws IOException {
        String text = minimal().replace("\"seatDiameter\": \"8 mm\"", "\"seatDiameter\": \"8 bar\"");
        List<Problem> list = problems(text, false);
        assertEquals(1, list.size(), list.stream().map(Problem::describe).collect(Collectors.joining("\n")));
        assertProblem(list.get(0), "elements[1].seatDiameter", lineOf(text, "8 bar"), "length unit", "\"8 bar\"");
    }
}
