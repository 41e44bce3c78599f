package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.analysis.SignalOscillation;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.measured.ChannelComparison;
import org.branchsim.core.measured.KeyEvents;
import org.branchsim.core.measured.Measurement;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.units.Unit;
import org.branchsim.plots.TraceCharts;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code branchsim compare SCENARIO MEASURED.csv... --map COLUMN=SIGNAL}: runs the scenario, puts the measured
 * channels on its time (see {@link MeasuredInput}) and reports per channel the RMS and peak error, the key events
 * of both records and their differences, and the sustained oscillations in the measured channel matched to the
 * nearest oscillatory mode of the model linearised at the end of the run. Writes compare.txt, compare.json and
 * overlay figures (whole window and zoomed on the landing).
 */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {"Run a scenario and compare it with measured traces: per channel RMS and peak error, "
                + "landing time, peak value and time, settled value and settling time of both, and oscillations "
                + "found in the measured channels matched to the model's modes; overlay figures."})
public final class CompareCommand implements Callable<Integer> {

    /** Time shown before the landing in the zoomed figure, s. */
    static final double ZOOM_BEFORE = 0.02;
    /** Time shown after the landing in the zoomed figure, s. */
    static final double ZOOM_AFTER = 0.15;

    @Mixin
    private ScenarioArgument scenario;

