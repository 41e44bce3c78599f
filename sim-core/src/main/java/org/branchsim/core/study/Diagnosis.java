package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.IntConsumer;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;

/**
 * Finds why a circuit oscillates and what cures it: runs the scenario, looks for sustained oscillations,
 * links the strongest to the linearised mode nearest in frequency and to the parts that take part, tries the
 * {@link RemedyCatalogue} changes for those parts as variants, and reports which remove the oscillation and
 * what each costs in overshoot and settling of the reducing valves.
 */
public final class Diagnosis {

    /** Mode participation share above which a part counts as taking part. */
    public static final double PART_SHARE = 0.1;
    /** Most parts whose remedies are tried. */
    public static final int MAX_PARTS = 4;

    /**
     * What one remedy did.
     *
     * @param remedy the change
     * @param outcome the variant's run
     * @param remaining oscillations left after the change
     * @param metrics regulation metrics of the first reducing valve (null when none or when the run failed)
     */
    public record Trial(Remedy remedy, VariantOutcome outcome, List<OscillationFinding> remaining,
                        ReducingValveMetrics metrics) {
        /** @return true when the run succeeded and no sustained oscillation is left */
        public boolean cures() {
            return outcome.ok() && remaining.isEmpty();
        }
    }

    /**
     * The whole diagnosis.
     *
     * @param scenario the scenario
     * @param baseline its run
     * @param findings oscillations found in it, strongest first
     * @param mode the linearised mode nearest to the strongest oscillation (null when none is oscillatory)
     * @param parts the parts whose remedies were tried
     * @param baselineMetrics regulation metrics of the first reducing valve in the baseline (or null)
     * @param trials every remedy tried, in catalogue order
     * @param recommended the cure with the shortest settling time, then the smallest overshoot (or null)
     */
    public record Report(Scenario scenario, SimulationResult baseline, List<OscillationFinding> findings, Mode mode,
                         List<String> parts, ReducingValveMetrics baselineMetrics, List<Trial> trials,
                         Trial recommended) {
    }

    private Diagnosis() {
    }

    /**
     * @param scenario a loaded scenario
     * @param threads threads for the remedy runs
     * @param progress called with the number of remedy runs done
     * @return the report
     */
    public static Report run(Scenario scenario, int threads, IntConsumer progress) {
        SimulationResult baseline = Simulator.run(scenario.circuit(), scenario.solver());
        List<OscillationFinding> findings = OscillationScan.scan(baseline);
        ReducingValveMetrics baseMetrics = firstValve(baseline, scenario);
        if (findings.isEmpty()) {
            return new Report(scenario, baseline, findings, null, List.of(), baseMetrics, List.of(), null);
        }
        OscillationFinding main = findings.get(0);
        double end = baseline.trace().time(baseline.trace().size() - 1);
        List<Mode> modes = ModeAnalysis.onTrajectory(baseline.circuit(), end, baseline.finalState());
        Mode nearest = modes.stream().filter(Mode::oscillatory)
                .min(Comparator.comparingDouble(m -> Math.abs(Math.log(m.naturalFrequency() / main.frequency()))))
                .orElse(null);
        Set<String> parts = new LinkedHashSet<>();
        if (main.impactingMember() != null) {
            parts.add(ModeAnalysis.owner(main.impactingMember()));
        }
        if (nearest != null) {
            nearest.elements().stream().filter(s -> s.share() >= PART_SHARE).forEach(s -> parts.add(s.name()));
        }
        parts.addAll(main.elements());
        List<String> tried = new ArrayList<>(parts).subList(0, Math.min(MAX_PARTS, parts.size()));
        List<Remedy> remedies = RemedyCatalogue.candidates(scenario.document(), scenario.circuit(), tried);
        List<Variant> variants = new ArrayList<>();
        for (int i = 0; i < remedies.size(); i++) {
            Map<String, Object> v = new LinkedHashMap<>();
            v.put(remedies.get(i).path(), remedies.get(i).to());
            variants.add(new Variant(i, v));
        }
        List<VariantOutcome> outcomes = StudyRunner.run(scenario.file(), scenario.document(), variants, threads, progress);
        List<Trial> trials = new ArrayList<>();
        for (int i = 0; i < remedies.size(); i++) {
            VariantOutcome o = outcomes.get(i);
            List<OscillationFinding> left = o.ok() ? OscillationScan.scan(o.result()) : List.of();
            trials.add(new Trial(remedies.get(i), o, left, o.ok() ? firstValve(o.result(), o.scenario()) : null));
        }
        Trial best = trials.stream().filter(Trial::cures)
                .min(Comparator.comparingDouble((Trial t) -> cost(t.metrics())))
                .orElse(null);
        return new Report(scenario, baseline, findings, nearest, tried, baseMetrics, trials, best);
    }

    private static double cost(ReducingValveMetrics m) {
        if (m == null) {
            return 0.0;
        }
        double settle = Double.isFinite(m.settlingTime()) ? m.settlingTime() : 1e3;
        return settle + 1e-3 * Math.max(0.0, m.overshootPercent());
    }

    private static ReducingValveMetrics firstValve(SimulationResult r, Scenario s) {
        List<ReducingValveMetrics> list = ReducingValveMetrics.of(r, s.metricsFrom(), s.metricsTo());
        return list.isEmpty() ? null : list.get(0);
    }
}
