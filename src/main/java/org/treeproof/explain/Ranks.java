package org.treeproof.explain;

import java.util.Arrays;

/**
 * Mid-ranks (ties share the mean of the ranks they span, 1-based) and the tie term {@code Σ (t³ − t)} over
 * the groups of {@code t} tied values, as the rank tests' tie corrections need them. Values must not be NaN.
 */
final class Ranks {
    private Ranks() {
    }

    /**
     * Writes the mid-rank of {@code values[i]} to {@code ranks[i]} for {@code i < n}.
     *
     * @param sorted scratch of at least {@code n} doubles
     * @return the tie term {@code Σ (t³ − t)}
     */
    static double midranks(double[] values, int n, double[] ranks, double[] sorted) {
        System.arraycopy(values, 0, sorted, 0, n);
        Arrays.sort(sorted, 0, n);
        double ties = 0;
        int start = 0;
        for (int p = 1; p <= n; p++) {
            if (p == n || sorted[p] != sorted[start]) {
                double t = p - start;
                ties += t * t * t - t;
                start = p;
            }
        }
        for (int i = 0; i < n; i++) {
            double v = values[i];
            int lo = lowerBound(sorted, n, v);
            int hi = upperBound(sorted, lo, n, v);
            ranks[i] = (lo + hi + 1) / 2.0;
        }
        return ties;
    }

    /** The first index whose value is not below {@code v}. */
    private static int lowerBound(double[] a, int n, double v) {
        int lo = 0;
        int hi = n;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] < v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** The first index from {@code from} whose value is above {@code v}. */
    private static int upperBound(double[] a, int from, int n, double v) {
        int lo = from;
        int hi = n;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] <= v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
