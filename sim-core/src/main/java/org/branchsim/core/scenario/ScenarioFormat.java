package org.branchsim.core.scenario;

/**
 * The top level of a scenario file, declared as data: the head fields ({@code $schema}, {@code formatVersion},
 * {@code name}, {@code description}) and one field per section, each section's block declared by its reader
 * ({@link FluidSection}, {@link NetworkSection}, {@link ScheduleSection}, {@link SolverSection},
 * {@link OutputsSection}). The field reference and the JSON Schema start from {@link #ROOT}.
 */
public final class ScenarioFormat {

    /** Longest scenario name: it names the output folder. */
    static final int MAX_NAME = 100;

    /** The head fields, read before the sections. */
    static final BlockSpec HEAD = BlockSpec.of("scenario",
            FieldSpec.text("$schema").optional()
                    .meaning("the JSON Schema this file follows, for editors (e.g. \"branchsim-scenario.schema.json\"); "
                            + "not read otherwise"),
            FieldSpec.number("formatVersion", 1, 1, 1).meaning("the only version is 1"),
            FieldSpec.text("name").pattern("^[A-Za-z0-9][A-Za-z0-9._-]*$", "a name of at most " + MAX_NAME
                    + " letters, digits, '.', '_' or '-' (it names the output folder)", MAX_NAME)
                    .meaning("names the output folder `out/<name>/`"),
            FieldSpec.text("description").byDefault("").meaning("free text"));

    /** The whole top level. */
    public static final BlockSpec ROOT = HEAD.plus(
            FieldSpec.block("fluid", FluidSection.SPEC).required().meaning("the oil"),
            FieldSpec.special("nodes", FieldSpec.Kind.NODE_LIST).required().minItems(1)
                    .meaning("the nodes (lumped volumes and tanks); at least one volume"),
            FieldSpec.special("elements", FieldSpec.Kind.ELEMENT_LIST).required().minItems(1)
                    .meaning("the elements, each wired to nodes by its ports"),
            FieldSpec.blockList("schedule", ScheduleSection.ITEM).meaning("timed changes of scheduled inputs"),
            FieldSpec.block("solver", SolverSection.SPEC).required().meaning("how to solve"),
            FieldSpec.block("outputs", OutputsSection.SPEC).meaning("how to present the results"));

    private ScenarioFormat() {
    }
}
