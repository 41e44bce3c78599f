package org.branchsim.core.results;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.units.Dimension;

/**
 * Signals sampled on a uniform time grid: times in s and, per signal, values in SI. Samples are kept in
 * fixed-size chunks of primitive doubles (time and values of a row side by side), filled while the run
 * integrates: no boxing, no array per sample, and no copying of earlier samples as the trace grows.
 */
public final class Trace {

    /** Name and dimension of one column. */
    public record Column(String name, Dimension dimension) {
    }

    /** Samples per chunk. */
    private static final int CHUNK_ROWS = 1024;

    private final List<Column> columns;
    /** Doubles per row: the time, then one value per column. */
    private final int stride;
    private final List<double[]> chunks = new ArrayList<>();
    private int size;

    /** @param columns the signals, in column order */
    public Trace(List<Column> columns) {
        this.columns = List.copyOf(columns);
        this.stride = this.columns.size() + 1;
    }

    /** Appends one sample: time (s) and the values of all signals (SI) in column order (copied). */
    public void add(double t, double[] values) {
        if (values.length != columns.size()) {
            throw new IllegalArgumentException("a sample has " + columns.size() + " values, not " + values.length);
        }
        int r = size % CHUNK_ROWS;
        if (r == 0) {
            chunks.add(new double[CHUNK_ROWS * stride]);
        }
        double[] chunk = chunks.get(chunks.size() - 1);
        chunk[r * stride] = t;
        System.arraycopy(values, 0, chunk, r * stride + 1, values.length);
        size++;
    }

    /** @return the place of the time of sample k in its chunk */
    private int offset(int k) {
        if (k < 0 || k >= size) {
            throw new IndexOutOfBoundsException("sample " + k + " of " + size);
        }
        return (k % CHUNK_ROWS) * stride;
    }

    /** @return the columns */
    public List<Column> columns() {
        return columns;
    }

    /** @return the number of samples */
    public int size() {
        return size;
    }

    /** @return the time of sample k, s */
    public double time(int k) {
        return chunks.get(k / CHUNK_ROWS)[offset(k)];
    }

    /** @return all sample times, s */
    public double[] times() {
        return column(0);
    }

    /** @return the value of signal i at sample k, SI */
    public double value(int k, int i) {
        if (i < 0 || i >= columns.size()) {
            throw new IndexOutOfBoundsException("signal " + i + " of " + columns.size());
        }
        return chunks.get(k / CHUNK_ROWS)[offset(k) + 1 + i];
    }

    /** @return the doubles at place j of every row (0 the time, 1 + i signal i) */
    private double[] column(int j) {
        double[] out = new double[size];
        for (int k = 0; k < size; k++) {
            out[k] = chunks.get(k / CHUNK_ROWS)[(k % CHUNK_ROWS) * stride + j];
        }
        return out;
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
        if (i < 0 || i >= columns.size()) {
            throw new IndexOutOfBoundsException("signal " + i + " of " + columns.size());
        }
        return column(1 + i);
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
        double[] v = new double[idx.length];
        for (int r = 0; r < size; r++) {
            for (int k = 0; k < idx.length; k++) {
                v[k] = value(r, idx[k]);
            }
            out.add(time(r), v);
        }
        return out;
    }

    /** @return the value of a signal at the sample nearest to time t, SI */
    public double valueAt(String name, double t) {
        int i = indexOf(name);
        int best = 0;
        for (int k = 0; k < size; k++) {
            if (Math.abs(time(k) - t) < Math.abs(time(best) - t)) {
                best = k;
            }
        }
        return value(best, i);
    }
}
