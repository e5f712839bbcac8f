package org.treeproof.score;

import org.treeproof.data.DataMatrix;
import org.treeproof.partition.Partition;

/**
 * The Calinski-Harabasz variance ratio of a partition of the rows of a data matrix, Euclidean.
 *
 * <p>T. Caliński and J. Harabasz, "A dendrite method for cluster analysis", Communications in
 * Statistics 3 (1974) 1-27, doi:10.1080/03610927408827101. With {@code B} the between-cluster sum of
 * squares {@code Σ_r n_r ||c_r - m||²} and {@code W} the within-cluster sum of squares
 * {@code Σ_i ||x_i - c_(r(i))||²}, the index is {@code [B / (k - 1)] / [W / (n - k)]}; larger is better.
 *
 * <p>Conventions, as in scikit-learn 1.2.1 ({@code calinski_harabasz_score}): undefined ({@code NaN})
 * with one cluster; 1.0 when {@code W} is exactly zero (every cluster's rows coincide, which includes
 * one sample per cluster). O(n·p) time; the matrix must have no missing values.
 */
public final class CalinskiHarabasz {
    private final DataMatrix data;
    private final Partition partition;

    private CalinskiHarabasz(DataMatrix data, Partition partition) {
        this.data = data;
        this.partition = partition;
    }

    /** The index of {@code partition} over the rows of {@code data} (same samples, same order). */
    public static CalinskiHarabasz of(DataMatrix data, Partition partition) {
        return new CalinskiHarabasz(data, partition);
    }

    /**
     * The index and its two sums of squares.
     *
     * @param value   the variance ratio, {@code NaN} with one cluster
     * @param between the between-cluster sum of squares {@code B}
     * @param within  the within-cluster sum of squares {@code W}
     */
    public record Result(double value, double between, double within) {
        public Result {
            if (!(between >= 0) || !(within >= 0)) {
                throw new IllegalArgumentException("sums of squares must be non-negative numbers");
            }
        }
    }

    /** Computes the index. */
    public Result compute() {
        Centroids c = Centroids.of(data, partition);
        double within = WithinClusterSumOfSquares.within(data, partition, c, null);
        double between = 0;
        for (int r = 0; r < c.clusters; r++) {
            double s = 0;
            for (int f = 0; f < c.features; f++) {
                double d = c.means[r * c.features + f] - c.grandMean[f];
                s += d * d;
            }
            between += c.sizes[r] * s;
        }
        int n = c.samples;
        int k = c.clusters;
        double value;
        if (k < 2) {
            value = Double.NaN;
        } else if (within == 0) {
            value = 1.0;
        } else {
            value = between * (n - k) / (within * (k - 1.0));
        }
        return new Result(value, between, within);
    }
}
