package org.branchsim.core.results;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.units.Dimension;

/**
 * Signals sampled on a uniform time grid: times in s and, per signal, values in SI.
 */
public final class Trace {

    /** Name and dimension of one column. */
    public record Column(String name, Dimension dimension) {
    }

    private final List<Column> columns;
    private final List<Double> times = new ArrayList<>();
    private final List<double[]> rows = new ArrayList<>();

    /** @param columns the signals, in column order */
    public Trace(List<Column> columns) {
        this.columns = List.copyOf(columns);
    }

    /** Appends one sample: time (s) and the values of all signals (SI) in column order. */
    public void add(double t, double[] values) {
        times.add(t);
        rows.add(values.clone());
    }

    /** @return the columns */
    public List<Column> columns() {
        return columns;
    }

    /** @return the number of samples */
    public int size() {
        return times.size();
    }

    /** @return the time of sample k, s */
    public double time(int k) {
        return times.get(k);
    }

    /** @return all sample times, s */
    public double[] times() {
        return times.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** @return the value of signal i at sample k, SI */
    public double value(int k, int i) {
        return rows.get(k)[i];
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
        double[] out = new double[rows.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = rows.get(k)[i];
        }
        return out;
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
        for (int r = 0; r < rows.size(); r++) {
            double[] row = rows.get(r);
            double[] v = new double[idx.length];
            for (int k = 0; k < idx.length; k++) {
                v[k] = row[idx[k]];
            }
            out.add(times.get(r), v);
        }
        return out;
    }

    /** @return the value of a signal at the sample nearest to time t, SI */
    public double valueAt(String name, double t) {
        int i = indexOf(name);
        int best = 0;
        for (int k = 0; k < times.size(); k++) {
            if (Math.abs(times.get(k) - t) < Math.abs(times.get(best) - t)) {
                best = k;
            }
        }
        return rows.get(best)[i];
    }
}
