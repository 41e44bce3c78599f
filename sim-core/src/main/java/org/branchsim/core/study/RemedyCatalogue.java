package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.elements.DirectReducingValve;
import org.branchsim.core.elements.PilotReducingValve;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.model.Circuit;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.scenario.Located;

/**
 * The changes a fluid-power engineer tries first against hunting or chatter, per kind of part (common
 * practice, no source): resize the damping orifice (smaller damps the main stage but slows it; larger can
 * help a sluggish pilot loop), enlarge the spring chamber, damp the spool or the pilot poppet, stiffen the
 * pilot spring, meter through slots instead of a full circumference, damp a relief poppet, add volume at a
 * node (a longer hose or a small accumulator).
 */
public final class RemedyCatalogue {

    private RemedyCatalogue() {
    }

    /**
     * @param document the scenario document
     * @param circuit its circuit (to know what each part is)
     * @param parts element and node ids that take part in the oscillation, most involved first
     * @return candidate remedies, for the most involved parts first
     */
    public static List<Remedy> candidates(Located document, Circuit circuit, Collection<String> parts) {
        List<Remedy> out = new ArrayList<>();
        for (String id : parts) {
            Element e = circuit.element(id);
            Node n = circuit.node(id);
            String base = "elements." + id + ".";
            if (e instanceof PilotReducingValve prv) {
                scale(out, document, id, base + "dampingOrifice.diameter", 0.6,
                        "smaller damping orifice: damps the main stage, slower response");
                scale(out, document, id, base + "dampingOrifice.diameter", 1.5,
                        "larger damping orifice: faster pilot loop, less main-stage damping");
                scale(out, document, id, base + "chamberVolume", 2.5,
                        "larger spring chamber: softer pilot loop");
                scaleOrSet(out, document, id, base + "spool.damping", 10.0, "50 N*s/m",
                        "more main-spool damping (a damping land or end orifice)");
                scaleOrSet(out, document, id, base + "pilot.damping", 4.0, "10 N*s/m",
                        "more pilot-poppet damping (a damping piston)");
                scale(out, document, id, base + "pilot.springRate", 2.0, "stiffer pilot spring: lower pilot gain");
                double d = prv.main().edge().spoolDiameter();
                if (prv.main().edge().width() > 0.5 * Math.PI * d) {
                    set(out, document, id, base + "spool.meteringWidth",
                            ValueText.format(0.4 * Math.PI * d * 1e3) + " mm",
                            "metering slots instead of a full-circumference edge: lower flow gain");
                }
            } else if (e instanceof DirectReducingValve) {
                scaleOrSet(out, document, id, base + "spool.damping", 5.0, "100 N*s/m", "more spool damping");
                scale(out, document, id, base + "spool.springRate", 1.5, "stiffer spring: lower gain, more droop");
            } else if (e instanceof ReliefValve) {
                scaleOrSet(out, document, id, base + "damping", 4.0, "200 N*s/m",
                        "more poppet damping (a damping piston)");
            } else if (e instanceof Cylinder) {
                scaleOrSet(out, document, id, base + "viscousFriction", 2.0, "2000 N*s/m",
                        "more load damping");
            } else if (n != null && !n.isTank()) {
                scale(out, document, id, "nodes." + id + ".volume", 3.0,
                        "more volume at this node (a longer hose or a small accumulator): slower pressure changes");
            }
        }
        return out;
    }

    private static void scale(List<Remedy> out, Located doc, String part, String path, double factor, String what) {
        ParameterPath p = ParameterPath.parse(path);
        if (!p.exists(doc) || !(p.find(doc) instanceof Located.Scalar s)) {
            return;
        }
        Object to = ValueText.scale(s.value(), factor);
        out.add(new Remedy(part, what, path, String.valueOf(s.value()), to));
    }

    private static void scaleOrSet(List<Remedy> out, Located doc, String part, String path, double factor,
                                   String fallback, String what) {
        ParameterPath p = ParameterPath.parse(path);
        if (p.exists(doc) && p.find(doc) instanceof Located.Scalar s && !isZero(s.value())) {
            out.add(new Remedy(part, what, path, String.valueOf(s.value()), ValueText.scale(s.value(), factor)));
        } else {
            out.add(new Remedy(part, what, path, p.exists(doc) ? "0" : "default (0)", fallback));
        }
    }

    private static void set(List<Remedy> out, Located doc, String part, String path, String value, String what) {
        ParameterPath p = ParameterPath.parse(path);
        String from = p.exists(doc) && p.find(doc) instanceof Located.Scalar s ? String.valueOf(s.value()) : "default";
        out.add(new Remedy(part, what, path, from, value));
    }

    private static boolean isZero(Object v) {
        try {
            Object scaled = ValueText.scale(v, 1.0);
            String text = String.valueOf(scaled).trim();
            return Double.parseDouble(text.split("\\s+")[0]) == 0.0;
        } catch (RuntimeException e) {
            return false;
        }
    }
}
