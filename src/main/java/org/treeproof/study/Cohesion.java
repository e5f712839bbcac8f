package org.treeproof.study;

import org.treeproof.partition.Clustering;

/**
 * Whether the clusters of a solution are cohesive: each cluster's members lie, on average, closer to each other
 * than to the nearest other cluster, that is the mean silhouette width of every cluster's members is above 0
 * (P. J. Rousseeuw, "Silhouettes: a graphical aid to the interpretation and validation of cluster analysis",
 * J. Comput. Appl. Math. 20 (1987) 53-65, doi:10.1016/0377-0427(87)90125-7: a negative width marks a sample closer
 * to a neighbouring cluster than to its own). The one owner of this reading, for the decision rule's condition
 * {@link Condition#EVERY_CLUSTER_COHESIVE}. Zero as the line is that reading, no tuned value.
 */
public final class Cohesion {
    private Cohesion() {
    }

    /**
     * The smallest mean silhouette width of one cluster's members.
     *
     * @param widths     per sample its silhouette width (NaN for outliers and where no width is defined)
     * @param clustering the solution
     * @return the smallest cluster mean, NaN when no cluster has a width
     */
    public static double leastClusterMean(double[] widths, Clustering clustering) {
        int[] labels = clustering.labels();
        double[] sum = new double[clustering.k()];
        int[] count = new int[clustering.k()];
        for (int i = 0; i < labels.length; i++) {
            if (labels[i] >= 0 && !Double.isNaN(widths[i])) {
                sum[labels[i]] += widths[i];
                count[labels[i]]++;
            }
        }
        double least = Double.NaN;
        for (int c = 0; c < sum.length; c++) {
            if (count[c] > 0) {
                double m = sum[c] / count[c];
                least = Double.isNaN(least) ? m : Math.min(least, m);
            }
        }
        return least;
    }

    /** Whether a solution with this smallest cluster mean width is cohesive (no widths at all: it is). */
    public static boolean cohesive(double leastClusterMean) {
        return !(leastClusterMean <= 0);
    }
}
