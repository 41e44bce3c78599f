package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every mistake in a command-line option exits with code 2 before any run, naming the option, what was
 * expected and what was found, and writes nothing. The limits checked are those stated in the README and
 * in the option help (design limits, common practice, no source).
 */
class OptionRefusalTest {

    private static final String FEED = RunCommandTest.SCENARIOS.resolve("feed-stall.json").toString();

    /** Runs a command that must be refused; checks the exit code, the option named, and that nothing ran. */
    private static String refused(Path out, String option, String... args) {
        RunCommandTest.Outcome o = RunCommandTest.run(args);
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains(option), "names " + option + ": " + o.err());
        assertTrue(o.err().contains("expected"), o.err());
        assertFalse(o.err().contains("variants 1/") || o.out().contains("ranked by"), "no run started: " + o.err());
        assertFalse(o.err().contains("\tat ") || o.err().contains("Exception"), o.err());
        if (out != null) {
            assertFalse(Files.exists(out), "nothing written");
        }
        return o.err();
    }

    @Test
    void unknownCommandWithHelpIsNamed() {
        RunCommandTest.Outcome o = RunCommandTest.run("fly", "--help");
        assertEquals(2, o.code());
        assertTrue(o.err().contains("unknown command \"fly\""), o.err());
        assertTrue(o.err().contains("run, check, sweep"), o.err());
    }

    @Test
    void sweepValuesMustCarryTheFieldsDimension(@TempDir Path dir) {
        Path out = dir.resolve("out");
        String bare = refused(out, "--vary elements.relief.seatDiameter", "sweep", FEED, "--vary",
                "elements.relief.seatDiameter=0.5,0.7", "--out", out.toString());
        assertTrue(bare.contains("length with its unit") && bare.contains("found \"0.5\""), bare);
        String wrong = refused(out, "--vary elements.relief.seatDiameter", "sweep", FEED, "--vary",
                "elements.relief.seatDiameter=5 bar", "--out", out.toString());
        assertTrue(wrong.contains("not a pressure unit"), wrong);
        String infinite = refused(out, "--vary", "sweep", FEED, "--vary", "elements.relief.seatDiameter=1e400 mm",
                "--out", out.toString());
        assertTrue(infinite.contains("finite"), infinite);
        String outside = refused(out, "--vary", "sweep", FEED, "--vary", "elements.relief.seatDiameter=3 m",
                "--out", out.toString());
        assertTrue(outside.contains("from 1 um to 2 m"), outside);
    }

    @Test
    void rangesNeedACountWithinTheLimit(@TempDir Path dir) {
        Path out = dir.resolve("out");
        String noCount = refused(out, "--vary", "sweep", FEED, "--vary", "elements.relief.seatDiameter=0.5 mm..1 mm",
                "--out", out.toString());
        assertTrue(noCount.contains("from..to:count"), noCount);
        String huge = refused(out, "--vary", "sweep", FEED, "--vary",
                "elements.relief.seatDiameter=5 mm..6 mm:1000000000", "--out", out.toString());
        assertTrue(huge.contains("from 2 to " + OptionChecks.MAX_VARIANTS), huge);
        String grid = refused(out, "--vary", "sweep", FEED, "--vary", "elements.relief.seatDiameter=5 mm..6 mm:200",
                "--vary", "elements.relief.damping=30 N*s/m..60 N*s/m:200", "--out", out.toString());
        assertTrue(grid.contains("at most " + OptionChecks.MAX_VARIANTS + " variants"), grid);
    }

    @Test
    void threadsAndRunCountsAreChecked(@TempDir Path dir) {
        Path out = dir.resolve("out");
        refused(out, "--threads", "sweep", FEED, "--vary", "elements.relief.seatDiameter=5 mm", "--threads", "0",
                "--out", out.toString());
        refused(out, "--runs", "tolerance", FEED, "--runs", "0", "--out", out.toString());
        refused(out, "--runs", "tolerance", FEED, "--runs", "2000000000", "--out", out.toString());
        refused(out, "--runs", "timing", "--runs", "0", "--out", out.toString(), FEED);
        refused(out, "--end-time", "timing", "--end-time", "1e400 s", "--out", out.toString(), FEED);
        refused(out, "--sweep-parameter", "timing", "--sweep-parameter", "elements.nothing.diameter", "--out",
                out.toString(), FEED);
    }

    @Test
    void unknownMetricsListTheValidOnes(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        String rank = refused(out, "--rank-by", "sweep", FEED, "--vary", "elements.relief.seatDiameter=5 mm",
                "--rank-by", "peak pressure", "--out", out.toString());
        assertTrue(rank.contains("pumpLine.p.peak [bar]") && rank.contains("found \"peak pressure\""), rank);
        Path toleranced = dir.resolve("toleranced.json");
        Files.writeString(toleranced, Files.readString(Path.of(FEED))
                .replace("\"springRate\": \"60 N/mm\"", "\"springRate\": \"60 N/mm ± 10 %\""));
        String histogram = refused(out, "--histogram", "tolerance", toleranced.toString(), "--runs", "2",
                "--histogram", "nope", "--out", out.toString());
        assertTrue(histogram.contains("energy.residual [%]"), histogram);
    }

    @Test
    void metricsAreFoundWithoutUnitInAnyCase() {
        List<String> cols = List.of("pumpLine.p.peak [bar]", "pumpLine.p.final [bar]", "oscillations");
        assertEquals("pumpLine.p.peak [bar]", StudyTable.resolve("--rank-by", "PUMPLINE.P.PEAK", cols));
        assertEquals("pumpLine.p.peak [bar]", StudyTable.resolve("--rank-by", "pumpLine.p.peak [bar]", cols));
        assertEquals("pumpLine.p.final [bar]", StudyTable.resolve("--rank-by", "pumpline.p.final [psi]", cols));
        assertEquals("oscillations", StudyTable.resolve("--rank-by", "Oscillations", cols));
    }

    @Test
    void thePredictedColumnsAreTheColumnsARunWrites(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        RunCommandTest.Outcome o = RunCommandTest.run("sweep", FEED, "--vary", "elements.relief.seatDiameter=5 mm",
                "--rank-by", "pumpline.p.peak", "--threads", "1", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        String header = Files.readAllLines(out.resolve("summary.csv")).get(0);
        List<String> written = Arrays.asList(header.split(",")).subList(5, header.split(",").length);
        assertEquals(StudyTable.columnsOf(ScenarioLoader.load(Path.of(FEED))), written);
    }

    @Test
    void outputFoldersThatCannotBeUsedAreRefusedBeforeTheRun(@TempDir Path dir) throws IOException {
        refused(null, "--out", "run", FEED, "--out", "");
        Path file = Files.writeString(dir.resolve("file.txt"), "not a folder");
        refused(null, "--out", "run", FEED, "--out", file.toString());
        refused(null, "--out", "run", FEED, "--out", file.resolve("below").toString());
        assertEquals("not a folder", Files.readString(file));
        Path foreign = Files.createDirectories(dir.resolve("mine"));
        Files.writeString(foreign.resolve("notes.txt"), "keep me");
        String f = refused(null, "--out", "run", FEED, "--out", foreign.toString());
        assertTrue(f.contains("notes.txt"), f);
        assertEquals("keep me", Files.readString(foreign.resolve("notes.txt")));
    }

    @Test
    void theScenariosOwnFolderIsNeverReplaced(@TempDir Path dir) throws IOException {
        Path scenario = dir.resolve("metrics.json");
        String text = Files.readString(Path.of(FEED));
        Files.writeString(scenario, text);
        String err = refused(null, "--out", "run", scenario.toString(), "--out", dir.toString());
        assertTrue(err.contains("does not hold the input"), err);
        assertEquals(text, Files.readString(scenario));
    }

    @Test
    void aStudyInWhichEveryVariantFailsExitsOneAndWritesNothing(@TempDir Path dir) throws IOException {
        Path limited = dir.resolve("limited.json");
        Files.writeString(limited, Files.readString(Path.of(FEED))
                .replace("\"relativeTolerance\": 1e-6", "\"relativeTolerance\": 1e-6, \"maxEvaluations\": 2000"));
        Path out = dir.resolve("out");
        RunCommandTest.Outcome o = RunCommandTest.run("sweep", limited.toString(), "--vary",
                "elements.relief.damping=30 N*s/m,60 N*s/m", "--threads", "2", "--out", out.toString());
        assertEquals(1, o.code(), o.err());
        assertTrue(o.err().contains("all 2 variants failed"), o.err());
        assertTrue(o.err().contains("derivative evaluations"), o.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void benchFindsItsDemosWithoutBeingRunFromTheRepositoryRoot() {
        // the tests run in sim-cli/, where ./scenarios does not exist
        assertFalse(Files.isDirectory(Path.of("scenarios")));
        List<Path> demos = TimingCommand.defaultDemos();
        assertEquals(TimingCommand.DEFAULT_DEMOS.size(), demos.size());
        for (Path p : demos) {
            assertTrue(Files.isRegularFile(p), p.toString());
        }
    }

    @Test
    void fileNamesMadeOfTitlesAreShortAndSafe() {
        String slug = FigureSet.slug("Clamp / branch: pressures at the part (bar) ".repeat(10) + "ünïcödé");
        assertTrue(slug.length() <= FigureSet.MAX_SLUG, slug);
        assertTrue(slug.matches("[a-z0-9]+(-[a-z0-9]+)*"), slug);
        assertTrue(("plot-99-" + slug + ".png").length() <= 60);
        assertEquals("figure", FigureSet.slug("°°°"));
    }
}
