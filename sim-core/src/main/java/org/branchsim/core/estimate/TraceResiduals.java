package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.measured.Measurement;
import org.branchsim.core.measured.Resampling;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.Variant;
import org.branchsim.core.study.VariantOutcome;

/**
 * Residuals of a scenario against measured channels: for each point the free parameters are written into a copy
 * of the scenario (with any fixed values, such as a shorter end time), the copy is run, and for every measured
 * sample inside the window the residual is (simulated - measured) / sigma of its channel, the simulation
 * interpolated linearly at the sample's time. The points of a batch run in parallel.
 *
 * <p>With a shift range r > 0 the record's alignment is refined as one more free parameter (the last coordinate
 * u of a point): the simulation is read at t + delta, delta = r (2u - 1), s. A trigger crossing found on noisy
 * samples is only good to a fraction of a sample, and on a landing that rises 20 bar per ms a tenth of a
 * millisecond of misalignment is a residual of many noise deviations, which the physical parameters would
 * otherwise be bent to absorb.
 */
public final class TraceResiduals implements ResidualModel {

    private final String fileName;
    private final Located document;
    private final List<FreeParameter> free;
    private final Map<String, Object> fixed;
    private final List<String> signals = new ArrayList<>();
    private final List<double[]> times = new ArrayList<>();
    private final List<double[]> values = new ArrayList<>();
    private final double[] sigma;
    private final int threads;
    private final double shiftRange;
    private final List<String> failures = new ArrayList<>();

    /**
     * @param fileName scenario file name (for messages)
     * @param document the scenario document (not modified)
     * @param free the free parameters
     * @param fixed values written into every run besides the free ones (path to value as a scenario writes it)
     * @param measured the measured channels, on the simulation's time
     * @param sigma standard deviation of each channel's noise, SI (positive)
     * @param from start of the fitted window, s
     * @param to end of the fitted window, s
     * @param threads threads for a batch
     */
    public TraceResiduals(String fileName, Located document, List<FreeParameter> free, Map<String, Object> fixed,
                          List<Measurement> measured, double[] sigma, double from, double to, int threads) {
        this(fileName, document, free, fixed, measured, sigma, from, to, threads, 0.0);
    }

    /**
     * As the other constructor, with the record's alignment refined within +- {@code shiftRange} as the last
     * free parameter.
     *
     * @param shiftRange r, s (0: the alignment is kept as given)
     */
    public TraceResiduals(String fileName, Located document, List<FreeParameter> free, Map<String, Object> fixed,
                          List<Measurement> measured, double[] sigma, double from, double to, int threads,
                          double shiftRange) {
        if (!(shiftRange >= 0.0)) {
            throw new IllegalArgumentException("a shift range of zero or more seconds, not " + shiftRange);
        }
        this.shiftRange = shiftRange;
        this.fileName = fileName;
        this.document = document;
        this.free = List.copyOf(free);
        this.fixed = new LinkedHashMap<>(fixed);
        this.sigma = sigma.clone();
        this.threads = threads;
        for (Measurement m : measured) {
            double[] t = m.time();
            double[] x = m.values();
            List<Integer> keep = new ArrayList<>();
            for (int k = 0; k < t.length; k++) {
                if (t[k] >= from && t[k] <= to) {
                    keep.add(k);
                }
            }
            double[] kt = new double[keep.size()];
            double[] kx = new double[keep.size()];
            for (int i = 0; i < kt.length; i++) {
                kt[i] = t[keep.get(i)];
                kx[i] = x[keep.get(i)];
            }
            signals.add(m.signal());
            times.add(kt);
            values.add(kx);
        }
    }

    @Override
    public int parameters() {
        return free.size() + (shiftRange > 0.0 ? 1 : 0);
    }

    /** @return whether the alignment is refined as the last parameter */
    public boolean refinesShift() {
        return shiftRange > 0.0;
    }

    /**
     * @param u a point in [0, 1]^p
     * @return delta, s: the simulation is read at the measured sample's time plus delta (0 without refinement)
     */
    public double shift(double[] u) {
        return shiftRange > 0.0 ? shiftRange * (2.0 * u[free.size()] - 1.0) : 0.0;
    }

    /** @return the shift range r, s */
    public double shiftRange() {
        return shiftRange;
    }

    /** @return the number of residuals per point */
    public int observations() {
        return times.stream().mapToInt(t -> t.length).sum();
    }

    /** @return the first failures met (at most a few), for messages */
    public synchronized List<String> failures() {
        return List.copyOf(failures);
    }

    /**
     * @param u a point in [0, 1]^p
     * @return the values a run at u writes into the scenario (free and fixed), by path
     */
    public Map<String, Object> values(double[] u) {
        Map<String, Object> v = new LinkedHashMap<>(fixed);
        for (int k = 0; k < free.size(); k++) {
            v.put(free.get(k).path(), free.get(k).text(u[k]));
        }
        return v;
    }

    @Override
    public List<double[]> residuals(List<double[]> points) {
        List<Variant> variants = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            variants.add(new Variant(i, values(points.get(i))));
        }
        return StudyRunner.run(fileName, document, variants, threads, done -> { },
                o -> residuals(o, shift(points.get(o.variant().index()))));
    }

    private double[] residuals(VariantOutcome o, double delta) {
        if (!o.ok()) {
            synchronized (this) {
                if (failures.size() < 3) {
                    failures.add(o.error());
                }
            }
            return null;
        }
        Trace trace = o.result().trace();
        double[] st = trace.times();
        double[] out = new double[observations()];
        int at = 0;
        for (int c = 0; c < signals.size(); c++) {
            double[] when = times.get(c);
            if (delta != 0.0) {
                when = when.clone();
                for (int k = 0; k < when.length; k++) {
                    when[k] += delta;
                }
            }
            double[] sim = Resampling.linear(st, trace.series(signals.get(c)), when);
            double[] meas = values.get(c);
            for (int k = 0; k < sim.length; k++) {
                double r = (sim[k] - meas[k]) / sigma[c];
                out[at++] = Double.isFinite(r) ? r : LeastSquaresFit.FAILED_RESIDUAL;
            }
        }
        return out;
    }
}
