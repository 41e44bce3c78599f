package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.PeriodicDrive;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;

/**
 * Looks for sustained oscillations in a run: in every {@link ScanWindow} (by default the later half of each
 * interval between schedule changes), the spectral {@link OscillationDetector} is run on every pressure, member
 * position and shaft speed signal (signals that repeat another one exactly, such as a valve's port pressure and
 * its node's pressure, are scanned once); the components of one window are grouped into physical oscillations
 * (one fundamental and its harmonics), weaker groups of the same parts folded into the stronger
 * ({@link #fold}); the same oscillation seen in several windows is one finding; and each
 * finding is classified as chatter when a member strikes its seat or stop in at least half of the cycles, hunting
 * otherwise.
 */
public final class OscillationScan {

    /** Smallest pressure amplitude reported, Pa (0.02 bar). */
    public static final double PRESSURE_FLOOR = 2e3;
    /** Pressure amplitude threshold as a fraction of the mean absolute pressure in the window. */
    public static final double PRESSURE_FRACTION = 0.002;
    /** Smallest position amplitude reported, m. */
    public static final double POSITION_FLOOR = 1e-7;
    /** Position and speed amplitude threshold as a fraction of the signal's largest magnitude in the run. */
    public static final double MOTION_FRACTION = 0.005;
    /** Smallest shaft speed amplitude reported, rad/s. */
    public static final double SPEED_FLOOR = 0.05;
    /**
     * Two findings in different windows are the same oscillation when the same member chatters in both (its
     * frequency moves with the operating point), or when their fundamentals are within this ratio and their
     * strongest signals belong to the same part (common practice, no source).
     */
    public static final double SAME_OSCILLATION_RATIO = 1.25;

    /** Strength, relative to a stronger group sharing a part, below which a group is folded into it. */
    public static final double WEAK_SHARE = 0.1;

    private OscillationScan() {
    }

    /** Scans the default windows: the later half of each interval between schedule changes. */
    public static List<OscillationFinding> scan(SimulationResult result) {
        Trace trace = result.trace();
        double end = trace.time(trace.size() - 1);
        return scan(result, ScanWindow.between(result.model().inputs(), end));
    }

    /**
     * @param result a run
     * @param windows where to look
     * @return findings, strongest first
     */
    public static List<OscillationFinding> scan(SimulationResult result, List<ScanWindow> windows) {
        Trace trace = result.trace();
        double[] t = trace.times();
        // one signal at a time (a long run's trace is read a column at a time, never whole), every window for it;
        // then each window's components, in signal order, grouped as OscillationDetector.detect groups them
        List<List<SignalOscillation>> components = new ArrayList<>();
        for (int w = 0; w < windows.size(); w++) {
            components.add(new ArrayList<>());
        }
        for (int i : scannedColumns(trace)) {
            Trace.Column c = trace.columns().get(i);
            double[] x = trace.series(i);
            for (int w = 0; w < windows.size(); w++) {
                ScanWindow win = windows.get(w);
                SignalSamples s = new SignalSamples(c.name(), c.dimension(), x, threshold(c.dimension(), t, x, win));
                components.get(w).addAll(OscillationDetector.components(t, s, win.from(), win.to()));
            }
        }
        List<OscillationFinding> all = new ArrayList<>();
        for (int w = 0; w < windows.size(); w++) {
            for (List<OscillationGroup> family : fold(OscillationGrouping.group(components.get(w)))) {
                all.add(finding(family, windows.get(w), result.events(), drives(result, t, windows.get(w))));
            }
        }
        return merge(all);
    }

