package org.branchsim.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;

/**
 * The folder a run writes into. Each file is first written under a temporary name and moved into place
 * when complete, so a failure never leaves a half-written file with a real name.
 */
public final class OutputFolder {

    /** Writes the content of one file to a path. */
    @FunctionalInterface
    public interface Content {
        /** Writes to {@code target}. */
        void writeTo(Path target) throws IOException;
    }

    private final Path dir;
    private final List<Path> written = new ArrayList<>();

    /** @param dir the folder (created when needed) */
    public OutputFolder(Path dir) {
        this.dir = dir;
    }

    /** @return the folder */
    public Path dir() {
        return dir;
    }

    /** @return the files written so far */
    public List<Path> written() {
        return List.copyOf(written);
    }

    /** Prints "outputs written to DIR:" and one line per file written. */
    public void report(java.io.PrintWriter w) {
        w.printf("outputs written to %s:%n", dir);
        for (Path p : written) {
            w.printf("  %s%n", p.getFileName());
        }
    }

    /** Writes a text file. */
    public Path writeText(String name, String text) {
        return write(name, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
    }

    /** Writes a file through a temporary name, then moves it into place. */
    public Path write(String name, Content content) {
        Path target = dir.resolve(name);
        Path tmp = dir.resolve("." + name + ".tmp");
        try {
            Files.createDirectories(dir);
            content.writeTo(tmp);
            try {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            written.add(target);
            return target;
        } catch (IOException | RuntimeException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the temporary file is hidden and will be replaced by the next run
            }
            if (e instanceof BranchsimException b) {
                throw b;
            }
            throw new BranchsimException(ErrorKey.OUTPUT_FAILED, target, String.valueOf(e.getMessage()));
        }
    }
}
