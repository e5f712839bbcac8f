package org.treeproof.score;

import org.treeproof.data.DataMatrix;
import org.treeproof.partition.Partition;

/**
 * The Davies-Bouldin index of a partition of the rows of a data matrix, Euclidean; smaller is better.
 *
 * <p>D. L. Davies and D. W. Bouldin, "A cluster separation measure", IEEE Transactions on Pattern
 * Analysis and Machine Intelligence 1 (1979) 224-227, doi:10.1109/TPAMI.1979.4766909. With
 * {@code S_r} the mean Euclidean distance of cluster {@code r}'s rows to its centroid and
 * {@code M_rs} the distance between centroids, the index is the mean over clusters of
 * {@code max_{s≠r} (S_r + S_s) / M_rs}.
 *
 * <p>Conventions, as in scikit-learn 1.2.1 ({@code davies_bouldin_score}): undefined ({@code NaN})
 * with one cluster; 0 when every {@code S_r} is zero or every {@code M_rs} is zero; a pair of clusters
 * with coincident centroids ({@code M_rs = 0}) contributes nothing to the maximum. scikit-learn tests
 * "zero" with an absolute tolerance of 10<sup>-8</sup>, which depends on the data's units; here zero
 * means exactly zero. O(n·p + k²·p) time; the matrix must have no missing values.
 */
public final class DaviesBouldin {
    private final DataMatrix data;
    private final Partition partition;

    private DaviesBouldin(DataMatrix data, Partition partition) {
        this.data = data;
        this.partition = partition;
    }

    /** The index of {@code partition} over the rows of {@code data} (same samples, same order). */
    public static DaviesBouldin of(DataMatrix data, Partition partition) {
        return new DaviesBouldin(data, partition);
    }

    /**
     * The index and its cluster scatters.
     *
     * @param value   the Davies-Bouldin index, {@code NaN} with one cluster
     * @param scatter {@code S_r} for each cluster, indexed by label
     */
    public record Result(double value, double[] scatter) {
        public Result {
            scatter = scatter.clone();
            if (value < 0) {
                throw new IllegalArgumentException("negative Davies-Bouldin index " + value);
            }
            for (double s : scatter) {
                if (!(s >= 0)) {
                    throw new IllegalArgumentException("cluster scatter " + s + " is not a non-negative number");
                }
            }
        }

        @Override
        public double[] scatter() {
            return scatter.clone();
        }
    }

    /** Computes the index. */
    public Result compute() {
        Centroids c = Centroids.of(data, partition);
        int k = c.clusters;
        double[] scatter = new double[k];
        double[] row = new double[c.features];
        for (int i = 0; i < c.samples; i++) {
            data.copyRow(i, row, 0);
            int r = partition.label(i);
            scatter[r] += Math.sqrt(c.squaredDistance(row, r));
        }
        boolean allScatterZero = true;
        for (int r = 0; r < k; r++) {
            scatter[r] /= c.sizes[r];
            allScatterZero &= scatter[r] == 0;
        }
        if (k < 2) {
            return new Result(Double.NaN, scatter);
        }
        double[] separation = new double[k * k];
        boolean allSeparationZero = true;
        for (int r = 0; r < k; r++) {
            for (int s = r + 1; s < k; s++) {
                double m = Math.sqrt(c.squaredDistanceBetween(r, s));
                separation[r * k + s] = m;
                separation[s * k + r] = m;
                allSeparationZero &= m == 0;
            }
        }
        if (allScatterZero || allSeparationZero) {
            return new Result(0.0, scatter);
        }
        double sum = 0;
        for (int r = 0; r < k; r++) {
            double worst = 0;
            for (int s = 0; s < k; s++) {
                double m = separation[r * k + s];
                if (s != r && m > 0) {
                    worst = Math.max(worst, (scatter[r] + scatter[s]) / m);
                }
            }
            sum += worst;
        }
        return new Result(sum / k, scatter);
    }
}
