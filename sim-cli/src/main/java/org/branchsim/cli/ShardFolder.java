package org.branchsim.cli;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.branchsim.core.results.Trace;
import org.branchsim.core.study.Variant;

/**
 * The folder one shard of a study writes: everything a merge needs, at full precision, so that the merged
 * folder equals the one an unsharded run writes.
 * <ul>
 * <li>{@value #MANIFEST}: the format tag, K and N, the study's definition ({@link StudyDefinition}) and one row
 * per variant of the shard: its global 0-based index, its values, its error (null when it ran) and its
 * metrics in summary.csv column order, each metric the exact double (JSON numbers round-trip Java doubles;
 * values that are not finite are written as text).</li>
 * <li>{@value #OVERLAYS} (sweeps only): the overlay signals of every variant that ran, in SI, one line per
 * sample: {@code variant,t [s],<signal> [<SI unit>]...}, numbers in Java's shortest exact decimal form.</li>
 * </ul>
 */
final class ShardFolder {

    /** The manifest's name. */
    static final String MANIFEST = "shard.json";
    /** The overlay samples' file name. */
    static final String OVERLAYS = "overlays.csv";
    /** The format tag the manifest starts with. */
    static final String FORMAT = "branchsim study shard, format 1";

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /**
     * What a shard folder holds.
     *
     * @param folder the folder
     * @param shard which shard of how many
     * @param study the study's definition
     * @param studyJson the definition as written (for comparing shards field by field)
     * @param rows the shard's variants in index order (overlay traces attached for sweeps)
     */
    record Content(Path folder, Shard shard, StudyDefinition study, ObjectNode studyJson, List<StudyTable.Row> rows) {
    }

    private ShardFolder() {
    }

