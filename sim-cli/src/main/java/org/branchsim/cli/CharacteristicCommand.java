package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.plots.CharacteristicChart;
import org.branchsim.plots.ValveCharacteristic;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim characteristic SCENARIO [--valve ID] [--out DIR]}: runs the scenario and reads the quasi-static
 * characteristic of each reducing valve from the stretches where the schedule ramps the demand (outlet pressure
 * against main flow, with the droop: least-squares slope in pressure per flow display unit) or the supply pressure
 * (outlet pressure against inlet pressure, with the regulation deviation over the inlet range), and the pilot
 * drain flow against outlet pressure. The curves are a static characteristic only where the ramps are slow
 * compared with the valve's response. Writes {@code characteristic-<id>.png} per valve and
 * {@code characteristic.csv} (all ramp samples, in the scenario's display units).
 */
@Command(name = "characteristic", mixinStandardHelpOptions = true,
        description = {"Run the scenario and draw each reducing valve's quasi-static characteristic from the "
                + "schedule's ramps: outlet pressure against main flow (demand ramps, with the droop) and against "
                + "inlet pressure (supply-pressure ramps, with the regulation deviation), and pilot drain flow "
                + "against outlet pressure.",
            "Static only where the ramps are slow compared with the valve's response."})
public final class CharacteristicCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--valve", paramLabel = "ID", description = "Only this reducing valve (default: all).")
    private String valve;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Output folder (default: out/<scenario name>-characteristic).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.load();
        List<ReducingValve> valves = valves(s);
        List<ValveCharacteristic.Stretch> stretches = RampStretches.of(s.circuit().inputs(), s.solver().endTime());
        if (stretches.isEmpty()) {
            throw new BranchsimException(ErrorKey.NOTHING_TO_CHARACTERISE, s.name(), "its schedule has no ramp of "
                    + "non-zero duration; add a slow ramp of the supply pressure or of a demand (\"over\": \"2 s\")");
        }
        SimulationResult r = Simulator.run(s.circuit(), s.solver());
        PrintWriter w = spec.commandLine().getOut();
        UnitSystem units = s.units();
        Unit pu = units.displayUnit(Dimension.PRESSURE);
        Unit qu = units.displayUnit(Dimension.VOLUME_FLOW);
        w.printf("characteristic of %s from %d ramp stretch(es): %s%n", s.name(), stretches.size(),
                stretches.stream().map(x -> String.format(Locale.ROOT, "%s %.4g..%.4g s", x.label(), x.from(), x.to()))
                        .collect(Collectors.joining(", ")));
        w.println("quasi-static: a static characteristic only where the ramps are slow compared with the valve's "
                + "response");
        StringBuilder csv = new StringBuilder(String.format(Locale.ROOT, "valve,stretch,time [s],main flow [%s],"
                + "inlet pressure [%s],outlet pressure [%s],drain flow [%s]%n", qu.symbol(), pu.symbol(), pu.symbol(),
                qu.symbol()));
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-characteristic"),
                scenario.file())) {
            for (ReducingValve v : valves) {
                ValveCharacteristic c = ValveCharacteristic.of(r.trace(), v, inlet(s, v, r.trace()), stretches);
                for (ValveCharacteristic.Sample x : c.samples()) {
                    csv.append(String.format(Locale.ROOT, "%s,%s,%.6f,%.6g,%.6g,%.6g,%.6g%n", c.id(),
                            x.stretch().label(), x.time(), qu.fromSi(x.flow()), pu.fromSi(x.inlet()),
                            pu.fromSi(x.outlet()), qu.fromSi(x.drain())));
                }
                String png = "characteristic-" + v.id() + ".png";
                folder.write(png, p -> CharacteristicChart.save(c, s.name() + ": characteristic of reducing valve "
                        + v.id(), units, p));
                w.printf(Locale.ROOT, "%s: %s%n", v.id(), droop(c, units, pu, qu));
                w.printf(Locale.ROOT, "%s: %s%n", v.id(), deviation(c, pu));
            }
            folder.writeText("characteristic.csv", csv.toString());
            folder.commit();
            w.printf("outputs written to %s (characteristic.csv, characteristic-<valve>.png)%n", folder.dir());
        }
        w.println("Caution: " + Cautions.SHORT);
        return BranchsimMain.OK;
    }

    private List<ReducingValve> valves(Scenario s) {
        List<ReducingValve> all = s.circuit().elements().stream().filter(e -> e instanceof ReducingValve)
                .map(e -> (ReducingValve) e).toList();
        if (all.isEmpty()) {
            throw new BranchsimException(ErrorKey.NOTHING_TO_CHARACTERISE, s.name(),
                    "it has no reducing valve (pilotReducingValve or directReducingValve)");
        }
        if (valve == null) {
            return all;
        }
        List<ReducingValve> chosen = all.stream().filter(v -> v.id().equals(valve)).toList();
        if (chosen.isEmpty()) {
            throw new BranchsimException(ErrorKey.NOTHING_TO_CHARACTERISE, s.name(), "it has no reducing valve \""
                    + valve + "\"; its reducing valves: "
                    + all.stream().map(ReducingValve::id).collect(Collectors.joining(", ")));
        }
        return chosen;
    }

    /**
     * @return the valve's inlet pressure at every trace sample, Pa: its {@code <id>.p.in} signal when the trace has
     *         one, else the pressure of its inlet node (a tank's scheduled pressure, or the node's {@code .p} signal)
     */
    private static double[] inlet(Scenario s, ReducingValve v, Trace trace) {
        if (trace.indexOf(v.id() + ".p.in") >= 0) {
            return trace.series(v.id() + ".p.in");
        }
        Element e = s.circuit().element(v.id());
        Node node = e.ports().get(0);
        double[] t = trace.times();
        double[] p = new double[t.length];
        if (node.isTank()) {
            for (int k = 0; k < t.length; k++) {
                p[k] = node.tankPressure().valueAt(t[k]);
            }
            return p;
        }
        return trace.series(node.id() + ".p");
    }

    private static String droop(ValveCharacteristic c, UnitSystem units, Unit pu, Unit qu) {
        int n = c.samplesOf(ValveCharacteristic.Drive.DEMAND).size();
        if (n < 2) {
            return "droop not measured (no demand ramp)";
        }
        return String.format(Locale.ROOT, "droop %.4g %s per %s (least-squares slope of outlet pressure against "
                + "main flow over %d demand-ramp samples)", CharacteristicChart.droopInDisplayUnits(c, units),
                pu.symbol(), qu.symbol(), n);
    }

    private static String deviation(ValveCharacteristic c, Unit pu) {
        if (c.samplesOf(ValveCharacteristic.Drive.SUPPLY).isEmpty()) {
            return "regulation deviation not measured (no supply-pressure ramp)";
        }
        double[] range = c.inletRange();
        return String.format(Locale.ROOT, "regulation deviation %.4g %s (highest minus lowest outlet pressure over "
                + "inlet %.4g .. %.4g %s)", c.deviation() / pu.factor(), pu.symbol(), pu.fromSi(range[0]),
                pu.fromSi(range[1]), pu.symbol());
    }
}
