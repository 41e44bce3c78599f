package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/** Tells on the console what a shard run did and how to merge the shards when all are done. */
final class ShardSummary {

    private static final int INDICES_SHOWN = 12;

    private ShardSummary() {
    }

    /**
     * @param study the study's definition
     * @param shard the shard that ran
     * @param rows its rows
     * @param folder the shard folder written
     * @param w the console
     */
    static void print(StudyDefinition study, Shard shard, List<StudyTable.Row> rows, Path folder, PrintWriter w) {
        String indices = rows.stream().limit(INDICES_SHOWN).map(r -> "#" + r.variant().index())
                .collect(Collectors.joining(", ")) + (rows.size() > INDICES_SHOWN ? ", ..." : "");
        w.printf("%s %s, shard %d of %d: ran %d of %d variants (%s), %d failed%n", study.scenario(), study.study(),
                shard.k(), shard.n(), rows.size(), study.variants(), indices, rows.stream().filter(r -> !r.ok()).count());
        w.println("when all " + shard.n() + " shards are done: branchsim merge " + siblings(folder, shard));
    }

    /** @return the folders of all shards when this one has the default name pattern, else a placeholder */
    private static String siblings(Path folder, Shard shard) {
        String name = folder.getFileName() == null ? "" : folder.getFileName().toString();
        String suffix = shard.folderSuffix();
        if (!name.endsWith(suffix)) {
            return "SHARD_FOLDER... (one folder per shard, 1 to " + shard.n() + ")";
        }
        String stem = name.substring(0, name.length() - suffix.length());
        List<String> all = new ArrayList<>();
        for (int k = 1; k <= shard.n(); k++) {
            all.add(folder.resolveSibling(stem + new Shard(k, shard.n()).folderSuffix()).toString());
        }
        return all.size() <= 4 ? String.join(" ", all)
                : all.get(0) + " ... " + all.get(all.size() - 1) + " (" + all.size() + " folders)";
    }
}
