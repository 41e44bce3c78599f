package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The margin search against a closed form: a piston of mass M on the oil column of one chamber (bore 50 mm, oil
 * column 50 mm plus 20 cm^3 dead volume, beta = 1.4 GPa, no air, rigid walls), loaded so that 50 bar holds it, is
 * a mass on a hydraulic spring k = beta A^2 / V (Merritt, Hydraulic Control Systems, 1967, ch. 2) with viscous
 * friction c; its damping ratio is zeta = c / (2 sqrt(k M)) (any vibrations textbook, e.g. Thomson, Theory of
 * Vibration with Applications). So the friction that damps it to the margin is c = 2 margin sqrt(k M).
 */
class StabilitySearchTest {

    private static final double MARGIN = 0.05;
    private static final double BETA = 1.4e9;
    private static final double MASS = 200.0;
    private static final double AREA = Math.PI * 0.025 * 0.025;
    private static final double VOLUME = 20e-6 + AREA * 0.050;
    private static final double STIFFNESS = BETA * AREA * AREA / VOLUME;
    private static final double CRITICAL = 2 * Math.sqrt(STIFFNESS * MASS);

    private static String scenario(double friction) {
        return """
            { "name": "oil-spring", "fluid": { "viscosity": "32 cSt", "density": "870 kg/m^3", "bulkModulus": "1.4 GPa" },
              "nodes": [ { "id": "vent", "type": "tank" }, { "id": "cap", "volume": "20 cm^3", "pressure": "50 bar" } ],
              "elements": [ { "id": "cyl", "type": "cylinder", "ports": { "capEnd": "cap", "rodEnd": "vent" },
                "bore": "50 mm", "rod": "28 mm", "stroke": "200 mm", "mass": "200 kg", "position": "50 mm",
                "load": "%s N", "viscousFriction": "%s N*s/m" } ],
              "solver": { "endTime": "0.05 s", "outputInterval": "0.1 ms" } }
            """.formatted(ValueText.format(50e5 * AREA), ValueText.format(friction));
    }

    @Test
    void marginValueOfViscousFrictionMatchesTheClosedForm(@TempDir Path dir) throws IOException {
        double zetaNow = 0.01;
        Path file = dir.resolve("oil-spring.json");
        Files.writeString(file, scenario(zetaNow * CRITICAL));
        Scenario s = ScenarioLoader.load(file);
        SimulationResult r = Simulator.run(s.circuit(), s.solver());
        OperatingPoint op = OperatingPointSolver.solve(s.circuit(), 0.05, OperatingPointSolver.startFrom(r, 0.0, 0.05));
        List<RemedyKnob> knobs = RemedyCatalogue.knobs(s.document(), s.circuit(), List.of("cyl.piston"));
        assertEquals(1, knobs.size(), knobs.toString());
        RemedyKnob friction = knobs.get(0);
        assertEquals("elements.cyl.viscousFriction", friction.path());
        List<StabilitySearch.Outcome> out = new StabilitySearch(s, op, List.of("cyl.piston", "cap"), MARGIN)
                .search(friction);
        StabilitySearch.Outcome raise = out.stream().filter(o -> o.direction() == StabilitySearch.Direction.RAISE)
                .findFirst().orElseThrow();
        assertEquals(zetaNow, raise.zetaNow(), 1e-3 * zetaNow * 10);
        assertEquals(MARGIN * CRITICAL, raise.marginValue(), 0.01 * MARGIN * CRITICAL);
        assertTrue(raise.recommended() > raise.marginValue(), "the recommendation goes past the margin value");
        assertTrue(raise.zetaRecommended() >= MARGIN);
        assertEquals(raise.recommended() / CRITICAL, raise.zetaRecommended(), 0.01 * raise.zetaRecommended());
        assertTrue(Double.isNaN(raise.threshold()), "a damped mode has no stability threshold to cross");
        StabilitySearch.Outcome lower = out.stream().filter(o -> o.direction() == StabilitySearch.Direction.LOWER)
                .findFirst().orElseThrow();
        assertFalse(lower.reachesMargin(), "less friction never damps it more");
    }
}
