package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.Locale;

/**
 * Progress of a study's variant runs on standard error: on a terminal a live line rewritten in place, in a log
 * file a line every tenth of the work (time left in s, estimated from the mean time per finished variant). Shared
 * by the sweep, tolerance and diagnose commands.
 */
final class VariantProgress {

    private final PrintWriter err;
    private final int total;
    private final long start;

    /**
     * @param err where progress goes
     * @param total variants to run, or a negative number when not known in advance
     */
    VariantProgress(PrintWriter err, int total) {
        this.err = err;
        this.total = total;
        this.start = System.nanoTime();
    }

    /** Reports that {@code done} variants have finished; safe to call from several threads. */
    void done(int done) {
        double elapsed = (System.nanoTime() - start) * 1e-9;
        double left = done == 0 ? Double.NaN : elapsed / done * (total - done);
        boolean console = System.console() != null;
        int step = Math.max(1, total / 10);
        if (!console && total > 0 && done % step != 0 && done != total) {
            return; // a log file gets a line every tenth of the work, a terminal a live line
        }
        synchronized (err) {
            if (!console) {
                err.printf(Locale.ROOT, total > 0 ? "variants %d/%d done, about %.0f s left%n" : "variants %d done%n",
                        done, total, left);
                err.flush();
                return;
            }
            if (total > 0) {
                err.printf(Locale.ROOT, "\rvariants %d/%d done, about %.0f s left   ", done, total, left);
            } else {
                err.printf(Locale.ROOT, "\rvariants %d done, %.0f s so far   ", done, elapsed);
            }
            err.flush();
        }
    }
}
