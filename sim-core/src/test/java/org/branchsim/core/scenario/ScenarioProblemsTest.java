package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.stream.Collectors;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.error.Problem;
import org.junit.jupiter.api.Test;

/**
 * Every kind of bad input named in the foundation issue gets a problem that names the file, the line and
 * column, the field path, what was expected and what was found.
 */
class ScenarioProblemsTest {

    static String resource(String name) throws IOException {
        try (InputStream in = ScenarioProblemsTest.class.getResourceAsStream("/scenarios/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    static String minimal() throws IOException {
        return resource("minimal.json");
    }

    static Problem onlyProblem(String text) {
        return problems(text, false).stream().findFirst().orElseThrow();
    }

    static java.util.List<Problem> problems(String text, boolean yaml) {
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> ScenarioLoader.build("bad.json", DocumentParser.parse("bad.json", text, yaml)));
        assertEquals(ErrorKey.SCENARIO_INVALID, e.key());
        assertTrue(e.key().isInputError());
        return e.problems();
    }

    static int lineOf(String text, String fragment) {
        int at = text.indexOf(fragment);
        assertTrue(at >= 0, "fragment not in text: " + fragment);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    static void assertProblem(Problem p, String path, int line, String expectedPart, String foundPart) {
        assertEquals("bad.json", p.file());
        assertEquals(path, p.path(), p.describe());
        assertEquals(line, p.line(), p.describe());
        assertTrue(p.column() > 0, p.describe());
        assertTrue(p.expected().contains(expectedPart), p.describe());
        assertTrue(p.found().contains(foundPart), p.describe());
        assertTrue(p.describe().startsWith("bad.json:" + line + ":"), p.describe());
    }

    @Test
    void theValidScenariosLoad() throws IOException {
        Scenario s = ScenarioLoader.build("minimal.json", DocumentParser.parse("minimal.json", minimal(), false));
        assertEquals("minimal", s.name());
        assertNotNull(s.circuit().signal("ram.piston.x"));
        Scenario y = ScenarioLoader.build("minimal.yaml", DocumentParser.parse("minimal.yaml", resource("minimal.yaml"), true));
        assertEquals("minimal-yaml", y.name());
        assertNotNull(y.circuit().signal("relief.poppet.x"));
    }

    /** Old spellings are still accepted for one release, each with a located note naming the new one. */
    @Test
    void oldSpellingsAreAcceptedWithALocatedNote() throws IOException {
        String text = minimal().replace("\"type\": \"meteringPath\"", "\"type\": \"valveEdge\"")
                .replace("\"solver\":", "\"outputs\": { \"units\": \"SI\" },\n  \"solver\":");
        Scenario s = ScenarioLoader.build("old.json", DocumentParser.parse("old.json", text, false));
        assertEquals(2, s.notes().size(), s.notes().toString());
        assertTrue(s.notes().get(0).startsWith("old.json:" + lineOf(text, "\"valveEdge\"") + ":"), s.notes().get(0));
        assertTrue(s.notes().get(0).contains("\"valveEdge\" is the old name of \"meteringPath\""), s.notes().get(0));
        assertTrue(s.notes().get(1).contains("\"SI\" is the old name of \"metric\""), s.notes().get(1));
        assertEquals(org.branchsim.core.units.UnitSystem.METRIC, s.units());
        Scenario now = ScenarioLoader.build("minimal.json", DocumentParser.parse("minimal.json", minimal(), false));
        assertEquals(java.util.List.of(), now.notes());
    }

    @Test
    void malformedJsonNamesLineAndColumn() throws IOException {
        String text = minimal().replace("\"bore\": \"40 mm\",", "\"bore\": \"40 mm\"");
        Problem p = onlyProblem(text);
        assertEquals(lineOf(text, "\"bore\""), p.line(), p.describe());
        assertTrue(p.expected().contains("well-formed JSON"), p.describe());
    }

    @Test
    void malformedYamlNamesLineAndColumn() throws IOException {
        String text = resource("minimal.yaml").replace("  - id: supply\n", "  - id: supply\n   bad: [\n");
        Problem p = problems(text, true).get(0);
        assertTrue(p.line() > 0, p.describe());
        assertTrue(p.expected().contains("well-formed YAML"), p.describe());
    }

    @Test
    void unknownFieldIsNamedWithTheFieldsThatExist() throws IOException {
        String text = minimal().replace("\"bore\": \"40 mm\",", "\"bore\": \"40 mm\", \"boer\": \"40 mm\",");
        assertProblem(onlyProblem(text), "elements[4].boer", lineOf(text, "\"boer\""), "one of the fields", "unknown field \"boer\"");
    }

    @Test
    void unknownUnit() throws IOException {
        // "Mbar" is refused, never read as the millibar: the case of an SI prefix changes its meaning
        // (BIPM, The International System of Units, 9th ed. 2019, table 7: m = 1e-3, M = 1e6)
        String text = minimal().replace("\"80 bar\"", "\"80 Mbar\"");
        assertProblem(onlyProblem(text), "elements[1].setting", lineOf(text, "80 Mbar"), "known pressure unit", "\"80 Mbar\"");
    }

    @Test
    void wrongDimension() throws IOException {
        String text = minimal().replace("\"80 bar\"", "\"60 mm\"");
        assertProblem(onlyProblem(text), "elements[1].setting", lineOf(text, "60 mm"), "pressure unit", "\"60 mm\"");
    }

    @Test
    void dimensionedValueWithoutUnit() throws IOException {
        String text = minimal().replace("\"stroke\": \"100 mm\"", "\"stroke\": 100");
        assertProblem(onlyProblem(text), "elements[4].stroke", lineOf(text, "\"stroke\": 100"), "length with its unit", "without unit");
    }

    @Test
    void zeroOrNegativeSizesAreRefused() throws IOException {
        String volume = minimal().replace("\"volume\": \"0.2 L\"", "\"volume\": \"0 L\"");
        assertProblem(onlyProblem(volume), "nodes[1].volume", lineOf(volume, "0 L"), "greater than zero", "\"0 L\"");
        String diameter = minimal().replace("\"diameter\": \"4 mm\" },\n    { \"id\": \"vent\"", "\"diameter\": \"-4 mm\" },\n    { \"id\": \"vent\"");
        assertProblem(onlyProblem(diameter), "elements[2].diameter", lineOf(diameter, "-4 mm"), "greater than zero", "\"-4 mm\"");
        String mass = minimal().replace("\"10 kg\"", "\"0 kg\"");
        assertProblem(onlyProblem(mass), "elements[4].mass", lineOf(mass, "0 kg"), "greater than zero", "\"0 kg\"");
        String stroke = minimal().replace("\"100 mm\"", "\"-100 mm\"");
        assertProblem(onlyProblem(stroke), "elements[4].stroke", lineOf(stroke, "-100 mm"), "greater than zero", "\"-100 mm\"");
    }

    @Test
    void elementWiredToUnknownNode() throws IOException {
        String text = minimal().replace("\"b\": \"tank\" }, \"diameter\"", "\"b\": \"drain\" }, \"diameter\"");
        assertProblem(onlyProblem(text), "elements[3].ports.b", lineOf(text, "\"drain\""), "the id of a node", "\"drain\"");
    }

    @Test
    void nodeNothingConnectsTo() throws IOException {
        String text = minimal().replace("{ \"id\": \"rodSide\", \"volume\": \"0.05 L\" }",
                "{ \"id\": \"rodSide\", \"volume\": \"0.05 L\" },\n    { \"id\": \"spare\", \"volume\": \"0.05 L\" }");
        assertProblem(onlyProblem(text), "nodes[4]", lineOf(text, "\"spare\""), "some element's port connects to", "\"spare\" connected to nothing");
    }

    @Test
    void duplicateIds() throws IOException {
        String text = minimal().replace("{ \"id\": \"vent\"", "{ \"id\": \"edge\"");
        Problem p = problems(text, false).stream().filter(x -> x.path().equals("elements[3].id")).findFirst().orElseThrow();
        assertProblem(p, "elements[3].id", lineOf(text, "{ \"id\": \"edge\", \"type\": \"orifice\""), "an id used once", "\"edge\" again");
    }

    @Test
    void endTimeMustBePositive() throws IOException {
        String text = minimal().replace("\"endTime\": \"0.2 s\"", "\"endTime\": \"0 s\"");
        assertProblem(onlyProblem(text), "solver.endTime", lineOf(text, "\"0 s\""), "greater than zero", "\"0 s\"");
    }

    @Test
    void aCircuitOfTanksAloneIsRefused() {
        String text = "{ \"name\": \"tanks\", \"fluid\": {},\n"
                + "  \"nodes\": [ {\"id\": \"a\", \"type\": \"tank\", \"pressure\": \"10 bar\"}, {\"id\": \"b\", \"type\": \"tank\"} ],\n"
                + "  \"elements\": [ {\"id\": \"o\", \"type\": \"orifice\", \"ports\": {\"a\": \"a\", \"b\": \"b\"}, \"diameter\": \"1 mm\"} ],\n"
                + "  \"solver\": {\"endTime\": \"0.1 s\"} }";
        assertProblem(onlyProblem(text), "nodes", 2, "at least one node of type \"volume\"", "only tanks");
    }

    @Test
    void allProblemsAreReportedTogether() throws IOException {
        String text = minimal().replace("\"80 bar\"", "\"80 Mbar\"").replace("\"10 kg\"", "\"0 kg\"");
        java.util.List<Problem> list = problems(text, false);
        assertEquals(2, list.size(), list.stream().map(Problem::describe).collect(Collectors.joining("\n")));
    }
}
