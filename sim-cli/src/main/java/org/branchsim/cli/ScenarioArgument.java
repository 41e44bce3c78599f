package org.branchsim.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import picocli.CommandLine;
import picocli.CommandLine.Parameters;

/** The scenario file argument shared by commands. */
public final class ScenarioArgument {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (.json, or .yaml/.yml).")
    private Path file;

    @CommandLine.Spec(CommandLine.Spec.Target.MIXEE)
    private CommandLine.Model.CommandSpec mixee;

    /** @return the scenario file */
    public Path file() {
        return file;
    }

    /** @return the loaded, checked scenario; its notes (old spellings still accepted) go to standard error */
    public Scenario load() {
        if (Files.isDirectory(file)) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, file, "a folder, not a scenario file");
        }
        if (!Files.exists(file)) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, file, "no such file");
        }
        if (!Files.isRegularFile(file)) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, file, "not a regular file");
        }
        Scenario s = ScenarioLoader.load(file);
        if (mixee != null) {
            for (String note : s.notes()) {
                mixee.commandLine().getErr().println("note: " + note);
            }
        }
        return s;
    }
}
