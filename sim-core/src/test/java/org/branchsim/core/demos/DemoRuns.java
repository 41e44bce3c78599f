package org.branchsim.core.demos;

import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.Method;
import org.branchsim.core.solve.Simulator;

/** Runs each demo scenario once per test JVM and shares the result between test classes. */
final class DemoRuns {

    /** A loaded scenario and its run. */
    record Run(Scenario scenario, SimulationResult result) {
    }

    private static final Map<String, Run> RUNS = new ConcurrentHashMap<>();

    private DemoRuns() {
    }

    static Path scenario(String name) {
        return Path.of("..", "scenarios", name + ".json");
    }

    /**
     * @return a fresh run of a demo, shortened to {@code end} s, with the given method and relative tolerance (not
     *         shared: for comparing methods)
     */
    static SimulationResult run(String demo, double end, Method method, double rtol) {
        Scenario s = ScenarioLoader.load(scenario(demo));
        return Simulator.run(s.circuit(), s.solver().withEndTime(end).withMethod(method).withRelativeTolerance(rtol));
    }

    static Run of(String name) {
        return RUNS.computeIfAbsent(name, n -> {
            Scenario s = ScenarioLoader.load(scenario(n));
            return new Run(s, Simulator.run(s.circuit(), s.solver()));
        });
    }
}
