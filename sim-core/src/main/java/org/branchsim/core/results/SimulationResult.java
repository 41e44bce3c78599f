package org.branchsim.core.results;

import java.util.List;
import org.branchsim.core.model.Circuit;

/**
 * Everything one run produced.
 *
 * @param circuit the simulated circuit (its final modes; for metrics that need element parameters)
 * @param trace sampled signals
 * @param statistics solver statistics
 * @param energy energy balance
 * @param events events in time order
 * @param finalState the state vector at the end, SI
 */
public record SimulationResult(Circuit circuit, Trace trace, SolverStatistics statistics, EnergyBalance energy,
                               List<EventRecord> events, double[] finalState) {
}
