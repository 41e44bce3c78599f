package org.branchsim.core.solve;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.model.Member;

/**
 * An operating point of a circuit: a state y with f(t, y) = 0 over the free states at a fixed time t
 * (scheduled inputs frozen at their values at t), members held at a seat or stop held there. Found by
 * {@link OperatingPointSolver}.
 *
 * @param time time, s
 * @param state the state vector, SI, in the order of the model's states (held members at their stop with zero
 *        velocity)
 * @param stateNames the names of the states, in the same order
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
public record OperatingPoint(double time, double[] state, List<String> stateNames, Map<String, Member.Mode> held,
                             int iterations, int switches, double residual, String worstState, double worstRate,
                             boolean converged, String failure) {

    /** Copies the state, the names and the held set. */
    public OperatingPoint {
        state = state.clone();
        stateNames = List.copyOf(stateNames);
        held = Collections.unmodifiableMap(new TreeMap<>(held));
        if (stateNames.size() != state.length) {
            throw new IllegalArgumentException("an operating point needs a name per state: " + stateNames.size()
                    + " names for " + state.length + " states");
        }
    }

    /** @return every state's value by name, SI, in the order of the model's states */
    public Map<String, Double> stateByName() {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int i = 0; i < state.length; i++) {
            out.put(stateNames.get(i), state[i]);
        }
        return Collections.unmodifiableMap(out);
    }

    /** @return a copy of the state vector, SI */
    @Override
    public double[] state() {
        return state.clone();
    }
}
