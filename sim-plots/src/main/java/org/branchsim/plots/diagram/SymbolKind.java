package org.branchsim.plots.diagram;

import java.util.List;
import java.util.Locale;

/**
 * The kinds of element a circuit diagram draws, each with its ports in the order the element lists them and the
 * name of the sim-core element class it stands for. Accumulator and line have symbols before sim-core has
 * elements of those kinds; an element class none of these names is drawn as a {@link #GENERIC} envelope.
 */
public enum SymbolKind {
    /** Fixed-displacement pump. */
    PUMP("Pump", List.of("inlet", "outlet")),
    /** Variable-displacement pump with a pressure compensator. */
    COMPENSATED_PUMP("CompensatedPump", List.of("inlet", "outlet")),
    /** Direct-acting relief valve. */
    RELIEF_VALVE("ReliefValve", List.of("inlet", "outlet")),
    /** Pilot-operated relief valve (external drain of the pilot stage). */
    PILOT_RELIEF_VALVE("PilotReliefValve", List.of("inlet", "outlet", "drain")),
    /** Direct-acting pressure reducing valve (external drain). */
    DIRECT_REDUCING_VALVE("DirectReducingValve", List.of("inlet", "outlet", "drain")),
    /** Pilot-operated pressure reducing valve (external drain). */
    PILOT_REDUCING_VALVE("PilotReducingValve", List.of("inlet", "outlet", "drain")),
    /** One metering path of a directional valve. */
    DIRECTIONAL_PATH("MeteringPath", List.of("a", "b")),
    /** Check valve. */
    CHECK_VALVE("CheckValve", List.of("inlet", "outlet")),
    /** Fixed orifice. */
    ORIFICE("Orifice", List.of("a", "b")),
    /** Double-acting single-rod cylinder. */
    CYLINDER("Cylinder", List.of("capEnd", "rodEnd")),
    /** Fixed-displacement motor. */
    MOTOR("Motor", List.of("a", "b")),
    /** Gas-loaded accumulator. */
    ACCUMULATOR("Accumulator", List.of("port")),
    /** Hydraulic line (pipe or hose) with its own dynamics. */
    LINE("HydraulicLine", List.of("a", "b")),
    /** An element of a kind without a symbol of its own: a plain envelope. */
    GENERIC("", List.of());

    private final String elementClass;
    private final List<String> ports;

    SymbolKind(String elementClass, List<String> ports) {
        this.elementClass = elementClass;
        this.ports = ports;
    }

    /** @return the port names, in the order the element lists its nodes (empty for {@link #GENERIC}) */
    public List<String> ports() {
        return ports;
    }

    /** @return whether the symbol is a pump, a source of the layout's layers */
    public boolean supply() {
        return this == PUMP || this == COMPENSATED_PUMP;
    }

    /** @return whether the symbol is an actuator, drawn in the top row */
    public boolean actuator() {
        return this == CYLINDER || this == MOTOR;
    }

    /** @return the kind of an element by the simple name of its class, {@link #GENERIC} when none matches */
    public static SymbolKind ofClass(String simpleName) {
        for (SymbolKind k : values()) {
            if (!k.elementClass.isEmpty() && k.elementClass.equals(simpleName)) {
                return k;
            }
        }
        return GENERIC;
    }

    /** @return a lower-case label for the kind, e.g. "pilot reducing valve" */
    public String label() {
        return name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
