package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ScanWindow;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.Diagnosis;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import org.branchsim.plots.CycleChart;
import org.branchsim.plots.TraceCharts;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim diagnose SCENARIO}: finds hunting or chatter, ties each oscillation to its mode at the operating
 * point and names its parts, finds on the linear model the changes that damp it with margin, confirms them in the
 * time domain, and recommends the one that costs the job least, with before/after figures.
 */
@Command(name = "diagnose", mixinStandardHelpOptions = true,
        description = "Find hunting or chatter, name the parts that oscillate, find the changes that damp it with "
                + "margin (linear model at the operating point, confirmed by a run) and recommend one, with "
                + "before/after figures.")
public final class DiagnoseCommand implements Callable<Integer> {

    /** Cycles shown in the zoomed before/after figures. */
    static final int ZOOM_CYCLES = 6;

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--threads", paramLabel = "N", description = "Threads for the remedy runs (default: all cores).")
    private Integer threads;

    @Option(names = "--margin", paramLabel = "ZETA",
            description = "Damping ratio every mode of the oscillation must reach for a change to count as a cure "
                    + "(default: ${DEFAULT-VALUE}).", defaultValue = "0.05")
    private double margin;

    @Option(names = "--window", paramLabel = "FROM..TO",
            description = "Scan only this stretch of the run, e.g. \"0.4 s..0.6 s\" (default: the later half of "
                    + "every interval between schedule changes).")
    private String window;

    @Option(names = "--on-trajectory",
            description = "When the circuit has no operating point, list modes about the simulated state instead.")
    private boolean onTrajectory;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-diagnosis).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        if (!(margin > 0.0 && margin < 1.0)) {
            throw OptionChecks.outOfRange("--margin", "a damping ratio between 0 and 1 (exclusive)", String.valueOf(margin));
        }
        int n = OptionChecks.threads(threads);
        Scenario s = scenario.load();
        ScanWindow given = window == null ? null : parseWindow(window, s.solver().endTime());
        PrintWriter err = spec.commandLine().getErr();
        VariantProgress progress = new VariantProgress(err, -1);
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-diagnosis"),
                scenario.file())) {
            Diagnosis.Report r = Diagnosis.run(s, new Diagnosis.Options(margin, given, onTrajectory, n),
                    progress::done);
            err.println();
            String text = DiagnosisText.text(r);
            folder.writeText("diagnosis.txt", text);
            folder.writeText("diagnosis.json", MetricsReport.toJson(DiagnosisJson.of(r)));
            int k = 0;
            for (Diagnosis.FindingDiagnosis d : r.diagnosed()) {
                k++;
                figures(folder, s, r, d, k);
            }
            ReportPage.diagnose(s, text, folder);
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.print(text);
            folder.report(w);
        }
        return BranchsimMain.OK;
    }

    /**
     * Before/after figures of one finding: the whole interval, and a zoom on its last few cycles drawn from samples
     * that resolve the waveform ({@link WaveformRun}: a re-run on a finer grid when the run's is too coarse), with
     * each run's seat and stop impacts marked and the sample spacing stated.
     */
    private static void figures(OutputFolder folder, Scenario s, Diagnosis.Report r, Diagnosis.FindingDiagnosis d,
                                int k) {
        OscillationFinding f = d.finding();
        ScanWindow w = f.window();
        double zoomFrom = Math.max(w.changeEnd(), w.to() - ZOOM_CYCLES / f.frequency());
        List<TraceCharts.Labelled> runs = new ArrayList<>();
        List<CycleChart.Run> zoomed = new ArrayList<>();
        List<WaveformRun> fine = new ArrayList<>();
        runs.add(new TraceCharts.Labelled("as is", r.baseline().trace()));
        fine.add(WaveformRun.of(r.baseline(), f.frequency(), w.to()));
        Diagnosis.Trial best = d.recommended();
        if (best != null) {
            runs.add(new TraceCharts.Labelled("with " + best.value() + " (" + best.linear().knob().path() + ")",
                    best.outcome().result().trace()));
            fine.add(WaveformRun.of(best.outcome().result(), f.frequency(), w.to()));
        }
        for (int i = 0; i < runs.size(); i++) {
            String label = runs.get(i).label();
            WaveformRun run = fine.get(i);
            zoomed.add(new CycleChart.Run(new TraceCharts.Labelled(label, run.trace()), run.impacts(zoomFrom, w.to()),
                    run.impactLabel(label, zoomFrom, w.to())));
        }
        String sampling = fine.stream().map(WaveformRun::sampling).distinct()
                .reduce((a, b) -> "as is: " + a + "; after: " + b).orElseThrow();
        List<String> signals = new ArrayList<>();
        signals.add(f.dominant().signal());
        ReducingValve.firstOutletSignal(r.baseline().model()).ifPresent(o -> {
            if (!signals.contains(o)) {
                signals.add(o);
            }
        });
        for (String signal : signals) {
            String slug = FigureSet.slug(signal);
            String title = String.format(Locale.ROOT, "%s, finding %d (%s at %.1f Hz): before and after", s.name(), k,
                    f.label(), f.frequency());
            folder.write("finding" + k + "-" + slug + "-interval.png",
                    p -> TraceCharts.compare(runs, signal, title, s.units(), p, w.changeEnd(), w.to()));
            folder.write("finding" + k + "-" + slug + "-cycles.png", new CycleChart.Figure(zoomed, signal,
                    title + ", last " + ZOOM_CYCLES + " cycles", sampling, s.units(), zoomFrom, w.to())::save);
        }
    }

    /** Parses "FROM..TO" (two times with units) into a window inside the run. */
    static ScanWindow parseWindow(String text, double endTime) {
        String[] ends = text.split("\\.\\.", -1);
        BranchsimException refused = OptionChecks.unreadable("--window", "two times with units inside the run (0 to "
                + org.branchsim.core.study.ValueText.format(endTime) + " s), e.g. \"0.4 s..0.6 s\"", "\"" + text + "\"");
        if (ends.length != 2) {
            throw refused;
        }
        Quantity.Parsed a = Quantity.parse(ends[0].trim(), Dimension.TIME);
        Quantity.Parsed b = Quantity.parse(ends[1].trim(), Dimension.TIME);
        if (!a.ok() || !b.ok() || !(a.si() >= 0.0) || !(b.si() > a.si()) || b.si() > endTime) {
            throw refused;
        }
        return ScanWindow.given(a.si(), b.si());
    }
}
