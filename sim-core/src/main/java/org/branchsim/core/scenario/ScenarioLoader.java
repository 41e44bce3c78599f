package org.branchsim.core.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.fluid.IsoGrade;
import org.branchsim.core.fluid.ViscosityModel;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.settings.Method;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;

/**
 * Turns a scenario document into a checked {@link Scenario}: reads the fluid, nodes, elements, schedule,
 * solver and output blocks, converts every value to SI, checks the wiring, and reports every problem at
 * once with file, line, column and field path. The format is described in docs/scenario-format.md.
 */
public final class ScenarioLoader {

    private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");
    private static final Pattern ID = Pattern.compile("[A-Za-z][A-Za-z0-9_-]*");
    private static final double DEFAULT_EXPANSION = 7e-4;
    /** Longest scenario name: it names the output folder. */
    private static final int MAX_NAME = 100;

    private ScenarioLoader() {
    }

    /** Reads, checks and builds a scenario file. */
    public static Scenario load(Path file) {
        return build(file.toString(), DocumentParser.parse(file));
    }

    /**
     * Builds a scenario from an already parsed document (a sweep variant, say).
     *
     * @param fileName name for messages
     * @param document the document root
     * @return the scenario
     * @throws org.branchsim.core.error.BranchsimException SCENARIO_INVALID listing every problem
     */
    public static Scenario build(String fileName, Located document) {
        Problems problems = new Problems(fileName);
        problems.preferUnits(declaredUnits(document));
        Fields root = Fields.of(document, "", problems);
        root.number("formatVersion", 1, 1, 1);
        String name = root.text("name");
        if (name != null && (!NAME.matcher(name).matches() || name.length() > MAX_NAME)) {
            root.problem("name", "a name of at most " + MAX_NAME + " letters, digits, '.', '_' or '-' (it names the "
                    + "output folder)", name.length() > MAX_NAME ? "a name of " + name.length() + " characters"
                    : "\"" + name + "\"");
        }
        String description = root.text("description", "");
        Fluid fluid = readFluid(root.object("fluid"), root, problems);

        CircuitBuilder builder = new CircuitBuilder(name == null ? "scenario" : name, fluid);
        Map<String, Located> idLocations = new LinkedHashMap<>();
        Map<String, Node> nodes = readNodes(root, builder, idLocations, problems);
        Map<String, Element> elements = readElements(root, builder, nodes, idLocations, fluid, problems);
        checkEveryNodeUsed(root, nodes, elements.values(), problems);

        Map<String, ScheduledInput> inputs = new LinkedHashMap<>();
        boolean wired = problems.isEmpty();
        if (wired) {
            for (ScheduledInput in : builder.inputs()) {
                inputs.put(in.name(), in);
            }
        }
        readSchedule(root, inputs, problems);
        CircuitModel circuit = wired ? builder.build() : null;
        SolverSettings solver = readSolver(root.object("solver"), root, problems);
        if (solver != null && circuit != null) {
            checkOutputGrid(root.object("solver"), solver, circuit.signals().size());
        }
        UnitSystem units = UnitSystem.METRIC;
        List<Scenario.PlotGroup> plots = new ArrayList<>();
        double metricsFrom = 0.0;
        double metricsTo = solver == null ? Double.NaN : solver.endTime();
        Fields out = root.object("outputs");
        if (out != null) {
            units = readUnits(out);
            plots = readPlots(out, circuit);
            metricsFrom = out.nonNegative("metricsFrom", Dimension.TIME, 0.0);
            if (solver != null && Geometry.ok(metricsFrom) && metricsFrom >= solver.endTime()) {
                out.problem("metricsFrom", "a time before the end time (" + Units.plain(solver.endTime()) + " s)",
                        out.raw("metricsFrom").describe());
            }
            metricsTo = out.positive("metricsTo", Dimension.TIME, metricsTo);
            if (out.has("metricsTo") && Geometry.ok(metricsFrom, metricsTo) && metricsTo <= metricsFrom) {
                out.problem("metricsTo", "a time after metricsFrom (" + Units.plain(metricsFrom) + " s)",
                        out.raw("metricsTo").describe());
            }
            out.finish();
        }
        root.finish();
        problems.throwIfAny();
        return new Scenario(name, description, fileName, circuit, solver, units, plots, metricsFrom, metricsTo,
                document, problems.notes());
    }

