package org.branchsim.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.results.Trace;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;

/**
 * The definition of a sweep: the scenario, the unit system its outputs use, the grid of varied values
 * (first parameter varying slowest), the metric the variants are ranked by and the signals overlaid.
 *
 * @param scenario the scenario's name
 * @param scenarioSha256 SHA-256 of the scenario file's bytes
 * @param units the unit system of the outputs (overlay axes)
 * @param axes each varied parameter with its values, as the scenario would write them
 * @param rankBy the summary.csv column the variants are ranked by
 * @param descending true when the largest value ranks first
 * @param overlay the signals drawn for every variant, with their dimensions (values in SI)
 */
record SweepDefinition(String scenario, String scenarioSha256, UnitSystem units, List<Axis> axes, String rankBy,
                       boolean descending, List<Trace.Column> overlay) implements StudyDefinition {

    /** One varied parameter. @param path its parameter path @param values its values, as text */
    record Axis(String path, List<String> values) {
        Axis {
            values = List.copyOf(values);
        }
    }

    SweepDefinition {
        axes = List.copyOf(axes);
        overlay = List.copyOf(overlay);
    }

    /**
     * @param scenario the scenario's name
     * @param scenarioSha256 SHA-256 of the scenario file
     * @param units unit system of the outputs
     * @param grid the --vary options as parameter path to values (values as the variants carry them)
     * @param rankBy the resolved ranking column
     * @param descending largest first
     * @param overlay the overlay signals with their dimensions
     * @return the definition
     */
    static SweepDefinition of(String scenario, String scenarioSha256, UnitSystem units, Map<String, List<Object>> grid,
                              String rankBy, boolean descending, List<Trace.Column> overlay) {
        List<Axis> axes = new ArrayList<>();
        grid.forEach((path, values) -> axes.add(new Axis(path, values.stream().map(String::valueOf).toList())));
        return new SweepDefinition(scenario, scenarioSha256, units, axes, rankBy, descending, overlay);
    }

    @Override
    public String study() {
        return "sweep";
    }

    @Override
    public int variants() {
        long n = 1;
        for (Axis a : axes) {
            n *= a.values().size();
        }
        return (int) Math.min(Integer.MAX_VALUE, n);
    }

    @Override
    public List<String> parameters() {
        return axes.stream().map(Axis::path).toList();
    }

    @Override
    public List<Variant> allVariants() {
        Map<String, List<Object>> m = new LinkedHashMap<>();
        for (Axis a : axes) {
            m.put(a.path(), new ArrayList<>(a.values()));
        }
        return SweepCommand.grid(m);
    }

    @Override
    public ObjectNode toJson() {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("study", study());
        o.put("scenario", scenario);
        o.put("scenarioSha256", scenarioSha256);
        o.put("units", units.name());
        o.put("variants", variants());
        ArrayNode vary = o.putArray("vary");
        for (Axis a : axes) {
            ObjectNode axis = vary.addObject();
            axis.put("path", a.path());
            ArrayNode values = axis.putArray("values");
            a.values().forEach(values::add);
        }
        o.put("rankBy", rankBy);
        o.put("descending", descending);
        ArrayNode signals = o.putArray("signals");
        for (Trace.Column c : overlay) {
            signals.addObject().put("name", c.name()).put("dimension", c.dimension().name());
        }
        return o;
    }

    /** @return the definition a manifest's "study" object holds */
    static SweepDefinition fromJson(JsonNode json, ShardJson reader) {
        List<Axis> axes = new ArrayList<>();
        for (JsonNode axis : reader.array(json, "vary")) {
            List<String> values = new ArrayList<>();
            for (JsonNode v : reader.array(axis, "values")) {
                if (!v.isTextual()) {
                    throw reader.bad("\"vary\" values", "text", v.toString());
                }
                values.add(v.asText());
            }
            if (values.isEmpty()) {
                throw reader.bad("\"vary\" values", "one or more values", "none");
            }
            axes.add(new Axis(reader.text(axis, "path"), values));
        }
        if (axes.isEmpty()) {
            throw reader.bad("\"vary\"", "one or more varied parameters", "none");
        }
        List<Trace.Column> overlay = new ArrayList<>();
        for (JsonNode s : reader.array(json, "signals")) {
            overlay.add(new Trace.Column(reader.text(s, "name"), enumValue(Dimension.class, s, "dimension", reader)));
        }
        SweepDefinition d = new SweepDefinition(reader.text(json, "scenario"), reader.text(json, "scenarioSha256"),
                enumValue(UnitSystem.class, json, "units", reader), axes, reader.text(json, "rankBy"),
                reader.flag(json, "descending"), overlay);
        long variants = reader.whole(json, "variants", 1, OptionChecks.MAX_VARIANTS);
        if (variants != d.variants()) {
            throw reader.bad("\"variants\"", d.variants() + ", the size of the \"vary\" grid", Long.toString(variants));
        }
        return d;
    }

    static <E extends Enum<E>> E enumValue(Class<E> type, JsonNode parent, String name, ShardJson reader) {
        String text = reader.text(parent, name);
        try {
            return Enum.valueOf(type, text);
        } catch (IllegalArgumentException e) {
            throw reader.bad("\"" + name + "\"", "one of " + java.util.Arrays.toString(type.getEnumConstants()),
                    "\"" + text + "\"");
        }
    }
}
