package org.branchsim.core.results;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * A trace gives back every sample it was given, across the chunks it stores them in. The samples are an analytic
 * pressure history, p(t) = p0 + dp sin(2 pi f t), and its exact time derivative, computed here with java.lang.Math
 * at every grid time, so the expected values do not come from the code under test.
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

    private static double pressure(double t) {
        return P0 + DP * Math.sin(2 * Math.PI * F * t);
    }

    private static double rate(double t) {
        return DP * 2 * Math.PI * F * Math.cos(2 * Math.PI * F * t);
    }
}
