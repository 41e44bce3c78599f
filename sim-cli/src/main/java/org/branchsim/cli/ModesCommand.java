package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Member;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim modes SCENARIO --at TIME}: runs to TIME, finds the circuit's operating point there (a
 * Newton solve started from the mean of each state over the last {@link #START_FRACTION} of [0, TIME], but
 * over at least the last {@link #START_MINIMUM} s, or all of it when TIME is shorter; members held the way
 * the run ends), linearises about it and reports every mode's frequency, damping ratio, stability verdict
 * against a damping-ratio margin, and the parts that take part. With {@code --on-trajectory} it linearises
 * about the simulated state at TIME instead. Writes modes.json and modes.csv.
 */
@Command(name = "modes", mixinStandardHelpOptions = true,
        description = {"Find the circuit's operating point at a time, linearise about it and list its modes: "
                + "natural frequency, damping ratio, verdict (UNSTABLE with its growth rate, LOW below the "
                + "damping-ratio margin) and the parts that take part most.",
            "The Newton solve starts from the mean of each state over the last 10 %% of the run to TIME "
                + "(at least the last 20 ms)."})
public final class ModesCommand implements Callable<Integer> {

    /** Fraction of [0, TIME] whose state means start the Newton solve. */
    static final double START_FRACTION = 0.1;
    /** Shortest averaging window for the Newton start, s (unless TIME itself is shorter). */
    static final double START_MINIMUM = 0.020;
    /** Shares below this are left out of the output files. */
    static final double OUTPUT_SHARE = 0.001;
    /** Parts, elements or components shown per mode on the console. */
    static final int CONSOLE_SHARES = 4;

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--at", required = true, paramLabel = "TIME", description = "Time to linearise at, e.g. \"1.2 s\".")
    private String at;

    @Option(names = "--on-trajectory", description = "Linearise about the simulated state at TIME instead of the "
            + "operating point (indicative only when the circuit moves or oscillates there).")
    private boolean onTrajectory;

    @Option(names = "--margin", paramLabel = "ZETA", defaultValue = "0.05",
            description = "Damping-ratio margin between 0 and 1: oscillatory modes below it are flagged LOW "
                    + "(default: ${DEFAULT-VALUE}).")
    private String margin;

    @Option(names = "--all", description = "List real (non-oscillatory) stable modes too.")
    private boolean all;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-modes).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Quantity.Parsed parsed = Quantity.parse(at, Dimension.TIME);
        if (!parsed.ok() || !(parsed.si() > 0)) {
            throw OptionChecks.unreadable("--at", "a positive time such as \"1.2 s\"", "\"" + at + "\"");
        }
        double zeta = margin();
        Scenario s = scenario.load();
        double t = parsed.si();
        double end = s.solver().endTime();
        if (t > end * (1 + 1e-12)) {
            throw OptionChecks.outOfRange("--at", "a time in (0 s, " + ValueText.format(end) + " s] (the scenario's end time)",
                    "\"" + at + "\"");
        }
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-modes"),
                scenario.file())) {
            return report(s, t, zeta, folder);
        }
    }

    private int report(Scenario s, double t, double zeta, OutputFolder folder) {
        SimulationResult r = Simulator.run(s.circuit(), s.solver().withEndTime(t));
        CircuitModel circuit = s.circuit();
        PrintWriter w = spec.commandLine().getOut();
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("scenario", s.name());
        root.put("time_s", t);
        root.put("margin", zeta);
        root.put("caution", Cautions.SHORT);
        List<Mode> modes;
        Map<String, Member.Mode> held;
        OperatingPoint op = null;
        String about;
        if (onTrajectory) {
            modes = ModeAnalysis.onTrajectory(r);
            held = r.description().finalModes();
            about = "trajectory";
            w.printf(Locale.ROOT, "modes of %s linearised on the trajectory at t = %s s: about the simulated state, "
                    + "which is not an operating point where the circuit moves or oscillates (indicative only)%n",
                    s.name(), ValueText.format(t));
            root.put("linearisedAbout", "the simulated state at t (on the trajectory)");
        } else {
            double from = Math.max(0.0, t - Math.max(START_FRACTION * t, START_MINIMUM));
            op = OperatingPointSolver.solve(circuit, t, OperatingPointSolver.startFrom(r, from, t));
            modes = ModeAnalysis.at(circuit, op);
            held = op.held();
            about = "operating point";
            w.printf(Locale.ROOT, "modes of %s linearised about its operating point at t = %s s (members held at a "
                    + "seat or stop stay held)%n", s.name(), ValueText.format(t));
            w.printf(Locale.ROOT, "operating point: Newton converged in %d iterations, %d held-set changes; residual "
                    + "max|f_i|/s_i = %.3g 1/s (largest in %s); started from the mean state over %s s .. %s s%n",
                    op.iterations(), op.switches(), op.residual(), op.worstState(), ValueText.format(from),
                    ValueText.format(t));
            if (circuit.timeDependentAt(t)) {
                w.println("inputs are ramping at this time: the operating point is that of the inputs frozen at "
                        + "their values at t");
            }
            root.put("linearisedAbout", "the operating point at t (f(y) = 0, inputs frozen at t)");
            root.set("operatingPoint", operatingPoint(op, from, t));
        }
        w.println("held members: " + held(held));
        root.set("heldMembers", heldJson(held));
        w.printf("%3s %10s %10s %9s  %-8s %12s %12s  %s%n", "#", "f_n [Hz]", "f_d [Hz]", "zeta", "verdict",
                "growth [1/s]", "doubling [s]", "mode: parts taking part (share)");
        ArrayNode arr = root.putArray("modes");
        StringBuilder csv = new StringBuilder("mode,name,verdict,real_1_per_s,imaginary_rad_per_s,natural_frequency_Hz,"
                + "damped_frequency_Hz,damping_ratio,growth_rate_1_per_s,doubling_time_s,parts,elements,components,"
                + "linearised_about,time_s,op_residual_1_per_s,op_residual_state,held_members\n");
        int k = 0;
        for (Mode m : modes) {
            k++;
            Mode.Verdict v = m.verdict(zeta);
            boolean unstable = v == Mode.Verdict.UNSTABLE;
            if (m.oscillatory() || unstable || all) {
                w.printf(Locale.ROOT, "%3d %10.2f %10.2f %9.4f  %-8s %12s %12s  %s: %s%n", k, m.naturalFrequency(),
                        m.dampedFrequency(), m.dampingRatio(), v == Mode.Verdict.OK ? "" : v.name(),
                        unstable ? String.format(Locale.ROOT, "%.4g", m.growthRate()) : "",
                        unstable ? String.format(Locale.ROOT, "%.4g", m.doublingTime()) : "",
                        m.name(), shares(m.parts(), CONSOLE_SHARES, OUTPUT_SHARE, true));
                w.printf("%70s elements: %s; eigenvector (scaled states): %s%n", "",
                        shares(m.elements(), CONSOLE_SHARES, OUTPUT_SHARE, true),
                        shares(m.components(), CONSOLE_SHARES, OUTPUT_SHARE, false));
            }
            arr.add(modeJson(k, m, v));
            csv.append(String.format(Locale.ROOT, "%d,%s,%s,%.9g,%.9g,%.9g,%.9g,%.6g,%s,%s,%s,%s,%s,%s,%.9g,%s,%s,%s%n",
                    k, StudyTable.field(m.name()), v, m.real(), m.imaginary(), m.naturalFrequency(), m.dampedFrequency(),
                    m.dampingRatio(), unstable ? String.format(Locale.ROOT, "%.6g", m.growthRate()) : "",
                    unstable ? String.format(Locale.ROOT, "%.6g", m.doublingTime()) : "",
                    StudyTable.field(shares(m.parts(), Integer.MAX_VALUE, OUTPUT_SHARE, true)),
                    StudyTable.field(shares(m.elements(), Integer.MAX_VALUE, OUTPUT_SHARE, true)),
                    StudyTable.field(shares(m.components(), Integer.MAX_VALUE, OUTPUT_SHARE, false)),
                    about, t, op == null ? "" : String.format(Locale.ROOT, "%.6g", op.residual()),
                    op == null ? "" : op.worstState(), StudyTable.field(held(held))));
        }
        long unstableCount = modes.stream().filter(m -> m.verdict(zeta) == Mode.Verdict.UNSTABLE).count();
        long low = modes.stream().filter(m -> m.verdict(zeta) == Mode.Verdict.LOW).count();
        w.printf(Locale.ROOT, "%d modes, %d oscillatory: %d UNSTABLE (damping ratio below 0), %d LOW (damping ratio "
                + "below the margin %s)%n", modes.size(), modes.stream().filter(Mode::oscillatory).count(),
                unstableCount, low, ValueText.format(zeta));
        folder.writeText("modes.json", MetricsReport.toJson(root));
        folder.writeText("modes.csv", csv.toString());
        folder.commit();
        w.printf("outputs written to %s (modes.json, modes.csv)%n", folder.dir());
        w.println("Caution: " + Cautions.SHORT);
        return BranchsimMain.OK;
    }

    private double margin() {
        double zeta;
        try {
            zeta = Double.parseDouble(margin.trim());
        } catch (NumberFormatException e) {
            zeta = Double.NaN;
        }
        if (!(zeta > 0.0 && zeta < 1.0)) {
            throw OptionChecks.outOfRange("--margin", "a damping ratio between 0 and 1 (exclusive), such as 0.05",
                    "\"" + margin + "\"");
        }
        return zeta;
    }

    private static ObjectNode operatingPoint(OperatingPoint op, double from, double to) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("converged", op.converged());
        o.put("iterations", op.iterations());
        o.put("heldSetChanges", op.switches());
        o.put("residual_1_per_s", op.residual());
        o.put("residualDefinition", "max over free states of |f_i| / s_i, s_i the state's typical magnitude");
        o.put("residualLargestIn", op.worstState());
        o.put("residualLargestRate_SI_per_s", op.worstRate());
        o.put("startWindowFrom_s", from);
        o.put("startWindowTo_s", to);
        o.put("startRule", "mean of each state over the last 10 % of [0, t], at least the last 20 ms");
        ObjectNode st = o.putObject("state_SI");
        op.stateByName().forEach(st::put);
        return o;
    }

    private static ObjectNode modeJson(int index, Mode m, Mode.Verdict v) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("mode", index);
        o.put("name", m.name());
        o.put("verdict", v.name());
        o.put("real_1_per_s", m.real());
        o.put("imaginary_rad_per_s", m.imaginary());
        o.put("naturalFrequency_Hz", m.naturalFrequency());
        o.put("dampedFrequency_Hz", m.dampedFrequency());
        o.put("dampingRatio", m.dampingRatio());
        if (v == Mode.Verdict.UNSTABLE) {
            o.put("growthRate_1_per_s", m.growthRate());
            o.put("doublingTime_s", m.doublingTime());
        } else {
            o.putNull("growthRate_1_per_s");
            o.putNull("doublingTime_s");
        }
        putShares(o.putObject("parts"), m.parts());
        putShares(o.putObject("elements"), m.elements());
        putShares(o.putObject("states"), m.participation());
        putShares(o.putObject("components"), m.components());
        return o;
    }

    private static void putShares(ObjectNode target, List<Mode.Share> shares) {
        shares.stream().filter(sh -> sh.share() >= OUTPUT_SHARE).forEach(sh -> target.put(sh.name(), sh.share()));
    }

    private static ObjectNode heldJson(Map<String, Member.Mode> held) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        held.forEach((id, mode) -> o.put(id, stop(mode)));
        return o;
    }

    private static String held(Map<String, Member.Mode> held) {
        if (held.isEmpty()) {
            return "none";
        }
        return held.entrySet().stream().map(e -> e.getKey() + " at its " + stop(e.getValue()))
                .collect(Collectors.joining(", "));
    }

    private static String stop(Member.Mode mode) {
        return mode == Member.Mode.AT_LOWER_STOP ? "lower stop" : "upper stop";
    }

    private static String shares(List<Mode.Share> list, int most, double least, boolean percent) {
        return list.stream().filter(sh -> sh.share() >= least).limit(most)
                .map(sh -> percent ? String.format(Locale.ROOT, "%s %.1f%%", sh.name(), 100 * sh.share())
                        : String.format(Locale.ROOT, "%s %.3f", sh.name(), sh.share()))
                .collect(Collectors.joining(", "));
    }
}
