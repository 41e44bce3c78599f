package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.EnergyBalance;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.RunDescription;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.stiff.RosenbrockIntegrator;
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
import org.hipparchus.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.hipparchus.exception.LocalizedCoreFormats;

/**
 * Runs a circuit model in time with Hipparchus: the only place that knows the integrator. Each run has its own
 * engine (member modes, impulse ledger, work buffers), so the model is only read and one model may be run many
 * times, on many threads at once. Registers every discontinuity as an event detector, checked inside the implicit
 * methods' steps where its switching function has an extremum along the dense output ({@link StepCheckTimes}) and
 * inside the explicit methods' steps at a fifth of a member's natural period ({@link CheckIntervals}); the
 * implicit methods land on the ones at known times (schedule corners) instead. Samples the output grid from the
 * dense output, integrates the energy accounts, and turns solver failures into {@link BranchsimException}s naming
 * the time and the states.
 */
public final class Simulator {

    private Simulator() {
    }

    /**
     * @param model the model to run (not changed)
     * @param settings solver settings
     * @return the run's description, trace, statistics, energy balance and events
     * @throws BranchsimException when the integration fails
     */
    public static SimulationResult run(CircuitModel model, SolverSettings settings) {
        RunEngine engine = new RunEngine(model);
        double[] y0 = model.initialState();
        engine.initialiseModes(0.0, y0);

        List<Trace.Column> columns = new ArrayList<>();
        for (SignalHandle h : model.signals()) {
            columns.add(new Trace.Column(h.name(), h.dimension()));
        }
        Trace trace = new Trace(columns);
        FailureReporter reporter = new FailureReporter(engine, 0.0, y0);
        List<EventRecord> log = new ArrayList<>();

        double[] absTol = new double[model.dimension()];
        double[] relTol = new double[model.dimension()];
        List<StateSlot> slots = model.states();
        for (int i = 0; i < absTol.length; i++) {
            absTol[i] = settings.relativeTolerance() * slots.get(i).absoluteScale();
            relTol[i] = settings.relativeTolerance();
        }
        AdaptiveStepsizeIntegrator integrator = IntegratorFactory.create(settings, absTol, relTol, engine);
        integrator.setMaxEvaluations((int) Math.min(Integer.MAX_VALUE, settings.maxEvaluations()));

        SharedView views = new SharedView(engine);
        boolean implicit = integrator instanceof RosenbrockIntegrator;
        CheckIntervals intervals = new CheckIntervals(engine, settings.maxStep(), y0);
        StepCheckTimes checkTimes = new StepCheckTimes(intervals.shortest());
        KnownTimes known = implicit ? new KnownTimes(log) : null;
        for (Discontinuity d : model.discontinuities()) {
            if (known != null && known.accepts(d)) {
                continue;
            }
            DiscontinuityDetector detector = new DiscontinuityDetector(engine, views, d, log,
                    implicit ? checkTimes : intervals.of(d), 200,
                    new BracketingNthOrderBrentSolver(0.0, settings.eventTolerance(), 0.0, 5));
            checkTimes.watch(detector::g);
            integrator.addEventDetector(detector);
        }
        if (implicit) {
            RosenbrockIntegrator rosenbrock = (RosenbrockIntegrator) integrator;
            rosenbrock.setKnownTimes(known.times(), known::landed);
            rosenbrock.setStepListener(checkTimes::inspect);
            rosenbrock.setSolutionPointMarker(engine::markSolutionPoint);
            engine.rememberMarkedPointsOnly();
        }
        GridSampler sampler = new GridSampler(engine, trace, settings.outputInterval(), settings.endTime(), reporter);
        EnergyQuadrature quadrature = new EnergyQuadrature(engine);
        integrator.addStepHandler(sampler);
        integrator.addStepHandler(quadrature);

        CircuitEquations equations = new CircuitEquations(engine, reporter);
        long start = System.nanoTime();
        ODEStateAndDerivative end;
        try {
            end = integrator.integrate(new ExpandableODE(equations), new ODEState(0.0, y0), settings.endTime());
        } catch (BranchsimException e) {
            throw e;
        } catch (MathIllegalArgumentException | MathIllegalStateException e) {
            throw translate(e, settings, reporter, IntegratorFactory.worstState(integrator, model));
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
                sampler.steps(), IntegratorFactory.rejected(integrator), engine.evaluations(),
                IntegratorFactory.jacobians(integrator), IntegratorFactory.factorisations(integrator),
                eventCounts, wall, settings.endTime());
        return new SimulationResult(new RunDescription(model, settings, engine.heldMembers()), trace, stats,
                energy(engine, quadrature), log, end.getPrimaryState());
    }

    /**
     * The signals of a model at one instant without integrating, its members in the modes a run starting there
     * would give them (e.g. a static characteristic, or a circuit of tanks only, which has no state to integrate).
     *
     * @param model the model (not changed)
     * @param t time, s
     * @param y state, SI, in the order of the model's states
     * @return every signal, SI, in the model's signal order
     */
    public static double[] signalsAt(CircuitModel model, double t, double[] y) {
        RunEngine engine = new RunEngine(model);
        engine.initialiseModes(t, y);
        return engine.sampleSignals(t, y);
    }

    private static EnergyBalance energy(RunEngine engine, EnergyQuadrature quadrature) {
        double[] integrated = quadrature.energy();
        double[] impulses = engine.impulses();
        Map<String, Double> totals = new LinkedHashMap<>();
        Map<String, EnergyAccount.Kind> kinds = new LinkedHashMap<>();
        for (EnergyAccount a : engine.model().accounts()) {
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
