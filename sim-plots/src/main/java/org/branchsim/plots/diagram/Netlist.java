package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;

/**
 * What a diagram draws: the parts (elements with their port connections) and which nodes are tanks (drawn as a
 * tank symbol at every port that reaches one, ISO 1219-1:2012, so that return lines need not be routed), and
 * which of those tanks hold a pressure other than zero (ideal pressure sources, drawn as a source symbol).
 *
 * @param parts the elements, in the scenario's order
 * @param tanks ids of the tank nodes, pressure sources included
 * @param sources ids of the tank nodes whose pressure is not zero throughout (a subset of tanks)
 */
public record Netlist(List<Part> parts, Set<String> tanks, Set<String> sources) {

    /** Copies the lists; checks that every source is a tank. */
    public Netlist {
        parts = List.copyOf(parts);
        tanks = Set.copyOf(tanks);
        sources = Set.copyOf(sources);
        if (!tanks.containsAll(sources)) {
            throw new IllegalArgumentException("pressure sources must be tank nodes: " + sources);
        }
    }

    /** @return the netlist of a circuit model: every element with its symbol kind, ports and nodes */
    public static Netlist of(CircuitModel model) {
        List<Part> parts = new ArrayList<>();
        for (Element e : model.elements()) {
            SymbolKind kind = SymbolKind.ofClass(e.getClass().getSimpleName());
            List<String> nodes = e.ports().stream().map(Node::id).toList();
            List<String> ports = new ArrayList<>(kind.ports());
            if (ports.size() != nodes.size()) {
                kind = SymbolKind.GENERIC;
                ports.clear();
                for (int i = 0; i < nodes.size(); i++) {
                    ports.add("port" + (i + 1));
                }
            }
            parts.add(new Part(e.id(), kind, ports, nodes));
        }
        Set<String> tanks = new TreeSet<>();
        Set<String> sources = new TreeSet<>();
        for (Node n : model.nodes()) {
            if (n.isTank()) {
                tanks.add(n.id());
                if (n.tankPressure().valueAt(0) != 0 || !n.tankPressure().ramps().isEmpty()) {
                    sources.add(n.id());
                }
            }
        }
        return new Netlist(parts, tanks, sources);
    }
}
