package org.branchsim.core.results;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * A trace gives back every sample it was given, across the chunks it stores them in. The samples are an analytic
 * pressure history, p(t) = p0 + dp sin(2 pi f t), and its exact time derivative, computed here with java.lang.Math
 * at every grid time, so the expected values do not come from the code under test. A trace whose memory budget is
 * exceeded keeps the later samples in a temporary file and gives back the same numbers, bit for bit.
 */
class TraceTest {

    private static final int SAMPLES = 2500;
    private static final double INTERVAL = 1e-3;
    private static final double P0 = 60e5;
    private static final double DP = 2e5;
    private static final double F = 7.0;

    @Test
    void everySampleComesBackAcrossChunkBoundaries() {
        // Given 2500 samples of p(t) and dp/dt on a 1 ms grid (more than two chunks)
        Trace trace = new Trace(List.of(new Trace.Column("line.p", Dimension.PRESSURE),
                new Trace.Column("line.rate", Dimension.PRESSURE)));
        double[] row = new double[2];
        for (int k = 0; k < SAMPLES; k++) {
            double t = k * INTERVAL;
            row[0] = pressure(t);
            row[1] = rate(t);
            trace.add(t, row);
        }

        // Then every time, value and series is the analytic one, and selecting a column keeps it
        assertEquals(SAMPLES, trace.size());
        double[] p = trace.series("line.p");
        double[] rate = trace.series(1);
        double[] times = trace.times();
        for (int k = 0; k < SAMPLES; k++) {
            double t = k * INTERVAL;
            assertEquals(t, times[k]);
            assertEquals(t, trace.time(k));
            assertEquals(pressure(t), p[k]);
            assertEquals(rate(t), rate[k]);
            assertEquals(pressure(t), trace.value(k, 0));
        }
        Trace rates = trace.select(List.of("line.rate"));
        assertArrayEquals(rate, rates.series(0));
        assertEquals(rate(1.5), trace.valueAt("line.rate", 1.5 + 0.2 * INTERVAL));
        assertThrows(IndexOutOfBoundsException.class, () -> trace.time(SAMPLES));
        assertThrows(IllegalArgumentException.class, () -> trace.add(0.0, new double[3]));
    }

    @Test
    void samplesBeyondTheMemoryBudgetComeBackFromTheSpillSpaceWhichIsReleasedOnClose() {
        // Given a spill space outside the heap (a byte buffer here; a temporary file in the command line)
        Space space = new Space(false);
        // and a budget of one chunk (4096 rows of 4 doubles), 20 000 samples of p(t), dp/dt and p(t) again
        Trace trace = new Trace(List.of(new Trace.Column("line.p", Dimension.PRESSURE),
                new Trace.Column("line.rate", Dimension.PRESSURE),
                new Trace.Column("port.p", Dimension.PRESSURE)), 4096L * 4 * 8, space);
        int n = 20_000;
        double[] row = new double[3];
        for (int k = 0; k < n; k++) {
            double t = k * INTERVAL;
            row[0] = pressure(t);
            row[1] = rate(t);
            row[2] = pressure(t);
            trace.add(t, row);
        }

        // Then most samples are on disk, and every column, slice, row and value is the analytic one
        assertTrue(trace.spilledBytes() > 8L * 4 * n / 2, "spilled " + trace.spilledBytes() + " bytes");
        double[] p = trace.series(0);
        double[] rate = trace.series("line.rate");
        double[] times = trace.times();
        double[] slice = trace.series(1, 12_345, 17_001);
        double[] sliceTimes = trace.times(12_345, 17_001);
        double[] r = new double[4];
        for (int k = 0; k < n; k++) {
            double t = k * INTERVAL;
            assertEquals(t, times[k]);
            assertEquals(pressure(t), p[k]);
            assertEquals(rate(t), rate[k]);
            trace.row(k, r);
            assertEquals(t, r[0]);
            assertEquals(pressure(t), r[1]);
            assertEquals(rate(t), r[2]);
            assertEquals(pressure(t), trace.value(k, 2));
            if (k >= 12_345 && k < 17_001) {
                assertEquals(rate(t), slice[k - 12_345]);
                assertEquals(t, sliceTimes[k - 12_345]);
            }
        }
        assertEquals(pressure(18.0), trace.valueAt("port.p", 18.0 + 0.3 * INTERVAL));
        // And identical columns are told from different ones
        assertTrue(trace.sameSeries(0, 2));
        assertFalse(trace.sameSeries(0, 1));

        // When it is closed, its region is released and the samples in it can no longer be read
        assertEquals(1, space.opened);
        assertFalse(space.released);
        trace.close();
        assertTrue(space.released);
        assertThrows(IllegalStateException.class, () -> trace.value(5000, 0));
    }

