package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A trace that spills to temporary files gives back, bit for bit, the samples it was given: an analytic pressure
 * history p(t) = p0 + dp sin(2 pi f t) computed here with java.lang.Math at every time; and its file is gone once
 * the trace is closed.
 */
class TempFileSpaceTest {

    private static double pressure(double t) {
        return 45e5 + 3e5 * Math.sin(2 * Math.PI * 4.0 * t);
    }

    @Test
    void aTraceSpilledToATemporaryFileReadsBackEverySampleAndLeavesNoFile(@TempDir Path dir) throws IOException {
        TempFileSpace space = new TempFileSpace(dir);
        Trace trace = Trace.spillingTo(space, () -> {
            // made on this thread inside the scope: spills beyond the default budget of 8 MiB
            Trace t = new Trace(List.of(new Trace.Column("line.p", Dimension.PRESSURE),
                    new Trace.Column("line.q", Dimension.VOLUME_FLOW)));
            for (int k = 0; k < 600_000; k++) {
                double time = k * 1e-4;
                t.add(time, new double[] {pressure(time), 1e-4 * time});
            }
            return t;
        });
        assertTrue(trace.spilledBytes() > 4_000_000, trace.spilledBytes() + " bytes spilled");
        double[] p = trace.series(0);
        double[] q = trace.series(1, 500_000, 600_000);
        for (int k = 0; k < 600_000; k++) {
            assertEquals(pressure(k * 1e-4), p[k]);
        }
        for (int k = 500_000; k < 600_000; k++) {
            assertEquals(1e-4 * (k * 1e-4), q[k - 500_000]);
        }
        trace.close();
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(), left.toList());
        }
        // a trace made outside the scope keeps everything on the heap
        Trace plain = new Trace(List.of(new Trace.Column("line.p", Dimension.PRESSURE)));
        for (int k = 0; k < 1_200_000; k++) {
            plain.add(k * 1e-4, new double[] {pressure(k * 1e-4)});
        }
        assertEquals(0L, plain.spilledBytes());
    }
}
