package org.branchsim.core.solve;

import org.branchsim.core.model.StateView;
import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * One view of the run's state shared by all event detectors: Hipparchus hands every detector the same state
 * object at each check time, so the view is set up once per state instead of once per detector.
 */
final class SharedView {
    private final RunEngine engine;
    private ODEStateAndDerivative last;
    private StateView view;

    SharedView(RunEngine engine) {
        this.engine = engine;
    }

    StateView of(ODEStateAndDerivative state) {
        if (state != last) {
            view = engine.view(state.getTime(), state.getPrimaryState());
            last = state;
        }
        return view;
    }

    /** Forgets the cached state (after anything else used the run's view). */
    void invalidate() {
        last = null;
    }
}
