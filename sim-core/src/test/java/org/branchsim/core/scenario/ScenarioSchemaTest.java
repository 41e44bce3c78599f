package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import org.branchsim.core.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The JSON Schema of scenario files, checked by a validator of its own (networknt json-schema-validator, which
 * implements JSON Schema draft 2020-12: A. Wright, H. Andrews, B. Hutton, G. Dennis, "JSON Schema: A Media Type
 * for Describing JSON Documents", draft 2020-12, 2022): the schema is a valid 2020-12 schema, the shipped file is
 * the generated one, every demo is valid, and files the reader refuses for their structure (an unknown field, a
 * missing field, a value of the wrong type) are refused by the schema too.
 */
class ScenarioSchemaTest {

    private static final Path SHIPPED = Path.of("..", "docs", ScenarioSchema.FILE_NAME);
    private static final Path DEMOS = Path.of("..", "scenarios");
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final SchemaRegistry REGISTRY = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
    private static final Schema SCHEMA = REGISTRY.getSchema(ScenarioSchema.text(), InputFormat.JSON);

    private static List<com.networknt.schema.Error> errors(String text, InputFormat format) {
        return SCHEMA.validate(text, format);
    }

    private static List<Path> demos() throws IOException {
        try (Stream<Path> s = Files.list(DEMOS)) {
            List<Path> out = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
            assertTrue(out.size() >= 6, "the demos in scenarios/");
            return out;
        }
    }

    @Test
    void theShippedSchemaIsTheGeneratedOne() throws IOException {
        assertEquals(ScenarioSchema.text(), Files.readString(SHIPPED, StandardCharsets.UTF_8),
                "docs/" + ScenarioSchema.FILE_NAME + " is out of date: write it with 'branchsim schema --out'");
    }

    @Test
    void theSchemaIsAValidDraft202012Schema() {
        // the dialect's own meta-schema (json-schema.org, draft 2020-12), bundled with the validator
        Schema meta = REGISTRY.getSchema(SchemaLocation.of(ScenarioSchema.DIALECT));
        List<com.networknt.schema.Error> problems = meta.validate(ScenarioSchema.text(), InputFormat.JSON);
        assertTrue(problems.isEmpty(), problems.toString());
        // a schema that accepts anything would pass the tests below trivially: it must refuse a bare object
        assertFalse(errors("{}", InputFormat.JSON).isEmpty());
    }

    @Test
    void everyDemoIsValidForTheSchemaAndTheReader() throws IOException {
        for (Path demo : demos()) {
            String text = Files.readString(demo, StandardCharsets.UTF_8);
            assertEquals(List.of(), errors(text, InputFormat.JSON), demo.toString());
            ScenarioLoader.load(demo);
        }
        for (String resource : new String[] {"minimal.json", "minimal.yaml"}) {
            String text = ScenarioProblemsTest.resource(resource);
            assertEquals(List.of(), errors(text, resource.endsWith(".yaml") ? InputFormat.YAML : InputFormat.JSON),
                    resource);
        }
    }

    @Test
    void aSchemaKeyIsAcceptedByTheReaderAndTheSchema() throws IOException {
        ObjectNode doc = demo("pilot-supply-hunting.json");
        ObjectNode withKey = JSON.createObjectNode();
        withKey.put("$schema", "../docs/" + ScenarioSchema.FILE_NAME);
        withKey.setAll(doc);
        String text = JSON.writeValueAsString(withKey);
        assertEquals(List.of(), errors(text, InputFormat.JSON));
        ScenarioLoader.build("with-schema.json", DocumentParser.parse("with-schema.json", text, false));
    }

    private static ObjectNode demo(String name) throws IOException {
        return (ObjectNode) JSON.readTree(DEMOS.resolve(name).toFile());
    }

    private static ObjectNode element(ObjectNode doc, String id) {
        for (JsonNode e : doc.get("elements")) {
            if (id.equals(e.get("id").asText())) {
                return (ObjectNode) e;
            }
        }
        throw new AssertionError("no element " + id);
    }

    private static ObjectNode node(ObjectNode doc, String id) {
        for (JsonNode n : doc.get("nodes")) {
            if (id.equals(n.get("id").asText())) {
                return (ObjectNode) n;
            }
        }
        throw new AssertionError("no node " + id);
    }

    @Test
    void structuralRefusalsOfTheReaderAreRefusedByTheSchemaToo() throws IOException {
        Map<String, Consumer<ObjectNode>> cases = new java.util.LinkedHashMap<>();
        // unknown fields, at every level
        cases.put("unknown top-level field", d -> d.putObject("solverr"));
        cases.put("unknown fluid field", d -> ((ObjectNode) d.get("fluid")).put("viscosityy", "46 cSt"));
        cases.put("unknown element field", d -> element(d, "relief").put("dampng", "1 N*s/m"));
        cases.put("unknown nested field", d -> ((ObjectNode) element(d, "pilotReducer").get("spool")).put("massa", "1 g"));
        cases.put("unknown wall field", d -> ((ObjectNode) node(d, "supply").get("wall")).put("hose", true));
        cases.put("unknown port", d -> ((ObjectNode) element(d, "pump").get("ports")).put("drain", "tank"));
        cases.put("unknown plot field", d -> ((ObjectNode) d.get("outputs").get("plots").get(0)).put("colour", "red"));
        cases.put("unknown schedule field", d -> ((ObjectNode) d.get("schedule").get(0)).put("until", "1 s"));
        // missing required fields
        cases.put("no end time", d -> ((ObjectNode) d.get("solver")).remove("endTime"));
        cases.put("no element id", d -> element(d, "pump").remove("id"));
        cases.put("no spool mass", d -> ((ObjectNode) element(d, "pilotReducer").get("spool")).remove("mass"));
        cases.put("no node volume", d -> node(d, "supply").remove("volume"));
        cases.put("no elements", d -> d.remove("elements"));
        cases.put("no solver", d -> d.remove("solver"));
        cases.put("no seat diameter", d -> element(d, "relief").remove("seatDiameter"));
        cases.put("no ports", d -> element(d, "pump").remove("ports"));
        cases.put("no outlet port", d -> ((ObjectNode) element(d, "pump").get("ports")).remove("outlet"));
        cases.put("neither setting nor preload", d -> element(d, "relief").remove("setting"));
        cases.put("both setting and preload", d -> element(d, "relief").put("preload", "700 N"));
        cases.put("no damping orifice", d -> element(d, "pilotReducer").remove("dampingOrifice"));
        cases.put("no schedule target", d -> ((ObjectNode) d.get("schedule").get(0)).remove("set"));
        cases.put("empty plot signals", d -> ((ObjectNode) d.get("outputs").get("plots").get(0)).putArray("signals"));
        // values of the wrong type
        cases.put("volume as a bare number", d -> node(d, "supply").put("volume", 0.5));
        cases.put("mass as a bare number", d -> element(d, "relief").put("mass", 20));
        cases.put("nodes as an object", d -> d.putObject("nodes"));
        cases.put("plots as a text", d -> ((ObjectNode) d.get("outputs")).put("plots", "none"));
        cases.put("efficiency as a boolean", d -> element(d, "pump").put("volumetricEfficiency", true));
        cases.put("name as a number", d -> d.put("name", 12));
        cases.put("type as a number", d -> element(d, "pump").put("type", 5));
        cases.put("fluid as a text", d -> d.put("fluid", "VG46"));
        cases.put("schedule time as a number", d -> ((ObjectNode) d.get("schedule").get(0)).put("at", 0.3));
        cases.put("unknown element type", d -> element(d, "pump").put("type", "pompe"));
        cases.put("unknown node type", d -> node(d, "supply").put("type", "accumulator"));
        cases.put("unknown solver method", d -> ((ObjectNode) d.get("solver")).put("method", "euler"));
        cases.put("a damping with a length unit", d -> element(d, "relief").put("damping", "400 mm"));
        cases.put("a setting in absolute units", d -> element(d, "relief").put("setting", "140 bara"));
        List<String> missed = new ArrayList<>();
        for (Map.Entry<String, Consumer<ObjectNode>> c : cases.entrySet()) {
            ObjectNode doc = demo("pilot-supply-hunting.json");
            c.getValue().accept(doc);
            String text = JSON.writeValueAsString(doc);
            BranchsimException e = assertThrows(BranchsimException.class,
                    () -> ScenarioLoader.build("case.json", DocumentParser.parse("case.json", text, false)), c.getKey());
            assertEquals(ErrorKey.SCENARIO_INVALID, e.key(), c.getKey());
            if (errors(text, InputFormat.JSON).isEmpty()) {
                missed.add(c.getKey());
            }
        }
        assertEquals(List.of(), missed, "refused by the reader but accepted by the schema");
    }

    /**
     * The unit pattern of each dimension accepts exactly what the reader's unit parser accepts, over every
     * spelling of the unit table and the ways of writing products and powers that the SI Brochure allows (BIPM,
     * The International System of Units, 9th ed. 2019, section 5.4.3: a product of units is written with a
     * space or a half-high dot; NIST SP 811 (2008), section 6.1: prefixes are case sensitive, M = mega, m = milli).
     */
    @Test
    void unitPatternsAcceptWhatTheReaderAccepts() {
        List<String> texts = new ArrayList<>();
        for (Dimension d : Dimension.values()) {
            for (Units.Spelling s : Units.spellingsOf(d)) {
                String u = s.text();
                texts.addAll(List.of("2.5 " + u, "2.5" + u, "-1e3 " + u, "1.5 " + u + " \u00b1 0.1 " + u,
                        "1.5 " + u + " +/- 10 %", "1 " + u + " .. 2 " + u, "  .5 " + u + "  "));
                if (s.anyCase()) {
                    texts.add("3 " + u.toUpperCase(java.util.Locale.ROOT));
                    texts.add("3 " + u.toLowerCase(java.util.Locale.ROOT));
                }
            }
        }
        texts.addAll(List.of("1 N s/m", "1 N\u00b7s/m", "1 N * s / m", "2 m3", "2 m\u00b3", "3 mm\u00b2", "40 deg C",
                "40 \u00b0 F", "3000 PSI", "5 GPM", "2 Nm", "1 kg cm2", "80 Mbar", "1 MM", "3000 psia", "1 mm^", "1 furlong",
                "mm", "1", "0.5", "1 bar bar", "1 bar \u00b1", "1 bar .. ", "1 MPA", "1 mPa", "12 L/min", "1 l/MIN"));
        List<String> disagreements = new ArrayList<>();
        for (Dimension d : Dimension.values()) {
            Pattern p = Pattern.compile(ValuePatterns.of(d));
            for (String t : texts) {
                boolean reader = Quantity.parse(t, d).ok();
                boolean schema = p.matcher(t).matches();
                if (reader != schema) {
                    disagreements.add(d + " \"" + t + "\": reader " + reader + ", schema " + schema);
                }
            }
        }
        assertEquals(List.of(), disagreements);
        // spot checks of the sources above
        Pattern pressure = Pattern.compile(ValuePatterns.of(Dimension.PRESSURE));
        assertTrue(pressure.matcher("80 mbar").matches());
        assertFalse(pressure.matcher("80 Mbar").matches());
        assertTrue(Pattern.compile(ValuePatterns.of(Dimension.DAMPING)).matcher("400 N\u00b7s/m").matches());
    }

    @Test
    void everyElementTypeAndNodeKindHasItsDefinition() throws IOException {
        JsonNode schema = JSON.readTree(ScenarioSchema.text());
        for (ElementDescriptor<?> d : ElementCatalog.standard().types()) {
            JsonNode def = schema.get("$defs").get("element." + d.type());
            assertTrue(def != null && def.get("additionalProperties").asBoolean(true) == false, d.type());
        }
        ArrayNode types = (ArrayNode) schema.get("$defs").get("element").get("properties").get("type").get("enum");
        // the nine element types of the issue, the accumulator, line, pilot-operated relief valve and
        // pressure-compensated pump of issue 12, plus the old name of the metering path
        assertEquals(14, types.size(), types.toString());
        for (NodeKind k : NodeKind.all()) {
            assertTrue(schema.get("$defs").has("node." + k.type()), k.type());
        }
    }
}
