package org.branchsim.plots.diagram;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.branchsim.plots.diagram.Canvas.Point;
import org.junit.jupiter.api.Test;

/**
 * The layout connects every port to its own node and places supply below actuators. The layering is the longest
 * path method of Sugiyama, Tagawa and Toda ("Methods for visual understanding of hierarchical system structures",
 * IEEE Trans. SMC 11(2), 1981, section III): along every edge the layer rises by at least one, so a chain of n
 * parts takes n layers and, drawn one above the other, has no crossing. Supply at the bottom and actuators at the
 * top is the custom of circuit diagrams (ISO 1219-2 practice; common practice, no source for the exact rule).
 */
class CircuitLayoutTest {

    /** Two reduced branches on one pump, like the press demo: pump, relief, two reducers, a clamp with its paths. */
    static Netlist press() {
        return new Netlist(List.of(
                new Part("pump", SymbolKind.PUMP, List.of("inlet", "outlet"), List.of("tank", "supply")),
                new Part("relief", SymbolKind.RELIEF_VALVE, List.of("inlet", "outlet"), List.of("supply", "tank")),
                new Part("pilotReducer", SymbolKind.PILOT_REDUCING_VALVE, List.of("inlet", "outlet", "drain"),
                        List.of("supply", "pilotLine", "tank")),
                new Part("pilotUse", SymbolKind.DIRECTIONAL_PATH, List.of("a", "b"), List.of("pilotLine", "tank")),
                new Part("clampReducer", SymbolKind.DIRECT_REDUCING_VALVE, List.of("inlet", "outlet", "drain"),
                        List.of("supply", "clampLine", "tank")),
                new Part("clampIn", SymbolKind.DIRECTIONAL_PATH, List.of("a", "b"), List.of("clampLine", "clampCap")),
                new Part("clampOut", SymbolKind.DIRECTIONAL_PATH, List.of("a", "b"), List.of("clampRod", "tank")),
                new Part("clamp", SymbolKind.CYLINDER, List.of("capEnd", "rodEnd"), List.of("clampCap", "clampRod"))),
                Set.of("tank"), Set.of());
    }

    @Test
    void everyPortIsDrawnToItsOwnNode() {
        Netlist net = press();
        CircuitLayout layout = CircuitLayout.of(net);
        int portsOnNodes = 0;
        for (Part p : net.parts()) {
            CircuitLayout.Placed placed = layout.placed(p.id());
            for (int k = 0; k < p.ports().size(); k++) {
                String node = p.nodes().get(k);
                Point end = placed.ports().get(k);
                String port = p.ports().get(k);
                if (net.tanks().contains(node)) {
                    assertTrue(layout.tanks().stream().anyMatch(t -> t.part().equals(p.id()) && t.port().equals(port)
                            && t.at().equals(end)), p.id() + "." + port + " has no tank symbol at its end");
                    continue;
                }
                portsOnNodes++;
                CircuitLayout.Wire w = layout.wires().stream().filter(x -> x.node().equals(node)).findFirst()
                        .orElseThrow();
                CircuitLayout.Drop d = w.drops().stream().filter(x -> x.part().equals(p.id()) && x.port().equals(port))
                        .findFirst().orElseThrow(() -> new AssertionError(p.id() + "." + port + " not on " + node));
                assertEquals(end, d.from(), p.id() + "." + port);
                assertEquals(w.trunkY(), d.to().y(), 1e-9);
                assertTrue(d.to().x() >= w.x0() - 1e-9 && d.to().x() <= w.x1() + 1e-9);
                assertEquals(end.x(), d.to().x(), 1e-9, "drops are vertical");
                // and no other node's wire claims this port
                long claims = layout.wires().stream().flatMap(x -> x.drops().stream())
                        .filter(x -> x.part().equals(p.id()) && x.port().equals(port)).count();
                assertEquals(1, claims, p.id() + "." + port);
            }
        }
        assertEquals(layout.wires().stream().mapToInt(w -> w.drops().size()).sum(), portsOnNodes);
        assertEquals(Set.of("supply", "pilotLine", "clampLine", "clampCap", "clampRod"),
                Set.copyOf(layout.wires().stream().map(CircuitLayout.Wire::node).toList()));
    }

