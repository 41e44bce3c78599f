package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.model.StateSlot;

/**
 * Remembers the last accepted state so that a failure can name the simulated time and the states that
 * were changing fastest (relative to their typical magnitude) when it happened.
 */
final class FailureReporter {
    private final RunEngine engine;
    private double lastTime;
    private double[] lastState;

    FailureReporter(RunEngine engine, double t0, double[] y0) {
        this.engine = engine;
        this.lastTime = t0;
        this.lastState = y0.clone();
    }

    void accepted(double t, double[] y) {
        lastTime = t;
        lastState = y;
    }

    double lastTime() {
        return lastTime;
    }

    String time(double t) {
        return String.format(Locale.ROOT, "%.9g", t);
    }

    /** @return the five states changing fastest at the last good state, with values and rates */
    String describeLastGood() {
        double[] yDot = new double[lastState.length];
        try {
            engine.derivatives(lastTime, lastState.clone(), yDot);
        } catch (RuntimeException e) {
            return "unavailable (" + e.getMessage() + ")";
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < lastState.length; i++) {
            order.add(i);
        }
        List<StateSlot> slots = engine.model().states();
        order.sort(Comparator.comparingDouble((Integer i) -> -Math.abs(yDot[i]) / slots.get(i).absoluteScale()));
        StringBuilder sb = new StringBuilder("at t = " + time(lastTime) + " s, fastest-changing: ");
        for (int k = 0; k < Math.min(5, order.size()); k++) {
            int i = order.get(k);
            StateSlot s = slots.get(i);
            if (k > 0) {
                sb.append("; ");
            }
            sb.append(String.format(Locale.ROOT, "%s = %.6g %s (rate %.3g %s/s)", s.name(), lastState[i],
                    s.dimension().siSymbol(), yDot[i], s.dimension().siSymbol()));
        }
        return sb.toString();
    }
}
