package org.treeproof.tree;

import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;
import java.util.Objects;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.CondensedRows;
import org.treeproof.partition.Partition;

/**
 * An immutable dendrogram over {@code n} leaves in the conventional layout: leaves are {@code 0..n-1},
 * merge {@code s} (for {@code s < n-1}) joins clusters {@code left(s) < right(s)} and forms cluster
 * {@code n+s}, at {@code height(s)}. For monotone linkages the merges are in non-decreasing height
 * order; for centroid and median they are in the order they happened, and a height may be lower than
 * an earlier one (an inversion).
 *
 * <p>Every operation is iterative (no recursion), so degenerate trees of depth {@code n} are fine. The
 * members of any cluster are a contiguous run of {@link #leafOrder()}, which makes cuts O(n): two
 * neighbours in the leaf order are in the same cluster exactly when the merge that first joins them
 * has been applied.
 *
 * <p>Serializable as its merges alone; reading one back checks them and rebuilds the derived arrays.
 */
public final class MergeTree implements Serializable {
    private static final long serialVersionUID = 1L;
    private final int n;
    private final int[] left;
    private final int[] right;
    private final double[] height;
    private final int[] size;
    private final int[] leafOrder;
    private final int[] cladeStart;
    /** For {@code p >= 1}: the merge that joins {@code leafOrder[p-1]} and {@code leafOrder[p]}. */
    private final int[] boundaryMerge;
    /** The largest height in the subtree of each merge, for cuts by height. */
    private final double[] subtreeMax;
    private final double[] prefixMax;
    private final double[] suffixMin;
    private final boolean monotone;

    /**
     * A tree from its merges; the arrays are copied.
     *
     * @param leaves  the number of leaves {@code n >= 1}
     * @param left    the smaller cluster id of each of the {@code n-1} merges
     * @param right   the larger cluster id of each merge
     * @param heights each merge's height, finite and non-negative
     * @throws IllegalArgumentException if the merges do not form one binary tree in the conventional layout
     */
    public static MergeTree of(int leaves, int[] left, int[] right, double[] heights) {
        return new MergeTree(leaves, left, right, heights, true);
    }

    MergeTree(int leaves, int[] left, int[] right, double[] heights, boolean copy) {
        Objects.requireNonNull(left, "left");
        Objects.requireNonNull(right, "right");
        Objects.requireNonNull(heights, "heights");
        if (leaves < 1) {
            throw new IllegalArgumentException("a tree needs at least one leaf, got " + leaves);
        }
        int m = leaves - 1;
        if (left.length != m || right.length != m || heights.length != m) {
            throw new IllegalArgumentException("a tree over " + leaves + " leaves has " + m + " merges, got arrays of "
                    + left.length + ", " + right.length + " and " + heights.length);
        }
        this.n = leaves;
        this.left = copy ? left.clone() : left;
        this.right = copy ? right.clone() : right;
        this.height = copy ? heights.clone() : heights;
        this.size = new int[m];
        boolean[] used = new boolean[2 * n - 1];
        boolean mono = true;
        for (int s = 0; s < m; s++) {
            int a = this.left[s];
            int b = this.right[s];
            double h = height[s];
            if (a < 0 || a >= b || b >= n + s) {
                throw new IllegalArgumentException("merge " + s + " joins " + a + " and " + b
                        + "; need 0 <= left < right < " + (n + s));
            }
            if (used[a] || used[b]) {
                throw new IllegalArgumentException("merge " + s + " reuses cluster " + (used[a] ? a : b));
            }
            if (!(h >= 0) || Double.isInfinite(h)) {
                throw new IllegalArgumentException("merge " + s + " has height " + h + "; need finite and >= 0");
            }
            used[a] = true;
            used[b] = true;
            size[s] = nodeSize(a) + nodeSize(b);
            if (s > 0 && h < height[s - 1]) {
                mono = false;
            }
        }
        this.monotone = mono;

        leafOrder = new int[n];
        cladeStart = new int[m];
        boundaryMerge = new int[n];
        boundaryMerge[0] = -1;
        if (m == 0) {
            leafOrder[0] = 0;
        }
        // parents come after their children, so a descending sweep places every clade before its parts
        for (int s = m - 1; s >= 0; s--) {
            int start = cladeStart[s];
            int a = this.left[s];
            int split = start + nodeSize(a);
            place(a, start);
            place(this.right[s], split);
            boundaryMerge[split] = s;
        }

        subtreeMax = new double[m];
        prefixMax = new double[m];
        suffixMin = new double[m];
        for (int s = 0; s < m; s++) {
            double h = height[s];
            double sm = h;
            if (this.left[s] >= n) {
                sm = Math.max(sm, subtreeMax[this.left[s] - n]);
            }
            if (this.right[s] >= n) {
                sm = Math.max(sm, subtreeMax[this.right[s] - n]);
            }
            subtreeMax[s] = sm;
            prefixMax[s] = s == 0 ? h : Math.max(prefixMax[s - 1], h);
        }
        for (int s = m - 1; s >= 0; s--) {
            suffixMin[s] = s == m - 1 ? height[s] : Math.min(suffixMin[s + 1], height[s]);
        }
    }

