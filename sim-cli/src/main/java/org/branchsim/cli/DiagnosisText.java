package org.branchsim.cli;

import java.util.Locale;
import java.util.stream.Collectors;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.ScanWindow;
import org.branchsim.core.analysis.SignalOscillation;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.Diagnosis;
import org.branchsim.core.study.DriveResonance;
import org.branchsim.core.study.StabilitySearch;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/** Writes a diagnosis in plain words (diagnosis.txt and the console). */
final class DiagnosisText {

    private static final String NL = System.lineSeparator();

    private DiagnosisText() {
    }

    /** @return one line describing an oscillation finding, in the scenario's units */
    static String describe(OscillationFinding f, UnitSystem units) {
        String what = what(f);
        String others = f.otherFrequencies().isEmpty() ? ""
                : "; the same parts also show peaks at " + f.otherFrequencies().stream().limit(4)
                .map(x -> String.format(Locale.ROOT, "%.1f", x)).collect(Collectors.joining(", "))
                + " Hz (an irregular or modulated oscillation)";
        return String.format(Locale.ROOT, "%s of %s at %.1f Hz, %s; strongest in %s (amplitude %s); seen %s%s", what,
                f.name(), f.frequency(), f.trend().label(), f.dominant().signal(), amplitude(f.dominant(), units),
                f.seenIn().stream().map(DiagnosisText::window).collect(Collectors.joining(", ")), others);
    }

    /** @return the finding's label with the evidence behind it */
    private static String what(OscillationFinding f) {
        if (f.kind() == OscillationFinding.Kind.CHATTER) {
            return String.format(Locale.ROOT, "chatter (%s strikes its seat or stop %.2f times per cycle, %.0f a second)",
                    f.impactingMember(), f.impactsPerCycle().get(f.impactingMember()), f.impactsPerSecond());
        }
        if (f.drivenBy() != null) {
            return "forced response (no seat or stop impacts; at the frequency of the " + f.drivenBy()
                    + ": driven from outside the loop, not a self-sustained oscillation)";
        }
        if (f.label().equals("ringing")) {
            return String.format(Locale.ROOT, "ringing (no seat or stop impacts; a damped response that decays over the "
                    + "window, damping ratio %.3f from its decay, not a self-sustained oscillation)",
                    f.dampingRatioFromDecay());
        }
        return "hunting (no seat or stop impacts)";
    }

    static String amplitude(SignalOscillation s, UnitSystem units) {
        Unit u = units.displayUnit(s.dimension());
        return String.format(Locale.ROOT, "%.3g %s", u.fromSi(s.amplitude()) - u.fromSi(0.0), u.symbol());
    }

    static String window(ScanWindow w) {
        return String.format(Locale.ROOT, "%.3f-%.3f s", w.from(), w.to());
    }

    static String mode(Mode m, double margin) {
        Mode.Verdict v = m.verdict(margin);
        String flag = v == Mode.Verdict.UNSTABLE
                ? String.format(Locale.ROOT, " UNSTABLE: grows at %.3g 1/s, amplitude doubles in %.3g s", m.growthRate(),
                m.doublingTime())
                : v == Mode.Verdict.LOW ? " LOW (below the margin " + margin + ")" : "";
        return String.format(Locale.ROOT, "%.1f Hz (damped %.1f Hz), damping ratio %.4f%s; parts: %s", m.naturalFrequency(),
                m.dampedFrequency(), m.dampingRatio(), flag, m.parts().stream().limit(5)
                        .map(s -> String.format(Locale.ROOT, "%s %.0f %%", s.name(), 100 * s.share()))
                        .collect(Collectors.joining(", ")));
    }

    static String metrics(ReducingValveMetrics m, UnitSystem units) {
        Unit q = units.displayUnit(Dimension.VOLUME_FLOW);
        String settle = m.oscillating()
                ? String.format(Locale.ROOT, "does not settle (oscillates at %.1f Hz)", m.oscillationFrequency())
                : !m.settled() ? "does not settle into +-2 % of the setting"
                : Double.isFinite(m.settlingTime())
                ? String.format(Locale.ROOT, "settles into +-2 %% of the setting %.3f s after the rise through 90 %% of it",
                m.settlingTime())
                : "inside +-2 % of the setting throughout";
        return String.format(Locale.ROOT, "%s: overshoot %.1f %% of setting, %s, steady deviation %+.2f %%, drain %.3g %s",
                m.id(), m.overshootPercent(), settle, m.deviationPercent(), q.fromSi(m.drainFlow()), q.symbol());
    }

