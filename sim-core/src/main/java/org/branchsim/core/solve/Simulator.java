package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.Circuit;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.EnergyBalance;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.results.Trace;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.LocalizedODEFormats;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.hipparchus.exception.LocalizedCoreFormats;

/**
 * Runs a circuit in time with Hipparchus: the only place that knows the integrator. Registers every
 * discontinuity as an event detector, samples the output grid from the dense output, integrates the energy
 * accounts, and turns solver failures into {@link BranchsimException}s naming the time and the states.
 */
public final class Simulator {

    private Simulator() {
    }

    /**
     * @param circuit a freshly built circuit
     * @param settings solver settings
     * @return the run's trace, statistics, energy balance and events
     * @throws BranchsimException when the integration fails
     */
    public static SimulationResult run(Circuit circuit, SolverSettings settings) {
        double[] y0 = circuit.initialState();
        circuit.initialiseModes(0.0, y0);
        circuit.clearImpulses();

        List<Trace.Column> columns = new ArrayList<>();
        for (SignalHandle h : circuit.signals()) {
            columns.add(new Trace.Column(h.name(), h.dimension()));
        }
        Trace trace = new Trace(columns);
        FailureReporter reporter = new FailureReporter(circuit, 0.0, y0);
        List<EventRecord> log = new ArrayList<>();

        double[] absTol = new double[circuit.dimension()];
        double[] relTol = new double[circuit.dimension()];
        List<StateSlot> slots = circuit.states();
        for (int i = 0; i < absTol.length; i++) {
            absTol[i] = settings.relativeTolerance() * slots.get(i).absoluteScale();
            relTol[i] = settings.relativeTolerance();
        }
        AdaptiveStepsizeIntegrator integrator = IntegratorFactory.create(settings, absTol, relTol, circuit);
        integrator.setMaxEvaluations((int) Math.min(Integer.MAX_VALUE, settings.maxEvaluations()));

        AdaptableInterval maxCheck = AdaptableInterval.of(settings.maxStep());
        SharedView views = new SharedView(circuit);
        for (Discontinuity d : circuit.discontinuities()) {
            integrator.addEventDetector(new DiscontinuityDetector(circuit, views, d, log, maxCheck, 200,
                    new BracketingNthOrderBrentSolver(0.0, settings.eventTolerance(), 0.0, 5)));
        }
        GridSampler sampler = new GridSampler(circuit, trace, settings.outputInterval(), settings.endTime(), reporter);
        EnergyQuadrature quadrature = new EnergyQuadrature(circuit);
        integrator.addStepHandler(sampler);
        integrator.addStepHandler(quadrature);

        CircuitEquations equations = new CircuitEquations(circuit, reporter);
        long start = System.nanoTime();
        ODEStateAndDerivative end;
        try {
            end = integrator.integrate(new ExpandableODE(equations), new ODEState(0.0, y0), settings.endTime());
        } catch (BranchsimException e) {
            throw e;
        } catch (MathIllegalArgumentException | MathIllegalStateException e) {
            throw translate(e, settings, reporter, IntegratorFactory.worstState(integrator, circuit));
        } catch (MathRuntimeException e) {
            throw new BranchsimException(ErrorKey.SOLVER_FAILED, List.of(), e,
                    reporter.time(reporter.lastTime()), e.getMessage(), reporter.describeLastGood());
        }
        double wall = (System.nanoTime() - start) * 1e-9;

        Map<String, Integer> eventCounts = new TreeMap<>();
        for (EventRecord r : log) {
            eventCounts.merge(r.kind(), 1, Integer::sum);
        }
        SolverStatistics stats = new SolverStatistics(IntegratorFactory.describe(settings.method()),
                sampler.steps(), IntegratorFactory.rejected(integrator), integrator.getEvaluations(),
                IntegratorFactory.jacobians(integrator), IntegratorFactory.factorisations(integrator),
                eventCounts, wall, settings.endTime());
        return new SimulationResult(circuit, trace, stats, energy(circuit, quadrature), List.copyOf(log),
                end.getPrimaryState());
    }

    private static EnergyBalance energy(Circuit circuit, EnergyQuadrature quadrature) {
        double[] integrated = quadrature.energy();
        double[] impulses = circuit.impulses();
        Map<String, Double> totals = new LinkedHashMap<>();
        Map<String, EnergyAccount.Kind> kinds = new LinkedHashMap<>();
        for (EnergyAccount a : circuit.accounts()) {
            totals.put(a.name(), integrated[a.index()] + impulses[a.index()]);
            kinds.put(a.name(), a.kind());
        }
        return new EnergyBalance(totals, kinds);
    }

    private static BranchsimException translate(RuntimeException e, SolverSettings settings, FailureReporter reporter,
                                                String worstState) {
        Object specifier = e instanceof MathIllegalArgumentException mia ? mia.getSpecifier()
                : ((MathIllegalStateException) e).getSpecifier();
        String t = reporter.time(reporter.lastTime());
        if (specifier == LocalizedODEFormats.MINIMAL_STEPSIZE_REACHED_DURING_INTEGRATION) {
            String states = reporter.describeLastGood();
            if (worstState != null) {
                states = "largest error in state " + worstState + "; " + states;
            }
            return new BranchsimException(ErrorKey.STEP_UNDERFLOW, List.of(), e,
                    Double.toString(settings.minStep()), t, states);
        }
        if (specifier == LocalizedCoreFormats.MAX_COUNT_EXCEEDED) {
            return new BranchsimException(ErrorKey.TOO_MANY_EVALUATIONS, List.of(), e,
                    Long.toString(settings.maxEvaluations()), t, reporter.describeLastGood());
        }
        return new BranchsimException(ErrorKey.SOLVER_FAILED, List.of(), e, t, e.getMessage(),
                reporter.describeLastGood());
    }
}
