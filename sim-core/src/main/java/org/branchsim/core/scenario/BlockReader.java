package org.branchsim.core.scenario;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the fields of one scenario object by its {@link BlockSpec}, checking each value as its declaration
 * says (dimension, sign, bounds, plain-number range, words, pattern), deciding the choices among fields, and
 * running the block's checks. Lists and catalogue-driven fields are left to the section readers; they are
 * only marked as known here.
 */
final class BlockReader {

    /** How a choice was decided: the index of the alternative written, or one of these. */
    private static final int NONE_WRITTEN = -1;
    private static final int REFUSED = -2;

    private BlockReader() {
    }

    /**
     * Reads a block; does not report unknown keys (the caller calls {@link Fields#finish()} when the object
     * holds nothing else).
     */
    static Reading read(Fields f, BlockSpec spec) {
        Reading r = new Reading(f);
        Map<Choice, Integer> decided = new HashMap<>();
        for (FieldSpec field : spec.fields()) {
            Choice c = spec.choiceOf(field.name());
            if (c == null) {
                read(f, r, field, field.isRequired());
                continue;
            }
            int chosen = decided.computeIfAbsent(c, k -> decide(f, k));
            if (chosen == REFUSED) {
                f.raw(field.name());
            } else {
                boolean inChosen = chosen >= 0 && c.alternatives().get(chosen).contains(field.name());
                read(f, r, field, inChosen && field.isRequired());
            }
        }
        for (BlockSpec.Check check : spec.checks()) {
            check.apply(r);
        }
        return r;
    }

    private static int decide(Fields f, Choice c) {
        int written = 0;
        int which = NONE_WRITTEN;
        List<List<String>> alternatives = c.alternatives();
        for (int i = 0; i < alternatives.size(); i++) {
            boolean any = false;
            for (String name : alternatives.get(i)) {
                any |= f.has(name);
            }
            if (any) {
                written++;
                which = i;
            }
        }
        if (written > 1) {
            f.problem(c.manyAt(), c.manyExpected(), c.manyFound(written));
            return REFUSED;
        }
        if (written == 0 && c.required()) {
            f.problem(c.noneAt(), c.noneExpected(), "neither");
            return REFUSED;
        }
        return which;
    }

    private static void read(Fields f, Reading r, FieldSpec field, boolean required) {
        String key = field.name();
        switch (field.kind()) {
            case QUANTITY -> r.putNumber(key, quantity(f, field, required));
            case NUMBER -> r.putNumber(key, f.number(key, field.min(), field.max(), field.defaultSi()));
            case TEXT -> r.putText(key, text(f, field, required));
            case CHOICE -> r.putText(key, word(f, field));
            case BLOCK -> {
                Fields sub = f.object(key);
                if (sub == null) {
                    if (required) {
                        f.problem(key, field.block().missingHint(key), "none");
                    }
                } else {
                    r.putBlock(key, read(sub, field.block()));
                    sub.finish();
                }
            }
            default -> f.raw(key);
        }
    }

    private static double quantity(Fields f, FieldSpec field, boolean required) {
        String key = field.name();
        if (!required && !f.has(key)) {
            return field.defaultSi();
        }
        return switch (field.sign()) {
            case POSITIVE -> f.positive(key, field.dimension());
            case NON_NEGATIVE -> f.nonNegative(key, field.dimension());
            default -> f.quantity(key, field.dimension());
        };
    }

    private static String text(Fields f, FieldSpec field, boolean required) {
        String key = field.name();
        String value = required ? f.text(key) : f.text(key, defaultWord(field));
        if (value != null && field.pattern() != null
                && (!value.matches(field.pattern()) || (field.maxLength() > 0 && value.length() > field.maxLength()))) {
            f.problem(key, field.patternText(), field.maxLength() > 0 && value.length() > field.maxLength()
                    ? "a text of " + value.length() + " characters" : "\"" + value + "\"");
        }
        return value;
    }

    private static String word(Fields f, FieldSpec field) {
        String key = field.name();
        String written = f.text(key, defaultWord(field));
        if (written == null) {
            return null;
        }
        String word = field.wordFor(written);
        if (word == null) {
            f.problem(key, field.wordsText(), "\"" + written + "\"");
            return null;
        }
        if (field.words().stream().noneMatch(w -> field.isAnyCase() ? w.word().equalsIgnoreCase(written)
                : w.word().equals(written))) {
            f.note(key, "\"" + written + "\" is the old name of \"" + word + "\"" + field.oldWordReason()
                    + "; it is still accepted in this release and will be refused in the next");
        }
        return word;
    }

    /** @return the default of a text or word field without its quotes, or null */
    private static String defaultWord(FieldSpec field) {
        String d = field.defaultText();
        if (d == null || !field.hasLiteralDefault()) {
            return null;
        }
        return d.length() >= 2 && d.startsWith("\"") && d.endsWith("\"") ? d.substring(1, d.length() - 1) : d;
    }
}
