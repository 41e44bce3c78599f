package org.branchsim.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileSystemException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;

/**
 * The folder a command writes its results into, replaced as a whole. Files are written into a fresh
 * temporary folder beside the target ({@code .NAME.branchsim-tmp-PID-N}); {@link #commit()} moves the
 * earlier result aside ({@code .NAME.branchsim-old-PID-N}), renames the new folder into place and only then
 * deletes the earlier one. So the target never holds a mixture of two runs or a temporary file: a run
 * killed before the swap leaves the earlier result untouched (its temporary folder is deleted on SIGINT or
 * SIGTERM, and after SIGKILL by the next run into the same target); a run killed between the two renames
 * leaves the earlier result beside the target, and the next run into it puts it back. Two runs committing
 * into one target at once both swap atomically: the last one wins, neither is mixed with the other.
 *
 * <p>The target is checked when the folder is created, before any run: it must not be a regular file, must
 * be creatable and writable, must not hold an input of the command, and when it exists it must be empty or
 * a folder branchsim wrote (it holds {@value #MARKER}, or only files named like branchsim outputs), because
 * the whole folder is replaced. A command that is refused or fails before {@link #commit()} writes nothing:
 * use the folder in try-with-resources, so that {@link #close()} discards an uncommitted result.
 */
public final class OutputFolder implements AutoCloseable {

    /** Writes the content of one file to a path. */
    @FunctionalInterface
    public interface Content {
        /** Writes to {@code target}. */
        void writeTo(Path target) throws IOException;
    }

    /** One file to write: its plain name and its content. */
    public record Pending(String name, Content content) {
    }

