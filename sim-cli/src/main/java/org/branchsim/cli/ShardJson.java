package org.branchsim.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;

/**
 * Reads the fields of a shard folder's {@value ShardFolder#MANIFEST}, refusing a missing or mistyped field
 * with a message that names the file, the field, what was expected and what was found (exit code 2: a shard
 * folder is the merge command's input). Numbers keep their full double precision; a metric that is not
 * finite is written as the text "NaN", "Infinity" or "-Infinity" (JSON has no such numbers).
 */
final class ShardJson {

    private final Path file;

    /** @param file the file being read, for messages */
    ShardJson(Path file) {
        this.file = file;
    }

    /** @return the field, which must be present and not null */
    JsonNode field(JsonNode parent, String name) {
        JsonNode v = parent == null ? null : parent.get(name);
        if (v == null || v.isNull()) {
            throw bad("\"" + name + "\"", "a value", "none");
        }
        return v;
    }

    /** @return a text field */
    String text(JsonNode parent, String name) {
        JsonNode v = field(parent, name);
        if (!v.isTextual()) {
            throw bad("\"" + name + "\"", "text", v.toString());
        }
        return v.asText();
    }

    /** @return a text field, or null when it is absent or null */
    String optionalText(JsonNode parent, String name) {
        JsonNode v = parent.get(name);
        return v == null || v.isNull() ? null : text(parent, name);
    }

    /** @return a whole-number field within [min, max] */
    long whole(JsonNode parent, String name, long min, long max) {
        JsonNode v = field(parent, name);
        if (!v.isIntegralNumber() || !v.canConvertToLong() || v.asLong() < min || v.asLong() > max) {
            throw bad("\"" + name + "\"", "a whole number from " + min + " to " + max, v.toString());
        }
        return v.asLong();
    }

    /** @return a true/false field */
    boolean flag(JsonNode parent, String name) {
        JsonNode v = field(parent, name);
        if (!v.isBoolean()) {
            throw bad("\"" + name + "\"", "true or false", v.toString());
        }
        return v.asBoolean();
    }

    /** @return an array field */
    JsonNode array(JsonNode parent, String name) {
        JsonNode v = field(parent, name);
        if (!v.isArray()) {
            throw bad("\"" + name + "\"", "a list", v.getNodeType().toString().toLowerCase(java.util.Locale.ROOT));
        }
        return v;
    }

    /** @return an object field */
    ObjectNode object(JsonNode parent, String name) {
        JsonNode v = field(parent, name);
        if (!(v instanceof ObjectNode o)) {
            throw bad("\"" + name + "\"", "an object", v.getNodeType().toString().toLowerCase(java.util.Locale.ROOT));
        }
        return o;
    }

    /** @return a double written by {@link #put(ObjectNode, String, double)} */
    double number(JsonNode v, String name) {
        if (v != null && v.isNumber()) {
            return v.doubleValue();
        }
        if (v != null && v.isTextual() && v.asText().matches("NaN|-?Infinity")) {
            return Double.parseDouble(v.asText());
        }
        throw bad("\"" + name + "\"", "a number", String.valueOf(v));
    }

    /** Writes a double exactly: a JSON number when finite, else its Java text. */
    static void put(ObjectNode node, String name, double value) {
        if (Double.isFinite(value)) {
            node.put(name, value);
        } else {
            node.put(name, Double.toString(value));
        }
    }

    /**
     * @param where the field or part of the file
     * @param expected what a shard folder holds there
     * @param found what was found
     * @return the refusal (exit code 2)
     */
    BranchsimException bad(String where, String expected, String found) {
        String shown = found.length() > 80 ? found.substring(0, 77) + "..." : found;
        return new BranchsimException(ErrorKey.SHARD_FOLDER_REFUSED, file + ", " + where,
                expected + " (as written by sweep or tolerance --shard)", shown);
    }
}
