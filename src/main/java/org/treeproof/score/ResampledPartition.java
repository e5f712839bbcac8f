package org.treeproof.score;

import java.util.Objects;
import org.treeproof.partition.Partition;

/**
 * The clustering of one resampling replicate: which of the original items it drew, and how it
 * clustered them.
 *
 * <p>Position {@code a} of the replicate is original item {@code items[a]} and has cluster
 * {@code partition.label(a)}. Items may repeat (bootstrap draws); the scores that use replicates say
 * how they treat a repeat. Arrays are copied in and out.
 *
 * @param items     original item indices, one per replicate position
 * @param partition the replicate's clusters, over its positions
 */
public record ResampledPartition(int[] items, Partition partition) {
    public ResampledPartition {
        Objects.requireNonNull(items, "items");
        Objects.requireNonNull(partition, "partition");
        if (items.length != partition.size()) {
            throw new IllegalArgumentException("a replicate of " + items.length
                    + " items has a partition of " + partition.size());
        }
        items = items.clone();
        for (int item : items) {
            if (item < 0) {
                throw new IllegalArgumentException("negative item index " + item);
            }
        }
    }

    @Override
    public int[] items() {
        return items.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ResampledPartition r && java.util.Arrays.equals(r.items, items)
                && r.partition.equals(partition);
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(items) * 31 + partition.hashCode();
    }

    @Override
    public String toString() {
        return "ResampledPartition[m=" + items.length + ", k=" + partition.clusterCount() + "]";
    }
}
