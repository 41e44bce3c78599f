package org.branchsim.core.solve;

import java.util.List;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.StateEditor;
import org.branchsim.core.results.EventRecord;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/** Turns one {@link Discontinuity} of a run's model into a Hipparchus event detector and handler. */
final class DiscontinuityDetector extends AbstractODEDetector<DiscontinuityDetector> {

    private final RunEngine engine;
    private final SharedView views;
    private final Discontinuity discontinuity;
    private final List<EventRecord> log;
    private final Handler handler = new Handler();

    DiscontinuityDetector(RunEngine engine, SharedView views, Discontinuity discontinuity, List<EventRecord> log,
                          AdaptableInterval maxCheck, int maxIter,
                          BracketedUnivariateSolver<UnivariateFunction> solver) {
        super(maxCheck, maxIter, solver, null);
        this.engine = engine;
        this.views = views;
        this.discontinuity = discontinuity;
        this.log = log;
    }

    @Override
    protected DiscontinuityDetector create(AdaptableInterval newMaxCheck, int newMaxIter,
                                           BracketedUnivariateSolver<UnivariateFunction> newSolver,
                                           ODEEventHandler newHandler) {
        return new DiscontinuityDetector(engine, views, discontinuity, log, newMaxCheck, newMaxIter, newSolver);
    }

    @Override
    public ODEEventHandler getHandler() {
        return handler;
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return discontinuity.g(views.of(state));
    }

    /** Applies the discontinuity's response and keeps the edited state for the reset. */
    private final class Handler implements ODEEventHandler {
        private double[] edited;

        @Override
        public Action eventOccurred(ODEStateAndDerivative state, ODEEventDetector detector, boolean increasing) {
            double[] y = state.getPrimaryState();
            StateEditor editor = engine.editor(state.getTime(), y);
            Discontinuity.Response r = discontinuity.onCrossing(increasing, editor);
            views.invalidate();
            switch (r) {
                case STATE_CHANGED:
                    edited = y;
                    log.add(new EventRecord(state.getTime(), discontinuity.kind(), discontinuity.owner(),
                            discontinuity.description()));
                    return Action.RESET_STATE;
                case RECOMPUTE:
                    log.add(new EventRecord(state.getTime(), discontinuity.kind(), discontinuity.owner(),
                            discontinuity.description() + (discontinuity.kind().equals("seat")
                                    || discontinuity.kind().equals("stop") ? " (leaves)" : "")));
                    return Action.RESET_DERIVATIVES;
                default:
                    return Action.CONTINUE;
            }
        }

        @Override
        public ODEState resetState(ODEEventDetector detector, ODEStateAndDerivative state) {
            return new ODEState(state.getTime(), edited);
        }
    }
}
