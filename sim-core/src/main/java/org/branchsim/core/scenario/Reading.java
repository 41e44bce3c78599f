package org.branchsim.core.scenario;

import java.util.HashMap;
import java.util.Map;

/**
 * The values read from one scenario object by its {@link BlockSpec}: dimensioned values and numbers in SI
 * (a field left out reads as its default, or NaN when it has none), texts, and nested blocks. A field whose
 * value had a problem reads as NaN (or null); the problem is already recorded with its location. Element
 * factories and checks between fields read from here and report further problems through
 * {@link #refuse}.
 */
public final class Reading {
    private final Fields fields;
    private final int problemsBefore;
    private final Map<String, Double> numbers = new HashMap<>();
    private final Map<String, String> texts = new HashMap<>();
    private final Map<String, Reading> blocks = new HashMap<>();

    Reading(Fields fields) {
        this.fields = fields;
        this.problemsBefore = fields.problems().count();
    }

    void putNumber(String name, double value) {
        numbers.put(name, value);
    }

    void putText(String name, String value) {
        texts.put(name, value);
    }

    void putBlock(String name, Reading value) {
        blocks.put(name, value);
    }

    /**
     * @param name a dimensioned or numeric field
     * @return its value in SI, its default when left out, NaN when it has no default or its value was refused
     */
    public double si(String name) {
        Double v = numbers.get(name);
        return v == null ? Double.NaN : v;
    }

    /** @return the text or word of a field (its default when left out), or null */
    public String text(String name) {
        return texts.get(name);
    }

    /** @return the nested block read from a field, or null when it was left out or is not an object */
    public Reading block(String name) {
        return blocks.get(name);
    }

    /** @return true when the field is written in the file */
    public boolean has(String name) {
        return fields.node().get(name) != null;
    }

    /** @return true when none of the named values is NaN (each was read, or has a default) */
    public boolean valid(String... names) {
        for (String n : names) {
            if (Double.isNaN(si(n))) {
                return false;
            }
        }
        return true;
    }

    /** @return true when no problem was recorded while reading this block, its nested blocks and its checks */
    public boolean ok() {
        return fields.problems().count() == problemsBefore;
    }

    /**
     * Reads a list of blocks (a {@code blockList} field), each checked against its spec; its problems are recorded.
     *
     * @param name the field
     * @param items the spec of one item
     * @return the items read, in order (empty when the field is left out)
     */
    java.util.List<Reading> items(String name, BlockSpec items) {
        java.util.List<Located> list = fields.list(name);
        java.util.List<Reading> out = new java.util.ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            Fields item = Fields.of(list.get(i), fields.path(name) + "[" + i + "]", fields.problems());
            out.add(BlockReader.read(item, items));
            item.finish();
        }
        return out;
    }

    /** @return the value as written, or null when the field is left out */
    public Located raw(String name) {
        return fields.node().get(name);
    }

    /**
     * Records a problem with a field's value: what was expected, and the value as written.
     *
     * @param name the field
     * @param expected what the value should have been, e.g. "a rod diameter smaller than the bore (40 mm)"
     */
    public void refuse(String name, String expected) {
        Located v = raw(name);
        fields.problem(name, expected, v == null ? "none" : v.describe());
        numbers.put(name, Double.NaN);
    }

    /** Records a problem at a field with its own "found" text. */
    public void problem(String name, String expected, String found) {
        fields.problem(name, expected, found);
    }
}
