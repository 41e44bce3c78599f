package org.branchsim.core.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.elements.MeteringEdge;
import org.branchsim.core.elements.PoppetGeometry;
import org.junit.jupiter.api.Test;

/** Annular leakage, poppet seat area, spool flow force and continuity against their published forms. */
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
    void conicalSeatAreaMatchesWorkedExample() {
        // A = pi d x sin(alpha/2) (1 - x sin(alpha) / (2 d)) (frustum surface; common textbook form, REFERENCES.md):
        // d = 4 mm, x = 0.1 mm: alpha = 60 deg -> 6.215e-7 m^2, 90 deg -> 8.775e-7 m^2
        assertEquals(6.215e-7, new PoppetSeat(4e-3, Math.toRadians(60)).area(0.1e-3), 0.001e-7);
        assertEquals(8.775e-7, new PoppetSeat(4e-3, Math.toRadians(90)).area(0.1e-3), 0.001e-7);
        assertEquals(0.0, new PoppetSeat(4e-3, Math.toRadians(90)).area(-1e-5), 0.0);
    }

    /**
     * The seat law against the frustum it stands for, built from its geometry: the narrowest passage between a
     * sharp seat edge of radius r1 = d/2 and a cone of full angle alpha lifted x is the frustum whose slant side is
     * the normal from the edge to the cone, length l = x sin(alpha/2), ending at radius r2 = r1 - l cos(alpha/2);
     * a frustum's lateral area is pi (r1 + r2) l (elementary solid geometry). The area grows up to the lift where
     * its derivative vanishes, x = d / sin(alpha), and the law holds it there.
     */
    @Test
    void conicalSeatAreaIsTheLateralAreaOfTheFrustumBelowTheUsefulLift() {
        double d = 2.5e-3;
        for (double degrees : new double[] {30, 60, 90, 120}) {
            double alpha = Math.toRadians(degrees);
            PoppetSeat seat = new PoppetSeat(d, alpha);
            double useful = d / Math.sin(alpha);
            assertEquals(useful, seat.usefulLift(), 1e-15, degrees + " deg");
            for (double fraction : new double[] {0.01, 0.1, 0.5, 0.9, 1.0}) {
                double x = fraction * useful;
                double slant = x * Math.sin(alpha / 2);
                double r1 = d / 2;
                double r2 = r1 - slant * Math.cos(alpha / 2);
                double frustum = Math.PI * (r1 + r2) * slant;
                assertEquals(frustum, seat.area(x), 1e-12 * frustum, degrees + " deg at x = " + x);
            }
            assertEquals(seat.area(useful), seat.area(2 * useful), 0.0, "held at the useful lift");
            // the gap the jet passes is x sin(alpha/2) wide; its hydraulic diameter is twice that
            assertEquals(2 * 0.1e-3 * Math.sin(alpha / 2), seat.gapHydraulicDiameter(0.1e-3), 1e-18);
            assertEquals(alpha / 2, seat.jetAngle(), 1e-15);
        }
    }

    @Test
    void flatSeatOpensTheCylinderAboveTheSeatUpToAQuarterOfTheDiameter() {
        // a disc lifted x from a bore of diameter d opens the cylinder pi d x; at x = d/4 that equals the bore area
        // pi d^2 / 4 (elementary geometry; REFERENCES.md), beyond which the bore limits the flow
        PoppetSeat flat = new PoppetSeat(4e-3, Math.PI);
        assertEquals(Math.PI * 4e-3 * 0.1e-3, flat.area(0.1e-3), 1e-15);
        assertEquals(Math.PI * 4e-3 * 4e-3 / 4, flat.area(2e-3), 1e-15);
        assertEquals(Math.PI * 4e-3 * 4e-3 / 4, flat.seatArea(), 1e-18);
        assertEquals(Math.PI / 2, flat.jetAngle(), 0.0, "a disc's jet leaves radially: no axial flow force");
    }

    @Test
    void thePoppetTheSimulatorUsesOpensTheFrustumArea() {
        // the relief valve's and the pilot stage's poppet (elements/PoppetGeometry) must open the worked areas above
        PoppetGeometry pilot = new PoppetGeometry(4e-3, Math.toRadians(60), 15e3, 20.0, 3e-3, 15.0, 1e-3, 0.61);
        assertEquals(6.215e-7, pilot.area(0.1e-3), 0.001e-7);
        assertEquals(Math.PI * 4e-3 * 4e-3 / 4, pilot.seatArea(), 1e-18);
        // and its flow force is Merritt's 2 Cd Cv A dp cos(theta) with the jet at half the cone angle (30 deg)
        double expected = 2 * 0.61 * 0.98 * 6.215e-7 * 50e5 * Math.cos(Math.toRadians(30));
        assertEquals(expected, pilot.flowForce(0.1e-3, 50e5), 0.001 * expected);
    }

    @Test
    void spoolFlowForceAndFlowMatchMerritt() {
        // Merritt, Hydraulic Control Systems, 1967: F = 2 Cd Cv w x dp cos(69 deg); REFERENCES.md worked example:
        // Cd 0.61, Cv 0.98, w = 62.83 mm (10 mm spool, full periphery), x = 0.2 mm, dp = 100 bar -> F = 53.8 N,
        // Q = 69.7 L/min (orifice equation, rho = 870)
        double area = 62.83e-3 * 0.2e-3;
        assertEquals(53.8, FlowForce.closingForce(0.61, 0.98, area, 100e5, FlowForce.SPOOL_JET_ANGLE), 0.1);
        assertEquals(53.8, FlowForce.closingForceAtCosine(0.61, 0.98, area, 100e5, FlowForce.SPOOL_JET_COSINE), 0.1);
        // the metering edge the reducing valves use, opened 0.2 mm on its full periphery, gives both numbers
        MeteringEdge edge = new MeteringEdge(10e-3, 62.83e-3, 0.5e-3, 0.0, 0.0, 0.61);
        double s = 0.2e-3;
        assertEquals(53.8, edge.flowForce(s, 100e5), 0.1);
        assertEquals(69.7, edge.flow(s, 100e5, 870.0, 32e-6) * 60000, 0.1);
        assertEquals(Math.PI * 10e-3 * 10e-3 / 4, edge.endArea(), 1e-18);
    }

    @Test
    void pressureRisesAtBulkModulusTimesInflowOverVolume() {
        // Merritt 1967, ch. 2: dp/dt = beta_e Q / V; REFERENCES.md: Q = 10 L/min, V = 1 L, beta = 1.6 GPa -> 2667 bar/s
        double rate = Compressibility.pressureRate(1.6e9, 1e-3, 10e-3 / 60.0);
        assertEquals(2666.7e5, rate, 0.1e5);
        assertTrue(Compressibility.pressureRate(1.6e9, 1e-3, -1e-4) < 0, "outflow lowers the pressure");
    }
}
