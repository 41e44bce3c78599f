package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;

/**
 * Finds, on the linear model, how far one parameter must move to damp an oscillation with margin.
 * <p>
 * For a value v of the parameter the scenario is rebuilt with v, its operating point is found by a Newton solve
 * started from the baseline's operating point (same held members, same time), and the modes there are computed.
 * The damping of the oscillation, zeta(v), is the smallest damping ratio of the modes in which the oscillation's
 * parts take part (at least {@link #RELEVANT_SHARE} of the mode's participation); the damping of the circuit is
 * the smallest over all modes. The search samples zeta on {@link #GRID} values spaced evenly in log(v) over the
 * knob's range, walks from the current value outwards in each direction to the first sample damped with margin,
 * and refines by bisection in log(v): the <em>threshold</em> where zeta crosses 0 (the oscillation stops growing)
 * and the <em>margin value</em> where zeta reaches the margin. The recommended value lies
 * {@link #MARGIN_OVERSHOOT} further from the current value than the margin value, in log(v), so that parameter
 * scatter of that size keeps zeta above the margin (for a parameter that is zero now, such as a damping left at its
 * default, {@link #MARGIN_OVERSHOOT} above the margin value); it is rounded to three significant digits away from the
 * current value and checked again.
 */
public final class StabilitySearch {

    /** Samples over each knob's range. */
    public static final int GRID = 13;
    /** Bisection steps for each crossing (the crossing is then known to about 2^-12 of a grid interval in log). */
    public static final int BISECTIONS = 12;
    /** Least participation of the oscillation's parts in a mode for that mode to count as the oscillation's. */
    public static final double RELEVANT_SHARE = 0.25;
    /** How much further than the margin value, as a fraction of its log-distance from the current value. */
    public static final double MARGIN_OVERSHOOT = 0.25;

    /** Direction of a change. */
    public enum Direction {
        /** A larger value. */
        RAISE,
        /** A smaller value. */
        LOWER;

        /** @return lower-case label */
        public String label() {
            return this == RAISE ? "raise" : "lower";
        }
    }

    /**
     * What the linear model says of one knob moved in one direction.
     *
     * @param knob the parameter
     * @param direction which way it moves
     * @param zetaNow damping of the oscillation at the current value
     * @param threshold value at which the oscillation's damping crosses zero, SI (NaN when it is not negative at
     *        the current value or does not cross in this direction)
     * @param marginValue value at which it reaches the margin, SI (NaN when it does not within the range)
     * @param recommended recommended value, SI (NaN when there is none)
     * @param zetaRecommended damping of the oscillation at the recommended value (NaN when none)
     * @param zetaAllRecommended smallest damping ratio of all modes at the recommended value (NaN when none)
     * @param bestZeta best damping of the oscillation seen in this direction, when the margin is not reached
     */
    public record Outcome(RemedyKnob knob, Direction direction, double zetaNow, double threshold,
                          double marginValue, double recommended, double zetaRecommended,
                          double zetaAllRecommended, double bestZeta) {

        /** @return true when the linear model finds a value with margin in this direction */
        public boolean reachesMargin() {
            return Double.isFinite(recommended);
        }
    }

    /** Damping of a variant: of the oscillation's modes, and of all modes (NaN when no operating point). */
    private record Damping(double relevant, double all) {
        static final Damping UNKNOWN = new Damping(Double.NaN, Double.NaN);
    }

    private final Scenario scenario;
    private final OperatingPoint base;
    private final Set<String> parts;
    private final double margin;

    /**
     * @param scenario the scenario as loaded
     * @param base its operating point (time, state and held members are reused for every variant)
     * @param parts the oscillation's parts (members and nodes), e.g. from its matched mode
     * @param margin the damping ratio asked for, e.g. 0.05
     */
    public StabilitySearch(Scenario scenario, OperatingPoint base, Collection<String> parts, double margin) {
        this.scenario = scenario;
        this.base = base;
        this.parts = Set.copyOf(parts);
        this.margin = margin;
    }

    /**
     * @param modes modes at an operating point
     * @param parts the oscillation's parts
     * @return the smallest damping ratio of the modes in which those parts take part at least
     *         {@link #RELEVANT_SHARE} (1 when there is none: nothing of the oscillation is left to oscillate)
     */
    public static double relevantDamping(List<Mode> modes, Collection<String> parts) {
        double zeta = 1.0;
        for (Mode m : modes) {
            double share = 0.0;
            for (Mode.Share s : m.parts()) {
                if (parts.contains(s.name())) {
                    share += s.share();
                }
            }
            if (share >= RELEVANT_SHARE) {
                zeta = Math.min(zeta, m.dampingRatio());
            }
        }
        return zeta;
    }

    /** @return the smallest damping ratio of all modes (1 when there are none) */
    public static double smallestDamping(List<Mode> modes) {
        double zeta = 1.0;
        for (Mode m : modes) {
            zeta = Math.min(zeta, m.dampingRatio());
        }
        return zeta;
    }