    static String linear(StabilitySearch.Outcome o, UnitSystem units, double margin) {
        String now = String.format(Locale.ROOT, "%s %s (now %s, damping ratio %.4f)", o.direction().label(),
                o.knob().path(), o.knob().absolute() ? "0" : o.knob().text(o.knob().current(), units), o.zetaNow());
        if (!o.reachesMargin()) {
            return now + String.format(Locale.ROOT, ": no value in range gives %.2f (best %.4f)", margin, o.bestZeta());
        }
        String threshold = Double.isFinite(o.threshold())
                ? "stops growing " + (o.direction() == StabilitySearch.Direction.RAISE ? "above " : "below ")
                + o.knob().text(o.threshold(), units) + "; " : "";
        return now + String.format(Locale.ROOT, ": %sdamping ratio %.2f reached at %s; recommended %s (damping ratio %.4f, "
                        + "every mode %.4f)", threshold, margin, o.knob().text(o.marginValue(), units),
                o.knob().text(o.recommended(), units), o.zetaRecommended(), o.zetaAllRecommended());
    }

    static String trial(Diagnosis.Trial t, UnitSystem units) {
        if (!t.outcome().ok()) {
            return "the run failed: " + t.outcome().error();
        }
        String verdict = t.cures() ? "no oscillation left from the start of the run"
                : t.remaining().stream().map(f -> String.format(Locale.ROOT, "%s of %s at %.1f Hz remains", f.label(),
                f.name(), f.frequency())).collect(Collectors.joining("; "));
        String cost = t.metrics().stream().map(m -> metrics(m, units)).collect(Collectors.joining("; "));
        return verdict + (cost.isEmpty() ? "" : "; " + cost) + String.format(Locale.ROOT, "; cost %.2f", t.cost());
    }

    static String text(Diagnosis.Report r) {
        Scenario s = r.scenario();
        UnitSystem u = s.units();
        StringBuilder sb = new StringBuilder();
        sb.append("branchsim diagnose: ").append(s.name()).append(" (").append(s.file()).append(')').append(NL);
        sb.append("Scanned for oscillations: ").append(r.windows().size() == 1
                && r.windows().get(0).change().startsWith("window given")
                ? "the window given, " : "the later half of every interval between schedule changes, ")
                .append(r.windows().stream().map(DiagnosisText::window).collect(Collectors.joining(", "))).append('.')
                .append(NL);
        for (ReducingValveMetrics m : r.baselineMetrics()) {
            sb.append("As it is, ").append(metrics(m, u)).append('.').append(NL);
        }
        if (r.findings().isEmpty()) {
            sb.append("No oscillation found: no hunting or chatter.").append(NL);
            sb.append(Cautions.FULL).append(NL);
            return sb.toString();
        }
        int k = 0;
        for (Diagnosis.FindingDiagnosis d : r.diagnosed()) {
            k++;
            sb.append(NL).append("Finding ").append(k).append(": ").append(describe(d.finding(), u)).append('.').append(NL);
            sb.append("  Amplitudes: ").append(d.finding().signals().stream().limit(6)
                    .map(x -> x.signal() + " " + amplitude(x, u)).collect(Collectors.joining(", "))).append('.').append(NL);
            findingBody(sb, d, r.margin(), u);
        }
        for (int i = r.diagnosed().size(); i < r.findings().size(); i++) {
            sb.append(NL).append("Also found (not diagnosed): ").append(describe(r.findings().get(i), u)).append('.')
                    .append(NL);
        }
        sb.append(Cautions.FULL).append(NL);
        return sb.toString();
    }

    /** What can and cannot be done about a forced response, with the resonance that sizes it. */
    private static void forcedBody(StringBuilder sb, Diagnosis.FindingDiagnosis d, double margin) {
        sb.append("  No remedy is searched: a forced response lasts as long as its source runs and no change of damping")
                .append(" removes it; its size is set by the source and by how near a mode of the circuit lies to the")
                .append(" drive frequency.").append(NL);
        DriveResonance r = d.resonance();
        if (r == null) {
            sb.append("  No oscillatory mode is known here").append(d.operatingPoint() == null
                    ? " (no operating point; --on-trajectory lists modes about the simulated state)" : "")
                    .append(", so the drive's magnification cannot be given.").append(NL);
        } else {
            sb.append("  Nearest mode to the drive: ").append(mode(r.mode(), margin)).append('.').append(NL);
            sb.append(String.format(Locale.ROOT, "  Drive at %.2f times that mode's frequency: a single mode magnifies it %.2f "
                    + "times (M = 1/sqrt((1 - r^2)^2 + (2 zeta r)^2); 1 far below the mode, 1/(2 zeta) on it).%n",
                    r.ratio(), r.magnification()));
        }
        sb.append("  To make it smaller: less ripple at the source (more pistons, a pulsation damper at the pump")
                .append(" outlet), or move the nearest mode away from the drive frequency (line length and volume, the")
                .append(" stiffness or mass of the part that moves).").append(NL);
    }

