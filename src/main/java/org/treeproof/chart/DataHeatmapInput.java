package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the data heat map shows: the samples-by-features matrix with rows in the sample tree's order and
 * columns in the feature tree's order, and both trees beside it.
 *
 * <p>The chart standardises each feature itself (z-score over the samples), so the values may be given as
 * prepared for clustering, standardised or not; standardising twice changes nothing.
 *
 * @param title         the chart title in plain words, e.g. "Data of 150 samples and 40 features"
 * @param sampleCount   rows, at least 2
 * @param featureCount  columns, at least 1
 * @param values        row-major {@code sampleCount * featureCount} values (sample {@code i}, feature {@code j}
 *                      at {@code i * featureCount + j}); finite or NaN for a missing value
 * @param sampleLabels  one name per sample
 * @param featureLabels one name per feature
 * @param sampleTree    the tree of the samples, {@code sampleCount} leaves
 * @param featureTree   the tree of the features, {@code featureCount} leaves, or {@code null} to keep the
 *                      columns in input order with no tree drawn
 * @param sampleCluster cluster labels {@code 0..k-1} per sample for a colour strip, or {@code null} for none
 */
public record DataHeatmapInput(String title, int sampleCount, int featureCount, double[] values,
        String[] sampleLabels, String[] featureLabels, ChartTree sampleTree, ChartTree featureTree,
        int[] sampleCluster) {

    public DataHeatmapInput {
        Check.text(title, "title");
        if (sampleCount < 2 || featureCount < 1) {
            throw new IllegalArgumentException("need at least 2 samples and 1 feature, got " + sampleCount + " by "
                    + featureCount);
        }
        Objects.requireNonNull(values, "values");
        long cells = (long) sampleCount * featureCount;
        if (values.length != cells) {
            throw new IllegalArgumentException("values has length " + values.length + ", expected " + sampleCount
                    + " x " + featureCount + " = " + cells);
        }
        values = values.clone();
        for (int t = 0; t < values.length; t++) {
            if (Double.isInfinite(values[t])) {
                throw new IllegalArgumentException("value of sample " + t / featureCount + ", feature "
                        + t % featureCount + " is " + values[t] + "; give a finite value or NaN");
            }
        }
        sampleLabels = Check.texts(sampleLabels, sampleCount, "sampleLabels");
        featureLabels = Check.texts(featureLabels, featureCount, "featureLabels");
        Objects.requireNonNull(sampleTree, "sampleTree");
        Check.length(sampleTree.leafCount(), sampleCount, "sampleTree leaves");
        if (featureTree != null) {
            Check.length(featureTree.leafCount(), featureCount, "featureTree leaves");
        }
        if (sampleCluster != null) {
            sampleCluster = Check.labels(sampleCluster, sampleCount, "sampleCluster");
        }
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public String[] sampleLabels() {
        return sampleLabels.clone();
    }

    @Override
    public String[] featureLabels() {
        return featureLabels.clone();
    }

    @Override
    public int[] sampleCluster() {
        return sampleCluster == null ? null : sampleCluster.clone();
    }

    double valueAt(int sample, int feature) {
        return values[sample * featureCount + feature];
    }

    String sampleLabelAt(int i) {
        return sampleLabels[i];
    }

    String featureLabelAt(int j) {
        return featureLabels[j];
    }

    int[] clusterView() {
        return sampleCluster;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DataHeatmapInput d && d.title.equals(title) && d.sampleCount == sampleCount
                && d.featureCount == featureCount && Arrays.equals(d.values, values)
                && Arrays.equals(d.sampleLabels, sampleLabels) && Arrays.equals(d.featureLabels, featureLabels)
                && d.sampleTree.equals(sampleTree) && Objects.equals(d.featureTree, featureTree)
                && Arrays.equals(d.sampleCluster, sampleCluster);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, sampleCount, featureCount, Arrays.hashCode(values), Arrays.hashCode(sampleLabels),
                Arrays.hashCode(featureLabels), sampleTree, featureTree, Arrays.hashCode(sampleCluster));
    }

    @Override
    public String toString() {
        return "DataHeatmapInput[" + title + ", " + sampleCount + " x " + featureCount + "]";
    }
}
