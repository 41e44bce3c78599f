package org.branchsim.core.solve;

import java.text.MessageFormat;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;

/**
 * The arguments of an {@link ErrorKey#NO_OPERATING_POINT} message: the time, why the solve stopped, the states
 * changing most (at the start state when something is in transit, since the iterate then says little; else at
 * the last Newton iterate), and what is still moving: members in transit, and shafts (velocity states of no
 * member) turning and still accelerating at the last iterate.
 */
final class NoOperatingPointReport {

    private NoOperatingPointReport() {
    }

    /**
     * @param engine the solve's engine, its member modes at the last held set
     * @param t time, s
     * @param reason why the solve stopped, with its counts
     * @param start the start
     * @param y the last iterate, SI
     * @return the message arguments
     */
    static Object[] arguments(RunEngine engine, double t, String reason, OperatingPointStart start, double[] y) {
        Map<String, Member.Mode> lastHeld = engine.heldMembers();
        List<StateSlot> free = Linearisation.freeStates(engine);
        double[] f = new double[y.length];
        engine.derivatives(t, y, f);
        List<StateSlot> top = fastest(engine, f, free);
        List<String> moving = new ArrayList<>();
        start.moving().forEach((id, speed) -> moving.add(String.format(Locale.ROOT, "%s is still moving at %.4g m/s",
                id, speed)));
        Set<Integer> memberVelocities = new HashSet<>();
        for (Member m : engine.model().members()) {
            memberVelocities.add(engine.position(m.velocitySlot()));
        }
        for (StateSlot s : top) {
            double speed = y[engine.position(s)];
            if ((s.dimension() == Dimension.VELOCITY || s.dimension() == Dimension.ROTATIONAL_SPEED)
                    && !memberVelocities.contains(engine.position(s))
                    && Math.abs(speed) > OperatingPointSolver.MOVING_FRACTION * s.absoluteScale()) {
                moving.add(String.format(Locale.ROOT, "%s is still moving at %.4g %s", part(s.name()), speed,
                        s.dimension().siSymbol()));
            }
        }
        String changing = "at the last Newton iterate: " + describe(engine, y, f, top);
        if (!start.moving().isEmpty()) {
            engine.hold(start.held());
            double[] y0 = start.state();
            double[] f0 = new double[y0.length];
            engine.derivatives(t, y0.clone(), f0);
            changing = "in the start state: " + describe(engine, y0, f0,
                    fastest(engine, f0, Linearisation.freeStates(engine)));
            engine.hold(lastHeld);
        }
        String suffix = moving.isEmpty()
                ? "; linearise on the trajectory (--on-trajectory) to see modes about the simulated state"
                : "; " + String.join(", ", moving) + ": the circuit has no operating point at this time; "
                + "linearise on the trajectory (--on-trajectory) to see modes about the moving state";
        return new Object[] {String.format(Locale.ROOT, "%.6g", t).replaceAll("\\.?0+$", ""), reason, changing, suffix};
    }

    /** @return the message those arguments give */
    static String message(Object[] arguments) {
        return new MessageFormat(ErrorKey.NO_OPERATING_POINT.pattern(), Locale.ROOT).format(arguments);
    }

    private static List<StateSlot> fastest(RunEngine engine, double[] f, List<StateSlot> free) {
        List<StateSlot> order = new ArrayList<>(free);
        order.sort(Comparator.comparingDouble((StateSlot s) -> -Math.abs(f[engine.position(s)]) / s.absoluteScale()));
        return order.subList(0, Math.min(OperatingPointSolver.REPORTED_STATES, order.size()));
    }

    private static String describe(RunEngine engine, double[] y, double[] f, List<StateSlot> states) {
        List<String> parts = new ArrayList<>();
        for (StateSlot s : states) {
            String unit = s.dimension().siSymbol();
            int i = engine.position(s);
            parts.add(String.format(Locale.ROOT, "%s = %.6g %s (rate %.4g %s/s)", s.name(), y[i], unit, f[i], unit));
        }
        return parts.isEmpty() ? "none (no free states)" : String.join("; ", parts);
    }

    private static String part(String stateName) {
        int dot = stateName.lastIndexOf('.');
        return dot < 0 ? stateName : stateName.substring(0, dot);
    }
}
