package org.branchsim.core.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;

/** The specification reader on the shipped demo and on mistakes; the minimax score of docs/spec-format.md. */
class SpecFileTest {

    @Test
    void readsTheClampDemoSpecificationInSi() throws IOException {
        Path p = Path.of("..", "scenarios", "specs", "fixture-clamp.json");
        SpecFile s = SpecFile.read(p.toString(), Files.readString(p));
        assertEquals("reducer", s.valve());
        assertEquals(4, s.specs().size());
        assertEquals(40.0, s.specs().get(0).limit(), 0.0);
        assertEquals(0.080, s.specs().get(1).limit(), 1e-15);
        // 0.5 L/min = 0.5e-3 m^3 / 60 s (definition of the litre, NIST SP 811)
        assertEquals(0.5e-3 / 60, s.specs().get(2).limit(), 1e-18);
        assertEquals(3, s.free().size());
        assertEquals(0.4, s.free().get(0).low(), 0.0);
        assertEquals("mm", s.free().get(0).unit());
        assertEquals(20, s.toleranceRuns());
    }

    @Test
    void refusesAMistakeAtItsPlace() {
        BranchsimException e = assertThrows(BranchsimException.class, () -> SpecFile.read("s.json",
                "{\"valve\": \"v\",\n \"specs\": [{\"metric\": \"overshoot\", \"max\": \"15\"}], \"free\": []}"));
        assertSame(ErrorKey.SPEC_INVALID, e.key());
        assertTrue(e.getMessage().startsWith("s.json:2:"), e.getMessage());
        assertTrue(e.getMessage().contains("percentage"), e.getMessage());
    }

    @Test
    void theScoreIsTheLargestWeightedNormalisedViolationAndNamesTheBindingSpec() {
        // docs/spec-format.md: g = (value - limit)/|limit| for max, (limit - value)/|limit| for min
        List<Spec> specs = List.of(new Spec(SpecMetric.OVERSHOOT, true, 20, 1, "20 %"),
                new Spec(SpecMetric.DRAIN_FLOW, true, 1e-5, 2, "0.6 L/min"),
                new Spec(SpecMetric.PEAK, false, 40e5, 1, "40 bar"));
        DesignEvaluation e = DesignEvaluation.of(specs, new double[] {15, 0.9e-5, 50e5});
        assertEquals(-0.1 * 2, e.objective(), 1e-12);
        assertEquals(1, e.binding());
        assertTrue(e.feasible());
        DesignEvaluation bad = DesignEvaluation.of(specs, new double[] {25, 0.9e-5, 50e5});
        assertEquals(0.25, bad.objective(), 1e-12);
        assertEquals(0, bad.binding());
        assertFalse(bad.feasible());
    }

    @Test
    void aDampingRatioIsAPlainNumberAndAnUndefinedOneFailsItsSpec() {
        SpecFile s = SpecFile.read("s.json", "{\"valve\": \"v\", \"specs\": [{\"metric\": \"dampingRatio\", \"min\": 0.1}],"
                + " \"free\": [{\"path\": \"elements.v.mass\", \"low\": \"1 g\", \"high\": \"2 g\"}]}");
        Spec d = s.specs().get(0);
        assertSame(SpecMetric.DAMPING_RATIO, d.metric());
        assertFalse(d.maximum());
        assertEquals(0.1, d.limit(), 0.0);
        assertEquals(-0.5, d.violation(0.15), 1e-12, "met with a margin of half the limit");
        assertEquals(Double.POSITIVE_INFINITY, d.violation(Double.NaN), "no operating point: the spec fails");
        for (String bad : new String[] {"\"0.1 %\"", "2", "\"high\""}) {
            BranchsimException e = assertThrows(BranchsimException.class, () -> SpecFile.read("s.json",
                    "{\"valve\": \"v\",\n \"specs\": [{\"metric\": \"dampingRatio\", \"min\": " + bad + "}], \"free\": []}"));
            assertTrue(e.getMessage().startsWith("s.json:2:") && e.getMessage().contains("damping ratio"), e.getMessage());
        }
    }
}
