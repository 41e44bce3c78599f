package org.branchsim.core.solve;

import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.settings.Method;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.stiff.RosenbrockIntegrator;
import org.branchsim.core.solve.stiff.RosenbrockScheme;
import org.branchsim.core.solve.stiff.SparsityPattern;
import org.branchsim.core.solve.stiff.StepMatrixChoice;
import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/** Creates the integrator a {@link Method} names and reads its work counters. */
final class IntegratorFactory {

    private IntegratorFactory() {
    }

    /** Steps a Jacobian may serve before it is estimated again. */
    static final int JACOBIAN_MAX_AGE = 1;

    /**
     * The implicit methods with their own dense output also control its error inside steps (docs/theory.md
     * section 10; docs/performance.md, "Method choice").
     */
    static final boolean INTERIOR_CONTROL = true;

    static AdaptiveStepsizeIntegrator create(SolverSettings s, double[] absTol, double[] relTol, RunEngine engine) {
        CircuitModel circuit = engine.model();
        switch (s.method()) {
            case IMPLICIT:
            case IMPLICIT_ORDER3:
                SparsityPattern pattern = SparsityPattern.ofBlocks(circuit.dimension(), circuit.couplings());
                RosenbrockIntegrator r = new RosenbrockIntegrator(scheme(s.method()), s.minStep(), s.maxStep(),
                        absTol, relTol, pattern, JACOBIAN_MAX_AGE);
                r.setTimeDependence(circuit::timeDependentAt);
                r.setInteriorErrorControl(INTERIOR_CONTROL);
                r.setJacobianSource(new ElementJacobian(engine));
                r.setLinearSolver(StepMatrixChoice.solverFor(pattern));
                return r;
            case REFERENCE:
                return new DormandPrince853Integrator(s.minStep(), s.maxStep(), absTol, relTol);
            case EXPLICIT:
            default:
                return new CountingDormandPrince(s.minStep(), s.maxStep(), absTol, relTol);
        }
    }

    /** @return the Rosenbrock scheme an implicit method runs */
    static RosenbrockScheme scheme(Method m) {
        return m == Method.IMPLICIT_ORDER3 ? RosenbrockScheme.RODAS3 : RosenbrockScheme.RODAS4;
    }

    static String describe(Method m) {
        switch (m) {
            case IMPLICIT:
            case IMPLICIT_ORDER3:
                return "implicit " + scheme(m).name();
            case REFERENCE:
                return "explicit Dormand-Prince 8(5,3)";
            case EXPLICIT:
            default:
                return "explicit Dormand-Prince 5(4)";
        }
    }

    static long rejected(AdaptiveStepsizeIntegrator integrator) {
        if (integrator instanceof CountingDormandPrince c) {
            return c.rejected();
        }
        if (integrator instanceof RosenbrockIntegrator r) {
            return r.rejectedSteps();
        }
        return 0;
    }

    /** @return the name of the state with the largest error in the last step tried, when the method knows it */
    static String worstState(AdaptiveStepsizeIntegrator integrator, CircuitModel circuit) {
        if (integrator instanceof RosenbrockIntegrator r && r.worstComponent() >= 0
                && r.worstComponent() < circuit.dimension()) {
            return circuit.states().get(r.worstComponent()).name();
        }
        return null;
    }

    static long jacobians(AdaptiveStepsizeIntegrator integrator) {
        return integrator instanceof RosenbrockIntegrator r ? r.jacobianEvaluations() : 0;
    }

    static long factorisations(AdaptiveStepsizeIntegrator integrator) {
        return integrator instanceof RosenbrockIntegrator r ? r.luFactorisations() : 0;
    }
}
