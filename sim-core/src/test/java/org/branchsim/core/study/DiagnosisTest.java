package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The chattering demo is flagged, the remedy the diagnosis recommends removes the oscillation when applied
 * and run in the time domain, and the stable clamp demo is not flagged.
 */
class DiagnosisTest {

    private static Scenario load(String name) {
        return ScenarioLoader.load(Path.of("..", "scenarios", name + ".json"));
    }

    @Test
    void chatterDemoIsFlaggedAndTheRecommendedRemedyCuresIt() {
        Scenario s = load("gripper-chatter");
        Diagnosis.Report r = Diagnosis.run(s, 2, d -> { });
        assertFalse(r.findings().isEmpty(), "the demo oscillates");
        OscillationFinding main = r.findings().get(0);
        assertTrue(main.elements().contains("prv"), main.elements().toString());
        assertNotNull(r.mode(), "linked to a mode");
        assertTrue(r.mode().elements().get(0).name().equals("prv"), "the mode lives in the reducing valve");
        assertNotNull(r.recommended(), "a remedy is recommended");
        assertTrue(r.trials().stream().anyMatch(t -> !t.cures()), "not every change cures it");

        // apply the recommended change by hand and run it in the time domain
        Located doc = s.document().copy();
        ParameterPath.parse(r.recommended().remedy().path()).setOrAdd(doc, r.recommended().remedy().to());
        Scenario fixed = ScenarioLoader.build(s.file(), doc);
        SimulationResult run = Simulator.run(fixed.circuit(), fixed.solver());
        assertEquals(List.of(), OscillationScan.scan(run), "no oscillation after the remedy");
    }

    @Test
    void stableClampDemoIsNotFlagged() {
        Scenario s = load("fixture-clamp");
        SimulationResult run = Simulator.run(s.circuit(), s.solver());
        assertEquals(List.of(), OscillationScan.scan(run));
    }
}
