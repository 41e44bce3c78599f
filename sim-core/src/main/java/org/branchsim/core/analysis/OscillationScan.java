package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;

/**
 * Looks for sustained oscillations in every pressure and position signal of a run after its transients,
 * groups the signals that oscillate at one frequency into findings, names the parts that take part, and
 * classifies each finding: chatter when a member strikes its seat or stop at least
 * {@link #CHATTER_IMPACTS} times in the window, hunting otherwise.
 */
public final class OscillationScan {

    /** Impacts of one member in the window that make an oscillation chatter. */
    public static final int CHATTER_IMPACTS = 3;
    /** Fraction of the run, at its end, taken as "after the transients" when no window is given. */
    public static final double DEFAULT_WINDOW_FRACTION = 0.4;
    /** Smallest pressure amplitude reported, Pa (0.02 bar). */
    public static final double PRESSURE_FLOOR = 2e3;
    /** Pressure amplitude threshold as a fraction of the mean pressure. */
    public static final double PRESSURE_FRACTION = 0.002;
    /** Smallest position amplitude reported, m. */
    public static final double POSITION_FLOOR = 1e-7;
    /** Position amplitude threshold as a fraction of the signal's largest magnitude in the run. */
    public static final double POSITION_FRACTION = 0.005;
    private static final double SAME_FREQUENCY = 0.05;

    private OscillationScan() {
    }

    /** Scans the last {@link #DEFAULT_WINDOW_FRACTION} of the run. */
    public static List<OscillationFinding> scan(SimulationResult result) {
        double end = result.trace().time(result.trace().size() - 1);
        return scan(result, end * (1 - DEFAULT_WINDOW_FRACTION), end);
    }

    /**
     * @param result a run
     * @param from window start, s
     * @param to window end, s
     * @return findings, strongest first
     */
    public static List<OscillationFinding> scan(SimulationResult result, double from, double to) {
        Trace trace = result.trace();
        double[] t = trace.times();
        List<Oscillation> found = new ArrayList<>();
        Map<Oscillation, Double> strength = new LinkedHashMap<>();
        Map<Oscillation, Dimension> dimensions = new LinkedHashMap<>();
        for (int i = 0; i < trace.columns().size(); i++) {
            Trace.Column c = trace.columns().get(i);
            if (c.dimension() != Dimension.PRESSURE && c.dimension() != Dimension.LENGTH) {
                continue;
            }
            double[] x = trace.series(i);
            double threshold = threshold(c.dimension(), t, x, from, to);
            Oscillation o = OscillationDetector.detect(c.name(), t, x, from, to, threshold);
            if (o != null) {
                found.add(o);
                strength.put(o, o.endAmplitude() / threshold);
                dimensions.put(o, c.dimension());
            }
        }
        found.sort(Comparator.comparingDouble((Oscillation o) -> strength.get(o)).reversed());
        List<OscillationFinding> findings = new ArrayList<>();
        List<List<Oscillation>> groups = new ArrayList<>();
        for (Oscillation o : found) {
            List<Oscillation> home = null;
            for (List<Oscillation> g : groups) {
                if (Math.abs(g.get(0).frequency() - o.frequency()) <= SAME_FREQUENCY * g.get(0).frequency()) {
                    home = g;
                    break;
                }
            }
            if (home == null) {
                home = new ArrayList<>();
                groups.add(home);
            }
            home.add(o);
        }
        for (List<Oscillation> g : groups) {
            findings.add(finding(g, dimensions.get(g.get(0)), result.events(), from, to));
        }
        return findings;
    }

    private static OscillationFinding finding(List<Oscillation> group, Dimension dimension, List<EventRecord> events,
                                              double from, double to) {
        Oscillation dominant = group.get(0);
        Set<String> elements = new LinkedHashSet<>();
        for (Oscillation o : group) {
            elements.add(ModeAnalysis.owner(o.signal()));
        }
        Map<String, Integer> impacts = new LinkedHashMap<>();
        for (EventRecord e : events) {
            boolean impact = (e.kind().equals("seat") || e.kind().equals("stop")) && !e.description().endsWith("(leaves)");
            if (impact && e.time() >= from && e.time() <= to && elements.contains(ModeAnalysis.owner(e.owner()))) {
                impacts.merge(e.owner(), 1, Integer::sum);
            }
        }
        String member = null;
        int most = 0;
        for (Map.Entry<String, Integer> e : impacts.entrySet()) {
            if (e.getValue() > most) {
                most = e.getValue();
                member = e.getKey();
            }
        }
        boolean chatter = most >= CHATTER_IMPACTS;
        return new OscillationFinding(chatter ? OscillationFinding.Kind.CHATTER : OscillationFinding.Kind.HUNTING,
                dominant.frequency(), dominant.trend(), dominant.growthRate(), dominant, dimension, List.copyOf(elements),
                List.copyOf(group), chatter ? member : null, chatter ? most / (to - from) : 0.0);
    }

    private static double threshold(Dimension d, double[] t, double[] x, double from, double to) {
        if (d == Dimension.PRESSURE) {
            double sum = 0.0;
            int n = 0;
            for (int k = 0; k < t.length; k++) {
                if (t[k] >= from && t[k] <= to) {
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
        return Math.max(POSITION_FLOOR, POSITION_FRACTION * max);
    }
}
