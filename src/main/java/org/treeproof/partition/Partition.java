package org.treeproof.partition;

import java.util.Arrays;

/**
 * A hard partition of {@code n} items into {@code k} non-empty clusters labelled {@code 0..k-1}.
 *
 * <p>Labels are canonical: clusters are numbered in order of their first item, so two equal
 * partitions are equal records whatever labels they were made from. The array is copied in and out.
 */
public record Partition(int[] labels, int clusterCount) {

    public Partition {
        labels = labels.clone();
        int k = 0;
        for (int l : labels) {
            if (l < 0) {
                throw new IllegalArgumentException("negative label " + l);
            }
            k = Math.max(k, l + 1);
        }
        if (k != clusterCount) {
            throw new IllegalArgumentException("labels use " + k + " clusters, not " + clusterCount);
        }
        int[] firstSeen = new int[k];
        Arrays.fill(firstSeen, -1);
        int next = 0;
        for (int i = 0; i < labels.length; i++) {
            if (firstSeen[labels[i]] < 0) {
                firstSeen[labels[i]] = i;
                if (labels[i] != next) {
                    throw new IllegalArgumentException("labels are not canonical; use Partition.of");
                }
                next++;
            }
        }
        if (next != k) {
            throw new IllegalArgumentException("a cluster label between 0 and " + (k - 1) + " is unused");
        }
    }

    /** A partition from any integer labels (any values, any order), relabelled canonically. */
    public static Partition of(int[] anyLabels) {
        int[] out = new int[anyLabels.length];
        if (anyLabels.length == 0) {
            return new Partition(out, 0);
        }
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int l : anyLabels) {
            min = Math.min(min, l);
            max = Math.max(max, l);
        }
        if ((long) max - min < (1 << 20)) {
            // labels in a small range (the usual case, on hot paths): relabel through an array, no boxing
            int[] map = new int[max - min + 1];
            java.util.Arrays.fill(map, -1);
            int next = 0;
            for (int i = 0; i < anyLabels.length; i++) {
                int slot = anyLabels[i] - min;
                if (map[slot] < 0) {
                    map[slot] = next++;
                }
                out[i] = map[slot];
            }
            return new Partition(out, next);
        }
        var map = new java.util.HashMap<Integer, Integer>();
        for (int i = 0; i < anyLabels.length; i++) {
            out[i] = map.computeIfAbsent(anyLabels[i], x -> map.size());
        }
        return new Partition(out, map.size());
    }

    /** The number of items. */
    public int size() {
        return labels.length;
    }

    /** The label of item {@code i}. */
    public int label(int i) {
        return labels[i];
    }

    @Override
    public int[] labels() {
        return labels.clone();
    }

    /** Items per cluster, indexed by label. */
    public int[] clusterSizes() {
        int[] s = new int[clusterCount];
        for (int l : labels) {
            s[l]++;
        }
        return s;
    }

    /** The items of each cluster, in increasing order. */
    public int[][] members() {
        int[] sizes = clusterSizes();
        int[][] m = new int[clusterCount][];
        for (int c = 0; c < clusterCount; c++) {
            m[c] = new int[sizes[c]];
        }
        int[] fill = new int[clusterCount];
        for (int i = 0; i < labels.length; i++) {
            m[labels[i]][fill[labels[i]]++] = i;
        }
        return m;
    }

    /** The partition restricted to the given items (in that order), relabelled canonically. */
    public Partition restrict(int[] items) {
        int[] l = new int[items.length];
        for (int a = 0; a < items.length; a++) {
            l[a] = labels[items[a]];
        }
        return of(l);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Partition p && p.clusterCount == clusterCount && Arrays.equals(p.labels, labels);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(labels);
    }

    @Override
    public String toString() {
        return "Partition[n=" + labels.length + ", k=" + clusterCount + "]";
    }
}