    private static Fluid readFluid(Fields f, Fields root, Problems problems) {
        if (f == null) {
            root.problem("fluid", "a \"fluid\" block (grade, temperature, bulk modulus...)", "none");
            return new Fluid(870, 46e-6, 1.6e9, 0, 1, 313.15);
        }
        double temperature = f.quantity("temperature", Dimension.TEMPERATURE, 313.15);
        double nu = readViscosity(f, temperature);
        double density;
        if (f.has("density")) {
            density = f.positive("density", Dimension.DENSITY);
        } else {
            double rho15 = f.positive("density15", Dimension.DENSITY, 870.0);
            density = Fluid.densityAt(rho15, DEFAULT_EXPANSION, temperature);
        }
        double beta = f.positive("bulkModulus", Dimension.PRESSURE, 1.6e9);
        double air = f.number("airContent", 0.0, 0.5, 0.0);
        String process = f.text("airProcess", "isothermal");
        double n = 1.0;
        if ("adiabatic".equals(process)) {
            n = 1.4;
        } else if (process != null && !"isothermal".equals(process)) {
            f.problem("airProcess", "\"isothermal\" or \"adiabatic\"", "\"" + process + "\"");
        }
        f.finish();
        return new Fluid(density, nu, beta, air, n, temperature);
    }

    private static double readViscosity(Fields f, double temperature) {
        boolean fixed = f.has("viscosity");
        boolean grade = f.has("grade");
        boolean points = f.has("viscosity40") || f.has("viscosity100");
        int ways = (fixed ? 1 : 0) + (grade ? 1 : 0) + (points ? 1 : 0);
        if (ways > 1) {
            f.problem("viscosity", "one way of giving viscosity: \"grade\", \"viscosity\", or \"viscosity40\" with \"viscosity100\"",
                    ways + " ways");
            return Double.NaN;
        }
        if (fixed) {
            return f.positive("viscosity", Dimension.KINEMATIC_VISCOSITY);
        }
        if (points) {
            double nu40 = f.positive("viscosity40", Dimension.KINEMATIC_VISCOSITY);
            double nu100 = f.positive("viscosity100", Dimension.KINEMATIC_VISCOSITY);
            if (!Geometry.ok(nu40, nu100, temperature)) {
                return Double.NaN;
            }
            if (nu100 >= nu40) {
                f.problem("viscosity100", "a viscosity at 100 degC lower than at 40 degC", f.raw("viscosity100").describe());
                return Double.NaN;
            }
            return ViscosityModel.throughPoints(313.15, nu40, 373.15, nu100).kinematicViscosity(temperature);
        }
        String g = f.text("grade", "VG46");
        IsoGrade iso = g == null ? null : IsoGrade.parse(g);
        if (iso == null) {
            if (g != null) {
                f.problem("grade", "an ISO VG grade (" + IsoGrade.names() + ")", "\"" + g + "\"");
            }
            return Double.NaN;
        }
        if (Double.isNaN(temperature)) {
            return Double.NaN;
        }
        return ViscosityModel.throughPoints(313.15, iso.nu40(), 373.15, iso.nu100()).kinematicViscosity(temperature);
    }

    private static boolean checkId(Fields f, String id, Map<String, Located> ids) {
        if (id == null) {
            return false;
        }
        if (!ID.matcher(id).matches()) {
            f.problem("id", "an id that starts with a letter and has only letters, digits, '_' or '-'", "\"" + id + "\"");
            return false;
        }
        Located first = ids.get(id);
        if (first != null) {
            f.problem("id", "an id used once (\"" + id + "\" is already used at line " + first.line() + ")",
                    "\"" + id + "\" again");
            return false;
        }
        ids.put(id, f.raw("id"));
        return true;
    }

