package org.branchsim.core.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.error.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files the parser cannot read are refused with a line and column: the encodings are checked against the
 * byte patterns of RFC 3629 (UTF-8) and RFC 2781 (UTF-16 and its byte order mark).
 */
class DocumentParserTest {

    private static Problem refusal(Path file) {
        BranchsimException e = assertThrows(BranchsimException.class, () -> DocumentParser.parse(file));
        assertEquals(ErrorKey.SCENARIO_INVALID, e.key(), e.fullReport());
        assertEquals(1, e.problems().size());
        Problem p = e.problems().get(0);
        assertTrue(p.line() >= 1 && p.column() >= 1, p.describe());
        assertTrue(p.describe().startsWith(file + ":" + p.line() + ":" + p.column() + ": "), p.describe());
        return p;
    }

    private static Problem refusal(String text, boolean yaml) {
        BranchsimException e = assertThrows(BranchsimException.class, () -> DocumentParser.parse("x", text, yaml));
        Problem p = e.problems().get(0);
        assertTrue(p.line() >= 1 && p.column() >= 1, p.describe());
        return p;
    }

    @Test
    void utf16WithAndWithoutByteOrderMarkIsRefusedAtTheStart(@TempDir Path dir) throws IOException {
        Path bom = dir.resolve("bom.json");
        Files.write(bom, "{\"name\": \"x\"}".getBytes(StandardCharsets.UTF_16));
        Problem p = refusal(bom);
        assertEquals(1, p.line());
        assertEquals(1, p.column());
        assertTrue(p.found().contains("UTF-16"), p.describe());
        Path le = dir.resolve("le.json");
        Files.write(le, "{\"name\": \"x\"}".getBytes(StandardCharsets.UTF_16LE));
        Problem q = refusal(le);
        // "{" then its zero high byte: the NUL is the second byte
        assertEquals(2, q.column(), q.describe());
        assertTrue(q.found().contains("NUL"), q.describe());
    }

    @Test
    void latin1IsRefusedAtItsFirstNonUtf8Byte(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("latin1.json");
        // 0xB0 (degree sign in ISO 8859-1) is a continuation byte and cannot start a UTF-8 sequence (RFC 3629)
        Files.write(f, "{\n  \"t\": \"40 \u00b0C\"}".getBytes(StandardCharsets.ISO_8859_1));
        Problem p = refusal(f);
        assertEquals(2, p.line());
        assertEquals(12, p.column(), p.describe());
        assertTrue(p.found().contains("0xB0"), p.describe());
    }

    @Test
    void binaryGarbageIsRefusedAtItsFirstByte(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("garbage.json");
        Files.write(f, new byte[] {(byte) 0xC3, (byte) 0x28, 0x41, 0x42});
        Problem p = refusal(f);
        assertEquals(1, p.column(), p.describe());
        assertTrue(p.expected().contains("UTF-8"), p.describe());
    }

    @Test
    void aUtf8ByteOrderMarkIsSkipped(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("bom8.json");
        Files.write(f, ("\uFEFF" + ScenarioProblemsTest.minimal()).getBytes(StandardCharsets.UTF_8));
        assertTrue(DocumentParser.parse(f) instanceof Located.Obj);
    }

    @Test
    void parserLimitsAreLocated() {
        Problem deep = refusal("[".repeat(1000) + "]".repeat(1000), false);
        assertTrue(deep.found().contains("nesting depth"), deep.describe());
        // the bracket that opens level 65 of "[[[[...", in column 65
        assertEquals(DocumentParser.MAX_NESTING_DEPTH + 1, deep.column(), deep.describe());
        Problem deepYaml = refusal("a: " + "[".repeat(1000) + "]".repeat(1000), true);
        assertTrue(deepYaml.found().contains("nesting depth"), deepYaml.describe());
        Problem text = refusal("{\n \"a\": \"" + "x".repeat(DocumentParser.MAX_STRING_LENGTH + 1) + "\"}", false);
        assertEquals(2, text.line(), text.describe());
        assertTrue(text.found().contains("String value length"), text.describe());
        Problem number = refusal("{\"a\": 1" + "0".repeat(500) + "}", false);
        assertTrue(number.found().contains("Number value length"), number.describe());
    }

    @Test
    void anOversizedFileIsRefusedWithoutReadingIt(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("big.json");
        Files.write(f, new byte[(int) DocumentParser.MAX_FILE_BYTES + 1]);
        Problem p = refusal(f);
        assertTrue(p.expected().contains("at most 2048 kB"), p.describe());
    }

    @Test
    void aMissingFileIsNamedWithoutJavaClassNames() {
        BranchsimException e = assertThrows(BranchsimException.class,
                () -> DocumentParser.parse(Path.of("no-such-dir", "missing.json")));
        assertEquals(ErrorKey.SCENARIO_UNREADABLE, e.key());
        assertTrue(e.getMessage().endsWith("no such file"), e.getMessage());
        assertFalse(e.getMessage().contains("Exception") || e.getMessage().contains("NoSuchFile"), e.getMessage());
    }
}
