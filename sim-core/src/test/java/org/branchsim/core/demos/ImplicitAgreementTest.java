package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.TraceComparison;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.Method;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The implicit method's trace agrees with Hipparchus's Dormand-Prince 8(5,3) run at rtol 1e-10 (a
 * general-purpose reference integrator): the largest error of every pressure, relative to that signal's
 * range, stays below 10 times the requested tolerance, and the same events happen in the same order at the
 * same times. Runs are shortened to keep the suite fast; {@code branchsim timing} reports full lengths.
 */
class ImplicitAgreementTest {

    private static final double RTOL = 1e-6;
    private static final double REFERENCE_RTOL = 1e-10;
    private static final double ERROR_FACTOR = 10.0;
    /**
     * Event times are located to 1e-9 s on each method's own trajectory; the two trajectories differ by about
     * the tolerance, so a crossing at a small slope (a member leaving its seat at balance) moves by more.
     */
    private static final double EVENT_TIME_TOLERANCE = 1e-6;


    @ParameterizedTest
    @CsvSource({"feed-stall, 0.6", "fixture-clamp, 0.5", "regulation-characteristic, 1.5"})
    void implicitMatchesHighOrderReference(String demo, double end) {
        SimulationResult implicit = DemoRuns.run(demo, end, Method.IMPLICIT, RTOL);
        SimulationResult reference = DemoRuns.run(demo, end, Method.REFERENCE, REFERENCE_RTOL);
        assertEquals(reference.trace().size(), implicit.trace().size());
        double error = TraceComparison.maxErrorOverRange(implicit.trace(), reference.trace(), Dimension.PRESSURE);
        assertTrue(error < ERROR_FACTOR * RTOL, demo + ": largest pressure error over range " + error);
        List<EventRecord> ea = implicit.events();
        List<EventRecord> eb = reference.events();
        assertEquals(eb.size(), ea.size(), "same number of events");
        for (int k = 0; k < ea.size(); k++) {
            assertEquals(eb.get(k).description(), ea.get(k).description(), "event " + k);
            assertEquals(eb.get(k).time(), ea.get(k).time(), EVENT_TIME_TOLERANCE, eb.get(k).description());
        }
        assertTrue(implicit.statistics().jacobians() > 0);
    }
}
