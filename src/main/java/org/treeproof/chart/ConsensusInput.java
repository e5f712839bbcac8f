package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the consensus heat map shows: for every pair of samples, the share of replicates that put both in the
 * same cluster (the consensus matrix of S. Monti, P. Tamayo, J. Mesirov and T. Golub, Machine Learning 52
 * (2003) 91-118, doi:10.1023/A:1023949509487), ordered by the tree.
 *
 * @param title         the chart title in plain words, e.g. "Consensus of 200 replicates at k = 4"
 * @param n             the number of samples, at least 2
 * @param condensed     the upper triangle in the condensed layout (pair {@code i < j} at
 *                      {@code n*i - i*(i+1)/2 + (j-i-1)}, length {@code n(n-1)/2}); values in [0, 1], NaN for a
 *                      pair never drawn together; the diagonal is 1 and not stored
 * @param leafOrder     the order of samples along both axes (the tree's leaf order), a permutation of
 *                      {@code 0..n-1}
 * @param clusterOfItem cluster labels {@code 0..k-1} per sample (input order), none unused
 */
public record ConsensusInput(String title, int n, double[] condensed, int[] leafOrder, int[] clusterOfItem) {

    public ConsensusInput {
        Check.text(title, "title");
        if (n < 2) {
            throw new IllegalArgumentException("need at least 2 samples, got " + n);
        }
        Objects.requireNonNull(condensed, "condensed");
        long expected = (long) n * (n - 1) / 2;
        if (condensed.length != expected) {
            throw new IllegalArgumentException("condensed has length " + condensed.length + ", expected n(n-1)/2 = "
                    + expected);
        }
        condensed = Check.within(condensed, condensed.length, 0, 1, true, "condensed");
        leafOrder = Check.permutation(leafOrder, n, "leafOrder");
        clusterOfItem = Check.labels(clusterOfItem, n, "clusterOfItem");
    }

    /** The number of clusters, k. */
    public int clusterCount() {
        return Check.count(clusterOfItem);
    }

    /** The consensus of samples {@code i} and {@code j}; 1 on the diagonal. */
    public double value(int i, int j) {
        if (i == j) {
            return 1.0;
        }
        int a = Math.min(i, j);
        int b = Math.max(i, j);
        return condensed[(int) ((long) n * a - (long) a * (a + 1) / 2 + (b - a - 1))];
    }

    @Override
    public double[] condensed() {
        return condensed.clone();
    }

    @Override
    public int[] leafOrder() {
        return leafOrder.clone();
    }

    @Override
    public int[] clusterOfItem() {
        return clusterOfItem.clone();
    }

    int[] orderView() {
        return leafOrder;
    }

    int[] clusterView() {
        return clusterOfItem;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ConsensusInput c && c.title.equals(title) && c.n == n
                && Arrays.equals(c.condensed, condensed) && Arrays.equals(c.leafOrder, leafOrder)
                && Arrays.equals(c.clusterOfItem, clusterOfItem);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, n, Arrays.hashCode(condensed), Arrays.hashCode(leafOrder),
                Arrays.hashCode(clusterOfItem));
    }

    @Override
    public String toString() {
        return "ConsensusInput[" + title + ", n=" + n + "]";
    }
}
