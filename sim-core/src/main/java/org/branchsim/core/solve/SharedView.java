package org.branchsim.core.solve;

import org.branchsim.core.model.Circuit;
import org.branchsim.core.model.StateView;
import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * One view of the circuit shared by all event detectors: Hipparchus hands every detector the same state
 * object at each check time, so the view is set up once per state instead of once per detector.
 */
final class SharedView {
    private final Circuit circuit;
    private ODEStateAndDerivative last;
    private StateView view;

    SharedView(Circuit circuit) {
        this.circuit = circuit;
    }

    StateView of(ODEStateAndDerivative state) {
        if (state != last) {
            view = circuit.view(state.getTime(), state.getPrimaryState());
            last = state;
        }
        return view;
    }

    /** Forgets the cached state (after anything else used the circuit's view). */
    void invalidate() {
        last = null;
    }
}
