package org.treeproof.score;

import java.util.Objects;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/**
 * The Dunn index of a partition from a dissimilarity matrix; larger is better.
 *
 * <p>J. C. Dunn, "Well-separated clusters and optimal fuzzy partitions", Journal of Cybernetics 4
 * (1974) 95-104, doi:10.1080/01969727408546059. The index is the smallest dissimilarity between two
 * samples in different clusters (single-link separation) divided by the largest dissimilarity
 * between two samples in the same cluster (the largest cluster diameter).
 *
 * <p>Conventions: undefined ({@code NaN}) with one cluster; {@code +Infinity} when every cluster's
 * diameter is zero but the separation is positive (as with one sample per cluster); {@code NaN} when
 * both are zero. One pass over the condensed matrix, O(n²) time, O(1) extra memory.
 */
public final class DunnIndex {
    private final CondensedDistances distances;
    private final Partition partition;

    private DunnIndex(CondensedDistances distances, Partition partition) {
        this.distances = Objects.requireNonNull(distances, "distances");
        this.partition = Objects.requireNonNull(partition, "partition");
        if (distances.size() != partition.size()) {
            throw new IllegalArgumentException("distances are over " + distances.size()
                    + " items but the partition over " + partition.size());
        }
    }

    /**
     * The Dunn index of the clusters of {@code clustering}, outliers ignored (neither within nor between
     * clusters).
     */
    public static Result of(CondensedDistances distances, org.treeproof.partition.Clustering clustering) {
        if (clustering.outlierCount() == 0) {
            return new DunnIndex(distances, clustering.clusteredPartition()).compute();
        }
        int n = clustering.size();
        double separation = Double.POSITIVE_INFINITY;
        double diameter = 0;
        int t = 0;
        for (int i = 0; i < n; i++) {
            int li = clustering.label(i);
            if (li < 0) {
                t += n - i - 1;
                continue;
            }
            for (int j = i + 1; j < n; j++) {
                double d = distances.at(t++);
                int lj = clustering.label(j);
                if (lj < 0) {
                    continue;
                }
                if (lj == li) {
                    diameter = Math.max(diameter, d);
                } else {
                    separation = Math.min(separation, d);
                }
            }
        }
        if (clustering.k() < 2) {
            return new Result(Double.NaN, Double.NaN, diameter);
        }
        double value = diameter == 0 ? (separation > 0 ? Double.POSITIVE_INFINITY : Double.NaN) : separation / diameter;
        return new Result(value, separation, diameter);
    }

    /** The Dunn index of {@code partition} under {@code distances} (same items, same order). */
    public static DunnIndex of(CondensedDistances distances, Partition partition) {
        return new DunnIndex(distances, partition);
    }

    /**
     * The index and its two parts.
     *
     * @param value       separation / diameter, or {@code NaN} / {@code +Infinity} as described above
     * @param separation  the smallest between-cluster dissimilarity ({@code NaN} with one cluster)
     * @param diameter    the largest within-cluster dissimilarity (0 when every cluster is one sample)
     */
    public record Result(double value, double separation, double diameter) {
        public Result {
            if (value < 0 || separation < 0 || !(diameter >= 0)) {
                throw new IllegalArgumentException("Dunn index parts must be non-negative");
            }
        }
    }

    /** Computes the index. */
    public Result compute() {
        int n = partition.size();
        int[] labels = partition.labels();
        double separation = Double.POSITIVE_INFINITY;
        double diameter = 0;
        int t = 0;
        for (int i = 0; i < n; i++) {
            int li = labels[i];
            // select rather than branch: cluster membership along a row is close to random, so a
            // branch here is mispredicted about half the time
            for (int j = i + 1; j < n; j++) {
                double d = distances.at(t++);
                boolean same = labels[j] == li;
                double within = same ? d : 0.0;
                double between = same ? Double.POSITIVE_INFINITY : d;
                diameter = within > diameter ? within : diameter;
                separation = between < separation ? between : separation;
            }
        }
        if (partition.clusterCount() < 2) {
            return new Result(Double.NaN, Double.NaN, diameter);
        }
        double value;
        if (diameter == 0) {
            value = separation > 0 ? Double.POSITIVE_INFINITY : Double.NaN;
        } else {
            value = separation / diameter;
        }
        return new Result(value, separation, diameter);
    }
}
