package org.branchsim.core.study;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;

/**
 * A scenario document with one reducing valve's branch copied several times onto the same supply node: the size
 * scaling case of the timing command. The branch is the valve and everything reached from its outlet through
 * elements without passing the valve's inlet node or a tank; copy k (k = 2, 3, ...) has every node and element id
 * of the branch suffixed {@code _k}, its ports and the schedule entries of its elements renamed alike. The first
 * copy keeps the original ids, so the document with one copy is the original. Built from the parsed document, not
 * from the file; the result is a new parsed document (the original is not changed).
 */
public final class BranchReplica {

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** What a replication copied: the ids of the branch's nodes and elements (those of the first copy). */
    public record Branch(Set<String> nodes, Set<String> elements) {
    }

    private BranchReplica() {
    }

    /**
     * @param document a scenario document (not changed)
     * @param valveId the id of the reducing valve whose branch is copied
     * @return the branch's node and element ids
     * @throws IllegalArgumentException when the valve is missing or its branch reaches back to its inlet node
     */
    public static Branch branchOf(Located document, String valveId) {
        ObjectNode root = toJson(document);
        Set<String> tanks = new HashSet<>();
        for (JsonNode node : root.path("nodes")) {
            if ("tank".equals(node.path("type").asText())) {
                tanks.add(node.path("id").asText());
            }
        }
        JsonNode valve = null;
        for (JsonNode element : root.path("elements")) {
            if (valveId.equals(element.path("id").asText())) {
                valve = element;
            }
        }
        if (valve == null || !valve.path("ports").has("outlet") || !valve.path("ports").has("inlet")) {
            throw new IllegalArgumentException("no element \"" + valveId + "\" with an inlet and an outlet port");
        }
        String inlet = valve.path("ports").path("inlet").asText();
        Set<String> nodes = new LinkedHashSet<>();
        nodes.add(valve.path("ports").path("outlet").asText());
        Set<String> elements = new LinkedHashSet<>();
        elements.add(valveId);
        boolean grew = true;
        while (grew) {
            grew = false;
            for (JsonNode element : root.path("elements")) {
                String id = element.path("id").asText();
                if (elements.contains(id) || !touches(element, nodes)) {
                    continue;
                }
                elements.add(id);
                grew = true;
                for (Iterator<JsonNode> it = element.path("ports").elements(); it.hasNext(); ) {
                    String port = it.next().asText();
                    if (port.equals(inlet)) {
                        throw new IllegalArgumentException("the branch of \"" + valveId + "\" reaches back to its inlet "
                                + "node \"" + inlet + "\" through \"" + id + "\"");
                    }
                    if (!tanks.contains(port)) {
                        nodes.add(port);
                    }
                }
            }
        }
        return new Branch(nodes, elements);
    }

    private static boolean touches(JsonNode element, Set<String> nodes) {
        for (Iterator<JsonNode> it = element.path("ports").elements(); it.hasNext(); ) {
            if (nodes.contains(it.next().asText())) {
                return true;
            }
        }
        return false;
    }

    /**
     * @param fileName name for messages
     * @param document a scenario document (not changed)
     * @param valveId the reducing valve whose branch is copied
     * @param copies how many copies of the branch the result has (1 = the original)
     * @return the new document, its name suffixed {@code -xN}
     */
    public static Located replicate(String fileName, Located document, String valveId, int copies) {
        if (copies < 1) {
            throw new IllegalArgumentException("copies must be at least 1, found " + copies);
        }
        Branch branch = branchOf(document, valveId);
        ObjectNode root = toJson(document);
        root.put("name", root.path("name").asText() + "-x" + copies);
        ArrayNode nodes = (ArrayNode) root.get("nodes");
        ArrayNode elements = (ArrayNode) root.get("elements");
        ArrayNode schedule = root.get("schedule") instanceof ArrayNode a ? a : null;
        List<JsonNode> branchNodes = new ArrayList<>();
        nodes.forEach(n -> {
            if (branch.nodes().contains(n.path("id").asText())) {
                branchNodes.add(n);
            }
        });
        List<JsonNode> branchElements = new ArrayList<>();
        elements.forEach(e -> {
            if (branch.elements().contains(e.path("id").asText())) {
                branchElements.add(e);
            }
        });
        List<JsonNode> branchEntries = new ArrayList<>();
        if (schedule != null) {
            schedule.forEach(s -> {
                if (branch.elements().contains(s.path("set").asText().split("\\.", 2)[0])) {
                    branchEntries.add(s);
                }
            });
        }
        for (int k = 2; k <= copies; k++) {
            String suffix = "_" + k;
            for (JsonNode n : branchNodes) {
                ObjectNode c = n.deepCopy();
                c.put("id", n.path("id").asText() + suffix);
                nodes.add(c);
            }
            for (JsonNode e : branchElements) {
                ObjectNode c = e.deepCopy();
                c.put("id", e.path("id").asText() + suffix);
                ObjectNode ports = (ObjectNode) c.get("ports");
                for (Iterator<String> it = e.path("ports").fieldNames(); it.hasNext(); ) {
                    String port = it.next();
                    String node = e.path("ports").path(port).asText();
                    if (branch.nodes().contains(node)) {
                        ports.put(port, node + suffix);
                    }
                }
                elements.add(c);
            }
            for (JsonNode s : branchEntries) {
                ObjectNode c = s.deepCopy();
                String[] target = s.path("set").asText().split("\\.", 2);
                c.put("set", target[0] + suffix + (target.length > 1 ? "." + target[1] : ""));
                schedule.add(c);
            }
        }
        String text;
        try {
            text = new ObjectMapper().writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a scenario tree could not be written as JSON", e);
        }
        return DocumentParser.parse(fileName + " (branch of " + valveId + " x" + copies + ")", text, false);
    }

    /** @return the document as a Jackson tree (values as parsed: texts, numbers, booleans, nulls) */
    static ObjectNode toJson(Located document) {
        JsonNode tree = json(document);
        if (!(tree instanceof ObjectNode o)) {
            throw new IllegalArgumentException("a scenario document is an object, found " + document.describe());
        }
        return o;
    }

    private static JsonNode json(Located value) {
        if (value instanceof Located.Obj o) {
            ObjectNode out = NODES.objectNode();
            for (String key : o.keys()) {
                out.set(key, json(o.get(key)));
            }
            return out;
        }
        if (value instanceof Located.Arr a) {
            ArrayNode out = NODES.arrayNode();
            for (Located item : a.items()) {
                out.add(json(item));
            }
            return out;
        }
        Object v = ((Located.Scalar) value).value();
        if (v == null) {
            return NODES.nullNode();
        }
        if (v instanceof String s) {
            return NODES.textNode(s);
        }
        if (v instanceof Boolean b) {
            return NODES.booleanNode(b);
        }
        if (v instanceof Integer i) {
            return NODES.numberNode(i);
        }
        if (v instanceof Long l) {
            return NODES.numberNode(l);
        }
        if (v instanceof BigInteger b) {
            return NODES.numberNode(b);
        }
        if (v instanceof BigDecimal b) {
            return NODES.numberNode(b);
        }
        if (v instanceof Number num) {
            return NODES.numberNode(num.doubleValue());
        }
        return NODES.textNode(String.valueOf(v));
    }
}
