package org.treeproof.partition;

import java.util.Arrays;

/**
 * A cluster solution that may set samples aside as outliers: {@code k} clusters labelled {@code 0..k-1}
 * and the label {@link #OUTLIER} for samples that belong to no cluster.
 *
 * <p>{@link #of} numbers clusters in order of their first clustered item; a clustering derived from another
 * (samples set aside, say) may keep the other's numbers, so every label from 0 to k - 1 is used but not always in
 * order of first appearance. Two ways to
 * score such a solution with measures made for partitions: {@link #withSingletons()} makes every outlier a
 * cluster of its own (for pair-counting measures such as the adjusted Rand index, where an outlier is then
 * "together with nobody"), and {@link #clusteredPartition()} keeps only the clustered items (for separation
 * measures such as the silhouette, which then ignore outliers altogether).
 *
 * @param labels per item its cluster, or {@link #OUTLIER}
 * @param k      the number of clusters (outliers not counted)
 */
public record Clustering(int[] labels, int k) {
    /** The label of a sample set aside as an outlier. */
    public static final int OUTLIER = -1;

    public Clustering {
        labels = labels.clone();
        int next = 0;
        int[] seen = new int[Math.max(k, 0)];
        Arrays.fill(seen, -1);
        for (int i = 0; i < labels.length; i++) {
            int l = labels[i];
            if (l == OUTLIER) {
                continue;
            }
            if (l < 0 || l >= k) {
                throw new IllegalArgumentException("label " + l + " outside 0.." + (k - 1));
            }
            if (seen[l] < 0) {
                seen[l] = i;
                next++;
            }
        }
        if (next != k) {
            throw new IllegalArgumentException("labels use " + next + " clusters, not " + k);
        }
    }

    /** A clustering from any labels, negative meaning outlier, relabelled canonically. */
    public static Clustering of(int[] anyLabels) {
        int[] out = new int[anyLabels.length];
        var map = new java.util.HashMap<Integer, Integer>();
        for (int i = 0; i < anyLabels.length; i++) {
            if (anyLabels[i] < 0) {
                out[i] = OUTLIER;
            } else {
                out[i] = map.computeIfAbsent(anyLabels[i], x -> map.size());
            }
        }
        return new Clustering(out, map.size());
    }

    /** A clustering without outliers. */
    public static Clustering of(Partition p) {
        return new Clustering(p.labels(), p.clusterCount());
    }

    @Override
    public int[] labels() {
        return labels.clone();
    }

    /** The number of items, outliers included. */
    public int size() {
        return labels.length;
    }

    /** The label of item {@code i}: a cluster or {@link #OUTLIER}. */
    public int label(int i) {
        return labels[i];
    }

    public boolean isOutlier(int i) {
        return labels[i] == OUTLIER;
    }

    /** The number of outliers. */
    public int outlierCount() {
        int c = 0;
        for (int l : labels) {
            c += l == OUTLIER ? 1 : 0;
        }
        return c;
    }

    /** The clustered items, in increasing order. */
    public int[] clustered() {
        return select(false);
    }

    /** The outliers, in increasing order. */
    public int[] outliers() {
        return select(true);
    }

    private int[] select(boolean outliers) {
        int c = 0;
        for (int l : labels) {
            c += (l == OUTLIER) == outliers ? 1 : 0;
        }
        int[] out = new int[c];
        int t = 0;
        for (int i = 0; i < labels.length; i++) {
            if ((labels[i] == OUTLIER) == outliers) {
                out[t++] = i;
            }
        }
        return out;
    }

    /**
     * How far one of two clusterings of the same items nests within the other: over the items clustered in both,
     * the share whose cluster in the finer of the two (more clusters; {@code this} on a tie) is counted in the
     * coarser cluster that holds most of that finer cluster. 1 when every finer cluster lies within one coarser
     * cluster; NaN when no item is clustered in both. A description, not a test.
     *
     * @throws IllegalArgumentException if the sizes differ
     */
    public double nesting(Clustering other) {
        if (other.size() != size()) {
            throw new IllegalArgumentException(size() + " items against " + other.size());
        }
        Clustering fine = other.k > k ? other : this;
        Clustering coarse = fine == this ? other : this;
        int[][] both = new int[fine.k][coarse.k];
        int n = 0;
        for (int i = 0; i < size(); i++) {
            if (!fine.isOutlier(i) && !coarse.isOutlier(i)) {
                both[fine.labels[i]][coarse.labels[i]]++;
                n++;
            }
        }
        if (n == 0) {
            return Double.NaN;
        }
        long held = 0;
        for (int[] row : both) {
            held += java.util.Arrays.stream(row).max().orElse(0);
        }
        return (double) held / n;
    }

    /** Cluster sizes, outliers not counted. */
    public int[] clusterSizes() {
        int[] s = new int[k];
        for (int l : labels) {
            if (l != OUTLIER) {
                s[l]++;
            }
        }
        return s;
    }

    /** Every outlier as a cluster of its own; the clusters keep their members. */
    public Partition withSingletons() {
        int[] raw = new int[labels.length];
        int next = k;
        for (int i = 0; i < labels.length; i++) {
            raw[i] = labels[i] == OUTLIER ? next++ : labels[i];
        }
        return Partition.of(raw);
    }

    /** The partition of the clustered items only, in the order of {@link #clustered()}. */
    public Partition clusteredPartition() {
        int[] idx = clustered();
        int[] raw = new int[idx.length];
        for (int t = 0; t < idx.length; t++) {
            raw[t] = labels[idx[t]];
        }
        return new Partition(raw, k);
    }

    /** The clustering of the items {@code items[0..]} (relabelled canonically). */
    public Clustering restrict(int[] items) {
        int[] raw = new int[items.length];
        for (int a = 0; a < items.length; a++) {
            raw[a] = labels[items[a]];
        }
        return of(raw);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Clustering c && c.k == k && Arrays.equals(c.labels, labels);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(labels) * 31 + k;
    }

    @Override
    public String toString() {
        return "Clustering[n=" + labels.length + ", k=" + k + ", outliers=" + outlierCount() + "]";
    }
}
