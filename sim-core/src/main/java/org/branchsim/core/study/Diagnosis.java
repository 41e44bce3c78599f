package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntConsumer;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.analysis.ModeMatch;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.ScanWindow;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;

/**
 * Finds why a circuit oscillates and what cures it with margin.
 * <ol>
 * <li>Run the scenario and scan it ({@link OscillationScan}): every oscillation is one finding.</li>
 * <li>For each finding, run to the end of the window where it is strongest, average the states over its last
 * whole cycles, and solve for the operating point there ({@link OperatingPointSolver}); linearise there and tie
 * the finding to its mode ({@link ModeMatch}), which names its parts.</li>
 * <li>For the parameters of those parts ({@link RemedyCatalogue}), find on the linear model the value at which the
 * oscillation's modes are damped with the margin, in both directions ({@link StabilitySearch}).</li>
 * <li>Run every such value in the time domain from the start of the run and scan it in the same windows: a change
 * cures when no oscillation of the finding's parts is left and no new one appears.</li>
 * <li>Recommend the cure that costs the job least ({@link JobCost}).</li>
 * </ol>
 */
public final class Diagnosis {

    /** Most findings diagnosed (the strongest first). */
    public static final int MAX_FINDINGS = 3;
    /** Least share of the matched mode for a part to be named and to have its parameters tried. */
    public static final double PART_SHARE = 0.1;
    /** Most parts whose parameters are tried per finding. */
    public static final int MAX_PARTS = 4;

    /**
     * How to diagnose.
     *
     * @param margin damping ratio a cure must give every mode of the oscillation, e.g. 0.05
     * @param window one window to scan instead of the default ones (null: the default windows)
     * @param onTrajectory linearise about the simulated state when there is no operating point
     * @param threads threads for the time-domain runs
     */
    public record Options(double margin, ScanWindow window, boolean onTrajectory, int threads) {
    }

    /**
     * A change tried in the time domain.
     *
     * @param linear what the linear model said of it
     * @param value the new value as written into the scenario
     * @param hardware the change in words of the trade
     * @param outcome the run with the change
     * @param remaining oscillations of the finding's parts left after the change, or new ones
     * @param metrics regulation metrics of every reducing valve with the change
     * @param cost cost to the job ({@link JobCost})
     */
    public record Trial(StabilitySearch.Outcome linear, String value, String hardware, VariantOutcome outcome,
                        List<OscillationFinding> remaining, List<ReducingValveMetrics> metrics, double cost) {
        /** @return true when the run succeeded and no oscillation of the finding is left */
        public boolean cures() {
            return outcome.ok() && remaining.isEmpty();
        }
    }

    /**
     * The diagnosis of one finding.
     *
     * @param finding the oscillation, named by its mode's parts when matched
     * @param operatingPoint the operating point at the end of its window (null when there is none)
     * @param noOperatingPoint why there is none (null when there is one)
     * @param linearisedOnTrajectory true when the modes are about the simulated state (no operating point)
     * @param modes the modes there
     * @param otherLowModes modes not involved in the oscillation whose damping is below the margin already
     * @param linear the linear search of every knob and direction
     * @param trials the time-domain runs of the values with margin
     * @param recommended the cure that costs the job least (null when none cures)
     * @param resonance for a forced response, the mode nearest its drive and the drive's magnification there (null
     *        otherwise, or when no oscillatory mode is known); a forced response gets no remedy search, since damping
     *        does not remove it
     */
    public record FindingDiagnosis(OscillationFinding finding, OperatingPoint operatingPoint, String noOperatingPoint,
                                   boolean linearisedOnTrajectory, List<Mode> modes, List<Mode> otherLowModes,
                                   List<StabilitySearch.Outcome> linear, List<Trial> trials, Trial recommended,
                                   DriveResonance resonance) {

        /** @return true when the finding is driven from outside (a pump's ripple) rather than self-sustained */
        public boolean forced() {
            return finding.drivenBy() != null;
        }
    }

    /**
     * The whole diagnosis.
     *
     * @param scenario the scenario
     * @param baseline its run
     * @param windows the windows scanned
     * @param margin the damping margin asked for
     * @param baselineMetrics regulation metrics of every reducing valve as it is
     * @param findings every oscillation found, strongest first
     * @param diagnosed the diagnosis of the strongest {@link #MAX_FINDINGS}
     */
    public record Report(Scenario scenario, SimulationResult baseline, List<ScanWindow> windows, double margin,
                         List<ReducingValveMetrics> baselineMetrics, List<OscillationFinding> findings,
                         List<FindingDiagnosis> diagnosed) {
    }

    private Diagnosis() {
    }

    /**
     * @param scenario a loaded scenario (its circuit is used for the baseline run)
     * @param options how to diagnose
     * @param progress called with the number of time-domain remedy runs done
     * @return the report
     */
    public static Report run(Scenario scenario, Options options, IntConsumer progress) {
        SimulationResult baseline = Simulator.run(scenario.circuit(), scenario.solver());
        double end = baseline.trace().time(baseline.trace().size() - 1);
        List<ScanWindow> windows = options.window() != null ? List.of(options.window())
                : ScanWindow.between(scenario.circuit().inputs(), end);
        List<OscillationFinding> findings = OscillationScan.scan(baseline, windows);
        List<FindingDiagnosis> diagnosed = new ArrayList<>();
        List<OscillationFinding> named = new ArrayList<>();
        int done = 0;
        for (OscillationFinding f : findings) {
            if (diagnosed.size() >= MAX_FINDINGS) {
                named.add(f);
                continue;
            }
            int offset = done;
            FindingDiagnosis d = diagnose(scenario, options, windows, findings, f, n -> progress.accept(offset + n));
            done += d.trials().size();
            diagnosed.add(d);
            named.add(d.finding());
        }
        List<ReducingValveMetrics> metrics = ReducingValveMetrics.of(baseline, scenario.metricsFrom(),
                scenario.metricsTo(), named);
        return new Report(scenario, baseline, windows, options.margin(), metrics, List.copyOf(named),
                List.copyOf(diagnosed));
    }

