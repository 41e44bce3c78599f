package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code branchsim schema} writes the JSON Schema shipped in docs/, a draft 2020-12 schema (its "$schema" names
 * the dialect's URI, json-schema.org draft 2020-12), to standard output or to a file, and refuses an output
 * path it cannot use with exit code 2.
 */
class SchemaCommandTest {

    private static final Path SHIPPED = Path.of("..", "docs", "branchsim-scenario.schema.json");

    @Test
    void writesTheShippedSchemaToStandardOutput() throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("schema");
        assertEquals(0, o.code(), o.err());
        assertEquals(Files.readString(SHIPPED, StandardCharsets.UTF_8), o.out());
        JsonNode schema = new ObjectMapper().readTree(o.out());
        assertEquals("https://json-schema.org/draft/2020-12/schema", schema.get("$schema").asText());
        assertFalse(schema.get("additionalProperties").asBoolean(true));
    }

    @Test
    void writesTheSchemaToAFile(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("scenario.schema.json");
        Files.writeString(file, "old");
        RunCommandTest.Outcome o = RunCommandTest.run("schema", "--out", file.toString());
        assertEquals(0, o.code(), o.err());
        assertEquals(Files.readString(SHIPPED, StandardCharsets.UTF_8), Files.readString(file, StandardCharsets.UTF_8));
        try (var listing = Files.list(dir)) {
            assertEquals(1, listing.count(), "no temporary file left behind");
        }
    }

    @Test
    void refusesAnOutputItCannotUse(@TempDir Path dir) {
        RunCommandTest.Outcome noFolder = RunCommandTest.run("schema", "--out", dir.resolve("missing/x.json").toString());
        assertEquals(2, noFolder.code(), noFolder.err());
        assertTrue(noFolder.err().contains("--out: expected a file in an existing folder"), noFolder.err());
        RunCommandTest.Outcome folder = RunCommandTest.run("schema", "--out", dir.toString());
        assertEquals(2, folder.code(), folder.err());
        assertTrue(folder.err().contains("--out: expected a file name"), folder.err());
    }
}
