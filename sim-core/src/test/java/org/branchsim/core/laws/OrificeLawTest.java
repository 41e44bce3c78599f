package org.branchsim.core.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Orifice equation Q = Cd A sqrt(2 dp / rho) (Merritt, Hydraulic Control Systems, 1967; Rabie, Fluid Power
 * Engineering, 2009, eqs 2.34-2.39) and Merritt's laminar limit Cd = delta sqrt(Re), delta = 0.2 (from memory).
 */
class OrificeLawTest {

    private static final double RHO = 870.0;
    private static final double NU = 32e-6;
    private static final double CD = 0.61;
    private static final double D = 1e-3;
    private static final double TURBULENT_TOLERANCE = 1e-3;

    private static double flow(double dp) {
        double a = OrificeLaw.circleArea(D);
        return OrificeLaw.flow(CD, a, dp, RHO, OrificeLaw.transitionPressure(CD, D, RHO, NU));
    }

    @Test
    void workedExampleOneMillimetreTenBar() {
        // REFERENCES.md: d = 1 mm, dp = 10 bar, rho = 870, Cd = 0.61 -> Q = 2.2971e-5 m^3/s = 1.378 L/min
        assertEquals(2.2971e-5, flow(10e5), 2.2971e-5 * TURBULENT_TOLERANCE);
    }

    @Test
    void followsSquareRootLawAtSeveralPressureDifferencesBothSigns() {
        double a = OrificeLaw.circleArea(D);
        for (double dpBar : new double[] {1, 5, 20, 100, 250}) {
            double dp = dpBar * 1e5;
            double expected = CD * a * Math.sqrt(2 * dp / RHO);
            assertEquals(expected, flow(dp), expected * TURBULENT_TOLERANCE, "dp = " + dpBar + " bar");
            assertEquals(-expected, flow(-dp), expected * TURBULENT_TOLERANCE, "dp = -" + dpBar + " bar");
        }
    }

    @Test
    void laminarLimitIsMerrittsLinearLaw() {
        // Q = 2 delta^2 A d_h dp / (rho nu) when delta sqrt(Re) < Cd (Merritt 1967, laminar orifice flow)
        double a = OrificeLaw.circleArea(D);
        double dp = 1.0;
        double expected = 2 * OrificeLaw.LAMINAR_DELTA * OrificeLaw.LAMINAR_DELTA * a * D * dp / (RHO * NU);
        assertEquals(expected, flow(dp), expected * 1e-3);
        assertEquals(0.0, flow(0.0), 0.0);
    }

    @Test
    void transitionReynoldsNumberIsNearNine() {
        // delta sqrt(Re) crosses 0.61 near Re = 9.3 (REFERENCES.md)
        double dpT = OrificeLaw.transitionPressure(CD, D, RHO, NU);
        double v = Math.sqrt(2 * dpT / RHO) * CD;
        assertEquals(9.3, v * D / NU, 0.05);
    }
}
