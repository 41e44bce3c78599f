package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.units.UnitSystem;

/**
 * A scenario read and checked: the circuit to simulate, how to solve it and how to present the results.
 *
 * @param name scenario name (used for the output folder)
 * @param description free text from the file
 * @param file where it was read from
 * @param circuit the circuit model, immutable: run it any number of times, on any number of threads
 * @param solver solver settings
 * @param units unit system of the outputs
 * @param plots plot groups the scenario asks for, besides the standard ones
 * @param metricsFrom start of the window for regulation metrics, s (leaves start-up out)
 * @param metricsTo end of that window, s (the end time unless given)
 * @param document the parsed document, for building variants (sweeps)
 * @param notes located notes that did not stop the scenario, e.g. old spellings accepted for one more release
 */
public record Scenario(String name, String description, String file, CircuitModel circuit, SolverSettings solver,
                       UnitSystem units, List<PlotGroup> plots, double metricsFrom, double metricsTo,
                       Located document, List<String> notes) {

    /**
     * A figure the scenario asks for.
     *
     * @param title figure title
     * @param signals signal names to draw
     */
    public record PlotGroup(String title, List<String> signals) {
    }
}
