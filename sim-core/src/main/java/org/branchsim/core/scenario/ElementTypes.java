package org.branchsim.core.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.CheckValve;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.elements.Motor;
import org.branchsim.core.elements.Orifice;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.elements.MeteringPath;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/**
 * The element types a scenario can use, by their {@code "type"} name, with the fields each reads.
 * docs/scenario-format.md lists the same fields; keep the two together.
 */
final class ElementTypes {

    /** Sharp-edged orifice contraction coefficient pi/(pi+2) (Merritt 1967), used as default Cd. */
    static final double SHARP_EDGE_CD = Math.PI / (Math.PI + 2.0);

    private static final Map<String, ElementReader> READERS = new LinkedHashMap<>();

    static {
        register("pump", List.of("inlet", "outlet"), (id, f, n, fluid) -> {
            double d = f.positive("displacement", Dimension.DISPLACEMENT);
            double speed = f.nonNegative("speed", Dimension.ROTATIONAL_SPEED);
            double eta = f.number("volumetricEfficiency", 0.01, 1.0, 1.0);
            return Geometry.ok(d, speed, eta) ? new Pump(id, n.get("inlet"), n.get("outlet"), d, speed, eta) : null;
        });
        register("orifice", List.of("a", "b"), (id, f, n, fluid) -> {
            double area = Geometry.area(f, "diameter", "area");
            double cd = f.number("cd", 0.05, 1.0, SHARP_EDGE_CD);
            return Geometry.ok(area, cd) ? new Orifice(id, n.get("a"), n.get("b"), area, cd) : null;
        });
        register("meteringPath", List.of("a", "b"), (id, f, n, fluid) -> {
            double area = Geometry.area(f, "diameter", "area");
            double cd = f.number("cd", 0.05, 1.0, SHARP_EDGE_CD);
            double opening = f.number("opening", 0.0, 1.0, 0.0);
            return Geometry.ok(area, cd, opening) ? new MeteringPath(id, n.get("a"), n.get("b"), area, cd, opening) : null;
        });
        register("checkValve", List.of("inlet", "outlet"), (id, f, n, fluid) -> {
            double crack = f.nonNegative("crackingPressure", Dimension.PRESSURE);
            double span = f.positive("fullOpenAbove", Dimension.PRESSURE, 2e5);
            double area = Geometry.area(f, "diameter", "area");
            double cd = f.number("cd", 0.05, 1.0, SHARP_EDGE_CD);
            return Geometry.ok(crack, span, area, cd)
                    ? new CheckValve(id, n.get("inlet"), n.get("outlet"), crack, span, area, cd) : null;
        });
        register("reliefValve", List.of("inlet", "outlet"), (id, f, n, fluid) -> {
            PoppetGeometry g = readPoppet(f, "setting");
            return g == null ? null : new ReliefValve(id, n.get("inlet"), n.get("outlet"), g);
        });
        register("cylinder", List.of("capEnd", "rodEnd"), ElementTypes::readCylinder);
        register("pilotReducingValve", List.of("inlet", "outlet", "drain"), ReducingValveReaders::pilotOperated);
        register("directReducingValve", List.of("inlet", "outlet", "drain"), ReducingValveReaders::directActing);
        register("motor", List.of("a", "b"), (id, f, n, fluid) -> {
            double d = f.positive("displacement", Dimension.DISPLACEMENT);
            double j = f.positive("inertia", Dimension.ROTATIONAL_INERTIA);
            double b = f.nonNegative("damping", Dimension.ROTARY_DAMPING, 0.0);
            double torque = f.quantity("loadTorque", Dimension.TORQUE, 0.0);
            double k = 0.0;
            Fields leak = f.object("leakage");
            if (leak != null) {
                double q = leak.positive("flow", Dimension.VOLUME_FLOW);
                double p = leak.positive("at", Dimension.PRESSURE);
                leak.finish();
                k = q / p;
            }
            return Geometry.ok(d, j, b, torque, k) ? new Motor(id, n.get("a"), n.get("b"), d, j, b, k, torque) : null;
        });
    }

    private ElementTypes() {
    }

    static void register(String type, List<String> ports, Reader reader) {
        READERS.put(type, new ElementReader() {
            @Override
            public List<String> ports() {
                return ports;
            }

            @Override
            public Element read(String id, Fields f, Map<String, Node> nodes, Fluid fluid) {
                return reader.read(id, f, nodes, fluid);
            }
        });
    }

    /** The reading part of an {@link ElementReader}. */
    @FunctionalInterface
    interface Reader {
        Element read(String id, Fields f, Map<String, Node> nodes, Fluid fluid);
    }

    /** Old type names still accepted for one release, with their new names. */
    private static final Map<String, String> RENAMED = Map.of("valveEdge", "meteringPath");

    /** @return the new name of an old type name, or null when the name is not an old one */
    static String renamed(String type) {
        return RENAMED.get(type);
    }

    static ElementReader find(String type) {
        return READERS.get(type);
    }

    static String names() {
        return String.join(", ", READERS.keySet());
    }

