package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.List;

/**
 * The last step of a sweep or tolerance study: the whole study's report, or, for one shard of a study split with
 * {@code --shard K/N}, the shard folder that {@code merge} reads; then the folder is committed, listed and the
 * caution printed. Shared by {@link SweepCommand} and {@link ToleranceCommand}.
 */
final class StudyOutput {

    /** Writes the report of a whole (unsharded) study into the folder. */
    @FunctionalInterface
    interface WholeReport {
        /** Writes the report. */
        void write(List<StudyTable.Row> rows, OutputFolder folder, PrintWriter w);
    }

    private StudyOutput() {
    }

    /**
     * @param study the study's definition
     * @param part this machine's shard, or null for the whole study
     * @param rows one row per variant run here
     * @param folder the output folder (committed here)
     * @param w standard output
     * @param whole how the whole study is reported
     */
    static void finish(StudyDefinition study, Shard part, List<StudyTable.Row> rows, OutputFolder folder,
                       PrintWriter w, WholeReport whole) {
        if (part == null) {
            whole.write(rows, folder, w);
        } else {
            ShardFolder.write(folder, part, study, rows);
        }
        folder.commit();
        if (part != null) {
            ShardSummary.print(study, part, rows, folder.dir(), w);
        }
        folder.report(w);
        w.println("Caution: " + Cautions.SHORT);
    }
}
