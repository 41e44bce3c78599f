package org.branchsim.cli;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.study.Variant;

/**
 * One part of a study split for many machines: shard {@code k} of {@code n} holds the variants whose
 * 0-based index i satisfies {@code i mod n = k - 1} (round robin). Round robin rather than contiguous blocks
 * because neighbouring variants of a grid tend to cost alike (a small orifice stiffens every variant of its
 * row), so dealing them out in turn gives shards of similar run time. The split depends only on the index
 * and {@code n}, never on the machine, the threads or the time.
 *
 * @param k this shard's number, 1 to n
 * @param n the number of shards
 */
record Shard(int k, int n) {

    private static final Pattern K_OF_N = Pattern.compile("^\\s*(\\d{1,9})\\s*/\\s*(\\d{1,9})\\s*$");

    /** @throws IllegalArgumentException when not 1 <= k <= n */
    Shard {
        if (n < 1 || k < 1 || k > n) {
            throw new IllegalArgumentException("shard " + k + " of " + n);
        }
    }

    /**
     * Reads the {@code --shard} option, before any run.
     *
     * @param text what the user wrote, e.g. "2/4"
     * @return the shard
     * @throws org.branchsim.core.error.BranchsimException BAD_ARGUMENT naming --shard, what was expected and
     *         what was found
     */
    static Shard parse(String text) {
        Matcher m = K_OF_N.matcher(text);
        if (!m.matches()) {
            throw OptionChecks.unreadable("--shard", "K/N, this machine's shard K of N shards as whole numbers "
                    + "(e.g. 2/4)", "\"" + text + "\"");
        }
        int k = Integer.parseInt(m.group(1));
        int n = Integer.parseInt(m.group(2));
        if (n < 1) {
            throw OptionChecks.outOfRange("--shard " + text.trim(), "N (the number of shards) of at least 1",
                    String.valueOf(n));
        }
        if (k < 1 || k > n) {
            throw OptionChecks.outOfRange("--shard " + text.trim(), "K (this shard) from 1 to N = " + n,
                    String.valueOf(k));
        }
        return new Shard(k, n);
    }

    /**
     * @param variants the number of variants of the whole study
     * @return this shard, when every shard gets at least one variant
     * @throws org.branchsim.core.error.BranchsimException BAD_ARGUMENT naming --shard when n exceeds the
     *         number of variants
     */
    Shard requireAtMost(int variants) {
        if (n > variants) {
            throw OptionChecks.outOfRange("--shard " + this, "N (the number of shards) at most the number of "
                    + "variants, " + variants, String.valueOf(n));
        }
        return this;
    }

    /** @return true when the variant with this 0-based index belongs to this shard */
    boolean holds(int index) {
        return index % n == k - 1;
    }

    /** @return the variants of the whole study that belong to this shard, in variant order */
    List<Variant> select(List<Variant> all) {
        return all.stream().filter(v -> holds(v.index())).toList();
    }

    /** @return the number of variants this shard holds in a study of {@code variants} */
    int size(int variants) {
        return variants / n + (k - 1 < variants % n ? 1 : 0);
    }

    /** @return the end of a shard folder's default name, e.g. "-shard-2-of-4" */
    String folderSuffix() {
        return String.format(Locale.ROOT, "-shard-%d-of-%d", k, n);
    }

    @Override
    public String toString() {
        return k + "/" + n;
    }
}
