package org.treeproof.distance;

import java.util.Objects;

/**
 * A condensed matrix with one owner, who may give its array up to an algorithm that overwrites it: a linkage
 * can then work in place instead of on a copy, which halves the largest memory of a run that no longer needs
 * the distances after clustering.
 *
 * <p>Single ownership: {@link #take()} and {@link #freeze()} each end the owner's use of the matrix, and any
 * further call fails with {@link IllegalStateException}. Whoever creates one must not keep another reference
 * to its array, and must not share the object between threads.
 */
public final class OwnedDistances implements CondensedRows {
    private final int n;
    private double[] values;

    private OwnedDistances(int n, double[] values) {
        this.n = n;
        this.values = values;
    }

    /** Takes ownership of {@code condensed} without copying, after checking it like {@link CondensedDistances#of}. */
    static OwnedDistances wrap(int n, double[] condensed) {
        CondensedDistances.check(n, condensed);
        return new OwnedDistances(n, condensed);
    }

    /** Takes ownership of values that come from a checked matrix, without looking at them again. */
    static OwnedDistances trusted(int n, double[] condensed) {
        return new OwnedDistances(n, condensed);
    }

    /** A copy of these distances, with an owner of its own. */
    public OwnedDistances copy() {
        return new OwnedDistances(n, array().clone());
    }

    /**
     * A copy of these distances in {@code out} (of this matrix's length), which the caller lends to the copy: the
     * caller may use {@code out} again only once the copy's last user (e.g. a linkage working in place) is done.
     */
    public OwnedDistances copyInto(double[] out) {
        double[] v = array();
        if (out.length != v.length) {
            throw new IllegalArgumentException("an array of " + out.length + " values cannot hold a copy of "
                    + v.length);
        }
        System.arraycopy(v, 0, out, 0, v.length);
        return new OwnedDistances(n, out);
    }

    /**
     * A copy of {@code distances} in {@code out} (of the matrix's length), lent by the caller as for
     * {@link #copyInto}.
     */
    public static OwnedDistances copyOf(CondensedDistances distances, double[] out) {
        Objects.requireNonNull(distances, "distances");
        if (out.length != CondensedDistances.length(distances.size())) {
            throw new IllegalArgumentException("an array of " + out.length + " values cannot hold a copy of the "
                    + "distances of " + distances.size() + " items");
        }
        distances.copyInto(out);
        return new OwnedDistances(distances.size(), out);
    }

    /** A copy of {@code distances} that its owner may give up. */
    public static OwnedDistances copyOf(CondensedDistances distances) {
        Objects.requireNonNull(distances, "distances");
        return new OwnedDistances(distances.size(), distances.toCondensedArray());
    }

    /** The number of items. */
    @Override
    public int size() {
        return n;
    }

    /** Whether the array has been given up. */
    public boolean taken() {
        return values == null;
    }

    /** The value at condensed position {@code t}. */
    public double at(int t) {
        return array()[t];
    }

    /** Rows straight from the array; the visitor must not change it. */
    @Override
    public void forEachRow(RowVisitor visitor) {
        double[] v = array();
        int t = 0;
        for (int i = 0; i < n - 1; i++) {
            visitor.row(i, v, t);
            t += n - i - 1;
        }
    }

    /**
     * Gives up the condensed array (length {@code n(n-1)/2}, the usual layout) for the caller to overwrite; this
     * object is empty afterwards.
     */
    public double[] take() {
        double[] v = array();
        values = null;
        return v;
    }

    /** Gives up the array as an immutable matrix, without copying; this object is empty afterwards. */
    public CondensedDistances freeze() {
        return CondensedDistances.trusted(n, take());
    }

    private double[] array() {
        if (values == null) {
            throw new IllegalStateException("these distances have been given up");
        }
        return values;
    }

    @Override
    public String toString() {
        return "OwnedDistances[n=" + n + (values == null ? ", taken]" : "]");
    }
}
