package org.branchsim.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/**
 * Writes a trace as CSV: first column {@code t [s]}, then one column per signal headed
 * {@code <name> [<unit>]} in the chosen unit system. Numbers use 7 significant digits and '.' decimals, the text
 * of {@code %.7g} (zero as {@code 0}), written row by row to a buffered stream without per-cell formatting; a
 * long trace is read from its store a chunk at a time, never whole.
 */
public final class TraceCsv {

    /** Characters gathered before they are handed to the writer. */
    private static final int CHUNK = 1 << 16;

    private TraceCsv() {
    }

    /** @return the CSV text (for small traces and tests; files are written with {@link #write}) */
    public static String format(Trace trace, UnitSystem units) {
        StringWriter w = new StringWriter();
        try {
            write(trace, units, w);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }

    /**
     * Writes the CSV to a file, UTF-8, through a buffer.
     *
     * @param trace the trace
     * @param units the unit system of the columns
     * @param target the file
     * @throws IOException when the file cannot be written
     */
    public static void write(Trace trace, UnitSystem units, Path target) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            write(trace, units, w);
        }
    }

    /**
     * Writes the CSV to a stream, a chunk of rows at a time (not flushed or closed).
     *
     * @param trace the trace
     * @param units the unit system of the columns
     * @param w where the text goes
     * @throws IOException when the stream fails
     */
    public static void write(Trace trace, UnitSystem units, Writer w) throws IOException {
        int n = trace.columns().size();
        Unit[] unit = new Unit[n];
        StringBuilder sb = new StringBuilder(CHUNK + 1024);
        sb.append("t [s]");
        for (int i = 0; i < n; i++) {
            Trace.Column c = trace.columns().get(i);
            unit[i] = units.displayUnit(c.dimension());
            sb.append(',').append(c.name()).append(" [").append(unit[i].symbol()).append(']');
        }
        sb.append('\n');
        double[] row = new double[n + 1];
        for (int k = 0; k < trace.size(); k++) {
            trace.row(k, row);
            SignificantDigits.append(sb, row[0]);
            for (int i = 0; i < n; i++) {
                sb.append(',');
                SignificantDigits.append(sb, unit[i].fromSi(row[1 + i]));
            }
            sb.append('\n');
            if (sb.length() >= CHUNK) {
                w.append(sb);
                sb.setLength(0);
            }
        }
        w.append(sb);
    }
}
