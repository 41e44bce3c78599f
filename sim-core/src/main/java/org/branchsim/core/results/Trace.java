package org.branchsim.core.results;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;
import org.branchsim.core.units.Dimension;

/**
 * Signals sampled on a uniform time grid: times in s and, per signal, values in SI. Samples are appended while
 * the run integrates and kept in a bounded-memory store: chunks of primitive doubles, column by column, on the
 * heap up to {@link #DEFAULT_MEMORY_BUDGET} bytes and beyond it in a {@link SpillSpace} (a temporary file the
 * command line provides through {@link #spillingTo}; released on {@link #close}, or when the trace is
 * collected). Without a spill space every sample stays on the heap. Analysis reads it a column at a time ({@link #series}), writers row by row
 * ({@link #row}). A fingerprint of every column, taken as samples arrive, tells identical columns apart
 * without reading them ({@link #sameSeries}).
 */
public final class Trace implements AutoCloseable {

    /** Name and dimension of one column. */
    public record Column(String name, Dimension dimension) {
    }

    /** Bytes of samples kept on the heap before later samples go to the spill space, if any (8 MiB). */
    public static final long DEFAULT_MEMORY_BUDGET = 8L << 20;

    /** Multiplier of the 64-bit FNV-1a hash (Fowler, Noll and Vo; IETF draft-eastlake-fnv, 2019). */
    private static final long FNV_PRIME = 0x100000001b3L;
    private static final long FNV_OFFSET = 0xcbf29ce484222325L;

    /** The spill space traces made on this thread use (see {@link #spillingTo}). */
    private static final ThreadLocal<SpillSpace> SPACE = new ThreadLocal<>();

    private final List<Column> columns;
    private final SampleStore store;
    private final long[] fingerprint;

    /**
     * @param columns the signals, in column order (samples beyond {@link #DEFAULT_MEMORY_BUDGET} go to the spill
     *        space of {@link #spillingTo} on this thread, if any)
     */
    public Trace(List<Column> columns) {
        this(columns, DEFAULT_MEMORY_BUDGET, SPACE.get());
    }

    /**
     * @param columns the signals, in column order
     * @param memoryBudget bytes of samples kept on the heap before later ones go to the spill space
     * @param space where they go, or null to keep every sample on the heap
     */
    public Trace(List<Column> columns, long memoryBudget, SpillSpace space) {
        this.columns = List.copyOf(columns);
        this.store = new SampleStore(this.columns.size() + 1, memoryBudget, space);
        this.fingerprint = new long[this.columns.size()];
        Arrays.fill(fingerprint, FNV_OFFSET);
    }

    /**
     * Runs a piece of work whose traces, made on this thread, keep samples beyond the memory budget in a spill
     * space (a run of the command line: its samples go to a temporary file instead of the heap).
     *
     * @param space the spill space
     * @param work the work (e.g. a simulation run)
     * @param <T> what it returns
     * @return what the work returned
     */
    public static <T> T spillingTo(SpillSpace space, Supplier<T> work) {
        SpillSpace before = SPACE.get();
        SPACE.set(space);
        try {
            return work.get();
        } finally {
            if (before == null) {
                SPACE.remove();
            } else {
                SPACE.set(before);
            }
        }
    }

    /** Appends one sample: time (s) and the values of all signals (SI) in column order (copied). */
    public void add(double t, double[] values) {
        if (values.length != columns.size()) {
            throw new IllegalArgumentException("a sample has " + columns.size() + " values, not " + values.length);
        }
        store.append(t, values);
        for (int i = 0; i < values.length; i++) {
            fingerprint[i] = (fingerprint[i] ^ Double.doubleToLongBits(values[i])) * FNV_PRIME;
        }
    }

    /** Releases the spill region (deletes the temporary file), if the trace needed one; its samples are gone then. */
    @Override
    public void close() {
        store.close();
    }

    /** @return bytes of samples written to the spill space (0 while the trace fits its memory budget) */
    public long spilledBytes() {
        return store.spilledBytes();
    }

    /** @return the columns */
    public List<Column> columns() {
        return columns;
    }

    /** @return the number of samples */
    public int size() {
        return store.size();
    }

    /** @return the time of sample k, s */
    public double time(int k) {
        return store.get(k, 0);
    }

    /** @return all sample times, s */
    public double[] times() {
        return store.column(0, 0, store.size());
    }

    /** @return the times of samples from (inclusive) to to (exclusive), s */
    public double[] times(int from, int to) {
        return store.column(0, from, to);
    }

    /** @return the value of signal i at sample k, SI */
    public double value(int k, int i) {
        return store.get(k, 1 + checked(i));
    }

    /**
     * Copies sample k: its time (s) into {@code out[0]}, signal i (SI) into {@code out[1 + i]}.
     *
     * @param k sample index
     * @param out at least one more place than there are columns
     */
    public void row(int k, double[] out) {
        store.row(k, out);
    }

    private int checked(int i) {
        if (i < 0 || i >= columns.size()) {
            throw new IndexOutOfBoundsException("signal " + i + " of " + columns.size());
        }
        return i;
    }

    /** @return the index of a column by name, or -1 */
    public int indexOf(String name) {
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /** @return the whole series of a signal, SI */
    public double[] series(int i) {
        return store.column(1 + checked(i), 0, store.size());
    }

    /** @return signal i at samples from (inclusive) to to (exclusive), SI */
    public double[] series(int i, int from, int to) {
        return store.column(1 + checked(i), from, to);
    }

    /**
     * @param i one signal
     * @param j another
     * @return true when the two signals are equal sample for sample (as {@link Arrays#equals(double[], double[])}
     *         says); read only when their fingerprints agree
     */
    public boolean sameSeries(int i, int j) {
        if (checked(i) == checked(j)) {
            return true;
        }
        return fingerprint[i] == fingerprint[j] && Arrays.equals(series(i), series(j));
    }

    /** @return the whole series of a signal by name, SI */
    public double[] series(String name) {
        int i = indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("no signal named " + name);
        }
        return series(i);
    }

    /** @return a trace with only the named signals (same times) */
    public Trace select(List<String> names) {
        List<Column> cols = new ArrayList<>();
        int[] idx = new int[names.size()];
        for (int k = 0; k < names.size(); k++) {
            idx[k] = indexOf(names.get(k));
            if (idx[k] < 0) {
                throw new IllegalArgumentException("no signal named " + names.get(k));
            }
            cols.add(columns.get(idx[k]));
        }
        Trace out = new Trace(cols);
        double[] row = new double[columns.size() + 1];
        double[] v = new double[idx.length];
        for (int r = 0; r < size(); r++) {
            row(r, row);
            for (int k = 0; k < idx.length; k++) {
                v[k] = row[1 + idx[k]];
            }
            out.add(row[0], v);
        }
        return out;
    }

    /** @return the value of a signal at the sample nearest to time t, SI */
    public double valueAt(String name, double t) {
        int i = indexOf(name);
        double[] times = times();
        int best = 0;
        for (int k = 0; k < times.length; k++) {
            if (Math.abs(times[k] - t) < Math.abs(times[best] - t)) {
                best = k;
            }
        }
        return value(best, i);
    }
}
