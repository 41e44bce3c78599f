package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code branchsim tune} on the clamp branch (the clamp demo without its feed cylinder). A 5 x 5 grid sweep of
 * damping orifice 0.4 .. 1.2 mm and spring chamber 0.5 .. 5 cm^3 (run with {@code branchsim sweep} when this test
 * was written) meets the specification below only in its 0.8 mm row (overshoot 43.6 .. 43.9 %, settling 35 .. 41
 * ms, drain 0.44 L/min, deviation 0.02 %): the grid shows it feasible with 25 runs. The search must find a design
 * that meets it, with fewer runs than the grid. The spec's limits are ours (common practice, no source).
 */
class TuneCommandTest {

    static final Path CLAMP_BRANCH = Path.of("..", "sim-core", "src", "test", "resources", "estimate",
            "clamp-branch.json");
    static final int GRID_RUNS = 25;

    static final String SPEC = """
            {
              "formatVersion": 1,
              "valve": "reducer",
              "specs": [
                { "metric": "overshoot", "max": "45 %" },
                { "metric": "settlingTime", "max": "50 ms" },
                { "metric": "drainFlow", "max": "0.5 L/min" },
                { "metric": "deviation", "max": "2 %", "weight": 0.5 }
              ],
              "free": [
                { "path": "elements.reducer.dampingOrifice.diameter", "low": "0.4 mm", "high": "1.2 mm" },
                { "path": "elements.reducer.chamberVolume", "low": "0.5 cm^3", "high": "5 cm^3" }
              ],
              "tolerances": { "runs": 4, "seed": 3,
                "values": { "elements.reducer.dampingOrifice.diameter": "0.005 mm" } }
            }
            """;

    @Test
    void findsADesignTheGridShowsFeasibleWithFewerRuns(@TempDir Path dir) throws IOException {
        Path spec = dir.resolve("spec.json");
        Files.writeString(spec, SPEC);
        Path out = dir.resolve("tune");
        RunCommandTest.Outcome o = RunCommandTest.run("tune", CLAMP_BRANCH.toString(), "--spec", spec.toString(),
                "--max-runs", "16", "--design", "6", "--threads", "2", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(out.resolve("tune.json").toFile());
        assertTrue(json.at("/best/meetsEverySpec").asBoolean(), o.out());
        assertTrue(json.get("modelRuns").asInt() < GRID_RUNS, o.out());
        double d = Double.parseDouble(json.at("/best/values/elements.reducer.dampingOrifice.diameter").asText()
                .replace(" mm", ""));
        // the grid: 0.6 mm overshoots 50 .. 53 %, 1.0 mm drains 0.68 L/min
        assertTrue(d > 0.6 && d < 1.0, "diameter " + d);
        List<String> table = Files.readAllLines(out.resolve("designs.csv"));
        assertEquals(1 + json.get("modelRuns").asInt(), table.size(), "header plus one row per design");
        assertTrue(table.get(1).startsWith("1,"), table.get(1));
        assertTrue(json.has("toleranceCheck"), o.out());
        assertEquals(4, json.at("/toleranceCheck/builds").asInt());
        assertTrue(o.out().contains("<- binds"), o.out());
        assertTrue(Files.exists(out.resolve("tuned.json")));
    }

    @Test
    void aBadSpecificationIsRefusedAtItsPlace(@TempDir Path dir) throws IOException {
        Path spec = dir.resolve("spec.json");
        Files.writeString(spec, SPEC.replace("\"overshoot\"", "\"overshot\""));
        BranchsimException e = ErrorKeysTest.thrownBy("tune", CLAMP_BRANCH.toString(), "--spec", spec.toString(),
                "--out", dir.resolve("never").toString());
        assertSame(ErrorKey.SPEC_INVALID, e.key());
        assertTrue(e.getMessage().startsWith(spec + ":5:17: metric"), e.getMessage());
        Files.writeString(spec, SPEC.replace("\"max\": \"50 ms\"", "\"max\": \"50 bar\""));
        RunCommandTest.Outcome o = RunCommandTest.run("tune", CLAMP_BRANCH.toString(), "--spec", spec.toString(),
                "--out", dir.resolve("never").toString());
        assertEquals(BranchsimMain.BAD_INPUT, o.code(), o.err());
        assertTrue(o.err().contains("settlingTime.max"), o.err());
        assertFalse(Files.exists(dir.resolve("never")));
    }
}
