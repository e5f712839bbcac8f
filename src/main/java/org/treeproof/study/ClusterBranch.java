package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.partition.Clustering;
import org.treeproof.partition.Partition;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.tree.MergeTree;

/**
 * The branch of a tree that forms one cluster of a cut, with its AU p-value: the lookup from a cluster to its
 * branch's p-value that reports and rules use.
 *
 * <p>A cluster is flagged for a low AU p-value when its branch was fitted with {@code au} below {@link #LOW_AU},
 * or never reappeared in any replicate. {@link #LOW_AU} = 0.95 is the level at which the AU test rejects "this
 * cluster does not exist" at 5%; Suzuki and Shimodaira (2006, Bioinformatics 22:1540,
 * doi:10.1093/bioinformatics/btl117) call clusters with au ≥ 0.95 strongly supported by the data (from memory).
 * A branch without a number for another reason (a poor fit, too few scales, or one found in every replicate) is
 * not flagged: the last is as strong as the replicates can show, the others are unknown and said so.
 *
 * @param cluster the cluster's id, 1-based as in the outputs
 * @param size    its number of samples
 * @param merge   the merge of the tree whose clade is exactly the cluster, or −1 for a single sample (no branch)
 * @param fit     the fit of that merge's counts, or {@code null} for a single sample
 */
public record ClusterBranch(int cluster, int size, int merge, MultiscaleFit.Result fit) {
    /** The AU p-value below which a cluster is flagged (see the class comment for its source). */
    public static final double LOW_AU = 0.95;

    /** The AU p-value of the cluster's branch; NaN when there is none. */
    public double au() {
        return fit == null ? Double.NaN : fit.au();
    }

    /** Whether the cluster is flagged for a low AU p-value. */
    public boolean lowAu() {
        if (fit == null) {
            return false;
        }
        return fit.status() == MultiscaleFit.Status.NEVER || (fit.fitted() && fit.au() < LOW_AU);
    }

    /**
     * The branch of each cluster of {@code partition}, a cut of {@code tree}, in cluster order.
     *
     * @throws IllegalArgumentException if a cluster is not a clade of the tree
     */
    public static List<ClusterBranch> of(MergeTree tree, Partition partition, BranchPValues pvalues) {
        return of(tree, Clustering.of(partition), pvalues);
    }

    /**
     * The branch of each cluster of {@code clustering}, a cut of {@code tree} whose outliers (samples on branches too
     * small to be clusters) belong to no cluster, in cluster order.
     *
     * @throws IllegalArgumentException if a cluster is not a clade of the tree
     */
    public static List<ClusterBranch> of(MergeTree tree, Clustering partition, BranchPValues pvalues) {
        int n = tree.leaves();
        int[] labels = partition.labels();
        if (labels.length != n) {
            throw new IllegalArgumentException("the partition is not of this tree's samples");
        }
        int k = partition.k();
        int[] sizes = partition.clusterSizes();
        // label of every node when all its members share one, else -1
        int[] uniform = new int[2 * n - 1];
        System.arraycopy(labels, 0, uniform, 0, n);
        int[] mergeOf = new int[k];
        java.util.Arrays.fill(mergeOf, -1);
        for (int s = 0; s < n - 1; s++) {
            int a = uniform[tree.left(s)];
            int b = uniform[tree.right(s)];
            int u = a >= 0 && a == b ? a : -1;
            uniform[n + s] = u;
            if (u >= 0 && tree.size(s) == sizes[u]) {
                mergeOf[u] = s;
            }
        }
        var out = new ArrayList<ClusterBranch>(k);
        for (int c = 0; c < k; c++) {
            if (sizes[c] > 1 && mergeOf[c] < 0) {
                throw new IllegalArgumentException("cluster " + (c + 1) + " is not a branch of the tree");
            }
            int m = mergeOf[c];
            out.add(new ClusterBranch(c + 1, sizes[c], m, m < 0 || pvalues == null ? null : pvalues.at(m)));
        }
        return List.copyOf(out);
    }
}
