package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/**
 * A kind of node a scenario can declare by its {@code "type"}: a lumped volume or a tank, each with its field
 * table and the factory that builds the node. The kinds are {@link #VOLUME} (the default) and {@link #TANK}.
 *
 * @param type the {@code "type"} word
 * @param summary what the kind models
 * @param fields the field table
 * @param factory builds the node from its id and the fields read (called when they were read without problem)
 */
public record NodeKind(String type, String summary, BlockSpec fields, Factory factory) {

    /** Builds a node. */
    @FunctionalInterface
    public interface Factory {
        /** @return the node */
        Node build(String id, Reading fields);
    }

    /** Steel's Young's modulus, Pa (common practice, no source: 200 to 210 GPa are quoted for steels). */
    static final String STEEL_MODULUS = "206 GPa";

    private static final BlockSpec WALL = BlockSpec.of("wall",
            FieldSpec.positive("bulkModulus", Dimension.PRESSURE).meaning("bulk modulus of a hose wall, e.g. \"2.5 GPa\""),
            FieldSpec.positive("innerDiameter", Dimension.LENGTH).meaning("inner diameter of a tube"),
            FieldSpec.positive("thickness", Dimension.LENGTH).meaning("wall thickness of the tube"),
            FieldSpec.positive("modulus", Dimension.PRESSURE).byDefault(STEEL_MODULUS)
                    .meaning("Young's modulus of the tube (steel by default); β_wall = E·t/d"))
            .with(new Choice(List.of(List.of("bulkModulus"), List.of("innerDiameter", "thickness", "modulus")), true,
                    "bulkModulus", "either \"bulkModulus\" (a hose) or \"innerDiameter\", \"thickness\" and "
                    + "\"modulus\" (a tube)", "bulkModulus",
                    "a \"bulkModulus\" (a hose) or an \"innerDiameter\" with a \"thickness\" (a tube)"));

    /** A lumped volume of fluid: the node's pressure is a state. */
    public static final NodeKind VOLUME = new NodeKind("volume", "a lumped volume of lines and ports",
            BlockSpec.of("volume",
                    FieldSpec.positive("volume", Dimension.VOLUME)
                            .meaning("the fluid volume of the lines and ports the node lumps")
                            .tuning(Tuning.scaled(10, CommonFields.members(), Tuning.VOLUME_RANGE,
                                    Tuning.Direction.EITHER, "cm^3", "in^3",
                                    "more volume at {id} (a longer or wider hose, or a small accumulator), %s in all",
                                    "less volume at {id} (shorter or narrower lines), %s in all")),
                    FieldSpec.quantity("pressure", Dimension.PRESSURE).byDefault("0 bar").meaning("pressure at t = 0"),
                    FieldSpec.block("wall", WALL).meaning("wall compliance: `{ \"bulkModulus\": \"2.5 GPa\" }` for a "
                            + "hose, or `{ \"innerDiameter\": \"10 mm\", \"thickness\": \"1.5 mm\" }` for a tube; rigid "
                            + "when left out")),
            NodeKind::volume);

    /** A reservoir at an imposed pressure, which a schedule may change (an ideal pressure source). */
    public static final NodeKind TANK = new NodeKind("tank", "a reservoir at an imposed pressure",
            BlockSpec.of("tank",
                    FieldSpec.quantity("pressure", Dimension.PRESSURE).byDefault("0 bar").schedulable()
                            .meaning("its pressure (a positive value models back-pressure); scheduled, it is an ideal "
                                    + "pressure source (a test bench supply)")),
            (id, r) -> Node.tank(id, r.si("pressure")));

    /** @return the kinds, the default first */
    public static List<NodeKind> all() {
        return List.of(VOLUME, TANK);
    }

    /** @return the kind of that type word, or null */
    public static NodeKind find(String type) {
        return all().stream().filter(k -> k.type().equals(type)).findFirst().orElse(null);
    }

    private static Node volume(String id, Reading r) {
        Reading wall = r.block("wall");
        double beta = Double.POSITIVE_INFINITY;
        if (wall != null) {
            beta = wall.has("bulkModulus") ? wall.si("bulkModulus")
                    : wall.si("modulus") * wall.si("thickness") / wall.si("innerDiameter");
        }
        return Node.volume(id, r.si("volume"), beta, r.si("pressure"));
    }
}
