package org.branchsim.cli;

import java.util.concurrent.Callable;
import org.branchsim.core.scenario.Scenario;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code branchsim check SCENARIO}: reads and checks a scenario without running it. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Check a scenario file without running it; lists every problem with file, line and column.")
public final class CheckCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.load();
        spec.commandLine().getOut().printf("%s: scenario \"%s\" is valid: %d nodes, %d elements, %d states, %d signals%n",
                scenario.file(), s.name(), s.circuit().nodes().size(), s.circuit().elements().size(),
                s.circuit().dimension(), s.circuit().signals().size());
        return BranchsimMain.OK;
    }
}
