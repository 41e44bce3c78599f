package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;

/**
 * The network sections: the {@code nodes} and {@code elements} lists and their wiring (each element port names
 * a node; every node is connected). Nodes and elements are read by their kind's or type's descriptor; ids are
 * unique across both lists. The circuit is built only once the whole network (and its schedule) is read.
 */
final class NetworkSection {

    /** What an id looks like: a letter, then letters, digits, '_' or '-'. */
    static final String ID_PATTERN = "^[A-Za-z][A-Za-z0-9_-]*$";
    /** The id rule in words. */
    static final String ID_TEXT = "an id that starts with a letter and has only letters, digits, '_' or '-'";

    /**
     * An element read and built, with its type and its scheduled inputs by field name.
     *
     * @param type its descriptor
     * @param element the element
     * @param inputs its scheduled inputs by field name
     */
    record Placed(ElementDescriptor<?> type, Element element, Map<String, ScheduledInput> inputs) {
    }

    /**
     * The network read.
     *
     * @param nodes the nodes by id, in file order
     * @param elements the elements in file order
     */
    record Network(Map<String, Node> nodes, List<Placed> elements) {

        /**
         * @return every scheduled input by its name {@code <id>.<field>}: tanks' pressures first, then the
         *         elements' inputs, in file order
         */
        Map<String, ScheduledInput> inputs() {
            Map<String, ScheduledInput> out = new LinkedHashMap<>();
            for (Node n : nodes.values()) {
                if (n.isTank()) {
                    out.put(n.tankPressure().name(), n.tankPressure());
                }
            }
            for (Placed p : elements) {
                for (ScheduledInput in : p.inputs().values()) {
                    out.put(in.name(), in);
                }
            }
            return out;
        }

        /** @return the circuit of these nodes and elements */
        CircuitModel build(String name, Fluid fluid) {
            CircuitBuilder builder = new CircuitBuilder(name, fluid);
            nodes.values().forEach(builder::add);
            elements.forEach(p -> builder.add(p.element()));
            return builder.build();
        }
    }

    private NetworkSection() {
    }

    /** Reads the nodes, the elements and their wiring; every problem is recorded. */
    static Network read(Fields root, Fluid fluid, ElementCatalog catalog, Problems problems) {
        Map<String, Located> ids = new LinkedHashMap<>();
        Map<String, Node> nodes = readNodes(root, ids, problems);
        List<Placed> elements = readElements(root, nodes, ids, fluid, catalog, problems);
        checkEveryNodeUsed(root, nodes, elements, problems);
        return new Network(nodes, elements);
    }

    private static boolean checkId(Fields f, String id, Map<String, Located> ids) {
        if (id == null) {
            return false;
        }
        if (!id.matches(ID_PATTERN)) {
            f.problem("id", ID_TEXT, "\"" + id + "\"");
            return false;
        }
        Located first = ids.get(id);
        if (first != null) {
            f.problem("id", "an id used once (\"" + id + "\" is already used at line " + first.line() + ")",
                    "\"" + id + "\" again");
            return false;
        }
        ids.put(id, f.raw("id"));
        return true;
    }

