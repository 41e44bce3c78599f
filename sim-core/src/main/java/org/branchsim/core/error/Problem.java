package org.branchsim.core.error;

/**
 * One problem found in a scenario file: where it is (file, line, column, field path), what was expected
 * and what was found. Line and column are 1-based; 0 means "not known".
 */
public record Problem(String file, int line, int column, String path, String expected, String found) {

    /** @return a one-line human-readable description, e.g. {@code demo.json:12:17: nodes[0].volume: expected ..., found ...}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(file);
        if (line > 0) {
            sb.append(':').append(line).append(':').append(column);
        }
        sb.append(": ");
        if (path != null && !path.isEmpty()) {
            sb.append(path).append(": ");
        }
        sb.append("expected ").append(expected).append(", found ").append(found);
        return sb.toString();
    }
}
