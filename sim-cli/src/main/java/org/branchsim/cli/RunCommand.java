package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.List;
import org.branchsim.core.analysis.CavitationFinding;
import org.branchsim.core.analysis.CylinderMetrics;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.SignalStatistics;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.plots.TraceCharts;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim run SCENARIO [--out DIR]}: simulates a scenario and writes trace.csv, metrics.json,
 * summary.txt and PNG figures into one folder.
 */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = "Simulate a scenario; write trace.csv, metrics.json, summary.txt and PNG figures.")
public final class RunCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        // the drawing classes load on the second core while the scenario is read and run
        Thread warmUp = new Thread(TraceCharts::warmUp, "branchsim-figure-warm-up");
        warmUp.setDaemon(true);
        warmUp.start();
        Scenario s = scenario.load();
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name()), scenario.file())) {
            SimulationResult result = Trace.spillingTo(TempFileSpace.inTemporaryDirectory(),
                    () -> Simulator.run(s.circuit(), s.solver()));
            String summary;
            // a long run keeps its samples in a temporary file: deleted when the outputs are written or fail
            try (Trace trace = result.trace()) {
                List<OscillationFinding> oscillations = OscillationScan.scan(result);
                List<ReducingValveMetrics> valves = ReducingValveMetrics.of(result, s.metricsFrom(), s.metricsTo(),
                        oscillations);
                summary = summary(s, result, valves, oscillations);
                folder.write("trace.csv", target -> TraceCsv.write(trace, s.units(), target));
                folder.writeText("metrics.json",
                        MetricsReport.toJson(MetricsReport.build(s, result, valves, oscillations)));
                FigureSet.write(s, trace, valves, folder);
                FigureSet.writeOscillations(s, trace, result.events(), oscillations, folder);
                ReportPage.run(s, result, valves, oscillations, folder);
            }
            folder.writeText("summary.txt", summary);
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.print(summary);
            folder.report(w);
        }
        return BranchsimMain.OK;
    }

    /** @return the settling result in words, saying what it is measured from and about what the band is centred */
    static String settling(ReducingValveMetrics m) {
        if (m.oscillating()) {
            return String.format(Locale.ROOT, "does not settle: oscillates at %.1f Hz", m.oscillationFrequency());
        }
        if (!m.settled()) {
            return "not inside +-2 % of the setting at the end of the window";
        }
        if (Double.isNaN(m.settlingTime())) {
            return String.format(Locale.ROOT, "inside +-2 %% of the setting from %.3f s", m.settledAt());
        }
        return String.format(Locale.ROOT, "settles into +-2 %% of the setting %.3f s after its rise through 90 %% of "
                + "the setting at %.3f s (inside from %.3f s)", m.settlingTime(), m.riseTime(), m.settledAt());
    }

    /** The cylinders' forces and the cavitation report, one line each, in the scenario's units. */
    private static void cylinderAndCavitationLines(StringBuilder sb, Scenario s, SimulationResult r) {
        Unit fu = s.units().displayUnit(Dimension.FORCE);
        for (CylinderMetrics m : CylinderMetrics.of(r, s.metricsFrom(), s.metricsTo())) {
            sb.append(String.format(Locale.ROOT, "cylinder %s: force (chamber pressures on the piston areas) peak %.4g %s "
                            + "at %.3f s, final %.4g %s", m.id(), fu.fromSi(m.force().peak()), fu.symbol(),
                    m.force().peakTime(), fu.fromSi(m.force().last()), fu.symbol()));
            if (m.clamp() != null) {
                sb.append(String.format(Locale.ROOT, "; clamp force on the part (contact force) peak %.4g %s at %.3f s, "
                                + "final %.4g %s", fu.fromSi(m.clamp().peak()), fu.symbol(), m.clamp().peakTime(),
                        fu.fromSi(m.clamp().last()), fu.symbol()));
            }
            sb.append(System.lineSeparator());
        }
        Unit pu = s.units().displayUnit(Dimension.PRESSURE);
        double threshold = r.model().fluid().releasePressure();
        List<CavitationFinding> cav = CavitationFinding.of(r);
        if (cav.isEmpty()) {
            sb.append(String.format(Locale.ROOT, "cavitation: no node fell below the air-release pressure %.3f %s "
                    + "(gauge)%n", pu.fromSi(threshold), pu.symbol()));
        }
        for (CavitationFinding f : cav) {
            sb.append(String.format(Locale.ROOT, "cavitation: node %s fell below the air-release pressure %.3f %s (gauge) "
                            + "at %.4f s, for %.4f s in all, down to %.4g %s absolute at %.4f s; air comes out of "
                            + "solution there and the result at that node is uncertain%n", f.node(),
                    pu.fromSi(threshold), pu.symbol(), f.firstTime(), f.duration(),
                    pu.fromSi(f.minimumAbsolute()) - pu.fromSi(0.0), pu.symbol(), f.minimumTime()));
        }
    }

    static String summary(Scenario s, SimulationResult r, List<ReducingValveMetrics> valves,
                          List<OscillationFinding> osc) {
        StringBuilder sb = new StringBuilder();
        String nl = System.lineSeparator();
        sb.append("branchsim run: ").append(s.name()).append(" (").append(s.file()).append(')').append(nl);
        SolverStatistics st = r.statistics();
        sb.append(String.format(Locale.ROOT,
                "solver: %s; %.4g s simulated in %.3f s wall; %d steps accepted, %d rejected, %d evaluations, "
                        + "%d Jacobians, %d LU factorisations, %d events%n",
                st.method(), st.simulatedSeconds(), st.wallSeconds(), st.acceptedSteps(), st.rejectedSteps(),
                st.evaluations(), st.jacobians(), st.factorisations(), st.totalEvents()));
        Unit pu = s.units().displayUnit(Dimension.PRESSURE);
        sb.append("node pressures [").append(pu.symbol()).append("]: peak (at s) / final").append(nl);
        for (SignalStatistics.Summary m : SignalStatistics.of(r.trace())) {
            if (m.dimension() == Dimension.PRESSURE && r.model().node(m.name().replace(".p", "")) != null) {
                sb.append(String.format(Locale.ROOT, "  %-24s %10.2f (%.3f) / %10.2f%n", m.name(), pu.fromSi(m.peak()),
                        m.peakTime(), pu.fromSi(m.last())));
            }
        }
        Unit qu = s.units().displayUnit(Dimension.VOLUME_FLOW);
        Unit wu = s.units().displayUnit(Dimension.POWER);
        for (ReducingValveMetrics m : valves) {
            sb.append(String.format(Locale.ROOT,
                    "reducing valve %s (%.3g s to %.3g s): setting %.2f %s, steady %.2f (%+.2f %%), peak %.2f at %.3f s, "
                            + "overshoot %.2f %s (%.1f %% of setting), %s; drain %.3f %s, pilot loss %.3g %s, "
                            + "metering loss %.3g %s%n",
                    m.id(), s.metricsFrom(), s.metricsTo(), pu.fromSi(m.setting()), pu.symbol(), pu.fromSi(m.steady()),
                    m.deviationPercent(), pu.fromSi(m.peak()), m.peakTime(), pu.fromSi(m.overshoot()) - pu.fromSi(0),
                    pu.symbol(), m.overshootPercent(), settling(m),
                    qu.fromSi(m.drainFlow()), qu.symbol(), wu.fromSi(m.drainPower()), wu.symbol(),
                    wu.fromSi(m.meteringPower()), wu.symbol()));
        }
        sb.append(MotorReport.text(org.branchsim.core.analysis.MotorMetrics.of(r, s.metricsFrom(), s.metricsTo()),
                s.units()));
        if (osc.isEmpty()) {
            sb.append("oscillation: none in the later half of any interval between schedule changes").append(nl);
        }
        for (OscillationFinding f : osc) {
            sb.append("oscillation: ").append(DiagnosisText.describe(f, s.units()))
                    .append(f.drivenBy() == null ? " (try 'branchsim diagnose')" : "").append(nl);
        }
        cylinderAndCavitationLines(sb, s, r);
        Unit eu = s.units().displayUnit(Dimension.ENERGY);
        sb.append(String.format(Locale.ROOT, "energy: %.4g %s supplied, residual %.3g %% of supplied%n",
                eu.fromSi(r.energy().total(org.branchsim.core.model.EnergyAccount.Kind.SUPPLY)), eu.symbol(),
                100 * r.energy().relativeResidual()));
        sb.append(Cautions.FULL).append(nl);
        return sb.toString();
    }
}
