package org.branchsim.core.scenario;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import java.io.IOException;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.error.Problem;

/**
 * Reads a scenario file (JSON, or YAML when the name ends in .yaml or .yml) into a {@link Located} tree with
 * Jackson's streaming parser, keeping line and column of every value. Every refusal is located: syntax
 * errors and duplicate keys, files that are not UTF-8 text (UTF-16, Latin-1, binary), files beyond
 * {@link #MAX_FILE_BYTES}, strings beyond {@link #MAX_STRING_LENGTH} and nesting beyond
 * {@link #MAX_NESTING_DEPTH} are reported as {@link Problem}s with line and column.
 */
public final class DocumentParser {

    /** Largest scenario file read, bytes (the demos are about 5 kB). */
    public static final long MAX_FILE_BYTES = 2L * 1024 * 1024;
    /** Longest text value, characters. */
    public static final int MAX_STRING_LENGTH = 100_000;
    /** Deepest nesting of objects and lists (a scenario needs about 6). */
    public static final int MAX_NESTING_DEPTH = 64;
    /** Longest number literal, characters. */
    public static final int MAX_NUMBER_LENGTH = 100;

    private static final StreamReadConstraints LIMITS = StreamReadConstraints.builder()
            .maxNestingDepth(MAX_NESTING_DEPTH)
            .maxStringLength(MAX_STRING_LENGTH)
            .maxNumberLength(MAX_NUMBER_LENGTH)
            .build();

    private DocumentParser() {
    }

    /**
     * @param file scenario file
     * @return the document's root
     * @throws BranchsimException SCENARIO_UNREADABLE or SCENARIO_INVALID
     */
    public static Located parse(Path file) {
        String name = file.toString();
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw invalid(name, new Problem(name, 1, 1, "", "a scenario file of at most "
                        + MAX_FILE_BYTES / 1024 + " kB", String.format(Locale.ROOT, "%.1f MB", size / 1e6)));
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, List.of(), null, name, reason(e));
        }
        return parse(name, decode(name, bytes), isYaml(name));
    }

    /** @return a plain reason for a failed read, without Java class names */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? "read error" : e.getMessage();
    }

    /**
     * Decodes a file as UTF-8 (a byte order mark is skipped); refuses, with the line and column of the first
     * offending byte, text in other encodings and binary data.
     */
    static String decode(String name, byte[] bytes) {
        if (bytes.length >= 2 && ((bytes[0] == (byte) 0xFE && bytes[1] == (byte) 0xFF)
                || (bytes[0] == (byte) 0xFF && bytes[1] == (byte) 0xFE))) {
            throw invalid(name, new Problem(name, 1, 1, "", "UTF-8 text",
                    "UTF-16 text (a byte order mark); save the file as UTF-8"));
        }
        int start = bytes.length >= 3 && bytes[0] == (byte) 0xEF && bytes[1] == (byte) 0xBB && bytes[2] == (byte) 0xBF
                ? 3 : 0;
        int nul = -1;
        for (int i = start; i < bytes.length && nul < 0; i++) {
            if (bytes[i] == 0) {
                nul = i;
            }
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult r = decoder.decode(in, out, true);
        int bad = r.isError() ? in.position() : -1;
        if (nul >= 0 && (bad < 0 || nul < bad)) {
            throw notText(name, bytes, start, nul, "a NUL byte (UTF-16 or binary data, not text); save the file as UTF-8");
        }
        if (bad >= 0) {
            throw notText(name, bytes, start, bad, String.format(Locale.ROOT,
                    "byte 0x%02X, which is not UTF-8 (Latin-1, UTF-16 or binary data?); save the file as UTF-8",
                    bytes[bad] & 0xFF));
        }
        decoder.flush(out);
        out.flip();
        return out.toString();
    }

    private static BranchsimException notText(String name, byte[] bytes, int start, int offset, String found) {
        int line = 1;
        int lineStart = start;
        for (int i = start; i < offset; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        String before = new String(bytes, lineStart, offset - lineStart, StandardCharsets.UTF_8);
        int column = before.codePointCount(0, before.length()) + 1;
        return invalid(name, new Problem(name, line, column, "", "UTF-8 text", found));
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
        JsonFactory factory = yaml ? YAMLFactory.builder().streamReadConstraints(LIMITS).build()
                : JsonFactory.builder().streamReadConstraints(LIMITS).build();
        String body = !text.isEmpty() && text.charAt(0) == '\uFEFF' ? text.substring(1) : text;
        JsonParser parser;
        try {
            parser = factory.createParser(new StringReader(body));
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, List.of(), null, fileName, reason(e));
        }
        try (parser) {
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
            throw syntax(fileName, yaml, e, parser);
        } catch (IOException e) {
            JsonLocation at = parser.currentLocation();
            String msg = e.getMessage() == null ? "unreadable content" : firstLine(e.getMessage());
            throw invalid(fileName, new Problem(fileName, Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()),
                    "", "well-formed " + (yaml ? "YAML" : "JSON"), msg));
        }
    }

    private static BranchsimException syntax(String fileName, boolean yaml, JsonProcessingException e, JsonParser p) {
        // a limit is reported at the last token read; its exception may carry the end of the read buffer
        JsonLocation at = e instanceof StreamConstraintsException ? p.currentTokenLocation() : e.getLocation();
        if (at == null || at.getLineNr() < 1) {
            at = p.currentLocation();
        }
        String msg = e.getOriginalMessage() == null ? "unreadable content" : firstLine(e.getOriginalMessage());
        String expected = "well-formed " + (yaml ? "YAML" : "JSON");
        if (e instanceof StreamConstraintsException) {
            msg = msg.replaceAll(",\\s*from\\s*`[^`]*`", "");
            expected += " within branchsim's limits (" + MAX_NESTING_DEPTH + " levels of nesting, texts of "
                    + MAX_STRING_LENGTH + " characters, numbers of " + MAX_NUMBER_LENGTH + " digits)";
        }
        return invalid(fileName, new Problem(fileName, Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()), "",
                expected, msg));
    }

    private static String firstLine(String msg) {
        int cut = msg.indexOf('\n');
        return cut > 0 ? msg.substring(0, cut) : msg;
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
                if (p.getNumberType() == JsonParser.NumberType.BIG_INTEGER) {
                    return new Located.Scalar(p.getDoubleValue(), line, col);
                }
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
