package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.elements.Motor;
import org.branchsim.core.model.Element;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;

/**
 * Speed, torque and power of each hydraulic motor of a run over an analysed window [from, to] (all SI). Measured
 * from: the speed is the shaft speed state (rad/s, positive when port a is the inlet); the torque is the one the
 * pressure difference applies to the shaft, D (p_a - p_b) (N*m, before friction and load); the power is that
 * torque times the speed (W): positive while the oil drives the shaft, negative while the load drives the motor
 * and it pumps (an overrunning load). "Steady" is the mean over the last {@link #STEADY_FRACTION} of the window;
 * the mean power is the shaft work over the window divided by its length (trapezoidal rule on the output grid).
 *
 * @param id motor id
 * @param from window start, s
 * @param to window end, s
 * @param peakSpeed highest speed, rad/s
 * @param peakSpeedTime its time, s
 * @param lowestSpeed lowest speed (negative: the motor ran backwards), rad/s
 * @param lowestSpeedTime its time, s
 * @param steadySpeed steady speed, rad/s
 * @param peakTorque torque of the largest magnitude, N*m
 * @param peakTorqueTime its time, s
 * @param steadyTorque steady torque, N*m
 * @param peakPower highest power, W
 * @param meanPower mean power over the window, W
 * @param drivenTime time within the window during which the load drove the motor (power below zero), s
 */
public record MotorMetrics(String id, double from, double to, double peakSpeed, double peakSpeedTime,
                           double lowestSpeed, double lowestSpeedTime, double steadySpeed, double peakTorque,
                           double peakTorqueTime, double steadyTorque, double peakPower, double meanPower,
                           double drivenTime) {

    /** Fraction of the window averaged for steady values. */
    public static final double STEADY_FRACTION = 0.1;

    /**
     * @param result a run
     * @param from start of the analysed window, s
     * @param to end of the analysed window, s (beyond the run: the end of the run)
     * @return metrics of every motor in the circuit, in circuit order
     */
    public static List<MotorMetrics> of(SimulationResult result, double from, double to) {
        List<MotorMetrics> out = new ArrayList<>();
        for (Element e : result.model().elements()) {
            if (e instanceof Motor m) {
                out.add(of(m, result.trace(), from, to));
            }
        }
        return out;
    }

    static MotorMetrics of(Motor m, Trace trace, double from, double to) {
        double[] t = trace.times();
        double[] w = trace.series(m.speedSignal());
        double[] torque = trace.series(m.torqueSignal());
        double[] power = trace.series(m.powerSignal());
        int start = 0;
        while (start < t.length - 1 && t[start] < from) {
            start++;
        }
        int end = t.length - 1;
        while (end > start + 1 && t[end] > to) {
            end--;
        }
        int steadyStart = Math.max(start, end - (int) Math.floor((end - start) * STEADY_FRACTION));
        int hi = start;
        int lo = start;
        int tq = start;
        int pw = start;
        double work = 0.0;
        double driven = 0.0;
        for (int k = start; k <= end; k++) {
            if (w[k] > w[hi]) {
                hi = k;
            }
            if (w[k] < w[lo]) {
                lo = k;
            }
            if (Math.abs(torque[k]) > Math.abs(torque[tq])) {
                tq = k;
            }
            if (power[k] > power[pw]) {
                pw = k;
            }
            if (k > start) {
                double dt = t[k] - t[k - 1];
                work += 0.5 * (power[k] + power[k - 1]) * dt;
                if (power[k] < 0.0 && power[k - 1] < 0.0) {
                    driven += dt;
                }
            }
        }
        double span = t[end] - t[start];
        return new MotorMetrics(m.id(), t[start], t[end], w[hi], t[hi], w[lo], t[lo], mean(w, steadyStart, end),
                torque[tq], t[tq], mean(torque, steadyStart, end), power[pw], span > 0.0 ? work / span : power[start],
                driven);
    }

    private static double mean(double[] x, int from, int to) {
        double s = 0.0;
        for (int k = from; k <= to; k++) {
            s += x[k];
        }
        return s / (to - from + 1);
    }
}
