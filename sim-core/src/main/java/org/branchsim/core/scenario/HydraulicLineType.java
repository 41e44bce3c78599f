package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.HydraulicLine;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.WaveSpeed;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code line} element type: a pipe or hose with friction, inertia, compliance and wave travel. */
final class HydraulicLineType {

    /** Most segments a line may have (each adds two states). */
    static final int MAX_SEGMENTS = 200;

    private static final BlockSpec WALL = BlockSpec.of("wall",
            FieldSpec.positive("bulkModulus", Dimension.PRESSURE)
                    .meaning("hose: the bulk modulus its wall adds in series with the fluid's, e.g. \"0.5 GPa\""),
            FieldSpec.positive("thickness", Dimension.LENGTH).meaning("tube: wall thickness"),
            FieldSpec.positive("modulus", Dimension.PRESSURE).byDefault(NodeKind.STEEL_MODULUS)
                    .meaning("tube: Young's modulus of the wall (steel by default); β_wall = E·t/d (Korteweg)"))
            .with(new Choice(List.of(List.of("bulkModulus"), List.of("thickness", "modulus")), true, "bulkModulus",
                    "either \"bulkModulus\" (a hose) or \"thickness\" and \"modulus\" (a tube)", "bulkModulus",
                    "a \"bulkModulus\" (a hose) or a \"thickness\" (a tube)"));

    static final ElementDescriptor<HydraulicLine> DESCRIPTOR = ElementDescriptor.of("line",
            "pipe or hose: friction, fluid inertia, compliance and wave travel in N lumped segments", List.of("a", "b"),
            BlockSpec.of("line",
                    FieldSpec.positive("length", Dimension.LENGTH).meaning("line length"),
                    FieldSpec.positive("diameter", Dimension.LENGTH).meaning("inner diameter"),
                    FieldSpec.block("wall", WALL).meaning("wall compliance: `{ \"thickness\": \"1.5 mm\" }` for a steel "
                            + "tube, or `{ \"bulkModulus\": \"0.5 GPa\" }` for a hose; rigid when left out"),
                    FieldSpec.number("segments", 1, MAX_SEGMENTS, 1)
                            .meaning("number of lumped segments N (a whole number); 1 is one volume + resistance + "
                                    + "inertance; waves need about 10 or more per wavelength of interest"))
                    .with(HydraulicLineType::wholeSegments),
            HydraulicLineType::build)
            .notes("Signals: `<id>.q.a` (flow in at a), `<id>.q.b` (flow out at b), `<id>.dp` (p_a - p_b). States: "
                    + "`<id>.q` or `<id>.q1` ... `<id>.qN` and `<id>.p1` ... `<id>.p(N-1)`. Docs: docs/theory.md 6.10.");

    private HydraulicLineType() {
    }

    private static void wholeSegments(Reading r) {
        double n = r.si("segments");
        if (!Double.isNaN(n) && n != Math.rint(n)) {
            r.refuse("segments", "a whole number of segments from 1 to " + MAX_SEGMENTS);
        }
    }

    private static HydraulicLine build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        double d = r.si("diameter");
        double wall = Double.POSITIVE_INFINITY;
        Reading w = r.block("wall");
        if (w != null && w.has("bulkModulus")) {
            wall = w.si("bulkModulus");
        } else if (w != null) {
            wall = WaveSpeed.thinWallTubeModulus(w.si("modulus"), w.si("thickness"), d);
        }
        return new HydraulicLine(id, ports.get("a"), ports.get("b"), r.si("length"), d, wall,
                (int) Math.rint(r.si("segments")));
    }
}