    @Test
    void columnsThatDifferInOneSampleAreNotTheSame() {
        // Given two columns equal except at one sample in the middle (the fingerprint must see it)
        Trace trace = new Trace(List.of(new Trace.Column("a", Dimension.PRESSURE),
                new Trace.Column("b", Dimension.PRESSURE)));
        for (int k = 0; k < 3000; k++) {
            double v = pressure(k * INTERVAL);
            trace.add(k * INTERVAL, new double[] {v, k == 1500 ? Math.nextUp(v) : v});
        }
        assertFalse(trace.sameSeries(0, 1));
        assertTrue(trace.sameSeries(1, 1));
    }

    @Test
    void aSpillSpaceThatCannotBeWrittenIsReportedWithItsKey() {
        Trace trace = new Trace(List.of(new Trace.Column("a", Dimension.PRESSURE)), 0L, new Space(true));
        BranchsimException e = assertThrows(BranchsimException.class, () -> {
            for (int k = 0; k < 100_000; k++) {
                trace.add(k * INTERVAL, new double[] {pressure(k * INTERVAL)});
            }
        });
        assertSame(ErrorKey.TRACE_STORE_FAILED, e.key());
        assertTrue(e.getMessage().contains("test region: disk full"), e.getMessage());
    }

    @Test
    void withoutASpillSpaceEverySampleStaysOnTheHeap() {
        Trace trace = new Trace(List.of(new Trace.Column("a", Dimension.PRESSURE)), 0L, null);
        for (int k = 0; k < 10_000; k++) {
            trace.add(k * INTERVAL, new double[] {pressure(k * INTERVAL)});
        }
        assertEquals(0L, trace.spilledBytes());
        assertEquals(pressure(9.999), trace.series(0)[9_999]);
    }

    /** A spill space in a heap buffer, or one whose writes fail (a full disk). */
    private static final class Space implements SpillSpace {
        private final boolean failing;
        private int opened;
        private boolean released;

        Space(boolean failing) {
            this.failing = failing;
        }

        @Override
        public Region open() {
            opened++;
            ByteBuffer store = ByteBuffer.allocate(1 << 22);
            return new Region() {
                @Override
                public void write(ByteBuffer bytes, long position) throws IOException {
                    if (failing) {
                        throw new IOException("disk full");
                    }
                    store.put((int) position, bytes, bytes.position(), bytes.remaining());
                    bytes.position(bytes.limit());
                }

                @Override
                public void read(ByteBuffer bytes, long position) {
                    int n = bytes.remaining();
                    bytes.put(bytes.position(), store, (int) position, n);
                    bytes.position(bytes.position() + n);
                }

                @Override
                public String describe() {
                    return "test region";
                }

                @Override
                public void close() {
                    released = true;
                }
            };
        }

        @Override
        public String describe() {
            return "test space";
        }
    }

    private static double pressure(double t) {
        return P0 + DP * Math.sin(2 * Math.PI * F * t);
    }

    private static double rate(double t) {
        return DP * 2 * Math.PI * F * Math.cos(2 * Math.PI * F * t);
    }
}
