package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;

/**
 * The damping ratio of a reducing valve in a finished run (dimensionless): the smallest damping ratio of the
 * modes of the circuit linearised at its operating point at the end of the metrics window, among the modes in
 * which the valve's own parts (its members and chambers, named {@code <valve>.<part>}) hold at least
 * {@link StabilitySearch#RELEVANT_SHARE} of the participation (1 when no mode involves them: nothing of the valve
 * oscillates). Negative: a mode of the valve grows, the valve hunts. This is the margin {@code diagnose} asks of a
 * cure (docs/theory.md section 8.3), so a specification can ask it of a design.
 */
public final class ValveDamping {

    /** Part of the metrics window, at its end, over which the state is averaged to start the operating point. */
    static final double AVERAGED_FRACTION = 0.1;

    private ValveDamping() {
    }

    /**
     * @param circuit the model that was run
     * @param result its run
     * @param metricsFrom start of the metrics window, s
     * @param metricsTo end of the metrics window, s
     * @param valveId the reducing valve's id
     * @return the valve's damping ratio, or NaN when the circuit has no operating point there (still moving)
     */
    public static double of(CircuitModel circuit, SimulationResult result, double metricsFrom, double metricsTo,
                            String valveId) {
        double end = result.trace().time(result.trace().size() - 1);
        double to = Math.min(metricsTo, end);
        double from = Math.max(metricsFrom, to - AVERAGED_FRACTION * (to - metricsFrom));
        List<Mode> modes;
        try {
            OperatingPoint op = OperatingPointSolver.solve(circuit, to, OperatingPointSolver.startFrom(result, from, to));
            modes = ModeAnalysis.at(circuit, op);
        } catch (BranchsimException e) {
            return Double.NaN;
        }
        return StabilitySearch.relevantDamping(modes, partsOf(modes, valveId));
    }

    /** @return the names of the valve's own parts among the modes' parts */
    static List<String> partsOf(List<Mode> modes, String valveId) {
        List<String> parts = new ArrayList<>();
        for (Mode m : modes) {
            for (Mode.Share s : m.parts()) {
                if (s.name().startsWith(valveId + ".") && !parts.contains(s.name())) {
                    parts.add(s.name());
                }
            }
        }
        return parts;
    }
}
