package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.branchsim.core.units.Dimension;

/**
 * One physical oscillation of the circuit: the signals that oscillate together at one fundamental (or its
 * harmonics), in the scan windows where it was seen, the parts (members and nodes) that take part, whether a
 * member strikes a seat or stop in each cycle (chatter) or none does (hunting), and, once the circuit has been
 * linearised, the linear mode it belongs to.
 *
 * @param kind chatter (a member strikes its seat or stop in at least {@link #CHATTER_IMPACTS_PER_CYCLE} of the
 *        cycles) or hunting (no such member)
 * @param frequency fundamental frequency, Hz (in the window where the oscillation is strongest)
 * @param trend growing, decaying or limit cycle (of the strongest signal, in that window)
 * @param growthRate amplitude growth rate of the strongest signal, 1/s (negative: decaying)
 * @param window the scan window where it is strongest
 * @param seenIn every scan window in which it was found, in time order
 * @param signals the oscillating signals in the strongest window, strongest first, amplitudes in SI
 * @param parts the members and nodes that take part, most involved first: from the matched mode's
 *        participation factors when there is one, otherwise from the oscillating signals by strength
 * @param impactsPerCycle for every member that strikes a seat or stop in the strongest window: impacts per cycle
 * @param otherFrequencies other fundamentals of the same parts in the strongest window, Hz (a modulated or
 *        irregular oscillation spreads over several peaks), strongest first
 * @param mode the linear mode the oscillation belongs to (null when not matched or not linearised)
 * @param drivenBy the periodic drive whose frequency (or a multiple up to {@link #DRIVE_MULTIPLES}) the oscillation
 *        has, in words (a pump's flow ripple), or null: a driven oscillation is a forced response
 */
public record OscillationFinding(Kind kind, double frequency, Oscillation.Trend trend, double growthRate,
                                 ScanWindow window, List<ScanWindow> seenIn, List<SignalOscillation> signals,
                                 List<String> parts, Map<String, Double> impactsPerCycle,
                                 List<Double> otherFrequencies, ModeMatch mode, String drivenBy) {

    /** A finding not tied to a periodic drive. */
    public OscillationFinding(Kind kind, double frequency, Oscillation.Trend trend, double growthRate,
                              ScanWindow window, List<ScanWindow> seenIn, List<SignalOscillation> signals,
                              List<String> parts, Map<String, Double> impactsPerCycle, List<Double> otherFrequencies,
                              ModeMatch mode) {
        this(kind, frequency, trend, growthRate, window, seenIn, signals, parts, impactsPerCycle, otherFrequencies,
                mode, null);
    }

    /** Multiples of a drive's frequency at which an oscillation counts as driven by it. */
    public static final int DRIVE_MULTIPLES = 4;

    /** Impacts per cycle of one member from which an oscillation counts as chatter. */
    public static final double CHATTER_IMPACTS_PER_CYCLE = 0.5;

    /** Copies the lists. */
    public OscillationFinding {
        seenIn = List.copyOf(seenIn);
        signals = List.copyOf(signals);
        parts = List.copyOf(parts);
        impactsPerCycle = Map.copyOf(impactsPerCycle);
        otherFrequencies = List.copyOf(otherFrequencies);
    }

    /** Chatter or hunting. */
    public enum Kind {
        /** A poppet or spool strikes its seat or stop in most cycles. */
        CHATTER,
        /** Pressures and members oscillate without seat or stop impacts. */
        HUNTING;

        /** @return lower-case label */
        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** @return the strongest signal's oscillation */
    public SignalOscillation dominant() {
        return signals.get(0);
    }

    /** @return the strongest signal's dimension (pressure, length...) */
    public Dimension dominantDimension() {
        return dominant().dimension();
    }

    /** @return the member striking its seat or stop most often per cycle (chatter), or null */
    public String impactingMember() {
        String best = null;
        double most = 0.0;
        for (Map.Entry<String, Double> e : impactsPerCycle.entrySet()) {
            if (e.getValue() > most || (e.getValue() == most && best != null && e.getKey().compareTo(best) < 0)) {
                most = e.getValue();
                best = e.getKey();
            }
        }
        return most >= CHATTER_IMPACTS_PER_CYCLE ? best : null;
    }

    /** @return impacts per second of {@link #impactingMember()}, 1/s (0 when hunting) */
    public double impactsPerSecond() {
        String m = impactingMember();
        return m == null ? 0.0 : impactsPerCycle.get(m) * frequency;
    }

    /**
     * @return what a reader calls it: "chatter"; "forced response" when it has no impacts and is at a periodic
     *         drive's frequency; "hunting" when it holds or grows over the window; "ringing" when
     *         it has no impacts and decays over the window (a damped response to the last change, still visible at
     *         the window's end, not a self-sustained oscillation)
     */
    public String label() {
        if (kind == Kind.HUNTING && drivenBy != null) {
            return "forced response";
        }
        if (kind == Kind.HUNTING && trend == Oscillation.Trend.DECAYING) {
            return "ringing";
        }
        return kind.label();
    }

    /**
     * The damping ratio of a ringing from its decay: for x = A e^(sigma t) cos(omega_d t), zeta = -sigma /
     * sqrt(sigma^2 + omega_d^2) (the underdamped second-order response, e.g. K. Ogata, Modern Control Engineering,
     * 5th ed., 2010, sec. 5-3), with sigma the fundamental's growth rate over the window and omega_d = 2 pi f.
     *
     * @return the damping ratio, NaN unless the oscillation decays
     */
    public double dampingRatioFromDecay() {
        double sigma = growthRate;
        if (!(sigma < 0.0) || trend != Oscillation.Trend.DECAYING) {
            return Double.NaN;
        }
        double omega = 2.0 * Math.PI * frequency;
        return -sigma / Math.sqrt(sigma * sigma + omega * omega);
    }

    /** @return the name of the oscillation from its parts, e.g. "reducer.pilot + reducer.chamber" */
    public String name() {
        return String.join(" + ", parts.subList(0, Math.min(3, parts.size())));
    }

    /** @return true when the oscillation was seen in a window that overlaps [from, to] */
    public boolean overlaps(double from, double to) {
        for (ScanWindow w : seenIn) {
            if (w.from() <= to && w.to() >= from) {
                return true;
            }
        }
        return false;
    }

    /** @return true when the named signal oscillates in it */
    public boolean hasSignal(String signal) {
        return signals.stream().anyMatch(s -> s.signal().equals(signal));
    }

    /** @return true when an element or node (by id) or a part (by name) takes part */
    public boolean involves(String id) {
        for (String p : parts) {
            if (p.equals(id) || ModeAnalysis.owner(p).equals(id)) {
                return true;
            }
        }
        return false;
    }

    /**
     * @param match the matched mode
     * @param partShare least share of the mode's participation a part needs to be named
     * @return this finding tied to a mode, named by the mode's parts
     */
    public OscillationFinding withMode(ModeMatch match, double partShare) {
        List<String> named = new ArrayList<>();
        for (Mode.Share s : match.mode().parts()) {
            if (s.share() >= partShare) {
                named.add(s.name());
            }
        }
        if (named.isEmpty()) {
            named.addAll(parts);
        }
        return new OscillationFinding(kind, frequency, trend, growthRate, window, seenIn, signals, named,
                impactsPerCycle, otherFrequencies, match, drivenBy);
    }
}
