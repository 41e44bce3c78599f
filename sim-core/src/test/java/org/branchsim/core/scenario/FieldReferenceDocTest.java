package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.branchsim.core.docs.GeneratedSections;
import org.junit.jupiter.api.Test;

/**
 * docs/scenario-format.md carries the field reference generated from the descriptors, word for word, so the
 * document cannot drift from what the reader accepts; and the reference states the physics defaults that the
 * literature gives.
 */
class FieldReferenceDocTest {

    @Test
    void theDocumentCarriesTheGeneratedReference() throws IOException {
        assertEquals(FieldReference.markdown(), GeneratedSections.of("fields"));
    }

    @Test
    void everyElementTypeIsInTheReferenceWithItsPorts() {
        String md = FieldReference.markdown();
        for (ElementDescriptor<?> d : ElementCatalog.standard().types()) {
            assertTrue(md.contains("### `" + d.type() + "` — "), d.type());
            for (String port : d.ports()) {
                assertTrue(md.contains("`" + port + "`"), d.type() + " port " + port);
            }
        }
    }

    @Test
    void physicsDefaultsAreTheLiteratureValues() {
        // contraction coefficient of a sharp-edged slot, pi/(pi+2) = 0.611 (von Mises; Merritt, Hydraulic Control
        // Systems, 1967, section 3.2)
        assertEquals(0.611, CommonFields.SHARP_EDGE_CD, 5e-4);
        assertTrue(FieldReference.markdown().contains("| `cd` | number 0.05 to 1 | 0.611 = π/(π+2) |"));
        // a tube wall's bulk modulus from E t / d (thin wall; Merritt 1967, ch. 2, from memory): 206 GPa for
        // steel, common practice, no source
        assertTrue(FieldReference.markdown().contains("| `modulus` | pressure > 0, 1 MPa to 1000 GPa | `\"206 GPa\"` |"));
        // ISO 3448 names the grades by their viscosity at 40 degC: VG46 is the grade of the demos
        assertTrue(FieldReference.markdown().contains("ISO VG grade: VG10, VG15, VG22, VG32, VG46, VG68, VG100, VG150"));
    }
}
