package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.elements.Orifice;

/** The {@code orifice} element type: a fixed sharp-edged orifice. */
final class OrificeType {

    static final ElementDescriptor<Orifice> DESCRIPTOR = ElementDescriptor.of("orifice",
            "fixed sharp-edged orifice", List.of("a", "b"),
            BlockSpec.of("orifice", CommonFields.openingSize("orifice")).plus(CommonFields.sharpEdgeCd())
                    .with(CommonFields.openingChoice()),
            (id, r, ports, fluid) -> new Orifice(id, ports.get("a"), ports.get("b"), CommonFields.openingArea(r),
                    r.si("cd")));

    private OrificeType() {
    }
}
