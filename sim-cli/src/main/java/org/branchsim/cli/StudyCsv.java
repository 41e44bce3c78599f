package org.branchsim.cli;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads the CSV text a study wrote (RFC 4180: comma-separated fields, a field in double quotes may hold commas,
 * line breaks and doubled quotes) back into rows of cells, for the tables of report.html.
 */
final class StudyCsv {

    private StudyCsv() {
    }

    /** @return the rows of a CSV text, each a list of its fields unquoted; no row for a trailing line break */
    static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
                continue;
            }
            if (c == '"') {
                quoted = true;
                any = true;
            } else if (c == ',') {
                row.add(field.toString());
                field.setLength(0);
                any = true;
            } else if (c == '\n' || c == '\r') {
                if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                row.add(field.toString());
                rows.add(row);
                row = new ArrayList<>();
                field.setLength(0);
                any = false;
            } else {
                field.append(c);
                any = true;
            }
        }
        if (any) {
            row.add(field.toString());
            rows.add(row);
        }
        return rows;
    }
}
