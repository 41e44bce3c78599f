package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.Set;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.api.Test;

/** The size-scaling case's copies of the clamp branch of the fixture-clamp demo. */
class BranchReplicaTest {

    private static final Located CLAMP = DocumentParser.parse(Path.of("..", "scenarios", "fixture-clamp.json"));

    /**
     * The demo's own description: the reducing valve feeds the clamp cylinder (clampLine, clampCap, clampRod, the
     * two metering paths and the cylinder); the feed branch and the relief valve stay on the pump line.
     */
    @Test
    void theClampBranchIsWhatTheReducingValveFeeds() {
        BranchReplica.Branch b = BranchReplica.branchOf(CLAMP, "reducer");
        assertEquals(Set.of("clampLine", "clampCap", "clampRod"), b.nodes());
        assertEquals(Set.of("reducer", "clampPA", "clampBT", "clamp"), b.elements());
    }

    /**
     * Sixteen copies: 7 nodes of the demo plus 15 x 3, each copy with its elements, ports and schedule entries;
     * 17 states for the demo and 10 more per copy (3 node pressures, the valve's spool and pilot positions and
     * velocities and its spring chamber pressure, the piston's position and velocity), so 167 states: the sizes the
     * issue quotes for this case (17 to 167 states).
     */
    @Test
    void sixteenCopiesGiveTheSizesOfTheScalingCase() {
        Located doc = BranchReplica.replicate("fixture-clamp.json", CLAMP, "reducer", 16);
        CircuitModel c = ScenarioLoader.build("fixture-clamp.json", doc).circuit();
        assertEquals(167, c.dimension());
        assertEquals(7 + 15 * 3, c.nodes().size());
        assertNotNull(c.element("clamp_16"));
        assertNotNull(c.signal("clampLine_16.p"));
        assertNotNull(c.signal("reducer_7.spool.x"));
        assertEquals(4 + 15 * 2, ((Located.Arr) ((Located.Obj) doc).get("schedule")).items().size());
        assertEquals(17, ScenarioLoader.build("x", BranchReplica.replicate("x", CLAMP, "reducer", 1)).circuit()
                .dimension());
    }

    @Test
    void anElementWithoutInletAndOutletIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> BranchReplica.branchOf(CLAMP, "clamp"));
        assertThrows(IllegalArgumentException.class, () -> BranchReplica.replicate("x", CLAMP, "reducer", 0));
    }
}
