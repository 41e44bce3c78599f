package org.branchsim.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.plots.diagram.CircuitDiagram;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim diagram SCENARIO [--out DIR]}: draws the scenario's circuit diagram (ISO 1219-1 symbols) as
 * circuit.svg and circuit.png without simulating.
 */
@Command(name = "diagram", mixinStandardHelpOptions = true,
        description = "Draw the scenario's circuit diagram (ISO 1219-1 symbols) as circuit.svg and circuit.png, "
                + "without simulating.")
public final class DiagramCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-diagram).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.load();
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-diagram"),
                scenario.file())) {
            CircuitDiagram d = CircuitDiagram.of(s.circuit(), s.name() + ": circuit");
            folder.write("circuit.svg", d::writeSvg);
            folder.write("circuit.png", d::writePng);
            folder.commit();
            folder.report(spec.commandLine().getOut());
        }
        return BranchsimMain.OK;
    }
}
