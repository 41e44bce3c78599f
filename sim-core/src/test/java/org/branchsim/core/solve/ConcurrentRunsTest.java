package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * One circuit model, many runs: a run keeps its member modes, impulse ledger and work buffers in its own engine,
 * so the model may be run again and on several threads at once. The property checked is the project's
 * determinism requirement (DESIGN.md section 4: the same scenario gives byte-identical traces), here for runs
 * sharing one model; the reference is a run of the same model alone on one thread.
 */
class ConcurrentRunsTest {

    /** Runs at once on one model. */
    private static final int THREADS = 4;
    /** End time, s: the gripper's pilot poppet has chattered on its seat by then. */
    private static final double END = 0.6;

    @Test
    void oneModelRunOnFourThreadsGivesIdenticalTraces() throws Exception {
        // Given the gripper demo, whose pilot poppet strikes its seat again and again (modes change at events)
        Scenario s = ScenarioLoader.load(Path.of("..", "scenarios", "gripper-chatter.json"));
        CircuitModel model = s.circuit();
        SolverSettings settings = s.solver().withEndTime(END);
        SimulationResult alone = Simulator.run(model, settings);
        assertTrue(alone.statistics().events().getOrDefault("seat", 0) > 10,
                "the reference run must exercise the stop events: " + alone.statistics().events());

        // When the same model runs on four threads at once
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        List<SimulationResult> results = new ArrayList<>();
        try {
            List<Future<SimulationResult>> runs = new ArrayList<>();
            for (int i = 0; i < THREADS; i++) {
                runs.add(pool.submit(() -> Simulator.run(model, settings)));
            }
            for (Future<SimulationResult> f : runs) {
                results.add(f.get());
            }
        } finally {
            pool.shutdownNow();
        }
        // and once more alone afterwards
        results.add(Simulator.run(model, settings));

        // Then every run gives the reference's trace, events, final state, final modes and energy, bit for bit
        for (SimulationResult r : results) {
            assertSameTrace(alone.trace(), r.trace());
            assertEquals(alone.events(), r.events());
            assertArrayEquals(alone.finalState(), r.finalState());
            assertEquals(alone.description().finalModes(), r.description().finalModes());
            assertEquals(alone.energy(), r.energy());
            assertTrue(r.model() == model, "the result describes the model that was run");
        }
    }

    @Test
    void aBuiltModelsScheduleCannotChange() {
        // Given a loaded scenario, its model built
        Scenario s = ScenarioLoader.load(Path.of("..", "scenarios", "fixture-clamp.json"));
        ScheduledInput first = s.circuit().inputs().get(0);
        int ramps = first.ramps().size();

        // When a ramp is added afterwards, it is refused and the schedule stays as built
        assertThrows(IllegalStateException.class, () -> first.addRamp(new ScheduledInput.Ramp(1.0, 0.0, 0.0)));
        assertEquals(ramps, first.ramps().size());
    }

    private static void assertSameTrace(Trace expected, Trace actual) {
        assertEquals(expected.columns(), actual.columns());
        assertEquals(expected.size(), actual.size());
        for (int k = 0; k < expected.size(); k++) {
            assertEquals(Double.doubleToRawLongBits(expected.time(k)), Double.doubleToRawLongBits(actual.time(k)));
            for (int i = 0; i < expected.columns().size(); i++) {
                assertEquals(Double.doubleToRawLongBits(expected.value(k, i)),
                        Double.doubleToRawLongBits(actual.value(k, i)), "sample " + k + ", " + expected.columns().get(i));
            }
        }
    }
}
