package org.branchsim.core.scenario;

import java.util.List;

/**
 * The field reference of docs/scenario-format.md, written from the descriptors: one table per section, node
 * kind, element type and nested block, with each field's value (dimension, sign, bounds), default, meaning,
 * schedule and remedy roles, and the choices among fields. A test keeps the document equal to this text.
 */
public final class FieldReference {

    private FieldReference() {
    }

    /** @return the reference of the standard element types, as Markdown */
    public static String markdown() {
        return markdown(ElementCatalog.standard());
    }

    /** @return the reference of a catalogue's element types, as Markdown */
    public static String markdown(ElementCatalog catalog) {
        StringBuilder sb = new StringBuilder();
        sb.append("## Top level\n");
        table(sb, ScenarioFormat.ROOT, "", false);
        sb.append("\nUnknown fields anywhere are errors (they are usually typing mistakes). Editors can check and "
                + "complete files with the JSON Schema `docs/" + ScenarioSchema.FILE_NAME + "` (written by "
                + "`branchsim schema`), named in the file as `\"$schema\"`.\n");

        section(sb, "fluid", FluidSection.SPEC, "");

        sb.append("\n## `nodes`\nEach node is an object with an `id` (a letter, then letters, digits, `_`, `-`; unique "
                + "across nodes and elements) and a `type` (default `\"" + NodeKind.VOLUME.type() + "\"`). Every node "
                + "must be connected to at least one element port.\n");
        for (NodeKind k : NodeKind.all()) {
            sb.append("\n### `").append(k.type()).append("` — ").append(k.summary()).append('\n');
            table(sb, k.fields(), "`" + k.type() + "` node", true);
        }

        sb.append("\n## `elements`\nEach element has `id`, `type`, `ports` (an object naming the node of each port) and "
                + "the fields of its type. A field whose default says \"required\" must be written; \"see below\" "
                + "marks fields of which exactly one way must be written.\n");
        for (ElementDescriptor<?> d : catalog.types()) {
            sb.append("\n### `").append(d.type()).append("` — ").append(d.summary()).append("; ports ")
                    .append(String.join(", ", d.ports().stream().map(p -> "`" + p + "`").toList())).append('\n');
            table(sb, d.fields(), "`" + d.type() + "`", true);
            if (!d.notes().isEmpty()) {
                sb.append('\n').append(d.notes()).append('\n');
            }
        }

        sb.append("\n## `schedule`\nA list of changes, each `{ \"at\": \"1.2 s\", \"set\": \"<element>.<input>\", \"to\": "
                + "<value>, \"over\": \"50 ms\" }`: from time `at`, the input moves from its current value to `to` in "
                + "`over`, linearly or along an S-curve (`\"shape\": \"s-curve\"`, cubic smoothstep); or "
                + "`{ \"set\": ..., \"table\": [ { \"t\": \"0 s\", \"value\": ... }, ... ] }`, values against time "
                + "joined by straight lines. Changes of one input must not overlap. Every corner is an event for the "
                + "solver.\n");
        table(sb, ScheduleSection.ITEM, "`schedule`", true);

        section(sb, "solver", SolverSection.SPEC, "");
        section(sb, "outputs", OutputsSection.SPEC, "");
        return sb.toString();
    }

    private static void section(StringBuilder sb, String name, BlockSpec spec, String intro) {
        sb.append("\n## `").append(name).append("`\n").append(intro);
        table(sb, spec, "`" + name + "`", true);
    }

    /** Writes a block's table, its choices, then the tables of its nested blocks. */
    private static void table(StringBuilder sb, BlockSpec spec, String owner, boolean nested) {
        sb.append("\n| field | value | default | meaning |\n|---|---|---|---|\n");
        for (FieldSpec f : spec.fields()) {
            sb.append("| `").append(f.name()).append("` | ").append(FieldText.value(f)).append(" | ")
                    .append(FieldText.defaultValue(f, spec)).append(" | ").append(FieldText.meaning(f)).append(" |\n");
        }
        List<Choice> choices = spec.choices();
        if (!choices.isEmpty()) {
            sb.append('\n');
            choices.forEach(c -> sb.append(FieldText.choice(c)).append('\n'));
        }
        if (!nested) {
            return;
        }
        for (FieldSpec f : spec.fields()) {
            if (f.kind() == FieldSpec.Kind.BLOCK || f.kind() == FieldSpec.Kind.BLOCK_LIST) {
                String label = "`" + f.name() + "`" + (f.kind() == FieldSpec.Kind.BLOCK_LIST ? " items" : " block");
                sb.append("\n#### ").append(label).append(" of ").append(owner).append('\n');
                table(sb, f.block(), owner + " › `" + f.name() + "`", true);
            }
        }
    }
}
