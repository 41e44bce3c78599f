package org.branchsim.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.branchsim.core.scenario.FieldBounds;
import org.branchsim.core.docs.GeneratedSections;
import org.junit.jupiter.api.Test;

/**
 * docs/scenario-format.md lists the unit spellings and the field bounds the code applies: the two tables in
 * the document are the code's own tables, word for word.
 */
class UnitTableDocTest {

    @Test
    void theDocumentListsEveryAcceptedUnitSpelling() throws IOException {
        assertEquals(Units.markdownTable(), GeneratedSections.of("units"));
        // spot checks of the table itself against the units of the trade named in the issue
        for (String spelling : new String[] {"`psig`", "`barg`", "`kpsi`", "`gpm`", "`\u00b0F`", "`\u00b0C`", "`degF`"}) {
            assertTrue(Units.markdownTable().contains(spelling), spelling);
        }
    }

    @Test
    void theDocumentListsEveryFieldBound() throws IOException {
        assertEquals(FieldBounds.markdownTable(), GeneratedSections.of("bounds"));
    }
}
