package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CountDownLatch;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An output folder holds one complete result: never a stale file of an earlier run, never a temporary file,
 * never a mixture of two runs, whatever happens while it is written.
 */
class OutputFolderTest {

    /** A process id above the Linux maximum (2^22, proc(5) pid_max), so it belongs to no live process. */
    private static final String DEAD_PID = "99999999";

    static Set<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
        }
    }

    private static void writeAll(Path target, String tag, String... files) {
        try (OutputFolder f = new OutputFolder(target)) {
            for (String name : files) {
                f.writeText(name, tag);
            }
            f.commit();
        }
    }

    @Test
    void aNewResultReplacesTheEarlierOneAsAWhole(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("result");
        writeAll(target, "first", "trace.csv", "pressures.png", "plot-1-old.png");
        writeAll(target, "second", "trace.csv", "pressures.png");
        assertEquals(Set.of("trace.csv", "pressures.png", OutputFolder.MARKER), names(target), "no stale plot-1-old.png");
        assertEquals("second", Files.readString(target.resolve("trace.csv")));
        assertEquals(Set.of("result"), names(dir), "no temporary or set-aside folder left");
    }

    @Test
    void anUncommittedResultLeavesNothing(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out").resolve("result");
        try (OutputFolder f = new OutputFolder(target)) {
            f.writeText("trace.csv", "partial");
        }
        assertEquals(Set.of(), names(dir), "not even the parent folder it created");
        writeAll(dir.resolve("kept"), "earlier", "trace.csv");
        try (OutputFolder f = new OutputFolder(dir.resolve("kept"))) {
            f.writeText("trace.csv", "partial");
        }
        assertEquals("earlier", Files.readString(dir.resolve("kept").resolve("trace.csv")));
        assertEquals(Set.of("kept"), names(dir));
    }

    @Test
    void foldersWithOtherFilesAreRefusedAndEarlierOutputsAccepted(@TempDir Path dir) throws IOException {
        Path mine = Files.createDirectories(dir.resolve("mine"));
        Files.writeString(mine.resolve("notes.txt"), "keep");
        BranchsimException e = assertThrows(BranchsimException.class, () -> new OutputFolder(mine));
        assertEquals(ErrorKey.OUTPUT_FOLDER_REFUSED, e.key());
        assertTrue(e.getMessage().startsWith("--out"), e.getMessage());
        // a folder written before the marker existed: only files named like branchsim outputs
        Path legacy = Files.createDirectories(dir.resolve("legacy"));
        Files.writeString(legacy.resolve("trace.csv"), "old");
        Files.writeString(legacy.resolve("pressures.png"), "old");
        Files.writeString(legacy.resolve(".trace.csv.tmp"), "old");
        writeAll(legacy, "new", "summary.txt");
        assertEquals(Set.of("summary.txt", OutputFolder.MARKER), names(legacy));
    }

    @Test
    void leftoversOfKilledRunsAreCleanedByTheNextRun(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("result");
        writeAll(target, "earlier", "trace.csv");
        Path temp = Files.createDirectory(dir.resolve(".result.branchsim-tmp-" + DEAD_PID + "-1-abc"));
        Files.writeString(temp.resolve("trace.csv"), "half");
        Path old = Files.createDirectory(dir.resolve(".result.branchsim-old-" + DEAD_PID + "-2-abc"));
        Files.writeString(old.resolve("trace.csv"), "older");
        writeAll(target, "new", "trace.csv");
        assertEquals(Set.of("result"), names(dir));
        assertEquals("new", Files.readString(target.resolve("trace.csv")));
    }

    @Test
    void aResultSetAsideByARunKilledMidSwapIsPutBack(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("result");
        Path old = Files.createDirectory(dir.resolve(".result.branchsim-old-" + DEAD_PID + "-1-abc"));
        Files.writeString(old.resolve("trace.csv"), "earlier");
        Files.writeString(old.resolve(OutputFolder.MARKER), "");
        try (OutputFolder f = new OutputFolder(target)) {
            assertEquals("earlier", Files.readString(f.dir().resolve("trace.csv")), "restored before anything else");
        }
        assertEquals(Set.of("result"), names(dir));
    }

    @Test
    void concurrentRunsIntoOneFolderNeverMix(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("result");
        for (int round = 0; round < 5; round++) {
            int writers = 4;
            CountDownLatch ready = new CountDownLatch(writers);
            CountDownLatch go = new CountDownLatch(1);
            List<Thread> threads = new ArrayList<>();
            List<Throwable> failures = java.util.Collections.synchronizedList(new ArrayList<>());
            for (int k = 0; k < writers; k++) {
                String tag = "writer-" + round + "-" + k;
                Thread t = new Thread(() -> {
                    try (OutputFolder f = new OutputFolder(target)) {
                        for (String name : List.of("trace.csv", "metrics.json", "pressures.png", "flows.png")) {
                            f.writeText(name, tag);
                        }
                        ready.countDown();
                        go.await();
                        f.commit();
                    } catch (Throwable e) {
                        failures.add(e);
                    }
                });
                threads.add(t);
                t.start();
            }
            ready.await();
            go.countDown();
            for (Thread t : threads) {
                t.join();
            }
            assertEquals(List.of(), failures);
            assertEquals(Set.of("trace.csv", "metrics.json", "pressures.png", "flows.png", OutputFolder.MARKER),
                    names(target));
            Set<String> tags = new TreeSet<>();
            for (String name : List.of("trace.csv", "metrics.json", "pressures.png", "flows.png")) {
                tags.add(Files.readString(target.resolve(name)));
            }
            assertEquals(1, tags.size(), "one writer's complete result, not a mixture: " + tags);
            assertEquals(Set.of("result"), names(dir));
        }
    }

    @Test
    void filesWrittenSideBySideAreListedInTheOrderGivenAndAFailureLeavesOnlyItsFile(@TempDir Path dir)
            throws IOException {
        Path target = dir.resolve("result");
        try (OutputFolder f = new OutputFolder(target)) {
            List<OutputFolder.Pending> files = new ArrayList<>();
            for (String name : List.of("pressures.png", "flows.png", "positions.png", "landing-a.png")) {
                files.add(new OutputFolder.Pending(name, p -> Files.writeString(p, name)));
            }
            files.add(2, new OutputFolder.Pending("broken.png", p -> {
                Files.writeString(p, "half");
                throw new IOException("disk full");
            }));
            BranchsimException e = assertThrows(BranchsimException.class, () -> f.writeAll(files));
            assertEquals(ErrorKey.OUTPUT_FAILED, e.key());
            assertTrue(e.getMessage().contains("broken.png") && e.getMessage().contains("disk full"), e.getMessage());
            // the others were written all the same, in the order given; the failed one is neither listed nor kept
            assertEquals(List.of("pressures.png", "flows.png", "positions.png", "landing-a.png"),
                    f.written().stream().map(p -> p.getFileName().toString()).toList());
            f.commit();
        }
        assertEquals(Set.of("pressures.png", "flows.png", "positions.png", "landing-a.png", OutputFolder.MARKER),
                names(target));
        assertEquals("flows.png", Files.readString(target.resolve("flows.png")));
    }
}
