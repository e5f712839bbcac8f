package org.treeproof.tree;

import java.util.Arrays;
import org.treeproof.partition.Clustering;

/**
 * Cuts of one tree into k clusters of at least {@code minSize} samples, outliers set aside ({@link SizedCut}).
 *
 * <p>Undoing the merges from the last one down, each step splits one branch in two; the number of branches of
 * at least {@code minSize} samples goes up by one (two large halves), stays (a large branch sheds a small one)
 * or, rarely, goes down (a large branch falls into two small ones). It starts at one, so every count up to its
 * largest is reached, and the state for {@code k} is the first at which the count is {@code k}. These states
 * are nested: each one refines the one for {@code k - 1}. O(n) to find every state, O(n) for each set of labels.
 */
public final class SizedCuts {
    private final MergeTree tree;
    private final int minSize;
    private final int[] branchesForK;   // index k; 0 when k is never reached

    private SizedCuts(MergeTree tree, int minSize, int maxK) {
        this.tree = tree;
        this.minSize = Math.max(1, minSize);
        this.branchesForK = findStates(tree, this.minSize, maxK);
    }

    /** The sized cuts of {@code tree} for k = 1..maxK with the given minimum cluster size. */
    public static SizedCuts of(MergeTree tree, int minSize, int maxK) {
        if (maxK < 1) {
            throw new IllegalArgumentException("maxK must be at least 1");
        }
        return new SizedCuts(tree, minSize, maxK);
    }

    public int minSize() {
        return minSize;
    }

    /** The largest k up to the asked maximum for which a state exists (0 when no branch is large enough). */
    public int reachableK() {
        int best = 0;
        for (int k = 1; k < branchesForK.length; k++) {
            if (branchesForK[k] > 0) {
                best = k;
            }
        }
        return best;
    }

    /** Whether a state with exactly {@code k} clusters exists. */
    public boolean reaches(int k) {
        return k >= 1 && k < branchesForK.length && branchesForK[k] > 0;
    }

    /** The cut at k, or {@code null} when no state has exactly k large branches. */
    public SizedCut at(int k) {
        if (!reaches(k)) {
            return null;
        }
        int branches = branchesForK[k];
        Clustering c = labelsOf(branches);
        double low = tree.cutLow(branches);
        double high = tree.cutHigh(branches);
        int n = tree.leaves();
        return new SizedCut(k, branches, c, low, high, KCut.chooseHeight(low, high), branches < n && low == high);
    }

    /**
     * Outlier-marked labels for k = 1..maxK ({@link Clustering#OUTLIER} for outliers): element {@code k - 1} is the
     * state at k, or, when k is not reached, the state of the largest reached count below k (so the states stay
     * nested). When even one large branch is missing, every sample is an outlier.
     */
    public int[][] labelsUpTo(int maxK) {
        int[][] out = new int[maxK][];
        int[] last = null;
        for (int k = 1; k <= maxK; k++) {
            if (reaches(k)) {
                last = labelsOf(branchesForK[k]).labels();
            } else if (last == null) {
                last = new int[tree.leaves()];
                Arrays.fill(last, Clustering.OUTLIER);
            }
            out[k - 1] = last;
        }
        return out;
    }

    /**
     * One cluster plus the far samples: the branches of fewer than the minimum size that the tree sheds before its
     * first split into two branches of the minimum size, and that join the rest at a height at least
     * {@code factor} times that split's height. Data without clusters still shed their most extreme samples one
     * by one at the top of a tree, at heights a little above the first real split (about 1.3 times it on Gaussian
     * samples under average linkage); a sample far from everything else joins many times higher. Without such a
     * split there is nothing to compare with and the result has no outliers.
     */
    public Clustering oneClusterWithOutliers(double factor) {
        int n = tree.leaves();
        int[] labels = new int[n];
        if (n < minSize) {
            Arrays.fill(labels, Clustering.OUTLIER);
            return new Clustering(labels, 0);
        }
        if (branchesForK.length <= 2 || branchesForK[2] == 0) {
            return new Clustering(labels, 1);
        }
        int splits = branchesForK[2] - 1;   // merges undone up to and including the first large split
        double firstLarge = tree.height(n - 1 - splits);
        for (int t = 1; t < splits; t++) {
            int s = n - 1 - t;
            if (!(tree.height(s) >= factor * firstLarge)) {
                continue;
            }
            int small = sizeOf(tree, tree.left(s)) < minSize ? tree.left(s) : tree.right(s);
            markLeaves(small, labels);
        }
        return Clustering.of(labels);
    }

    private void markLeaves(int node, int[] labels) {
        int n = tree.leaves();
        var stack = new java.util.ArrayDeque<Integer>();
        stack.push(node);
        while (!stack.isEmpty()) {
            int x = stack.pop();
            if (x < n) {
                labels[x] = Clustering.OUTLIER;
            } else {
                stack.push(tree.left(x - n));
                stack.push(tree.right(x - n));
            }
        }
    }

    private Clustering labelsOf(int branches) {
        int[] raw = tree.cutLabelsAtK(branches);
        int[] sizes = new int[branches];
        for (int l : raw) {
            sizes[l]++;
        }
        for (int i = 0; i < raw.length; i++) {
            if (sizes[raw[i]] < minSize) {
                raw[i] = Clustering.OUTLIER;
            }
        }
        return Clustering.of(raw);
    }

    private static int[] findStates(MergeTree tree, int minSize, int maxK) {
        int n = tree.leaves();
        int[] found = new int[maxK + 1];
        int big = n >= minSize ? 1 : 0;
        if (big == 1 && maxK >= 1) {
            found[1] = 1;
        }
        int remaining = maxK - (big == 1 ? 1 : 0);
        for (int branches = 1; branches < n && remaining > 0; branches++) {
            int s = n - 1 - branches;   // the merge undone to go from `branches` to `branches + 1`
            big += (sizeOf(tree, tree.left(s)) >= minSize ? 1 : 0) + (sizeOf(tree, tree.right(s)) >= minSize ? 1 : 0)
                    - (tree.size(s) >= minSize ? 1 : 0);
            if (big >= 1 && big <= maxK && found[big] == 0) {
                found[big] = branches + 1;
                remaining--;
            }
        }
        return found;
    }

    private static int sizeOf(MergeTree tree, int node) {
        int n = tree.leaves();
        return node < n ? 1 : tree.size(node - n);
    }
}
