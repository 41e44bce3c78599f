package org.branchsim.core.study;

import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;

/**
 * What one variant produced: its scenario and result, or the message of the error that stopped it.
 *
 * @param variant the variant
 * @param scenario its scenario (null when it could not be built)
 * @param result its run (null on error)
 * @param error the error message (null on success)
 */
public record VariantOutcome(Variant variant, Scenario scenario, SimulationResult result, String error) {

    /** @return true when the variant ran */
    public boolean ok() {
        return error == null;
    }
}
