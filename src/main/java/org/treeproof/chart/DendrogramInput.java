package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the tree chart shows: one clustering tree, its cut into clusters, and how well each group held up.
 *
 * @param title          the chart title in plain words, e.g. "Tree of 150 samples, average linkage"
 * @param tree           the merges and the order of the leaves
 * @param leafLabels     one name per leaf, indexed by leaf (sample) number, not by position
 * @param clusterOfLeaf  the cluster of each leaf at the chosen cut, labels {@code 0..k-1} with none unused,
 *                       indexed by leaf; shown as "cluster 1".."cluster k"
 * @param cutHeight      the height of the chosen cut, drawn as a dashed line; NaN draws no line
 * @param support        per merge (same index as the merges), the share of replicates in which the group formed
 *                       by that merge is found again, in [0, 1], or NaN where not measured; may be {@code null}
 *                       when nothing was measured
 * @param au             per merge, the approximately unbiased p-value of its group from the multiscale bootstrap, in
 *                       [0, 1], or NaN where there is none; may be {@code null} when it was not computed
 * @param heightLabel    the height axis title with its unit, e.g. "Merge height (Euclidean distance)"
 */
public record DendrogramInput(String title, ChartTree tree, String[] leafLabels, int[] clusterOfLeaf,
        double cutHeight, double[] support, double[] au, String heightLabel) {

    /** Without AU p-values. */
    public DendrogramInput(String title, ChartTree tree, String[] leafLabels, int[] clusterOfLeaf, double cutHeight,
            double[] support, String heightLabel) {
        this(title, tree, leafLabels, clusterOfLeaf, cutHeight, support, null, heightLabel);
    }

    public DendrogramInput {
        Check.text(title, "title");
        Objects.requireNonNull(tree, "tree");
        int n = tree.leafCount();
        leafLabels = Check.texts(leafLabels, n, "leafLabels");
        clusterOfLeaf = Check.labels(clusterOfLeaf, n, "clusterOfLeaf");
        if (Double.isInfinite(cutHeight)) {
            throw new IllegalArgumentException("cutHeight is " + cutHeight + "; give a finite height or NaN for none");
        }
        if (support == null) {
            support = new double[n - 1];
            Arrays.fill(support, Double.NaN);
        } else {
            support = Check.within(support, n - 1, 0, 1, true, "support");
        }
        if (au == null) {
            au = new double[n - 1];
            Arrays.fill(au, Double.NaN);
        } else {
            au = Check.within(au, n - 1, 0, 1, true, "au");
        }
        Check.text(heightLabel, "heightLabel");
    }

    /** The number of clusters at the cut. */
    public int clusterCount() {
        return Check.count(clusterOfLeaf);
    }

    @Override
    public String[] leafLabels() {
        return leafLabels.clone();
    }

    @Override
    public int[] clusterOfLeaf() {
        return clusterOfLeaf.clone();
    }

    @Override
    public double[] support() {
        return support.clone();
    }

    @Override
    public double[] au() {
        return au.clone();
    }

    double auAt(int merge) {
        return au[merge];
    }

    /** Whether any merge has an AU p-value. */
    boolean hasAu() {
        for (double v : au) {
            if (!Double.isNaN(v)) {
                return true;
            }
        }
        return false;
    }

    int clusterAt(int leaf) {
        return clusterOfLeaf[leaf];
    }

    String labelAt(int leaf) {
        return leafLabels[leaf];
    }

    double supportAt(int merge) {
        return support[merge];
    }

    int[] clusterView() {
        return clusterOfLeaf;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DendrogramInput d && d.title.equals(title) && d.tree.equals(tree)
                && Arrays.equals(d.leafLabels, leafLabels) && Arrays.equals(d.clusterOfLeaf, clusterOfLeaf)
                && Double.compare(d.cutHeight, cutHeight) == 0 && Arrays.equals(d.support, support)
                && Arrays.equals(d.au, au)
                && d.heightLabel.equals(heightLabel);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, tree, Arrays.hashCode(leafLabels), Arrays.hashCode(clusterOfLeaf), cutHeight,
                Arrays.hashCode(support), Arrays.hashCode(au), heightLabel);
    }

    @Override
    public String toString() {
        return "DendrogramInput[" + title + ", leaves=" + tree.leafCount() + ", k=" + clusterCount() + "]";
    }
}
