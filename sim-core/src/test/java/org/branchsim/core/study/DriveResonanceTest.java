package org.branchsim.core.study;

import org.branchsim.core.analysis.Mode;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

/**
 * The magnification of a driven second-order mode against the textbook frequency response (Ogata, Modern Control
 * Engineering, 5th ed., 2010, ch. 7, second-order factors: |G(j omega)| = 1 / sqrt((1 - r^2)^2 + (2 zeta r)^2), its
 * value 1/(2 zeta) at r = 1, and the resonant peak M_r = 1 / (2 zeta sqrt(1 - zeta^2)) at r = sqrt(1 - 2 zeta^2) for
 * zeta below 1/sqrt(2); from memory of the section), and the choice of the mode nearest a drive.
 */
class DriveResonanceTest {

    @Test
    void magnificationFollowsTheSecondOrderFrequencyResponse() {
        assertEquals(1.0, DriveResonance.magnification(1e-6, 0.1), 1e-9, "far below the mode: the static gain");
        assertEquals(1.0 / (2 * 0.05), DriveResonance.magnification(1.0, 0.05), 1e-9, "on the mode: 1/(2 zeta)");
        assertEquals(1.0 / (100.0 * 100.0 - 1.0), DriveResonance.magnification(100.0, 0.0), 1e-12, "far above: 1/(r^2 - 1)");
        for (double zeta : new double[] {0.02, 0.1, 0.3, 0.6}) {
            double rPeak = Math.sqrt(1 - 2 * zeta * zeta);
            double peak = 1.0 / (2 * zeta * Math.sqrt(1 - zeta * zeta));
            assertEquals(peak, DriveResonance.magnification(rPeak, zeta), 1e-9 * peak, "resonant peak, zeta " + zeta);
            assertEquals(true, DriveResonance.magnification(rPeak * 1.01, zeta) < peak, "a maximum, zeta " + zeta);
            assertEquals(true, DriveResonance.magnification(rPeak * 0.99, zeta) < peak, "a maximum, zeta " + zeta);
        }
    }

    @Test
    void theNearestOscillatoryModeOnALogScaleIsChosen() {
        Mode real = mode(0.0, 500.0, 1.0);
        Mode low = mode(2 * Math.PI * 100.0, 100.0, 0.2);
        Mode high = mode(2 * Math.PI * 900.0, 900.0, 0.05);
        DriveResonance r = DriveResonance.nearest(540.0, List.of(real, low, high));
        // |ln(540/900)| = 0.51 < |ln(540/100)| = 1.69; the real mode at 500 Hz does not oscillate and is skipped
        assertSame(high, r.mode());
        assertEquals(0.6, r.ratio(), 1e-12);
        assertEquals(DriveResonance.magnification(0.6, 0.05), r.magnification(), 1e-12);
        assertNull(DriveResonance.nearest(540.0, List.of(real)));
    }

    private static Mode mode(double imaginary, double naturalFrequency, double zeta) {
        double omega = 2 * Math.PI * naturalFrequency;
        return new Mode(-zeta * omega, imaginary, naturalFrequency, zeta, "test mode", List.of(), List.of(), List.of(),
                List.of());
    }
}
