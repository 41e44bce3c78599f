package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.branchsim.core.units.Dimension;

/**
 * A time-scheduled input of an element (a valve opening, a pump speed, a load force): a function of time made
 * of ramps from the value at their start to a target, each either linear or an S-curve (cubic smoothstep,
 * {@link Shape#S_CURVE}). A ramp of zero duration is a step; a table of values against time is a chain of
 * linear ramps. The solver places an event at every corner so that no step straddles one. Ramps are added while the
 * circuit is assembled; building the {@link CircuitModel} fixes them, so every run of the model sees the same
 * schedule.
 */
public final class ScheduledInput {

    /** How a ramp moves from its start value to its target. */
    public enum Shape {
        /** At constant rate: v = v0 + (v1 - v0) f, f = (t - t0) / duration. */
        LINEAR,
        /**
         * Cubic smoothstep, v = v0 + (v1 - v0) (3 f^2 - 2 f^3): zero rate at both ends, so the input and its rate
         * are continuous; the peak rate is 1.5 times the linear ramp's, at mid-ramp.
         */
        S_CURVE;

        /**
         * @param f fraction of the ramp's duration elapsed, 0 to 1
         * @return fraction of the change made, 0 to 1
         */
        public double progress(double f) {
            return this == LINEAR ? f : f * f * (3.0 - 2.0 * f);
        }
    }

    /**
     * One change: from {@code start} (s), move to {@code target} (SI) in {@code duration} (s) along a shape.
     *
     * @param start start time, s
     * @param duration duration, s (0: a step)
     * @param target value at the end, SI
     * @param shape linear or S-curve
     */
    public record Ramp(double start, double duration, double target, Shape shape) {
        /** A linear ramp (or a step when the duration is 0). */
        public Ramp(double start, double duration, double target) {
            this(start, duration, target, Shape.LINEAR);
        }
    }

    private final String name;
    private final Dimension dimension;
    private final double initial;
    private final List<Ramp> ramps = new ArrayList<>();
    private double[] times = new double[0];
    private double[] values = new double[0];
    private Shape[] shapes = new Shape[0];
    private boolean fixed;

    /**
     * @param name input name, {@code <element>.<input>}
     * @param dimension dimension of the value
     * @param initial value before the first ramp, SI
     */
    public ScheduledInput(String name, Dimension dimension, double initial) {
        this.name = name;
        this.dimension = dimension;
        this.initial = initial;
        rebuild();
    }

    /** @return the input's name */
    public String name() {
        return name;
    }

    /** @return the input's dimension */
    public Dimension dimension() {
        return dimension;
    }

    /**
     * Adds a ramp; ramps are applied in start-time order and must not overlap (checked by the reader).
     *
     * @throws IllegalStateException once the model holding this input is built (its schedule is fixed then)
     */
    public void addRamp(Ramp ramp) {
        if (fixed) {
            throw new IllegalStateException("the schedule of " + name + " is fixed once its circuit model is built");
        }
        ramps.add(ramp);
        ramps.sort((a, b) -> Double.compare(a.start(), b.start()));
        rebuild();
    }

    /** Fixes the schedule (the model is being built). */
    void fix() {
        fixed = true;
    }

    private void rebuild() {
        List<Double> t = new ArrayList<>();
        List<Double> v = new ArrayList<>();
        List<Shape> s = new ArrayList<>();
        double current = initial;
        for (Ramp r : ramps) {
            s.add(r.shape());
            t.add(r.start());
            v.add(current);
            t.add(r.start() + r.duration());
            v.add(r.target());
            current = r.target();
        }
        times = t.stream().mapToDouble(Double::doubleValue).toArray();
        values = v.stream().mapToDouble(Double::doubleValue).toArray();
        shapes = s.toArray(new Shape[0]);
    }

    /**
     * @param t time, s
     * @return the input's value at t, SI. At a step the value after the step is returned.
     */
    public double valueAt(double t) {
        if (times.length == 0) {
            return initial;
        }
        if (t >= times[times.length - 1]) {
            return values[values.length - 1]; // after the last ramp (the common case in a long run)
        }
        double result = initial;
        for (int i = 0; i < times.length; i += 2) {
            double t0 = times[i];
            double t1 = times[i + 1];
            if (t < t0) {
                break;
            }
            if (t >= t1) {
                result = values[i + 1];
            } else {
                double f = shapes[i / 2].progress((t - t0) / (t1 - t0));
                result = values[i] + f * (values[i + 1] - values[i]);
            }
        }
        return result;
    }

    /** @return the ramps in start-time order */
    public List<Ramp> ramps() {
        return List.copyOf(ramps);
    }

    /** @return true when a ramp of non-zero duration is under way at time t (start included, end excluded) */
    public boolean rampingAt(double t) {
        for (Ramp r : ramps) {
            if (r.duration() > 0.0 && t >= r.start() && t < r.start() + r.duration()) {
                return true;
            }
        }
        return false;
    }

    /** @return the times (s) where the function has a corner or a step, without duplicates */
    public double[] corners() {
        TreeSet<Double> set = new TreeSet<>();
        for (double t : times) {
            set.add(t);
        }
        return set.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
