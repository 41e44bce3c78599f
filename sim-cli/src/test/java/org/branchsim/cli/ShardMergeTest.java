package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Studies split with {@code --shard K/N} and put together with {@code merge}. The reference for every
 * merged folder is the folder the unsharded study writes: the requirement (issue 9, item 6) is that the two
 * are byte for byte the same, whatever the number of shards.
 */
class ShardMergeTest {

    private static final Path CLAMP = RunCommandTest.SCENARIOS.resolve("fixture-clamp.json");
    private static final String ORIFICE = "elements.reducer.dampingOrifice.diameter=0.5 mm..0.8 mm:4";

    /** The clamp demo cut short after the clamp lands (about 0.35 s), so that a variant takes a second or less. */
    private static Path shortClamp(Path dir, String endTime) throws IOException {
        String text = Files.readString(CLAMP);
        assertTrue(text.contains("\"endTime\": \"3.5 s\""), "the demo's end time is where this test expects it");
        return Files.writeString(dir.resolve("clamp-" + endTime.replace(" ", "") + ".json"),
                text.replace("\"endTime\": \"3.5 s\"", "\"endTime\": \"" + endTime + "\""));
    }

    /** The short clamp with a toleranced pilot spring and bulk modulus (document order: fluid first). */
    private static Path toleranced(Path dir, String endTime) throws IOException {
        Path p = shortClamp(dir, endTime);
        String text = Files.readString(p);
        String spring = "\"springRate\": \"15 N/mm\", \"mass\": \"3 g\"";
        assertTrue(text.contains(spring) && text.contains("\"bulkModulus\": \"1.5 GPa\""));
        return Files.writeString(dir.resolve("toleranced-" + p.getFileName()), text
                .replace(spring, "\"springRate\": \"15 N/mm ± 10 %\", \"mass\": \"3 g\"")
                .replace("\"bulkModulus\": \"1.5 GPa\"", "\"bulkModulus\": \"1.3 GPa .. 1.7 GPa\""));
    }

    private static RunCommandTest.Outcome ok(String... args) {
        RunCommandTest.Outcome o = RunCommandTest.run(args);
        assertEquals(0, o.code(), String.join(" ", args) + "\n" + o.err());
        return o;
    }

    /** Runs every shard of a study into dir/shard-K and returns the folders, last shard first. */
    private static List<String> shards(Path dir, int n, String... study) {
        List<String> folders = new ArrayList<>();
        for (int k = n; k >= 1; k--) {
            String folder = dir.resolve("shard-" + k + "-of-" + n).toString();
            List<String> args = new ArrayList<>(List.of(study));
            args.addAll(List.of("--shard", k + "/" + n, "--threads", "1", "--out", folder));
            RunCommandTest.Outcome o = ok(args.toArray(String[]::new));
            assertTrue(o.out().contains("shard " + k + " of " + n), o.out());
            folders.add(folder);
        }
        return folders;
    }

    private static String[] mergeArgs(List<String> folders, Path out) {
        List<String> args = new ArrayList<>(List.of("merge"));
        args.addAll(folders);
        args.addAll(List.of("--out", out.toString()));
        return args.toArray(String[]::new);
    }

