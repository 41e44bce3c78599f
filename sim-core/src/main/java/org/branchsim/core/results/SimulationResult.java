package org.branchsim.core.results;

import java.util.List;
import org.branchsim.core.model.CircuitModel;

/**
 * Everything one run produced.
 *
 * @param description what was run: the model, the settings, the members' final modes
 * @param trace sampled signals
 * @param statistics solver statistics
 * @param energy energy balance
 * @param events events in time order
 * @param finalState the state vector at the end, SI, in the order of the model's states
 */
public record SimulationResult(RunDescription description, Trace trace, SolverStatistics statistics,
                               EnergyBalance energy, List<EventRecord> events, double[] finalState) {

    /** Copies the events and the final state. */
    public SimulationResult {
        events = List.copyOf(events);
        finalState = finalState.clone();
    }

    /** @return the model that was run */
    public CircuitModel model() {
        return description.model();
    }

    /** @return a copy of the state vector at the end, SI */
    @Override
    public double[] finalState() {
        return finalState.clone();
    }
}
