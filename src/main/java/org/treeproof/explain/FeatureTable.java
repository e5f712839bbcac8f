package org.treeproof.explain;

import java.util.List;
import java.util.Objects;

/**
 * Every feature compared between each cluster and the rest of the clustered samples: effect sizes, the test's
 * p-value, the Benjamini-Hochberg q-value within the cluster, and the feature's rank in the cluster. Clusters
 * are 1-based, features 0-based in the data's order. Immutable: arrays are copied in and only read out.
 *
 * <p>The rank orders a cluster's features by how far the AUC lies from 0.5 (a feature that is higher or
 * lower in the cluster counts alike), then by the size of Cohen's d, then by the p-value, then by the data's order; rank 1 is the most
 * distinguishing feature.
 */
public final class FeatureTable {
    private final ContrastTest test;
    private final List<String> features;
    private final int[] clusterSizes;
    private final int clustered;
    private final double[][] effect;
    private final double[][] auc;
    private final double[][] meanIn;
    private final double[][] meanOut;
    private final double[][] p;
    private final double[][] q;
    private final int[][] order;

    FeatureTable(ContrastTest test, List<String> features, int[] clusterSizes, int clustered, double[][] effect,
            double[][] auc, double[][] meanIn, double[][] meanOut, double[][] p, double[][] q, int[][] order) {
        this.test = Objects.requireNonNull(test);
        this.features = List.copyOf(features);
        this.clusterSizes = clusterSizes.clone();
        this.clustered = clustered;
        this.effect = effect;
        this.auc = auc;
        this.meanIn = meanIn;
        this.meanOut = meanOut;
        this.p = p;
        this.q = q;
        this.order = order;
        for (double[][] a : new double[][][] {effect, auc, meanIn, meanOut, p, q}) {
            if (a.length != clusterSizes.length || (a.length > 0 && a[0].length != features.size())) {
                throw new IllegalArgumentException("one value per cluster and feature");
            }
        }
    }

    public ContrastTest test() {
        return test;
    }

    /** The number of clusters. */
    public int clusters() {
        return clusterSizes.length;
    }

    /** The feature names, in the data's order. */
    public List<String> features() {
        return features;
    }

    /** The size of cluster {@code c} (1-based). */
    public int clusterSize(int c) {
        return clusterSizes[c - 1];
    }

    /** The samples in any cluster (outliers left out). */
    public int clustered() {
        return clustered;
    }

    /** Cohen's d of feature {@code j}: (mean in cluster − mean elsewhere) / pooled standard deviation. */
    public double effect(int c, int j) {
        return effect[c - 1][j];
    }

    /** The probability that a sample of the cluster has a higher value than one elsewhere (ties count half). */
    public double auc(int c, int j) {
        return auc[c - 1][j];
    }

    public double meanIn(int c, int j) {
        return meanIn[c - 1][j];
    }

    public double meanElsewhere(int c, int j) {
        return meanOut[c - 1][j];
    }

    public double pValue(int c, int j) {
        return p[c - 1][j];
    }

    public double qValue(int c, int j) {
        return q[c - 1][j];
    }

    /** The feature at rank {@code r} (1-based) in cluster {@code c}. */
    public int featureAtRank(int c, int r) {
        return order[c - 1][r - 1];
    }

    /** The number of q-values at or below {@code level} in cluster {@code c}. */
    public int significant(int c, double level) {
        int n = 0;
        for (double v : q[c - 1]) {
            n += v <= level ? 1 : 0;
        }
        return n;
    }
}
