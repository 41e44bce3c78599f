package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.study.Variant;
import org.junit.jupiter.api.Test;

/**
 * summary.csv as a spreadsheet reads it (issue 13 item 6): fields separated by commas, one record per line
 * (RFC 4180, Common Format and MIME Type for CSV Files, 2005, section 2); parameter values as numbers in the unit
 * named in the header, converted by the exact factors of NIST Special Publication 811 (2008), Appendix B
 * (1 um = 1e-3 mm); whole numbers as integers; the rank (1 = best) in a column apart from the variant id.
 */
class StudyTableTest {

    private static final String DIAMETER = "elements.reducer.dampingOrifice.diameter";
    private static final String GAIN = "elements.reducer.gain";
    private static final String OVERSHOOT = "reducer.overshoot [%]";
    private static final String STEPS = "solver.steps";

    private static StudyTable.Row row(int index, Object diameter, Object gain, Double overshoot, double steps) {
        Map<String, Object> values = new LinkedHashMap<>();
        values.put(DIAMETER, diameter);
        values.put(GAIN, gain);
        Map<String, Double> metrics = new LinkedHashMap<>();
        metrics.put(OVERSHOOT, overshoot);
        metrics.put(STEPS, steps);
        return new StudyTable.Row(new Variant(index, values), null, metrics, null);
    }

    private static List<StudyTable.Row> rows() {
        return List.of(row(0, "0.8 mm", 2, 12.5, 8049.0), row(1, "900 um", 3, 7.25, 8100.0),
                row(2, "1.2 mm", 4, 30.0, 7990.0),
                new StudyTable.Row(new Variant(3, Map.of(DIAMETER, "1.5 mm", GAIN, 5)), "solver failed", Map.of(),
                        null));
    }

    @Test
    void parametersAreNumbersInTheHeadersUnitAndTheRankStandsApartFromTheVariantId() {
        List<StudyTable.Row> rows = rows();
        int[] ranks = StudyTable.ranks(rows, OVERSHOOT, false);
        assertArrayEquals(new int[] {2, 1, 3, 0}, ranks, "smallest overshoot first; the failed variant unranked");
        List<String> lines = StudyTable.csv(List.of(DIAMETER, GAIN), rows, List.of(OVERSHOOT, STEPS), ranks)
                .lines().toList();
        assertEquals("variant,rank," + DIAMETER + " [mm]," + GAIN + ",status,error," + OVERSHOOT + "," + STEPS,
                lines.get(0));
        assertEquals("0,2,0.8,2,ok,,12.5,8049", lines.get(1));
        assertEquals("1,1,0.9,3,ok,,7.25,8100", lines.get(2), "900 um written as 0.9 mm");
        assertEquals("2,3,1.2,4,ok,,30,7990", lines.get(3));
        assertEquals("3,,1.5,5,failed,solver failed,,", lines.get(4));
        assertArrayEquals(new int[] {2, 3, 1, 0}, StudyTable.ranks(rows, OVERSHOOT, true), "largest first");
    }

    @Test
    void numbersAreWrittenSoThatASpreadsheetReadsThem() {
        assertEquals("8049", StudyTable.field(8049.0));
        assertEquals("0.2", StudyTable.field(0.2));
        assertEquals("2.892949e-06", StudyTable.field(2.8929487e-6));
        assertEquals("148.5961", StudyTable.field(148.59612));
        assertEquals("", StudyTable.field(Double.NaN));
        assertEquals("\"a, b\"", StudyTable.field("a, b"), "RFC 4180: a field with a comma is quoted");
    }
}
