package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ContainerNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Random;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A fuzz test of our own: a seeded mutator turns the demo scenarios into hostile files (fields deleted and
 * duplicated, types swapped, wrong units, extreme and non-finite numbers, truncated files, deep nesting,
 * other encodings, YAML) and runs {@code check} on most and {@code run} (end time capped) on some. Every
 * case must end with exit code 0, 1 or 2, print no stack trace and no Java class name, name file:line:col
 * in every exit-2 message, write nothing when refused, and take at most {@link #MAX_CASE_SECONDS}.
 * The same seed gives the same cases. With the environment variable {@code BRANCHSIM_FUZZ_LOG} set to a
 * file name, every case's outcome is appended to that file, to read the messages users would see.
 */
class ScenarioFuzzTest {

    /** Seed of the mutator (the number of the issue that asked for it). */
    private static final long SEED = 9L;
    private static final int CHECK_CASES = 400;
    private static final int RUN_CASES = 16;
    /** Longest a single case may take, s (a check takes milliseconds; a capped run well under a second). */
    static final double MAX_CASE_SECONDS = 20.0;
    /** Signs of a Java stack trace or exception leaking to the user. */
    private static final Pattern LEAK = Pattern.compile("\tat |Exception|java\\.lang\\.|java\\.io\\.|com\\.fasterxml");

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final YAMLMapper YAML = new YAMLMapper();
    private static final String[] UNITS = {"bar", "mm", "L/min", "kg", "s", "N", "N/mm", "degC", "rpm",
        "cm^3/rev", "%", "Mbar", "psia", "MM", "furlongs", "PSI", "gpm", "\u00b0F", "kpsi", ""};
    private static final String[] NUMBERS = {"1e308", "-1e308", "1e-320", "0", "-0", "1e999", "-1e999", "NaN",
        "Infinity", "1e-300", "123456789012345678901234567890", "-5", "0.000001", "1e12", ".", "1e"};

    /** One mutated file and the command to run on it. */
    private record Case(String fileName, byte[] bytes, boolean run) {
    }

    private static List<JsonNode> demos() throws IOException {
        List<JsonNode> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(RunCommandTest.SCENARIOS)) {
            for (Path p : s.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                out.add(JSON.readTree(p.toFile()));
            }
        }
        assertTrue(out.size() >= 3, "the demos in scenarios/");
        return out;
    }

    /** A place in the tree: a field of an object or an item of a list. */
    private record Slot(ContainerNode<?> parent, String field, int index) {
        JsonNode get() {
            return parent instanceof ObjectNode o ? o.get(field) : ((ArrayNode) parent).get(index);
        }

        void set(JsonNode value) {
            if (parent instanceof ObjectNode o) {
                o.set(field, value);
            } else {
                ((ArrayNode) parent).set(index, value);
            }
        }

        void remove() {
            if (parent instanceof ObjectNode o) {
                o.remove(field);
            } else {
                ((ArrayNode) parent).remove(index);
            }
        }
    }

    private static void slots(JsonNode node, List<Slot> out) {
        if (node instanceof ObjectNode o) {
            for (Iterator<String> it = o.fieldNames(); it.hasNext(); ) {
                String f = it.next();
                out.add(new Slot(o, f, -1));
                slots(o.get(f), out);
            }
        } else if (node instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                out.add(new Slot(a, null, i));
                slots(a.get(i), out);
            }
        }
    }

    private static Slot anySlot(JsonNode root, Random r) {
        List<Slot> all = new ArrayList<>();
        slots(root, all);
        return all.get(r.nextInt(all.size()));
    }

    /** Mutates the tree in place; returns a description for failure messages. */
    private static String mutateTree(JsonNode root, Random r) {
        Slot s = anySlot(root, r);
        JsonNode v = s.get();
        JsonNodeFactory f = JsonNodeFactory.instance;
        switch (r.nextInt(8)) {
            case 0 -> {
                s.remove();
                return "delete " + s.field();
            }
            case 1 -> {
                JsonNode swapped = v.isTextual() ? f.numberNode(r.nextInt(100)) : v.isNumber() ? f.textNode("x")
                        : v.isObject() ? f.arrayNode() : v.isArray() ? f.objectNode() : f.nullNode();
                s.set(r.nextBoolean() ? swapped : r.nextBoolean() ? f.booleanNode(true) : f.nullNode());
                return "swap type of " + s.field();
            }
            case 2, 3 -> {
                String text = v.isTextual() ? v.asText() : "1";
                String number = text.replaceAll("^\\s*([-+0-9.eE]*).*$", "$1");
                s.set(f.textNode((number.isEmpty() ? "1" : number) + " " + UNITS[r.nextInt(UNITS.length)]));
                return "unit of " + s.field();
            }
            case 4, 5 -> {
                String n = NUMBERS[r.nextInt(NUMBERS.length)];
                if (v.isNumber() || r.nextInt(4) == 0) {
                    s.set(r.nextBoolean() ? f.numberNode(r.nextBoolean() ? 1e308 : -1e-320)
                            : f.numberNode(new BigInteger("9".repeat(1 + r.nextInt(40)))));
                } else {
                    String unit = v.isTextual() ? v.asText().replaceAll("^\\s*[-+0-9.eE]*\\s*", "") : "";
                    s.set(f.textNode(n + (unit.isEmpty() ? "" : " " + unit)));
                }
                return "extreme number in " + s.field();
            }
            case 6 -> {
                JsonNode deep = f.textNode("1 mm");
                int depth = 10 + r.nextInt(120);
                for (int i = 0; i < depth; i++) {
                    deep = r.nextBoolean() ? f.arrayNode().add(deep) : f.objectNode().set("k", deep);
                }
                s.set(deep);
                return "nest " + depth + " deep at " + s.field();
            }
            default -> {
                if (s.parent() instanceof ArrayNode a) {
                    a.add(v.deepCopy());
                    return "duplicate list item";
                }
                ((ObjectNode) s.parent()).set(s.field() + "x", v.deepCopy());
                return "copy field " + s.field();
            }
        }
    }

    /** Byte- and text-level mutations that a tree cannot express. */
    private static byte[] mutateText(String text, Random r) {
        switch (r.nextInt(7)) {
            case 0 -> {
                return text.substring(0, r.nextInt(text.length())).getBytes(StandardCharsets.UTF_8);
            }
            case 1 -> {
                List<String> lines = new ArrayList<>(text.lines().toList());
                int i = r.nextInt(lines.size());
                lines.add(i, lines.get(i));
                return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
            }
            case 2 -> {
                return text.getBytes(r.nextBoolean() ? StandardCharsets.UTF_16 : StandardCharsets.UTF_16LE);
            }
            case 3 -> {
                return text.replaceFirst("\"", "\"\u00b0 ").getBytes(StandardCharsets.ISO_8859_1);
            }
            case 4 -> {
                byte[] b = text.getBytes(StandardCharsets.UTF_8);
                byte[] garbage = new byte[1 + r.nextInt(64)];
                r.nextBytes(garbage);
                int at = r.nextInt(b.length);
                byte[] out = new byte[b.length + garbage.length];
                System.arraycopy(b, 0, out, 0, at);
                System.arraycopy(garbage, 0, out, at, garbage.length);
                System.arraycopy(b, at, out, at + garbage.length, b.length - at);
                return out;
            }
            case 5 -> {
                int depth = 50 + r.nextInt(5000);
                return ("[".repeat(depth) + text + "]".repeat(depth)).getBytes(StandardCharsets.UTF_8);
            }
            default -> {
                return ("\uFEFF" + text).getBytes(StandardCharsets.UTF_8);
            }
        }
    }

    private static void capRun(JsonNode root) {
        if (root instanceof ObjectNode o && o.get("solver") instanceof ObjectNode solver) {
            solver.set("endTime", TextNode.valueOf("20 ms"));
            solver.set("outputInterval", TextNode.valueOf("1 ms"));
            solver.put("maxEvaluations", 200000);
        }
        if (root instanceof ObjectNode o && o.get("outputs") instanceof ObjectNode outputs) {
            outputs.remove("metricsFrom");
            outputs.remove("metricsTo");
        }
    }

    private static List<Case> cases(int count, boolean run, Random r) throws IOException {
        List<JsonNode> demos = demos();
        List<Case> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            JsonNode root = demos.get(r.nextInt(demos.size())).deepCopy();
            int mutations = run ? r.nextInt(2) : 1 + r.nextInt(3);
            for (int k = 0; k < mutations; k++) {
                mutateTree(root, r);
            }
            if (run) {
                capRun(root);
            }
            boolean yaml = r.nextInt(6) == 0;
            String text = yaml ? YAML.writeValueAsString(root) : JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root);
            if (yaml && r.nextInt(3) == 0) {
                text = text.replaceFirst("(?m)^(\\s*\\w+:\\s*)\"[^\"]*\"$", "$1.inf");
            }
            byte[] bytes = !run && r.nextInt(4) == 0 ? mutateText(text, r) : text.getBytes(StandardCharsets.UTF_8);
            out.add(new Case(String.format("case-%03d.%s", i, yaml ? "yaml" : "json"), bytes, run));
        }
        return out;
    }

    /** Runs the cases; returns how many ended with exit codes 0, 1 and 2. */
    private static int[] play(List<Case> cases, Path dir) throws IOException {
        int[] codes = new int[3];
        for (Case c : cases) {
            Path file = dir.resolve(c.fileName());
            Files.write(file, c.bytes());
            Path out = dir.resolve("out-" + c.fileName());
            long t0 = System.nanoTime();
            RunCommandTest.Outcome o = c.run()
                    ? RunCommandTest.run("run", file.toString(), "--out", out.toString())
                    : RunCommandTest.run("check", file.toString());
            double seconds = (System.nanoTime() - t0) * 1e-9;
            String said = o.out() + o.err();
            String what = c.fileName() + " (exit " + o.code() + "): " + said;
            if (System.getenv("BRANCHSIM_FUZZ_LOG") != null) {
                Files.writeString(Path.of(System.getenv("BRANCHSIM_FUZZ_LOG")), what + "\n", StandardCharsets.UTF_8,
                        java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
            }
            assertTrue(o.code() >= 0 && o.code() <= 2, what);
            codes[o.code()]++;
            assertFalse(LEAK.matcher(said).find(), "no stack trace or class name: " + what);
            if (o.code() == 2) {
                assertTrue(Pattern.compile(Pattern.quote(file.toString()) + ":\\d+:\\d+: ").matcher(o.err()).find(),
                        "located: " + what);
            }
            if (o.code() != 0) {
                assertFalse(Files.exists(out), "nothing written: " + what);
            }
            assertTrue(seconds <= MAX_CASE_SECONDS, c.fileName() + " took " + seconds + " s");
            Files.delete(file);
            if (Files.exists(out)) {
                try (Stream<Path> s = Files.walk(out)) {
                    for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                        Files.delete(p);
                    }
                }
            }
            try (Stream<Path> s = Files.list(dir)) {
                assertEquals(List.of(), s.toList(), "no file left behind by " + c.fileName());
            }
        }
        return codes;
    }

    @Test
    void mutatedScenariosAreCheckedOrRefusedWithALocation(@TempDir Path dir) throws IOException {
        int[] codes = play(cases(CHECK_CASES, false, new Random(SEED)), dir);
        assertEquals(0, codes[1], "check never simulates, so it never fails as a simulation");
        assertTrue(codes[2] > CHECK_CASES / 2, "most mutations are refused: " + codes[2]);
        assertTrue(codes[0] > 0, "some mutations are harmless: " + codes[0]);
    }

    @Test
    void mutatedScenariosRunOrAreRefused(@TempDir Path dir) throws IOException {
        int[] codes = play(cases(RUN_CASES, true, new Random(SEED + 1)), dir);
        assertEquals(RUN_CASES, codes[0] + codes[1] + codes[2]);
        assertTrue(codes[0] > 0, "some mutated scenarios still run: " + codes[0]);
    }
}
