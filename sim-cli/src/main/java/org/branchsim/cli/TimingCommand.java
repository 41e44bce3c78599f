package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.branchsim.core.analysis.TraceComparison;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.scenario.FieldBounds;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.Method;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.study.Variant;
import org.branchsim.core.study.VariantOutcome;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code branchsim timing} (formerly {@code bench}, still accepted for one release): runs scenarios several
 * times in one JVM after warm-up, per integration method, each run on this one thread, and writes per run the
 * wall time and the thread's CPU time (s), the work counters (every evaluation of the circuit equations counted,
 * output sampling and energy recording included), accuracy against a tight reference and peak heap to
 * timing.json and timing.csv; then times a parallel sweep of variants of the first scenario. With
 * {@code --scaling} it measures instead the size-scaling case ({@link ScalingCase}): a reducing valve's branch copied
 * onto the same supply, dense and sparse LU side by side, written to scaling.json and scaling.csv.
 */
@Command(name = "timing", aliases = "bench", mixinStandardHelpOptions = true,
        description = "Measure run time, solver work, accuracy and memory per scenario and method; write timing.json "
                + "and timing.csv (\"bench\" is the old name of this command).")
public final class TimingCommand implements Callable<Integer> {

    @Parameters(paramLabel = "SCENARIO", arity = "0..*",
            description = "Scenarios to measure (default: the demos in ./scenarios or in scenarios/ beside the program).")
    private List<Path> scenarios = new ArrayList<>();

    @Option(names = "--runs", paramLabel = "N", defaultValue = "5", description = "Timed runs per scenario and method (default ${DEFAULT-VALUE}).")
    private int runs;

    @Option(names = "--warmup", paramLabel = "N", defaultValue = "2", description = "Untimed warm-up runs (default ${DEFAULT-VALUE}).")
    private int warmup;

    @Option(names = "--methods", paramLabel = "METHOD", defaultValue = "implicit,explicit", split = ",",
            description = "Methods to compare (default ${DEFAULT-VALUE}).")
    private List<String> methods;

    @Option(names = "--end-time", paramLabel = "TIME", description = "Override every scenario's end time, e.g. \"10 s\".")
    private String endTime;

    @Option(names = "--no-reference", description = "Skip the accuracy check against Dormand-Prince 8(5,3) at rtol 1e-10.")
    private boolean noReference;

    @Option(names = "--reference-spread",
            description = "Also run the reference at rtol 1e-11 and report how far it is from the one at 1e-10 (largest "
                    + "pressure difference over its range): the floor below which a pointwise error cannot be judged, "
                    + "e.g. for a member chattering on its seat.")
    private boolean referenceSpread;

    @Option(names = "--sweep-variants", paramLabel = "N", defaultValue = "64",
            description = "Variants in the sweep benchmark of the first scenario, 0 to skip (default ${DEFAULT-VALUE}).")
    private int sweepVariants;

    @Option(names = "--sweep-parameter", paramLabel = "PATH", defaultValue = "elements.reducer.dampingOrifice.diameter",
            description = "Parameter varied in the sweep benchmark (default ${DEFAULT-VALUE}).")
    private String sweepParameter;

    @Option(names = "--threads", paramLabel = "N", description = "Threads for the sweep benchmark (default: all cores).")
    private Integer threads;

    @Option(names = "--scaling", paramLabel = "COPIES", split = ",",
            description = "Instead of the demo table, the size-scaling case: the branch of --scaling-valve in the first "
                    + "scenario copied this many times onto the same supply (e.g. 1,2,4,8,16), each size run with dense "
                    + "and with sparse LU; writes scaling.json and scaling.csv.")
    private List<Integer> scaling;

    @Option(names = "--scaling-valve", paramLabel = "ID", defaultValue = "reducer",
            description = "The reducing valve whose branch the scaling case copies (default ${DEFAULT-VALUE}).")
    private String scalingValve;

    /** Relative tolerance of the second, tighter reference run of --reference-spread. */
    static final double TIGHTER_REFERENCE_RTOL = 1e-11;

    /** Most copies of a branch in the scaling case. */
    static final int MAX_COPIES = 64;

