package org.branchsim.core.measured;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/** The logger CSV reader: units to SI, time bases, and a located refusal of every kind of bad file. */
class MeasuredCsvTest {

    /** NIST SP 811 (2008), Appendix B: 1 psi = 6894.757293168 Pa (exact from in, lb and gn). */
    private static final double PSI = 6894.757293168;

    private static BranchsimException refused(String text, Map<String, String> units) {
        BranchsimException e = assertThrows(BranchsimException.class, () -> MeasuredCsv.read("log.csv", text, units));
        assertSame(ErrorKey.MEASURED_FILE_INVALID, e.key());
        return e;
    }

    private static void assertPlace(BranchsimException e, int line, int column, String name) {
        Object[] a = e.arguments();
        assertEquals("log.csv", a[0], e.getMessage());
        assertEquals(Integer.toString(line), a[1], e.getMessage());
        assertEquals(Integer.toString(column), a[2], e.getMessage());
        assertEquals(name, a[3], e.getMessage());
    }

    @Test
    void readsPsiAndMillisecondsIntoSi() {
        MeasuredFile f = MeasuredCsv.read("log.csv", "# made by hand\ntime [ms],P2 [psi],P1 [bar]\n0,1000,10\n"
                + "0.5,2000,20\n1.0,3000,30\n", Map.of());
        assertEquals(2, f.channels().size());
        MeasuredChannel p2 = f.channels().get(0);
        assertEquals("P2", p2.name());
        // NIST SP 811 (2008), Appendix B: 3000 psi = 206.8427 bar
        assertEquals(206.8427e5, p2.values()[2], 5.0, "the reference is rounded to 0.0001 bar");
        assertEquals(1000 * PSI, p2.values()[0], 1e-6);
        assertArrayEquals(new double[] {0, 5e-4, 1e-3}, p2.time(), 1e-15);
        assertEquals(30e5, f.channels().get(1).values()[2], 1e-9);
    }

    @Test
    void readsIsoTimestampsAsSecondsAndUnitsGivenOutsideTheHeader() {
        MeasuredFile f = MeasuredCsv.read("log.csv", "stamp;P2\n2026-11-30T10:15:02.125Z;45\n"
                + "2026-11-30 10:15:02.126;46\n", Map.of("P2", "bar"));
        double[] t = f.channels().get(0).time();
        assertTrue(f.timestamps());
        // ISO 8601: the two stamps are 1 ms apart (the second, without zone, read as UTC)
        assertEquals(1e-3, t[1] - t[0], 1e-7);
        assertEquals(46e5, f.channels().get(0).values()[1], 1e-9);
    }

    @Test
    void refusesAnUnparseableNumberAtItsLineAndColumn() {
        BranchsimException e = refused("t [s],P2 [bar]\n0,1\n0.001,1,5x\n", Map.of());
        assertPlace(e, 3, 9, "(column 3)");
        e = refused("t [s],P2 [bar]\n0,1\n0.001,1.2.3\n", Map.of());
        assertPlace(e, 3, 7, "P2");
        assertTrue(e.getMessage().contains("\"1.2.3\""), e.getMessage());
    }

    @Test
    void refusesTimeThatDoesNotIncrease() {
        BranchsimException e = refused("t [s],P2 [bar]\n0,1\n0.002,1\n0.001,1\n", Map.of());
        assertPlace(e, 4, 1, "t");
    }

    @Test
    void refusesAnUnknownUnitAndAMissingOne() {
        assertPlace(refused("t [s],P2 [barr]\n0,1\n1,1\n", Map.of()), 1, 7, "P2");
        assertPlace(refused("t [s],P2\n0,1\n1,1\n", Map.of()), 1, 7, "P2");
        assertPlace(refused("t [furlong],P2 [bar]\n0,1\n1,1\n", Map.of()), 1, 1, "t");
        assertPlace(refused("t [s],P2 [bar]\n0,1\n1,1\n", Map.of("P2", "psi")), 1, 7, "P2");
    }

    @Test
    void refusesMissingFieldsBadTimestampsAndEmptyFiles() {
        assertPlace(refused("t [s],P2 [bar],P3 [bar]\n0,1,2\n1,1\n", Map.of()), 3, 4, "P3");
        assertPlace(refused("stamp,P2 [bar]\nyesterday,1\n", Map.of()), 2, 1, "stamp");
        assertPlace(refused("# only a comment\n", Map.of()), 1, 1, "time");
        assertPlace(refused("t [s],P2 [bar]\n0,1\n", Map.of()), 2, 1, "t");
    }

    @Test
    void refusesAMappedColumnTheFilesLackAndAUnitOfAnotherDimension() {
        MeasuredFile f = MeasuredCsv.read("log.csv", "t [s],P2 [bar],X [mm]\n0,1,0\n1,2,1\n", Map.of());
        BranchsimException missing = assertThrows(BranchsimException.class, () -> ChannelSet.map(List.of(f),
                List.of(ChannelMapping.parse("P9=clampLine.p")), s -> Dimension.PRESSURE, "clampLine.p"));
        assertSame(ErrorKey.MEASURED_FILE_INVALID, missing.key());
        assertEquals("P9", missing.arguments()[3]);
        BranchsimException wrong = assertThrows(BranchsimException.class, () -> ChannelSet.map(List.of(f),
                List.of(ChannelMapping.parse("X=clampLine.p")), s -> Dimension.PRESSURE, "clampLine.p"));
        assertSame(ErrorKey.MEASURED_FILE_INVALID, wrong.key());
        assertTrue(wrong.getMessage().contains("pressure"), wrong.getMessage());
    }

    @Test
    void mappingsReadTheirColumnUnitAndSignal() {
        assertEquals(new ChannelMapping("P2", "psi", "clampLine.p"), ChannelMapping.parse("P2 [psi]=clampLine.p"));
        assertEquals(new ChannelMapping("Supply P", null, "pumpLine.p"), ChannelMapping.parse("Supply P = pumpLine.p"));
        assertEquals(null, ChannelMapping.parse("clampLine.p"));
    }
}
