package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.branchsim.core.units.Dimension;

/**
 * A time-scheduled input of an element (a valve opening, a pump speed, a load force): a piecewise-linear
 * function of time made of ramps from the value at their start to a target. A ramp of zero duration is a
 * step. The solver places an event at every corner so that no step straddles one. Ramps are added while the
 * circuit is assembled; building the {@link CircuitModel} fixes them, so every run of the model sees the same
 * schedule.
 */
public final class ScheduledInput {

    /** One change: from {@code start} (s), move linearly to {@code target} (SI) in {@code duration} (s). */
    public record Ramp(double start, double duration, double target) {
    }

    private final String name;
    private final Dimension dimension;
    private final double initial;
    private final List<Ramp> ramps = new ArrayList<>();
    private double[] times = new double[0];
    private double[] values = new double[0];
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
        double current = initial;
        for (Ramp r : ramps) {
            t.add(r.start());
            v.add(current);
            t.add(r.start() + r.duration());
            v.add(r.target());
            current = r.target();
        }
        times = t.stream().mapToDouble(Double::doubleValue).toArray();
        values = v.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /**
     * @param t time, s
     * @return the input's value at t, SI. At a step the value after the step is returned.
     */
    public double valueAt(double t) {
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
                double f = (t - t0) / (t1 - t0);
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
