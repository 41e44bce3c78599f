package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.PilotReliefValve;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code pilotReliefValve} element type: a pilot-operated (two-stage) relief valve. */
final class PilotReliefValveType {

    private static final BlockSpec MAIN = BlockSpec.of("poppet", PoppetBlock.body(
            CommonFields.damping("viscous damping of the main poppet"), PoppetBlock.springRate()))
            .plus(FieldSpec.nonNegative("preload", Dimension.FORCE)
                    .meaning("light main spring's force on the seat; preload / seat area is the pressure difference "
                            + "that lifts the main poppet"));

    private static final BlockSpec DAMPING_ORIFICE = BlockSpec.of("dampingOrifice",
            FieldSpec.positive("diameter", Dimension.LENGTH).meaning("diameter of the damping orifice"),
            CommonFields.sharpEdgeCd());

    private static final BlockSpec PILOT = BlockSpec.of("pilot", PoppetBlock.body(
            CommonFields.damping("viscous damping of the pilot poppet"), PoppetBlock.springRate()));

    static final ElementDescriptor<PilotReliefValve> DESCRIPTOR = ElementDescriptor.of("pilotReliefValve",
            "pilot-operated (two-stage) relief valve", List.of("inlet", "outlet", "drain"),
            BlockSpec.of("pilotReliefValve",
                    FieldSpec.positive("setting", Dimension.PRESSURE)
                            .meaning("the pilot's cracking pressure (pilot preload = setting × pilot seat area)"),
                    FieldSpec.block("poppet", MAIN).required().meaning("main poppet block, below"),
                    FieldSpec.positive("chamberVolume", Dimension.VOLUME)
                            .meaning("spring-chamber volume with the main poppet seated (> seat area × maxLift)"),
                    FieldSpec.block("dampingOrifice", DAMPING_ORIFICE).required()
                            .meaning("orifice from the inlet to the spring chamber, e.g. `{ \"diameter\": \"0.5 mm\" }`"),
                    FieldSpec.block("pilot", PILOT).required().meaning("pilot poppet block, below")),
            PilotReliefValveType::build)
            .notes("The drain port takes the pilot's spill: tie it to the outlet's tank for an internally drained "
                    + "valve. Signals: `<id>.q` (main flow), `<id>.orifice.q`, `<id>.drain.q`, `<id>.chamber.p`, "
                    + "`<id>.poppet.x`, `<id>.poppet.v`, `<id>.pilot.x`, `<id>.pilot.v`. Docs: docs/theory.md 6.11.");

    private PilotReliefValveType() {
    }

    private static PilotReliefValve build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading m = r.block("poppet");
        PoppetGeometry main = PoppetBlock.read(m).withPreload(m.si("preload"));
        double chamber = r.si("chamberVolume");
        double swept = main.seatArea() * main.maxLift();
        if (chamber <= swept) {
            r.refuse("chamberVolume", "more than the main poppet's swept volume (" + Fields.format(swept * 1e6)
                    + " cm^3)");
            return null;
        }
        PoppetGeometry pilotBody = PoppetBlock.read(r.block("pilot"));
        PoppetGeometry pilot = pilotBody.withPreload(r.si("setting") * pilotBody.seatArea());
        Reading orifice = r.block("dampingOrifice");
        return new PilotReliefValve(id, ports.get("inlet"), ports.get("outlet"), ports.get("drain"), main, chamber,
                orifice.si("diameter"), orifice.si("cd"), pilot);
    }
}
