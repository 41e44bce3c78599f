package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.error.Problem;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Member;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The scenario fields of this round: restitution per member, a cylinder's load table against position, the
 * work-piece's damping fade, and the fluid's air-release pressure and releasable air; read, run, and refused with
 * located problems.
 */
class ContactScenarioTest {

    /** A cylinder pushed by a 5 bar supply against a load that grows with position like a spring of 10 kN/m. */
    private static final String SPRING_TABLE = """
            {
              "formatVersion": 1,
              "name": "table",
              "fluid": { "grade": "VG46", "airReleasePressure": "-0.5 bar", "releasableAir": "2 %" },
              "nodes": [
                { "id": "supply", "type": "tank", "pressure": "5 bar" },
                { "id": "tank", "type": "tank" },
                { "id": "cap", "volume": "0.05 L" }
              ],
              "elements": [
                { "id": "feed", "type": "orifice", "ports": { "a": "supply", "b": "cap" }, "diameter": "10 mm" },
                { "id": "cyl", "type": "cylinder", "ports": { "capEnd": "cap", "rodEnd": "tank" },
                  "bore": "50 mm", "rod": "28 mm", "stroke": "200 mm", "mass": "5 kg", "viscousFriction": "1000 N*s/m",
                  "restitution": 0.4,
                  "loadTable": [ { "position": "0 mm", "force": "0 N" }, { "position": "200 mm", "force": "2 kN" } ],
                  "workpiece": { "position": "190 mm", "stiffness": "100 kN/mm", "damping": "1 kN*s/m",
                                 "dampingFade": "0.05 mm" } }
              ],
              "solver": { "endTime": "2 s", "outputInterval": "1 ms" }
            }
            """;

    private static Scenario load(String text) {
        return ScenarioLoader.build("bad.json", DocumentParser.parse("bad.json", text, false));
    }

    @Test
    void aLoadTableAgainstPositionSetsTheStaticBalance() {
        Scenario s = load(SPRING_TABLE);
        SimulationResult r = Simulator.run(s.circuit(), s.solver());
        Trace t = r.trace();
        // statics: p A1 = F_table(x) = k x with k = 2 kN / 0.2 m, so x = p A1 / k (linear interpolation of the table)
        double area = 0.25 * Math.PI * 0.05 * 0.05;
        double expected = 5e5 * area / 1e4;
        assertEquals(0.09817, expected, 1e-5);
        assertEquals(expected, t.value(t.size() - 1, t.indexOf("cyl.piston.x")), 1e-3 * expected);
    }

    @Test
    void theNewFieldsReachTheModel() {
        Scenario s = load(SPRING_TABLE);
        Fluid f = s.circuit().fluid();
        assertEquals(-0.5e5, f.releasePressure(), 1e-6);
        assertEquals(0.02, f.releasableAir(), 1e-12);
        Member piston = s.circuit().members().stream().filter(m -> m.id().equals("cyl.piston")).findFirst()
                .orElseThrow();
        assertEquals(0.4, ((TravelLimitedMass) piston).restitution(), 0.0);
    }

    @Test
    void aTableThatDoesNotRiseAndAReleaseBelowVacuumAreRefusedWhereTheyAre() {
        String text = SPRING_TABLE.replace("\"position\": \"200 mm\", \"force\"", "\"position\": \"0 mm\", \"force\"");
        Problem p = ScenarioProblemsTest.onlyProblem(text);
        assertTrue(p.path().contains("loadTable[1]") && p.path().endsWith("position"), p.describe());
        assertTrue(p.expected().contains("above the previous row"), p.describe());
        List<Problem> problems = ScenarioProblemsTest.problems(
                SPRING_TABLE.replace("\"-0.5 bar\"", "\"-2 bar\""), false);
        assertTrue(problems.stream().anyMatch(q -> q.path().endsWith("airReleasePressure")
                && q.expected().contains("-1.01325 bar")), problems.toString());
        // and one above atmospheric: air does not come out of solution above the pressure it was dissolved at
        Problem above = ScenarioProblemsTest.onlyProblem(SPRING_TABLE.replace("\"-0.5 bar\"", "\"0.5 bar\""));
        assertTrue(above.path().endsWith("airReleasePressure") && above.expected().contains("absolute vacuum"),
                above.describe());
    }
}
