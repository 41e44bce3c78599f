package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `run` reports cavitation and the cylinders' forces in metrics.json and summary.txt. The circuit (test resource
 * overrunning-load.json) hangs a 3 to 4 kN load (a table against position) on a 50 mm cylinder whose cap end draws
 * oil only through a 0.3 mm orifice: to hold the load the cap end would need about -17 bar, below absolute vacuum
 * (p A = F, statics), so it must fall below the air-release pressure and the report must fire, with the minimum
 * absolute pressure above zero. A demo that stays above the threshold reports none.
 */
class CavitationReportTest {

    @Test
    void anOverrunningLoadFiresTheReportAndTheForcesAreReported(@TempDir Path dir) throws IOException {
        Path scenario = Path.of("src", "test", "resources", "overrunning-load.json");
        RunCommandTest.Outcome o = RunCommandTest.run("run", scenario.toString(), "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode m = new ObjectMapper().readTree(dir.resolve("metrics.json").toFile());
        JsonNode cav = m.get("cavitation");
        assertTrue(cav.get("found").asBoolean(), cav.toString());
        assertEquals(-0.7, cav.get("threshold").asDouble(), 1e-9);
        assertEquals("bar", cav.get("pressureUnit").asText());
        JsonNode cap = cav.get("nodes").get(0);
        assertEquals("cap", cap.get("node").asText());
        assertEquals(1, cav.get("nodes").size(), "the rod end is pressurised by the load, not cavitating");
        double minimum = cap.get("minimumAbsolutePressure").asDouble();
        assertTrue(minimum > 0.0 && minimum < 0.313, "minimum absolute pressure " + minimum + " bar");
        assertTrue(cap.get("durationBelow_s").asDouble() > 0.0);
        assertTrue(cap.get("uncertain").asText().contains("uncertain"));
        String summary = Files.readString(dir.resolve("summary.txt"));
        assertTrue(summary.contains("cavitation: node cap fell below the air-release pressure -0.700 bar"), summary);
        assertTrue(summary.contains("result at that node is uncertain"), summary);

        // the cylinder force is p_cap A_cap - p_rod A_rod: with the load pulling 3 to 4 kN the rod end carries it,
        // so the force is negative (retracting) and at most the load plus the cap's vacuum share p_atm A_cap
        JsonNode arm = m.get("cylinders").get(0);
        assertEquals("arm", arm.get("id").asText());
        assertEquals("N", arm.get("forceUnit").asText());
        assertTrue(arm.at("/cylinderForce/measuredFrom").asText().contains("p_cap A_cap - p_rod A_rod"));
        assertTrue(arm.at("/cylinderForce/final").asDouble() < 0.0, arm.toString());
        assertFalse(arm.has("clampForce"), "no work-piece, no clamp force");
        assertTrue(summary.contains("cylinder arm: force (chamber pressures on the piston areas)"), summary);
    }

    @Test
    void theOtherDemosReportNoCavitation(@TempDir Path dir) throws IOException {
        for (String demo : new String[] {"feed-stall", "gripper-chatter", "pilot-supply-hunting",
            "press-two-branches"}) {
            Path out = dir.resolve(demo);
            RunCommandTest.Outcome o = RunCommandTest.run("run",
                    RunCommandTest.SCENARIOS.resolve(demo + ".json").toString(), "--out", out.toString());
            assertEquals(0, o.code(), o.err());
            JsonNode m = new ObjectMapper().readTree(out.resolve("metrics.json").toFile());
            assertFalse(m.at("/cavitation/found").asBoolean(), demo + ": " + m.get("cavitation"));
        }
    }

    @Test
    void theFixtureClampReportsItsClampForceAndNoCavitation(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("run",
                RunCommandTest.SCENARIOS.resolve("fixture-clamp.json").toString(), "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode m = new ObjectMapper().readTree(dir.resolve("metrics.json").toFile());
        assertFalse(m.at("/cavitation/found").asBoolean(), m.get("cavitation").toString());
        JsonNode clamp = m.get("cylinders").get(0);
        assertEquals("clamp", clamp.get("id").asText());
        // at rest on the part the contact carries the hydraulic force (statics, F_contact = p1 A1 - p2 A2): the
        // final clamp force equals the final cylinder force within the friction-free balance, 1 %
        double force = clamp.at("/cylinderForce/final").asDouble();
        double onPart = clamp.at("/clampForce/final").asDouble();
        assertTrue(onPart > 0.0, clamp.toString());
        assertEquals(force, onPart, 0.01 * force);
        String summary = Files.readString(dir.resolve("summary.txt"));
        assertTrue(summary.contains("cavitation: no node fell below the air-release pressure"), summary);
        assertTrue(summary.contains("clamp force on the part (contact force)"), summary);
    }
}
