package org.treeproof.data;

import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;

/**
 * An immutable samples-by-features table of finite or missing ({@code NaN}) values.
 *
 * <p>Values are held row-major: sample {@code i}, feature {@code j} is at {@code i * features() + j}.
 * The array given to the constructor is copied; {@link #rowMajorCopy()} returns a copy, so no caller
 * can change a matrix after it is made. Sample ids and feature names must be unique and non-empty.
 *
 * <p>Serializable (to run replicates on other machines) through a proxy that goes back through the
 * constructor, so a deserialized matrix is checked like any other.
 */
public final class DataMatrix implements Serializable {
    private static final long serialVersionUID = 1L;

    private final List<String> sampleIds;
    private final List<String> featureNames;
    private final double[] values;

    /**
     * @param sampleIds    one id per row, unique
     * @param featureNames one name per column, unique
     * @param values       row-major values, length {@code sampleIds.size() * featureNames.size()}; copied
     */
    public DataMatrix(List<String> sampleIds, List<String> featureNames, double[] values) {
        this.sampleIds = List.copyOf(Objects.requireNonNull(sampleIds, "sampleIds"));
        this.featureNames = List.copyOf(Objects.requireNonNull(featureNames, "featureNames"));
        Objects.requireNonNull(values, "values");
        long expected = (long) this.sampleIds.size() * this.featureNames.size();
        if (values.length != expected) {
            throw new IllegalArgumentException("values has length " + values.length + ", expected "
                    + this.sampleIds.size() + " x " + this.featureNames.size() + " = " + expected);
        }
        requireUnique(this.sampleIds, "sample id");
        requireUnique(this.featureNames, "feature name");
        this.values = values.clone();
    }

    private static void requireUnique(List<String> names, String what) {
        var seen = new HashSet<String>(names.size() * 2);
        for (String s : names) {
            if (s.isEmpty()) {
                throw new IllegalArgumentException("empty " + what);
            }
            if (!seen.add(s)) {
                throw new IllegalArgumentException("duplicate " + what + " '" + s + "'");
            }
        }
    }

    public int samples() {
        return sampleIds.size();
    }

    public int features() {
        return featureNames.size();
    }

    public List<String> sampleIds() {
        return sampleIds;
    }

    public List<String> featureNames() {
        return featureNames;
    }

    /** The value of sample {@code i}, feature {@code j} ({@code NaN} when missing). */
    public double get(int i, int j) {
        Objects.checkIndex(i, samples());
        Objects.checkIndex(j, features());
        return values[i * featureNames.size() + j];
    }

    /** Copies row {@code i} into {@code dst} starting at {@code offset}. */
    public void copyRow(int i, double[] dst, int offset) {
        Objects.checkIndex(i, samples());
        System.arraycopy(values, i * features(), dst, offset, features());
    }

    /** A fresh copy of row {@code i}. */
    public double[] row(int i) {
        double[] r = new double[features()];
        copyRow(i, r, 0);
        return r;
    }

    /** A fresh copy of column {@code j}. */
    public double[] column(int j) {
        Objects.checkIndex(j, features());
        int p = features();
        double[] c = new double[samples()];
        for (int i = 0; i < c.length; i++) {
            c[i] = values[i * p + j];
        }
        return c;
    }

    /** A fresh row-major copy of all values. */
    public double[] rowMajorCopy() {
        return values.clone();
    }

    /** The number of missing ({@code NaN}) cells. */
    public long missingCount() {
        long c = 0;
        for (double v : values) {
            if (Double.isNaN(v)) {
                c++;
            }
        }
        return c;
    }

    /** The matrix restricted to the given rows (in the given order, repeats not allowed) and all columns. */
    public DataMatrix selectSamples(int[] rows) {
        int p = features();
        double[] v = new double[rows.length * p];
        String[] ids = new String[rows.length];
        for (int r = 0; r < rows.length; r++) {
            ids[r] = sampleIds.get(rows[r]);
            System.arraycopy(values, rows[r] * p, v, r * p, p);
        }
        return new DataMatrix(List.of(ids), featureNames, v);
    }

    /** The matrix restricted to the given columns (in the given order, repeats not allowed) and all rows. */
    public DataMatrix selectFeatures(int[] cols) {
        int p = features();
        int n = samples();
        double[] v = new double[n * cols.length];
        String[] names = new String[cols.length];
        for (int c = 0; c < cols.length; c++) {
            names[c] = featureNames.get(cols[c]);
        }
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < cols.length; c++) {
                v[i * cols.length + c] = values[i * p + cols[c]];
            }
        }
        return new DataMatrix(sampleIds, List.of(names), v);
    }

    /** The transpose: features become samples. */
    public DataMatrix transpose() {
        int n = samples();
        int p = features();
        double[] t = new double[n * p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                t[j * n + i] = values[i * p + j];
            }
        }
        return new DataMatrix(featureNames, sampleIds, t);
    }

    private Object writeReplace() {
        return new SerialForm(sampleIds, featureNames, values);
    }

    private void readObject(ObjectInputStream in) throws java.io.InvalidObjectException {
        throw new java.io.InvalidObjectException("a DataMatrix is read through its serial form");
    }

    /** What is written for a matrix: its names and values, read back through the constructor. */
    private record SerialForm(List<String> sampleIds, List<String> featureNames, double[] values)
            implements Serializable {
        private Object readResolve() {
            return new DataMatrix(sampleIds, featureNames, values);
        }
    }

    @Override
    public String toString() {
        return "DataMatrix[" + samples() + " samples x " + features() + " features]";
    }
}
