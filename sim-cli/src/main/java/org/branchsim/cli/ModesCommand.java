package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim modes SCENARIO --at TIME}: runs to TIME, linearises the circuit there (members held at a
 * seat or stop stay held) and reports every mode's frequency, damping ratio and the parts that take part.
 */
@Command(name = "modes", mixinStandardHelpOptions = true,
        description = "Linearise the circuit at a time and list its modes: natural frequency, damping ratio, "
                + "and the states and elements that take part most. Modes with damping ratio below 0.1 are flagged.")
public final class ModesCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--at", required = true, paramLabel = "TIME", description = "Time to linearise at, e.g. \"1.2 s\".")
    private String at;

    @Option(names = "--all", description = "List real (non-oscillatory) modes too.")
    private boolean all;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-modes).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Quantity.Parsed t = Quantity.parse(at, Dimension.TIME);
        if (!t.ok() || t.si() <= 0) {
            throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--at: expected a positive time such as \"1.2 s\", found \"" + at + "\"");
        }
        Scenario s = scenario.load();
        SimulationResult r = Simulator.run(s.circuit(), s.solver().withEndTime(t.si()));
        List<Mode> modes = ModeAnalysis.at(r.circuit(), t.si(), r.finalState());
        PrintWriter w = spec.commandLine().getOut();
        w.printf(Locale.ROOT, "modes of %s linearised at t = %s s (members held at a seat or stop stay held)%n", s.name(),
                org.branchsim.core.study.ValueText.format(t.si()));
        w.printf("%3s %12s %12s %9s  %-5s %s%n", "#", "f_n [Hz]", "f_d [Hz]", "zeta", "flag", "parts taking part (share)");
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("scenario", s.name());
        root.put("time_s", t.si());
        root.put("caution", Cautions.SHORT);
        ArrayNode arr = root.putArray("modes");
        StringBuilder csv = new StringBuilder("mode,real_1_per_s,imaginary_rad_per_s,natural_frequency_Hz,damped_frequency_Hz,"
                + "damping_ratio,lightly_damped,elements,states\n");
        int k = 0;
        for (Mode m : modes) {
            k++;
            String elements = shares(m.elements());
            String states = shares(m.participation());
            if (m.oscillatory() || all) {
                w.printf(Locale.ROOT, "%3d %12.2f %12.2f %9.4f  %-5s %s%n", k, m.naturalFrequency(), m.dampedFrequency(),
                        m.dampingRatio(), m.lightlyDamped() ? "LOW" : "", elements);
                w.printf("%43s states: %s%n", "", states);
            }
            ObjectNode o = arr.addObject();
            o.put("real_1_per_s", m.real());
            o.put("imaginary_rad_per_s", m.imaginary());
            o.put("naturalFrequency_Hz", m.naturalFrequency());
            o.put("dampedFrequency_Hz", m.dampedFrequency());
            o.put("dampingRatio", m.dampingRatio());
            o.put("lightlyDamped", m.lightlyDamped());
            ObjectNode e = o.putObject("elements");
            m.elements().forEach(sh -> e.put(sh.name(), sh.share()));
            ObjectNode st = o.putObject("states");
            m.participation().forEach(sh -> st.put(sh.name(), sh.share()));
            csv.append(String.format(Locale.ROOT, "%d,%.9g,%.9g,%.9g,%.9g,%.6g,%s,%s,%s%n", k, m.real(), m.imaginary(),
                    m.naturalFrequency(), m.dampedFrequency(), m.dampingRatio(), m.lightlyDamped(),
                    StudyTable.field(elements), StudyTable.field(states)));
        }
        long flagged = modes.stream().filter(Mode::lightlyDamped).count();
        w.printf("%d modes, %d oscillatory, %d lightly damped (damping ratio < %.1f)%n", modes.size(),
                modes.stream().filter(Mode::oscillatory).count(), flagged, Mode.LIGHT_DAMPING);
        OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-modes"), scenario.file());
        folder.writeText("modes.json", MetricsReport.toJson(root));
        folder.writeText("modes.csv", csv.toString());
        folder.commit();
        w.printf("outputs written to %s (modes.json, modes.csv)%n", folder.dir());
        w.println("Caution: " + Cautions.SHORT);
        return BranchsimMain.OK;
    }

    private static String shares(List<Mode.Share> list) {
        return list.stream().map(sh -> String.format(Locale.ROOT, "%s %.0f%%", sh.name(), 100 * sh.share()))
                .collect(Collectors.joining(", "));
    }
}
