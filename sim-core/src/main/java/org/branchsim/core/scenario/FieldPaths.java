package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * Resolves a dotted parameter path of a scenario ({@code elements.reducer.dampingOrifice.diameter},
 * {@code nodes.clampLine.volume}, {@code fluid.bulkModulus}) to the field it names in the descriptors: list
 * items of {@code nodes} and {@code elements} are picked by id and read by their kind's or type's table. A
 * path that names no declared field is refused with the place in the file it stopped at.
 */
public final class FieldPaths {

    private FieldPaths() {
    }

    /**
     * The field a path names.
     *
     * @param field the declared field
     * @param ownerId the id of the node or element the path goes through, or null for a section field
     * @param ownerType the node kind's or element type's name, or null for a section field
     * @param relative the path below the node or element (below the top level for a section field)
     */
    public record Target(FieldSpec field, String ownerId, String ownerType, String relative) {
    }

    /**
     * @param segments the path's names
     * @param document the scenario document (ids and types are looked up there)
     * @param catalog the element types
     * @return the field the path names
     * @throws IllegalArgumentException with a located reason when the path names no declared field
     */
    public static Target resolve(List<String> segments, Located document, ElementCatalog catalog) {
        BlockSpec block = ScenarioFormat.ROOT;
        String where = "the top level of the scenario";
        Located here = document;
        String ownerId = null;
        String ownerType = null;
        int ownerEnd = 0;
        for (int i = 0; i < segments.size(); i++) {
            String seg = segments.get(i);
            FieldSpec f = block.field(seg);
            if (f == null) {
                throw new IllegalArgumentException("no \"" + seg + "\" in " + where + at(here) + "; its fields: "
                        + String.join(", ", block.names()));
            }
            Located next = here instanceof Located.Obj o ? o.get(seg) : null;
            boolean last = i == segments.size() - 1;
            switch (f.kind()) {
                case BLOCK -> {
                    if (last) {
                        throw new IllegalArgumentException("\"" + seg + "\" in " + where + " is a block, not a value; its "
                                + "fields: " + String.join(", ", f.block().names()));
                    }
                    block = f.block();
                    where = "the \"" + seg + "\" block" + (ownerId == null ? "" : " of " + ownerType + " \"" + ownerId
                            + "\"");
                    here = next;
                }
                case NODE_LIST, ELEMENT_LIST -> {
                    if (last) {
                        throw new IllegalArgumentException("\"" + seg + "\" is a list; name an id and a field, e.g. "
                                + seg + ".<id>.<field>");
                    }
                    String id = segments.get(++i);
                    Located.Obj item = item(next, id);
                    if (item == null) {
                        throw new IllegalArgumentException("no \"" + id + "\" in the scenario (ids there: "
                                + String.join(", ", ids(next)) + ")");
                    }
                    boolean nodes = f.kind() == FieldSpec.Kind.NODE_LIST;
                    String type = item.get("type") instanceof Located.Scalar s && s.value() instanceof String t ? t
                            : nodes ? NodeKind.VOLUME.type() : null;
                    if (nodes) {
                        NodeKind kind = type == null ? null : NodeKind.find(type);
                        if (kind == null) {
                            throw new IllegalArgumentException("node \"" + id + "\"" + at(item) + " is of no known kind");
                        }
                        block = kind.fields();
                    } else {
                        String renamed = type == null ? null : catalog.renamed(type);
                        ElementDescriptor<?> d = type == null ? null
                                : catalog.find(renamed == null ? type : renamed);
                        if (d == null) {
                            throw new IllegalArgumentException("element \"" + id + "\"" + at(item)
                                    + " is of no known type");
                        }
                        block = d.fields();
                        type = d.type();
                    }
                    ownerId = id;
                    ownerType = type;
                    ownerEnd = i + 1;
                    where = type + " \"" + id + "\"";
                    here = item;
                    if (i == segments.size() - 1) {
                        throw new IllegalArgumentException("\"" + seg + "." + id + "\" is " + (nodes ? "a node" : "an element")
                                + ", not a value; its fields: " + String.join(", ", block.names()));
                    }
                }
                case BLOCK_LIST, TEXT_LIST -> throw new IllegalArgumentException("\"" + seg + "\" in " + where
                        + " is a list whose items have no id; it cannot be varied by path");
                default -> {
                    if (!last) {
                        throw new IllegalArgumentException("\"" + seg + "\" in " + where + " is a value with no fields "
                                + "below it");
                    }
                    return new Target(f, ownerId, ownerType, String.join(".", segments.subList(ownerEnd, segments.size())));
                }
            }
        }
        throw new IllegalArgumentException("an empty path");
    }

    private static String at(Located here) {
        return here == null ? "" : " (line " + here.line() + ", column " + here.column() + ")";
    }

    private static Located.Obj item(Located list, String id) {
        if (list instanceof Located.Arr a) {
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s && id.equals(s.value())) {
                    return o;
                }
            }
        }
        return null;
    }

    private static List<String> ids(Located list) {
        List<String> out = new ArrayList<>();
        if (list instanceof Located.Arr a) {
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s) {
                    out.add(String.valueOf(s.value()));
                }
            }
        }
        return out;
    }
}
