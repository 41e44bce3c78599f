package org.branchsim.core.solve;

import java.util.HashMap;
import java.util.Map;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.StateView;
import org.hipparchus.ode.events.AdaptableInterval;

/**
 * How often each discontinuity's switching function is checked inside a step of the explicit methods (the
 * implicit ones use {@link StepCheckTimes}): a member's seat and stop
 * events every fifth of the member's natural period 2 pi sqrt(m/k) (k its stiffness at the start of the run),
 * so that a member crossing a stop and coming back within one step is still seen; everything else, and a
 * member without a restoring stiffness, at most every longest step (in practice at step ends). Times in s.
 */
final class CheckIntervals {

    /** Checks per natural period of a member (common practice, no source: five samples per cycle see a swing). */
    static final double CHECKS_PER_PERIOD = 5.0;

    private final double maxStep;
    private final Map<String, Double> memberInterval = new HashMap<>();

    /**
     * @param engine the run's engine, its member modes initialised
     * @param maxStep longest step, s
     * @param y0 initial state, SI
     */
    CheckIntervals(RunEngine engine, double maxStep, double[] y0) {
        this.maxStep = maxStep;
        StateView start = engine.view(0.0, y0);
        for (Member m : engine.model().members()) {
            double period = m.naturalPeriod(start);
            if (period > 0.0 && Double.isFinite(period)) {
                memberInterval.put(m.id(), Math.min(maxStep, period / CHECKS_PER_PERIOD));
            }
        }
    }

    /** @return the check interval of member {@code id}'s stop events, s, or the longest step when it has none */
    double ofMember(String id) {
        return memberInterval.getOrDefault(id, maxStep);
    }

    /**
     * @return the shortest check interval of any member's stop events, s (the longest step when no member has
     *         a restoring stiffness): a step no longer than this cannot hold a member's swing out and back
     */
    double shortest() {
        return memberInterval.values().stream().mapToDouble(Double::doubleValue).min().orElse(maxStep);
    }

    /** @return the check interval of one discontinuity */
    AdaptableInterval of(Discontinuity d) {
        boolean stop = d.kind().equals("seat") || d.kind().equals("stop");
        return AdaptableInterval.of(stop ? ofMember(d.owner()) : maxStep);
    }
}
