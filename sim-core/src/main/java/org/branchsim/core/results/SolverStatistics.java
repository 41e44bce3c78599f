package org.branchsim.core.results;

import java.util.Map;

/**
 * How hard the solver worked on one run.
 *
 * @param method integration method name
 * @param acceptedSteps steps accepted
 * @param rejectedSteps steps tried and rejected by the error control
 * @param evaluations evaluations of the circuit equations, every one counted: right-hand sides for steps, stages
 *        and Jacobians, and signal and power samples for the output grid and the energy accounts
 * @param jacobians Jacobian evaluations (0 for explicit methods)
 * @param factorisations LU factorisations (0 for explicit methods)
 * @param events events handled, by kind (seat, stop, contact, corner, schedule)
 * @param wallSeconds wall-clock time of the integration, s
 * @param simulatedSeconds simulated time span, s
 */
public record SolverStatistics(String method, long acceptedSteps, long rejectedSteps, long evaluations,
                               long jacobians, long factorisations, Map<String, Integer> events,
                               double wallSeconds, double simulatedSeconds) {

    /** @return total events handled */
    public int totalEvents() {
        return events.values().stream().mapToInt(Integer::intValue).sum();
    }
}
