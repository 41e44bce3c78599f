package org.branchsim.plots;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.results.Trace;

/**
 * The quasi-static characteristic of one reducing valve read from a run's trace: the samples taken while the
 * scenario ramps the demand (outlet pressure against main flow) or the supply pressure (outlet pressure against
 * inlet pressure). It is a static characteristic only when the ramps are slow compared with the valve's response;
 * a fast ramp adds the valve's dynamics (lag, overshoot) to the curve. All values SI: pressures in Pa, flows in
 * m^3/s, times in s.
 *
 * @param id the valve's element id
 * @param setting the valve's setting, Pa
 * @param samples the samples in the ramp stretches, in time order
 */
public record ValveCharacteristic(String id, double setting, List<Sample> samples) {

    /** What a ramp stretch changes. */
    public enum Drive {
        /** the demand downstream (a valve opening, a load): outlet pressure against main flow */
        DEMAND,
        /** the supply pressure upstream: outlet pressure against inlet pressure */
        SUPPLY
    }

    /**
     * A stretch of the run in which the scenario ramps one kind of input in one direction.
     *
     * @param from start, s
     * @param to end, s
     * @param drive what is ramped
     * @param rising true when the ramped input rises (more demand, higher supply pressure)
     */
    public record Stretch(double from, double to, Drive drive, boolean rising) {

        /** @return the stretch in words, e.g. "demand rising" */
        public String label() {
            return (drive == Drive.DEMAND ? "demand " : "supply pressure ") + (rising ? "rising" : "falling");
        }
    }

    /**
     * One sample of the trace in a stretch.
     *
     * @param time time, s
     * @param stretch the stretch it lies in
     * @param flow main (inlet to outlet) flow, m^3/s
     * @param inlet inlet pressure, Pa
     * @param outlet outlet pressure, Pa
     * @param drain pilot drain flow, m^3/s
     */
    public record Sample(double time, Stretch stretch, double flow, double inlet, double outlet, double drain) {
    }

    public ValveCharacteristic {
        samples = List.copyOf(samples);
    }

    /**
     * @param trace the run's trace; must hold the valve's outlet pressure, main flow and drain flow
     * @param valve the valve
     * @param inlet the valve's inlet pressure at every trace sample, Pa
     * @param stretches the ramp stretches
     * @return the samples of the trace in the stretches (a sample in two stretches is taken once per stretch)
     */
    public static ValveCharacteristic of(Trace trace, ReducingValve valve, double[] inlet, List<Stretch> stretches) {
        double[] t = trace.times();
        double[] q = signal(trace, valve.mainFlowSignal());
        double[] out = signal(trace, valve.outletPressureSignal());
        double[] drain = signal(trace, valve.drainFlowSignal());
        if (inlet.length != t.length) {
            throw new IllegalArgumentException(inlet.length + " inlet pressures for " + t.length + " samples");
        }
        List<Sample> list = new ArrayList<>();
        for (Stretch s : stretches) {
            for (int k = 0; k < t.length; k++) {
                if (t[k] >= s.from() && t[k] <= s.to()) {
                    list.add(new Sample(t[k], s, q[k], inlet[k], out[k], drain[k]));
                }
            }
        }
        list.sort((a, b) -> Double.compare(a.time(), b.time()));
        return new ValveCharacteristic(valve.id(), valve.setting(), list);
    }

    private static double[] signal(Trace trace, String name) {
        int i = trace.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("the trace has no signal " + name);
        }
        return trace.series(i);
    }

    /** @return the samples of one drive */
    public List<Sample> samplesOf(Drive drive) {
        return samples.stream().filter(s -> s.stretch().drive() == drive).toList();
    }

    /**
     * @return the droop: least-squares slope of outlet pressure against main flow over all demand-ramp samples
     *         (rising and falling), Pa per m^3/s; NaN without demand samples
     */
    public double droop() {
        List<Sample> d = samplesOf(Drive.DEMAND);
        return StraightLineFit.of(d.stream().mapToDouble(Sample::flow).toArray(),
                d.stream().mapToDouble(Sample::outlet).toArray()).slope();
    }

    /**
     * @return the regulation deviation: highest minus lowest outlet pressure over all supply-ramp samples, Pa;
     *         NaN without supply samples
     */
    public double deviation() {
        List<Sample> s = samplesOf(Drive.SUPPLY);
        if (s.isEmpty()) {
            return Double.NaN;
        }
        return s.stream().mapToDouble(Sample::outlet).max().getAsDouble()
                - s.stream().mapToDouble(Sample::outlet).min().getAsDouble();
    }

    /** @return {lowest, highest} inlet pressure over the supply-ramp samples, Pa (NaN without them) */
    public double[] inletRange() {
        List<Sample> s = samplesOf(Drive.SUPPLY);
        if (s.isEmpty()) {
            return new double[] {Double.NaN, Double.NaN};
        }
        return new double[] {s.stream().mapToDouble(Sample::inlet).min().getAsDouble(),
            s.stream().mapToDouble(Sample::inlet).max().getAsDouble()};
    }
}
