package org.treeproof.score;

import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.partition.Partition;

/**
 * Cluster centroids of a data matrix under a partition, shared by the Euclidean scores.
 *
 * <p>Rows are read one at a time into a buffer, so a wide matrix is never copied whole.
 */
final class Centroids {
    final int samples;
    final int features;
    final int clusters;
    final int[] sizes;
    /** Row-major {@code clusters x features}. */
    final double[] means;
    /** The mean of all samples. */
    final double[] grandMean;

    private Centroids(int samples, int features, int clusters, int[] sizes, double[] means, double[] grandMean) {
        this.samples = samples;
        this.features = features;
        this.clusters = clusters;
        this.sizes = sizes;
        this.means = means;
        this.grandMean = grandMean;
    }

    static Centroids of(DataMatrix data, Partition partition) {
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(partition, "partition");
        if (data.samples() != partition.size()) {
            throw new IllegalArgumentException("the data have " + data.samples()
                    + " samples but the partition " + partition.size() + " items");
        }
        int n = data.samples();
        int p = data.features();
        int k = partition.clusterCount();
        double[] means = new double[k * p];
        double[] row = new double[p];
        for (int i = 0; i < n; i++) {
            data.copyRow(i, row, 0);
            int base = partition.label(i) * p;
            for (int f = 0; f < p; f++) {
                means[base + f] += row[f];
            }
        }
        int[] sizes = partition.clusterSizes();
        double[] grand = new double[p];
        for (int c = 0; c < k; c++) {
            for (int f = 0; f < p; f++) {
                grand[f] += means[c * p + f];
            }
        }
        for (int f = 0; f < p; f++) {
            grand[f] /= n;
        }
        for (int c = 0; c < k; c++) {
            for (int f = 0; f < p; f++) {
                double m = means[c * p + f] / sizes[c];
                if (Double.isNaN(m)) {
                    throw new IllegalArgumentException("feature " + data.featureNames().get(f)
                            + " has missing values; scores need complete data");
                }
                means[c * p + f] = m;
            }
        }
        return new Centroids(n, p, k, sizes, means, grand);
    }

    /** The squared Euclidean distance from {@code row} to centroid {@code c}. */
    double squaredDistance(double[] row, int c) {
        int base = c * features;
        double s = 0;
        for (int f = 0; f < features; f++) {
            double d = row[f] - means[base + f];
            s += d * d;
        }
        return s;
    }

    /** The squared Euclidean distance between centroids {@code c} and {@code e}. */
    double squaredDistanceBetween(int c, int e) {
        double s = 0;
        for (int f = 0; f < features; f++) {
            double d = means[c * features + f] - means[e * features + f];
            s += d * d;
        }
        return s;
    }
}