    /** Asserts that two folders hold the same file names (hidden marker included) with the same bytes. */
    private static void assertSameFolder(Path expected, Path actual) throws IOException {
        List<String> names = names(expected);
        assertEquals(names, names(actual), "same files in " + actual + " as in " + expected);
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(expected.resolve(name)), Files.readAllBytes(actual.resolve(name)),
                    name + " byte for byte");
        }
    }

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aSweepSplitIntoTwoOrThreeShardsMergesToTheUnshardedFolder(@TempDir Path dir) throws IOException {
        String scenario = shortClamp(dir, "0.5 s").toString();
        String[] study = {"sweep", scenario, "--vary", ORIFICE, "--rank-by", "reducer.overshoot"};
        Path whole = dir.resolve("whole");
        List<String> args = new ArrayList<>(List.of(study));
        args.addAll(List.of("--threads", "2", "--out", whole.toString()));
        RunCommandTest.Outcome unsharded = ok(args.toArray(String[]::new));
        assertTrue(names(whole).containsAll(List.of("summary.csv", "overlay-reducer-p-out.png",
                "overlay-reducer-p-out-landing.png", OutputFolder.MARKER)), names(whole).toString());
        assertEquals(1 + 4, Files.readAllLines(whole.resolve("summary.csv")).size(), "header and 4 variants");
        for (int n : new int[] {2, 3}) {
            Path shardDir = Files.createDirectory(dir.resolve("n" + n));
            List<String> folders = shards(shardDir, n, study);
            Path merged = dir.resolve("merged-" + n);
            RunCommandTest.Outcome m = ok(mergeArgs(folders, merged));
            assertSameFolder(whole, merged);
            // the console shows the same ranking as the unsharded sweep
            String ranking = unsharded.out().substring(unsharded.out().indexOf("4 variants, ranked by"),
                    unsharded.out().indexOf("outputs written"));
            assertTrue(m.out().contains(ranking), m.out());
        }
    }

    @Test
    void aToleranceStudySplitIntoShardsMergesToTheUnshardedFolderWithTheSameDraws(@TempDir Path dir)
            throws IOException {
        String scenario = toleranced(dir, "0.45 s").toString();
        String[] study = {"tolerance", scenario, "--runs", "5", "--seed", "42"};
        Path whole = dir.resolve("whole");
        List<String> args = new ArrayList<>(List.of(study));
        args.addAll(List.of("--threads", "2", "--out", whole.toString()));
        ok(args.toArray(String[]::new));
        List<String> folders = shards(Files.createDirectory(dir.resolve("n2")), 2, study);
        Path merged = dir.resolve("merged");
        ok(mergeArgs(folders, merged));
        assertSameFolder(whole, merged);
        assertTrue(names(merged).containsAll(List.of("runs.csv", "statistics.csv", "histogram-reducer-overshoot.png")));

        // Every run's values come from one generator in run order, whichever shard ran it. Reference: the
        // linear congruential generator that the Java SE 17 API specification prescribes for java.util.Random
        // (class description, next(int) and nextDouble()), from D. E. Knuth, The Art of Computer Programming,
        // vol. 2, 3rd ed., 1997, section 3.2.1; a toleranced value is low + u (high - low).
        Knuth48 random = new Knuth48(42);
        List<String> rows = Files.readAllLines(merged.resolve("runs.csv"));
        // numeric parameter columns, the unit in the header (issue 13 item 6)
        assertTrue(rows.get(0).startsWith("variant,fluid.bulkModulus [GPa],elements.reducer.pilot.springRate [N/mm],"),
                rows.get(0));
        for (int run = 0; run < 5; run++) {
            String[] f = rows.get(1 + run).split(",");
            double bulk = 1.3 + random.nextDouble() * (1.7 - 1.3);
            double spring = 13.5 + random.nextDouble() * (16.5 - 13.5);
            // values are written with 6 significant digits
            assertEquals(bulk, Double.parseDouble(f[1]), 5e-6 * bulk, rows.get(1 + run));
            assertEquals(spring, Double.parseDouble(f[2]), 5e-6 * spring, rows.get(1 + run));
        }
    }

    /** java.util.Random's generator as its API specification writes it, kept apart from the code under test. */
    private static final class Knuth48 {
        private long seed;

        Knuth48(long seed) {
            this.seed = (seed ^ 0x5DEECE66DL) & ((1L << 48) - 1);
        }

        int next(int bits) {
            seed = (seed * 0x5DEECE66DL + 0xBL) & ((1L << 48) - 1);
            return (int) (seed >>> (48 - bits));
        }

        double nextDouble() {
            return (((long) next(26) << 27) + next(27)) * 0x1.0p-53;
        }
    }

    @Test
    void theSplitDealsTheVariantsOutInTurnAndCoversEachOnce() {
        // the documented rule: variant i (0-based) goes to shard (i mod N) + 1 (docs/scale-out.md)
        assertEquals(List.of(0, 3), indices(new Shard(1, 3), 6));
        assertEquals(List.of(1, 4), indices(new Shard(2, 3), 6));
        assertEquals(List.of(2, 5), indices(new Shard(3, 3), 6));
        assertEquals(List.of(1, 5, 9), indices(new Shard(2, 4), 10));
        for (int variants = 1; variants <= 40; variants++) {
            for (int n = 1; n <= variants; n++) {
                int[] seen = new int[variants];
                for (int k = 1; k <= n; k++) {
                    List<Integer> mine = indices(new Shard(k, n), variants);
                    assertEquals(mine.size(), new Shard(k, n).size(variants));
                    assertFalse(mine.isEmpty(), "every shard gets a variant when N <= variants");
                    mine.forEach(i -> seen[i]++);
                }
                for (int i = 0; i < variants; i++) {
                    assertEquals(1, seen[i], "variant " + i + " of " + variants + " in exactly one of " + n + " shards");
                }
            }
        }
    }

    private static List<Integer> indices(Shard s, int variants) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < variants; i++) {
            if (s.holds(i)) {
                out.add(i);
            }
        }
        return out;
    }

    /** Runs a command that must be refused with exit code 2 before any run, naming the option. */
    private static String refused(Path out, String option, String... args) {
        RunCommandTest.Outcome o = RunCommandTest.run(args);
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains(option), "names " + option + ": " + o.err());
        assertTrue(o.err().contains("expected") && o.err().contains("found"), o.err());
        assertFalse(o.err().contains("variants 1/") || o.err().contains("\tat ") || o.err().contains("Exception"),
                o.err());
        assertFalse(Files.exists(out), "nothing written");
        return o.err();
    }

    @Test
    void badShardOptionsAreRefusedBeforeAnyRun(@TempDir Path dir) throws IOException {
        String scenario = shortClamp(dir, "0.3 s").toString();
        Path out = dir.resolve("out");
        for (String bad : new String[] {"2", "a/b", "0/2", "3/2", "1/0", "-1/2", "1/2/3", "1/99999999999"}) {
            refused(out, "--shard", "sweep", scenario, "--vary", ORIFICE, "--shard", bad, "--out", out.toString());
        }
        String tooMany = refused(out, "--shard", "sweep", scenario, "--vary", ORIFICE, "--shard", "1/5",
                "--out", out.toString());
        assertTrue(tooMany.contains("at most the number of variants, 4, found 5"), tooMany);
        String k = refused(out, "--shard", "sweep", scenario, "--vary", ORIFICE, "--shard", "3/2",
                "--out", out.toString());
        assertTrue(k.contains("from 1 to N = 2, found 3"), k);
        Path tol = toleranced(dir, "0.3 s");
        String runs = refused(out, "--shard", "tolerance", tol.toString(), "--runs", "3", "--shard", "1/4",
                "--out", out.toString());
        assertTrue(runs.contains("found 4"), runs);
    }

    @Test
    void mergeRefusesShardsThatAreNotOneWholeStudy(@TempDir Path dir) throws IOException {
        Path scenario = shortClamp(dir, "0.3 s");
        String[] study = {"sweep", scenario.toString(), "--vary", ORIFICE};
        List<String> two = shards(Files.createDirectory(dir.resolve("two")), 2, study);
        List<String> three = shards(Files.createDirectory(dir.resolve("three")), 3, study);
        Path out = dir.resolve("merged");
        RunCommandTest.Outcome help = RunCommandTest.run("merge", "--help");
        assertEquals(0, help.code(), help.err());
        assertTrue(help.out().contains("SHARD_FOLDER...") && help.out().contains("--out=DIR"), help.out());
        assertEquals(2, RunCommandTest.run("merge").code(), "at least one folder");

        String missing = refused(out, "SHARD_FOLDER", "merge", two.get(0), "--out", out.toString());
        assertTrue(missing.contains("expected all 2 shards") && missing.contains("missing 1/2"), missing);
        String twice = refused(out, "SHARD_FOLDER", "merge", two.get(0), two.get(0), two.get(1), "--out",
                out.toString());
        assertTrue(twice.contains("expected each shard once"), twice);
        String split = refused(out, "SHARD_FOLDER", "merge", two.get(0), three.get(1), "--out", out.toString());
        assertTrue(split.contains("expected a shard of 2") && split.contains("found shard 2/3"), split);

        // the same options on a changed scenario file are another study
        Files.writeString(scenario, Files.readString(scenario) + "\n");
        List<String> edited = shards(Files.createDirectory(dir.resolve("edited")), 2, study);
        String file = refused(out, "SHARD_FOLDER", "merge", two.get(0), edited.get(0), "--out", out.toString());
        assertTrue(file.contains("another study") && file.contains("scenarioSha256"), file);
        List<String> ranked = shards(Files.createDirectory(dir.resolve("ranked")), 2,
                "sweep", scenario.toString(), "--vary", ORIFICE, "--rank-by", "clampLine.p.peak");
        String rank = refused(out, "SHARD_FOLDER", "merge", edited.get(0), ranked.get(1), "--out", out.toString());
        assertTrue(rank.contains("rankBy"), rank);

        String into = refused(Path.of(two.get(0), "never"), "--out", "merge", two.get(0), two.get(1), "--out",
                two.get(0));
        assertTrue(into.contains("does not hold the input"), into);
        String notShard = refused(out, "SHARD_FOLDER", "merge", dir.toString(), "--out", out.toString());
        assertTrue(notShard.contains("shard.json"), notShard);
        Path tampered = Path.of(two.get(1));
        Path manifest = tampered.resolve(ShardFolder.MANIFEST);
        String row = "\"elements.reducer.dampingOrifice.diameter\" : \"0.7 mm\"";
        assertTrue(Files.readString(manifest).contains(row), "shard 1/2 holds variant 2, 0.7 mm");
        Files.writeString(manifest, Files.readString(manifest).replace(row, row.replace("0.7 mm", "0.75 mm")));
        String values = refused(out, "SHARD_FOLDER", "merge", two.get(0), two.get(1), "--out", out.toString());
        assertTrue(values.contains("variant 2") && values.contains("0.75 mm"), values);
        Files.writeString(manifest, "{ \"format\": ");
        String broken = refused(out, "SHARD_FOLDER", "merge", two.get(0), two.get(1), "--out", out.toString());
        assertTrue(broken.contains("expected JSON"), broken);
    }

    @Test
    void aShardWhoseVariantsAllFailStillWritesItsFolderAndTheMergeExitsOne(@TempDir Path dir) throws IOException {
        Path limited = dir.resolve("limited.json");
        Files.writeString(limited, Files.readString(shortClamp(dir, "0.3 s"))
                .replace("\"relativeTolerance\": 1e-6", "\"relativeTolerance\": 1e-6, \"maxEvaluations\": 2000"));
        List<String> folders = shards(Files.createDirectory(dir.resolve("shards")), 2,
                "sweep", limited.toString(), "--vary", "elements.relief.damping=30 N*s/m,60 N*s/m");
        Path out = dir.resolve("merged");
        RunCommandTest.Outcome o = RunCommandTest.run(mergeArgs(folders, out));
        assertEquals(1, o.code(), o.err());
        assertTrue(o.err().contains("all 2 variants failed"), o.err());
        assertTrue(o.err().contains("derivative evaluations"), o.err());
        assertFalse(Files.exists(out));
    }
}
