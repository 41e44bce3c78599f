package org.branchsim.core.solve;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.parts.TravelLimitedMass;

/**
 * An operating point of a circuit: a state y with f(t, y) = 0 over the free states at a fixed time t
 * (scheduled inputs frozen at their values at t), members held at a seat or stop held there. Found by
 * {@link OperatingPointSolver}.
 *
 * @param time time, s
 * @param state the state vector, SI, in solver order (held members at their stop with zero velocity)
 * @param held members held at a stop: member id ({@code <element>.<member>}) to the stop holding it, sorted
 *        by id
 * @param iterations Newton iterations taken, over all active sets
 * @param switches active-set changes (a member held at a stop or released)
 * @param residual scaled residual max_i |f_i| / s_i over the free states, 1/s (s_i the state's typical
 *        magnitude, {@link org.branchsim.core.model.StateSlot#absoluteScale()})
 * @param worstState the free state with the largest scaled residual
 * @param worstRate that state's rate f_i, SI per second
 * @param converged true when the convergence rule of {@link OperatingPointSolver} holds
 * @param failure why the solve failed (empty when it converged)
 */
public record OperatingPoint(double time, double[] state, Map<String, TravelLimitedMass.Mode> held, int iterations,
                             int switches, double residual, String worstState, double worstRate, boolean converged,
                             String failure) {

    /** Copies the state and the held set. */
    public OperatingPoint {
        state = state.clone();
        held = Collections.unmodifiableMap(new TreeMap<>(held));
    }

    /** @return a copy of the state vector, SI */
    @Override
    public double[] state() {
        return state.clone();
    }
}
