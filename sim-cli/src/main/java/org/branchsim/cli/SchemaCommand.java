package org.branchsim.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.ScenarioSchema;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code branchsim schema [--out FILE]}: writes the JSON Schema (draft 2020-12) of scenario files, generated from
 * the element descriptors, for editors to check and complete scenario files. The same text is shipped as
 * docs/branchsim-scenario.schema.json.
 */
@Command(name = "schema", mixinStandardHelpOptions = true,
        description = "Write the JSON Schema (draft 2020-12) of scenario files, for editors; to standard output "
                + "unless --out is given.")
public final class SchemaCommand implements Callable<Integer> {

    @Option(names = "--out", paramLabel = "FILE",
            description = "Write the schema to this file (written whole, then moved into place) instead of standard "
                    + "output.")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        String text = ScenarioSchema.text();
        PrintWriter w = spec.commandLine().getOut();
        if (out == null) {
            w.print(text);
            w.flush();
            return BranchsimMain.OK;
        }
        Path target = out.toAbsolutePath().normalize();
        Path folder = target.getParent();
        if (Files.isDirectory(target)) {
            throw new BranchsimException(ErrorKey.OUTPUT_FOLDER_REFUSED, "--out", "a file name", "the folder " + out);
        }
        if (folder == null || !Files.isDirectory(folder)) {
            throw new BranchsimException(ErrorKey.OUTPUT_FOLDER_REFUSED, "--out", "a file in an existing folder",
                    out + " (no folder " + folder + ")");
        }
        Path temp = null;
        try {
            temp = Files.createTempFile(folder, ".branchsim-tmp-", ".json");
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            try {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            deleteQuietly(temp);
            throw new BranchsimException(ErrorKey.OUTPUT_FAILED, out,
                    e.getMessage() == null ? "write error" : e.getMessage());
        }
        w.println("wrote " + out);
        w.flush();
        return BranchsimMain.OK;
    }

    private static void deleteQuietly(Path p) {
        if (p == null) {
            return;
        }
        try {
            Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // the temporary file is left behind; it is named .branchsim-tmp-*
        }
    }
}
