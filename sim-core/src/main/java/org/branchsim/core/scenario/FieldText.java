package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/** The words the field reference and the JSON Schema use to describe a declared field. */
final class FieldText {

    private FieldText() {
    }

    /** @return what the value is, e.g. "length > 0, 1 um to 2 m", "number 0.05 to 1", "\"metric\" or \"us\"" */
    static String value(FieldSpec f) {
        return switch (f.kind()) {
            case QUANTITY -> {
                FieldBounds.Range b = f.bounds();
                yield f.dimension().humanName() + f.sign().text() + (b == null ? "" : ", " + range(f, b));
            }
            case NUMBER -> f.min() == f.max() ? "number " + Units.plain(f.min())
                    : "number " + Units.plain(f.min()) + " to " + Units.plain(f.max());
            case TEXT -> f.patternText() == null ? "text" : "text: " + f.patternText();
            case CHOICE -> f.wordsText() + (f.isAnyCase() ? ", any case" : "");
            case BLOCK -> "block `" + f.block().title() + "`";
            case BLOCK_LIST -> "list of `" + f.block().title() + "` blocks";
            case TEXT_LIST -> "list of texts";
            case NODE_LIST -> "list of nodes";
            case ELEMENT_LIST -> "list of elements";
            case SCHEDULED_VALUE -> "number, or value with the input's unit";
        };
    }

    /**
     * @return the bounds as the reference shows them: "LOW to HIGH", or "up to HIGH" when the field's own rule
     *         (greater than zero, zero or more) already excludes the negative part of its dimension's row (a
     *         spring preload, a setting: not "≥ 0, -100000 kN to 100000 kN")
     */
    private static String range(FieldSpec f, FieldBounds.Range b) {
        if (f.sign() != FieldSpec.Sign.ANY && b.low() < 0.0) {
            return "up to " + b.highText();
        }
        return b.lowText() + " to " + b.highText();
    }

    /** @return the default as the reference shows it, or a word saying there is none */
    static String defaultValue(FieldSpec f, BlockSpec owner) {
        if (f.defaultText() != null && !f.defaultText().isEmpty()) {
            if (f.defaultText().equals("\"\"")) {
                return "empty";
            }
            return f.hasLiteralDefault() ? "`" + f.defaultText() + "`" : f.defaultText();
        }
        Choice c = owner.choiceOf(f.name());
        if (c != null) {
            return c.required() ? "see below" : "none";
        }
        return f.isRequired() ? "required" : "none";
    }

    /** @return the meaning with the schedule and remedy roles appended */
    static String meaning(FieldSpec f) {
        List<String> parts = new ArrayList<>();
        parts.add(f.meaning());
        if (f.isSchedulable()) {
            parts.add("schedulable as `<id>." + f.name() + "`");
        }
        if (f.tuning() != null) {
            parts.add(tuning(f.tuning(), f.dimension()));
        }
        return String.join("; ", parts.stream().filter(s -> !s.isEmpty()).toList());
    }

    /** @return the remedy role in words, e.g. "remedy candidate: raising it helps damping; searched ×0.3 to ×20" */
    static String tuning(Tuning t, Dimension d) {
        String helps = switch (t.helps()) {
            case RAISE -> "raising it helps damping";
            case LOWER -> "lowering it helps damping";
            case EITHER -> "either way may help damping";
        };
        String range = "searched ×" + Units.plain(t.lowFactor()) + " to ×" + Units.plain(t.highFactor());
        if (t.searchedFromZero()) {
            String unit = t.metricUnit();
            double factor = Units.require(unit).factor();
            range += " (" + Units.plain(t.absoluteLow() / factor) + " to " + Units.plain(t.absoluteHigh() / factor) + " "
                    + unit + " when zero)";
        }
        if (!t.members().isEmpty()) {
            range += ", for " + String.join(", ", t.members().stream().sorted().toList());
        }
        return "remedy candidate: " + helps + "; " + range;
    }

    /** @return a choice in words, e.g. "Exactly one of `diameter` or `area`." */
    static String choice(Choice c) {
        List<String> alternatives = new ArrayList<>();
        for (List<String> a : c.alternatives()) {
            alternatives.add(String.join(" + ", a.stream().map(n -> "`" + n + "`").toList()));
        }
        String list = alternatives.size() == 2 ? alternatives.get(0) + " or " + alternatives.get(1)
                : String.join(", ", alternatives.subList(0, alternatives.size() - 1)) + " or "
                + alternatives.get(alternatives.size() - 1);
        return (c.required() ? "Exactly one of " : "At most one of ") + list
                + (c.required() ? "." : " (none: the defaults apply).");
    }
}