    private static Map<String, Node> readNodes(Fields root, CircuitBuilder builder, Map<String, Located> ids,
                                               Problems problems) {
        Map<String, Node> nodes = new LinkedHashMap<>();
        List<Located> list = root.list("nodes");
        if (!root.has("nodes") || list.isEmpty()) {
            root.problem("nodes", "a list of at least one node", root.has("nodes") ? "an empty list" : "none");
        }
        boolean anyVolume = false;
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "nodes[" + i + "]", problems);
            String id = f.text("id");
            boolean idOk = checkId(f, id, ids);
            String type = f.text("type", "volume");
            Node node = null;
            if ("tank".equals(type)) {
                double p = f.quantity("pressure", Dimension.PRESSURE, 0.0);
                if (idOk && Geometry.ok(p)) {
                    node = Node.tank(id, p);
                }
            } else if ("volume".equals(type)) {
                double v = f.positive("volume", Dimension.VOLUME);
                double p0 = f.quantity("pressure", Dimension.PRESSURE, 0.0);
                double wall = readWall(f.object("wall"));
                if (idOk && Geometry.ok(v, p0, wall)) {
                    node = Node.volume(id, v, wall, p0);
                }
                anyVolume = true;
            } else if (type != null) {
                f.problem("type", "\"volume\" or \"tank\"", "\"" + type + "\"");
            }
            f.finish();
            if (node != null) {
                nodes.put(id, node);
                builder.add(node);
            }
        }
        if (!list.isEmpty() && !anyVolume) {
            root.problem("nodes", "at least one node of type \"volume\" (tanks alone hold no pressure state to simulate)",
                    "only tanks");
        }
        return nodes;
    }

    private static double readWall(Fields f) {
        if (f == null) {
            return Double.POSITIVE_INFINITY;
        }
        double result;
        if (f.has("bulkModulus")) {
            result = f.positive("bulkModulus", Dimension.PRESSURE);
        } else {
            double d = f.positive("innerDiameter", Dimension.LENGTH);
            double t = f.positive("thickness", Dimension.LENGTH);
            double e = f.positive("modulus", Dimension.PRESSURE, 206e9);
            result = Geometry.ok(d, t, e) ? e * t / d : Double.NaN;
        }
        f.finish();
        return result;
    }

    private static Map<String, Element> readElements(Fields root, CircuitBuilder builder, Map<String, Node> nodes,
                                                     Map<String, Located> ids, Fluid fluid, Problems problems) {
        Map<String, Element> elements = new LinkedHashMap<>();
        List<Located> list = root.list("elements");
        if (!root.has("elements") || list.isEmpty()) {
            root.problem("elements", "a list of at least one element", root.has("elements") ? "an empty list" : "none");
        }
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "elements[" + i + "]", problems);
            String id = f.text("id");
            boolean idOk = checkId(f, id, ids);
            String type = f.text("type");
            String renamed = type == null ? null : ElementTypes.renamed(type);
            if (renamed != null) {
                f.note("type", "\"" + type + "\" is the old name of \"" + renamed + "\"; it is still accepted in this "
                        + "release and will be refused in the next");
                type = renamed;
            }
            ElementReader reader = type == null ? null : ElementTypes.find(type);
            if (type != null && reader == null) {
                f.problem("type", "an element type (" + ElementTypes.names() + ")", "\"" + type + "\"");
            }
            Map<String, Node> ports = reader == null ? null : readPorts(f, reader.ports(), nodes);
            if (reader != null) {
                Element e = reader.read(id, f, ports == null ? Map.of() : ports, fluid);
                if (e != null && idOk && ports != null) {
                    elements.put(id, e);
                    builder.add(e);
                }
            } else {
                f.raw("ports");
                for (String key : f.node().keys()) {
                    f.raw(key);
                }
            }
            f.finish();
        }
        return elements;
    }

    private static Map<String, Node> readPorts(Fields f, List<String> portNames, Map<String, Node> nodes) {
        Fields ports = f.object("ports");
        if (ports == null) {
            f.problem("ports", "a \"ports\" object naming the node of each port (" + String.join(", ", portNames) + ")",
                    "none");
            return null;
        }
        Map<String, Node> out = new LinkedHashMap<>();
        boolean ok = true;
        for (String port : portNames) {
            String nodeId = ports.text(port);
            if (nodeId == null) {
                ok = false;
                continue;
            }
            Node n = nodes.get(nodeId);
            if (n == null) {
                ports.problem(port, "the id of a node (" + String.join(", ", nodes.keySet()) + ")",
                        "\"" + nodeId + "\", which is not a node");
                ok = false;
                continue;
            }
            out.put(port, n);
        }
        ports.finish();
        return ok ? out : null;
    }

    private static void checkEveryNodeUsed(Fields root, Map<String, Node> nodes, java.util.Collection<Element> elements,
                                           Problems problems) {
        Set<Node> used = new HashSet<>();
        for (Element e : elements) {
            used.addAll(e.ports());
        }
        List<Located> list = root.list("nodes");
        for (int i = 0; i < list.size(); i++) {
            if (!(list.get(i) instanceof Located.Obj o) || !(o.get("id") instanceof Located.Scalar s)
                    || !(s.value() instanceof String id)) {
                continue;
            }
            Node n = nodes.get(id);
            if (n != null && !used.contains(n) && problems.isEmpty()) {
                problems.add(o, "nodes[" + i + "]", "a node that some element's port connects to",
                        "node \"" + id + "\" connected to nothing");
            }
        }
    }

    private static void readSchedule(Fields root, Map<String, ScheduledInput> inputs, Problems problems) {
        List<Located> list = root.list("schedule");
        Map<String, Double> lastEnd = new LinkedHashMap<>();
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "schedule[" + i + "]", problems);
            double at = f.nonNegative("at", Dimension.TIME);
            double over = f.nonNegative("over", Dimension.TIME, 0.0);
            String target = f.text("set");
            Located to = f.raw("to");
            if (to == null) {
                f.problem("to", "the value to move to, e.g. 1 for a valve opening or \"5 kN\" for a load", "none");
            }
            if (target != null && !inputs.isEmpty() && !inputs.containsKey(target)) {
                f.problem("set", "a scheduled input (" + String.join(", ", inputs.keySet()) + ")",
                        "\"" + target + "\"");
            } else if (target != null && inputs.isEmpty() && problems.isEmpty()) {
                f.problem("set", "a scheduled input, but no element in this circuit has one", "\"" + target + "\"");
            }
            ScheduledInput in = target == null ? null : inputs.get(target);
            if (in != null && to != null) {
                double value = Fields.parseQuantity(to, f.path("to"), in.dimension(), problems);
                if (in.dimension() == Dimension.DIMENSIONLESS && !Double.isNaN(value) && (value < 0 || value > 1)) {
                    f.problem("to", "an opening from 0 (closed) to 1 (fully open)", to.describe());
                    value = Double.NaN;
                }
                Double end = lastEnd.get(target);
                if (end != null && Geometry.ok(at) && at < end - 1e-15) {
                    f.problem("at", "a start at or after the end of the previous change of " + target + " ("
                            + Units.plain(end) + " s)", f.raw("at").describe());
                } else if (Geometry.ok(at, over, value)) {
                    in.addRamp(new ScheduledInput.Ramp(at, over, value));
                    lastEnd.put(target, at + over);
                }
            }
            f.finish();
        }
    }

    private static SolverSettings readSolver(Fields f, Fields root, Problems problems) {
        if (f == null) {
            root.problem("solver", "a \"solver\" block with at least \"endTime\"", "none");
            return null;
        }
        double end = f.positive("endTime", Dimension.TIME);
        double dt = f.positive("outputInterval", Dimension.TIME, Double.isNaN(end) ? 1e-3 : end / 1000.0);
        if (Geometry.ok(end, dt) && dt > end) {
            f.problem("outputInterval", "an interval no longer than the end time", f.raw("outputInterval").describe());
        }
        double rtol = f.number("relativeTolerance", 1e-12, 1e-2, SolverSettings.DEFAULT_RELATIVE_TOLERANCE);
        double maxStep = f.positive("maxStep", Dimension.TIME, Geometry.ok(end, dt) ? Math.max(dt, end / 100.0) : 1e-3);
        double minStep = f.positive("minStep", Dimension.TIME, SolverSettings.DEFAULT_MIN_STEP);
        double evTol = f.positive("eventTolerance", Dimension.TIME, SolverSettings.DEFAULT_EVENT_TOLERANCE);
        double maxEval = f.number("maxEvaluations", 1000, 1e10, SolverSettings.DEFAULT_MAX_EVALUATIONS);
        String methodName = f.text("method", SolverSettings.DEFAULT_METHOD.name().toLowerCase(Locale.ROOT));
        Method method = null;
        for (Method m : Method.values()) {
            if (m.name().toLowerCase(Locale.ROOT).equals(methodName)) {
                method = m;
            }
        }
        if (method == null && methodName != null) {
            List<String> names = new ArrayList<>();
            for (Method m : Method.values()) {
                names.add("\"" + m.name().toLowerCase(Locale.ROOT) + "\"");
            }
            f.problem("method", "one of " + String.join(", ", names), "\"" + methodName + "\"");
        }
        f.finish();
        if (!Geometry.ok(end, dt, rtol, maxStep, minStep, evTol, maxEval) || method == null) {
            return null;
        }
        if (SolverSettings.outputGridProblem(end, dt, 0) != null) {
            checkOutputGrid(f, end, dt, 0);
            return null;
        }
        return new SolverSettings(method, end, dt, rtol, minStep, maxStep, evTol, (long) maxEval);
    }

    /** Refuses, before any run, an output grid beyond {@link SolverSettings#MAX_OUTPUT_VALUES}. */
    private static void checkOutputGrid(Fields f, SolverSettings solver, int signals) {
        checkOutputGrid(f, solver.endTime(), solver.outputInterval(), signals);
    }

    private static void checkOutputGrid(Fields f, double end, double dt, int signals) {
        String problem = SolverSettings.outputGridProblem(end, dt, signals);
        if (problem != null && f != null) {
            f.problem(f.has("outputInterval") ? "outputInterval" : "endTime", problem,
                    SolverSettings.outputGrid(end, dt, signals));
        }
    }

    /**
     * @return the unit system the document asks for, read without checking (so that hints about units can
     *         list its units first); the checked reading comes later
     */
    private static UnitSystem declaredUnits(Located document) {
        if (document instanceof Located.Obj root && root.get("outputs") instanceof Located.Obj out
                && out.get("units") instanceof Located.Scalar s && s.value() instanceof String u
                && "us".equalsIgnoreCase(u.trim())) {
            return UnitSystem.US;
        }
        return UnitSystem.METRIC;
    }

    private static UnitSystem readUnits(Fields out) {
        String u = out.text("units", "metric");
        if ("metric".equalsIgnoreCase(u)) {
            return UnitSystem.METRIC;
        }
        if ("us".equalsIgnoreCase(u)) {
            return UnitSystem.US;
        }
        if ("SI".equalsIgnoreCase(u)) {
            out.note("units", "\"SI\" is the old name of \"metric\" (bar, L/min and mm are metric units of the trade, "
                    + "not SI units); it is still accepted in this release and will be refused in the next");
            return UnitSystem.METRIC;
        }
        if (u != null) {
            out.problem("units", "\"metric\" (bar, L/min, mm) or \"us\" (psi, gal/min, in)", "\"" + u + "\"");
        }
        return UnitSystem.METRIC;
    }

    private static List<Scenario.PlotGroup> readPlots(Fields out, CircuitModel circuit) {
        List<Scenario.PlotGroup> plots = new ArrayList<>();
        List<Located> list = out.list("plots");
        for (int i = 0; i < list.size(); i++) {
            Fields p = Fields.of(list.get(i), out.path("plots") + "[" + i + "]", out.problems());
            String title = p.text("title");
            List<String> signals = new ArrayList<>();
            Map<String, Integer> seen = new LinkedHashMap<>();
            List<Located> names = p.list("signals");
            if (names.isEmpty()) {
                p.problem("signals", "a list of signal names such as \"clampLine.p\"", "none");
            }
            for (int k = 0; k < names.size(); k++) {
                Located s = names.get(k);
                String path = p.path("signals") + "[" + k + "]";
                if (!(s instanceof Located.Scalar sc) || !sc.isText()) {
                    out.problems().add(s, path, "a signal name in quotes", s.describe());
                    continue;
                }
                String name = (String) sc.value();
                Integer first = seen.putIfAbsent(name, k);
                if (first != null) {
                    out.problems().add(s, path, "each signal once in a plot group (\"" + name + "\" is already "
                            + p.path("signals") + "[" + first + "])", "\"" + name + "\" again");
                    continue;
                }
                if (circuit != null && circuit.signal(name) == null) {
                    out.problems().add(s, path, "a signal of this circuit, such as "
                            + circuit.signals().get(0).name(), "\"" + name + "\"");
                    continue;
                }
                signals.add(name);
            }
            p.finish();
            if (title != null) {
                plots.add(new Scenario.PlotGroup(title, signals));
            }
        }
        return plots;
    }
}
