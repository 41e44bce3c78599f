package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.InputFormat;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.Problem;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * Adding an element is one class and one descriptor: a toy laminar restrictor registered through its descriptor
 * alone is read from a scenario (with the reader's checks and located problems), appears in the JSON Schema and
 * the field reference, and simulates to the pressure divider that Hagen-Poiseuille conductances give.
 */
class ToyElementTest {

    /** Relative tolerance on the settled divider pressure (the run lasts about 15 time constants). */
    private static final double DIVIDER_TOLERANCE = 1e-4;

    private static final ElementCatalog WITH_TOY = ElementCatalog.standard().with(LaminarRestrictor.DESCRIPTOR);

    private static String scenario(String secondLength) {
        return "{ \"name\": \"divider\", \"fluid\": { \"grade\": \"VG46\", \"temperature\": \"40 degC\" },\n"
                + "  \"nodes\": [ { \"id\": \"supply\", \"type\": \"tank\", \"pressure\": \"100 bar\" },\n"
                + "    { \"id\": \"mid\", \"volume\": \"0.1 L\" }, { \"id\": \"drain\", \"type\": \"tank\" } ],\n"
                + "  \"elements\": [\n"
                + "    { \"id\": \"r1\", \"type\": \"laminarRestrictor\", \"ports\": { \"a\": \"supply\", \"b\": \"mid\" },\n"
                + "      \"diameter\": \"1 mm\", \"length\": \"50 mm\" },\n"
                + "    { \"id\": \"r2\", \"type\": \"laminarRestrictor\", \"ports\": { \"a\": \"mid\", \"b\": \"drain\" },\n"
                + "      \"diameter\": \"1 mm\", \"length\": " + secondLength + " } ],\n"
                + "  \"solver\": { \"endTime\": \"50 ms\", \"outputInterval\": \"1 ms\", \"relativeTolerance\": 1e-9 } }";
    }

    @Test
    void aToyElementRegisteredByItsDescriptorIsReadAndSimulated() {
        String text = scenario("\"100 mm\"");
        Scenario s = ScenarioLoader.build("divider.json", DocumentParser.parse("divider.json", text, false), WITH_TOY);
        SimulationResult run = Simulator.run(s.circuit(), s.solver());
        double mid = run.trace().valueAt("mid.p", 0.05);
        // two conductances in series between 100 bar and 0 bar: p_mid = p_s G1 / (G1 + G2), G ~ d^4 / L
        // (Hagen-Poiseuille), so with equal bores and L2 = 2 L1: p_mid = 100 bar * 2/3
        double expected = 100e5 * (1.0 / 0.05) / (1.0 / 0.05 + 1.0 / 0.1);
        assertEquals(expected, mid, DIVIDER_TOLERANCE * expected);
        // and the flow through r1 is the Hagen-Poiseuille flow at its pressure difference
        double mu = s.circuit().fluid().density() * s.circuit().fluid().kinematicViscosity();
        double q = LaminarRestrictor.conductance(1e-3, 0.05, mu) * (100e5 - expected);
        assertEquals(q, run.trace().valueAt("r1.q", 0.05), 1e-3 * q);
    }

    @Test
    void theStandardCatalogueDoesNotKnowTheToy() {
        String text = scenario("\"100 mm\"");
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> ScenarioLoader.build("divider.json", DocumentParser.parse("divider.json", text, false)));
        assertTrue(e.problems().get(0).expected().contains("an element type (pump, orifice"), e.fullReport());
    }

    @Test
    void theToysFieldsAreCheckedLikeAnyOther() {
        String text = scenario("100");
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> ScenarioLoader.build("divider.json", DocumentParser.parse("divider.json", text, false), WITH_TOY));
        List<Problem> problems = e.problems();
        assertEquals(1, problems.size(), e.fullReport());
        assertEquals("elements[1].length", problems.get(0).path());
        assertEquals(8, problems.get(0).line());
        assertTrue(problems.get(0).expected().contains("length with its unit"), e.fullReport());
    }

    @Test
    void theToyIsInTheSchemaAndTheReference() {
        var schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12)
                .getSchema(ScenarioSchema.text(WITH_TOY), InputFormat.JSON);
        assertEquals(List.of(), schema.validate(scenario("\"100 mm\""), InputFormat.JSON));
        assertTrue(!schema.validate(scenario("100"), InputFormat.JSON).isEmpty(), "a length without unit");
        assertTrue(FieldReference.markdown(WITH_TOY).contains("### `laminarRestrictor` — fixed laminar restrictor"));
    }
}
