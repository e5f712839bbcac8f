package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the cluster-wise stability chart shows: for each cluster of the chosen solution, the mean Jaccard
 * similarity between it and its best match in each replicate.
 *
 * @param title       the chart title in plain words, e.g. "How well each cluster is found again (k = 4)"
 * @param jaccard     one mean Jaccard similarity per cluster (index = cluster label), each in [0, 1]
 * @param clusterSize the number of samples in each cluster, each at least 1, same length
 */
public record JaccardInput(String title, double[] jaccard, int[] clusterSize) {

    public JaccardInput {
        Check.text(title, "title");
        Objects.requireNonNull(jaccard, "jaccard");
        if (jaccard.length == 0) {
            throw new IllegalArgumentException("jaccard must hold at least one cluster");
        }
        jaccard = Check.within(jaccard, jaccard.length, 0, 1, false, "jaccard");
        Objects.requireNonNull(clusterSize, "clusterSize");
        Check.length(clusterSize.length, jaccard.length, "clusterSize");
        clusterSize = clusterSize.clone();
        for (int c = 0; c < clusterSize.length; c++) {
            if (clusterSize[c] < 1) {
                throw new IllegalArgumentException("clusterSize[" + c + "] is " + clusterSize[c] + "; clusters are"
                        + " never empty");
            }
        }
    }

    /** The number of clusters, k. */
    public int clusterCount() {
        return jaccard.length;
    }

    @Override
    public double[] jaccard() {
        return jaccard.clone();
    }

    @Override
    public int[] clusterSize() {
        return clusterSize.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof JaccardInput j && j.title.equals(title) && Arrays.equals(j.jaccard, jaccard)
                && Arrays.equals(j.clusterSize, clusterSize);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, Arrays.hashCode(jaccard), Arrays.hashCode(clusterSize));
    }

    @Override
    public String toString() {
        return "JaccardInput[" + title + ", k=" + jaccard.length + "]";
    }
}
