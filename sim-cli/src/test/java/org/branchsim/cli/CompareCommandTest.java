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
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code branchsim compare}: alignment of the measured demo, the report, and located refusals of bad files. */
class CompareCommandTest {

    static final Path MEASURED = RunCommandTest.SCENARIOS.resolve("fixture-clamp-measured.csv");
    /** Logger interval of the measured demo, s (its header: 2 kHz). */
    static final double LOGGER_INTERVAL = 0.5e-3;

    /** The clamp demo cut to the measured demo's span (1 s), so that the test stays quick. */
    static Path shortClamp(Path dir) throws IOException {
        String text = Files.readString(RunCommandTest.SCENARIOS.resolve("fixture-clamp.json"))
                .replace("\"endTime\": \"3.5 s\"", "\"endTime\": \"1.0 s\"")
                .replace("\"metricsTo\": \"1.15 s\"", "\"metricsTo\": \"1.0 s\"");
        Path p = dir.resolve("clamp-short.json");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void triggerAlignmentFindsTheDemoOffsetAndTheReportHasEveryKeyEvent(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("cmp");
        RunCommandTest.Outcome o = RunCommandTest.run("compare", shortClamp(dir).toString(), MEASURED.toString(),
                "--map", "P_clamp=clampLine.p", "--map", "P_spring [psi]=reducer.chamber.p", "--trigger",
                "P_clamp<30 bar", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(out.resolve("compare.json").toFile());
        // the demo's header says how it was made: logger time = simulation time + 1.3 s
        assertEquals(1.3, json.get("offset_s").asDouble(), LOGGER_INTERVAL);
        JsonNode clamp = json.get("channels").get(0);
        assertEquals("clampLine.p", clamp.get("signal").asText());
        // the demo was made from the same circuit with other unknowns: the settled pressure is the setting in
        // both (45 bar, within the 2 % band of the valve metrics, common practice, no source)
        assertEquals(45.0, clamp.at("/measured/settled").asDouble(), 0.9);
        assertEquals(45.0, clamp.at("/simulated/settled").asDouble(), 0.9);
        assertTrue(clamp.get("rmsError").asDouble() > 0.0);
        assertTrue(Files.exists(out.resolve("compare-clampline.p.png")));
        assertTrue(Files.exists(out.resolve("compare-clampline.p-landing.png")));
        assertTrue(o.out().contains("peak error"), o.out());
    }

    @Test
    void aBadMeasuredFileIsRefusedAtItsPlaceWithExitTwoAndNothingWritten(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "t [s],P2 [psi]\n0.000,10\n0.001,11\n0.002,1O\n");
        Path out = dir.resolve("never");
        String[] args = {"compare", shortClamp(dir).toString(), bad.toString(), "--map", "P2=clampLine.p", "--out",
            out.toString()};
        BranchsimException e = ErrorKeysTest.thrownBy(args);
        assertSame(ErrorKey.MEASURED_FILE_INVALID, e.key());
        assertTrue(e.getMessage().startsWith(bad + ":4:7: column \"P2\""), e.getMessage());
        RunCommandTest.Outcome o = RunCommandTest.run(args);
        assertEquals(BranchsimMain.BAD_INPUT, o.code(), o.err());
        assertFalse(Files.exists(out), "nothing written");

        Path missing = dir.resolve("missing.csv");
        o = RunCommandTest.run("compare", shortClamp(dir).toString(), missing.toString(), "--map", "P2=clampLine.p");
        assertEquals(BranchsimMain.BAD_INPUT, o.code(), o.err());
        assertTrue(o.err().contains("no such file"), o.err());

        o = RunCommandTest.run("compare", shortClamp(dir).toString(), MEASURED.toString(), "--map", "P_clamp=clampLine.x");
        assertEquals(BranchsimMain.BAD_INPUT, o.code(), o.err());
        o = RunCommandTest.run("compare", shortClamp(dir).toString(), MEASURED.toString(), "--map", "clampLine.p");
        assertEquals(BranchsimMain.BAD_INPUT, o.code(), o.err());
    }
}
