package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The diagnosis on the demos: one finding per physical oscillation at its fundamental, named by its mode's parts;
 * a hunting main stage flagged as hunting with the main stage named; the stable valve of a two-valve circuit left
 * alone; and every recommended change, applied by hand and run from t = 0, leaves no oscillation in any window
 * and every mode at the operating point damped at least as well as the margin.
 */
class DiagnosisTest {

    private static final double MARGIN = 0.05;
    private static final Map<String, Diagnosis.Report> REPORTS = new ConcurrentHashMap<>();

    private static Scenario load(String name) {
        return ScenarioLoader.load(Path.of("..", "scenarios", name + ".json"));
    }

    private static Diagnosis.Report diagnose(String name) {
        return REPORTS.computeIfAbsent(name, n -> Diagnosis.run(load(n), new Diagnosis.Options(MARGIN, null, false, 2),
                d -> { }));
    }

    /**
     * Applies the recommended change of a finding by hand, runs the scenario from t = 0 and checks (1) no
     * oscillation in any scan window and (2) every mode at the operating point at the end of the finding's window
     * damped at least as well as the margin. The operating point and modes are computed afresh here, from the run
     * with the change, not taken from the diagnosis.
     */
    private static void assertCuresWithMargin(String name, Diagnosis.FindingDiagnosis d) {
        Diagnosis.Trial best = d.recommended();
        assertNotNull(best, "a change is recommended for " + d.finding().name());
        Scenario fixed = StudyRunner.build(load(name).file(), load(name).document(),
                Map.of(best.linear().knob().path(), best.value()));
        SimulationResult run = Simulator.run(fixed.circuit(), fixed.solver());
        assertEquals(List.of(), OscillationScan.scan(run).stream().map(OscillationFinding::name).toList(),
                "no oscillation in any window after " + best.value());
        double t = d.finding().window().to();
        Scenario again = StudyRunner.build(fixed.file(), fixed.document(), Map.of());
        SimulationResult toT = Simulator.run(again.circuit(), again.solver().withEndTime(t));
        OperatingPoint op = OperatingPointSolver.solve(again.circuit(), t,
                OperatingPointSolver.startFrom(toT, d.finding().window().from(), t));
        for (Mode m : ModeAnalysis.at(again.circuit(), op)) {
            assertTrue(m.dampingRatio() >= MARGIN, m.name() + " has damping ratio " + m.dampingRatio());
        }
    }

    /**
     * One pilot poppet chattering is one finding, at its fundamental: the period of the chatter is the time between
     * successive seat impacts (events located by the solver, independent of the spectral estimate), so their
     * median interval times the fundamental is one per impact per cycle (definition of a period).
     */
    @Test
    void chatteringPilotIsOneFindingAtItsFundamental() {
        Diagnosis.Report r = diagnose("gripper-chatter");
        assertEquals(1, r.findings().size(), r.findings().stream().map(OscillationFinding::name).toList().toString());
        OscillationFinding f = r.findings().get(0);
        assertEquals(OscillationFinding.Kind.CHATTER, f.kind());
        assertEquals("reducer.pilot", f.impactingMember());
        List<Double> impacts = new ArrayList<>();
        for (EventRecord e : r.baseline().events()) {
            if (e.owner().equals("reducer.pilot") && e.kind().equals("seat") && !e.description().endsWith("(leaves)")
                    && f.window().contains(e.time())) {
                impacts.add(e.time());
            }
        }
        List<Double> gaps = new ArrayList<>();
        for (int i = 1; i < impacts.size(); i++) {
            gaps.add(impacts.get(i) - impacts.get(i - 1));
        }
        gaps.sort(Double::compare);
        double median = gaps.get(gaps.size() / 2);
        double perCycle = f.impactsPerCycle().get("reducer.pilot");
        assertEquals(1.0, median * f.frequency() * Math.round(perCycle), 0.03,
                "median impact interval " + median + " s at " + f.frequency() + " Hz");
        // its mode at the operating point is the pilot poppet's, and it is unstable there
        assertNotNull(f.mode());
        assertEquals("reducer.pilot", f.mode().mode().parts().get(0).name());
        assertEquals(Mode.Verdict.UNSTABLE, f.mode().mode().verdict(MARGIN));
        assertTrue(f.parts().contains("reducer.pilot"), f.parts().toString());
    }

    @Test
    void chatterCureHasMarginAndConfirmsInTheTimeDomain() {
        Diagnosis.Report r = diagnose("gripper-chatter");
        Diagnosis.FindingDiagnosis d = r.diagnosed().get(0);
        assertTrue(d.trials().stream().allMatch(t -> t.linear().zetaRecommended() >= MARGIN));
        StabilitySearch.Outcome o = d.recommended().linear();
        assertTrue(Double.isFinite(o.threshold()), "an unstable mode has a threshold");
        assertTrue(o.direction() == StabilitySearch.Direction.RAISE
                ? o.threshold() < o.marginValue() && o.marginValue() <= o.recommended()
                : o.threshold() > o.marginValue() && o.marginValue() >= o.recommended(), o.toString());
        assertCuresWithMargin("gripper-chatter", d);
    }

    /** A main stage hunting without impacts is hunting, named by the main spool and its spring chamber. */
    @Test
    void huntingMainStageIsNamedAndCured() {
        Diagnosis.Report r = diagnose("pilot-supply-hunting");
        assertEquals(1, r.findings().size(), r.findings().stream().map(OscillationFinding::name).toList().toString());
        OscillationFinding f = r.findings().get(0);
        assertEquals(OscillationFinding.Kind.HUNTING, f.kind());
        assertNull(f.impactingMember());
        assertNotNull(f.mode());
        assertEquals("pilotReducer.spool", f.mode().mode().parts().get(0).name());
        assertTrue(f.parts().containsAll(List.of("pilotReducer.spool", "pilotReducer.chamber")), f.parts().toString());
        assertEquals(Mode.Verdict.UNSTABLE, f.mode().mode().verdict(MARGIN));
        ReducingValveMetrics m = r.baselineMetrics().get(0);
        assertFalse(m.settled(), "a hunting valve is never reported as settled");
        assertTrue(m.oscillating());
        assertCuresWithMargin("pilot-supply-hunting", r.diagnosed().get(0));
    }

    /** With two reducing valves, only the one that hunts is named; the stable one settles and is left alone. */
    @Test
    void stableValveOfTwoIsNotNamed() {
        Diagnosis.Report r = diagnose("press-two-branches");
        assertFalse(r.findings().isEmpty());
        for (OscillationFinding f : r.findings()) {
            assertFalse(f.involves("clampReducer"), f.name());
            assertFalse(f.parts().stream().anyMatch(p -> p.startsWith("clampLine") || p.startsWith("clamp.")), f.name());
            assertTrue(f.involves("pilotReducer"), f.name());
        }
        ReducingValveMetrics clamp = r.baselineMetrics().stream().filter(v -> v.id().equals("clampReducer"))
                .findFirst().orElseThrow();
        assertTrue(clamp.settled() && !clamp.oscillating(), clamp.toString());
        Diagnosis.FindingDiagnosis d = r.diagnosed().get(0);
        assertTrue(d.linear().stream().allMatch(o -> o.knob().part().startsWith("pilotReducer")
                || o.knob().part().equals("pilotLine")), "only the hunting valve's parameters are tried");
    }

    @Test
    void stableClampDemoIsNotFlagged() {
        Scenario s = load("fixture-clamp");
        SimulationResult run = Simulator.run(s.circuit(), s.solver());
        assertEquals(List.of(), OscillationScan.scan(run));
    }
}
