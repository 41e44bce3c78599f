package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ValveDamping;
import org.branchsim.core.study.Variant;
import org.branchsim.core.study.VariantOutcome;

/**
 * Runs designs of a scenario against a specification: each point u in [0, 1]^p is written into a copy of the
 * scenario (the free parameters at their values), run, scanned for oscillations (a valve that still oscillates
 * is not settled) and measured by the valve's metrics over the scenario's metrics window. Batches run in
 * parallel; every evaluation is kept by point for the report.
 */
public final class SpecObjective {

    private final String fileName;
    private final Located document;
    private final SpecFile spec;
    private final int threads;
    private final Map<List<Double>, DesignEvaluation> seen = new ConcurrentHashMap<>();

    /**
     * @param fileName scenario file name (for messages)
     * @param document scenario document (not modified)
     * @param spec the specification
     * @param threads threads per batch
     */
    public SpecObjective(String fileName, Located document, SpecFile spec, int threads) {
        this.fileName = fileName;
        this.document = document;
        this.spec = spec;
        this.threads = threads;
    }

    /** @return the values a design at u writes into the scenario, by path */
    public Map<String, Object> values(double[] u) {
        Map<String, Object> v = new LinkedHashMap<>();
        for (int k = 0; k < spec.free().size(); k++) {
            v.put(spec.free().get(k).path(), spec.free().get(k).text(u[k]));
        }
        return v;
    }

    /**
     * @param points designs in [0, 1]^p
     * @return the objective of each (NaN when the run failed)
     */
    public double[] objective(List<double[]> points) {
        List<DesignEvaluation> e = evaluate(points);
        double[] out = new double[e.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = e.get(i).error() != null ? Double.NaN : e.get(i).objective();
        }
        return out;
    }

    /** @return the evaluation of each point (kept for {@link #evaluation}) */
    public List<DesignEvaluation> evaluate(List<double[]> points) {
        List<Variant> variants = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            variants.add(new Variant(i, values(points.get(i))));
        }
        List<DesignEvaluation> out = evaluateVariants(variants);
        for (int i = 0; i < points.size(); i++) {
            seen.put(key(points.get(i)), out.get(i));
        }
        return out;
    }

    /**
     * @param variants variants of the scenario (any values)
     * @return the evaluation of each against the specs
     */
    public List<DesignEvaluation> evaluateVariants(List<Variant> variants) {
        return StudyRunner.run(fileName, document, variants, threads, d -> { }, this::evaluate);
    }

    /** @return the evaluation kept for a point, or null */
    public DesignEvaluation evaluation(double[] u) {
        return seen.get(key(u));
    }

    private DesignEvaluation evaluate(VariantOutcome o) {
        if (!o.ok()) {
            return DesignEvaluation.failed(spec.specs().size(), o.error());
        }
        List<OscillationFinding> findings = OscillationScan.scan(o.result());
        ReducingValveMetrics m = null;
        for (ReducingValveMetrics v : ReducingValveMetrics.of(o.result(), o.scenario().metricsFrom(),
                o.scenario().metricsTo(), findings)) {
            if (v.id().equals(spec.valve())) {
                m = v;
            }
        }
        if (m == null) {
            return DesignEvaluation.failed(spec.specs().size(), "no reducing valve \"" + spec.valve() + "\"");
        }
        double damping = Double.NaN;
        if (spec.specs().stream().anyMatch(sp -> sp.metric().needsModes())) {
            damping = ValveDamping.of(o.scenario().circuit(), o.result(), o.scenario().metricsFrom(),
                    o.scenario().metricsTo(), spec.valve());
        }
        double[] values = new double[spec.specs().size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = spec.specs().get(i).metric().of(m, damping);
        }
        return DesignEvaluation.of(spec.specs(), values);
    }

    private static List<Double> key(double[] u) {
        List<Double> k = new ArrayList<>();
        for (double x : u) {
            k.add(x);
        }
        return k;
    }
}
