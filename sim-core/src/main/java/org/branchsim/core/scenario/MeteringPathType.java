package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.elements.MeteringPath;

/** The {@code meteringPath} element type: one metering path of a directional valve (P to A, B to T). */
final class MeteringPathType {

    static final ElementDescriptor<MeteringPath> DESCRIPTOR = ElementDescriptor.of("meteringPath",
            "a directional valve's metering path (P→A, B→T)", List.of("a", "b"),
            BlockSpec.of("meteringPath", CommonFields.openingSize("fully open")).plus(CommonFields.sharpEdgeCd(),
                    FieldSpec.number("opening", 0.0, 1.0, 0.0).schedulable()
                            .meaning("opening at t = 0, from 0 (closed) to 1 (fully open)"))
                    .with(CommonFields.openingChoice()),
            (id, r, ports, fluid) -> new MeteringPath(id, ports.get("a"), ports.get("b"),
                    CommonFields.openingArea(r), r.si("cd"), r.si("opening")))
            .input("opening", MeteringPath::opening)
            .oldNames("valveEdge")
            .notes("Called `valveEdge` before this release; the old name is still accepted, with a note, and will be "
                    + "refused in the next release.");

    private MeteringPathType() {
    }
}
