package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** End to end through the command line: the demo runs and its files are complete and readable. */
class RunCommandTest {

    static final Path SCENARIOS = Path.of("..", "scenarios");

    /** Output of one command-line call. */
    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = BranchsimMain.execute(new PrintWriter(out), new PrintWriter(err), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** A run that oscillates gets a figure of the last few cycles of each oscillation, with the waveform's samples. */
    @Test
    void anOscillationGetsAFigureOfItsLastCycles(@TempDir Path dir) throws IOException {
        Outcome o = run("run", SCENARIOS.resolve("gripper-chatter.json").toString(), "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        Path figure = dir.resolve("oscillation-1-reducer-pilot-x.png");
        assertTrue(Files.exists(figure), o.out());
        assertTrue(ImageIO.read(figure.toFile()) != null);
        assertTrue(o.out().contains("oscillation: chatter"), o.out());
    }

    @Test
    void feedStallDemoWritesTraceMetricsAndFigures(@TempDir Path dir) throws IOException {
        Outcome o = run("run", SCENARIOS.resolve("feed-stall.json").toString(), "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("CAUTION"), o.out());
        assertTrue(o.out().contains("steps accepted"), o.out());

        List<String> csv = Files.readAllLines(dir.resolve("trace.csv"), StandardCharsets.UTF_8);
        String[] header = csv.get(0).split(",");
        assertEquals("t [s]", header[0]);
        assertTrue(List.of(header).contains("pumpLine.p [bar]"), csv.get(0));
        assertTrue(List.of(header).contains("feed.piston.x [mm]"), csv.get(0));
        assertTrue(List.of(header).contains("relief.q [L/min]"), csv.get(0));
        assertEquals(2501 + 1, csv.size(), "header plus one row per millisecond from 0 to 2.5 s");
        assertEquals(header.length, csv.get(csv.size() - 1).split(",").length);

        JsonNode metrics = new ObjectMapper().readTree(dir.resolve("metrics.json").toFile());
        assertEquals("feed-stall", metrics.get("scenario").asText());
        assertEquals("bar", metrics.at("/signals/pumpLine.p/unit").asText());
        assertTrue(metrics.at("/signals/pumpLine.p/peak").asDouble() > 140.0);
        assertTrue(metrics.at("/solver/acceptedSteps").asLong() > 0);
        assertTrue(metrics.at("/solver/derivativeEvaluations").asLong() > 0);
        assertTrue(metrics.at("/solver/wallTime_s").isNumber());
        assertTrue(metrics.get("caution").asText().contains("ISO 4413"));

        for (String png : List.of("pressures.png", "flows.png", "positions.png", "plot-1-feed-axis-pressures.png")) {
            BufferedImage img = ImageIO.read(dir.resolve(png).toFile());
            assertNotNull(img, png + " decodes");
            assertTrue(img.getWidth() > 500 && img.getHeight() > 300, png);
        }
        try (var files = Files.list(dir)) {
            assertFalse(files.anyMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary files left");
        }
    }

    @Test
    void badScenarioExitsTwoWritesNothingAndShowsNoStackTrace(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.json");
        String text = Files.readString(SCENARIOS.resolve("feed-stall.json")).replace("\"140 bar\"", "\"140\"");
        Files.writeString(bad, text);
        Path out = dir.resolve("out");
        Outcome o = run("run", bad.toString(), "--out", out.toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("bad.json:"), o.err());
        assertTrue(o.err().contains("elements[1].setting"), o.err());
        assertFalse(o.err().contains("\tat "), "no stack trace: " + o.err());
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    void solverFailureExitsOneAndNamesTimeAndStates(@TempDir Path dir) throws IOException {
        Path limited = dir.resolve("limited.json");
        String text = Files.readString(SCENARIOS.resolve("feed-stall.json"))
                .replace("\"relativeTolerance\": 1e-6", "\"relativeTolerance\": 1e-6, \"maxEvaluations\": 2000");
        Files.writeString(limited, text);
        Outcome o = run("run", limited.toString(), "--out", dir.resolve("out").toString());
        assertEquals(1, o.code(), o.err());
        assertTrue(o.err().contains("derivative evaluations"), o.err());
        assertTrue(o.err().contains("t = "), o.err());
        assertTrue(o.err().contains("pumpLine.p") || o.err().contains("relief.poppet"), o.err());
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void stepSizeUnderflowExitsOneAndNamesTimeAndStates(@TempDir Path dir) throws IOException {
        Path limited = dir.resolve("coarse.json");
        Files.writeString(limited, Files.readString(SCENARIOS.resolve("feed-stall.json"))
                .replace("\"relativeTolerance\": 1e-6", "\"relativeTolerance\": 1e-6, \"minStep\": \"1 ms\", \"maxStep\": \"2 ms\""));
        Outcome o = run("run", limited.toString(), "--out", dir.resolve("out").toString());
        assertEquals(1, o.code(), o.err());
        assertTrue(o.err().contains("step size fell below the minimum"), o.err());
        assertTrue(o.err().contains("largest error in state pumpLine.p"), o.err());
        assertTrue(o.err().contains("at t = ") && o.err().contains("pumpLine.p"), o.err());
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void usageErrorsExitTwo() {
        assertEquals(2, run().code());
        assertEquals(2, run("run").code());
        assertEquals(2, run("fly", "x.json").code());
        Outcome missing = run("run", "no-such-file.json");
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no-such-file.json"), missing.err());
    }

    @Test
    void helpIsAvailableOnEveryCommand() {
        for (String[] args : new String[][] {{"--help"}, {"run", "--help"}, {"check", "--help"}}) {
            Outcome o = run(args);
            assertEquals(0, o.code());
            assertTrue(o.out().contains("Usage: branchsim"), o.out());
        }
        assertTrue(run("run", "--help").out().contains("--out=DIR"));
    }

    @Test
    void checkValidatesWithoutRunning(@TempDir Path dir) {
        Outcome o = run("check", SCENARIOS.resolve("feed-stall.json").toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("is valid"), o.out());
    }
}