    private static void findingBody(StringBuilder sb, Diagnosis.FindingDiagnosis d, double margin, UnitSystem u) {
        if (d.operatingPoint() != null) {
            sb.append(String.format(Locale.ROOT, "  Operating point at %.4g s: residual %.2g 1/s (largest in %s)%s.%n",
                    d.operatingPoint().time(), d.operatingPoint().residual(), d.operatingPoint().worstState(),
                    d.operatingPoint().held().isEmpty() ? "" : "; held: " + d.operatingPoint().held().entrySet().stream()
                            .map(e -> e.getKey() + " " + e.getValue().name().toLowerCase(Locale.ROOT).replace('_', ' '))
                            .collect(Collectors.joining(", "))));
        } else {
            sb.append("  No operating point: ").append(d.noOperatingPoint()).append(NL);
            if (d.linearisedOnTrajectory()) {
                sb.append("  Modes below are about the simulated state (--on-trajectory), not an equilibrium.").append(NL);
            }
        }
        if (d.finding().mode() != null) {
            sb.append(String.format(Locale.ROOT, "  Its mode (frequency ratio %.2f, %.0f %% of the mode in the oscillating parts): ",
                    d.finding().mode().frequencyRatio(), 100 * d.finding().mode().overlap()))
                    .append(mode(d.finding().mode().mode(), margin)).append('.').append(NL);
        } else if (!d.modes().isEmpty()) {
            sb.append("  No linear mode matches it in frequency and parts; it is named by its signals.").append(NL);
        }
        for (Mode m : d.otherLowModes()) {
            sb.append("  Note: a mode not involved in this oscillation is below the margin already: ")
                    .append(mode(m, margin)).append('.').append(NL);
        }
        if (d.forced()) {
            forcedBody(sb, d, margin);
            return;
        }
        if (d.operatingPoint() == null) {
            sb.append("  Changes cannot be judged with a margin without an operating point.").append(NL);
            return;
        }
        sb.append(String.format(Locale.ROOT, "  Changes (linear model at the operating point; a cure needs damping ratio >= %.2f "
                + "in every mode of the oscillation, then a run from t = 0 with no oscillation in any window):%n", margin));
        for (StabilitySearch.Outcome o : d.linear()) {
            sb.append("   - ").append(linear(o, u, margin)).append(NL);
            for (Diagnosis.Trial t : d.trials()) {
                if (t.linear() == o) {
                    sb.append("       run with ").append(t.value()).append(": ").append(trial(t, u)).append(NL);
                }
            }
        }
        Diagnosis.Trial b = d.recommended();
        if (b == null) {
            sb.append("  No single change tried cures it with margin; try combinations with 'branchsim sweep'.").append(NL);
            return;
        }
        StabilitySearch.Outcome o = b.linear();
        sb.append("  Recommended: ").append(b.hardware()).append(" (").append(o.knob().path()).append(": ")
                .append(o.knob().absolute() ? "0" : o.knob().text(o.knob().current(), u)).append(" -> ").append(b.value())
                .append(").").append(NL);
        sb.append(String.format(Locale.ROOT, "  Evidence: %s; damping ratio %.2f reached at %s; at %s the oscillation's "
                        + "modes have damping ratio %.4f (every mode %.4f) against the margin %.2f; the run from t = 0 shows "
                        + "no oscillation in any window.%n",
                Double.isFinite(o.threshold()) ? "the oscillation stops growing "
                        + (o.direction() == StabilitySearch.Direction.RAISE ? "above " : "below ")
                        + o.knob().text(o.threshold(), u) : "already decaying at the present value",
                margin, o.knob().text(o.marginValue(), u), b.value(), o.zetaRecommended(), o.zetaAllRecommended(), margin));
        sb.append("  With it: ").append(b.metrics().stream().map(m -> metrics(m, u)).collect(Collectors.joining("; ")))
                .append('.').append(NL);
        sb.append("  Check the change on the machine before relying on it.").append(NL);
    }
}
