package org.branchsim.core.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The laws' closed-form partial derivatives against their published limits and against central differences
 * (f(x + h) - f(x - h)) / (2 h), h = 1e-4 of the variable's own scale (Dennis and Schnabel, Numerical Methods for
 * Unconstrained Optimization and Nonlinear Equations, 1983, ch. 5: error h^2/6 |f'''| + eps |f| / h, here below
 * 1e-7 relative; checked to {@link #DIFFERENCE_TOLERANCE}).
 */
class LawPartialsTest {

    private static final double RHO = 870.0;
    private static final double NU = 32e-6;
    private static final double CD = 0.61;
    private static final double D = 1e-3;
    private static final double A = OrificeLaw.circleArea(D);
    /** Agreement asked of a closed form with central differences (their error is below 1e-7 here). */
    private static final double DIFFERENCE_TOLERANCE = 1e-6;

    private static double central(DoubleUnaryOperator f, double x, double h) {
        return (f.applyAsDouble(x + h) - f.applyAsDouble(x - h)) / (2 * h);
    }

    @Test
    void orificeSlopeIsTheSquareRootLawsSlopeWhenTurbulent() {
        double dpT = OrificeLaw.transitionPressure(CD, D, RHO, NU);
        for (double dp : new double[] {10e5, 100e5, -50e5}) {
            // d/d(dp) of Q = Cd A sqrt(2 |dp| / rho) (Merritt, Hydraulic Control Systems, 1967) is Q / (2 dp)
            double expected = CD * A / Math.sqrt(2 * RHO * Math.abs(dp));
            assertEquals(expected, OrificeLaw.slope(CD, A, dp, RHO, dpT), 1e-3 * expected, "dp = " + dp);
        }
    }

    @Test
    void orificeSlopeAtZeroIsMerrittsLaminarConductance() {
        // Merritt 1967, laminar orifice flow: Q = 2 delta^2 A d_h dp / (rho nu), delta = 0.2 (from memory)
        double expected = 2 * OrificeLaw.LAMINAR_DELTA * OrificeLaw.LAMINAR_DELTA * A * D / (RHO * NU);
        double dpT = OrificeLaw.transitionPressure(CD, D, RHO, NU);
        assertEquals(expected, OrificeLaw.slope(CD, A, 0.0, RHO, dpT), 1e-12 * expected);
    }

    @Test
    void orificeSlopesAgreeWithCentralDifferencesAcrossTheTransition() {
        double dpT = OrificeLaw.transitionPressure(CD, D, RHO, NU);
        for (double ratio : new double[] {-30, -1, -0.3, 0.01, 0.1, 1, 3, 1000}) {
            double dp = ratio * dpT;
            double h = 1e-4 * Math.max(Math.abs(dp), dpT);
            double slope = OrificeLaw.slope(CD, A, dp, RHO, dpT);
            assertEquals(central(x -> OrificeLaw.flow(CD, A, x, RHO, dpT), dp, h), slope,
                    DIFFERENCE_TOLERANCE * Math.abs(slope), "dp = " + ratio + " dp_t");
            double byTransition = OrificeLaw.transitionSlope(CD, A, dp, RHO, dpT);
            assertEquals(central(t -> OrificeLaw.flow(CD, A, dp, RHO, t), dpT, 1e-4 * dpT), byTransition,
                    DIFFERENCE_TOLERANCE * Math.abs(byTransition), "d/d(dp_t) at dp = " + ratio + " dp_t");
        }
    }

    @Test
    void roundHoleTransitionIsTheTransitionPressureOfItsDiameter() {
        // dp_t = rho/2 (Re_t nu / (Cd d_h))^2 with d_h the hole's diameter (Merritt 1967, laminar orifice flow)
        double reT = (CD / OrificeLaw.LAMINAR_DELTA) * (CD / OrificeLaw.LAMINAR_DELTA);
        double v = reT * NU / (CD * D);
        double expected = 0.5 * RHO * v * v;
        assertEquals(expected, OrificeLaw.roundHoleTransition(OrificeLaw.transitionConstant(CD, RHO, NU), A),
                1e-12 * expected);
    }

    @Test
    void poppetSeatAreaSlopeIsTheFrustumsDerivative() {
        // flat seat: A = pi d x, so dA/dx = pi d; cone at x -> 0: A = pi d x sin(alpha/2), slope pi d sin(alpha/2)
        // (frustum lateral area, common textbook form, REFERENCES.md)
        double d = 4e-3;
        assertEquals(Math.PI * d, new PoppetSeat(d, Math.PI).areaSlope(0.1e-3), 1e-15);
        PoppetSeat cone = new PoppetSeat(d, Math.toRadians(60));
        assertEquals(Math.PI * d * Math.sin(Math.toRadians(30)), cone.areaSlope(1e-9), 1e-6 * Math.PI * d);
        for (double x : new double[] {1e-6, 0.1e-3, 1e-3, 5e-3}) {
            assertEquals(central(cone::area, x, 1e-4 * x), cone.areaSlope(x), DIFFERENCE_TOLERANCE * cone.areaSlope(x),
                    "x = " + x);
        }
        assertEquals(0.0, cone.areaSlope(2 * cone.usefulLift()), 0.0, "constant beyond the useful lift");
        assertEquals(0.0, cone.areaSlope(-1e-6), 0.0, "closed");
    }

    @Test
    void flowForceSlopesFollowItsLinearLaw() {
        // F = 2 Cd Cv A |dp| cos(theta) (Merritt 1967) is linear in A and in |dp|
        double f = FlowForce.closingForceAtCosine(CD, 0.98, A, 50e5, FlowForce.SPOOL_JET_COSINE);
        assertEquals(f / 50e5, FlowForce.pressureSlopeAtCosine(CD, 0.98, A, 50e5, FlowForce.SPOOL_JET_COSINE), 1e-15);
        assertEquals(-f / 50e5, FlowForce.pressureSlopeAtCosine(CD, 0.98, A, -50e5, FlowForce.SPOOL_JET_COSINE),
                1e-15);
        assertEquals(f / A, FlowForce.areaSlopeAtCosine(CD, 0.98, -50e5, FlowForce.SPOOL_JET_COSINE), 1e-6 * f / A);
    }
}
