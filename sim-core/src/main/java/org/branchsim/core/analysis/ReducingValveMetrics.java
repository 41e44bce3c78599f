package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.model.Element;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;

/**
 * How well each reducing valve of a run regulated (all SI): setting, peak outlet pressure, overshoot above
 * the steady value, settling into a band of +-{@link #BAND} of the setting <em>centred on the setting</em>, the
 * steady outlet pressure and its deviation from the setting (reported separately: a valve whose steady deviation
 * exceeds the band never counts as settled), and, at steady state, the pilot drain flow and the power lost in the
 * pilot stage and across the metering edge. "Steady" means the mean over the last tenth of the analysed window
 * [from, to], chosen so that start-up and later disturbances can be left out.
 * <p>
 * The settling time is measured from the last rise of the outlet through {@link #RISE_FRACTION} of the setting
 * before the peak (the landing of the actuator, say) to the time after which the outlet stays inside the band.
 * A valve whose outlet still oscillates (an oscillation finding in the window that involves its outlet or
 * members, see {@link #withPersistingOscillation}) is never reported as settled.
 *
 * @param id valve id
 * @param setting setting, Pa
 * @param peak peak outlet pressure in the window, Pa
 * @param peakTime its time, s
 * @param steady steady outlet pressure, Pa
 * @param overshoot peak minus steady, Pa
 * @param deviation steady minus setting, Pa
 * @param riseTime time of the last rise through {@link #RISE_FRACTION} of the setting before the peak, s (NaN when
 *        the outlet did not rise through it in the window): what the settling time is measured from
 * @param settledAt time after which the outlet stays in the band, s (the window start if it never left; NaN when
 *        it is outside the band at the end of the window or still oscillates)
 * @param settlingTime settledAt minus riseTime, s (NaN when either is undefined)
 * @param settled true when the outlet is inside the band at the end of the window and does not oscillate
 * @param oscillationFrequency fundamental of an oscillation that persists at this valve, Hz (NaN when none)
 * @param drainFlow steady pilot drain flow, m^3/s
 * @param drainPower steady power lost in the pilot stage (damping orifice, pilot seat), W
 * @param meteringPower steady power lost across the metering edge, W
 */
public record ReducingValveMetrics(String id, double setting, double peak, double peakTime, double steady,
                                   double overshoot, double deviation, double riseTime, double settledAt,
                                   double settlingTime, boolean settled, double oscillationFrequency,
                                   double drainFlow, double drainPower, double meteringPower) {

    /** Half-width of the settling band, centred on the setting, as a fraction of the setting. */
    public static final double BAND = 0.02;
    /** Fraction of the window averaged for steady values. */
    public static final double STEADY_FRACTION = 0.1;
    /** Fraction of the setting whose crossing on the way up starts the settling time. */
    public static final double RISE_FRACTION = 0.9;

    /** @return overshoot as a percentage of the setting */
    public double overshootPercent() {
        return 100.0 * overshoot / setting;
    }

    /** @return deviation as a percentage of the setting */
    public double deviationPercent() {
        return 100.0 * deviation / setting;
    }

    /** @return true when an oscillation persists at this valve */
    public boolean oscillating() {
        return Double.isFinite(oscillationFrequency);
    }

    /**
     * @param frequency fundamental of an oscillation found at this valve in the window, Hz
     * @return these metrics, no longer settled
     */
    public ReducingValveMetrics withPersistingOscillation(double frequency) {
        return new ReducingValveMetrics(id, setting, peak, peakTime, steady, overshoot, deviation, riseTime,
                Double.NaN, Double.NaN, false, frequency, drainFlow, drainPower, meteringPower);
    }

    /**
     * @param result a run
     * @param from start of the analysed window, s
     * @param to end of the analysed window, s (beyond the run: the end of the run)
     * @return metrics of every reducing valve in the circuit, in circuit order
     */
    public static List<ReducingValveMetrics> of(SimulationResult result, double from, double to) {
        List<ReducingValveMetrics> out = new ArrayList<>();
        for (Element e : result.model().elements()) {
            if (e instanceof ReducingValve v) {
                out.add(of(v, result.trace(), from, to));
            }
        }
        return out;
    }

    /**
     * Metrics of every reducing valve, marked as not settled where an oscillation found in [from, to] involves
     * the valve (its outlet signal oscillates, or one of its members or nodes is among the finding's parts).
     *
     * @param result a run
     * @param from start of the analysed window, s
     * @param to end of the analysed window, s
     * @param findings oscillations found in the run
     * @return metrics, in circuit order
     */
    public static List<ReducingValveMetrics> of(SimulationResult result, double from, double to,
                                                List<OscillationFinding> findings) {
        List<ReducingValveMetrics> out = new ArrayList<>();
        for (ReducingValveMetrics m : of(result, from, to)) {
            ReducingValveMetrics marked = m;
            for (OscillationFinding f : findings) {
                if (f.overlaps(from, to) && f.involves(m.id())) {
                    marked = m.withPersistingOscillation(f.frequency());
                    break;
                }
            }
            out.add(marked);
        }
        return out;
    }

    static ReducingValveMetrics of(ReducingValve v, Trace trace, double from, double to) {
        double[] t = trace.times();
        double[] p = trace.series(v.outletPressureSignal());
        int start = 0;
        while (start < t.length - 1 && t[start] < from) {
            start++;
        }
        int end = t.length - 1;
        while (end > start + 1 && t[end] > to) {
            end--;
        }
        int steadyStart = Math.max(start, end - (int) Math.floor((end - start) * STEADY_FRACTION));
        double steady = mean(p, steadyStart, end);
        int iPeak = start;
        for (int k = start; k <= end; k++) {
            if (p[k] > p[iPeak]) {
                iPeak = k;
            }
        }
        double band = BAND * v.setting();
        int lastOutside = -1;
        for (int k = start; k <= end; k++) {
            if (Math.abs(p[k] - v.setting()) > band) {
                lastOutside = k;
            }
        }
        boolean settled = lastOutside < end;
        double settledAt = lastOutside < 0 ? t[start] : (settled ? t[lastOutside + 1] : Double.NaN);
        double rise = Double.NaN;
        for (int k = Math.max(start, 1); k <= iPeak; k++) {
            if (p[k - 1] < RISE_FRACTION * v.setting() && p[k] >= RISE_FRACTION * v.setting()) {
                rise = t[k];
            }
        }
        double settlingTime = Double.isNaN(rise) || Double.isNaN(settledAt) ? Double.NaN : Math.max(0.0, settledAt - rise);
        return new ReducingValveMetrics(v.id(), v.setting(), p[iPeak], t[iPeak], steady, p[iPeak] - steady,
                steady - v.setting(), rise, settledAt, settlingTime, settled, Double.NaN,
                mean(trace.series(v.drainFlowSignal()), steadyStart, end),
                mean(trace.series(v.drainPowerSignal()), steadyStart, end),
                mean(trace.series(v.meteringPowerSignal()), steadyStart, end));
    }

    private static double mean(double[] x, int from, int to) {
        double s = 0.0;
        for (int k = from; k <= to; k++) {
            s += x[k];
        }
        return s / (to - from + 1);
    }
}
