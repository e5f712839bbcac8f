package org.treeproof.distance;

import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;
import java.util.Objects;

/**
 * An immutable symmetric dissimilarity matrix with zero diagonal, stored as its upper triangle.
 *
 * <p>The layout is the conventional condensed one (as in scipy's {@code pdist}): for {@code i < j}
 * the pair {@code (i, j)} is at {@code n*i - i*(i+1)/2 + (j - i - 1)}. Length {@code n(n-1)/2}, held
 * in one {@code double[]}, so the largest supported {@code n} is about 65 000.
 *
 * <p>Serializable through a proxy that is checked again when read; a study ships distances only when it has
 * no data table to compute them from.
 */
public final class CondensedDistances implements Serializable, CondensedRows {
    private static final long serialVersionUID = 1L;

    private final int n;
    private final double[] values;

    private CondensedDistances(int n, double[] values) {
        this.n = n;
        this.values = values;
    }

    /**
     * A matrix over {@code n} items from a condensed array, which is copied.
     *
     * @throws IllegalArgumentException if the length is wrong or a value is negative or not finite
     */
    public static CondensedDistances of(int n, double[] condensed) {
        Objects.requireNonNull(condensed, "condensed");
        return wrap(n, condensed.clone());
    }

    /** Takes ownership of {@code condensed} without copying; only for code in this package that made it. */
    static CondensedDistances wrap(int n, double[] condensed) {
        check(n, condensed);
        return new CondensedDistances(n, condensed);
    }

    /** Takes ownership of an array already {@linkplain #check checked}, without looking at it again. */
    static CondensedDistances trusted(int n, double[] condensed) {
        return new CondensedDistances(n, condensed);
    }

    /**
     * Checks a condensed array over {@code n} items: its length, and every value finite and non-negative.
     *
     * @throws IllegalArgumentException naming the first violation
     */
    static void check(int n, double[] condensed) {
        if (n < 1) {
            throw new IllegalArgumentException("need at least one item, got " + n);
        }
        if (condensed.length != length(n)) {
            throw new IllegalArgumentException("condensed length " + condensed.length + " does not match n = " + n
                    + " (expected " + length(n) + ")");
        }
        for (int t = 0; t < condensed.length; t++) {
            double v = condensed[t];
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("distance at condensed position " + t + " is " + v
                        + "; distances must be finite and non-negative");
            }
        }
    }

    /** The most items a condensed matrix holds: n(n-1)/2 pairs must fit one Java array. */
    public static final int MAX_ITEMS = 65_536;

    /** The condensed length for {@code n} items, {@code n(n-1)/2}; fails if it does not fit an array. */
    public static int length(int n) {
        long len = (long) n * (n - 1) / 2;
        if (len > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException(n + " items need " + len + " pairwise distances, more than one array holds");
        }
        return (int) len;
    }

    /** The condensed index of pair {@code (i, j)}, {@code i != j}, in either order. */
    public static int index(int n, int i, int j) {
        if (i > j) {
            int t = i;
            i = j;
            j = t;
        }
        return (int) ((long) n * i - (long) i * (i + 1) / 2 + (j - i - 1));
    }

    /** The number of items. */
    public int size() {
        return n;
    }

    /** The dissimilarity between items {@code i} and {@code j}; 0 when {@code i == j}. */
    public double get(int i, int j) {
        Objects.checkIndex(i, n);
        Objects.checkIndex(j, n);
        return i == j ? 0.0 : values[index(n, i, j)];
    }

    /** The value at condensed position {@code t}. */
    public double at(int t) {
        return values[t];
    }

    /** Each row is copied into a buffer of the pass, so the visitor never sees this matrix's own array. */
    @Override
    public void forEachRow(RowVisitor visitor) {
        double[] row = new double[Math.max(0, n - 1)];
        int t = 0;
        for (int i = 0; i < n - 1; i++) {
            int len = n - i - 1;
            System.arraycopy(values, t, row, 0, len);
            visitor.row(i, row, 0);
            t += len;
        }
    }

    /** A fresh copy of the condensed array (for algorithms that update distances in place). */
    public double[] toCondensedArray() {
        return values.clone();
    }

    /** Copies the condensed array into {@code dst}, which must have length {@code n(n-1)/2}. */
    public void copyInto(double[] dst) {
        System.arraycopy(values, 0, dst, 0, values.length);
    }

    /**
     * The sub-matrix over the given items, in the given order. Items may repeat (bootstrap): a repeated
     * item is at distance 0 from its copy. Never recomputes a distance.
     */
    public CondensedDistances gather(int[] items) {
        return new CondensedDistances(items.length, gatherValues(items));
    }

    /** {@link #gather} as a matrix the caller owns and may give up to a linkage that works in place. */
    public OwnedDistances gatherOwned(int[] items) {
        return OwnedDistances.trusted(items.length, gatherValues(items));
    }

    /**
     * {@link #gatherOwned} into {@code out}, an array of length {@code length(items.length)} that the caller lends
     * to the result: its old values are overwritten, and the caller may use it again only once the result's last
     * user (e.g. a linkage working in place) is done with it. Saves allocating (and zeroing) a matrix per replicate.
     */
    public OwnedDistances gatherOwned(int[] items, double[] out) {
        if (out.length != length(items.length)) {
            throw new IllegalArgumentException("an array of " + out.length + " values cannot hold the distances of "
                    + items.length + " items");
        }
        return OwnedDistances.trusted(items.length, gatherValues(items, out));
    }

    private double[] gatherValues(int[] items) {
        return gatherValues(items, new double[length(items.length)]);
    }

    private double[] gatherValues(int[] items, double[] out) {
        int m = items.length;
        // (i, j) with i < j is at base[i] + j: one addition per pair instead of the index arithmetic
        int[] base = new int[m];
        for (int a = 0; a < m; a++) {
            int i = items[a];
            Objects.checkIndex(i, n);
            base[a] = (int) ((long) n * i - (long) i * (i + 1) / 2 - i - 1);
        }
        double[] v = values;
        int t = 0;
        for (int a = 0; a < m; a++) {
            int i = items[a];
            int bi = base[a];
            for (int b = a + 1; b < m; b++) {
                int j = items[b];
                out[t++] = i < j ? v[bi + j] : i > j ? v[base[b] + i] : 0.0;
            }
        }
        return out;
    }

    /** Bytes needed to hold a condensed matrix over {@code n} items. */
    public static long bytesFor(long n) {
        return n * (n - 1) / 2 * Double.BYTES;
    }

    private Object writeReplace() {
        return new SerialForm(n, values);
    }

    private void readObject(ObjectInputStream in) throws java.io.InvalidObjectException {
        throw new java.io.InvalidObjectException("CondensedDistances are read through their serial form");
    }

    /** What is written: the size and the condensed values, checked again by {@link #wrap}. */
    private record SerialForm(int n, double[] values) implements Serializable {
        private Object readResolve() {
            return wrap(n, values);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CondensedDistances c && c.n == n && Arrays.equals(c.values, values);
    }

    @Override
    public int hashCode() {
        return 31 * n + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "CondensedDistances[n=" + n + "]";
    }
}