    @Mixin
    private MeasuredInput measured;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "MEASURED", description = MeasuredInput.FILES_DESCRIPTION)
    private List<Path> files;

    @Option(names = "--from", paramLabel = "TIME", description = "Start of the compared window (simulation time).")
    private String from;

    @Option(names = "--to", paramLabel = "TIME", description = "End of the compared window (simulation time).")
    private String to;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-compare).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.load();
        double lo = OptionChecks.time("--from", from, Double.NEGATIVE_INFINITY);
        double hi = OptionChecks.time("--to", to, Double.POSITIVE_INFINITY);
        measured.files(files);
        List<Measurement> raw = measured.read(s.circuit());
        List<Path> inputs = new ArrayList<>(measured.files());
        inputs.add(scenario.file());
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-compare"),
                inputs.toArray(Path[]::new))) {
            // the output grid no coarser than the record's samples: the simulation is read between grid points by
            // linear interpolation, whose error on a steep landing would count as model error
            double grid = Math.min(s.solver().outputInterval(),
                    FitCommand.finestSpacing(raw, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY));
            SimulationResult r = Simulator.run(s.circuit(), s.solver().withOutputInterval(grid));
            MeasuredInput.Aligned aligned = measured.align(raw, r.trace());
            List<Mode> modes;
            String modesNote;
            try {
                modes = ModeAnalysis.onTrajectory(r);
                modesNote = "modes of the model linearised on its state at the end of the run (t = "
                        + fmt(r.trace().time(r.trace().size() - 1)) + " s)";
            } catch (BranchsimException e) {
                modes = List.of();
                modesNote = "modes not computed: " + e.getMessage();
            }
            StringBuilder text = new StringBuilder();
            ObjectNode root = MetricsReport.mapper().createObjectNode();
            root.put("scenario", s.name());
            root.put("alignment", aligned.how());
            root.put("offset_s", aligned.offset());
            root.put("offsetMeaning", "logger time of the simulation's t = 0");
            root.put("errorDefinition", "simulated minus measured, the simulation interpolated linearly at the "
                    + "measured sample times");
            root.put("modes", modesNote);
            text.append(String.format(Locale.ROOT, "compare %s with %s%n", s.name(), measured.files()));
            text.append(String.format(Locale.ROOT, "alignment %s: offset %s s (logger time of the simulation's "
                    + "t = 0)%n", aligned.how(), fmt(aligned.offset())));
            ArrayNode arr = root.putArray("channels");
            for (Measurement m : aligned.measurements()) {
                Trace.Column col = r.trace().columns().get(r.trace().indexOf(m.signal()));
                ChannelComparison c = ChannelComparison.of(m, r.trace().times(), r.trace().series(m.signal()),
                        col.dimension(), lo, hi);
                arr.add(report(c, s, modes, text));
                figures(s, r, m, c, folder);
            }
            text.append(modesNote).append(System.lineSeparator());
            text.append("Caution: ").append(Cautions.SHORT).append(System.lineSeparator());
            root.put("caution", Cautions.SHORT);
            folder.writeText("compare.txt", text.toString());
            folder.writeText("compare.json", MetricsReport.toJson(root));
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.print(text);
            folder.report(w);
        }
        return BranchsimMain.OK;
    }

    private ObjectNode report(ChannelComparison c, Scenario s, List<Mode> modes, StringBuilder text) {
        Unit u = s.units().displayUnit(c.dimension());
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("signal", c.signal());
        o.put("channel", c.channel());
        o.put("unit", u.symbol());
        o.put("from_s", c.from());
        o.put("to_s", c.to());
        o.put("samples", c.samples());
        MetricsReport.putFinite(o, "rmsError", u.fromSi(c.rmsError()) - u.fromSi(0));
        MetricsReport.putFinite(o, "peakError", u.fromSi(c.peakError()) - u.fromSi(0));
        MetricsReport.putFinite(o, "peakErrorTime_s", c.peakErrorTime());
        text.append(String.format(Locale.ROOT, "%s (measured %s), %s s .. %s s, %d samples: RMS error %s %s, "
                        + "peak error %s %s at %s s%n", c.signal(), c.channel(), fmt(c.from()), fmt(c.to()),
                c.samples(), fmt(u.fromSi(c.rmsError()) - u.fromSi(0)), u.symbol(),
                fmt(u.fromSi(c.peakError()) - u.fromSi(0)), u.symbol(), fmt(c.peakErrorTime())));
        if (c.measured() != null) {
            o.set("measured", events(c.measured(), u));
            o.set("simulated", events(c.simulated(), u));
            KeyEvents m = c.measured();
            KeyEvents k = c.simulated();
            text.append(String.format(Locale.ROOT, "  %-16s %14s %14s %14s%n", "key event", "measured", "simulated",
                    "sim - meas"));
            row(text, "landing [s]", m.landingTime(), k.landingTime());
            row(text, "peak [" + u.symbol() + "]", u.fromSi(m.peak()), u.fromSi(k.peak()));
            row(text, "peak time [s]", m.peakTime(), k.peakTime());
            row(text, "settled [" + u.symbol() + "]", u.fromSi(m.settled()), u.fromSi(k.settled()));
            row(text, "settling [s]", m.settlingTime(), k.settlingTime());
        }
        ArrayNode osc = o.putArray("measuredOscillations");
        if (c.oscillations().isEmpty()) {
            text.append("  no sustained oscillation in the measured channel\n");
        }
        for (SignalOscillation so : c.oscillations()) {
            ObjectNode j = osc.addObject();
            j.put("frequency_Hz", so.frequency());
            j.put("endAmplitude", u.fromSi(so.endAmplitude()) - u.fromSi(0));
            j.put("trend", so.trend().label());
            Mode near = nearest(modes, so.frequency());
            String match = "no oscillatory mode of the model";
            if (near != null) {
                j.put("nearestMode", near.name());
                j.put("nearestModeDampedFrequency_Hz", near.dampedFrequency());
                j.put("nearestModeDampingRatio", near.dampingRatio());
                j.put("frequencyRatio", near.dampedFrequency() / so.frequency());
                match = String.format(Locale.ROOT, "nearest mode %s at %.1f Hz (zeta %.3f), ratio %.2f", near.name(),
                        near.dampedFrequency(), near.dampingRatio(), near.dampedFrequency() / so.frequency());
            }
            text.append(String.format(Locale.ROOT, "  measured oscillation %.1f Hz, amplitude %s %s at the end "
                    + "(%s): %s%n", so.frequency(), fmt(u.fromSi(so.endAmplitude()) - u.fromSi(0)), u.symbol(),
                    so.trend().label(), match));
        }
        return o;
    }

    /** @return the oscillatory mode whose damped frequency is nearest in ratio, or null */
    static Mode nearest(List<Mode> modes, double f) {
        Mode best = null;
        for (Mode m : modes) {
            if (m.oscillatory() && (best == null
                    || Math.abs(Math.log(m.dampedFrequency() / f)) < Math.abs(Math.log(best.dampedFrequency() / f)))) {
                best = m;
            }
        }
        return best;
    }

    private static void row(StringBuilder sb, String name, double meas, double sim) {
        sb.append(String.format(Locale.ROOT, "  %-16s %14s %14s %14s%n", name, fmt(meas), fmt(sim), fmt(sim - meas)));
    }

    private static ObjectNode events(KeyEvents e, Unit u) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        MetricsReport.putFinite(o, "landingTime_s", e.landingTime());
        MetricsReport.putFinite(o, "peak", u.fromSi(e.peak()));
        MetricsReport.putFinite(o, "peakTime_s", e.peakTime());
        MetricsReport.putFinite(o, "settled", u.fromSi(e.settled()));
        MetricsReport.putFinite(o, "settlingTime_s", e.settlingTime());
        return o;
    }

    private static void figures(Scenario s, SimulationResult r, Measurement m, ChannelComparison c, OutputFolder folder) {
        Trace.Column col = r.trace().columns().get(r.trace().indexOf(m.signal()));
        Trace meas = new Trace(List.of(new Trace.Column(m.signal(), col.dimension())));
        double[] t = m.time();
        double[] x = m.values();
        for (int k = 0; k < t.length; k++) {
            if (t[k] >= c.from() && t[k] <= c.to()) {
                meas.add(t[k], new double[] {x[k]});
            }
        }
        if (meas.size() < 2) {
            return;
        }
        List<TraceCharts.Labelled> runs = List.of(new TraceCharts.Labelled("measured " + m.channel(), meas),
                new TraceCharts.Labelled("simulated", r.trace()));
        String stem = "compare-" + m.signal().toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9.-]", "-");
        folder.write(stem + ".png", target -> TraceCharts.compare(runs, m.signal(), "Measured and simulated "
                + m.signal(), s.units(), target, c.from(), c.to()));
        double landing = c.measured() != null && Double.isFinite(c.measured().landingTime())
                ? c.measured().landingTime() : Double.NaN;
        if (Double.isFinite(landing)) {
            folder.write(stem + "-landing.png", target -> TraceCharts.compare(runs, m.signal(), "Measured and "
                    + "simulated " + m.signal() + " at the landing", s.units(), target, landing - ZOOM_BEFORE,
                    landing + ZOOM_AFTER));
        }
    }

    private static String fmt(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "-";
    }
}
