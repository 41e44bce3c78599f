package org.branchsim.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.scenario.FieldBounds;
import org.junit.jupiter.api.Test;

/**
 * docs/scenario-format.md lists the unit spellings and the field bounds the code applies: the two tables in
 * the document are the code's own tables, word for word.
 */
class UnitTableDocTest {

    private static final Path DOC = Path.of("..", "docs", "scenario-format.md");

    private static String between(String text, String begin, String end) {
        int a = text.indexOf(begin);
        int b = text.indexOf(end);
        assertTrue(a >= 0 && b > a, "markers " + begin + " / " + end + " in " + DOC);
        return text.substring(text.indexOf('\n', a) + 1, b);
    }

    @Test
    void theDocumentListsEveryAcceptedUnitSpelling() throws IOException {
        String doc = Files.readString(DOC, StandardCharsets.UTF_8);
        assertEquals(Units.markdownTable(), between(doc, "<!-- units:begin", "<!-- units:end"));
        // spot checks of the table itself against the units of the trade named in the issue
        for (String spelling : new String[] {"`psig`", "`barg`", "`kpsi`", "`gpm`", "`\u00b0F`", "`\u00b0C`", "`degF`"}) {
            assertTrue(Units.markdownTable().contains(spelling), spelling);
        }
    }

    @Test
    void theDocumentListsEveryFieldBound() throws IOException {
        String doc = Files.readString(DOC, StandardCharsets.UTF_8);
        assertEquals(FieldBounds.markdownTable(), between(doc, "<!-- bounds:begin", "<!-- bounds:end"));
    }
}
