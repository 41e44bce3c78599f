package org.branchsim.core.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Annular leakage, poppet seat area and spool flow force against their published forms. */
class LeakageAndSeatTest {

    @Test
    void annularLeakageMatchesWorkedExample() {
        // Rabie, Fluid Power Engineering, 2009, eq. 2.19: Q = pi D c^3 dp / (12 mu L);
        // D = 10 mm, c = 10 um, L = 10 mm, dp = 100 bar, mu = 0.02784 Pa s -> 9.40e-8 m^3/s; fully eccentric x2.5
        double q = AnnularLeakage.flow(10e-3, 10e-6, 10e-3, 0.0, 100e5, 0.02784);
        assertEquals(9.40e-8, q, 0.01e-8);
        assertEquals(2.5 * q, AnnularLeakage.flow(10e-3, 10e-6, 10e-3, 1.0, 100e5, 0.02784), 1e-15);
    }

    @Test
    void conicalSeatAreaMatchesFrustumFormula() {
        // A = pi d x sin(alpha/2) (1 - x sin(alpha) / (2 d)) (frustum surface; common textbook form):
        // d = 4 mm, x = 0.1 mm: alpha = 60 deg -> 6.215e-7 m^2, 90 deg -> 8.775e-7 m^2
        assertEquals(6.215e-7, PoppetSeat.area(4e-3, Math.toRadians(60), 0.1e-3), 0.001e-7);
        assertEquals(8.775e-7, PoppetSeat.area(4e-3, Math.toRadians(90), 0.1e-3), 0.001e-7);
        assertEquals(0.0, PoppetSeat.area(4e-3, Math.toRadians(90), -1e-5), 0.0);
        // flat seat: pi d x
        assertEquals(Math.PI * 4e-3 * 0.1e-3, PoppetSeat.area(4e-3, Math.PI, 0.1e-3), 1e-15);
    }

    @Test
    void spoolFlowForceMatchesMerritt() {
        // Merritt, Hydraulic Control Systems, 1967: F = 2 Cd Cv w x dp cos(69 deg);
        // Cd 0.61, Cv 0.98, w = 62.83 mm, x = 0.2 mm, dp = 100 bar -> 53.8 N, Q = 69.7 L/min
        double area = 62.83e-3 * 0.2e-3;
        double f = FlowForce.closingForce(0.61, 0.98, area, 100e5, FlowForce.SPOOL_JET_ANGLE);
        assertEquals(53.8, f, 0.1);
        double q = 0.61 * area * Math.sqrt(2 * 100e5 / 870.0);
        assertEquals(69.7, q * 60000, 0.1);
    }
}
