package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.SignalOscillation;
import org.branchsim.core.settings.Method;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * On the demos that oscillate without end (a chattering pilot, hunting valves) the implicit method's trace drifts
 * in phase from the reference's over hundreds of cycles, so a pointwise comparison ({@link ImplicitAgreementTest})
 * does not apply there. What a user acts on does: the oscillations found, their kind, their parts, their frequency
 * and their amplitude agree with those found in Hipparchus's Dormand-Prince 8(5,3) run at rtol 1e-10 (a
 * general-purpose reference integrator) analysed the same way. Frequency within 10 x rtol; amplitude, which is
 * read from samples whose phase against the waveform differs between the runs, within 100 x rtol (common
 * practice, no source: both far below the percent steps in which margins and cures are judged).
 */
class OscillationAgreementTest {

    private static final double RTOL = 1e-6;
    private static final double REFERENCE_RTOL = 1e-10;


    @ParameterizedTest
    @CsvSource({"gripper-chatter, 0.6", "pilot-supply-hunting, 0.8", "press-two-branches, 0.5"})
    void theOscillationsFoundAgreeWithTheReference(String demo, double end) {
        List<OscillationFinding> implicit = OscillationScan.scan(DemoRuns.run(demo, end, Method.IMPLICIT, RTOL));
        List<OscillationFinding> reference =
                OscillationScan.scan(DemoRuns.run(demo, end, Method.REFERENCE, REFERENCE_RTOL));
        assertFalse(reference.isEmpty(), demo + " oscillates");
        assertEquals(reference.size(), implicit.size(), "findings");
        for (int k = 0; k < reference.size(); k++) {
            OscillationFinding a = implicit.get(k);
            OscillationFinding b = reference.get(k);
            assertEquals(b.kind(), a.kind());
            assertEquals(b.parts(), a.parts());
            assertEquals(b.window(), a.window());
            assertEquals(b.frequency(), a.frequency(), 10 * RTOL * b.frequency(), "frequency, Hz");
            SignalOscillation da = a.dominant();
            SignalOscillation db = b.dominant();
            assertEquals(db.signal(), da.signal());
            assertEquals(db.amplitude(), da.amplitude(), 100 * RTOL * db.amplitude(), "amplitude of " + db.signal());
            assertTrue(db.amplitude() > 0.0);
        }
    }
}
