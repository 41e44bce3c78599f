package org.branchsim.core.solve;

import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;

/** Creates the integrator a {@link Method} names and reads its work counters. */
final class IntegratorFactory {

    private IntegratorFactory() {
    }

    static AdaptiveStepsizeIntegrator create(SolverSettings s, double[] absTol, double[] relTol) {
        switch (s.method()) {
            case EXPLICIT:
            default:
                return new CountingDormandPrince(s.minStep(), s.maxStep(), absTol, relTol);
        }
    }

    static String describe(Method m) {
        switch (m) {
            case EXPLICIT:
            default:
                return "explicit Dormand-Prince 5(4)";
        }
    }

    static long rejected(AdaptiveStepsizeIntegrator integrator) {
        if (integrator instanceof CountingDormandPrince c) {
            return c.rejected();
        }
        return 0;
    }

    static long jacobians(AdaptiveStepsizeIntegrator integrator) {
        return 0;
    }

    static long factorisations(AdaptiveStepsizeIntegrator integrator) {
        return 0;
    }
}