    /** Most timed or warm-up runs per scenario and method. */
    static final int MAX_RUNS = 1000;
    /** The demos measured when no scenario is given, looked for in ./scenarios and beside the program. */
    static final List<String> DEFAULT_DEMOS = List.of("fixture-clamp.json", "regulation-characteristic.json", "feed-stall.json");

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "out/timing", description = "Output folder (default ${DEFAULT-VALUE}).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        if (spec.commandLine().getParent() != null
                && spec.commandLine().getParent().getParseResult().originalArgs().contains("bench")) {
            spec.commandLine().getErr().println("note: \"bench\" is the old name of \"timing\"; it is still accepted "
                    + "in this release and will be refused in the next");
        }
        OptionChecks.count("--runs", runs, 1, MAX_RUNS);
        OptionChecks.count("--warmup", warmup, 0, MAX_RUNS);
        OptionChecks.count("--sweep-variants", sweepVariants, 0, OptionChecks.MAX_VARIANTS);
        int n = OptionChecks.threads(threads);
        List<Path> files = scenarios.isEmpty() ? defaultDemos() : scenarios;
        List<Method> methodList = new ArrayList<>();
        for (String m : methods) {
            Method method = Method.named(m);
            if (method == null) {
                throw OptionChecks.unreadable("--methods", java.util.Arrays.stream(Method.values()).map(Method::word)
                        .collect(java.util.stream.Collectors.joining(", ")), "\"" + m + "\"");
            }
            methodList.add(method);
        }
        Double end = endTime == null ? null : parseTime(endTime);
        // every input is read and checked before the first measurement
        Map<Path, SolverSettings> settingsOf = new LinkedHashMap<>();
        for (Path file : files) {
            if (!Files.isRegularFile(file)) {
                throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, file, "no such file");
            }
            Scenario base = ScenarioLoader.load(file);
            settingsOf.put(file, end == null ? base.solver() : withEndTime(base, end));
        }
        if (scaling != null) {
            for (int copies : scaling) {
                OptionChecks.count("--scaling", copies, 1, MAX_COPIES);
            }
            try (OutputFolder folder = new OutputFolder(out, files.get(0))) {
                ScalingCase.run(files.get(0), scalingValve, scaling, end, runs, warmup, folder,
                        spec.commandLine().getOut());
                folder.commit();
                spec.commandLine().getOut().printf("results written to %s (scaling.json, scaling.csv)%n", folder.dir());
            }
            return BranchsimMain.OK;
        }
        if (sweepVariants > 0) {
            sweepValue(ScenarioLoader.load(files.get(0)));
        }
        try (OutputFolder folder = new OutputFolder(out, files.toArray(new Path[0]))) {
            measure(files, settingsOf, methodList, end, n, folder);
        }
        return BranchsimMain.OK;
    }

    private void measure(List<Path> files, Map<Path, SolverSettings> settingsOf, List<Method> methodList, Double end,
                         int n, OutputFolder folder) {
        PrintWriter w = spec.commandLine().getOut();
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("cores", Runtime.getRuntime().availableProcessors());
        root.put("java", System.getProperty("java.version"));
        root.put("runs", runs);
        root.put("warmup", warmup);
        ArrayNode results = root.putArray("results");
        StringBuilder csv = new StringBuilder("scenario,method,simulated_s,median_wall_s,min_wall_s,max_wall_s,"
                + "median_cpu_s,min_cpu_s,max_cpu_s,simulated_per_wall,accepted_steps,rejected_steps,evaluations,jacobians,lu_factorisations,events,"
                + "max_pressure_error_rel_range,event_time_max_diff_s,peak_heap_MB,reference_spread_rel_range\n");
        ThreadMXBean cpuClock = ManagementFactory.getThreadMXBean();
        boolean cpuTimed = cpuClock.isCurrentThreadCpuTimeSupported();
        if (cpuTimed && !cpuClock.isThreadCpuTimeEnabled()) {
            cpuClock.setThreadCpuTimeEnabled(true);
        }
        root.put("cpuTimeMeasured", cpuTimed);
        w.printf("%-18s %-9s %9s %9s %9s %9s %9s %8s %8s %8s %8s %8s %10s %8s %8s %7s %8s%n", "scenario", "method", "sim [s]",
                "wall med", "wall min", "wall max", "cpu med", "cpu min", "cpu max", "sim/wall", "steps", "rejected", "evals", "jacobian", "LU",
                "err/range", "heap MB");
        for (Path file : files) {
            Scenario base = ScenarioLoader.load(file);
            SolverSettings settings = settingsOf.get(file);
            SimulationResult reference = null;
            if (!noReference) {
                try {
                    reference = Simulator.run(base.circuit(),
                            settings.withMethod(Method.REFERENCE).withRelativeTolerance(1e-10));
                } catch (BranchsimException e) {
                    w.printf("%s: no reference (Dormand-Prince 8(5,3) at rtol 1e-10 failed: %s)%n", base.name(), e.getMessage());
                }
            }
            double spread = Double.NaN;
            if (reference != null && referenceSpread) {
                try {
                    SimulationResult tighter = Simulator.run(base.circuit(),
                            settings.withMethod(Method.REFERENCE).withRelativeTolerance(TIGHTER_REFERENCE_RTOL));
                    spread = TraceComparison.maxErrorOverRange(tighter.trace(), reference.trace(), Dimension.PRESSURE);
                    w.printf(Locale.ROOT, "%s: references at rtol 1e-10 and 1e-11 differ by %.2g of a pressure's range%n",
                            base.name(), spread);
                } catch (BranchsimException e) {
                    w.printf("%s: no reference spread (Dormand-Prince 8(5,3) at rtol 1e-11 failed: %s)%n", base.name(),
                            e.getMessage());
                }
            }
            for (Method m : methodList) {
                SolverSettings s = settings.withMethod(m);
                for (int i = 0; i < warmup; i++) {
                    Simulator.run(base.circuit(), s);
                }
                double[] walls = new double[runs];
                double[] cpus = new double[runs];
                SimulationResult last = null;
                for (int i = 0; i < runs; i++) {
                    long c0 = cpuTimed ? cpuClock.getCurrentThreadCpuTime() : 0L;
                    long t0 = System.nanoTime();
                    last = Simulator.run(base.circuit(), s);
                    walls[i] = (System.nanoTime() - t0) * 1e-9;
                    cpus[i] = cpuTimed ? (cpuClock.getCurrentThreadCpuTime() - c0) * 1e-9 : Double.NaN;
                }
                double heap = peakHeapMegabytes(base, s);
                ObjectNode o = results.addObject();
                ArrayNode perRun = o.putArray("perRun");
                for (int i = 0; i < runs; i++) {
                    ObjectNode r = perRun.addObject();
                    r.put("wall_s", walls[i]);
                    MetricsReport.putFinite(r, "cpu_s", cpus[i]);
                }
                Arrays.sort(walls);
                Arrays.sort(cpus);
                double median = walls[walls.length / 2];
                double cpuMedian = cpus[cpus.length / 2];
                SolverStatistics st = last.statistics();
                double err = reference == null ? Double.NaN
                        : TraceComparison.maxErrorOverRange(last.trace(), reference.trace(), Dimension.PRESSURE);
                double eventDiff = reference == null ? Double.NaN
                        : TraceComparison.eventTimeDifference(last.events(), reference.events());
                o.put("scenario", base.name());
                o.put("method", st.method());
                o.put("simulated_s", s.endTime());
                o.put("relativeTolerance", s.relativeTolerance());
                o.put("medianWall_s", median);
                o.put("minWall_s", walls[0]);
                o.put("maxWall_s", walls[walls.length - 1]);
                MetricsReport.putFinite(o, "medianCpu_s", cpuMedian);
                MetricsReport.putFinite(o, "minCpu_s", cpus[0]);
                MetricsReport.putFinite(o, "maxCpu_s", cpus[cpus.length - 1]);
                o.put("simulatedPerWall", s.endTime() / median);
                o.put("acceptedSteps", st.acceptedSteps());
                o.put("rejectedSteps", st.rejectedSteps());
                o.put("evaluations", st.evaluations());
                o.put("jacobians", st.jacobians());
                o.put("luFactorisations", st.factorisations());
                o.put("events", st.totalEvents());
                MetricsReport.putFinite(o, "maxPressureErrorOverRange", err);
                MetricsReport.putFinite(o, "eventTimeMaxDifference_s", eventDiff);
                MetricsReport.putFinite(o, "referenceSpreadOverRange", spread);
                o.put("peakHeap_MB", heap);
                csv.append(String.format(Locale.ROOT, "%s,%s,%g,%.6f,%.6f,%.6f,%s,%s,%s,%.1f,%d,%d,%d,%d,%d,%d,%s,%s,%.1f,%s%n",
                        base.name(), m.word(), s.endTime(), median, walls[0],
                        walls[walls.length - 1], seconds(cpuMedian), seconds(cpus[0]), seconds(cpus[cpus.length - 1]),
                        s.endTime() / median, st.acceptedSteps(), st.rejectedSteps(),
                        st.evaluations(), st.jacobians(), st.factorisations(), st.totalEvents(),
                        Double.isNaN(err) ? "" : String.format(Locale.ROOT, "%.3g", err),
                        Double.isNaN(eventDiff) ? "" : String.format(Locale.ROOT, "%.3g", eventDiff), heap,
                        Double.isNaN(spread) ? "" : String.format(Locale.ROOT, "%.3g", spread)));
                w.printf(Locale.ROOT, "%-18s %-9s %9.3g %9.4f %9.4f %9.4f %9.4f %8.4f %8.4f %8.1f %8d %8d %10d %8d %8d %7.2g %8.1f%n",
                        base.name(), m.word(), s.endTime(), median, walls[0],
                        walls[walls.length - 1], cpuMedian, cpus[0], cpus[cpus.length - 1], s.endTime() / median, st.acceptedSteps(), st.rejectedSteps(),
                        st.evaluations(), st.jacobians(), st.factorisations(), err, heap);
                w.flush();
            }
        }
        if (sweepVariants > 0) {
            root.set("sweep", sweep(files.get(0), end, n, w));
        }
        folder.writeText("timing.json", MetricsReport.toJson(root));
        folder.writeText("timing.csv", csv.toString());
        folder.commit();
        w.printf("results written to %s (timing.json, timing.csv)%n", folder.dir());
    }

    /** @return seconds with 6 decimals for timing.csv, empty when the CPU clock is not available */
    private static String seconds(double s) {
        return Double.isNaN(s) ? "" : String.format(Locale.ROOT, "%.6f", s);
    }

    /** @return the settings with the --end-time override, checked against the scenario's output grid */
    private static SolverSettings withEndTime(Scenario base, double end) {
        String grid = SolverSettings.outputGridProblem(end, base.solver().outputInterval(),
                base.circuit().signals().size());
        if (grid != null) {
            throw OptionChecks.outOfRange("--end-time for " + base.file(), grid, SolverSettings.outputGrid(end,
                    base.solver().outputInterval(), base.circuit().signals().size()));
        }
        return base.solver().withEndTime(end);
    }

    /**
     * @return the value the sweep benchmark varies, from the first scenario
     * @throws BranchsimException UNKNOWN_PARAMETER_PATH, PARAMETER_PATH_MALFORMED or PARAMETER_NOT_NUMERIC naming
     *         --sweep-parameter when the path names no number there
     */
    private Object sweepValue(Scenario base) {
        Located at;
        try {
            at = ParameterPath.parse(sweepParameter).find(base.document());
        } catch (BranchsimException e) {
            throw e.within("--sweep-parameter for " + base.file() + " (or --sweep-variants 0)");
        }
        Object current = at instanceof Located.Scalar sc ? sc.value() : null;
        if (ValueText.dimensionOf(current) == null) {
            throw new BranchsimException(ErrorKey.PARAMETER_NOT_NUMERIC, "--sweep-parameter " + sweepParameter,
                    at.describe());
        }
        return current;
    }

    /** @return the demos beside the program or in ./scenarios */
    static List<Path> defaultDemos() {
        List<Path> candidates = new ArrayList<>();
        candidates.add(Path.of("scenarios"));
        try {
            java.security.CodeSource source = TimingCommand.class.getProtectionDomain().getCodeSource();
            if (source != null) {
                Path p = Path.of(source.getLocation().toURI()).toAbsolutePath();
                for (int up = 0; up < 4 && p != null; up++, p = p.getParent()) {
                    candidates.add(p.resolve("scenarios"));
                }
            }
        } catch (java.net.URISyntaxException | IllegalArgumentException | SecurityException e) {
            // the program's own place is unknown: only ./scenarios is searched
        }
        return defaultDemosIn(candidates);
    }

    /**
     * @param candidates folders to look in, in order
     * @return the default demos from the first folder that holds them all
     * @throws BranchsimException DEMOS_NOT_FOUND naming the folders looked in
     */
    static List<Path> defaultDemosIn(List<Path> candidates) {
        List<Path> looked = new ArrayList<>();
        for (Path dir : candidates) {
            looked.add(dir.toAbsolutePath().normalize());
            List<Path> demos = DEFAULT_DEMOS.stream().map(dir::resolve).toList();
            if (demos.stream().allMatch(Files::isRegularFile)) {
                return demos;
            }
        }
        throw new BranchsimException(ErrorKey.DEMOS_NOT_FOUND, String.join(", ", DEFAULT_DEMOS),
                looked.stream().distinct().map(Path::toString).collect(java.util.stream.Collectors.joining(", ")));
    }

    private ObjectNode sweep(Path file, Double end, int n, PrintWriter w) {
        Scenario base = ScenarioLoader.load(file);
        List<Variant> variants = new ArrayList<>();
        Object current = sweepValue(base);
        for (int i = 0; i < sweepVariants; i++) {
            Map<String, Object> values = new LinkedHashMap<>();
            double f = 0.8 + 0.4 * i / Math.max(1, sweepVariants - 1);
            values.put(sweepParameter, ValueText.scale(current, f));
            if (end != null) {
                values.put("solver.endTime", String.format(Locale.ROOT, "%.6g s", end));
            }
            variants.add(new Variant(i, values));
        }
        long t0 = System.nanoTime();
        // each outcome is reduced to whether it ran on its worker thread, so no trace outlives its variant
        List<Boolean> ran = StudyRunner.run(file.toString(), base.document(), variants, n, d -> { }, VariantOutcome::ok);
        double wall = (System.nanoTime() - t0) * 1e-9;
        long failed = ran.stream().filter(ok -> !ok).count();
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("scenario", base.name());
        o.put("parameter", sweepParameter);
        o.put("variants", sweepVariants);
        o.put("threads", n);
        o.put("wall_s", wall);
        o.put("variantsPerSecond", sweepVariants / wall);
        o.put("failed", failed);
        w.printf(Locale.ROOT, "sweep: %d variants of %s (%s from 0.8x to 1.2x) on %d threads: %.2f s wall, %.1f variants/s, %d failed%n",
                sweepVariants, base.name(), sweepParameter, n, wall, sweepVariants / wall, failed);
        return o;
    }

    private static double parseTime(String text) {
        Quantity.Parsed p = Quantity.parse(text, Dimension.TIME);
        FieldBounds.Range bounds = FieldBounds.of("endTime", Dimension.TIME);
        if (!p.ok() || p.si() <= 0 || !bounds.allows(p.si())) {
            throw OptionChecks.outOfRange("--end-time", bounds.expected() + " such as \"10 s\"", "\"" + text + "\"");
        }
        return p.si();
    }

    /** Peak heap during one run, MB: pools' peaks reset after a GC, read after the run (includes garbage). */
    private static double peakHeapMegabytes(Scenario sc, SolverSettings s) {
        System.gc();
        List<MemoryPoolMXBean> pools = ManagementFactory.getMemoryPoolMXBeans();
        for (MemoryPoolMXBean p : pools) {
            p.resetPeakUsage();
        }
        Simulator.run(sc.circuit(), s);
        long peak = 0;
        for (MemoryPoolMXBean p : pools) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        return peak / 1048576.0;
    }
}
