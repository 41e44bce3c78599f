package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.ElementCatalog;
import org.branchsim.core.scenario.FieldPaths;
import org.branchsim.core.scenario.FieldSpec;
import org.branchsim.core.scenario.Located;

/**
 * The address of one value in a scenario document, written with dots. List items of {@code nodes} and
 * {@code elements} are picked by their id: {@code elements.reducer.dampingOrifice.diameter},
 * {@code nodes.clampLine.volume}, {@code fluid.bulkModulus}, {@code solver.relativeTolerance}. A path must
 * name a field the descriptors declare ({@link FieldPaths}): a misspelt field is refused with the place in the
 * file the path stopped at and the fields there, before any value is read or written.
 */
public final class ParameterPath {
    private final String text;
    private final List<String> segments;

    private ParameterPath(String text, List<String> segments) {
        this.text = text;
        this.segments = segments;
    }

    /**
     * @param text dotted path
     * @return the path
     * @throws BranchsimException PARAMETER_PATH_MALFORMED when the text is empty or has empty segments
     */
    public static ParameterPath parse(String text) {
        String[] parts = text.split("\\.", -1);
        List<String> segs = new ArrayList<>();
        for (String p : parts) {
            if (p.isBlank()) {
                throw new BranchsimException(ErrorKey.PARAMETER_PATH_MALFORMED, text);
            }
            segs.add(p.trim());
        }
        return new ParameterPath(text, List.copyOf(segs));
    }

    @Override
    public String toString() {
        return text;
    }

    /**
     * @param root the scenario document
     * @return the declared field this path names, with the node or element it belongs to
     * @throws BranchsimException UNDECLARED_PARAMETER_FIELD, located, when the path names no declared field
     */
    public FieldPaths.Target target(Located root) {
        try {
            return FieldPaths.resolve(segments, root, ElementCatalog.standard());
        } catch (IllegalArgumentException e) {
            throw refused(e.getMessage());
        }
    }

    /**
     * @param root the scenario document
     * @return the declaration of the field this path names (its dimension, bounds, remedy role)
     * @throws BranchsimException UNDECLARED_PARAMETER_FIELD, located, when the path names no declared field
     */
    public FieldSpec field(Located root) {
        return target(root).field();
    }

    /** @return the located value this path names in the document (it must be declared and already written there) */
    public Located find(Located root) {
        target(root);
        return locate(root, false);
    }

    /**
     * Replaces the value this path names with {@code value} (a unit-bearing string or a number). The field
     * itself must already exist, so that a mistyped path is caught instead of adding an unknown field.
     */
    public void set(Located root, Object value) {
        target(root);
        Located.Obj parent = (Located.Obj) locate(root, true);
        String last = segments.get(segments.size() - 1);
        Located old = parent.get(last);
        parent.set(last, new Located.Scalar(value, old.line(), old.column()));
    }

    /**
     * Sets the value, adding the field when its parent object exists but the field does not (an optional
     * field left at its default). The field must be one the descriptors declare.
     */
    public void setOrAdd(Located root, Object value) {
        target(root);
        Located parent = segments.size() == 1 ? root : locateParentAllowingMissingLeaf(root);
        if (!(parent instanceof Located.Obj o)) {
            throw missing(segments.size() - 1, parent);
        }
        String last = segments.get(segments.size() - 1);
        Located old = o.get(last);
        int line = old == null ? o.line() : old.line();
        int col = old == null ? o.column() : old.column();
        o.set(last, new Located.Scalar(value, line, col));
    }

    /** @return true when the document has a value at this path */
    public boolean exists(Located root) {
        try {
            find(root);
            return true;
        } catch (BranchsimException e) {
            return false;
        }
    }

    private Located locateParentAllowingMissingLeaf(Located root) {
        Located here = root;
        for (int i = 0; i < segments.size() - 1; i++) {
            here = step(here, segments.get(i), i);
        }
        return here;
    }

    private Located locate(Located root, boolean parentOfLast) {
        Located here = root;
        int end = parentOfLast ? segments.size() - 1 : segments.size();
        for (int i = 0; i < end; i++) {
            String seg = segments.get(i);
            here = step(here, seg, i);
        }
        if (parentOfLast) {
            String last = segments.get(segments.size() - 1);
            if (!(here instanceof Located.Obj o) || o.get(last) == null) {
                throw missing(segments.size() - 1, here);
            }
        }
        return here;
    }

    private Located step(Located here, String seg, int index) {
        if (here instanceof Located.Obj o) {
            Located next = o.get(seg);
            if (next == null) {
                throw missing(index, here);
            }
            return next;
        }
        if (here instanceof Located.Arr a) {
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s && seg.equals(s.value())) {
                    return item;
                }
            }
            throw missing(index, here);
        }
        throw missing(index, here);
    }

    private BranchsimException missing(int index, Located here) {
        String known = "";
        if (here instanceof Located.Obj o) {
            known = " (there: " + String.join(", ", o.keys()) + ")";
        } else if (here instanceof Located.Arr a) {
            List<String> ids = new ArrayList<>();
            for (Located item : a.items()) {
                if (item instanceof Located.Obj o && o.get("id") instanceof Located.Scalar s) {
                    ids.add(String.valueOf(s.value()));
                }
            }
            known = " (ids there: " + String.join(", ", ids) + ")";
        }
        return new BranchsimException(ErrorKey.UNKNOWN_PARAMETER_PATH, text, segments.get(index), known);
    }

    /** A path that does not name a declared field of the scenario's descriptors, with what is declared there. */
    private BranchsimException refused(String reason) {
        return new BranchsimException(ErrorKey.UNDECLARED_PARAMETER_FIELD, text, reason);
    }
}
