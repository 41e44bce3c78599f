package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.elements.DirectReducingValve;
import org.branchsim.core.elements.Motor;
import org.branchsim.core.elements.PilotReducingValve;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;

/**
 * The parameters a fluid-power engineer changes against hunting or chatter, per kind of part, each searched in
 * both directions over a wide range (common practice, no source; the cures named in the trade are: resize the
 * damping orifice, change the spring-chamber volume, damp the main spool or the pilot poppet, stiffen the pilot
 * spring, meter through slots, damp a relief poppet, add or remove volume at a node). Ranges: dampings x0.3 to x20
 * of their value (an absolute range when the value is zero), volumes x0.25 to x4, orifices and springs x0.5 to x2,
 * metering width x0.25 to x1.
 */
public final class RemedyCatalogue {

    /** Range of a damping coefficient, as factors of its value. */
    public static final double[] DAMPING_RANGE = {0.3, 20.0};
    /** Range of a volume, as factors of its value. */
    public static final double[] VOLUME_RANGE = {0.25, 4.0};
    /** Range of an orifice diameter or a spring rate, as factors of its value. */
    public static final double[] SIZE_RANGE = {0.5, 2.0};

    private RemedyCatalogue() {
    }

    /**
     * @param document the scenario document
     * @param circuit its circuit (to know what each part is)
     * @param parts members and nodes that take part in the oscillation ({@code reducer.pilot}, {@code branch}),
     *        most involved first
     * @return the knobs for those parts, without duplicates, most involved part first
     */
    public static List<RemedyKnob> knobs(Located document, CircuitModel circuit, Collection<String> parts) {
        Map<String, RemedyKnob> out = new LinkedHashMap<>();
        for (String part : parts) {
            int dot = part.indexOf('.');
            String owner = dot < 0 ? part : part.substring(0, dot);
            String member = dot < 0 ? "" : part.substring(dot + 1);
            Element e = circuit.element(owner);
            Node n = circuit.node(owner);
            List<RemedyKnob> found = new ArrayList<>();
            String base = "elements." + owner + ".";
            if (e instanceof PilotReducingValve) {
                pilotOperated(found, document, part, base, member);
            } else if (e instanceof DirectReducingValve) {
                damping(found, document, part, base + "spool.damping", 1.0, 500.0, "spool damping",
                        "a damping land or a throttled spring chamber on the spool, about %s");
                size(found, document, part, base + "spool.springRate", Dimension.STIFFNESS, "N/mm", "lbf/in",
                        "a stiffer spool spring of %s (lower gain, more droop)", "a softer spool spring of %s");
            } else if (e instanceof ReliefValve) {
                damping(found, document, part, base + "damping", 10.0, 2000.0, "poppet damping",
                        "a damping piston on the relief poppet, about %s");
            } else if (e instanceof Cylinder) {
                damping(found, document, part, base + "viscousFriction", 100.0, 2e4, "load damping",
                        "more load damping (meter-out throttling or a load damper), about %s");
            } else if (e instanceof Motor) {
                damping(found, document, part, base + "damping", 1e-3, 1.0, "shaft damping",
                        "more shaft damping (a throttled motor return line), about %s");
            } else if (n != null && !n.isTank()) {
                scale(found, document, part, "nodes." + owner + ".volume", Dimension.VOLUME, VOLUME_RANGE,
                        "cm^3", "in^3",
                        "more volume at " + owner + " (a longer or wider hose, or a small accumulator), %s in all",
                        "less volume at " + owner + " (shorter or narrower lines), %s in all");
            }
            for (RemedyKnob k : found) {
                out.putIfAbsent(k.path(), k);
            }
        }
        return List.copyOf(out.values());
    }