    @Test
    void supplyIsBelowTheValvesAndTheActuatorOnTop() {
        CircuitLayout layout = CircuitLayout.of(press());
        CircuitLayout.Placed pump = layout.placed("pump");
        CircuitLayout.Placed reducer = layout.placed("clampReducer");
        CircuitLayout.Placed path = layout.placed("clampIn");
        CircuitLayout.Placed clamp = layout.placed("clamp");
        assertEquals(0, pump.layer());
        assertEquals(0, layout.placed("relief").layer(), "a relief valve hangs beside the pump it protects");
        assertTrue(pump.layer() < reducer.layer() && reducer.layer() < path.layer() && path.layer() < clamp.layer());
        int top = layout.placed().stream().mapToInt(CircuitLayout.Placed::layer).max().orElseThrow();
        assertEquals(top, clamp.layer(), "actuator in the top layer");
        // y grows downwards: the actuator is drawn above (smaller y) the supply
        assertTrue(clamp.cy() < path.cy() && path.cy() < reducer.cy() && reducer.cy() < pump.cy());
        // the meter-out path sits in the row under the cylinder it drains
        assertEquals(clamp.layer() - 1, layout.placed("clampOut").layer());
    }

    @Test
    void aChainIsDrawnWithoutCrossingsOneLayerPerPart() {
        // Sugiyama et al. 1981: longest-path layers, a chain has a planar layered drawing
        Netlist chain = new Netlist(List.of(
                new Part("p", SymbolKind.PUMP, List.of("inlet", "outlet"), List.of("t", "n1")),
                new Part("c", SymbolKind.CHECK_VALVE, List.of("inlet", "outlet"), List.of("n1", "n2")),
                new Part("o", SymbolKind.ORIFICE, List.of("a", "b"), List.of("n2", "n3")),
                new Part("l", SymbolKind.LINE, List.of("a", "b"), List.of("n3", "n4")),
                new Part("m", SymbolKind.MOTOR, List.of("a", "b"), List.of("n4", "t"))), Set.of("t"), Set.of());
        CircuitLayout layout = CircuitLayout.of(chain);
        assertEquals(0, layout.crossings());
        int k = 0;
        for (String id : List.of("p", "c", "o", "l", "m")) {
            assertEquals(k++, layout.placed(id).layer(), id);
        }
    }

    @Test
    void thePressLayoutHasNoCrossings() {
        // the press circuit is planar: branches side by side need not cross (Sugiyama et al. 1981, barycentre step)
        assertEquals(0, CircuitLayout.of(press()).crossings());
    }

    @Test
    void aTankHeldAtAPressureIsDrawnAsASource() {
        Netlist net = new Netlist(List.of(
                new Part("r", SymbolKind.DIRECT_REDUCING_VALVE, List.of("inlet", "outlet", "drain"),
                        List.of("supply", "out", "tank")),
                new Part("d", SymbolKind.DIRECTIONAL_PATH, List.of("a", "b"), List.of("out", "tank"))),
                Set.of("tank", "supply"), Set.of("supply"));
        CircuitLayout layout = CircuitLayout.of(net);
        assertTrue(layout.tanks().stream().anyMatch(t -> t.node().equals("supply") && t.source()));
        assertTrue(layout.tanks().stream().filter(t -> t.node().equals("tank")).noneMatch(CircuitLayout.TankMark::source));
        assertTrue(layout.tanks().stream().anyMatch(t -> t.port().equals("drain") && t.dashed()),
                "the drain to tank is dashed (ISO 1219-1:2012 line types)");
    }
}
