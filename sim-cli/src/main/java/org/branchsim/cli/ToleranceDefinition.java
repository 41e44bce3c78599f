package org.branchsim.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.study.ToleranceStudy;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Tolerance;

/**
 * The definition of a tolerance study: the scenario, its toleranced values with their limits, the number of
 * runs and the seed they are drawn with, and the metric drawn as a histogram. Every run's values follow from
 * these alone ({@link ToleranceStudy#draw}), whichever shard runs it.
 *
 * @param scenario the scenario's name
 * @param scenarioSha256 SHA-256 of the scenario file's bytes
 * @param runs the number of runs (variants) of the whole study
 * @param seed the seed of the one generator all runs' values are drawn from, in run order
 * @param histogram the metric drawn as a histogram
 * @param tolerances the toleranced values, in document order
 */
record ToleranceDefinition(String scenario, String scenarioSha256, int runs, long seed, String histogram,
                           List<ToleranceStudy.Parameter> tolerances) implements StudyDefinition {

    ToleranceDefinition {
        tolerances = List.copyOf(tolerances);
    }

    @Override
    public String study() {
        return "tolerance";
    }

    @Override
    public int variants() {
        return runs;
    }

    @Override
    public List<String> parameters() {
        return tolerances.stream().map(ToleranceStudy.Parameter::path).toList();
    }

    @Override
    public List<Variant> allVariants() {
        return ToleranceStudy.draw(tolerances, runs, seed);
    }

    @Override
    public ObjectNode toJson() {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("study", study());
        o.put("scenario", scenario);
        o.put("scenarioSha256", scenarioSha256);
        o.put("variants", runs);
        o.put("seed", seed);
        o.put("histogram", histogram);
        ArrayNode list = o.putArray("tolerances");
        for (ToleranceStudy.Parameter p : tolerances) {
            ObjectNode t = list.addObject();
            t.put("path", p.path());
            t.put("nominal", p.tolerance().nominal());
            ShardJson.put(t, "low", p.tolerance().low());
            ShardJson.put(t, "high", p.tolerance().high());
            t.put("unit", p.tolerance().unit());
        }
        return o;
    }

    /** @return the definition a manifest's "study" object holds */
    static ToleranceDefinition fromJson(JsonNode json, ShardJson reader) {
        List<ToleranceStudy.Parameter> tolerances = new ArrayList<>();
        for (JsonNode t : reader.array(json, "tolerances")) {
            tolerances.add(new ToleranceStudy.Parameter(reader.text(t, "path"), new Tolerance(reader.text(t, "nominal"),
                    reader.number(t.get("low"), "low"), reader.number(t.get("high"), "high"), reader.text(t, "unit"))));
        }
        if (tolerances.isEmpty()) {
            throw reader.bad("\"tolerances\"", "one or more toleranced values", "none");
        }
        JsonNode seed = reader.field(json, "seed");
        if (!seed.isIntegralNumber() || !seed.canConvertToLong()) {
            throw reader.bad("\"seed\"", "a whole number", seed.toString());
        }
        return new ToleranceDefinition(reader.text(json, "scenario"), reader.text(json, "scenarioSha256"),
                (int) reader.whole(json, "variants", 2, OptionChecks.MAX_VARIANTS), seed.asLong(),
                reader.text(json, "histogram"), tolerances);
    }
}
