package org.branchsim.core.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;

/**
 * One element type a scenario can use, declared as data: its {@code "type"} name, a one-line summary, its
 * ports, the table of its fields ({@link BlockSpec}), the factory that calls the element's constructor with
 * the values read, and the scheduled input behind each schedulable field. Adding an element to branchsim is
 * one element class, one descriptor in {@link ElementCatalog}, and its law tests: the reader, the parameter
 * paths, the remedy candidates, the field reference and the JSON Schema follow from the descriptor.
 *
 * @param <E> the element class
 */
public final class ElementDescriptor<E extends Element> {

    /**
     * Builds the element from the values read. Called only when every field was read without problem; may
     * still refuse values that only the element's physics can judge, through {@link Reading#refuse}.
     *
     * @param <E> the element class
     */
    @FunctionalInterface
    public interface Factory<E extends Element> {
        /**
         * @param id element id
         * @param fields the element's fields, read and checked
         * @param ports the node of each port by port name (all present, except while the wiring has a problem)
         * @param fluid the scenario's fluid
         * @return the element, or null after recording a problem
         */
        E build(String id, Reading fields, Map<String, Node> ports, Fluid fluid);
    }

    private final String type;
    private final String summary;
    private final List<String> ports;
    private final BlockSpec fields;
    private final Factory<E> factory;
    private final Map<String, Function<E, ScheduledInput>> inputs;
    private final List<String> oldNames;
    private final String notes;

    private ElementDescriptor(String type, String summary, List<String> ports, BlockSpec fields, Factory<E> factory,
                              Map<String, Function<E, ScheduledInput>> inputs, List<String> oldNames, String notes) {
        this.type = type;
        this.summary = summary;
        this.ports = List.copyOf(ports);
        this.fields = fields;
        this.factory = factory;
        this.inputs = inputs;
        this.oldNames = List.copyOf(oldNames);
        this.notes = notes;
    }

    /**
     * @param type the {@code "type"} name in scenario files
     * @param summary what it models, in a few words, e.g. "fixed-displacement pump"
     * @param ports port names in order
     * @param fields the field table
     * @param factory builds the element
     * @param <E> the element class
     * @return a descriptor without schedulable fields, old names or notes
     */
    public static <E extends Element> ElementDescriptor<E> of(String type, String summary, List<String> ports,
                                                              BlockSpec fields, Factory<E> factory) {
        ElementDescriptor<E> d = new ElementDescriptor<>(type, summary, ports, fields, factory, Map.of(), List.of(), "");
        d.checkInputs();
        return d;
    }

    /**
     * @param field a schedulable field of the table
     * @param input the element's scheduled input the field starts
     * @return a copy where a schedule can change the field as {@code <id>.<field>}
     */
    public ElementDescriptor<E> input(String field, Function<E, ScheduledInput> input) {
        Map<String, Function<E, ScheduledInput>> m = new LinkedHashMap<>(inputs);
        m.put(field, input);
        ElementDescriptor<E> d = new ElementDescriptor<>(type, summary, ports, fields, factory, m, oldNames, notes);
        d.checkInputs();
        return d;
    }

    /** @return a copy that also accepts old type names, with a located note */
    public ElementDescriptor<E> oldNames(String... names) {
        return new ElementDescriptor<>(type, summary, ports, fields, factory, inputs, List.of(names), notes);
    }

    /** @return a copy with Markdown notes for the field reference (signals, history) */
    public ElementDescriptor<E> notes(String markdown) {
        return new ElementDescriptor<>(type, summary, ports, fields, factory, inputs, oldNames, markdown);
    }

    /** Each scheduled input names a schedulable field of the table; the complete check runs in the catalogue. */
    private void checkInputs() {
        for (String name : inputs.keySet()) {
            FieldSpec f = fields.field(name);
            if (f == null || !f.isSchedulable()) {
                throw new IllegalArgumentException(type + ": input " + name + " is not a schedulable field");
            }
        }
    }

    /** @return true when every schedulable field has its input */
    boolean complete() {
        return fields.fields().stream().filter(FieldSpec::isSchedulable).allMatch(f -> inputs.containsKey(f.name()));
    }

    /** @return the {@code "type"} name */
    public String type() {
        return type;
    }

    /** @return what the type models, in a few words */
    public String summary() {
        return summary;
    }

    /** @return port names in order */
    public List<String> ports() {
        return ports;
    }

    /** @return the field table */
    public BlockSpec fields() {
        return fields;
    }

    /** @return old type names still accepted */
    public List<String> oldNames() {
        return oldNames;
    }

    /** @return Markdown notes for the field reference, or "" */
    public String notes() {
        return notes;
    }

    /**
     * Builds the element and collects its scheduled inputs by field name.
     *
     * @return the element with its inputs, or null when the factory refused a value
     */
    Built build(String id, Reading r, Map<String, Node> nodes, Fluid fluid) {
        E e = factory.build(id, r, nodes, fluid);
        if (e == null) {
            return null;
        }
        Map<String, ScheduledInput> in = new LinkedHashMap<>();
        for (Map.Entry<String, Function<E, ScheduledInput>> entry : inputs.entrySet()) {
            in.put(entry.getKey(), entry.getValue().apply(e));
        }
        return new Built(e, in);
    }

    /**
     * An element just built, with the scheduled input of each schedulable field.
     *
     * @param element the element
     * @param inputs its inputs by field name
     */
    record Built(Element element, Map<String, ScheduledInput> inputs) {
    }
}