    /** @return the pressure, position and speed columns, each signal equal to an earlier one left out */
    private static List<Integer> scannedColumns(Trace trace) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < trace.columns().size(); i++) {
            Dimension d = trace.columns().get(i).dimension();
            if (d != Dimension.PRESSURE && d != Dimension.LENGTH && d != Dimension.ROTATIONAL_SPEED) {
                continue;
            }
            boolean repeat = false;
            for (int j : out) {
                if (trace.sameSeries(i, j)) {
                    repeat = true;
                    break;
                }
            }
            if (!repeat) {
                out.add(i);
            }
        }
        return out;
    }

    /**
     * Folds the weaker groups of one window into the stronger group they belong to: a group whose strongest
     * signal belongs to the same part as a stronger group's, or that shares a part with a stronger group and is
     * less than {@link #WEAK_SHARE} of its strength, is the same motion seen at another frequency (a modulated or
     * irregular limit cycle spreads over several peaks) and is kept as one of its other frequencies.
     *
     * @param groups the groups of one window, strongest first
     * @return families of groups, the strongest group first in each, strongest family first
     */
    static List<List<OscillationGroup>> fold(List<OscillationGroup> groups) {
        List<List<OscillationGroup>> families = new ArrayList<>();
        for (OscillationGroup g : groups) {
            Set<String> parts = partsOf(g);
            String lead = ModeAnalysis.part(g.dominant().signal());
            List<OscillationGroup> home = null;
            for (List<OscillationGroup> f : families) {
                OscillationGroup head = f.get(0);
                boolean sameLead = ModeAnalysis.part(head.dominant().signal()).equals(lead);
                boolean weakSharing = g.strength() < WEAK_SHARE * head.strength()
                        && partsOf(head).stream().anyMatch(parts::contains);
                if (sameLead || weakSharing) {
                    home = f;
                    break;
                }
            }
            if (home == null) {
                home = new ArrayList<>();
                families.add(home);
            }
            home.add(g);
        }
        return families;
    }

    private static Set<String> partsOf(OscillationGroup g) {
        Set<String> parts = new LinkedHashSet<>();
        for (OscillationGroup.Member m : g.members()) {
            parts.add(ModeAnalysis.part(m.oscillation().signal()));
        }
        return parts;
    }

    /** A periodic drive's fundamental in one window: Hz, and the drive in words. */
    private record Drive(double frequency, String description) {
    }

    /**
     * @param t the trace's sample times, s
     * @return the fundamental frequency of every periodic drive of the model (a pump's flow ripple) over the
     *         window: periods per turn times the mean shaft speed in the window / 2 pi
     */
    private static List<Drive> drives(SimulationResult result, double[] t, ScanWindow w) {
        List<Drive> out = new ArrayList<>();
        Trace trace = result.trace();
        for (Element e : result.model().elements()) {
            if (!(e instanceof PeriodicDrive d) || d.drivePeriodsPerTurn() <= 0) {
                continue;
            }
            int column = trace.indexOf(d.driveSpeedSignal());
            if (column < 0) {
                continue;
            }
            double[] speed = trace.series(column);
            double sum = 0.0;
            int n = 0;
            for (int k = 0; k < t.length; k++) {
                if (w.contains(t[k])) {
                    sum += speed[k];
                    n++;
                }
            }
            double hz = n == 0 ? 0.0 : d.drivePeriodsPerTurn() * Math.abs(sum / n) / (2.0 * Math.PI);
            if (hz > 0.0) {
                out.add(new Drive(hz, d.driveDescription()));
            }
        }
        return out;
    }

    /**
     * @return the drive whose frequency, or a multiple of it up to {@link OscillationFinding#DRIVE_MULTIPLES}, lies
     *         within {@link OscillationDetector#HARMONIC_TOLERANCE} of f, in words with its frequency; else null
     */
    private static String drivenBy(double f, List<Drive> drives) {
        for (Drive d : drives) {
            for (int m = 1; m <= OscillationFinding.DRIVE_MULTIPLES; m++) {
                if (Math.abs(f - m * d.frequency()) <= OscillationDetector.HARMONIC_TOLERANCE * d.frequency()) {
                    return String.format(java.util.Locale.ROOT, "%s at %.1f Hz%s", d.description(), d.frequency(),
                            m == 1 ? "" : ", the oscillation at " + m + " times that");
                }
            }
        }
        return null;
    }

    private static OscillationFinding finding(List<OscillationGroup> family, ScanWindow w, List<EventRecord> events,
                                              List<Drive> drives) {
        OscillationGroup g = family.get(0);
        List<Double> others = new ArrayList<>();
        for (int i = 1; i < family.size(); i++) {
            others.add(family.get(i).frequency());
        }
        List<SignalOscillation> signals = new ArrayList<>();
        Set<String> parts = new LinkedHashSet<>();
        for (OscillationGroup.Member m : g.members()) {
            signals.add(m.oscillation());
            parts.add(ModeAnalysis.part(m.oscillation().signal()));
        }
        double cycles = g.frequency() * w.length();
        Map<String, Integer> impacts = new LinkedHashMap<>();
        for (EventRecord e : events) {
            boolean impact = (e.kind().equals("seat") || e.kind().equals("stop")) && !e.description().endsWith("(leaves)");
            if (impact && w.contains(e.time()) && parts.contains(e.owner())) {
                impacts.merge(e.owner(), 1, Integer::sum);
            }
        }
        Map<String, Double> perCycle = new LinkedHashMap<>();
        impacts.forEach((member, n) -> perCycle.put(member, n / cycles));
        boolean chatter = perCycle.values().stream().anyMatch(v -> v >= OscillationFinding.CHATTER_IMPACTS_PER_CYCLE);
        return new OscillationFinding(chatter ? OscillationFinding.Kind.CHATTER : OscillationFinding.Kind.HUNTING,
                g.frequency(), g.trend(), g.growthRate(), w, List.of(w), signals, List.copyOf(parts), perCycle, others,
                null, chatter ? null : drivenBy(g.frequency(), drives));
    }

    /** Joins the findings of different windows that are the same oscillation; keeps each at its strongest. */
    private static List<OscillationFinding> merge(List<OscillationFinding> all) {
        List<List<OscillationFinding>> same = new ArrayList<>();
        for (OscillationFinding f : all) {
            List<OscillationFinding> home = null;
            for (List<OscillationFinding> s : same) {
                OscillationFinding first = s.get(0);
                double ratio = f.frequency() / first.frequency();
                boolean sameWindow = s.stream().anyMatch(o -> o.window().equals(f.window()));
                boolean sameStriker = f.impactingMember() != null && f.impactingMember().equals(first.impactingMember());
                boolean samePart = ModeAnalysis.part(f.dominant().signal()).equals(ModeAnalysis.part(first.dominant().signal()));
                if (!sameWindow && (sameStriker || samePart && ratio <= SAME_OSCILLATION_RATIO
                        && ratio >= 1.0 / SAME_OSCILLATION_RATIO)) {
                    home = s;
                    break;
                }
            }
            if (home == null) {
                home = new ArrayList<>();
                same.add(home);
            }
            home.add(f);
        }
        List<OscillationFinding> out = new ArrayList<>();
        for (List<OscillationFinding> s : same) {
            OscillationFinding strongest = s.stream()
                    .max(Comparator.comparingDouble((OscillationFinding f) -> f.dominant().strength())).orElseThrow();
            List<ScanWindow> windows = s.stream().map(OscillationFinding::window)
                    .sorted(Comparator.comparingDouble(ScanWindow::from)).toList();
            out.add(new OscillationFinding(strongest.kind(), strongest.frequency(), strongest.trend(),
                    strongest.growthRate(), strongest.window(), windows, strongest.signals(), strongest.parts(),
                    strongest.impactsPerCycle(), strongest.otherFrequencies(), null, strongest.drivenBy()));
        }
        out.sort(Comparator.comparingDouble((OscillationFinding f) -> f.dominant().strength()).reversed()
                .thenComparing(f -> f.dominant().signal()));
        return out;
    }

    private static double threshold(Dimension d, double[] t, double[] x, ScanWindow w) {
        if (d == Dimension.PRESSURE) {
            double sum = 0.0;
            int n = 0;
            for (int k = 0; k < t.length; k++) {
                if (w.contains(t[k])) {
                    sum += Math.abs(x[k]);
                    n++;
                }
            }
            return Math.max(PRESSURE_FLOOR, PRESSURE_FRACTION * (n > 0 ? sum / n : 0.0));
        }
        double max = 0.0;
        for (double v : x) {
            max = Math.max(max, Math.abs(v));
        }
        double floor = d == Dimension.ROTATIONAL_SPEED ? SPEED_FLOOR : POSITION_FLOOR;
        return Math.max(floor, MOTION_FRACTION * max);
    }
}
