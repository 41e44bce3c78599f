package org.branchsim.core.docs;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads the sections of docs/scenario-format.md that are generated from the code's tables, between an HTML comment
 * marker {@code <!-- NAME:begin ... -->} and {@code <!-- NAME:end -->}, for the tests that keep them up to date.
 */
public final class GeneratedSections {

    /** The scenario format document, seen from a module folder. */
    public static final Path SCENARIO_FORMAT = Path.of("..", "docs", "scenario-format.md");

    private GeneratedSections() {
    }

    /**
     * @param name the section's marker name, e.g. {@code units}
     * @return the text between the line of its begin marker and its end marker
     * @throws IOException when the document cannot be read
     */
    public static String of(String name) throws IOException {
        String text = Files.readString(SCENARIO_FORMAT, StandardCharsets.UTF_8);
        String begin = "<!-- " + name + ":begin";
        String end = "<!-- " + name + ":end";
        int a = text.indexOf(begin);
        int b = text.indexOf(end);
        assertTrue(a >= 0 && b > a, "markers " + begin + " / " + end + " in " + SCENARIO_FORMAT);
        return text.substring(text.indexOf('\n', a) + 1, b);
    }
}
