package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * The element types a scenario can use, each by its {@link ElementDescriptor}. Immutable: {@link #with}
 * returns a catalogue with one more type (a test's toy element), so the standard catalogue shared by every
 * reader never changes.
 */
public final class ElementCatalog {

    private static final ElementCatalog STANDARD = new ElementCatalog(List.of(
            PumpType.DESCRIPTOR,
            OrificeType.DESCRIPTOR,
            MeteringPathType.DESCRIPTOR,
            CheckValveType.DESCRIPTOR,
            ReliefValveType.DESCRIPTOR,
            CylinderType.DESCRIPTOR,
            PilotReducingValveType.DESCRIPTOR,
            DirectReducingValveType.DESCRIPTOR,
            MotorType.DESCRIPTOR,
            AccumulatorType.DESCRIPTOR,
            HydraulicLineType.DESCRIPTOR,
            PilotReliefValveType.DESCRIPTOR,
            CompensatedPumpType.DESCRIPTOR));

    private final List<ElementDescriptor<?>> types;

    private ElementCatalog(List<ElementDescriptor<?>> types) {
        this.types = List.copyOf(types);
        List<String> seen = new ArrayList<>();
        for (ElementDescriptor<?> d : types) {
            List<String> names = new ArrayList<>(d.oldNames());
            names.add(d.type());
            for (String n : names) {
                if (seen.contains(n)) {
                    throw new IllegalArgumentException("element type name used twice: " + n);
                }
                seen.add(n);
            }
            if (!d.complete()) {
                throw new IllegalArgumentException(d.type() + ": a schedulable field has no scheduled input");
            }
        }
    }

    /** @return the element types branchsim ships */
    public static ElementCatalog standard() {
        return STANDARD;
    }

    /** @return a catalogue with one more type */
    public ElementCatalog with(ElementDescriptor<?> type) {
        List<ElementDescriptor<?>> more = new ArrayList<>(types);
        more.add(type);
        return new ElementCatalog(more);
    }

    /** @return the types in reference order */
    public List<ElementDescriptor<?>> types() {
        return types;
    }

    /** @return the type of that name (not an old name), or null */
    public ElementDescriptor<?> find(String type) {
        for (ElementDescriptor<?> d : types) {
            if (d.type().equals(type)) {
                return d;
            }
        }
        return null;
    }

    /** @return the current name of an old type name, or null when the name is not an old one */
    public String renamed(String oldName) {
        for (ElementDescriptor<?> d : types) {
            if (d.oldNames().contains(oldName)) {
                return d.type();
            }
        }
        return null;
    }

    /** @return the type names for messages, e.g. "pump, orifice, ..." */
    public String names() {
        return String.join(", ", types.stream().map(ElementDescriptor::type).toList());
    }
}