    private void place(int node, int start) {
        if (node < n) {
            leafOrder[start] = node;
        } else {
            cladeStart[node - n] = start;
        }
    }

    private int nodeSize(int node) {
        return node < n ? 1 : size[node - n];
    }

    /** The number of leaves (clustered items). */
    public int leaves() {
        return n;
    }

    /** The number of merges, {@code leaves() - 1}. */
    public int merges() {
        return n - 1;
    }

    /** The smaller id of the two clusters joined at merge {@code s} (a leaf below n, else merge id - n). */
    public int left(int s) {
        return left[Objects.checkIndex(s, n - 1)];
    }

    /** The larger id of the two clusters joined at merge {@code s}. */
    public int right(int s) {
        return right[Objects.checkIndex(s, n - 1)];
    }

    /** The height of merge {@code s} (in the units of the input distances). */
    public double height(int s) {
        return height[Objects.checkIndex(s, n - 1)];
    }

    /** All merge heights in merge order (a copy). */
    public double[] heights() {
        return height.clone();
    }

    /** The number of leaves in the cluster formed at merge {@code s}. */
    public int size(int s) {
        return size[Objects.checkIndex(s, n - 1)];
    }

    /** Whether heights never decrease along the merge order (no inversions). */
    public boolean monotone() {
        return monotone;
    }

    /**
     * The leaves in dendrogram order: a pre-order walk from the root visiting each left child before the
     * right one, the order of scipy's {@code leaves_list}. A copy.
     */
    public int[] leafOrder() {
        return leafOrder.clone();
    }

    /** Where the members of merge {@code s} begin in {@link #leafOrder()}. */
    public int cladeStart(int s) {
        return cladeStart[Objects.checkIndex(s, n - 1)];
    }

    /** Where the members of merge {@code s} end (exclusive) in {@link #leafOrder()}. */
    public int cladeEnd(int s) {
        return cladeStart[Objects.checkIndex(s, n - 1)] + size[s];
    }

    /** The leaves under merge {@code s}, in increasing order. */
    public int[] cladeMembers(int s) {
        int start = cladeStart(s);
        int[] members = Arrays.copyOfRange(leafOrder, start, start + size[s]);
        Arrays.sort(members);
        return members;
    }

    /**
     * The state of the agglomeration when {@code k} clusters remain: the first {@code n-k} merges
     * applied, in merge order. Always exactly {@code k} clusters, also on trees with inversions.
     *
     * <p>The height interval generalises "between merge n-k-1 and merge n-k" to trees with inversions:
     * {@code low} is the largest height among the applied merges (0 for {@code k = n}), {@code high} the
     * smallest among the others ({@code +∞} for {@code k = 1}). On monotone trees these are the heights of
     * merges {@code n-k-1} and {@code n-k}. See {@link KCut} for the chosen height.
     */
    public KCut cutAtK(int k) {
        int[] labels = cutLabelsAtK(k);
        double low = k == n ? 0.0 : prefixMax[n - k - 1];
        double high = k == 1 ? Double.POSITIVE_INFINITY : suffixMin[n - k];
        return new KCut(k, new Partition(labels, k), low, high, KCut.chooseHeight(low, high), k < n && low == high);
    }

    /** The lowest height of the cut at k ({@link KCut#low()}), without the labels. */
    double cutLow(int k) {
        return k == n ? 0.0 : prefixMax[n - k - 1];
    }

    /** The highest height of the cut at k ({@link KCut#high()}), without the labels. */
    double cutHigh(int k) {
        return k == 1 ? Double.POSITIVE_INFINITY : suffixMin[n - k];
    }

    /**
     * The labels of {@link #cutAtK(int)} without the record: canonical (clusters numbered
     * {@code 0..k-1} in order of their first item), O(n).
     */
    public int[] cutLabelsAtK(int k) {
        if (k < 1 || k > n) {
            throw new IllegalArgumentException("k must be between 1 and " + n + ", got " + k);
        }
        int applied = n - k;
        int[] out = new int[n];
        int label = 0;
        out[leafOrder[0]] = 0;
        for (int p = 1; p < n; p++) {
            if (boundaryMerge[p] >= applied) {
                label++;
            }
            out[leafOrder[p]] = label;
        }
        return canonical(out, label + 1);
    }

    /**
     * The labels of the cuts at every {@code k} from 1 to {@code maxK}: element {@code k-1} holds the
     * labels of {@link #cutLabelsAtK(int) cutLabelsAtK(k)}. O(n·maxK).
     */
    public int[][] cutLabelsUpTo(int maxK) {
        if (maxK < 1 || maxK > n) {
            throw new IllegalArgumentException("maxK must be between 1 and " + n + ", got " + maxK);
        }
        int[][] all = new int[maxK][];
        for (int k = 1; k <= maxK; k++) {
            all[k - 1] = cutLabelsAtK(k);
        }
        return all;
    }

