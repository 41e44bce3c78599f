package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code branchsim modes}: operating point, verdicts, outputs and refusals. */
class ModesCommandTest {

    private static final String GRIPPER = RunCommandTest.SCENARIOS.resolve("gripper-chatter.json").toString();
    private static final String FEED = RunCommandTest.SCENARIOS.resolve("feed-stall.json").toString();

    @Test
    void gripperModesAboutTheOperatingPoint(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("modes", GRIPPER, "--at", "0.55 s", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("linearised about its operating point at t = 0.55 s"), o.out());
        assertTrue(o.out().contains("operating point: Newton converged"), o.out());
        assertTrue(o.out().contains("held members: none"), o.out());
        assertTrue(o.out().contains("reducer.pilot"), o.out());
        assertTrue(o.out().contains("Caution: "), o.out());

        JsonNode json = new ObjectMapper().readTree(dir.resolve("modes.json").toFile());
        assertTrue(json.get("linearisedAbout").asText().startsWith("the operating point"));
        assertTrue(json.at("/operatingPoint/converged").asBoolean());
        assertTrue(json.at("/operatingPoint/residual_1_per_s").asDouble() < 1e-3);
        assertEquals(0.05, json.get("margin").asDouble(), 0.0);
        assertEquals(Cautions.SHORT, json.get("caution").asText());
        JsonNode modes = json.get("modes");
        List<String> csv = Files.readAllLines(dir.resolve("modes.csv"));
        assertEquals(1 + modes.size(), csv.size(), "header plus one row per mode");
        assertTrue(csv.get(0).startsWith("mode,name,verdict,"), csv.get(0));
        assertTrue(csv.get(1).contains(",operating point,"), csv.get(1));
        for (JsonNode m : modes) {
            // the verdicts by their definition: UNSTABLE when zeta < 0, then the growth rate is Re(lambda) > 0
            // and the doubling time ln 2 / Re(lambda); LOW for oscillatory modes with 0 <= zeta < margin
            double zeta = m.get("dampingRatio").asDouble();
            String verdict = m.get("verdict").asText();
            assertEquals(zeta < 0, verdict.equals("UNSTABLE"), m.toString());
            if (zeta < 0) {
                assertEquals(m.get("real_1_per_s").asDouble(), m.get("growthRate_1_per_s").asDouble(), 0.0);
                assertEquals(Math.log(2) / m.get("real_1_per_s").asDouble(), m.get("doublingTime_s").asDouble(), 1e-12);
            }
            boolean oscillatory = m.get("imaginary_rad_per_s").asDouble() > 0;
            assertEquals(oscillatory && zeta >= 0 && zeta < 0.05, verdict.equals("LOW"), m.toString());
            double parts = 0;
            for (JsonNode share : m.get("parts")) {
                parts += share.asDouble();
            }
            // participation factors are normalised per mode (Perez-Arriaga, Verghese and Schweppe, 1982); parts
            // below 0.1 % are left out of the file
            assertTrue(parts > 0.98 && parts <= 1.0 + 1e-9, m.toString());
        }
    }

    @Test
    void movingCylinderHasNoOperatingPointButCanBeLinearisedOnTheTrajectory(@TempDir Path dir) {
        RunCommandTest.Outcome o = RunCommandTest.run("modes", FEED, "--at", "0.8 s", "--out", dir.toString());
        assertEquals(1, o.code(), o.out());
        assertTrue(o.err().contains("no operating point at t = 0.8 s"), o.err());
        assertTrue(o.err().contains("feed.piston is still moving at"), o.err());
        assertTrue(o.err().contains("--on-trajectory"), o.err());

        RunCommandTest.Outcome t = RunCommandTest.run("modes", FEED, "--at", "0.8 s", "--on-trajectory", "--margin", "0.1",
                "--out", dir.toString());
        assertEquals(0, t.code(), t.err());
        assertTrue(t.out().contains("linearised on the trajectory at t = 0.8 s"), t.out());
        assertTrue(t.out().contains("below the margin 0.1"), t.out());
    }

    @Test
    void badOptionsAreRefusedWithExitTwo() {
        RunCommandTest.Outcome margin = RunCommandTest.run("modes", FEED, "--at", "2 s", "--margin", "1.5");
        assertEquals(2, margin.code());
        assertTrue(margin.err().contains("--margin") && margin.err().contains("\"1.5\""), margin.err());
        assertEquals(2, RunCommandTest.run("modes", FEED, "--at", "2 s", "--margin", "0").code());
        assertEquals(2, RunCommandTest.run("modes", FEED, "--at", "2 s", "--margin", "low").code());
        RunCommandTest.Outcome late = RunCommandTest.run("modes", FEED, "--at", "3 s");
        assertEquals(2, late.code());
        assertTrue(late.err().contains("--at") && late.err().contains("(0 s, 2.5 s]") && late.err().contains("\"3 s\""),
                late.err());
        assertEquals(2, RunCommandTest.run("modes", FEED, "--at", "soon").code());
    }
}
