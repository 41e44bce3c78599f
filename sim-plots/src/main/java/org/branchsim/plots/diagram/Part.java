package org.branchsim.plots.diagram;

import java.util.List;

/**
 * One element as the diagram sees it: its id, its symbol and the node each port connects to.
 *
 * @param id element id, written beside the symbol
 * @param kind the symbol drawn
 * @param ports port names, in the element's order
 * @param nodes node id of each port, same order
 */
public record Part(String id, SymbolKind kind, List<String> ports, List<String> nodes) {

    /** Checks that every port has a node. */
    public Part {
        ports = List.copyOf(ports);
        nodes = List.copyOf(nodes);
        if (ports.size() != nodes.size()) {
            throw new IllegalArgumentException(id + ": " + ports.size() + " ports but " + nodes.size() + " nodes");
        }
    }

    /** @return the node of a port, null when the part has no such port */
    public String node(String port) {
        int i = ports.indexOf(port);
        return i < 0 ? null : nodes.get(i);
    }
}