    /**
     * Reads a poppet on a seat whose spring preload comes from a pressure setting (cracking pressure
     * = preload / seat area) or is given directly as {@code preload}.
     */
    static PoppetGeometry readPoppet(Fields f, String settingKey) {
        PoppetGeometry body = readPoppetBody(f);
        // read the setting even when the body has a problem, so that it is checked and not reported as unknown
        double preload = preload(f, settingKey, body == null ? Double.NaN : body.seatDiameter());
        if (body == null || Double.isNaN(preload)) {
            return null;
        }
        return body.withPreload(preload);
    }

    /** Reads a poppet's seat, spring, mass, damping and lift, without its preload (set to 0). */
    static PoppetGeometry readPoppetBody(Fields f) {
        double seat = f.positive("seatDiameter", Dimension.LENGTH);
        double cone = f.positive("coneAngle", Dimension.ANGLE, Math.toRadians(90.0));
        double rate = f.positive("springRate", Dimension.STIFFNESS);
        double mass = f.positive("mass", Dimension.MASS);
        double damping = f.nonNegative("damping", Dimension.DAMPING, 0.0);
        double maxLift = f.positive("maxLift", Dimension.LENGTH);
        double cd = f.number("cd", 0.05, 1.0, SHARP_EDGE_CD);
        if (!Geometry.ok(seat, cone, rate, mass, damping, maxLift, cd)) {
            return null;
        }
        return new PoppetGeometry(seat, cone, rate, 0.0, mass, damping, maxLift, cd);
    }

    private static double preload(Fields f, String settingKey, double seat) {
        boolean hasSetting = f.has(settingKey);
        boolean hasPreload = f.has("preload");
        if (hasSetting == hasPreload) {
            f.problem(settingKey, "exactly one of \"" + settingKey + "\" (a pressure) or \"preload\" (a force)",
                    hasSetting ? "both" : "neither");
            return Double.NaN;
        }
        if (hasPreload) {
            return f.positive("preload", Dimension.FORCE);
        }
        double setting = f.positive(settingKey, Dimension.PRESSURE);
        return setting * 0.25 * Math.PI * seat * seat;
    }

    private static Element readCylinder(String id, Fields f, Map<String, Node> n, Fluid fluid) {
        double bore = f.positive("bore", Dimension.LENGTH);
        double rod = f.positive("rod", Dimension.LENGTH);
        if (Geometry.ok(bore, rod) && rod >= bore) {
            f.problem("rod", "a rod diameter smaller than the bore (" + Fields.format(bore * 1e3) + " mm)",
                    f.raw("rod").describe());
            rod = Double.NaN;
        }
        double stroke = f.positive("stroke", Dimension.LENGTH);
        double mass = f.positive("mass", Dimension.MASS);
        double dead1 = f.nonNegative("deadVolumeCap", Dimension.VOLUME, 0.0);
        double dead2 = f.nonNegative("deadVolumeRod", Dimension.VOLUME, 0.0);
        double coulomb = f.nonNegative("coulombFriction", Dimension.FORCE, 0.0);
        double viscous = f.nonNegative("viscousFriction", Dimension.DAMPING, 0.0);
        double vs = f.positive("frictionVelocity", Dimension.VELOCITY, 1e-3);
        double x0 = f.nonNegative("position", Dimension.LENGTH, 0.0);
        if (Geometry.ok(x0, stroke) && x0 > stroke) {
            f.problem("position", "a position within the stroke (0 to " + Fields.format(stroke * 1e3) + " mm)",
                    f.raw("position").describe());
            x0 = Double.NaN;
        }
        double load = f.quantity("load", Dimension.FORCE, 0.0);
        Cylinder.Leakage internal = readLeakage(f.object("internalLeakage"));
        Cylinder.Leakage external = readLeakage(f.object("externalLeakage"));
        Cylinder.Contact contact = null;
        Fields wp = f.object("workpiece");
        boolean contactOk = true;
        if (wp != null) {
            double at = wp.positive("position", Dimension.LENGTH);
            double k = wp.positive("stiffness", Dimension.STIFFNESS);
            double c = wp.nonNegative("damping", Dimension.DAMPING, 0.0);
            wp.finish();
            contactOk = Geometry.ok(at, k, c);
            if (contactOk && Geometry.ok(stroke) && at >= stroke) {
                wp.problem("position", "a contact position inside the stroke", wp.raw("position").describe());
                contactOk = false;
            }
            contact = contactOk ? new Cylinder.Contact(at, k, c) : null;
        }
        if (!Geometry.ok(bore, rod, stroke, mass, dead1, dead2, coulomb, viscous, vs, x0, load) || !contactOk
                || (f.has("internalLeakage") && internal == null) || (f.has("externalLeakage") && external == null)) {
            return null;
        }
        Cylinder.Parameters p = new Cylinder.Parameters(bore, rod, stroke, mass, dead1, dead2, coulomb, viscous, vs, x0);
        return new Cylinder(id, n.get("capEnd"), n.get("rodEnd"), p, internal, external, contact, load);
    }

    private static Cylinder.Leakage readLeakage(Fields f) {
        if (f == null) {
            return null;
        }
        double c = f.positive("clearance", Dimension.LENGTH);
        double l = f.positive("length", Dimension.LENGTH);
        f.finish();
        return Geometry.ok(c, l) ? new Cylinder.Leakage(c, l) : null;
    }
}
