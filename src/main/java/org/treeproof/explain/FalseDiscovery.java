package org.treeproof.explain;

import java.util.Arrays;

/**
 * Benjamini-Hochberg adjusted p-values (q-values): {@code q_(i) = min_{j ≥ i} min(1, m p_(j) / j)} over the
 * {@code m} p-values in increasing order. A p-value that is NaN (no test) gets a NaN q-value and does not count
 * in {@code m}.
 *
 * <p>Y. Benjamini and Y. Hochberg, "Controlling the false discovery rate: a practical and powerful approach to
 * multiple testing", Journal of the Royal Statistical Society B 57 (1995) 289-300,
 * doi:10.1111/j.2517-6161.1995.tb02031.x.
 */
public final class FalseDiscovery {
    private FalseDiscovery() {
    }

    /** The q-values of {@code p}, in the same order. */
    public static double[] benjaminiHochberg(double[] p) {
        int m = 0;
        for (double v : p) {
            m += Double.isNaN(v) ? 0 : 1;
        }
        double[] q = new double[p.length];
        Arrays.fill(q, Double.NaN);
        if (m == 0) {
            return q;
        }
        double[] sortedP = new double[m];
        Integer[] order = new Integer[m];
        int t = 0;
        for (int i = 0; i < p.length; i++) {
            if (!Double.isNaN(p[i])) {
                order[t++] = i;
            }
        }
        // ties keep input order, so the result does not depend on the sort's stability
        Arrays.sort(order, (a, b) -> {
            int c = Double.compare(p[a], p[b]);
            return c != 0 ? c : Integer.compare(a, b);
        });
        for (int r = 0; r < m; r++) {
            sortedP[r] = p[order[r]];
        }
        double running = 1.0;
        for (int r = m - 1; r >= 0; r--) {
            running = Math.min(running, sortedP[r] * m / (r + 1));
            q[order[r]] = running;
        }
        return q;
    }
}
