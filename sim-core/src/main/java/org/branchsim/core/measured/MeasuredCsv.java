package org.branchsim.core.measured;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.Units;

/**
 * Reads the text of a data-logger CSV file. Lines starting with {@code #} and blank lines are skipped. The
 * first other line is the header; its first column is the time: {@code t [s]}, {@code time [ms]} (any unit of
 * time), or a name without a unit, whose values are then ISO-8601 timestamps ({@code 2026-11-30T10:15:02.125Z},
 * or without zone, read as UTC; a space may replace the {@code T}). Every other column is a channel written
 * {@code NAME [unit]}; a channel without a unit in the header takes the unit given for it (from the command
 * line's mapping), else it is refused. Fields are separated by commas, or by semicolons or tabs when the header
 * has no comma. Numbers use a decimal point. Times must increase strictly.
 * <p>
 * Every mistake is reported as {@link ErrorKey#MEASURED_FILE_INVALID} with the file, line and column (1-based,
 * the column counted in characters), the column's name, what was expected and what was found.
 */
public final class MeasuredCsv {

    private static final Pattern NAME_AND_UNIT = Pattern.compile("^\\s*(.*?)\\s*(?:\\[(.*)\\])?\\s*$");
    private static final String TIME = "time";

    private MeasuredCsv() {
    }

    /**
     * @param fileName name for messages
     * @param text the file's text
     * @param unitsByColumn units of columns whose header has none, by column name (may be empty)
     * @return the file's channels with times in s and values in SI
     * @throws BranchsimException MEASURED_FILE_INVALID, located, on any mistake
     */
    public static MeasuredFile read(String fileName, String text, Map<String, String> unitsByColumn) {
        String[] lines = text.split("\r?\n|\r", -1);
        int headerLine = -1;
        for (int i = 0; i < lines.length; i++) {
            String l = lines[i].strip();
            if (!l.isEmpty() && !l.startsWith("#")) {
                headerLine = i;
                break;
            }
        }
        if (headerLine < 0) {
            throw bad(fileName, 1, 1, TIME, "a header line such as \"t [s],P2 [bar]\"", "no header (the file is empty)");
        }
        String header = lines[headerLine];
        char sep = header.indexOf(',') >= 0 ? ',' : header.indexOf(';') >= 0 ? ';' : '\t';
        List<Field> heads = split(header, sep);
        int width = heads.size();
        if (width < 2) {
            throw bad(fileName, headerLine + 1, 1, heads.get(0).text.strip(),
                    "a time column and at least one channel separated by commas", "one column");
        }
        Field timeHead = heads.get(0);
        Matcher tm = nameAndUnit(timeHead.text);
        String timeName = tm.group(1);
        Unit timeUnit = null;
        if (tm.group(2) != null) {
            timeUnit = Units.find(tm.group(2).strip());
            if (timeUnit == null || timeUnit.dimension() != Dimension.TIME) {
                throw bad(fileName, headerLine + 1, timeHead.column, timeName, "a time unit such as s or ms "
                        + "(or no unit for ISO timestamps)", "\"" + tm.group(2).strip() + "\"");
            }
        }
        String[] names = new String[width];
        Unit[] units = new Unit[width];
        for (int c = 1; c < width; c++) {
            Field h = heads.get(c);
            Matcher m = nameAndUnit(h.text);
            names[c] = m.group(1);
            if (names[c].isEmpty()) {
                throw bad(fileName, headerLine + 1, h.column, "(column " + (c + 1) + ")", "a channel name such as "
                        + "\"P2 [bar]\"", "an empty name");
            }
            for (int k = 1; k < c; k++) {
                if (names[k].equals(names[c])) {
                    throw bad(fileName, headerLine + 1, h.column, names[c], "each channel name once",
                            "it again (also column " + (k + 1) + ")");
                }
            }
            String given = unitsByColumn.get(names[c]);
            if (m.group(2) != null && given != null && Units.find(given) != Units.find(m.group(2).strip())) {
                throw bad(fileName, headerLine + 1, h.column, names[c], "the unit given for it (" + given + ")",
                        "\"" + m.group(2).strip() + "\" in the header");
            }
            String symbol = m.group(2) != null ? m.group(2).strip() : given;
            if (symbol == null) {
                throw bad(fileName, headerLine + 1, h.column, names[c], "a unit in the header, e.g. \"" + names[c]
                        + " [bar]\", or one given with --map \"" + names[c] + " [bar]=SIGNAL\"", "no unit");
            }
            units[c] = Units.find(symbol);
            if (units[c] == null) {
                throw bad(fileName, headerLine + 1, h.column, names[c], "a known unit such as bar, psi, MPa, L/min, mm",
                        "\"" + symbol + "\"");
            }
        }
        List<double[]> rows = new ArrayList<>();
        double previous = Double.NEGATIVE_INFINITY;
        for (int i = headerLine + 1; i < lines.length; i++) {
            String l = lines[i];
            if (l.isBlank() || l.strip().startsWith("#")) {
                continue;
            }
            List<Field> fields = split(l, sep);
            if (fields.size() != width) {
                int col = fields.size() < width ? l.length() + 1 : fields.get(width).column;
                String column = fields.size() < width ? names[fields.size()] : "(column " + (width + 1) + ")";
                throw bad(fileName, i + 1, col, column, width + " fields as in the header",
                        fields.size() + " field(s)");
            }
            double[] row = new double[width];
            Field tf = fields.get(0);
            row[0] = timeUnit != null ? number(fileName, i + 1, tf, timeName, "a time in " + timeUnit.symbol())
                    * timeUnit.factor() : timestamp(fileName, i + 1, tf, timeName);
            if (!(row[0] > previous)) {
                throw bad(fileName, i + 1, tf.column, timeName, "a time after the previous row's",
                        "\"" + tf.text.strip() + "\" (time does not increase)");
            }
            previous = row[0];
            for (int c = 1; c < width; c++) {
                row[c] = units[c].toSi(number(fileName, i + 1, fields.get(c), names[c],
                        "a number in " + units[c].symbol()));
            }
            rows.add(row);
        }
        if (rows.size() < 2) {
            throw bad(fileName, headerLine + 2, 1, timeName, "at least two rows of samples below the header",
                    rows.size() + " row(s)");
        }
        double[] t = new double[rows.size()];
        for (int k = 0; k < t.length; k++) {
            t[k] = rows.get(k)[0];
        }
        List<MeasuredChannel> channels = new ArrayList<>();
        for (int c = 1; c < width; c++) {
            double[] v = new double[rows.size()];
            for (int k = 0; k < v.length; k++) {
                v[k] = rows.get(k)[c];
            }
            channels.add(new MeasuredChannel(fileName, names[c], units[c], t, v));
        }
        return new MeasuredFile(fileName, channels, timeUnit == null);
    }

