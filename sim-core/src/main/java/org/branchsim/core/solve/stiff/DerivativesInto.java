package org.branchsim.core.solve.stiff;

import org.hipparchus.ode.OrdinaryDifferentialEquation;

/**
 * Equations that can write dy/dt into an array the caller owns (SI per second), so that the Rosenbrock
 * integrator evaluates its stages without allocating and copying per evaluation. The integrator uses it when
 * the equations it integrates are only these primary equations.
 */
public interface DerivativesInto extends OrdinaryDifferentialEquation {

    /**
     * @param t time, s
     * @param y state, SI (not changed)
     * @param yDot output: dy/dt, SI per second, every entry written
     */
    void derivatives(double t, double[] y, double[] yDot);
}
