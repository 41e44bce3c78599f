package org.branchsim.core.scenario;

import static org.branchsim.core.scenario.ScenarioProblemsTest.assertProblem;
import static org.branchsim.core.scenario.ScenarioProblemsTest.lineOf;
import static org.branchsim.core.scenario.ScenarioProblemsTest.onlyProblem;
import static org.branchsim.core.scenario.ScenarioProblemsTest.resource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.Method;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The accumulator, line and pilot-operated relief valve types read from a scenario and run with the implicit
 * method; schedules as tables (linear interpolation) and S-curves (cubic smoothstep), and bad tables refused with
 * located problems.
 */
class NewPartsScenarioTest {

    private static final double RPM = 2 * Math.PI / 60;

    private static Scenario load(String text) {
        return ScenarioLoader.build("new-parts.json", DocumentParser.parse("new-parts.json", text, false));
    }

    private static ScheduledInput input(Scenario s, String name) {
        return s.circuit().inputs().stream().filter(i -> i.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void theNewTypesRunWithTheImplicitMethod() throws IOException {
        Scenario s = load(resource("new-parts.json"));
        assertEquals(Method.IMPLICIT, s.solver().method());
        SimulationResult r = Simulator.run(s.circuit(), s.solver());
        double[] p = r.trace().series("supply.p");
        // the run reaches its end, the accumulator charges above its 50 bar precharge and the relief valve holds
        // the supply near its 100 bar setting (within 5 %: a pilot-operated valve's small override, common
        // practice, no source)
        assertEquals(0.5, r.trace().time(r.trace().size() - 1), 1e-9);
        assertTrue(p[p.length - 1] > 50e5 && p[p.length - 1] < 105e5, "supply " + p[p.length - 1] / 1e5 + " bar");
        assertNotNull(r.trace().series("hose.q.b"));
        assertTrue(r.trace().series("acc.fluid.volume")[p.length - 1] > 0, "the accumulator took fluid");
    }

    @Test
    void aTableIsInterpolatedLinearlyAndARampMayBeAnSCurve() throws IOException {
        Scenario s = load(resource("new-parts.json"));
        ScheduledInput speed = input(s, "pump.speed");
        // linear interpolation between the rows (0.1 s, 1500 rpm) and (0.3 s, 1500 rpm), (0.3 s, 1500) and
        // (0.4 s, 1000): v = v0 + (v1 - v0) (t - t0) / (t1 - t0)
        assertEquals(750 * RPM, speed.valueAt(0.05), 1e-9);
        assertEquals(1500 * RPM, speed.valueAt(0.2), 1e-9);
        assertEquals(1250 * RPM, speed.valueAt(0.35), 1e-9);
        assertEquals(1000 * RPM, speed.valueAt(0.45), 1e-9);
        // the cubic smoothstep 3f^2 - 2f^3 (cubic Hermite with zero end slopes; Ebert et al., Texturing and
        // Modeling, 1994, from memory) is at 5/32 of the change at a quarter of the ramp, at half at mid-ramp
        ScheduledInput opening = input(s, "user.opening");
        assertEquals(0.2 * 5.0 / 32.0, opening.valueAt(0.225), 1e-12);
        assertEquals(0.1, opening.valueAt(0.25), 1e-12);
        assertEquals(0.2, opening.valueAt(0.35), 1e-12);
    }

    @Test
    void aTableWhoseTimeGoesBackIsRefusedWhereItGoesBack() throws IOException {
        String text = resource("new-parts.json").replace("{ \"t\": \"0.4 s\"", "{ \"t\": \"0.25 s\"");
        assertProblem(onlyProblem(text), "schedule[0].table[3].t", lineOf(text, "\"0.25 s\""),
                "at or after the previous row's (0.3 s)", "0.25 s");
    }

    @Test
    void aTableValueWithoutItsUnitIsRefused() throws IOException {
        String text = resource("new-parts.json").replace("\"value\": \"1500 rpm\" },", "\"value\": \"1500\" },");
        assertProblem(onlyProblem(text), "schedule[0].table[1].value", lineOf(text, "\"1500\""), "", "1500");
        String noTimeUnit = resource("new-parts.json").replace("\"t\": \"0.1 s\"", "\"t\": \"0.1\"");
        assertProblem(onlyProblem(noTimeUnit), "schedule[0].table[1].t", lineOf(noTimeUnit, "\"0.1\""), "", "0.1");
    }

    @Test
    void aChangeIsEitherARampOrATable() throws IOException {
        String text = resource("new-parts.json").replace("{ \"set\": \"pump.speed\", \"table\"",
                "{ \"set\": \"pump.speed\", \"to\": \"100 rpm\", \"table\"");
        assertProblem(onlyProblem(text), "schedule[0].to", lineOf(text, "\"100 rpm\""), "or a \"table\"", "both");
    }

    @Test
    void aLineNeedsAWholeNumberOfSegments() throws IOException {
        String text = resource("new-parts.json").replace("\"segments\": 6", "\"segments\": 6.5");
        assertProblem(onlyProblem(text), "elements[3].segments", lineOf(text, "6.5"), "whole number", "6.5");
    }

    @Test
    void anAccumulatorCannotHoldMoreFluidThanItsGas() throws IOException {
        String text = resource("new-parts.json").replace("\"inletDiameter\": \"6 mm\"",
                "\"inletDiameter\": \"6 mm\", \"capacity\": \"0.6 L\"");
        assertProblem(onlyProblem(text), "elements[2].capacity", lineOf(text, "\"0.6 L\""), "below the gas volume",
                "0.6 L");
    }
}
