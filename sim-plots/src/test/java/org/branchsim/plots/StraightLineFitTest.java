package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The least-squares line against the normal equations worked by hand: slope = S_xy / S_xx, intercept = mean y -
 * slope * mean x (Montgomery and Runger, Applied Statistics and Probability for Engineers, 6th ed., Wiley 2014,
 * section 11-2, the least-squares estimates of simple linear regression; equation numbers from memory).
 */
class StraightLineFitTest {

    @Test
    void fourPointsWorkedByHand() {
        // x = 0, 1, 2, 3; y = 1, 3, 2, 5: mean x 1.5, mean y 2.75, S_xx = 5, S_xy = 5.5 -> slope 1.1, intercept 1.1
        StraightLineFit f = StraightLineFit.of(new double[] {0, 1, 2, 3}, new double[] {1, 3, 2, 5});
        assertEquals(1.1, f.slope(), 1e-12);
        assertEquals(1.1, f.intercept(), 1e-12);
        assertEquals(4, f.count());
    }

    @Test
    void anExactLineIsRecovered() {
        // residuals are zero on an exact line, so the estimates equal its coefficients (same source)
        double[] x = new double[50];
        double[] y = new double[50];
        for (int k = 0; k < x.length; k++) {
            x[k] = 1e-5 * k;
            y[k] = 72e5 - 1.2e10 * x[k];
        }
        StraightLineFit f = StraightLineFit.of(x, y);
        assertEquals(-1.2e10, f.slope(), 1e-3);
        assertEquals(72e5, f.intercept(), 1e-6);
    }

    @Test
    void noSlopeWithoutTwoDistinctAbscissae() {
        // S_xx = 0 leaves the normal equations singular (same source)
        assertTrue(Double.isNaN(StraightLineFit.of(new double[] {2, 2}, new double[] {1, 3}).slope()));
        assertTrue(Double.isNaN(StraightLineFit.of(new double[] {2}, new double[] {1}).slope()));
    }
}
