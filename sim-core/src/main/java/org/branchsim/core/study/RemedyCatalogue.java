package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.scenario.BlockSpec;
import org.branchsim.core.scenario.ElementCatalog;
import org.branchsim.core.scenario.ElementDescriptor;
import org.branchsim.core.scenario.FieldSpec;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.NodeKind;
import org.branchsim.core.scenario.Tuning;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;

/**
 * The parameters a fluid-power engineer changes against hunting or chatter, per kind of part, as the
 * descriptors declare them: every field with a {@link Tuning} of the node kind or element type of a part that
 * takes part in an oscillation, for the member that takes part, in the order of their ranks. Each is searched in
 * both directions over its range: a damping coefficient by factors of its value, or over an absolute range when
 * it is zero or not written; a size by factors of its written value (common practice, no source).
 */
public final class RemedyCatalogue {

    private RemedyCatalogue() {
    }

    /**
     * @param document the scenario document
     * @param circuit its circuit (not needed: the document's descriptors say what each part is; kept for callers)
     * @param parts members and nodes that take part in the oscillation ({@code reducer.pilot}, {@code branch}),
     *        most involved first
     * @return the knobs for those parts, without duplicates, most involved part first
     */
    public static List<RemedyKnob> knobs(Located document, CircuitModel circuit, Collection<String> parts) {
        return knobs(document, parts);
    }

    /**
     * @param document the scenario document
     * @param parts members and nodes that take part in the oscillation ({@code reducer.pilot}, {@code branch}),
     *        most involved first
     * @return the knobs for those parts, without duplicates, most involved part first
     */
    public static List<RemedyKnob> knobs(Located document, Collection<String> parts) {
        Map<String, RemedyKnob> out = new LinkedHashMap<>();
        for (String part : parts) {
            int dot = part.indexOf('.');
            String owner = dot < 0 ? part : part.substring(0, dot);
            String member = dot < 0 ? "" : part.substring(dot + 1);
            String base;
            BlockSpec fields;
            Located.Obj element = item(document, "elements", owner);
            Located.Obj node = item(document, "nodes", owner);
            if (element != null) {
                ElementDescriptor<?> type = elementType(element);
                if (type == null) {
                    continue;
                }
                base = "elements." + owner + ".";
                fields = type.fields();
            } else if (node != null) {
                NodeKind kind = NodeKind.find(text(node, "type", NodeKind.VOLUME.type()));
                if (kind == null) {
                    continue;
                }
                base = "nodes." + owner + ".";
                fields = kind.fields();
            } else {
                continue;
            }
            List<Candidate> candidates = new ArrayList<>();
            collect(fields, "", member, candidates);
            candidates.sort(Comparator.comparingInt(c -> c.field().tuning().rank()));
            for (Candidate c : candidates) {
                RemedyKnob k = knob(document, part, owner, base + c.path(), c.field());
                if (k != null) {
                    out.putIfAbsent(k.path(), k);
                }
            }
        }
        return List.copyOf(out.values());
    }

    /** A tunable field below a node or element, by its relative path. */
    private record Candidate(String path, FieldSpec field) {
    }

    private static void collect(BlockSpec block, String prefix, String member, List<Candidate> out) {
        for (FieldSpec f : block.fields()) {
            if (f.kind() == FieldSpec.Kind.BLOCK) {
                collect(f.block(), prefix + f.name() + ".", member, out);
            } else if (f.tuning() != null && f.tuning().actsOn(member)) {
                out.add(new Candidate(prefix + f.name(), f));
            }
        }
    }

    private static RemedyKnob knob(Located doc, String part, String owner, String path, FieldSpec field) {
        Tuning t = field.tuning();
        Dimension d = field.dimension();
        String raise = t.raiseWords(owner);
        String lower = t.lowerWords(owner);
        if (t.searchedFromZero()) {
            double v = ParameterPath.parse(path).exists(doc) ? valueOf(doc, path, d) : 0.0;
            if (!Double.isFinite(v)) {
                return null;
            }
            return v > 0.0
                    ? new RemedyKnob(part, path, d, v, v * t.lowFactor(), v * t.highFactor(), t.metricUnit(), t.usUnit(),
                    raise, lower)
                    : new RemedyKnob(part, path, d, 0.0, t.absoluteLow(), t.absoluteHigh(), t.metricUnit(), t.usUnit(),
                    raise, lower);
        }
        double v = valueOf(doc, path, d);
        if (Double.isFinite(v) && v > 0.0) {
            return new RemedyKnob(part, path, d, v, v * t.lowFactor(), v * t.highFactor(), t.metricUnit(), t.usUnit(),
                    raise, lower);
        }
        return null;
    }

    private static ElementDescriptor<?> elementType(Located.Obj element) {
        String type = text(element, "type", null);
        if (type == null) {
            return null;
        }
        ElementCatalog catalog = ElementCatalog.standard();
        String renamed = catalog.renamed(type);
        return catalog.find(renamed == null ? type : renamed);
    }

    private static Located.Obj item(Located doc, String list, String id) {
        if (doc instanceof Located.Obj root && root.get(list) instanceof Located.Arr a) {
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s && id.equals(s.value())) {
                    return o;
                }
            }
        }
        return null;
    }

    private static String text(Located.Obj o, String key, String otherwise) {
        return o.get(key) instanceof Located.Scalar s && s.value() instanceof String t ? t : otherwise;
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
