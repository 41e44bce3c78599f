package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.elements.CheckValve;
import org.branchsim.core.units.Dimension;

/** The {@code checkValve} element type: a quasi-static check valve. */
final class CheckValveType {

    static final ElementDescriptor<CheckValve> DESCRIPTOR = ElementDescriptor.of("checkValve",
            "quasi-static check valve", List.of("inlet", "outlet"),
            BlockSpec.of("checkValve",
                    FieldSpec.nonNegative("crackingPressure", Dimension.PRESSURE)
                            .meaning("pressure difference at which it starts to open"),
                    FieldSpec.positive("fullOpenAbove", Dimension.PRESSURE).byDefault("2 bar")
                            .meaning("pressure above cracking at which it is fully open"))
                    .plus(CommonFields.openingSize("fully open")).plus(CommonFields.sharpEdgeCd())
                    .with(CommonFields.openingChoice()),
            (id, r, ports, fluid) -> new CheckValve(id, ports.get("inlet"), ports.get("outlet"),
                    r.si("crackingPressure"), r.si("fullOpenAbove"), CommonFields.openingArea(r), r.si("cd")));

    private CheckValveType() {
    }
}