    /**
     * @param knob the parameter to move
     * @return what the linear model says in each direction the knob's range leaves room for (both; only up from
     *         zero; only down for a metering width already at its full size)
     */
    public List<Outcome> search(RemedyKnob knob) {
        double[] grid = new double[GRID];
        double lo = Math.log(knob.lowest());
        double hi = Math.log(knob.highest());
        for (int i = 0; i < GRID; i++) {
            grid[i] = Math.exp(lo + (hi - lo) * i / (GRID - 1));
        }
        Damping now = damping(knob, knob.current());
        List<Outcome> out = new ArrayList<>();
        if (knob.highest() > knob.current() * (1 + 1e-9)) {
            out.add(walk(knob, grid, now, Direction.RAISE));
        }
        if (!knob.absolute() && knob.lowest() < knob.current() * (1 - 1e-9)) {
            out.add(walk(knob, grid, now, Direction.LOWER));
        }
        return out;
    }

    private Outcome walk(RemedyKnob knob, double[] grid, Damping now, Direction dir) {
        List<Double> path = new ArrayList<>();
        if (dir == Direction.RAISE) {
            for (double v : grid) {
                if (v > knob.current() * (1 + 1e-9)) {
                    path.add(v);
                }
            }
        } else {
            for (int i = grid.length - 1; i >= 0; i--) {
                if (grid[i] < knob.current() * (1 - 1e-9)) {
                    path.add(grid[i]);
                }
            }
        }
        double prevValue = knob.current();
        double prevZeta = now.relevant();
        double best = prevZeta;
        double threshold = Double.NaN;
        for (double v : path) {
            Damping d = damping(knob, v);
            if (Double.isNaN(d.relevant())) {
                break;
            }
            best = Double.isNaN(best) ? d.relevant() : Math.max(best, d.relevant());
            if (Double.isNaN(threshold) && now.relevant() < 0 && d.relevant() >= 0 && Double.isFinite(prevZeta)) {
                threshold = bisect(knob, prevValue, v, 0.0);
            }
            if (d.relevant() >= margin && Double.isFinite(prevZeta)) {
                double marginValue = prevZeta >= margin ? prevValue : bisect(knob, prevValue, v, margin);
                return recommend(knob, dir, now.relevant(), threshold, marginValue, best);
            }
            prevValue = v;
            prevZeta = d.relevant();
        }
        return new Outcome(knob, dir, now.relevant(), threshold, Double.NaN, Double.NaN, Double.NaN, Double.NaN, best);
    }

    private Outcome recommend(RemedyKnob knob, Direction dir, double zetaNow, double threshold, double marginValue,
                              double best) {
        double target = knob.absolute() ? marginValue * (1 + MARGIN_OVERSHOOT)
                : Math.exp(Math.log(marginValue) + MARGIN_OVERSHOOT * (Math.log(marginValue) - Math.log(knob.current())));
        target = Math.max(knob.lowest(), Math.min(knob.highest(), target));
        double rounded = roundAway(knob, target, dir);
        Damping d = damping(knob, rounded);
        if (!(d.relevant() >= margin)) {
            return new Outcome(knob, dir, zetaNow, threshold, marginValue, Double.NaN, Double.NaN, Double.NaN,
                    Math.max(best, Double.isNaN(d.relevant()) ? best : d.relevant()));
        }
        return new Outcome(knob, dir, zetaNow, threshold, marginValue, rounded, d.relevant(), d.all(), best);
    }

    /** Rounds to three significant digits in the knob's unit, away from the current value. */
    private double roundAway(RemedyKnob knob, double si, Direction dir) {
        org.branchsim.core.units.Unit unit = knob.unit(scenario.units());
        double shown = unit.fromSi(si);
        double scale = Math.pow(10, Math.floor(Math.log10(Math.abs(shown))) - 2);
        double r = dir == Direction.RAISE ? Math.ceil(shown / scale) * scale : Math.floor(shown / scale) * scale;
        return unit.toSi(RemedyKnob.roundTo3(r));
    }

    /** Bisection in log(v) for the value where the oscillation's damping crosses {@code level}. */
    private double bisect(RemedyKnob knob, double below, double above, double level) {
        double a = Math.log(below);
        double b = Math.log(above);
        for (int i = 0; i < BISECTIONS; i++) {
            double mid = 0.5 * (a + b);
            Damping d = damping(knob, Math.exp(mid));
            if (Double.isNaN(d.relevant())) {
                break;
            }
            if (d.relevant() >= level) {
                b = mid;
            } else {
                a = mid;
            }
        }
        return Math.exp(b);
    }

    private Damping damping(RemedyKnob knob, double value) {
        try {
            Scenario variant = StudyRunner.build(scenario.file(), scenario.document(),
                    Map.of(knob.path(), knob.exactText(value, scenario.units())));
            OperatingPoint op = OperatingPointSolver.solve(variant.circuit(), base.time(), base.state(), base.held());
            List<Mode> modes = ModeAnalysis.at(variant.circuit(), op);
            return new Damping(relevantDamping(modes, parts), smallestDamping(modes));
        } catch (BranchsimException e) {
            return Damping.UNKNOWN;
        }
    }
}