    /**
     * Writes a shard's results into the (uncommitted) output folder.
     *
     * @param out the output folder
     * @param shard which shard of how many
     * @param study the study's definition
     * @param rows the shard's variants, in index order
     */
    static void write(OutputFolder out, Shard shard, StudyDefinition study, List<StudyTable.Row> rows) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("shard", shard.k());
        root.put("shards", shard.n());
        root.set("study", study.toJson());
        ArrayNode list = root.putArray("rows");
        for (StudyTable.Row r : rows) {
            ObjectNode row = list.addObject();
            row.put("variant", r.variant().index());
            ObjectNode values = row.putObject("values");
            r.variant().values().forEach((path, v) -> {
                if (v instanceof Double d) {
                    ShardJson.put(values, path, d);
                } else {
                    values.put(path, String.valueOf(v));
                }
            });
            row.put("error", r.error());
            ObjectNode metrics = row.putObject("metrics");
            r.metrics().forEach((name, v) -> ShardJson.put(metrics, name, v));
        }
        out.write(MANIFEST, p -> MAPPER.writeValue(p.toFile(), root));
        if (study instanceof SweepDefinition s && !s.overlay().isEmpty()) {
            out.write(OVERLAYS, p -> writeOverlays(p, s.overlay(), rows));
        }
    }

    private static String overlayHeader(List<Trace.Column> columns) {
        return "variant,t [s]," + columns.stream().map(c -> c.name() + " [" + c.dimension().siSymbol() + "]")
                .collect(Collectors.joining(","));
    }

    private static void writeOverlays(Path file, List<Trace.Column> columns, List<StudyTable.Row> rows)
            throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(overlayHeader(columns));
            w.write('\n');
            StringBuilder line = new StringBuilder();
            for (StudyTable.Row r : rows) {
                Trace t = r.overlay();
                if (!r.ok() || t == null) {
                    continue;
                }
                for (int k = 0; k < t.size(); k++) {
                    line.setLength(0);
                    line.append(r.variant().index()).append(',').append(Double.toString(t.time(k)));
                    for (int i = 0; i < columns.size(); i++) {
                        line.append(',').append(Double.toString(t.value(k, i)));
                    }
                    w.append(line).append('\n');
                }
            }
        }
    }

    /**
     * Reads and checks a shard folder: its manifest is complete, its rows are exactly the variants the
     * split gives this shard, with the values the definition gives them, and every variant that ran has its
     * overlay samples.
     *
     * @param folder a folder written by sweep or tolerance --shard
     * @return its content
     * @throws org.branchsim.core.error.BranchsimException BAD_ARGUMENT naming the folder, what was expected
     *         and what was found
     */
    static Content read(Path folder) {
        ShardJson reader = new ShardJson(folder);
        if (!Files.isDirectory(folder)) {
            throw reader.bad("the folder", "a folder", Files.exists(folder) ? "a file that is not a folder" : "nothing there");
        }
        Path manifest = folder.resolve(MANIFEST);
        if (!Files.isRegularFile(manifest)) {
            throw reader.bad("the folder", "a folder holding " + MANIFEST, "none (an unsharded study's or another "
                    + "command's output?)");
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(manifest.toFile());
        } catch (JacksonException e) {
            throw reader.bad(MANIFEST, "JSON", e.getOriginalMessage());
        } catch (IOException e) {
            throw reader.bad(MANIFEST, "a readable file", String.valueOf(e.getMessage()));
        }
        reader = new ShardJson(manifest);
        if (root == null || !root.isObject()) {
            throw reader.bad("the file", "a JSON object", root == null ? "nothing" : root.getNodeType().toString());
        }
        if (!FORMAT.equals(root.path("format").asText(null))) {
            throw reader.bad("\"format\"", "\"" + FORMAT + "\"", String.valueOf(root.get("format")));
        }
        int n = (int) reader.whole(root, "shards", 1, OptionChecks.MAX_VARIANTS);
        int k = (int) reader.whole(root, "shard", 1, n);
        Shard shard = new Shard(k, n);
        ObjectNode studyJson = reader.object(root, "study");
        StudyDefinition study = StudyDefinition.fromJson(studyJson, reader);
        List<StudyTable.Row> rows = rows(reader.array(root, "rows"), reader, study);
        checkIndices(reader, shard, study, rows);
        if (study instanceof SweepDefinition s && !s.overlay().isEmpty()) {
            rows = withOverlays(folder.resolve(OVERLAYS), s.overlay(), rows);
        }
        return new Content(folder, shard, study, studyJson, rows);
    }

    private static List<StudyTable.Row> rows(JsonNode list, ShardJson reader, StudyDefinition study) {
        List<Variant> expected = study.allVariants();
        List<StudyTable.Row> rows = new ArrayList<>();
        for (JsonNode row : list) {
            int index = (int) reader.whole(row, "variant", 0, study.variants() - 1L);
            Map<String, Object> values = new LinkedHashMap<>();
            for (Map.Entry<String, JsonNode> e : reader.object(row, "values").properties()) {
                JsonNode v = e.getValue();
                values.put(e.getKey(), v.isTextual() ? v.asText() : (Object) reader.number(v, e.getKey()));
            }
            Map<String, String> asText = new LinkedHashMap<>();
            values.forEach((p, v) -> asText.put(p, String.valueOf(v)));
            Map<String, String> defined = new LinkedHashMap<>();
            expected.get(index).values().forEach((p, v) -> defined.put(p, String.valueOf(v)));
            if (!asText.equals(defined) || !List.copyOf(asText.keySet()).equals(List.copyOf(defined.keySet()))) {
                throw reader.bad("variant " + index, "the values the study's definition gives it " + defined,
                        asText.toString());
            }
            String error = reader.optionalText(row, "error");
            Map<String, Double> metrics = new LinkedHashMap<>();
            for (Map.Entry<String, JsonNode> e : reader.object(row, "metrics").properties()) {
                metrics.put(e.getKey(), reader.number(e.getValue(), e.getKey()));
            }
            if (error != null && !metrics.isEmpty()) {
                throw reader.bad("variant " + index, "no metrics for a variant that failed", metrics.size() + " metrics");
            }
            rows.add(new StudyTable.Row(new Variant(index, values), error, metrics, null));
        }
        return rows;
    }

    private static void checkIndices(ShardJson reader, Shard shard, StudyDefinition study, List<StudyTable.Row> rows) {
        List<Integer> found = rows.stream().map(r -> r.variant().index()).toList();
        List<Integer> expected = new ArrayList<>();
        for (int i = shard.k() - 1; i < study.variants(); i += shard.n()) {
            expected.add(i);
        }
        if (!found.equals(expected)) {
            throw reader.bad("\"rows\"", "the " + expected.size() + " variants of shard " + shard + " of a "
                    + study.variants() + "-variant study, in order: " + abbreviate(expected),
                    found.size() + " variants: " + abbreviate(found));
        }
    }

    private static String abbreviate(List<Integer> indices) {
        String all = indices.stream().map(String::valueOf).collect(Collectors.joining(", "));
        return all.length() > 60 ? all.substring(0, all.lastIndexOf(',', 57)) + ", ..." : all;
    }

    private static List<StudyTable.Row> withOverlays(Path file, List<Trace.Column> columns, List<StudyTable.Row> rows) {
        ShardJson reader = new ShardJson(file);
        if (!Files.isRegularFile(file)) {
            throw reader.bad("the file", "the overlay samples of the shard's variants", "no such file");
        }
        Map<Integer, Trace> traces = new HashMap<>();
        String header = overlayHeader(columns);
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String first = in.readLine();
            if (!header.equals(first)) {
                throw reader.bad("line 1", "the header " + header, String.valueOf(first));
            }
            String line;
            int lineNo = 1;
            double[] values = new double[columns.size()];
            while ((line = in.readLine()) != null) {
                lineNo++;
                String[] f = line.split(",", -1);
                if (f.length != columns.size() + 2) {
                    throw reader.bad("line " + lineNo, (columns.size() + 2) + " fields", f.length + " fields");
                }
                try {
                    int index = Integer.parseInt(f[0]);
                    double t = Double.parseDouble(f[1]);
                    for (int i = 0; i < values.length; i++) {
                        values[i] = Double.parseDouble(f[i + 2]);
                    }
                    traces.computeIfAbsent(index, x -> new Trace(columns)).add(t, values);
                } catch (NumberFormatException e) {
                    throw reader.bad("line " + lineNo, "numbers", line);
                }
            }
        } catch (IOException e) {
            throw reader.bad("the file", "a readable file", String.valueOf(e.getMessage()));
        }
        List<StudyTable.Row> out = new ArrayList<>();
        for (StudyTable.Row r : rows) {
            Trace t = traces.remove(r.variant().index());
            if (r.ok() && t == null) {
                throw reader.bad("variant " + r.variant().index(), "its overlay samples (it ran)", "none");
            }
            if (!r.ok() && t != null) {
                throw reader.bad("variant " + r.variant().index(), "no samples (it failed)", t.size() + " samples");
            }
            out.add(new StudyTable.Row(r.variant(), r.error(), r.metrics(), t));
        }
        if (!traces.isEmpty()) {
            throw reader.bad("variants", "only the shard's variants", "samples of variants " + traces.keySet());
        }
        return out;
    }
}
