package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Each command-line mistake is refused with its own error key, exits with code 2 (a run-time failure with 1), and
 * its message names the option, what was expected and what was found (the keys' definitions in ErrorKey).
 */
class ErrorKeysTest {

    private static final String FEED = RunCommandTest.SCENARIOS.resolve("feed-stall.json").toString();
    private static final String DAMPING = "elements.relief.damping=30 N*s/m";

    /** Runs a command line and returns what it threw, checking that {@link BranchsimMain} gives the key's exit code. */
    private static BranchsimException raised(ErrorKey key, String... args) {
        BranchsimException e = thrownBy(args);
        assertSame(key, e.key(), e.getMessage());
        RunCommandTest.Outcome o = RunCommandTest.run(args);
        assertEquals(key.isInputError() ? BranchsimMain.BAD_INPUT : BranchsimMain.SIMULATION_FAILED, o.code(), o.err());
        assertTrue(o.err().contains(e.getMessage()), o.err());
        return e;
    }

    /** @return the exception a command line throws, caught before the command line turns it into an exit code */
    static BranchsimException thrownBy(String... args) {
        AtomicReference<Exception> seen = new AtomicReference<>();
        CommandLine cl = BranchsimMain.commandLine(args);
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(new StringWriter()));
        cl.setExecutionExceptionHandler((ex, c, parse) -> {
            seen.set(ex);
            return BranchsimMain.BAD_INPUT;
        });
        cl.execute(args);
        return assertInstanceOf(BranchsimException.class, seen.get(), String.join(" ", args));
    }

    @Test
    void optionsOutsideTheirLimits() {
        String threads = raised(ErrorKey.OPTION_OUT_OF_RANGE, "sweep", FEED, "--vary", DAMPING, "--threads", "0")
                .getMessage();
        assertEquals("--threads: expected a whole number from 1 to " + OptionChecks.MAX_THREADS + ", found 0", threads);
        String late = raised(ErrorKey.OPTION_OUT_OF_RANGE, "modes", FEED, "--at", "3 s").getMessage();
        assertTrue(late.startsWith("--at: expected a time in (0 s, 2.5 s]") && late.endsWith("found \"3 s\""), late);
        raised(ErrorKey.OPTION_OUT_OF_RANGE, "diagnose", FEED, "--margin", "1.5");
    }

    @Test
    void optionsThatCannotBeRead() {
        String at = raised(ErrorKey.OPTION_UNREADABLE, "modes", FEED, "--at", "soon").getMessage();
        assertEquals("--at: expected a positive time such as \"1.2 s\", found \"soon\"", at);
        raised(ErrorKey.OPTION_UNREADABLE, "diagnose", FEED, "--window", "0.4 s");
        raised(ErrorKey.OPTION_UNREADABLE, "sweep", FEED, "--vary", "elements.relief.damping");
        raised(ErrorKey.OPTION_UNREADABLE, "timing", "--methods", "quantum", FEED);
    }

    @Test
    void optionsThatNameOneThingTwice() {
        String twice = raised(ErrorKey.OPTION_REPEATED, "sweep", FEED, "--vary", DAMPING, "--vary", DAMPING).getMessage();
        assertEquals("--vary: expected each parameter once, found elements.relief.damping twice", twice);
        raised(ErrorKey.OPTION_REPEATED, "sweep", FEED, "--vary", DAMPING, "--signals", "pumpLine.p,pumpLine.p");
    }

    @Test
    void parameterPathsAndTheirValues() {
        String unknown = raised(ErrorKey.UNDECLARED_PARAMETER_FIELD, "sweep", FEED, "--vary", "elements.relief.dampng=1 N*s/m")
                .getMessage();
        assertTrue(unknown.startsWith("--vary: parameter path \"elements.relief.dampng\": expected"), unknown);
        raised(ErrorKey.PARAMETER_PATH_MALFORMED, "sweep", FEED, "--vary", "elements..damping=1 N*s/m");
        String name = raised(ErrorKey.PARAMETER_NOT_NUMERIC, "sweep", FEED, "--vary", "fluid.grade=VG32").getMessage();
        assertTrue(name.startsWith("--vary fluid.grade: expected the path of a number"), name);
        String big = raised(ErrorKey.PARAMETER_VALUE_REFUSED, "sweep", FEED, "--vary", "elements.relief.seatDiameter=3 m")
                .getMessage();
        assertTrue(big.contains("expected values the scenario accepts") && big.endsWith("found \"3 m\""), big);
        raised(ErrorKey.UNDECLARED_PARAMETER_FIELD, "timing", "--sweep-parameter", "elements.nothing.diameter", FEED);
        String block = raised(ErrorKey.UNDECLARED_PARAMETER_FIELD, "timing", "--sweep-parameter", "elements.relief", FEED)
                .getMessage();
        assertTrue(block.contains("\"elements.relief\" is an element, not a value"), block);
        String grade = raised(ErrorKey.PARAMETER_NOT_NUMERIC, "timing", "--sweep-parameter", "fluid.grade", FEED)
                .getMessage();
        assertTrue(grade.contains("expected the path of a number"), grade);
    }

    @Test
    void signalsAndMetricsTheStudyDoesNotHave() {
        String signal = raised(ErrorKey.UNKNOWN_SIGNAL, "sweep", FEED, "--vary", DAMPING, "--signals", "nothing.p")
                .getMessage();
        assertTrue(signal.startsWith("--signals: expected signals of this circuit such as ") && signal.endsWith(
                "found \"nothing.p\""), signal);
        String metric = raised(ErrorKey.UNKNOWN_METRIC, "sweep", FEED, "--vary", DAMPING, "--rank-by", "speed")
                .getMessage();
        assertTrue(metric.startsWith("--rank-by: expected a metric of summary.csv") && metric.endsWith("found \"speed\""),
                metric);
    }

    /** merge takes only shard folders written by sweep or tolerance --shard. */
    @Test
    void mergeRefusesAFolderThatIsNoShard(@TempDir Path dir) throws IOException {
        Path empty = Files.createDirectories(dir.resolve("not-a-shard"));
        String refused = raised(ErrorKey.SHARD_FOLDER_REFUSED, "merge", empty.toString(), "--out",
                dir.resolve("merged").toString()).getMessage();
        assertTrue(refused.startsWith("SHARD_FOLDER " + empty), refused);
    }

    @Test
    void aToleranceStudyNeedsToleratedValues() {
        String none = raised(ErrorKey.NO_TOLERANCED_VALUE, "tolerance", FEED, "--runs", "2").getMessage();
        assertTrue(none.startsWith(FEED + ":1:1: no value is written with a tolerance"), none);
    }

    @Test
    void outputFoldersThatCannotBeUsedOrWritten(@TempDir Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("a-file.txt"), "x");
        String refused = raised(ErrorKey.OUTPUT_FOLDER_REFUSED, "run", FEED, "--out", file.toString()).getMessage();
        assertTrue(refused.endsWith("expected a folder, found a file that is not a folder"), refused);
        try (OutputFolder folder = new OutputFolder(dir.resolve("out"))) {
            BranchsimException failed = assertThrows(BranchsimException.class,
                    () -> folder.write("figure.png", p -> {
                        throw new IOException("no space left on device");
                    }));
            assertSame(ErrorKey.OUTPUT_FAILED, failed.key());
            assertTrue(failed.getMessage().contains("no space left on device"), failed.getMessage());
        }
    }

    @Test
    void timingWithoutItsDemosSaysWhereItLooked(@TempDir Path dir) {
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> TimingCommand.defaultDemosIn(List.of(dir.resolve("scenarios"))));
        assertSame(ErrorKey.DEMOS_NOT_FOUND, e.key());
        assertTrue(e.getMessage().contains(dir.resolve("scenarios").toAbsolutePath().normalize().toString()), e.getMessage());
        assertTrue(e.key().isInputError());
    }

    @Test
    void aStudyWhoseEveryVariantFailsIsARunTimeFailure(@TempDir Path dir) throws IOException {
        Path limited = dir.resolve("limited.json");
        Files.writeString(limited, Files.readString(Path.of(FEED))
                .replace("\"relativeTolerance\": 1e-6", "\"relativeTolerance\": 1e-6, \"maxEvaluations\": 2000"));
        String all = raised(ErrorKey.STUDY_FAILED, "sweep", limited.toString(), "--vary",
                "elements.relief.damping=30 N*s/m,60 N*s/m", "--threads", "1", "--out", dir.resolve("out").toString())
                .getMessage();
        assertTrue(all.startsWith("all 2 variants failed, nothing written"), all);
        assertTrue(!Files.exists(dir.resolve("out")), "nothing written");
    }
}
