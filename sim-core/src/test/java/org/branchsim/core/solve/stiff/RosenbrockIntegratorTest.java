package org.branchsim.core.solve.stiff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/** The Rosenbrock integrator on problems with known solutions. */
class RosenbrockIntegratorTest {

    private static RosenbrockIntegrator integrator(int n, double rtol, double atol) {
        double[] a = new double[n];
        double[] r = new double[n];
        Arrays.fill(a, atol);
        Arrays.fill(r, rtol);
        return new RosenbrockIntegrator(1e-14, 10.0, a, r, SparsityPattern.dense(n), 1);
    }

    private static double[] solve(RosenbrockIntegrator integ, OrdinaryDifferentialEquation ode, double[] y0, double t) {
        ODEStateAndDerivative end = integ.integrate(new ExpandableODE(ode), new ODEState(0.0, y0), t);
        assertEquals(t, end.getTime(), 1e-12);
        return end.getPrimaryState();
    }

    /**
     * Prothero-Robinson problem y' = L (y - cos t) - sin t, exact solution y = cos t for y(0) = 1, a standard
     * stiff test with an analytic solution (Hairer and Wanner, Solving ODEs II, 1996, sec. IV.15), with a
     * non-stiff companion y' = -y, y = exp(-t).
     */
    @Test
    void linearStiffProblemMatchesAnalyticSolution() {
        double lambda = -1e5;
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return new double[] {lambda * (y[0] - Math.cos(t)) - Math.sin(t), -y[1]};
            }
        };
        RosenbrockIntegrator integ = integrator(2, 1e-7, 1e-10);
        double[] y = solve(integ, ode, new double[] {1.0, 1.0}, 5.0);
        assertEquals(Math.cos(5.0), y[0], 1e-6);
        assertEquals(Math.exp(-5.0), y[1], 1e-6);
        assertTrue(integ.acceptedSteps() < 2000, "stiffness does not force tiny steps: " + integ.acceptedSteps());
    }

    /** Fixed-step error falls as h^3 on a smooth non-linear problem: the coefficients have order 3. */
    @Test
    void convergesAtThirdOrder() {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return new double[] {y[1], -Math.sin(y[0]) + 0.3 * Math.cos(t)};
            }
        };
        // reference: Hipparchus Dormand-Prince 8(5,3) at tight tolerance (general-purpose reference library)
        DormandPrince853Integrator ref = new DormandPrince853Integrator(1e-12, 0.1, 1e-14, 1e-14);
        double[] exact = ref.integrate(new ExpandableODE(ode), new ODEState(0.0, new double[] {1.0, 0.0}), 2.0)
                .getPrimaryState();
        double[] errors = new double[3];
        for (int k = 0; k < 3; k++) {
            double h = 0.04 / (1 << k);
            double[] tol = {1e6, 1e6};
            RosenbrockIntegrator fixed = new RosenbrockIntegrator(h, h, tol, tol, SparsityPattern.dense(2), 1);
            fixed.setInitialStepSize(h);
            double[] y = solve(fixed, ode, new double[] {1.0, 0.0}, 2.0);
            errors[k] = Math.hypot(y[0] - exact[0], y[1] - exact[1]);
        }
        double order1 = Math.log(errors[0] / errors[1]) / Math.log(2);
        double order2 = Math.log(errors[1] / errors[2]) / Math.log(2);
        assertEquals(3.0, order1, 0.3, Arrays.toString(errors));
        assertEquals(3.0, order2, 0.3, Arrays.toString(errors));
    }

    /**
     * Robertson's chemical kinetics, y1' = -0.04 y1 + 1e4 y2 y3, y2' = 0.04 y1 - 1e4 y2 y3 - 3e7 y2^2,
     * y3' = 3e7 y2^2 (Hairer and Wanner 1996, sec. IV.1). Reference at t = 40 (from memory, the values
     * quoted with the problem): y1 = 0.7158270687, y2 = 9.185534765e-6, y3 = 0.2841637457.
     */
    @Test
    void robertsonKinetics() {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return new double[] {-0.04 * y[0] + 1e4 * y[1] * y[2],
                    0.04 * y[0] - 1e4 * y[1] * y[2] - 3e7 * y[1] * y[1], 3e7 * y[1] * y[1]};
            }
        };
        double[] a = {1e-8, 1e-12, 1e-8};
        double[] r = {1e-6, 1e-6, 1e-6};
        RosenbrockIntegrator integ = new RosenbrockIntegrator(1e-14, 10.0, a, r, SparsityPattern.dense(3), 1);
        double[] y = solve(integ, ode, new double[] {1.0, 0.0, 0.0}, 40.0);
        assertEquals(0.7158270687, y[0], 1e-5);
        assertEquals(9.185534765e-6, y[1], 1e-9);
        assertEquals(0.2841637457, y[2], 1e-5);
        assertEquals(1.0, y[0] + y[1] + y[2], 1e-9, "mass is conserved");
    }

    /**
     * Van der Pol oscillator with mu = 1000 in the scaled form y1' = y2, y2' = ((1 - y1^2) y2 - y1) / eps,
     * eps = 1/mu^2 = 1e-6, y(0) = (2, -0.66) (Hairer and Wanner 1996, sec. IV.1). Reference at t = 2 (from
     * memory, the value published with the problem in the test-set literature):
     * y1 = 1.706167732170483, y2 = -0.8928097010247975.
     */
    @Test
    void vanDerPolMuThousand() {
        double eps = 1e-6;
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return new double[] {y[1], ((1 - y[0] * y[0]) * y[1] - y[0]) / eps};
            }
        };
        RosenbrockIntegrator integ = integrator(2, 1e-7, 1e-7);
        double[] y = solve(integ, ode, new double[] {2.0, -0.66}, 2.0);
        assertEquals(1.706167732170483, y[0], 1e-4);
        assertEquals(-0.8928097010247975, y[1], 1e-3);
        assertTrue(integ.jacobianEvaluations() > 0 && integ.luFactorisations() >= integ.acceptedSteps());
    }

    @Test
    void groupedColumnsNeedFewerEvaluationsThanColumns() {
        // a chain: each state couples to its neighbours only (tridiagonal): three groups suffice
        int n = 30;
        java.util.List<int[]> blocks = new java.util.ArrayList<>();
        for (int i = 0; i + 1 < n; i++) {
            blocks.add(new int[] {i, i + 1});
        }
        SparsityPattern p = SparsityPattern.ofBlocks(n, blocks);
        assertEquals(3, p.groupCount());
        assertEquals(n, SparsityPattern.dense(n).groupCount());
    }

    /**
     * The step-size factor's power x^(-1/order) by roots agrees with the general power (the identity
     * x^(-1/4) = 1/sqrt(sqrt(x)), x^(-1/3) = 1/cbrt(x)) to 1e-14 relative over the error norms a controller
     * meets (1e-10 to 1e4): the general power's exponent -1/3 is itself rounded (by up to 2.8e-17, half a unit in
     * the last place of 1/3), which moves its result by up to |ln x| 2.8e-17 relative, 6.4e-16 at 1e-10, beside
     * each function's own rounding; and the general power is kept for other orders.
     */
    @Test
    void stepFactorPowerByRootsMatchesTheGeneralPower() {
        for (int order = 2; order <= 5; order++) {
            for (double x = 1e-10; x < 1e4; x *= 1.37) {
                double expected = StrictMath.pow(x, -1.0 / order);
                double got = RosenbrockIntegrator.inverseRoot(x, order);
                assertEquals(expected, got, 1e-14 * expected, "order " + order + ", x = " + x);
            }
        }
        assertEquals(0.5, RosenbrockIntegrator.inverseRoot(16.0, 4), 0.0);
        assertEquals(0.5, RosenbrockIntegrator.inverseRoot(8.0, 3), 0.0);
    }
}
