package org.branchsim.core.model;

import java.util.Locale;

/**
 * A corner or step of a scheduled input at a fixed time: g = t - t_corner. The solver stops there and
 * restarts with fresh derivatives, so no step straddles the change; its time is known, so the implicit solver
 * lands on it exactly (the explicit ones locate the sign change of g).
 */
final class ScheduleCorner implements Discontinuity {
    private final String input;
    private final double time;
    private final String description;

    ScheduleCorner(String input, double time) {
        this.input = input;
        this.time = time;
        this.description = String.format(Locale.ROOT, "%s changes at t = %.6g s", input, time);
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public String kind() {
        return "schedule";
    }

    @Override
    public String owner() {
        return input.substring(0, Math.max(0, input.indexOf('.')));
    }

    @Override
    public double knownTime() {
        return time;
    }

    @Override
    public double g(StateView state) {
        return state.time() - time;
    }

    @Override
    public Response onCrossing(boolean increasing, StateEditor state) {
        return Response.RECOMPUTE;
    }
}
