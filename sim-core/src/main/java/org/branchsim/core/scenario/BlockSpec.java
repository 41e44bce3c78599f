package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * The fields of one kind of scenario object (the fluid block, a node of kind "volume", a spool block, a
 * relief valve), declared once as data: the fields in the order the reference lists them, the choices among
 * them, and the checks that relate fields to each other (a rod thinner than the bore). Immutable.
 *
 * @param title the block's name in the reference and in messages, e.g. "spool"
 * @param fields the fields, in reference order
 * @param choices alternatives among the fields
 * @param checks checks between fields, run after every field was read (each checks only values read
 *        without problem)
 */
public record BlockSpec(String title, List<FieldSpec> fields, List<Choice> choices, List<Check> checks) {

    /** A check between fields of one block, reporting through {@link Reading#refuse}. */
    @FunctionalInterface
    public interface Check {
        /** Checks the values read; records a problem for anything wrong. */
        void apply(Reading reading);
    }

    /** Copies the lists and checks that every choice names fields of the block. */
    public BlockSpec {
        fields = List.copyOf(fields);
        choices = List.copyOf(choices);
        checks = List.copyOf(checks);
        for (Choice c : choices) {
            for (String name : c.fields()) {
                if (fields.stream().noneMatch(f -> f.name().equals(name))) {
                    throw new IllegalArgumentException("choice of block " + title + " names no field " + name);
                }
            }
        }
    }

    /** @return a block with these fields and nothing else */
    public static BlockSpec of(String title, FieldSpec... fields) {
        return new BlockSpec(title, List.of(fields), List.of(), List.of());
    }

    /** @return a copy with one more choice */
    public BlockSpec with(Choice choice) {
        List<Choice> c = new ArrayList<>(choices);
        c.add(choice);
        return new BlockSpec(title, fields, c, checks);
    }

    /** @return a copy with one more check */
    public BlockSpec with(Check check) {
        List<Check> c = new ArrayList<>(checks);
        c.add(check);
        return new BlockSpec(title, fields, choices, c);
    }

    /** @return a copy with more fields at the end */
    public BlockSpec plus(FieldSpec... more) {
        List<FieldSpec> f = new ArrayList<>(fields);
        f.addAll(List.of(more));
        return new BlockSpec(title, f, choices, checks);
    }

    /** @return the field of that name, or null */
    public FieldSpec field(String name) {
        for (FieldSpec f : fields) {
            if (f.name().equals(name)) {
                return f;
            }
        }
        return null;
    }

    /** @return the field names in order */
    public List<String> names() {
        return fields.stream().map(FieldSpec::name).toList();
    }

    /** @return the choice a field belongs to, or null */
    public Choice choiceOf(String field) {
        for (Choice c : choices) {
            if (c.covers(field)) {
                return c;
            }
        }
        return null;
    }

    /**
     * @return what a missing block of this kind is expected to hold, for messages: the fields that must be
     *         written, else the first few, e.g. {@code a "pilot" block (seatDiameter, springRate, mass, maxLift)}
     */
    public String missingHint(String key) {
        List<String> named = new ArrayList<>();
        for (FieldSpec f : fields) {
            if (f.isRequired() && choiceOf(f.name()) == null) {
                named.add(f.name());
            }
        }
        if (named.isEmpty()) {
            fields.stream().limit(3).forEach(f -> named.add(f.name()));
            return "a \"" + key + "\" block (" + String.join(", ", named) + "...)";
        }
        return "a \"" + key + "\" block (" + String.join(", ", named) + ")";
    }
}