    /**
     * The flat clusters at height {@code h}: every merge at or below {@code h} is joined. On trees with
     * inversions a merge counts as below {@code h} only when the largest height in its whole subtree is
     * at most {@code h}, so a cluster is kept whole exactly when none of its merges lies above {@code h}
     * (the rule of scipy's {@code fcluster} with the {@code distance} criterion). On monotone trees this
     * is the same as joining every merge whose own height is at most {@code h}.
     */
    public Partition cutAtHeight(double h) {
        if (Double.isNaN(h)) {
            throw new IllegalArgumentException("cut height is NaN");
        }
        int[] out = new int[n];
        int label = 0;
        out[leafOrder[0]] = 0;
        for (int p = 1; p < n; p++) {
            if (!(subtreeMax[boundaryMerge[p]] <= h)) {
                label++;
            }
            out[leafOrder[p]] = label;
        }
        return new Partition(canonical(out, label + 1), label + 1);
    }

    /** Relabels so clusters are numbered in order of their first item, as {@link Partition} requires. */
    private static int[] canonical(int[] labels, int k) {
        int[] map = new int[k];
        Arrays.fill(map, -1);
        int next = 0;
        for (int i = 0; i < labels.length; i++) {
            int l = labels[i];
            if (map[l] < 0) {
                map[l] = next++;
            }
            labels[i] = map[l];
        }
        return labels;
    }

    /**
     * The cophenetic distances (the height of the merge that first joins each pair) as a condensed
     * array in the usual layout; needs {@code n(n-1)/2} doubles, so meant for small {@code n}.
     */
    public double[] copheneticCondensed() {
        return new Cophenetic(this).condensed();
    }

    /**
     * The cophenetic correlation coefficient: Pearson's r between the cophenetic distances and the
     * {@code original} ones over all pairs. R. R. Sokal and F. J. Rohlf, "The comparison of dendrograms
     * by objective methods", Taxon 11 (1962) 33-40, doi:10.2307/1217208. Streams over the matrix with
     * O(n) extra memory. NaN when either side has no variance (for instance with two items).
     *
     * @throws IllegalArgumentException if {@code original} is not over the same number of items
     */
    public double copheneticCorrelation(CondensedDistances original) {
        Objects.requireNonNull(original, "original");
        if (original.size() != n) {
            throw new IllegalArgumentException("distances over " + original.size() + " items, tree over " + n);
        }
        return new Cophenetic(this).correlation(original);
    }

    /**
     * The same coefficient from distances read in two separate passes, for a caller that cannot hold the matrix
     * while the tree is built (it gives the matrix to {@link Linkage#clusterInPlace}): {@code meanDistance} comes
     * from {@link #meanDistance} on the distances before clustering, {@code original} gives them again afterwards
     * (say from {@link org.treeproof.distance.Metric#rows}). The same bits as
     * {@link #copheneticCorrelation(CondensedDistances)}.
     *
     * @throws IllegalArgumentException if {@code original} is not over the same number of items
     */
    public double copheneticCorrelation(double meanDistance, CondensedRows original) {
        Objects.requireNonNull(original, "original");
        if (original.size() != n) {
            throw new IllegalArgumentException("distances over " + original.size() + " items, tree over " + n);
        }
        return new Cophenetic(this).correlation(meanDistance, original);
    }

    /** The mean of the distances over all pairs as the cophenetic correlation computes it (NaN below two items). */
    public static double meanDistance(CondensedRows distances) {
        return Cophenetic.meanDistance(Objects.requireNonNull(distances, "distances"));
    }

    int[] leftArray() {
        return left;
    }

    int[] rightArray() {
        return right;
    }

    double[] heightArray() {
        return height;
    }

    int[] sizeArray() {
        return size;
    }

    int[] leafOrderArray() {
        return leafOrder;
    }

    int[] cladeStartArray() {
        return cladeStart;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MergeTree t && t.n == n && Arrays.equals(t.left, left) && Arrays.equals(t.right, right)
                && Arrays.equals(t.height, height);
    }

    @Override
    public int hashCode() {
        return Objects.hash(n, Arrays.hashCode(left), Arrays.hashCode(right), Arrays.hashCode(height));
    }

    private Object writeReplace() {
        return new SerialForm(n, left, right, height);
    }

    private void readObject(ObjectInputStream in) throws java.io.InvalidObjectException {
        throw new java.io.InvalidObjectException("a MergeTree is read through its serial form");
    }

    /** What is written for a tree: its merges, read back through the checking constructor. */
    private record SerialForm(int leaves, int[] left, int[] right, double[] heights) implements Serializable {
        private Object readResolve() {
            return new MergeTree(leaves, left, right, heights, false);
        }
    }

    @Override
    public String toString() {
        return "MergeTree[leaves=" + n + (monotone ? "" : ", with inversions") + "]";
    }
}
