package org.treeproof.chart;

import java.util.Objects;

/** Argument checks shared by the chart-input records; each failure names the component concerned. */
final class Check {
    private Check() {
    }

    static String text(String s, String what) {
        Objects.requireNonNull(s, what);
        if (s.isBlank()) {
            throw new IllegalArgumentException(what + " must not be blank");
        }
        return s;
    }

    static String[] texts(String[] a, int length, String what) {
        Objects.requireNonNull(a, what);
        length(a.length, length, what);
        String[] c = a.clone();
        for (int i = 0; i < c.length; i++) {
            if (c[i] == null) {
                throw new IllegalArgumentException(what + "[" + i + "] is null");
            }
        }
        return c;
    }

    static void length(int actual, int expected, String what) {
        if (actual != expected) {
            throw new IllegalArgumentException(what + " has length " + actual + ", expected " + expected);
        }
    }

    /** A copy of {@code a} after checking its length and that every value is finite. */
    static double[] finite(double[] a, int length, String what) {
        Objects.requireNonNull(a, what);
        length(a.length, length, what);
        for (int i = 0; i < a.length; i++) {
            if (!Double.isFinite(a[i])) {
                throw new IllegalArgumentException(what + "[" + i + "] is " + a[i] + "; it must be finite");
            }
        }
        return a.clone();
    }

    /** A copy of {@code a} after checking its length and that every value lies in {@code [lo, hi]}. */
    static double[] within(double[] a, int length, double lo, double hi, boolean nanAllowed, String what) {
        Objects.requireNonNull(a, what);
        length(a.length, length, what);
        for (int i = 0; i < a.length; i++) {
            double v = a[i];
            if (Double.isNaN(v) ? !nanAllowed : (v < lo || v > hi)) {
                throw new IllegalArgumentException(what + "[" + i + "] is " + v + "; it must lie in [" + lo + ", "
                        + hi + "]" + (nanAllowed ? " or be NaN (no value)" : ""));
            }
        }
        return a.clone();
    }

    /**
     * A copy of {@code labels} after checking its length and that it uses exactly the labels
     * {@code 0..k-1}, none skipped; returns the copy (k is recomputed by callers with {@link #count}).
     */
    static int[] labels(int[] labels, int length, String what) {
        Objects.requireNonNull(labels, what);
        length(labels.length, length, what);
        int k = 0;
        for (int i = 0; i < labels.length; i++) {
            if (labels[i] < -1) {
                throw new IllegalArgumentException(what + "[" + i + "] is " + labels[i]
                        + "; labels start at 0 (-1 marks an outlier)");
            }
            k = Math.max(k, labels[i] + 1);
        }
        boolean[] used = new boolean[k];
        for (int l : labels) {
            if (l >= 0) {
                used[l] = true;
            }
        }
        for (int c = 0; c < k; c++) {
            if (!used[c]) {
                throw new IllegalArgumentException(what + " skips label " + c + "; use labels 0.." + (k - 1)
                        + " with none unused");
            }
        }
        return labels.clone();
    }

    /** The number of distinct labels in a checked label array. */
    static int count(int[] labels) {
        int k = 0;
        for (int l : labels) {
            k = Math.max(k, l + 1);
        }
        return k;
    }

    /** A copy of {@code order} after checking it is a permutation of {@code 0..n-1}. */
    static int[] permutation(int[] order, int n, String what) {
        Objects.requireNonNull(order, what);
        length(order.length, n, what);
        boolean[] seen = new boolean[n];
        for (int i = 0; i < n; i++) {
            int v = order[i];
            if (v < 0 || v >= n || seen[v]) {
                throw new IllegalArgumentException(what + " is not a permutation of 0.." + (n - 1) + " (entry " + i
                        + " is " + v + ")");
            }
            seen[v] = true;
        }
        return order.clone();
    }
}
