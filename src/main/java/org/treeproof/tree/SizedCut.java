package org.treeproof.tree;

import java.util.Objects;
import org.treeproof.partition.Clustering;

/**
 * A cut of a dendrogram into {@code k} clusters of at least a minimum size, the samples on smaller branches
 * set aside as outliers.
 *
 * <p>It is the ordinary cut into {@code branches} branches ({@link MergeTree#cutAtK(int)}), for the smallest
 * number of branches at which exactly {@code k} of them reach the minimum size; the other branches' samples are
 * outliers. So it is a cut by height like any other (every height in {@code [low, high)} gives it, read with
 * the same minimum size), and a split that only sheds a few samples from a cluster does not count as a new
 * cluster. See {@link SizedCuts}.
 *
 * @param k            the number of clusters (branches of at least the minimum size)
 * @param branches     the number of branches of the ordinary cut, outlier branches included
 * @param clustering   the clusters and outliers
 * @param low          the lower end of the height interval of the ordinary cut
 * @param high         its upper end, possibly {@code +∞}
 * @param chosen       the cut height to report
 * @param tieDependent whether tied heights at the cut make the state depend on the order of ties
 */
public record SizedCut(int k, int branches, Clustering clustering, double low, double high, double chosen,
        boolean tieDependent) {

    public SizedCut {
        Objects.requireNonNull(clustering, "clustering");
        if (clustering.k() != k || branches < k) {
            throw new IllegalArgumentException("a sized cut at k = " + k + " over " + branches + " branches has "
                    + clustering.k() + " clusters");
        }
    }

    /** Whether a cut by height at {@link #chosen()} reproduces this state ({@code low < high}). */
    public boolean reproducibleByHeight() {
        return low < high;
    }
}
