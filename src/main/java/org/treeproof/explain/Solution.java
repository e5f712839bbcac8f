package org.treeproof.explain;

import java.util.Arrays;

/**
 * A cluster solution to explain: one label per sample in input order, clusters numbered {@code 1..k}, and
 * {@code 0} for a sample set aside as an outlier (it belongs to no cluster and is left out of every comparison
 * and test).
 *
 * @param labels the label of each sample, {@code 0..k}
 * @param k      the number of clusters, at least 2; each of {@code 1..k} holds at least one sample
 */
public record Solution(int[] labels, int k) {

    public Solution {
        labels = labels.clone();
        if (k < 2) {
            throw new IllegalArgumentException("a solution to explain has at least 2 clusters, got k = " + k);
        }
        int[] sizes = new int[k + 1];
        for (int l : labels) {
            if (l < 0 || l > k) {
                throw new IllegalArgumentException("label " + l + " outside 0.." + k);
            }
            sizes[l]++;
        }
        for (int c = 1; c <= k; c++) {
            if (sizes[c] == 0) {
                throw new IllegalArgumentException("cluster " + c + " has no sample");
            }
        }
    }

    /** A solution from labels {@code 0..k} with {@code k} the largest label. */
    public static Solution of(int[] labels) {
        return new Solution(labels, Arrays.stream(labels).max().orElse(0));
    }

    @Override
    public int[] labels() {
        return labels.clone();
    }

    /** The number of samples, outliers included. */
    public int samples() {
        return labels.length;
    }

    /** The label of sample {@code i}: its cluster {@code 1..k}, or 0 for an outlier. */
    public int label(int i) {
        return labels[i];
    }

    /** The number of samples in cluster {@code c} (1-based). */
    public int size(int c) {
        int n = 0;
        for (int l : labels) {
            n += l == c ? 1 : 0;
        }
        return n;
    }

    /** The samples that belong to a cluster (not outliers), in input order. */
    public int[] clustered() {
        return java.util.stream.IntStream.range(0, labels.length).filter(i -> labels[i] > 0).toArray();
    }

    /** The number of outliers. */
    public int outliers() {
        return labels.length - clustered().length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Solution s && s.k == k && Arrays.equals(s.labels, labels);
    }

    @Override
    public int hashCode() {
        return 31 * k + Arrays.hashCode(labels);
    }

    @Override
    public String toString() {
        return "Solution[k=" + k + ", samples=" + labels.length + "]";
    }
}
