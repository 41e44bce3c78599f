package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.FieldPaths;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The parameter paths of sweeps, tolerance studies and diagnoses name fields the descriptors declare: a misspelt
 * field is refused before anything runs, with the line and column the path stopped at and the fields there.
 * The demo is the press pilot supply of scenarios/pilot-supply-hunting.json.
 */
class ParameterPathTest {

    private static final Path FILE = Path.of("..", "scenarios", "pilot-supply-hunting.json");
    private static final Located DEMO = DocumentParser.parse(FILE);

    /** @return the 1-based line of the first occurrence of a fragment in the demo file */
    private static int lineOf(String fragment) throws IOException {
        String text = Files.readString(FILE, StandardCharsets.UTF_8);
        int at = text.indexOf(fragment);
        assertTrue(at >= 0, fragment);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    private static BranchsimException refused(String path) {
        BranchsimException e = assertThrows(BranchsimException.class, () -> ParameterPath.parse(path).field(DEMO), path);
        assertEquals(ErrorKey.UNDECLARED_PARAMETER_FIELD, e.key());
        assertTrue(e.key().isInputError());
        return e;
    }

    @Test
    void aMisspeltFieldIsRefusedWithItsPlaceAndTheFieldsThere() throws IOException {
        String m = refused("elements.relief.dampng").getMessage();
        assertTrue(m.contains("no \"dampng\" in reliefValve \"relief\" (line " + lineOf("{ \"id\": \"relief\"")
                + ", column 5)"), m);
        assertTrue(m.contains("seatDiameter, coneAngle, springRate, mass, damping, maxLift, cd"), m);
        String nested = refused("elements.pilotReducer.dampingOrifice.diametre").getMessage();
        assertTrue(nested.contains("no \"diametre\" in the \"dampingOrifice\" block of pilotReducingValve "
                + "\"pilotReducer\""), nested);
        assertTrue(nested.contains("its fields: diameter, cd"), nested);
        assertTrue(refused("elements.nobody.damping").getMessage().contains("no \"nobody\" in the scenario (ids there: "
                + "pump, relief, pilotReducer, pilotUse)"));
        assertTrue(refused("fluid.grad").getMessage().contains("no \"grad\" in the \"fluid\" block"));
        assertTrue(refused("elements.pilotReducer.spool").getMessage().contains("is a block, not a value"));
        assertTrue(refused("schedule.0.at").getMessage().contains("items have no id"));
    }

    @Test
    void aDeclaredFieldGivesItsDimensionEvenWhenLeftAtItsDefault() {
        // the relief valve's cone angle is not written in the demo: it is declared, an angle
        FieldPaths.Target t = ParameterPath.parse("elements.relief.coneAngle").target(DEMO);
        assertEquals(Dimension.ANGLE, t.field().dimension());
        assertEquals("relief", t.ownerId());
        assertEquals("reliefValve", t.ownerType());
        assertEquals(Dimension.VOLUME, ParameterPath.parse("nodes.supply.volume").field(DEMO).dimension());
        assertEquals(Dimension.PRESSURE, ParameterPath.parse("nodes.supply.wall.bulkModulus").field(DEMO).dimension());
        assertEquals(Dimension.LENGTH,
                ParameterPath.parse("elements.pilotReducer.spool.endOrifice.diameter").field(DEMO).dimension());
        // a declared field that is not written can be added by a sweep, but not found
        Located copy = DEMO.copy();
        ParameterPath.parse("elements.relief.coneAngle").setOrAdd(copy, "60 deg");
        assertEquals("60 deg", ((Located.Scalar) ParameterPath.parse("elements.relief.coneAngle").find(copy)).value());
        assertTrue(assertThrows(BranchsimException.class, () -> ParameterPath.parse("elements.relief.coneAngle")
                .find(DEMO)).getMessage().contains("found no \"coneAngle\""));
    }

    @Test
    void anUndeclaredFieldIsNeverAdded() {
        Located copy = DEMO.copy();
        assertThrows(BranchsimException.class, () -> ParameterPath.parse("elements.relief.dampng").setOrAdd(copy, "1 N*s/m"));
        assertEquals(null, ((Located.Obj) ((Located.Arr) ((Located.Obj) copy).get("elements")).items().get(1)).get("dampng"));
    }
}
