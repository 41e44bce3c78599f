package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.ScanWindow;
import org.branchsim.core.analysis.SignalOscillation;
import org.branchsim.core.study.Diagnosis;
import org.branchsim.core.study.StabilitySearch;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/**
 * Builds diagnosis.json: one entry per finding with its fundamental, parts, signals and amplitudes, the operating
 * point, the matched mode, every change searched on the linear model with its threshold and margin value, every
 * time-domain verdict, and the recommendation. Values are in the scenario's unit system, with their units.
 */
final class DiagnosisJson {

    private DiagnosisJson() {
    }

    static ObjectNode of(Diagnosis.Report r) {
        UnitSystem u = r.scenario().units();
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("scenario", r.scenario().name());
        root.put("caution", Cautions.SHORT);
        root.put("dampingMargin", r.margin());
        ArrayNode windows = root.putArray("scannedWindows");
        r.windows().forEach(w -> windows.add(window(w)));
        root.set("reducingValves", MetricsReport.reducingValves(r.baselineMetrics(), u, r.scenario().metricsFrom(),
                r.scenario().metricsTo()));
        ArrayNode found = root.putArray("findings");
        for (int i = 0; i < r.findings().size(); i++) {
            Diagnosis.FindingDiagnosis d = i < r.diagnosed().size() ? r.diagnosed().get(i) : null;
            ObjectNode o = finding(r.findings().get(i), u);
            if (d != null) {
                diagnosis(o, d, u, r.margin(), r.scenario().metricsFrom(), r.scenario().metricsTo());
            }
            found.add(o);
        }
        return root;
    }

