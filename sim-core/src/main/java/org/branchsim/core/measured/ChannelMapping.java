package org.branchsim.core.measured;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Which circuit signal a measured column records: written {@code "P2 [psi]=clampLine.p"} (the unit is
 * optional when the file's header gives it) or {@code "P2=clampLine.p"}.
 *
 * @param column the column's name, without its unit
 * @param unit the unit given for the column, or null to take the header's
 * @param signal the circuit signal, e.g. {@code clampLine.p}
 */
public record ChannelMapping(String column, String unit, String signal) {

    private static final Pattern FORM = Pattern.compile("^\\s*([^\\[=]+?)\\s*(?:\\[([^\\]]*)\\])?\\s*=\\s*(\\S+)\\s*$");

    /**
     * @param text the mapping as written
     * @return the mapping, or null when the text is not of the form {@code COLUMN [unit]=SIGNAL}
     */
    public static ChannelMapping parse(String text) {
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            return null;
        }
        String unit = m.group(2) == null || m.group(2).isBlank() ? null : m.group(2).strip();
        return new ChannelMapping(m.group(1), unit, m.group(3));
    }
}