    private static Matcher nameAndUnit(String text) {
        Matcher m = NAME_AND_UNIT.matcher(text);
        if (!m.matches()) {
            throw new IllegalStateException("the name pattern matches any text: " + text);
        }
        return m;
    }

    private static double number(String file, int line, Field f, String column, String expected) {
        String s = f.text.strip();
        try {
            double x = Double.parseDouble(s);
            if (Double.isFinite(x) && !s.endsWith("d") && !s.endsWith("D") && !s.endsWith("f") && !s.endsWith("F")) {
                return x;
            }
        } catch (NumberFormatException e) {
            // refused below
        }
        throw bad(file, line, f.column, column, expected, s.isEmpty() ? "an empty field" : "\"" + s + "\"");
    }

    private static double timestamp(String file, int line, Field f, String column) {
        String s = f.text.strip();
        try {
            Instant i;
            if (s.endsWith("Z") || s.matches(".*[+-]\\d\\d:\\d\\d$")) {
                i = java.time.OffsetDateTime.parse(s.replace(' ', 'T')).toInstant();
            } else {
                i = LocalDateTime.parse(s.replace(' ', 'T')).toInstant(ZoneOffset.UTC);
            }
            return i.getEpochSecond() + i.getNano() * 1e-9;
        } catch (DateTimeParseException e) {
            throw bad(file, line, f.column, column, "an ISO timestamp such as 2026-11-30T10:15:02.125Z (the time "
                    + "header has no unit), or a unit in the header such as \"t [s]\"", "\"" + s + "\"");
        }
    }

    private record Field(String text, int column) {
    }

    private static List<Field> split(String line, char sep) {
        List<Field> out = new ArrayList<>();
        int start = 0;
        for (int i = 0; i <= line.length(); i++) {
            if (i == line.length() || line.charAt(i) == sep) {
                String raw = line.substring(start, i);
                String unquoted = raw.strip();
                if (unquoted.length() >= 2 && unquoted.startsWith("\"") && unquoted.endsWith("\"")) {
                    unquoted = unquoted.substring(1, unquoted.length() - 1);
                }
                out.add(new Field(unquoted, start + 1));
                start = i + 1;
            }
        }
        return out;
    }

    private static BranchsimException bad(String file, int line, int column, String name, String expected,
                                          String found) {
        return new BranchsimException(ErrorKey.MEASURED_FILE_INVALID, file, Integer.toString(line),
                Integer.toString(column), name, expected, found);
    }
}
