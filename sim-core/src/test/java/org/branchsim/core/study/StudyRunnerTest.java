package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.junit.jupiter.api.Test;

/**
 * Variants are built from the parsed document, never from a file, and each is reduced on its worker thread: a pump
 * into a node vented through an orifice, the pump speed varied.
 */
class StudyRunnerTest {

    private static final double DISPLACEMENT = 4e-6 / (2 * Math.PI); // 4 cm^3/rev in m^3/rad
    private static final double DIAMETER = 2e-3;
    private static final double CD = 0.61;

    private static final String SCENARIO = """
            { "name": "vented-pump",
              "fluid": { "grade": "VG46", "temperature": "45 degC", "density15": "870 kg/m^3" },
              "nodes": [ { "id": "tank", "type": "tank" }, { "id": "supply", "volume": "0.05 L" } ],
              "elements": [
                { "id": "pump", "type": "pump", "ports": { "inlet": "tank", "outlet": "supply" },
                  "displacement": "4 cm^3/rev", "speed": "1000 rpm" },
                { "id": "vent", "type": "orifice", "ports": { "a": "supply", "b": "tank" }, "diameter": "2 mm",
                  "cd": 0.61 } ],
              "solver": { "endTime": "0.3 s", "outputInterval": "1 ms" } }
            """;

    @Test
    void variantsAreBuiltFromTheParsedTreeAndReducedOnTheirThreads() {
        // Given a document parsed from text: there is no file to read again
        Located document = DocumentParser.parse("no-such-file.json", SCENARIO, false);
        List<Variant> variants = new ArrayList<>();
        double[] rpm = {600, 1000, 1500, 2000};
        for (int i = 0; i < rpm.length; i++) {
            variants.add(new Variant(i, Map.of("elements.pump.speed", rpm[i] + " rpm")));
        }
        // When the variants run on two threads, each reduced to its final supply pressure
        List<double[]> finals = StudyRunner.run("no-such-file.json", document, variants, 2, d -> { }, o -> {
            assertNull(o.error());
            int supply = o.result().model().states().indexOf(o.result().model().states().stream()
                    .filter(s -> s.name().equals("supply.p")).findFirst().orElseThrow());
            return new double[] {o.result().finalState()[supply], o.result().model().fluid().density()};
        });
        // Then each settles at the orifice drop of the pump's flow: dp = rho/2 (Q / (Cd A))^2 (orifice equation,
        // Merritt, Hydraulic Control Systems, 1967; Rabie, Fluid Power Engineering, 2009, eqs 2.34-2.39), with
        // Q = displacement x speed, rho the oil's density at 45 degC (below 870 kg/m^3 at 15 degC by a
        // thermal expansion of about 6.5e-4 per K, from memory: 840 to 870)
        for (int i = 0; i < rpm.length; i++) {
            double q = DISPLACEMENT * rpm[i] * 2 * Math.PI / 60;
            double area = Math.PI * DIAMETER * DIAMETER / 4;
            double density = finals.get(i)[1];
            assertEquals(855.0, density, 15.0);
            double drop = 0.5 * density * Math.pow(q / (CD * area), 2);
            assertEquals(drop, finals.get(i)[0], 0.005 * drop, "variant at " + rpm[i] + " rpm");
        }
        // and the base document is unchanged
        assertEquals("1000 rpm", ((Located.Scalar) ParameterPath.parse("elements.pump.speed").find(document)).value());
    }
}
