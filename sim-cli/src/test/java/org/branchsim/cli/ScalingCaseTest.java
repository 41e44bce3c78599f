package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The size-scaling case of {@code timing --scaling}. */
class ScalingCaseTest {

    private static final String CLAMP = RunCommandTest.SCENARIOS.resolve("fixture-clamp.json").toString();

    /** The fitted exponent of an exact power law y = 2.5 x^1.3 is 1.3 (ln y = ln 2.5 + 1.3 ln x). */
    @Test
    void exponentOfAnExactPowerLaw() {
        double[] x = {17, 27, 47, 87, 167};
        double[] lx = new double[x.length];
        double[] ly = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            lx[i] = Math.log(x[i]);
            ly[i] = Math.log(2.5 * Math.pow(x[i], 1.3));
        }
        assertEquals(1.3, ScalingCase.slope(lx, ly), 1e-12);
        assertTrue(Double.isNaN(ScalingCase.slope(new double[] {1}, new double[] {2})));
    }

    /**
     * One and two clamp branches: 17 and 27 states (the count: 17 states for the demo, 10 per branch), each
     * with dense and sparse LU; the two solvers give the same pressures to within 10 x rtol of each signal's range
     * (the project's accuracy claim for any change of solver internals, docs/performance.md), rtol = 1e-6.
     */
    @Test
    void denseAndSparseSideBySide(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("timing", "--scaling", "1,2", "--runs", "1", "--warmup", "0",
                "--end-time", "0.1 s", "--out", dir.toString(), CLAMP);
        assertEquals(0, o.code(), o.err());
        List<String> csv = Files.readAllLines(dir.resolve("scaling.csv"));
        assertEquals(1 + 4, csv.size(), String.join("\n", csv));
        assertTrue(csv.get(1).startsWith("1,17,dense,"), csv.get(1));
        assertTrue(csv.get(2).startsWith("1,17,sparse,"), csv.get(2));
        assertTrue(csv.get(3).startsWith("2,27,dense,"), csv.get(3));
        assertTrue(csv.get(4).startsWith("2,27,sparse,"), csv.get(4));
        for (String row : List.of(csv.get(2), csv.get(4))) {
            String[] cells = row.split(",", -1);
            double difference = Double.parseDouble(cells[cells.length - 1]);
            assertTrue(difference <= 10 * 1e-6, "sparse against dense: " + difference + " of range in " + row);
        }
        assertTrue(o.out().contains("CPU per step grows as n^"), o.out());
        assertTrue(Files.readString(dir.resolve("scaling.json")).contains("\"exponentOfCpuPerStep\""));
    }

    @Test
    void badScalingOptionsAreRefused(@TempDir Path dir) {
        assertEquals(2, RunCommandTest.run("timing", "--scaling", "0", "--out", dir.toString(), CLAMP).code());
        RunCommandTest.Outcome o = RunCommandTest.run("timing", "--scaling", "2", "--scaling-valve", "clamp",
                "--out", dir.toString(), CLAMP);
        assertEquals(2, o.code());
        assertTrue(o.err().contains("--scaling-valve"), o.err());
    }
}