    static ObjectNode window(ScanWindow w) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("from_s", MetricsReport.round(w.from()));
        o.put("to_s", MetricsReport.round(w.to()));
        o.put("after", w.change());
        return o;
    }

    /** The finding itself (also used in metrics.json). */
    static ObjectNode finding(OscillationFinding f, UnitSystem units) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("name", f.name());
        o.put("kind", f.kind().label());
        o.put("label", f.label());
        if (f.drivenBy() != null) {
            o.put("drivenBy", f.drivenBy());
        }
        if (Double.isFinite(f.dampingRatioFromDecay())) {
            o.put("dampingRatioFromDecay", f.dampingRatioFromDecay());
        }
        o.put("fundamental_Hz", MetricsReport.round(f.frequency()));
        o.put("trend", f.trend().label());
        o.put("growthRate_1_per_s", MetricsReport.round(f.growthRate()));
        ArrayNode others = o.putArray("otherFrequencies_Hz");
        f.otherFrequencies().forEach(x -> others.add(MetricsReport.round(x)));
        ArrayNode parts = o.putArray("parts");
        f.parts().forEach(parts::add);
        o.set("strongestWindow", window(f.window()));
        ArrayNode seen = o.putArray("seenIn");
        f.seenIn().forEach(w -> seen.add(window(w)));
        ArrayNode sig = o.putArray("signals");
        for (SignalOscillation s : f.signals()) {
            Unit u = units.displayUnit(s.dimension());
            ObjectNode so = sig.addObject();
            so.put("signal", s.signal());
            so.put("unit", u.symbol());
            so.put("amplitude", MetricsReport.round(u.fromSi(s.amplitude()) - u.fromSi(0.0)));
            so.put("halfPeakToPeak", MetricsReport.round(u.fromSi(s.halfPeakToPeak()) - u.fromSi(0.0)));
            so.put("frequency_Hz", MetricsReport.round(s.frequency()));
            so.put("trend", s.trend().label());
        }
        ObjectNode impacts = o.putObject("impactsPerCycle");
        f.impactsPerCycle().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> impacts.put(e.getKey(), MetricsReport.round(e.getValue())));
        if (f.mode() != null) {
            ObjectNode m = mode(f.mode().mode());
            m.put("frequencyRatio", MetricsReport.round(f.mode().frequencyRatio()));
            m.put("shareInOscillatingParts", MetricsReport.round(f.mode().overlap()));
            o.set("mode", m);
        }
        return o;
    }

    static ObjectNode mode(Mode m) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("name", m.name());
        o.put("naturalFrequency_Hz", MetricsReport.round(m.naturalFrequency()));
        o.put("dampedFrequency_Hz", MetricsReport.round(m.dampedFrequency()));
        o.put("dampingRatio", MetricsReport.round(m.dampingRatio()));
        o.put("growthRate_1_per_s", MetricsReport.round(m.growthRate()));
        ObjectNode parts = o.putObject("parts");
        m.parts().forEach(s -> parts.put(s.name(), MetricsReport.round(s.share())));
        return o;
    }

    private static void diagnosis(ObjectNode o, Diagnosis.FindingDiagnosis d, UnitSystem u, double margin,
                                  double metricsFrom, double metricsTo) {
        if (d.operatingPoint() != null) {
            ObjectNode op = o.putObject("operatingPoint");
            op.put("time_s", d.operatingPoint().time());
            op.put("residual_1_per_s", d.operatingPoint().residual());
            op.put("largestResidualIn", d.operatingPoint().worstState());
            ObjectNode held = op.putObject("heldMembers");
            d.operatingPoint().held().forEach((k, v) -> held.put(k, v.name().toLowerCase(java.util.Locale.ROOT)));
        } else {
            o.put("noOperatingPoint", d.noOperatingPoint());
            o.put("modesAboutSimulatedState", d.linearisedOnTrajectory());
        }
        o.put("modeVerdict", d.finding().mode() == null ? "unmatched"
                : d.finding().mode().mode().verdict(margin).name().toLowerCase(java.util.Locale.ROOT));
        ArrayNode other = o.putArray("otherModesBelowMargin");
        d.otherLowModes().forEach(m -> other.add(mode(m)));
        o.put("forcedResponse", d.forced());
        if (d.resonance() != null) {
            ObjectNode res = o.putObject("nearestModeToDrive");
            res.set("mode", mode(d.resonance().mode()));
            res.put("frequencyRatio", MetricsReport.round(d.resonance().ratio()));
            res.put("magnification", MetricsReport.round(d.resonance().magnification()));
        }
        ArrayNode changes = o.putArray("changes");
        for (StabilitySearch.Outcome l : d.linear()) {
            ObjectNode c = changes.addObject();
            c.put("path", l.knob().path());
            c.put("direction", l.direction().label());
            c.put("part", l.knob().part());
            c.put("now", l.knob().absolute() ? "0" : l.knob().text(l.knob().current(), u));
            c.put("dampingRatioNow", MetricsReport.round(l.zetaNow()));
            putText(c, "stopsGrowingAt", l.threshold(), l, u);
            putText(c, "marginReachedAt", l.marginValue(), l, u);
            putText(c, "recommended", l.recommended(), l, u);
            MetricsReport.putFinite(c, "dampingRatioRecommended", MetricsReport.round(l.zetaRecommended()));
            MetricsReport.putFinite(c, "smallestDampingRatioAllModes", MetricsReport.round(l.zetaAllRecommended()));
            MetricsReport.putFinite(c, "bestDampingRatioInRange", MetricsReport.round(l.bestZeta()));
            for (Diagnosis.Trial t : d.trials()) {
                if (t.linear() == l) {
                    ObjectNode run = c.putObject("timeDomain");
                    run.put("hardware", t.hardware());
                    run.put("cures", t.cures());
                    if (!t.outcome().ok()) {
                        run.put("error", t.outcome().error());
                    }
                    ArrayNode left = run.putArray("remaining");
                    t.remaining().forEach(f -> left.add(f.name() + " at " + MetricsReport.round(f.frequency()) + " Hz"));
                    run.set("reducingValves", MetricsReport.reducingValves(t.metrics(), u, metricsFrom, metricsTo));
                    MetricsReport.putFinite(run, "cost", MetricsReport.round(t.cost()));
                }
            }
        }
        Diagnosis.Trial b = d.recommended();
        if (b == null) {
            o.putNull("recommended");
        } else {
            ObjectNode rec = o.putObject("recommended");
            rec.put("path", b.linear().knob().path());
            rec.put("from", b.linear().knob().absolute() ? "0" : b.linear().knob().text(b.linear().knob().current(), u));
            rec.put("to", b.value());
            rec.put("hardware", b.hardware());
            rec.put("dampingRatio", MetricsReport.round(b.linear().zetaRecommended()));
            rec.put("margin", margin);
        }
    }

    private static void putText(ObjectNode o, String key, double si, StabilitySearch.Outcome l, UnitSystem u) {
        if (Double.isFinite(si)) {
            o.put(key, l.knob().text(si, u));
        } else {
            o.putNull(key);
        }
    }
}
