package org.branchsim.core.measured;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;

/**
 * Alignment of a logger's time base: a known offset is recovered within one sample. The reference signal is a
 * step response of a second-order system, x(t) = 1 - exp(-zeta w t)(cos wd t + zeta/sqrt(1-zeta^2) sin wd t)
 * (Ogata, Modern Control Engineering, 5th ed. 2010, eq. 5-20), which has a landing-like rise and ringing.
 */
class AlignmentTest {

    private static final double DT = 1e-3;
    private static final double LOGGER_DT = 0.4e-3;
    private static final double OFFSET = 12.3456;

    private static double response(double t) {
        double start = 0.1;
        if (t < start) {
            return 0.0;
        }
        double w = 2 * Math.PI * 40;
        double z = 0.2;
        double wd = w * Math.sqrt(1 - z * z);
        double s = t - start;
        return 1 - Math.exp(-z * w * s) * (Math.cos(wd * s) + z / Math.sqrt(1 - z * z) * Math.sin(wd * s));
    }

    @Test
    void crossCorrelationRecoversAKnownOffsetWithinOneSample() {
        double[] st = Resampling.grid(0, 0.5, DT);
        double[] sx = new double[st.length];
        for (int k = 0; k < st.length; k++) {
            sx[k] = response(st[k]);
        }
        double[] mt = Resampling.grid(OFFSET - 0.2, OFFSET + 0.8, LOGGER_DT);
        double[] mx = new double[mt.length];
        Random noise = new Random(7);
        for (int k = 0; k < mt.length; k++) {
            mx[k] = response(mt[k] - OFFSET) + 0.02 * noise.nextGaussian();
        }
        double found = Alignment.byCrossCorrelation(mt, mx, st, sx);
        assertEquals(OFFSET, found, LOGGER_DT, "within one logger sample");
    }

    @Test
    void triggerRecoversAKnownOffsetWithinOneSample() {
        double[] st = Resampling.grid(0, 0.5, DT);
        double[] sx = new double[st.length];
        for (int k = 0; k < st.length; k++) {
            sx[k] = response(st[k]);
        }
        double[] mt = Resampling.grid(OFFSET - 0.2, OFFSET + 0.8, LOGGER_DT);
        double[] mx = new double[mt.length];
        for (int k = 0; k < mt.length; k++) {
            mx[k] = response(mt[k] - OFFSET);
        }
        assertEquals(OFFSET, Alignment.byTrigger(mt, mx, st, sx, 0.5, true, "x>0.5"), LOGGER_DT);
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> Alignment.byTrigger(mt, mx, st, sx, 5.0, true, "x>5"));
        assertSame(ErrorKey.ALIGNMENT_FAILED, e.key());
    }

    @Test
    void linearResamplingIsExactOnAStraightLine() {
        // a straight line is reproduced exactly by linear interpolation (definition)
        double[] r = Resampling.linear(new double[] {0, 1, 3}, new double[] {1, 3, 7}, new double[] {0.5, 2, 4});
        assertEquals(2.0, r[0], 1e-15);
        assertEquals(5.0, r[1], 1e-15);
        assertEquals(Double.NaN, r[2]);
    }
}