    private static Map<String, Node> readNodes(Fields root, Map<String, Located> ids, Problems problems) {
        Map<String, Node> nodes = new LinkedHashMap<>();
        List<Located> list = root.list("nodes");
        if (!root.has("nodes") || list.isEmpty()) {
            root.problem("nodes", "a list of at least one node", root.has("nodes") ? "an empty list" : "none");
        }
        boolean anyVolume = false;
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "nodes[" + i + "]", problems);
            String id = f.text("id");
            boolean idOk = checkId(f, id, ids);
            String type = f.text("type", NodeKind.VOLUME.type());
            NodeKind kind = type == null ? null : NodeKind.find(type);
            if (type != null && kind == null) {
                f.problem("type", kindWords(), "\"" + type + "\"");
            }
            if (kind != null) {
                Reading r = BlockReader.read(f, kind.fields());
                if (r.ok() && idOk) {
                    nodes.put(id, kind.factory().build(id, r));
                }
                anyVolume |= kind == NodeKind.VOLUME;
            }
            f.finish();
        }
        if (!list.isEmpty() && !anyVolume) {
            root.problem("nodes", "at least one node of type \"volume\" (tanks alone hold no pressure state to simulate)",
                    "only tanks");
        }
        return nodes;
    }

    /** @return the node type words for messages: {@code "volume" or "tank"} */
    private static String kindWords() {
        List<String> words = NodeKind.all().stream().map(k -> "\"" + k.type() + "\"").toList();
        return String.join(" or ", words);
    }

    private static List<Placed> readElements(Fields root, Map<String, Node> nodes, Map<String, Located> ids,
                                             Fluid fluid, ElementCatalog catalog, Problems problems) {
        List<Placed> elements = new ArrayList<>();
        List<Located> list = root.list("elements");
        if (!root.has("elements") || list.isEmpty()) {
            root.problem("elements", "a list of at least one element", root.has("elements") ? "an empty list" : "none");
        }
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "elements[" + i + "]", problems);
            String id = f.text("id");
            boolean idOk = checkId(f, id, ids);
            String type = f.text("type");
            String renamed = type == null ? null : catalog.renamed(type);
            if (renamed != null) {
                f.note("type", "\"" + type + "\" is the old name of \"" + renamed + "\"; it is still accepted in this "
                        + "release and will be refused in the next");
                type = renamed;
            }
            ElementDescriptor<?> descriptor = type == null ? null : catalog.find(type);
            if (type != null && descriptor == null) {
                f.problem("type", "an element type (" + catalog.names() + ")", "\"" + type + "\"");
            }
            if (descriptor != null) {
                Map<String, Node> ports = readPorts(f, descriptor.ports(), nodes);
                Reading r = BlockReader.read(f, descriptor.fields());
                if (r.ok()) {
                    ElementDescriptor.Built built = descriptor.build(id, r, ports == null ? Map.of() : ports, fluid);
                    if (built != null && idOk && ports != null) {
                        elements.add(new Placed(descriptor, built.element(), built.inputs()));
                    }
                }
            } else {
                f.raw("ports");
                for (String key : f.node().keys()) {
                    f.raw(key);
                }
            }
            f.finish();
        }
        return elements;
    }

    private static Map<String, Node> readPorts(Fields f, List<String> portNames, Map<String, Node> nodes) {
        Fields ports = f.object("ports");
        if (ports == null) {
            f.problem("ports", "a \"ports\" object naming the node of each port (" + String.join(", ", portNames) + ")",
                    "none");
            return null;
        }
        Map<String, Node> out = new LinkedHashMap<>();
        boolean ok = true;
        for (String port : portNames) {
            String nodeId = ports.text(port);
            if (nodeId == null) {
                ok = false;
                continue;
            }
            Node n = nodes.get(nodeId);
            if (n == null) {
                ports.problem(port, "the id of a node (" + String.join(", ", nodes.keySet()) + ")",
                        "\"" + nodeId + "\", which is not a node");
                ok = false;
                continue;
            }
            out.put(port, n);
        }
        ports.finish();
        return ok ? out : null;
    }

    private static void checkEveryNodeUsed(Fields root, Map<String, Node> nodes, List<Placed> elements,
                                           Problems problems) {
        Set<Node> used = new HashSet<>();
        for (Placed p : elements) {
            used.addAll(p.element().ports());
        }
        List<Located> list = root.list("nodes");
        for (int i = 0; i < list.size(); i++) {
            if (!(list.get(i) instanceof Located.Obj o) || !(o.get("id") instanceof Located.Scalar s)
                    || !(s.value() instanceof String id)) {
                continue;
            }
            Node n = nodes.get(id);
            if (n != null && !used.contains(n) && problems.isEmpty()) {
                problems.add(o, "nodes[" + i + "]", "a node that some element's port connects to",
                        "node \"" + id + "\" connected to nothing");
            }
        }
    }
}
