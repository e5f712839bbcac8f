package org.treeproof.score;

import org.treeproof.data.DataMatrix;
import org.treeproof.partition.Partition;

/**
 * The pooled within-cluster sum of squares {@code W_k} of a partition of the rows of a data matrix.
 *
 * <p>R. Tibshirani, G. Walther and T. Hastie, "Estimating the number of clusters in a data set via the
 * gap statistic", Journal of the Royal Statistical Society B 63 (2001) 411-423,
 * doi:10.1111/1467-9868.00293, define {@code W_k = Σ_r D_r / (2 n_r)} with {@code D_r} the sum of
 * squared Euclidean distances over all ordered pairs of members of cluster {@code r}. As they note, this
 * equals the sum of squared deviations of the rows from their cluster centroids, which is how it is
 * computed here: O(n·p) time instead of O(n²·p), and without the cancellation of a pairwise sum.
 * The matrix must have no missing values.
 */
public final class WithinClusterSumOfSquares {
    private final DataMatrix data;
    private final Partition partition;

    private WithinClusterSumOfSquares(DataMatrix data, Partition partition) {
        this.data = data;
        this.partition = partition;
    }

    /** {@code W_k} of {@code partition} over the rows of {@code data} (same samples, same order). */
    public static WithinClusterSumOfSquares of(DataMatrix data, Partition partition) {
        return new WithinClusterSumOfSquares(data, partition);
    }

    /**
     * The pooled sum and its terms.
     *
     * @param total      {@code W_k}
     * @param perCluster {@code D_r / (2 n_r)} for each cluster, indexed by label
     */
    public record Result(double total, double[] perCluster) {
        public Result {
            perCluster = perCluster.clone();
            if (!(total >= 0)) {
                throw new IllegalArgumentException("W_k " + total + " is not a non-negative number");
            }
            for (double w : perCluster) {
                if (!(w >= 0)) {
                    throw new IllegalArgumentException("cluster sum of squares " + w + " is not a non-negative number");
                }
            }
        }

        @Override
        public double[] perCluster() {
            return perCluster.clone();
        }
    }

    /** Computes {@code W_k}. */
    public Result compute() {
        Centroids c = Centroids.of(data, partition);
        double[] perCluster = new double[c.clusters];
        double total = within(data, partition, c, perCluster);
        return new Result(total, perCluster);
    }

    /** Σ of squared deviations from the centroids; fills {@code perCluster} when it is not null. */
    static double within(DataMatrix data, Partition partition, Centroids c, double[] perCluster) {
        double[] row = new double[c.features];
        double total = 0;
        for (int i = 0; i < c.samples; i++) {
            data.copyRow(i, row, 0);
            int r = partition.label(i);
            double s = c.squaredDistance(row, r);
            total += s;
            if (perCluster != null) {
                perCluster[r] += s;
            }
        }
        return total;
    }
}
