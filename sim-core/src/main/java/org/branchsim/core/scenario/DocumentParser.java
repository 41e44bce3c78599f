package org.branchsim.core.scenario;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.error.Problem;

/**
 * Reads a scenario file (JSON, or YAML when the name ends in .yaml or .yml) into a {@link Located} tree with
 * Jackson's streaming parser, keeping line and column of every value. Syntax errors and duplicate keys are
 * reported as {@link Problem}s with their location.
 */
public final class DocumentParser {

    private DocumentParser() {
    }

    /**
     * @param file scenario file
     * @return the document's root
     * @throws BranchsimException SCENARIO_UNREADABLE or SCENARIO_INVALID
     */
    public static Located parse(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, List.of(), null, file.toString(),
                    e.getClass().getSimpleName().replace("Exception", "") + " " + e.getMessage());
        }
        return parse(file.toString(), text, isYaml(file.toString()));
    }

    /** @return true when the file name asks for YAML */
    public static boolean isYaml(String name) {
        String n = name.toLowerCase(java.util.Locale.ROOT);
        return n.endsWith(".yaml") || n.endsWith(".yml");
    }

    /**
     * @param fileName name used in messages
     * @param text document text
     * @param yaml true for YAML, false for JSON
     * @return the document's root
     */
    public static Located parse(String fileName, String text, boolean yaml) {
        JsonFactory factory = yaml ? new YAMLFactory() : new JsonFactory();
        try (Reader reader = new StringReader(text); JsonParser parser = factory.createParser(reader)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw invalid(fileName, new Problem(fileName, 1, 1, "", "a scenario object", "an empty file"));
            }
            Located root = value(fileName, parser);
            JsonToken trailing = parser.nextToken();
            if (trailing != null) {
                JsonLocation at = parser.currentTokenLocation();
                throw invalid(fileName, new Problem(fileName, at.getLineNr(), at.getColumnNr(), "",
                        "the end of the document", "more content (" + trailing.asString() + ")"));
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            String msg = e.getOriginalMessage();
            int cut = msg.indexOf('\n');
            if (cut > 0) {
                msg = msg.substring(0, cut);
            }
            throw invalid(fileName, new Problem(fileName, at == null ? 0 : at.getLineNr(),
                    at == null ? 0 : at.getColumnNr(), "", "well-formed " + (yaml ? "YAML" : "JSON"), msg));
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, List.of(), null, fileName, e.getMessage());
        }
    }

    private static BranchsimException invalid(String fileName, Problem p) {
        return new BranchsimException(ErrorKey.SCENARIO_INVALID, List.of(p), null, fileName, 1);
    }

    private static Located value(String fileName, JsonParser p) throws IOException {
        JsonLocation at = p.currentTokenLocation();
        int line = at.getLineNr();
        int col = at.getColumnNr();
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT: {
                Located.Obj obj = new Located.Obj(line, col);
                while (p.nextToken() != JsonToken.END_OBJECT) {
                    String key = p.currentName();
                    JsonLocation keyAt = p.currentTokenLocation();
                    if (obj.get(key) != null) {
                        throw invalid(fileName, new Problem(fileName, keyAt.getLineNr(), keyAt.getColumnNr(), key,
                                "each key once in an object", "a second \"" + key + "\""));
                    }
                    p.nextToken();
                    obj.put(key, value(fileName, p), keyAt.getLineNr(), keyAt.getColumnNr());
                }
                return obj;
            }
            case START_ARRAY: {
                Located.Arr arr = new Located.Arr(line, col);
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    arr.add(value(fileName, p));
                }
                return arr;
            }
            case VALUE_STRING:
                return new Located.Scalar(p.getText(), line, col);
            case VALUE_NUMBER_INT:
                return new Located.Scalar(p.getLongValue(), line, col);
            case VALUE_NUMBER_FLOAT:
                return new Located.Scalar(p.getDoubleValue(), line, col);
            case VALUE_TRUE:
                return new Located.Scalar(Boolean.TRUE, line, col);
            case VALUE_FALSE:
                return new Located.Scalar(Boolean.FALSE, line, col);
            case VALUE_NULL:
                return new Located.Scalar(null, line, col);
            default:
                throw invalid(fileName, new Problem(fileName, line, col, "", "a value", t.asString()));
        }
    }
}
