package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Gathers the oscillation components of many signals into physical oscillations. Components are taken from
 * the lowest fundamental up (ties: stronger first, then by signal name); a component joins the first-made group
 * whose fundamental F it matches as an integer multiple m &gt;= 1 (|f - m F| &lt;=
 * {@link OscillationDetector#HARMONIC_TOLERANCE} F, the nearest such group if several), otherwise it starts a new
 * group. So components at one frequency share a group, and a signal that shows only the second harmonic of a
 * motion joins the group of its fundamental; because groups are started from the lowest frequency up, the
 * group's fundamental is the lowest consistent one. The group's frequency is the strength-weighted mean of f / m
 * over its members; its trend and growth rate are those of its strongest member.
 */
public final class OscillationGrouping {

    /** Comparator: strongest first, ties by signal name then frequency. */
    private static final Comparator<SignalOscillation> STRONGEST_FIRST =
            Comparator.comparingDouble(SignalOscillation::strength).reversed()
                    .thenComparing(SignalOscillation::signal)
                    .thenComparingDouble(SignalOscillation::frequency);

    private OscillationGrouping() {
    }

    /**
     * @param components components of any number of signals (each with its signal name and dimension)
     * @return the groups, strongest first (by the strength of their strongest member; ties by that member's
     *         signal name, then frequency), members of each strongest first (ties by signal name)
     */
    public static List<OscillationGroup> group(List<SignalOscillation> components) {
        List<SignalOscillation> ordered = new ArrayList<>(components);
        ordered.sort(Comparator.comparingDouble(SignalOscillation::frequency)
                .thenComparing(STRONGEST_FIRST));
        List<List<OscillationGroup.Member>> groups = new ArrayList<>();
        for (SignalOscillation c : ordered) {
            List<OscillationGroup.Member> home = null;
            int multiple = 0;
            double error = Double.POSITIVE_INFINITY;
            for (List<OscillationGroup.Member> g : groups) {
                double f0 = fundamental(g);
                int m = Harmonics.multiple(c.frequency(), f0, OscillationDetector.HARMONIC_TOLERANCE);
                double e = Math.abs(c.frequency() - m * f0) / f0;
                if (m >= 1 && e < error) {
                    home = g;
                    multiple = m;
                    error = e;
                }
            }
            if (home == null) {
                home = new ArrayList<>();
                groups.add(home);
                multiple = 1;
            }
            home.add(new OscillationGroup.Member(c, multiple));
        }
        List<OscillationGroup> out = new ArrayList<>();
        for (List<OscillationGroup.Member> g : groups) {
            g.sort(Comparator.comparing(OscillationGroup.Member::oscillation, STRONGEST_FIRST));
            SignalOscillation strongest = g.get(0).oscillation();
            out.add(new OscillationGroup(fundamental(g), strongest.trend(), strongest.growthRate(),
                    strongest.strength(), g));
        }
        out.sort(Comparator.comparing(OscillationGroup::dominant, STRONGEST_FIRST));
        return out;
    }

    /** Strength-weighted mean of each member's frequency divided by its multiple (plain mean if all strengths are 0), Hz. */
    private static double fundamental(List<OscillationGroup.Member> members) {
        double sum = 0.0;
        double weight = 0.0;
        for (OscillationGroup.Member m : members) {
            double w = m.oscillation().strength();
            sum += w * m.oscillation().frequency() / m.multiple();
            weight += w;
        }
        if (weight > 0.0) {
            return sum / weight;
        }
        double plain = 0.0;
        for (OscillationGroup.Member m : members) {
            plain += m.oscillation().frequency() / m.multiple();
        }
        return plain / members.size();
    }
}
