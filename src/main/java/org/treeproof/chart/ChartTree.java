package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * A merge tree as the charts need it, in the conventional layout: leaves are {@code 0..n-1}; merge
 * {@code s} (0-based) joins nodes {@code left[s]} and {@code right[s]} at {@code height[s]} and forms node
 * {@code n+s}. Heights need not increase (centroid and median linkage can invert); the charts draw such
 * merges where they are and say how many there are.
 *
 * <p>{@code leafOrder} lists the leaves from the first drawn position to the last. It must keep every
 * subtree together (otherwise branches would cross); {@link #leftFirst} builds the usual order, with each
 * merge's left part before its right part.
 *
 * @param leafCount n, at least 2
 * @param left      n-1 node indices
 * @param right     n-1 node indices
 * @param height    n-1 finite heights
 * @param leafOrder a permutation of the leaves that keeps every subtree contiguous
 */
public record ChartTree(int leafCount, int[] left, int[] right, double[] height, int[] leafOrder) {

    public ChartTree {
        if (leafCount < 2) {
            throw new IllegalArgumentException("a tree needs at least 2 leaves, got " + leafCount);
        }
        Objects.requireNonNull(left, "left");
        Objects.requireNonNull(right, "right");
        Check.length(left.length, leafCount - 1, "left");
        Check.length(right.length, leafCount - 1, "right");
        left = left.clone();
        right = right.clone();
        height = Check.finite(height, leafCount - 1, "height");
        checkMerges(leafCount, left, right);
        leafOrder = Check.permutation(leafOrder, leafCount, "leafOrder");
        checkContiguous(leafCount, left, right, leafOrder);
    }

    /** The tree with the order that puts each merge's left part before its right part. */
    public static ChartTree leftFirst(int leafCount, int[] left, int[] right, double[] height) {
        if (leafCount < 2) {
            throw new IllegalArgumentException("a tree needs at least 2 leaves, got " + leafCount);
        }
        Objects.requireNonNull(left, "left");
        Objects.requireNonNull(right, "right");
        Check.length(left.length, leafCount - 1, "left");
        Check.length(right.length, leafCount - 1, "right");
        checkMerges(leafCount, left, right);
        int[] order = new int[leafCount];
        int[] stack = new int[2 * leafCount];
        int top = 0;
        int filled = 0;
        stack[top++] = 2 * leafCount - 2;
        while (top > 0) {
            int node = stack[--top];
            if (node < leafCount) {
                order[filled++] = node;
            } else {
                stack[top++] = right[node - leafCount];
                stack[top++] = left[node - leafCount];
            }
        }
        return new ChartTree(leafCount, left, right, height, order);
    }

    @Override
    public int[] left() {
        return left.clone();
    }

    @Override
    public int[] right() {
        return right.clone();
    }

    @Override
    public double[] height() {
        return height.clone();
    }

    @Override
    public int[] leafOrder() {
        return leafOrder.clone();
    }

    /** Node index of the root, {@code 2n-2}. */
    int root() {
        return 2 * leafCount - 2;
    }

    int leftOf(int merge) {
        return left[merge];
    }

    int rightOf(int merge) {
        return right[merge];
    }

    double heightOf(int merge) {
        return height[merge];
    }

    int leafAt(int position) {
        return leafOrder[position];
    }

    /** Number of merges that sit lower than one of the merges they join. */
    int inversions() {
        int count = 0;
        for (int s = 0; s < leafCount - 1; s++) {
            if (nodeHeight(left[s]) > height[s] || nodeHeight(right[s]) > height[s]) {
                count++;
            }
        }
        return count;
    }

    /** Height of any node: 0 for leaves. */
    double nodeHeight(int node) {
        return node < leafCount ? 0.0 : height[node - leafCount];
    }

    private static void checkMerges(int n, int[] left, int[] right) {
        boolean[] used = new boolean[2 * n - 1];
        for (int s = 0; s < n - 1; s++) {
            int a = left[s];
            int b = right[s];
            for (int c : new int[] {a, b}) {
                if (c < 0 || c >= n + s) {
                    throw new IllegalArgumentException("merge " + s + " joins node " + c
                            + ", which does not exist yet (valid: 0.." + (n + s - 1) + ")");
                }
                if (used[c]) {
                    throw new IllegalArgumentException("merge " + s + " joins node " + c + ", which an earlier merge"
                            + " already joined");
                }
                used[c] = true;
            }
            if (a == b) {
                throw new IllegalArgumentException("merge " + s + " joins node " + a + " with itself");
            }
        }
    }

    private static void checkContiguous(int n, int[] left, int[] right, int[] order) {
        int[] lo = new int[2 * n - 1];
        int[] hi = new int[2 * n - 1];
        int[] size = new int[2 * n - 1];
        for (int p = 0; p < n; p++) {
            lo[order[p]] = p;
            hi[order[p]] = p;
            size[order[p]] = 1;
        }
        for (int s = 0; s < n - 1; s++) {
            int node = n + s;
            lo[node] = Math.min(lo[left[s]], lo[right[s]]);
            hi[node] = Math.max(hi[left[s]], hi[right[s]]);
            size[node] = size[left[s]] + size[right[s]];
            if (hi[node] - lo[node] + 1 != size[node]) {
                throw new IllegalArgumentException("leafOrder splits the group formed by merge " + s
                        + "; every subtree's leaves must be adjacent");
            }
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ChartTree t && t.leafCount == leafCount && Arrays.equals(t.left, left)
                && Arrays.equals(t.right, right) && Arrays.equals(t.height, height)
                && Arrays.equals(t.leafOrder, leafOrder);
    }

    @Override
    public int hashCode() {
        return Objects.hash(leafCount, Arrays.hashCode(left), Arrays.hashCode(right), Arrays.hashCode(height),
                Arrays.hashCode(leafOrder));
    }

    @Override
    public String toString() {
        return "ChartTree[leaves=" + leafCount + "]";
    }
}
