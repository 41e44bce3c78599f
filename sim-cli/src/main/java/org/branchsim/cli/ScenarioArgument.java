package org.branchsim.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import picocli.CommandLine.Parameters;

/** The scenario file argument shared by commands. */
public final class ScenarioArgument {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (.json, or .yaml/.yml).")
    private Path file;

    /** @return the scenario file */
    public Path file() {
        return file;
    }

    /** @return the loaded, checked scenario */
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
        return ScenarioLoader.load(file);
    }
}
