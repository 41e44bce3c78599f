package org.branchsim.cli;

import org.branchsim.core.error.BranchsimException;

import org.branchsim.core.error.ErrorKey;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code branchsim merge SHARD_FOLDER... [--out DIR]}: combines the shard folders of one sweep or tolerance
 * study (written with {@code --shard K/N}) into exactly the folder the unsharded study writes. Refuses
 * (exit code 2, writing nothing) folders of different studies, of different splits, a shard given twice or
 * a shard missing; a merged study in which every variant failed exits 1, as the unsharded study does.
 */
@Command(name = "merge", mixinStandardHelpOptions = true,
        description = "Combine the shard folders of one sweep or tolerance study (run with --shard K/N) into the "
                + "folder the unsharded study writes: summary.csv and overlays, or runs.csv, statistics.csv and "
                + "the histogram.")
public final class MergeCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "SHARD_FOLDER",
            description = "The folders of all N shards of one study, in any order.")
    private List<Path> shards;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Output folder (default: out/<scenario name>-sweep or out/<scenario name>-tolerance).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        List<ShardFolder.Content> parts = new ArrayList<>();
        for (Path p : shards) {
            parts.add(ShardFolder.read(p));
        }
        checkOneStudy(parts);
        StudyDefinition study = parts.get(0).study();
        List<StudyTable.Row> rows = parts.stream().flatMap(p -> p.rows().stream())
                .sorted(Comparator.comparingInt(r -> r.variant().index())).toList();
        Path[] inputs = shards.toArray(Path[]::new);
        try (OutputFolder folder = new OutputFolder(out != null ? out : study.defaultOut(), inputs)) {
            PrintWriter w = spec.commandLine().getOut();
            ReportPage.copyCircuit(shards.get(0), folder);
            w.printf("%s %s: merged %d shards, %d variants%n", study.scenario(), study.study(), parts.size(), rows.size());
            if (study instanceof SweepDefinition sweep) {
                SweepReport.write(sweep, rows, folder, w);
            } else if (study instanceof ToleranceDefinition tolerance) {
                ToleranceReport.write(tolerance, rows, folder, w);
            }
            folder.commit();
            folder.report(w);
            w.println("Caution: " + Cautions.SHORT);
        }
        return BranchsimMain.OK;
    }

    /**
     * Checks that the folders are every shard of one study, each once.
     *
     * @throws org.branchsim.core.error.BranchsimException BAD_ARGUMENT naming SHARD_FOLDER, what was expected
     *         and what was found
     */
    static void checkOneStudy(List<ShardFolder.Content> parts) {
        ShardFolder.Content first = parts.get(0);
        for (ShardFolder.Content p : parts) {
            String difference = StudyDefinition.firstDifference(first.studyJson(), p.studyJson());
            if (difference != null) {
                throw new BranchsimException(ErrorKey.SHARD_FOLDER_REFUSED, String.valueOf(p.folder()),
                        "a shard of the study in " + first.folder() + " (every folder from one study)",
                        "another study; first difference, " + difference);
            }
        }
        for (ShardFolder.Content p : parts) {
            if (p.shard().n() != first.shard().n()) {
                throw new BranchsimException(ErrorKey.SHARD_FOLDER_REFUSED, String.valueOf(p.folder()),
                        "a shard of " + first.shard().n() + " like " + first.folder() + " (shard " + first.shard() + ")",
                        "shard " + p.shard());
            }
        }
        Map<Integer, Path> byK = new TreeMap<>();
        for (ShardFolder.Content p : parts) {
            Path before = byK.putIfAbsent(p.shard().k(), p.folder());
            if (before != null) {
                throw new BranchsimException(ErrorKey.SHARD_FOLDER_REFUSED, String.valueOf(p.folder()),
                        "each shard once", "shard " + p.shard() + " again (also in " + before + ")");
            }
        }
        int n = first.shard().n();
        if (byK.size() != n) {
            List<String> missing = new ArrayList<>();
            for (int k = 1; k <= n; k++) {
                if (!byK.containsKey(k)) {
                    missing.add(k + "/" + n);
                }
            }
            throw new BranchsimException(ErrorKey.SHARD_FOLDER_REFUSED, "(all of them)",
                    "all " + n + " shards of the study", byK.size() + " (" + byK.keySet().stream().map(k -> k + "/" + n)
                    .collect(Collectors.joining(", ")) + "); missing " + String.join(", ", missing));
        }
    }
}
