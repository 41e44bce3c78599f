package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.MeteringEdge;
import org.branchsim.core.elements.PilotReducingValve;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/**
 * The {@code pilotReducingValve} element type: a pilot-operated pressure reducing valve. Its remedy candidates
 * are ranked as a fluid-power engineer tries them on a hunting main stage or a chattering pilot (common
 * practice, no source): damp the member that moves, resize its sensing orifice, then the damping orifice, the
 * spring chamber, the metering edge.
 */
final class PilotReducingValveType {

    private static final BlockSpec SPOOL = SpoolBlock.spec(
            CommonFields.damping("viscous damping of the spool")
                    .tuning(Tuning.damping(10, CommonFields.members("spool", "end"), 1.0, 500.0, "main-spool damping",
                            "N*s/m", "lbf*s/in", "a damping land or an end orifice on the main spool, about %s")),
            SpoolBlock.springRate(),
            SpoolBlock.meteringWidth().tuning(Tuning.scaled(70, CommonFields.members("spool", "end"),
                    new double[] {0.25, 1.0}, Tuning.Direction.LOWER, "mm", "in", "a wider metering edge of %s",
                    "metering slots instead of a full edge, %s of metering width")),
            SpoolBlock.endOrificeDiameter().tuning(Tuning.scaled(20, CommonFields.members("end"), Tuning.SIZE_RANGE,
                    Tuning.Direction.LOWER, "mm", "in", "a larger sensing orifice of %s",
                    "a smaller sensing orifice of %s")),
            FieldSpec.nonNegative("springPreload", Dimension.FORCE).meaning("spool spring force on the open stop"),
            CommonFields.restitution("its open and closed stops"));

    private static final BlockSpec DAMPING_ORIFICE = BlockSpec.of("dampingOrifice",
            FieldSpec.positive("diameter", Dimension.LENGTH).meaning("diameter of the damping orifice")
                    .tuning(Tuning.scaled(50, CommonFields.members(), Tuning.SIZE_RANGE, Tuning.Direction.EITHER, "mm",
                            "in", "a larger damping orifice of %s (drilled out)",
                            "a smaller drilled damping orifice of %s")),
            CommonFields.sharpEdgeCd());

    private static final BlockSpec PILOT = BlockSpec.of("pilot", PoppetBlock.body(
            CommonFields.damping("viscous damping of the pilot poppet")
                    .tuning(Tuning.damping(30, CommonFields.members("pilot"), 0.1, 100.0, "pilot damping", "N*s/m",
                            "lbf*s/in", "a damping piston or a tighter guide clearance on the pilot poppet, about %s")),
            PoppetBlock.springRate().tuning(Tuning.scaled(40, CommonFields.members("pilot"), Tuning.SIZE_RANGE,
                    Tuning.Direction.RAISE, "N/mm", "lbf/in",
                    "a stiffer pilot spring of %s (re-set the valve after fitting it)",
                    "a softer pilot spring of %s (re-set the valve after fitting it)"))))
            .plus(CommonFields.restitution("its seat and lift stop"));

    static final ElementDescriptor<PilotReducingValve> DESCRIPTOR = ElementDescriptor.of("pilotReducingValve",
            "pilot-operated pressure reducing valve", List.of("inlet", "outlet", "drain"),
            BlockSpec.of("pilotReducingValve",
                    FieldSpec.positive("setting", Dimension.PRESSURE)
                            .meaning("outlet pressure at small demand with a free drain (the pilot preload is derived, "
                                    + "docs/theory.md 6.5); or give `pilotPreload`"),
                    FieldSpec.positive("pilotPreload", Dimension.FORCE)
                            .meaning("pilot spring force at zero lift; or give `setting`"),
                    FieldSpec.block("spool", SPOOL).required().meaning("main spool block, below"),
                    FieldSpec.positive("chamberVolume", Dimension.VOLUME)
                            .meaning("spring-chamber volume with the spool fully open (> spool area × stroke)")
                            .tuning(Tuning.scaled(60, CommonFields.members(), Tuning.VOLUME_RANGE,
                                    Tuning.Direction.EITHER, "cm^3", "in^3", "a larger spring-chamber volume of %s",
                                    "a smaller spring-chamber volume of %s (a filler sleeve)")),
                    FieldSpec.block("dampingOrifice", DAMPING_ORIFICE).required()
                            .meaning("orifice from the outlet to the spring chamber, e.g. `{ \"diameter\": \"0.7 mm\" }`"),
                    FieldSpec.block("pilot", PILOT).required().meaning("pilot poppet block, below"))
                    .with(Choice.exactlyOne("setting",
                            "exactly one of \"setting\" (outlet pressure at small demand) or \"pilotPreload\"",
                            List.of(List.of("setting"), List.of("pilotPreload")))),
            PilotReducingValveType::build)
            .notes("Signals: `<id>.p.in`, `<id>.p.out`, `<id>.chamber.p`, `<id>.spool.x`, `<id>.spool.v`, `<id>.pilot.x` "
                    + "(poppet lift), `<id>.pilot.v`, `<id>.q` (main flow), `<id>.pilot.q` (damping orifice flow), "
                    + "`<id>.drain.q`, `<id>.metering.area`, `<id>.metering.power`, `<id>.drain.power` (pilot stage and "
                    + "drain), and with an end orifice `<id>.end.p`, `<id>.end.q`.");

    private PilotReducingValveType() {
    }

    private static PilotReducingValve build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading s = r.block("spool");
        MeteringEdge edge = SpoolBlock.edge(s);
        PilotReducingValve.MainStage main = new PilotReducingValve.MainStage(edge, s.si("mass"), s.si("springRate"),
                s.si("springPreload"), s.si("damping"), s.si("stroke"), SpoolBlock.endChamber(s));
        double chamber = r.si("chamberVolume");
        if (chamber <= edge.endArea() * s.si("stroke")) {
            r.refuse("chamberVolume", "more than the spool's swept volume ("
                    + Fields.format(edge.endArea() * s.si("stroke") * 1e6) + " cm^3)");
            return null;
        }
        Reading orifice = r.block("dampingOrifice");
        double od = orifice.si("diameter");
        double ocd = orifice.si("cd");
        PoppetGeometry pilot = PoppetBlock.read(r.block("pilot"));
        double setting;
        double preload;
        if (r.has("setting")) {
            setting = r.si("setting");
            preload = PilotReducingValve.pilotPreloadFor(setting, main, od, ocd, pilot, fluid);
            if (Double.isNaN(preload) || preload <= 0.0) {
                r.refuse("setting", "a setting above the spool spring bias (" + Fields.format(main.springBias() / 1e5)
                        + " bar) that the pilot can hold within its lift");
                return null;
            }
        } else {
            preload = r.si("pilotPreload");
            setting = preload / pilot.seatArea() + main.springBias();
        }
        return new PilotReducingValve(id, ports.get("inlet"), ports.get("outlet"), ports.get("drain"), main, chamber,
                od, ocd, pilot.withPreload(preload), setting)
                .withRestitution(s.si("restitution"), r.block("pilot").si("restitution"));
    }
}
