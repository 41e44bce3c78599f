package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run killed at any moment (SIGKILL, SIGTERM, SIGINT) leaves its output folder holding either the complete
 * earlier result or the complete new one: the earlier run simulates 0.1 s, the new one 0.15 s, and every
 * file of the folder must tell the same end time. Temporary folders a SIGKILL leaves are siblings with a
 * recognisable name, removed by the next run. The signals are those of POSIX kill(1).
 */
class KilledRunTest {

    private static final String LEFTOVER = "\\.result\\.branchsim-(tmp|old)-\\d+-.*";

    private static Path scenario(Path dir, String name, String endTime) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, Files.readString(RunCommandTest.SCENARIOS.resolve("feed-stall.json"))
                .replace("\"endTime\": \"2.5 s\"", "\"endTime\": \"" + endTime + "\""));
        return p;
    }

    private static Process start(Path scenario, Path target) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return new ProcessBuilder(java, "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"),
                BranchsimMain.class.getName(), "run", scenario.toString(), "--out", target.toString())
                .redirectErrorStream(true).redirectOutput(new File("/dev/null")).start();
    }

    /** @return the end time every file of the folder tells, after checking the folder is complete */
    private static String completeResult(Path target, Set<String> files) throws IOException {
        assertEquals(files, OutputFolderTest.names(target), "complete, no temporary file");
        List<String> trace = Files.readAllLines(target.resolve("trace.csv"));
        String end = trace.get(trace.size() - 1).split(",")[0];
        String metrics = Files.readString(target.resolve("metrics.json"));
        String summary = Files.readString(target.resolve("summary.txt"));
        double seconds = Double.parseDouble(end);
        assertTrue(metrics.contains("\"simulatedTime_s\" : " + (seconds == 0.1 ? "0.1" : "0.15")), "metrics agree with trace");
        assertTrue(summary.contains(String.format(java.util.Locale.ROOT, "%.4g s simulated", seconds)),
                "summary agrees with trace");
        return end;
    }

    /**
     * Waits until the run's temporary folder appears (it has begun to write) or the run ends.
     *
     * @return the time it appeared, System.nanoTime()
     */
    private static long waitForWriting(Path dir, Process p) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (p.isAlive() && System.nanoTime() < deadline) {
            try (var s = Files.list(dir)) {
                if (s.anyMatch(f -> f.getFileName().toString().startsWith(".result.branchsim-tmp-" + p.pid() + "-"))) {
                    return System.nanoTime();
                }
            }
            Thread.sleep(1);
        }
        return System.nanoTime();
    }

    @Test
    void aKilledRunLeavesTheEarlierOrTheNewResultComplete(@TempDir Path dir) throws Exception {
        Assumptions.assumeTrue(File.separatorChar == '/', "POSIX signals");
        Path earlier = scenario(dir, "earlier.json", "0.1 s");
        Path newer = scenario(dir, "newer.json", "0.15 s");
        Path target = dir.resolve("result");
        assertEquals(0, RunCommandTest.run("run", earlier.toString(), "--out", target.toString()).code());
        Set<String> files = OutputFolderTest.names(target);
        assertEquals("0.1000000", completeResult(target, files));

        // kills timed from the moment a run begins to write its files (writing the figures takes about a second)
        String[] signals = {"KILL", "TERM", "INT"};
        long[] afterWritingBegins = {0, 300, 800};
        for (int i = 0; i < signals.length; i++) {
            Process p = start(newer, target);
            waitForWriting(dir, p);
            Thread.sleep(afterWritingBegins[i]);
            new ProcessBuilder("kill", "-" + signals[i], Long.toString(p.pid())).start().waitFor();
            assertTrue(p.waitFor(60, TimeUnit.SECONDS));
            String end = completeResult(target, files);
            assertTrue(end.equals("0.1000000") || end.equals("0.1500000"), end);
            String own = ".result.branchsim-tmp-" + p.pid() + "-";
            boolean leftover = false;
            try (var s = Files.list(dir)) {
                for (Path sibling : s.toList()) {
                    String name = sibling.getFileName().toString();
                    assertTrue(name.equals("result") || name.endsWith(".json") || name.matches(LEFTOVER), name);
                    leftover |= name.startsWith(own);
                }
            }
            if (signals[i].equals("KILL")) {
                assertTrue(leftover || end.equals("0.1500000"), "killed while writing: its temporary folder stays");
            } else {
                assertTrue(!leftover, "SIGTERM and SIGINT: the run removes its temporary folder as it exits");
            }
        }
        assertEquals(0, RunCommandTest.run("run", newer.toString(), "--out", target.toString()).code());
        assertEquals("0.1500000", completeResult(target, files));
        assertEquals(Set.of("result", "earlier.json", "newer.json"), OutputFolderTest.names(dir), "leftovers cleaned");
    }
}
