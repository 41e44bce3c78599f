package org.branchsim.core.scenario;

import java.util.Map;
import org.branchsim.core.elements.DirectReducingValve;
import org.branchsim.core.elements.MeteringEdge;
import org.branchsim.core.elements.PilotReducingValve;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.SpoolEndChamber;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** Reads the two reducing-valve element types. Field lists are in docs/scenario-format.md. */
final class ReducingValveReaders {

    private static final double SPOOL_CD = 0.7;
    /** Default dead volume of the spool end chamber, m^3 (0.5 cm^3). */
    private static final double DEFAULT_END_VOLUME = 0.5e-6;
    private ReducingValveReaders() {
    }

    /** One spool block: metering geometry plus mass, spring rate, damping and stroke. */
    private record Spool(MeteringEdge edge, double mass, double springRate, double damping, double stroke,
                         SpoolEndChamber endChamber, Fields fields) {
    }

    private static Spool readSpool(Fields parent) {
        Fields f = parent.object("spool");
        if (f == null) {
            parent.problem("spool", "a \"spool\" block (diameter, openLength, stroke, mass, springRate...)", "none");
            return null;
        }
        double d = f.positive("diameter", Dimension.LENGTH);
        double width = f.positive("meteringWidth", Dimension.LENGTH, Geometry.ok(d) ? Math.PI * d : Double.NaN);
        double open = f.positive("openLength", Dimension.LENGTH);
        double stroke = f.positive("stroke", Dimension.LENGTH);
        if (Geometry.ok(open, stroke) && stroke <= open) {
            f.problem("stroke", "a stroke longer than openLength (the spool must be able to close)",
                    f.raw("stroke").describe());
            stroke = Double.NaN;
        }
        double notchLength = f.nonNegative("notchLength", Dimension.LENGTH, 0.0);
        double notchArea = f.nonNegative("notchArea", Dimension.AREA, 0.0);
        double mass = f.positive("mass", Dimension.MASS);
        double rate = f.nonNegative("springRate", Dimension.STIFFNESS);
        double damping = f.nonNegative("damping", Dimension.DAMPING, 0.0);
        double cd = f.number("cd", 0.05, 1.0, SPOOL_CD);
        SpoolEndChamber end = null;
        Fields e = f.object("endOrifice");
        boolean endOk = true;
        if (e != null) {
            double ed = e.positive("diameter", Dimension.LENGTH);
            double ecd = e.number("cd", 0.05, 1.0, ElementTypes.SHARP_EDGE_CD);
            double ev = e.positive("chamberVolume", Dimension.VOLUME, DEFAULT_END_VOLUME);
            e.finish();
            endOk = Geometry.ok(ed, ecd, ev);
            end = endOk ? new SpoolEndChamber(ev, ed, ecd) : null;
        }
        if (!Geometry.ok(d, width, open, stroke, notchLength, notchArea, mass, rate, damping, cd) || !endOk) {
            return null;
        }
        return new Spool(new MeteringEdge(d, width, open, notchLength, notchArea, cd), mass, rate, damping, stroke,
                end, f);
    }

    static Element pilotOperated(String id, Fields f, Map<String, Node> n, Fluid fluid) {
        Spool spool = readSpool(f);
        double springPreload = Double.NaN;
        if (spool != null) {
            springPreload = spool.fields().nonNegative("springPreload", Dimension.FORCE);
            spool.fields().finish();
        }
        double chamber = f.positive("chamberVolume", Dimension.VOLUME);
        Fields orifice = f.object("dampingOrifice");
        double od = Double.NaN;
        double ocd = Double.NaN;
        if (orifice == null) {
            f.problem("dampingOrifice", "a \"dampingOrifice\" block with its diameter", "none");
        } else {
            od = orifice.positive("diameter", Dimension.LENGTH);
            ocd = orifice.number("cd", 0.05, 1.0, ElementTypes.SHARP_EDGE_CD);
            orifice.finish();
        }
        Fields pilotFields = f.object("pilot");
        PoppetGeometry pilot = null;
        if (pilotFields == null) {
            f.problem("pilot", "a \"pilot\" block (seatDiameter, springRate, mass, maxLift...)", "none");
        } else {
            pilot = ElementTypes.readPoppetBody(pilotFields);
            pilotFields.finish();
        }
        boolean hasSetting = f.has("setting");
        boolean hasPreload = f.has("pilotPreload");
        if (hasSetting == hasPreload) {
            f.problem("setting", "exactly one of \"setting\" (outlet pressure at small demand) or \"pilotPreload\"",
                    hasSetting ? "both" : "neither");
            return null;
        }
        double setting = hasSetting ? f.positive("setting", Dimension.PRESSURE) : Double.NaN;
        double preload = hasPreload ? f.positive("pilotPreload", Dimension.FORCE) : Double.NaN;
        if (spool == null || pilot == null || !Geometry.ok(springPreload, chamber, od, ocd)
                || (hasSetting && !Geometry.ok(setting)) || (hasPreload && !Geometry.ok(preload))) {
            return null;
        }
        PilotReducingValve.MainStage main = new PilotReducingValve.MainStage(spool.edge(), spool.mass(),
                spool.springRate(), springPreload, spool.damping(), spool.stroke(), spool.endChamber());
        if (chamber <= spool.edge().endArea() * spool.stroke()) {
            f.problem("chamberVolume", "more than the spool's swept volume ("
                    + Fields.format(spool.edge().endArea() * spool.stroke() * 1e6) + " cm^3)", f.raw("chamberVolume").describe());
            return null;
        }
        if (hasSetting) {
            preload = PilotReducingValve.pilotPreloadFor(setting, main, od, ocd, pilot, fluid);
            if (Double.isNaN(preload) || preload <= 0.0) {
                f.problem("setting", "a setting above the spool spring bias ("
                        + Fields.format(main.springBias() / 1e5) + " bar) that the pilot can hold within its lift",
                        f.raw("setting").describe());
                return null;
            }
        } else {
            setting = preload / pilot.seatArea() + main.springBias();
        }
        return new PilotReducingValve(id, n.get("inlet"), n.get("outlet"), n.get("drain"), main, chamber, od, ocd,
                pilot.withPreload(preload), setting);
    }

    static Element directActing(String id, Fields f, Map<String, Node> n, Fluid fluid) {
        Spool spool = readSpool(f);
        if (spool != null) {
            spool.fields().finish();
        }
        double setting = f.positive("setting", Dimension.PRESSURE);
        if (spool == null || !Geometry.ok(setting)) {
            return null;
        }
        DirectReducingValve v = new DirectReducingValve(id, n.get("inlet"), n.get("outlet"), n.get("drain"),
                spool.edge(), spool.mass(), spool.springRate(), setting, spool.damping(), spool.stroke(),
                spool.endChamber());
        if (v.preload() <= 0.0) {
            f.problem("setting", "a setting high enough for a positive spring preload (above "
                    + Fields.format(spool.springRate() * spool.edge().openLength() / spool.edge().endArea() / 1e5)
                    + " bar with this spring)", f.raw("setting").describe());
            return null;
        }
        return v;
    }
}
