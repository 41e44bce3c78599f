package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The scan windows follow the rule stated in docs/theory.md section 8.0 (the later half of every quiet interval
 * between schedule changes; overlapping ramps are one change); expected values are worked by hand from the rule.
 */
class ScanWindowTest {

    private static final double EPS = 1e-12;

    @Test
    void laterHalfOfEveryIntervalBetweenChanges() {
        ScheduledInput valve = new ScheduledInput("v.opening", Dimension.DIMENSIONLESS, 0.0);
        valve.addRamp(new ScheduledInput.Ramp(1.0, 0.1, 1.0));
        ScheduledInput load = new ScheduledInput("c.load", Dimension.FORCE, 0.0);
        load.addRamp(new ScheduledInput.Ramp(1.05, 0.15, 100.0));
        load.addRamp(new ScheduledInput.Ramp(5.0, 0.0, 0.0));
        List<ScanWindow> w = ScanWindow.between(List.of(valve, load), 10.0);
        assertEquals(3, w.size(), w.toString());
        // [0, 1]: scanned 0.5 .. 1; [1.2, 5] (1.0..1.1 and 1.05..1.2 overlap): 3.1 .. 5; [5, 10]: 7.5 .. 10
        assertEquals(0.5, w.get(0).from(), EPS);
        assertEquals(1.0, w.get(0).to(), EPS);
        assertEquals(3.1, w.get(1).from(), EPS);
        assertEquals(5.0, w.get(1).to(), EPS);
        assertEquals(1.2, w.get(1).changeEnd(), EPS);
        assertEquals(7.5, w.get(2).from(), EPS);
        assertEquals(10.0, w.get(2).to(), EPS);
    }

    @Test
    void aRunWithoutScheduleIsScannedInItsLaterHalf() {
        List<ScanWindow> w = ScanWindow.between(List.of(), 2.0);
        assertEquals(List.of(new ScanWindow(1.0, 2.0, 0.0, "start of the run")), w);
    }
}
