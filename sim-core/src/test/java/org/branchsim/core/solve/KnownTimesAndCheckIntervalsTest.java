package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.TreeSet;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.Method;
import org.junit.jupiter.api.Test;

/**
 * On the fixture-clamp demo: the implicit method lands on every schedule corner exactly and logs it as the
 * event search did; with the explicit methods a member's stop events are checked every fifth of its natural
 * period (the implicit methods check at extrema along the step: {@link StepCheckTimesTest}).
 */
class KnownTimesAndCheckIntervalsTest {

    private static final double END_TIME = 0.5;

    private static Scenario clamp() {
        return ScenarioLoader.load(Path.of("..", "scenarios", "fixture-clamp.json"));
    }

    @Test
    void scheduleCornersAreLandedOnExactlyAndLoggedAsBefore() {
        // Given the clamp valves' schedules: ramps at 0.3 s over 40 ms (two inputs), so corners at 0.3 and 0.34 s
        Scenario s = clamp();
        CircuitModel model = s.circuit();
        TreeSet<Double> corners = new TreeSet<>();
        int expected = 0;
        for (ScheduledInput in : model.inputs()) {
            for (double c : in.corners()) {
                if (c > 0.0 && c < END_TIME) {
                    corners.add(c);
                    expected++;
                }
            }
        }
        // When the implicit method and the reference (which still searches for g = t - t_corner) run
        SimulationResult implicit = Simulator.run(model, s.solver().withEndTime(END_TIME).withMethod(Method.IMPLICIT));
        SimulationResult reference = Simulator.run(model, s.solver().withEndTime(END_TIME).withMethod(Method.EXPLICIT));
        List<EventRecord> landed = implicit.events().stream().filter(e -> e.kind().equals("schedule")).toList();
        List<EventRecord> searched = reference.events().stream().filter(e -> e.kind().equals("schedule")).toList();

        // Then every corner is logged once per input at exactly its time, with the same owner and description
        assertEquals(expected, landed.size());
        assertEquals(searched.size(), landed.size());
        for (int k = 0; k < landed.size(); k++) {
            assertTrue(corners.contains(landed.get(k).time()), "exact corner time " + landed.get(k).time());
            assertEquals(searched.get(k).owner(), landed.get(k).owner());
            assertEquals(searched.get(k).description(), landed.get(k).description());
            // the search locates g = t - t_corner to the event tolerance (1e-9 s by default)
            assertEquals(searched.get(k).time(), landed.get(k).time(), 1e-8);
        }
    }

    /**
     * The relief poppet of the demo: m = 25 g on a 60 N/mm spring, nothing else position-dependent at the start
     * (no pressure, so no flow force): natural period 2 pi sqrt(m/k) = 4.056 ms (simple harmonic motion, e.g.
     * Timoshenko, Vibration Problems in Engineering, 1955, ch. 1), checked every fifth of it.
     */
    @Test
    void stopEventsOfAMemberAreCheckedEveryFifthOfItsNaturalPeriod() {
        CircuitModel model = clamp().circuit();
        RunEngine engine = new RunEngine(model);
        double[] y0 = model.initialState();
        engine.initialiseModes(0.0, y0);
        CheckIntervals intervals = new CheckIntervals(engine, 1.0, y0);
        double period = 2 * Math.PI * Math.sqrt(0.025 / 60e3);
        assertEquals(period / 5, intervals.ofMember("relief.poppet"), 1e-3 * period / 5);
        // the pilot poppet: 3 g on 15 N/mm (2.81 ms)
        double pilot = 2 * Math.PI * Math.sqrt(0.003 / 15e3);
        assertEquals(pilot / 5, intervals.ofMember("reducer.pilot"), 1e-2 * pilot / 5);
        // a member with no restoring stiffness (the clamp piston: a mass on oil) is checked at the longest step
        assertEquals(1.0, intervals.ofMember("clamp.piston"), 0.0);
    }
}
