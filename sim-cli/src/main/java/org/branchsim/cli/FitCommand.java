package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.branchsim.core.estimate.FitResult;
import org.branchsim.core.estimate.FreeParameter;
import org.branchsim.core.estimate.LeastSquaresFit;
import org.branchsim.core.estimate.NoiseEstimate;
import org.branchsim.core.estimate.TraceResiduals;
import org.branchsim.core.measured.Measurement;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code branchsim fit SCENARIO MEASURED.csv... --map COLUMN=SIGNAL --free PATH[=LOW..HIGH]}: estimates the free
 * parameters by weighted least squares on the aligned traces (see {@link LeastSquaresFit}), each channel weighted
 * by the inverse of its noise variance estimated from the measured record itself ({@link NoiseEstimate}).
 * Reports each value with its approximate 95 % confidence interval, the correlations, the cost before and
 * after, which parameters are not identifiable, and writes the fitted scenario (fitted.json), fit.json and
 * fit.txt. The alignment is found once, with the scenario as given, and kept during the fit.
 */
@Command(name = "fit", mixinStandardHelpOptions = true,
        description = {"Estimate free parameters from measured traces by weighted least squares "
                + "(Levenberg-Marquardt): values with approximate 95 %% confidence intervals, correlations, residual "
                + "before and after, identifiability; writes the fitted scenario."})