    private static FindingDiagnosis diagnose(Scenario scenario, Options options, List<ScanWindow> windows,
                                             List<OscillationFinding> baselineFindings, OscillationFinding f,
                                             IntConsumer progress) {
        ScanWindow w = f.window();
        SimulationResult partial = Simulator.run(scenario.circuit(), scenario.solver().withEndTime(w.to()));
        double cycles = Math.max(1.0, Math.floor(w.length() * f.frequency()));
        double from = Math.max(w.from(), w.to() - cycles / f.frequency());
        OperatingPoint op = null;
        String noOp = null;
        List<Mode> modes = List.of();
        boolean onTrajectory = false;
        try {
            op = OperatingPointSolver.solve(scenario.circuit(), w.to(),
                    OperatingPointSolver.startFrom(partial, from, w.to()));
            modes = ModeAnalysis.at(scenario.circuit(), op);
        } catch (BranchsimException e) {
            noOp = e.getMessage();
            if (options.onTrajectory()) {
                modes = ModeAnalysis.onTrajectory(partial);
                onTrajectory = true;
            }
        }
        ModeMatch match = ModeMatch.find(f, modes, options.margin());
        OscillationFinding named = match == null ? f : f.withMode(match, PART_SHARE);
        List<String> parts = named.parts().subList(0, Math.min(MAX_PARTS, named.parts().size()));
        List<Mode> otherLow = new ArrayList<>();
        for (Mode m : modes) {
            if (m != (match == null ? null : match.mode())
                    && StabilitySearch.relevantDamping(List.of(m), parts) >= 1.0 && m.dampingRatio() < options.margin()) {
                otherLow.add(m);
            }
        }
        if (f.drivenBy() != null) {
            // a forced response lasts while its source runs: no damping change removes it, so no remedy is searched
            return new FindingDiagnosis(named, op, noOp, onTrajectory, modes, otherLow, List.of(), List.of(), null,
                    DriveResonance.nearest(f.frequency(), modes));
        }
        if (op == null) {
            return new FindingDiagnosis(named, null, noOp, onTrajectory, modes, otherLow, List.of(), List.of(), null,
                    null);
        }
        List<RemedyKnob> knobs = RemedyCatalogue.knobs(scenario.document(), scenario.circuit(), parts);
        StabilitySearch search = new StabilitySearch(scenario, op, parts, options.margin());
        List<StabilitySearch.Outcome> linear = new ArrayList<>();
        for (RemedyKnob k : knobs) {
            linear.addAll(search.search(k));
        }
        List<Trial> trials = trials(scenario, options, windows, baselineFindings, parts, linear, progress);
        Trial best = trials.stream().filter(Trial::cures).min(Comparator.comparingDouble(Trial::cost)).orElse(null);
        return new FindingDiagnosis(named, op, null, false, modes, otherLow, linear, trials, best, null);
    }

    private static List<Trial> trials(Scenario scenario, Options options, List<ScanWindow> windows,
                                      List<OscillationFinding> baselineFindings, List<String> parts,
                                      List<StabilitySearch.Outcome> linear, IntConsumer progress) {
        List<StabilitySearch.Outcome> tried = linear.stream().filter(StabilitySearch.Outcome::reachesMargin).toList();
        List<Variant> variants = new ArrayList<>();
        for (int i = 0; i < tried.size(); i++) {
            StabilitySearch.Outcome o = tried.get(i);
            Map<String, Object> values = new LinkedHashMap<>();
            values.put(o.knob().path(), o.knob().text(o.recommended(), scenario.units()));
            variants.add(new Variant(i, values));
        }
        List<VariantOutcome> runs = StudyRunner.run(scenario.file(), scenario.document(), variants,
                options.threads(), progress);
        List<Trial> out = new ArrayList<>();
        for (int i = 0; i < tried.size(); i++) {
            StabilitySearch.Outcome o = tried.get(i);
            VariantOutcome run = runs.get(i);
            List<OscillationFinding> remaining = List.of();
            List<ReducingValveMetrics> metrics = List.of();
            double cost = Double.POSITIVE_INFINITY;
            if (run.ok()) {
                List<OscillationFinding> found = OscillationScan.scan(run.result(), windows);
                remaining = found.stream().filter(v -> touches(v, parts) || isNew(v, baselineFindings)).toList();
                metrics = ReducingValveMetrics.of(run.result(), scenario.metricsFrom(), scenario.metricsTo(), found);
                cost = JobCost.of(metrics, o.knob().absolute() ? Double.NaN : o.recommended() / o.knob().current());
            }
            out.add(new Trial(o, o.knob().text(o.recommended(), scenario.units()),
                    o.knob().hardware(o.recommended(), scenario.units()), run, remaining, metrics, cost));
        }
        return out;
    }

    private static boolean touches(OscillationFinding f, List<String> parts) {
        return f.parts().stream().anyMatch(parts::contains);
    }

    private static boolean isNew(OscillationFinding f, List<OscillationFinding> baseline) {
        for (OscillationFinding b : baseline) {
            double ratio = f.frequency() / b.frequency();
            if (ratio < OscillationScan.SAME_OSCILLATION_RATIO && ratio > 1.0 / OscillationScan.SAME_OSCILLATION_RATIO
                    && f.parts().stream().anyMatch(b.parts()::contains)) {
                return false;
            }
        }
        return true;
    }
}
