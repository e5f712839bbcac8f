package org.treeproof.tree;

import java.util.Objects;
import org.treeproof.partition.Partition;

/**
 * The cut of a dendrogram into {@code k} clusters, with the range of heights that produce it.
 *
 * <p>{@code low} is the largest height among the merges applied to reach {@code k} clusters (0 for
 * {@code k = n}) and {@code high} the smallest height among the merges not applied ({@code +∞} for
 * {@code k = 1}). When {@code low < high}, cutting at any height in {@code [low, high)} with
 * {@link MergeTree#cutAtHeight(double)} gives this partition. {@code chosen} is the midpoint of the
 * interval, the height a reader would draw the cut line at (a convention, not from a publication);
 * it is {@code low} when {@code high} is infinite (k = 1) and also when the interval is empty.
 *
 * <p>An empty interval arises in two ways. With {@code low == high} (and {@code k < n}) the heights tie
 * at the cut: another resolution of the tie could have given a different k-cluster state, which
 * {@link #tieDependent()} reports. With {@code low > high}, possible only on trees with inversions
 * (centroid, median), no single cut height reproduces this state.
 *
 * @param k            the number of clusters
 * @param partition    the clusters, with exactly {@code k} labels
 * @param low          the lower end of the height interval
 * @param high         the upper end of the height interval, possibly {@code +∞}
 * @param chosen       the cut height to report for this state
 * @param tieDependent whether tied heights at the cut make this state depend on the order of ties
 */
public record KCut(int k, Partition partition, double low, double high, double chosen, boolean tieDependent) {

    public KCut {
        Objects.requireNonNull(partition, "partition");
        if (k < 1 || partition.clusterCount() != k) {
            throw new IllegalArgumentException("a cut at k = " + k + " needs a partition with k clusters, got "
                    + partition.clusterCount());
        }
        if (!(low >= 0) || Double.isInfinite(low) || Double.isNaN(high) || !Double.isFinite(chosen)) {
            throw new IllegalArgumentException("bad cut heights: low " + low + ", high " + high + ", chosen " + chosen);
        }
        if (tieDependent && low != high) {
            throw new IllegalArgumentException("a tie-dependent cut has low == high");
        }
    }

    /** Whether a cut by height at {@link #chosen()} reproduces this partition ({@code low < high}). */
    public boolean reproducibleByHeight() {
        return low < high;
    }

    static double chooseHeight(double low, double high) {
        if (!(low < high) || Double.isInfinite(high)) {
            return low;
        }
        return low + (high - low) / 2;
    }
}