public final class FitCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Mixin
    private MeasuredInput measured;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "MEASURED", description = MeasuredInput.FILES_DESCRIPTION)
    private List<Path> files;

    @Option(names = "--free", required = true, paramLabel = "PATH[=LOW..HIGH]",
            description = "A parameter to estimate and its bounds, e.g. "
                    + "\"elements.reducer.dampingOrifice.diameter=0.4 mm..1.2 mm\" (default bounds: half to double "
                    + "the scenario's value). Repeatable.")
    private List<String> free;

    @Option(names = "--from", paramLabel = "TIME", description = "Start of the fitted window (simulation time).")
    private String from;

    @Option(names = "--to", paramLabel = "TIME", description = "End of the fitted window (simulation time).")
    private String to;

    @Option(names = "--starts", defaultValue = "8", paramLabel = "N",
            description = "Candidate starts screened by their cost: the scenario's values and Halton points "
                    + "(default: ${DEFAULT-VALUE}).")
    private int starts;

    @Option(names = "--descents", defaultValue = "2", paramLabel = "N",
            description = "Levenberg-Marquardt descents from the cheapest candidates (default: ${DEFAULT-VALUE}).")
    private int descents;

    @Option(names = "--iterations", defaultValue = "20", paramLabel = "N",
            description = "Levenberg-Marquardt iterations per descent (default: ${DEFAULT-VALUE}).")
    private int iterations;

    @Option(names = "--shift-range", defaultValue = "1 ms", paramLabel = "TIME",
            description = "Refine the record's time offset within +- TIME as one more free parameter; \"0 s\" keeps "
                    + "the alignment as found (default: ${DEFAULT-VALUE}).")
    private String shiftRange;

    @Option(names = "--threads", paramLabel = "N", description = "Threads (default: the number of cores).")
    private Integer threads;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-fit).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        OptionChecks.count("--starts", starts, 1, 1000);
        OptionChecks.count("--descents", descents, 1, 100);
        OptionChecks.count("--iterations", iterations, 1, 1000);
        int nThreads = OptionChecks.threads(threads);
        Scenario s = scenario.load();
        Located doc = s.document();
        List<FreeParameter> params = FreeOption.parse(free, doc);
        measured.files(files);
        List<Measurement> raw = measured.read(s.circuit());
        double shiftRangeS = OptionChecks.time("--shift-range", shiftRange, 0.0);
        if (!(shiftRangeS >= 0.0) || shiftRangeS > MAX_SHIFT_RANGE) {
            throw OptionChecks.outOfRange("--shift-range", "a time from 0 s to " + ValueText.format(MAX_SHIFT_RANGE)
                    + " s", "\"" + shiftRange + "\"");
        }
        double lo = OptionChecks.time("--from", from, 0.0);
        double hi = OptionChecks.time("--to", to, s.solver().endTime());
        List<Path> inputs = new ArrayList<>(files);
        inputs.add(scenario.file());
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-fit"),
                inputs.toArray(Path[]::new))) {
            SimulationResult r = Simulator.run(s.circuit(), s.solver());
            MeasuredInput.Aligned aligned = measured.align(raw, r.trace());
            double wFrom = Math.max(lo, 0.0);
            double wTo = Math.min(hi, s.solver().endTime());
            for (Measurement m : aligned.measurements()) {
                wFrom = Math.max(wFrom, m.start());
                wTo = Math.min(wTo, m.end());
            }
            if (!(wTo > wFrom)) {
                throw OptionChecks.outOfRange("--from/--to", "a window where the scenario and every measured channel "
                        + "overlap", ValueText.format(wFrom) + " s .. " + ValueText.format(wTo) + " s");
            }
            double[] sigma = new double[aligned.measurements().size()];
            for (int c = 0; c < sigma.length; c++) {
                double[] x = window(aligned.measurements().get(c), wFrom, wTo);
                double scale = 0;
                for (double v : x) {
                    scale = Math.max(scale, Math.abs(v));
                }
                sigma[c] = Math.max(NoiseEstimate.sigma(x), SIGMA_FLOOR * scale + Double.MIN_NORMAL);
            }
            // the model's output grid no coarser than the record's samples: reading the simulation between grid
            // points is linear interpolation, whose error on a landing that rises 20 bar per ms would otherwise
            // be many noise deviations
            double grid = Math.min(s.solver().outputInterval(), finestSpacing(aligned.measurements(), wFrom, wTo));
            Map<String, Object> fixedValues = new java.util.LinkedHashMap<>();
            fixedValues.put("solver.endTime", ValueText.format(Math.min(s.solver().endTime(), wTo + END_MARGIN))
                    + " s");
            fixedValues.put("solver.outputInterval", ValueText.format(grid) + " s");
            TraceResiduals model = new TraceResiduals(s.file(), doc, params, fixedValues,
                    aligned.measurements(), sigma, wFrom, wTo, nThreads, shiftRangeS);
            double[] scenarioU = new double[model.parameters()];
            java.util.Arrays.fill(scenarioU, 0.5);
            for (int k = 0; k < params.size(); k++) {
                double v = FreeOption.current(params.get(k), doc);
                scenarioU[k] = Double.isNaN(v) ? 0.5 : Math.max(0, Math.min(1, params.get(k).scaled(v)));
            }
            List<String> names = new ArrayList<>(params.stream().map(FreeParameter::path).toList());
            if (model.refinesShift()) {
                names.add(SHIFT_NAME);
            }
            FitResult fit = LeastSquaresFit.fit(model, LeastSquaresFit.starts(model.parameters(), starts, scenarioU),
                    descents, iterations, names);
            Located fitted = doc.copy();
            Map<String, Object> values = model.values(fit.optimum());
            for (FreeParameter p : params) {
                ParameterPath.parse(p.path()).setOrAdd(fitted, values.get(p.path()));
            }
            String text = report(s, aligned, params, sigma, wFrom, wTo, scenarioU, fit, model);
            folder.writeText("fitted.json", LocatedJson.text(fitted));
            folder.writeText("fit.json", MetricsReport.toJson(json(s, aligned, params, sigma, wFrom, wTo, fit, model)));
            folder.writeText("fit.txt", text);
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.print(text);
            folder.report(w);
        }
        return BranchsimMain.OK;
    }

    /** Name of the alignment refinement among the fit's parameters. */
    static final String SHIFT_NAME = "time offset refinement";
    /** Largest --shift-range, s. */
    static final double MAX_SHIFT_RANGE = 0.1;

    /** Smallest noise standard deviation used, as a fraction of the channel's largest magnitude. */
    static final double SIGMA_FLOOR = 1e-4;
    /** Time simulated beyond the fitted window, s. */
    static final double END_MARGIN = 0.005;

    /** @return the smallest spacing of the measured samples inside the window, s (infinity when none) */
    static double finestSpacing(List<Measurement> measured, double from, double to) {
        double finest = Double.POSITIVE_INFINITY;
        for (Measurement m : measured) {
            double[] t = m.time();
            for (int k = 1; k < t.length; k++) {
                if (t[k] >= from && t[k - 1] <= to && t[k] > t[k - 1]) {
                    finest = Math.min(finest, t[k] - t[k - 1]);
                }
            }
        }
        return finest;
    }

    private static double[] window(Measurement m, double from, double to) {
        double[] t = m.time();
        double[] x = m.values();
        List<Double> keep = new ArrayList<>();
        for (int k = 0; k < t.length; k++) {
            if (t[k] >= from && t[k] <= to) {
                keep.add(x[k]);
            }
        }
        return keep.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static String report(Scenario s, MeasuredInput.Aligned a, List<FreeParameter> params, double[] sigma,
                                 double from, double to, double[] scenarioU, FitResult fit, TraceResiduals model) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "fit of %s: %d residuals from %d channel(s), %s s .. %s s; alignment %s, "
                + "offset %s s%n", s.name(), fit.observations(), a.measurements().size(), ValueText.format(from),
                ValueText.format(to), a.how(), ValueText.format(a.offset())));
        for (int c = 0; c < sigma.length; c++) {
            Measurement m = a.measurements().get(c);
            sb.append(String.format(Locale.ROOT, "  weight of %s (%s): 1/sigma^2, sigma %s %s estimated from the record's "
                    + "second differences%n", m.signal(), m.channel(),
                    ValueText.format(s.units().displayUnit(Dimension.PRESSURE).fromSi(sigma[c])),
                    s.units().displayUnit(Dimension.PRESSURE).symbol()));
        }
        sb.append(String.format(Locale.ROOT, "weighted sum of squares: %s at the first start -> %s at the optimum "
                + "(s^2 = %s with %d degrees of freedom; about 1 when the weights are the noise)%n",
                ValueText.format(fit.costBefore()), ValueText.format(fit.costAfter()), ValueText.format(fit.variance()),
                fit.observations() - model.parameters()));
        if (model.refinesShift()) {
            int k = params.size();
            double delta = model.shift(fit.optimum());
            double half = fit.halfWidth()[k] * 2.0 * model.shiftRange();
            sb.append(String.format(Locale.ROOT, "alignment refined as a free parameter: the record's offset %s s -> "
                    + "%s s (+- %s s, 95 %%; searched within +- %s s)%n", ValueText.format(a.offset()),
                    ValueText.format(a.offset() - delta), Double.isFinite(half) ? ValueText.format(half)
                    : "undetermined", ValueText.format(model.shiftRange())));
        }
        sb.append(String.format(Locale.ROOT, "%d model runs, %d Levenberg-Marquardt iterations in the best descent%n",
                fit.modelRuns(), fit.iterations()));
        sb.append(String.format(Locale.ROOT, "%-46s %12s %12s %14s %22s%n", "parameter", "scenario", "estimate",
                "95 % CI +-", "bounds"));
        for (int k = 0; k < params.size(); k++) {
            FreeParameter p = params.get(k);
            double est = p.value(fit.optimum()[k]);
            double half = fit.halfWidth()[k] * p.range();
            boolean atBound = fit.optimum()[k] <= 1e-6 || fit.optimum()[k] >= 1 - 1e-6;
            sb.append(String.format(Locale.ROOT, "%-46s %12s %12s %14s %22s%s%n", p.path(),
                    ValueText.format(p.value(scenarioU[k])) + " " + p.unit(), ValueText.format(est) + " " + p.unit(),
                    Double.isFinite(half) ? ValueText.format(half) + " " + p.unit() : "undetermined",
                    ValueText.format(p.low()) + " .. " + ValueText.format(p.high()) + " " + p.unit(),
                    atBound ? "  AT BOUND (the interval assumes an interior optimum)" : ""));
            if (fit.identifiability().get(k) != null) {
                sb.append("    ").append(fit.identifiability().get(k)).append(System.lineSeparator());
            }
        }
        sb.append(String.format(Locale.ROOT, "condition index of the column-scaled Jacobian: %.3g (not identifiable "
                + "above %.0f)%n", fit.conditionIndex(), LeastSquaresFit.CONDITION_LIMIT));
        sb.append("correlations of the estimates:").append(System.lineSeparator());
        for (int a1 = 0; a1 < params.size(); a1++) {
            StringBuilder row = new StringBuilder("  ");
            for (int b = 0; b < params.size(); b++) {
                row.append(String.format(Locale.ROOT, "%8.3f", fit.correlation()[a1][b]));
            }
            sb.append(row).append("  ").append(params.get(a1).path()).append(System.lineSeparator());
        }
        sb.append("intervals: u +- t(0.975, n - p) sqrt(s^2 (J^T J)^-1) (Bates and Watts 1988), linearised at the "
                + "optimum").append(System.lineSeparator());
        sb.append("fitted scenario: fitted.json (feed it to diagnose)").append(System.lineSeparator());
        sb.append("Caution: ").append(Cautions.SHORT).append(System.lineSeparator());
        return sb.toString();
    }

    private static ObjectNode json(Scenario s, MeasuredInput.Aligned a, List<FreeParameter> params, double[] sigma,
                                   double from, double to, FitResult fit, TraceResiduals model) {
        ObjectNode o = MetricsReport.mapper().createObjectNode();
        o.put("scenario", s.name());
        o.put("from_s", from);
        o.put("to_s", to);
        o.put("alignment", a.how());
        o.put("offset_s", a.offset());
        if (model.refinesShift()) {
            double delta = model.shift(fit.optimum());
            o.put("refinedOffset_s", a.offset() - delta);
            MetricsReport.putFinite(o, "refinedOffsetHalfWidth95_s",
                    fit.halfWidth()[params.size()] * 2.0 * model.shiftRange());
            o.put("shiftRange_s", model.shiftRange());
        }
        o.put("observations", fit.observations());
        o.put("costBefore", fit.costBefore());
        o.put("costAfter", fit.costAfter());
        o.put("variance", fit.variance());
        o.put("tQuantile", fit.tQuantile());
        o.put("conditionIndex", fit.conditionIndex());
        o.put("modelRuns", fit.modelRuns());
        o.put("intervalDefinition", "approximate 95 %: estimate +- t(0.975, n - p) sqrt(diag(s^2 (J^T J)^-1)), "
                + "Bates and Watts 1988");
        ArrayNode w = o.putArray("channels");
        for (int c = 0; c < sigma.length; c++) {
            ObjectNode ch = w.addObject();
            ch.put("signal", a.measurements().get(c).signal());
            ch.put("channel", a.measurements().get(c).channel());
            ch.put("sigma_SI", sigma[c]);
        }
        ArrayNode ps = o.putArray("parameters");
        for (int k = 0; k < params.size(); k++) {
            FreeParameter p = params.get(k);
            ObjectNode j = ps.addObject();
            j.put("path", p.path());
            j.put("unit", p.unit());
            j.put("estimate", p.value(fit.optimum()[k]));
            MetricsReport.putFinite(j, "halfWidth95", fit.halfWidth()[k] * p.range());
            j.put("low", p.low());
            j.put("high", p.high());
            if (fit.identifiability().get(k) == null) {
                j.putNull("notIdentifiable");
            } else {
                j.put("notIdentifiable", fit.identifiability().get(k));
            }
            ArrayNode corr = j.putArray("correlations");
            for (int b = 0; b < params.size(); b++) {
                corr.add(fit.correlation()[k][b]);
            }
        }
        o.put("caution", Cautions.SHORT);
        return o;
    }
}
