package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.plots.diagram.Netlist;
import org.branchsim.plots.diagram.Part;
import org.branchsim.plots.diagram.SymbolKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every demo's circuit is read into the diagram's netlist with the symbol of each element's kind (ISO 1219-1:2012
 * symbols for pump, relief valve, reducing valves, directional valve paths, cylinder) and its ports on the nodes
 * the scenario names; {@code diagram} writes circuit.svg and circuit.png for each.
 */
class DiagramCommandTest {

    @Test
    void theNetlistOfADemoCarriesItsElementsKindsAndNodes() {
        Netlist net = Netlist.of(ScenarioLoader.load(RunCommandTest.SCENARIOS.resolve("press-two-branches.json"))
                .circuit());
        assertEquals(SymbolKind.PUMP, kind(net, "pump"));
        assertEquals(SymbolKind.RELIEF_VALVE, kind(net, "relief"));
        assertEquals(SymbolKind.PILOT_REDUCING_VALVE, kind(net, "pilotReducer"));
        assertEquals(SymbolKind.DIRECTIONAL_PATH, kind(net, "pilotUse"));
        assertEquals(SymbolKind.CYLINDER, kind(net, "clamp"));
        // as the scenario file names them: "ports": { "inlet": "supply", "outlet": "clampLine", "drain": "tank" }
        Part reducer = part(net, "clampReducer");
        assertEquals(List.of("inlet", "outlet", "drain"), reducer.ports());
        assertEquals(List.of("supply", "clampLine", "tank"), reducer.nodes());
        assertEquals(Set.of("tank"), net.tanks());
        Netlist bench = Netlist.of(ScenarioLoader.load(RunCommandTest.SCENARIOS.resolve(
                "regulation-characteristic.json")).circuit());
        assertEquals(Set.of("supply"), bench.sources(), "the tank held at 80 bar is a pressure source");
        assertEquals(SymbolKind.DIRECT_REDUCING_VALVE, kind(bench, "directReducer"));
    }

    @Test
    void everyDemoGetsItsDiagram(@TempDir Path dir) throws IOException {
        List<Path> demos;
        try (Stream<Path> s = Files.list(RunCommandTest.SCENARIOS)) {
            demos = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertTrue(demos.size() >= 6, demos.toString());
        for (Path demo : demos) {
            Path out = dir.resolve(demo.getFileName().toString().replace(".json", ""));
            RunCommandTest.Outcome o = RunCommandTest.run("diagram", demo.toString(), "--out", out.toString());
            assertEquals(0, o.code(), o.err());
            String svg = Files.readString(out.resolve("circuit.svg"));
            for (Part p : Netlist.of(ScenarioLoader.load(demo).circuit()).parts()) {
                assertTrue(svg.contains(">" + p.id() + "</text>"), demo + ": no label " + p.id());
            }
            assertTrue(ImageIO.read(out.resolve("circuit.png").toFile()).getWidth() > 300, demo.toString());
        }
    }

    private static Part part(Netlist net, String id) {
        return net.parts().stream().filter(p -> p.id().equals(id)).findFirst().orElseThrow();
    }

    private static SymbolKind kind(Netlist net, String id) {
        return part(net, id).kind();
    }
}
