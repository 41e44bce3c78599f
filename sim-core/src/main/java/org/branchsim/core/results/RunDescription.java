package org.branchsim.core.results;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Member;
import org.branchsim.core.settings.SolverSettings;

/**
 * What a run was, all of it immutable: the model it ran (layout, signals with their dimensions, schedules),
 * the solver settings it ran with, and where its moving members ended up.
 *
 * @param model the circuit model that was run (shared, never changed by a run)
 * @param settings the solver settings of the run (times in s)
 * @param finalModes members held at a seat or stop at the end of the run: member id ({@code <element>.<member>})
 *        to its stop, sorted by id (free members are not listed)
 */
public record RunDescription(CircuitModel model, SolverSettings settings, Map<String, Member.Mode> finalModes) {

    /** Copies the held set, sorted by id, without free members. */
    public RunDescription {
        Map<String, Member.Mode> held = new TreeMap<>(finalModes);
        held.values().removeIf(m -> m == Member.Mode.FREE);
        finalModes = Collections.unmodifiableMap(held);
    }
}
