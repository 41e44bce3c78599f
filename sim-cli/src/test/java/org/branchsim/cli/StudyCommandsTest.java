package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** sweep, tolerance, diagnose and bench through the command line (modes: {@link ModesCommandTest}). */
class StudyCommandsTest {

    private static final String FEED = RunCommandTest.SCENARIOS.resolve("feed-stall.json").toString();

    @Test
    void sweepGivesIdenticalSummaryOnOneAndTwoThreads(@TempDir Path dir) throws IOException {
        String[] common = {"sweep", FEED, "--vary", "elements.relief.damping=30 N*s/m,60 N*s/m,120 N*s/m",
            "--vary", "nodes.pumpLine.volume=0.2 L..0.4 L:2", "--rank-by", "pumpLine.p.peak [bar]"};
        RunCommandTest.Outcome one = RunCommandTest.run(concat(common, "--threads", "1", "--out", dir.resolve("one").toString()));
        RunCommandTest.Outcome two = RunCommandTest.run(concat(common, "--threads", "2", "--out", dir.resolve("two").toString()));
        assertEquals(0, one.code(), one.err());
        assertEquals(0, two.code(), two.err());
        String a = Files.readString(dir.resolve("one/summary.csv"));
        String b = Files.readString(dir.resolve("two/summary.csv"));
        assertEquals(a, b);
        List<String> lines = a.lines().toList();
        assertEquals(1 + 6, lines.size(), "header plus 3 x 2 variants");
        // a spreadsheet reads numbers: numeric parameter columns with the unit in the header, a rank apart from
        // the variant id (issue 13 item 6)
        assertTrue(lines.get(0).startsWith(
                "variant,rank,elements.relief.damping [N*s/m],nodes.pumpLine.volume [L],status,error,"), lines.get(0));
        assertTrue(lines.get(1).startsWith("0,") && lines.get(1).contains(",30,0.2,ok,"), lines.get(1));
        assertTrue(one.out().contains("6 variants, ranked by pumpLine.p.peak [bar]"), one.out());
        assertTrue(one.err().contains("variants 6/6 done"), one.err());
        assertTrue(ImageIO.read(dir.resolve("one").resolve("overlay-pumpline-p.png").toFile()) != null);
    }

    @Test
    void sweepRejectsAnUnknownPath() {
        RunCommandTest.Outcome o = RunCommandTest.run("sweep", FEED, "--vary", "elements.relief.dampng=1 N*s/m");
        assertEquals(2, o.code());
        assertTrue(o.err().contains("no \"dampng\""), o.err());
    }

    @Test
    void toleranceStudyIsRepeatableWithTheSameSeed(@TempDir Path dir) throws IOException {
        Path scenario = dir.resolve("toleranced.json");
        Files.writeString(scenario, Files.readString(Path.of(FEED))
                .replace("\"springRate\": \"60 N/mm\"", "\"springRate\": \"60 N/mm ± 10 %\"")
                .replace("\"bulkModulus\": \"1.5 GPa\"", "\"bulkModulus\": \"1.3 GPa .. 1.7 GPa\""));
        String[] args = {"tolerance", scenario.toString(), "--runs", "4", "--seed", "42", "--threads", "2"};
        RunCommandTest.Outcome a = RunCommandTest.run(concat(args, "--out", dir.resolve("a").toString()));
        RunCommandTest.Outcome b = RunCommandTest.run(concat(args, "--out", dir.resolve("b").toString()));
        assertEquals(0, a.code(), a.err());
        assertEquals(Files.readString(dir.resolve("a/statistics.csv")), Files.readString(dir.resolve("b/statistics.csv")));
        assertTrue(a.out().contains("elements.relief.springRate: 60 N/mm, drawn uniformly from 54 to 66 N/mm"), a.out());
        assertTrue(a.out().contains("fluid.bulkModulus: 1.5 GPa"), a.out());
        assertTrue(Files.readString(dir.resolve("a/statistics.csv")).startsWith("metric,runs,mean,p5,p95,min,max"));
        try (var files = Files.list(dir.resolve("a"))) {
            assertTrue(files.anyMatch(p -> p.getFileName().toString().startsWith("histogram-")));
        }
    }

    /** The old command name still works for one release and says so. */
    @Test
    void oldCommandNameStillWorksWithANote() {
        RunCommandTest.Outcome o = RunCommandTest.run("bench", "--runs", "0", FEED);
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains("note: \"bench\" is the old name of \"timing\""), o.err());
        assertTrue(o.err().contains("--runs"), o.err());
    }

    @Test
    void diagnoseReportsAStableCircuitAsStable(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("diagnose", FEED, "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("No oscillation found"), o.out());
        assertTrue(Files.readString(dir.resolve("diagnosis.json")).contains("\"findings\" : [ ]"));
    }

    @Test
    void benchWritesItsFigures(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("timing", "--runs", "1", "--warmup", "0", "--methods", "implicit",
                "--end-time", "0.3 s", "--sweep-variants", "2", "--sweep-parameter", "elements.dcvPA.diameter",
                "--out", dir.toString(), FEED);
        assertEquals(0, o.code(), o.err());
        List<String> csv = Files.readAllLines(dir.resolve("timing.csv"));
        assertTrue(csv.get(0).startsWith("scenario,method,simulated_s,median_wall_s"), csv.get(0));
        assertTrue(csv.get(1).startsWith("feed-stall,implicit,0.3"), csv.get(1));
        assertTrue(Files.readString(dir.resolve("timing.json")).contains("\"variantsPerSecond\""));
        assertEquals(2, RunCommandTest.run("timing", "--methods", "quantum", FEED).code());
    }

    /**
     * The reference spread: two Dormand-Prince 8(5,3) runs at rtol 1e-10 and 1e-11 of a circuit without a sustained
     * oscillation agree far inside the 1e-6 a default run is judged at (the method's error falls with its
     * tolerance, Hairer, Norsett and Wanner, Solving ODEs I, 1993, sec. II.4), and the column is written.
     */
    @Test
    void referenceSpreadIsReportedAndSmallOnACircuitThatSettles(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("timing", "--runs", "1", "--warmup", "0", "--methods", "implicit",
                "--end-time", "0.3 s", "--sweep-variants", "0", "--reference-spread", "--out", dir.toString(), FEED);
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("feed-stall: references at rtol 1e-10 and 1e-11 differ by"), o.out());
        List<String> csv = Files.readAllLines(dir.resolve("timing.csv"));
        assertTrue(csv.get(0).endsWith(",reference_spread_rel_range"), csv.get(0));
        String[] cells = csv.get(1).split(",", -1);
        double spread = Double.parseDouble(cells[cells.length - 1]);
        assertTrue(spread >= 0.0 && spread < 1e-7, csv.get(1));
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = new String[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