    /** Name of the file that marks a folder as written by branchsim (so that replacing it loses nothing). */
    public static final String MARKER = ".branchsim-output";
    private static final String TEMP_TAG = ".branchsim-tmp-";
    private static final String OLD_TAG = ".branchsim-old-";
    private static final int MAX_NAME_IN_SIBLINGS = 100;
    private static final int SWAP_ATTEMPTS = 20;
    /** Longest time a discarded result's deletion waits for writers still finishing a file, ms. */
    private static final long SETTLE_MILLIS = 2000;
    /** Files a branchsim command writes, for folders written before the marker existed. */
    private static final Pattern OUTPUT_NAME = Pattern.compile(
            "(trace\\.csv|metrics\\.json|summary\\.(txt|csv)|runs\\.csv|statistics\\.csv|modes\\.(json|csv)"
                    + "|diagnosis\\.(txt|json)|(bench|timing)\\.(json|csv)|[a-z0-9][a-z0-9.-]*\\.png|\\..+\\.tmp)");
    private static final Set<OutputFolder> OPEN = ConcurrentHashMap.newKeySet();
    private static final AtomicLong SEQUENCE = new AtomicLong();
    private static final long PID = ProcessHandle.current().pid();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(OutputFolder::discardAll, "branchsim-output-cleanup"));
    }

    private enum State { OPEN, COMMITTED, DISCARDED }

    private final Path dir;
    private final Path target;
    private final List<String> names = new ArrayList<>();
    private final List<Path> createdParents = new ArrayList<>();
    private Path temp;
    private State state = State.OPEN;

    /**
     * @param dir the target folder, checked at once (see the class comment)
     * @throws BranchsimException OUTPUT_FOLDER_REFUSED naming {@code --out} when the target cannot be used
     */
    public OutputFolder(Path dir) {
        this(dir, new Path[0]);
    }

    /**
     * @param dir the target folder, checked at once (see the class comment)
     * @param inputs files the command reads, which the target must not hold
     * @throws BranchsimException OUTPUT_FOLDER_REFUSED naming {@code --out} when the target cannot be used
     */
    public OutputFolder(Path dir, Path... inputs) {
        this.dir = dir;
        this.target = check(dir, inputs);
        restoreInterruptedSwap();
    }

    /** @return the target folder, as given */
    public Path dir() {
        return dir;
    }

    /** @return the files written so far, at their place in the target folder */
    public synchronized List<Path> written() {
        return names.stream().map(dir::resolve).toList();
    }

    /** Prints "outputs written to DIR:" and one line per file written. */
    public void report(PrintWriter w) {
        w.printf("outputs written to %s:%n", dir);
        for (Path p : written()) {
            w.printf("  %s%n", p.getFileName());
        }
    }

    /** Writes a text file (UTF-8). */
    public Path writeText(String name, String text) {
        return write(name, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
    }

    /**
     * Writes one file into the new result (it appears in the target folder at {@link #commit()}).
     *
     * @param name a plain file name, no folders
     * @param content what to write
     * @return the file's place in the target folder
     */
    public Path write(String name, Content content) {
        if (name.isEmpty() || name.contains("/") || name.contains("\\") || name.startsWith(".")) {
            throw new IllegalArgumentException("output file names are plain names: " + name);
        }
        Path file;
        synchronized (this) {
            requireOpen();
            file = temporaryFolder().resolve(name);
        }
        try {
            content.writeTo(file);
        } catch (IOException | RuntimeException e) {
            try {
                Files.deleteIfExists(file);
            } catch (IOException ignored) {
                // the whole temporary folder goes when the command ends
            }
            if (e instanceof BranchsimException b) {
                throw b;
            }
            throw new BranchsimException(ErrorKey.OUTPUT_FAILED, dir.resolve(name), reason(e));
        }
        synchronized (this) {
            if (!names.contains(name)) {
                names.add(name);
            }
        }
        return dir.resolve(name);
    }

    /**
     * Writes several files at once, on up to one thread per processor (figures are drawn independently of each
     * other), and returns when all are written; they are listed in the order given. When any fails, the others
     * still finish and the first failure in that order is thrown.
     *
     * @param files the files, each as for {@link #write}
     */
    public void writeAll(List<Pending> files) {
        int threads = Math.min(files.size(), Runtime.getRuntime().availableProcessors());
        if (threads <= 1) {
            for (Pending f : files) {
                write(f.name(), f.content());
            }
            return;
        }
        synchronized (this) {
            requireOpen();
            for (Pending f : files) {
                if (!names.contains(f.name())) {
                    names.add(f.name());
                }
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "branchsim-output-writer");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Path>> done = new ArrayList<>();
            for (Pending f : files) {
                done.add(pool.submit(() -> write(f.name(), f.content())));
            }
            RuntimeException first = null;
            for (int k = 0; k < done.size(); k++) {
                try {
                    done.get(k).get();
                } catch (ExecutionException e) {
                    synchronized (this) {
                        names.remove(files.get(k).name());
                    }
                    if (first == null) {
                        first = e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new BranchsimException(ErrorKey.OUTPUT_FAILED, dir, "interrupted while writing figures");
                }
            }
            if (first != null) {
                throw first;
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Puts the new result in place of the earlier one, as a whole (see the class comment).
     *
     * @throws BranchsimException OUTPUT_FAILED when the folder cannot be moved into place
     */
    public synchronized void commit() {
        requireOpen();
        Path folder = temporaryFolder();
        try {
            Files.writeString(folder.resolve(MARKER), "This folder was written by branchsim; the next run into it "
                    + "replaces it as a whole.\n", StandardCharsets.UTF_8);
            deleteLeftovers();
            for (int attempt = 0; attempt < SWAP_ATTEMPTS; attempt++) {
                Path old = moveAside();
                try {
                    Files.move(folder, target, StandardCopyOption.ATOMIC_MOVE);
                } catch (FileSystemException e) {
                    if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                        throw e;
                    }
                    // another run put its result in place between our two renames ("directory not empty"):
                    // the earlier result we set aside is older than it; set the other one aside in turn
                    deleteTree(old);
                    continue;
                }
                state = State.COMMITTED;
                OPEN.remove(this);
                deleteTree(old);
                return;
            }
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.OUTPUT_FAILED, dir, reason(e));
        }
        throw new BranchsimException(ErrorKey.OUTPUT_FAILED, dir, "other runs kept replacing it; "
                + SWAP_ATTEMPTS + " attempts to move the results into place failed");
    }

    /** Discards the new result unless it was committed: deletes the temporary folder and parents it made. */
    @Override
    public synchronized void close() {
        if (state != State.OPEN) {
            return;
        }
        state = State.DISCARDED;
        OPEN.remove(this);
        try {
            deleteSettled(temp);
            for (int i = createdParents.size() - 1; i >= 0; i--) {
                Files.deleteIfExists(createdParents.get(i));
            }
        } catch (IOException e) {
            // best effort: a leftover temporary folder is deleted by the next run into the same target
        }
    }

    private static void discardAll() {
        for (OutputFolder f : List.copyOf(OPEN)) {
            f.close();
        }
    }

    private void requireOpen() {
        if (state != State.OPEN) {
            throw new IllegalStateException("output folder " + dir + " is already " + state.name().toLowerCase(java.util.Locale.ROOT));
        }
    }

    private Path temporaryFolder() {
        if (temp != null) {
            return temp;
        }
        try {
            Path parent = target.getParent();
            List<Path> missing = new ArrayList<>();
            for (Path p = parent; p != null && !Files.exists(p); p = p.getParent()) {
                missing.add(0, p);
            }
            for (Path p : missing) {
                Files.createDirectory(p);
                createdParents.add(p);
            }
            temp = Files.createDirectory(sibling(TEMP_TAG));
            OPEN.add(this);
            return temp;
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.OUTPUT_FAILED, dir, reason(e));
        }
    }

    private String shortName() {
        String name = target.getFileName().toString();
        return name.length() > MAX_NAME_IN_SIBLINGS ? name.substring(0, MAX_NAME_IN_SIBLINGS) : name;
    }

    private Path sibling(String tag) {
        return target.resolveSibling("." + shortName() + tag + PID + "-" + SEQUENCE.incrementAndGet() + "-"
                + Long.toHexString(System.nanoTime() & 0xffffff));
    }

    /** @return where the earlier result went, or null when there was none */
    private Path moveAside() throws IOException {
        if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            return null;
        }
        Path old = sibling(OLD_TAG);
        try {
            Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
            return old;
        } catch (NoSuchFileException e) {
            return null; // another run moved it aside first
        }
    }

    /** @return the temporary and set-aside siblings of the target left by runs that no longer live */
    private List<Path> leftovers(String tag) {
        Path parent = target.getParent();
        String prefix = "." + shortName() + tag;
        if (parent == null || !Files.isDirectory(parent)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(parent)) {
            return s.filter(p -> p.getFileName().toString().startsWith(prefix))
                    .filter(p -> !alive(p.getFileName().toString().substring(prefix.length())))
                    .toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    private static boolean alive(String pidAndRest) {
        int dash = pidAndRest.indexOf('-');
        try {
            long pid = Long.parseLong(dash < 0 ? pidAndRest : pidAndRest.substring(0, dash));
            return pid == PID || ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private void deleteLeftovers() throws IOException {
        for (Path p : leftovers(TEMP_TAG)) {
            deleteTree(p);
        }
        for (Path p : leftovers(OLD_TAG)) {
            deleteTree(p);
        }
    }

    /** Puts back an earlier result that a run killed between its two renames left beside the target. */
    private void restoreInterruptedSwap() {
        if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Path newest = null;
        FileTime newestTime = null;
        for (Path p : leftovers(OLD_TAG)) {
            try {
                FileTime t = Files.getLastModifiedTime(p);
                if (newest == null || t.compareTo(newestTime) > 0) {
                    newest = p;
                    newestTime = t;
                }
            } catch (IOException e) {
                // gone meanwhile
            }
        }
        if (newest != null) {
            try {
                Files.move(newest, target, StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                // another run restored or replaced it
            }
        }
    }

    /**
     * Deletes a discarded temporary folder. Figures are written on other threads ({@link #writeAll}); one that was
     * already writing when the folder was discarded (a signal ends the command while it draws) can add its file
     * after the folder was listed, and the folder is then not empty when it is removed. The deletion is repeated
     * until the folder is gone, for at most {@value #SETTLE_MILLIS} ms; a writer that comes later finds no folder
     * and fails.
     */
    private static void deleteSettled(Path root) throws IOException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(SETTLE_MILLIS);
        while (true) {
            try {
                deleteTree(root);
                return;
            } catch (DirectoryNotEmptyException | NoSuchFileException e) {
                if (System.nanoTime() > deadline) {
                    throw e;
                }
                try {
                    Thread.sleep(5);
                } catch (InterruptedException interrupted) {
                    Thread.currentThread().interrupt();
                    throw e;
                }
            }
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (root == null || !Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.deleteIfExists(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                Files.deleteIfExists(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }

    private static String reason(Exception e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or folder: " + e.getMessage();
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied: " + e.getMessage();
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason() + ": " + f.getFile();
        }
        return String.valueOf(e.getMessage());
    }

    /**
     * Checks a target folder before any run.
     *
     * @param dir the folder as given
     * @param inputs files the command reads
     * @return the folder as an absolute, normalised path
     * @throws BranchsimException OUTPUT_FOLDER_REFUSED naming {@code --out}, what was expected and what was found
     */
    static Path check(Path dir, Path... inputs) {
        String shown = "--out \"" + dir + "\"";
        if (dir.toString().isBlank()) {
            throw bad("--out", "a folder name", "an empty name");
        }
        Path abs = dir.toAbsolutePath().normalize();
        if (abs.getParent() == null || abs.getFileName() == null) {
            throw bad(shown, "a folder inside another folder (it is replaced as a whole)", "the root");
        }
        for (Path input : inputs) {
            if (input != null && inside(input, abs)) {
                throw bad(shown, "a folder that does not hold the input " + input + " (the whole folder is replaced)",
                        "the input inside it");
            }
        }
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw bad(shown, "a folder", "a file that is not a folder");
        }
        if (Files.isDirectory(abs)) {
            List<String> foreign = foreignEntries(abs);
            if (!foreign.isEmpty()) {
                throw bad(shown, "a new or empty folder, or one branchsim wrote (the whole folder is replaced)",
                        "other files in it: " + String.join(", ", foreign) + "; choose another folder or empty this one");
            }
        }
        Path existing = abs.getParent();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null || !Files.isDirectory(existing)) {
            throw bad(shown, "a folder that can be created", existing + ", which is not a folder");
        }
        if (!Files.isWritable(existing) || !canCreateFolderIn(existing)) {
            throw bad(shown, "a place where branchsim may write", existing + " not writable");
        }
        return abs;
    }

    /** Tries to create and delete an empty folder (permissions alone do not tell, e.g. for root or /proc). */
    private static boolean canCreateFolderIn(Path folder) {
        Path probe = folder.resolve(".branchsim-probe-" + PID + "-" + SEQUENCE.incrementAndGet());
        try {
            Files.createDirectory(probe);
            Files.delete(probe);
            return true;
        } catch (IOException | UnsupportedOperationException e) {
            return false;
        }
    }

    private static boolean inside(Path input, Path folder) {
        Path in = input.toAbsolutePath().normalize();
        if (in.startsWith(folder)) {
            return true;
        }
        try {
            return Files.exists(folder) && Files.exists(in) && in.toRealPath().startsWith(folder.toRealPath());
        } catch (IOException e) {
            return false;
        }
    }

    /** @return up to five entries that neither mark nor look like branchsim's outputs (empty when all do) */
    private static List<String> foreignEntries(Path folder) {
        try (Stream<Path> s = Files.list(folder)) {
            List<Path> entries = s.toList();
            if (entries.stream().anyMatch(p -> p.getFileName().toString().equals(MARKER))) {
                return List.of();
            }
            return entries.stream()
                    .filter(p -> !Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)
                            || !OUTPUT_NAME.matcher(p.getFileName().toString()).matches())
                    .map(p -> p.getFileName().toString())
                    .sorted()
                    .limit(5)
                    .toList();
        } catch (IOException e) {
            return List.of("(unreadable: " + reason(e) + ")");
        }
    }

    private static BranchsimException bad(String option, String expected, String found) {
        return new BranchsimException(ErrorKey.OUTPUT_FOLDER_REFUSED, option, expected, found);
    }
}
