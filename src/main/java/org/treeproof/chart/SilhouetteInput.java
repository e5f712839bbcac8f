package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the silhouette chart shows: each sample's silhouette width under one clustering.
 *
 * @param title            the chart title in plain words, e.g. "Silhouette of 4 clusters, average linkage"
 * @param silhouette       one width per sample, each in [-1, 1] (the convention of 0 for a sample alone in its
 *                         cluster is the caller's), no NaN
 * @param clusterOfSample  the cluster of each sample, labels {@code 0..k-1} with none unused, same order as
 *                         {@code silhouette}
 */
public record SilhouetteInput(String title, double[] silhouette, int[] clusterOfSample) {

    public SilhouetteInput {
        Check.text(title, "title");
        Objects.requireNonNull(silhouette, "silhouette");
        if (silhouette.length < 2) {
            throw new IllegalArgumentException("need at least 2 samples, got " + silhouette.length);
        }
        silhouette = Check.within(silhouette, silhouette.length, -1, 1, false, "silhouette");
        clusterOfSample = Check.labels(clusterOfSample, silhouette.length, "clusterOfSample");
    }

    /** The number of clusters, k. */
    public int clusterCount() {
        return Check.count(clusterOfSample);
    }

    /** The mean width over all samples, the figure usually quoted for the whole clustering. */
    public double average() {
        double s = 0;
        for (double v : silhouette) {
            s += v;
        }
        return s / silhouette.length;
    }

    @Override
    public double[] silhouette() {
        return silhouette.clone();
    }

    @Override
    public int[] clusterOfSample() {
        return clusterOfSample.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SilhouetteInput s && s.title.equals(title) && Arrays.equals(s.silhouette, silhouette)
                && Arrays.equals(s.clusterOfSample, clusterOfSample);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, Arrays.hashCode(silhouette), Arrays.hashCode(clusterOfSample));
    }

    @Override
    public String toString() {
        return "SilhouetteInput[" + title + ", samples=" + silhouette.length + "]";
    }
}
