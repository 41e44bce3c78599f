package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.settings.Method;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * The method words a scenario's {@code solver.method} accepts (docs/scenario-format.md, field reference) and what
 * each runs: "implicit" is RODAS of order 4 (the default), "implicit-order3" the RODAS3 method it replaced.
 */
class MethodNamesTest {

    @Test
    void wordsNameTheMethods() {
        assertEquals(Method.IMPLICIT_ORDER3, Method.named("implicit-order3"));
        assertEquals(Method.IMPLICIT_ORDER3, Method.named("IMPLICIT_ORDER3"), "the enum spelling is read too");
        assertEquals(Method.IMPLICIT, Method.named(" Implicit "));
        assertNull(Method.named("rodas"));
        assertNull(Method.named(null));
        for (Method m : Method.values()) {
            assertEquals(m, Method.named(m.word()));
        }
        assertEquals(Method.IMPLICIT, SolverSettings.DEFAULT_METHOD);
    }

    @Test
    void theImplicitWordsRunTheirSchemes() {
        assertTrue(IntegratorFactory.describe(Method.IMPLICIT).contains("RODAS (order 4"));
        assertTrue(IntegratorFactory.describe(Method.IMPLICIT_ORDER3).contains("RODAS3 (order 3"));
    }
}