    private static void pilotOperated(List<RemedyKnob> out, Located doc, String part, String base, String member) {
        boolean spool = member.equals("spool") || member.equals("end");
        boolean pilot = member.equals("pilot");
        if (spool) {
            damping(out, doc, part, base + "spool.damping", 1.0, 500.0, "main-spool damping",
                    "a damping land or an end orifice on the main spool, about %s");
            if (member.equals("end")) {
                size(out, doc, part, base + "spool.endOrifice.diameter", Dimension.LENGTH, "mm", "in",
                        "a larger sensing orifice of %s", "a smaller sensing orifice of %s");
            }
        }
        if (pilot) {
            damping(out, doc, part, base + "pilot.damping", 0.1, 100.0, "pilot damping",
                    "a damping piston or a tighter guide clearance on the pilot poppet, about %s");
            size(out, doc, part, base + "pilot.springRate", Dimension.STIFFNESS, "N/mm", "lbf/in",
                    "a stiffer pilot spring of %s (re-set the valve after fitting it)",
                    "a softer pilot spring of %s (re-set the valve after fitting it)");
        }
        size(out, doc, part, base + "dampingOrifice.diameter", Dimension.LENGTH, "mm", "in",
                "a larger damping orifice of %s (drilled out)", "a smaller drilled damping orifice of %s");
        scale(out, doc, part, base + "chamberVolume", Dimension.VOLUME, VOLUME_RANGE, "cm^3", "in^3",
                "a larger spring-chamber volume of %s", "a smaller spring-chamber volume of %s (a filler sleeve)");
        if (spool) {
            scale(out, doc, part, base + "spool.meteringWidth", Dimension.LENGTH, new double[] {0.25, 1.0}, "mm", "in",
                    "a wider metering edge of %s", "metering slots instead of a full edge, %s of metering width");
        }
    }

    private static void size(List<RemedyKnob> out, Located doc, String part, String path, Dimension d, String metric,
                             String us, String raise, String lower) {
        scale(out, doc, part, path, d, SIZE_RANGE, metric, us, raise, lower);
    }

    private static void scale(List<RemedyKnob> out, Located doc, String part, String path, Dimension d,
                              double[] range, String metric, String us, String raise, String lower) {
        double v = valueOf(doc, path, d);
        if (Double.isFinite(v) && v > 0.0) {
            out.add(new RemedyKnob(part, path, d, v, v * range[0], v * range[1], metric, us, raise, lower));
        }
    }

    /** A damping: scaled when set, over [absLow, absHigh] N*s/m (or N*m*s/rad) when zero or absent. */
    private static void damping(List<RemedyKnob> out, Located doc, String part, String path, double absLow,
                                double absHigh, String name, String raise) {
        Dimension d = path.endsWith(".damping") && part.endsWith(".shaft") ? Dimension.ROTARY_DAMPING : Dimension.DAMPING;
        String metric = d == Dimension.ROTARY_DAMPING ? "N*m*s/rad" : "N*s/m";
        String us = d == Dimension.ROTARY_DAMPING ? "N*m*s/rad" : "lbf*s/in";
        double v = ParameterPath.parse(path).exists(doc) ? valueOf(doc, path, d) : 0.0;
        if (!Double.isFinite(v)) {
            return;
        }
        String lower = "less " + name + ", about %s";
        if (v > 0.0) {
            out.add(new RemedyKnob(part, path, d, v, v * DAMPING_RANGE[0], v * DAMPING_RANGE[1], metric, us, raise,
                    lower));
        } else {
            out.add(new RemedyKnob(part, path, d, 0.0, absLow, absHigh, metric, us, raise, lower));
        }
    }

    private static double valueOf(Located doc, String path, Dimension d) {
        ParameterPath p = ParameterPath.parse(path);
        if (!p.exists(doc) || !(p.find(doc) instanceof Located.Scalar s)) {
            return Double.NaN;
        }
        Quantity.Parsed q = Quantity.parse(String.valueOf(s.value()), d);
        return q.ok() ? q.si() : Double.NaN;
    }
}
