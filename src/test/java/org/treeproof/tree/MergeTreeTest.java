package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/**
 * MergeTree's derived views checked against direct definitions: a cut at k is the union-find state after
 * the first n-k merges; a cut at h joins the merges whose whole subtree lies at or below h (scipy's
 * fcluster "distance" rule, checked against scipy itself in {@link ScipyReferenceTest}); the cophenetic
 * distance of two leaves is the height of the merge that first joins them (Sokal and Rohlf 1962,
 * doi:10.2307/1217208), and the cophenetic correlation is Pearson's r of those with the distances.
 */
class MergeTreeTest {

    private static CondensedDistances randomPoints(SplittableRandom rnd, int n) {
        double[][] x = new double[n][2];
        for (double[] row : x) {
            row[0] = rnd.nextInt(5) + (rnd.nextBoolean() ? rnd.nextDouble() : 0);
            row[1] = rnd.nextGaussian();
        }
        return TreeFixtures.euclidean(x);
    }

    private static int find(int[] parent, int x) {
        while (parent[x] != x) {
            x = parent[x];
        }
        return x;
    }

    /** Labels from union-find over the merges selected by {@code applied}. */
    private static Partition replay(MergeTree t, boolean[] applied) {
        int n = t.leaves();
        int[] parent = new int[2 * n - 1];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (int s = 0; s < n - 1; s++) {
            if (applied[s]) {
                parent[t.left(s)] = n + s;
                parent[t.right(s)] = n + s;
            }
        }
        int[] labels = new int[n];
        for (int i = 0; i < n; i++) {
            labels[i] = find(parent, i);
        }
        return Partition.of(labels);
    }

    @Test
    void viewsAgreeWithTheirDefinitionsOnRandomTrees() {
        SplittableRandom rnd = new SplittableRandom(20240611);
        for (int c = 0; c < 60; c++) {
            int n = 1 + rnd.nextInt(40);
            CondensedDistances d = randomPoints(rnd, n);
            for (Linkage l : Linkage.values()) {
                MergeTree t = l.cluster(d);
                String what = l.id() + " case " + c;
                int[][] all = t.cutLabelsUpTo(n);
                for (int k = 1; k <= n; k++) {
                    boolean[] applied = new boolean[Math.max(0, n - 1)];
                    Arrays.fill(applied, 0, n - k, true);
                    KCut cut = t.cutAtK(k);
                    assertEquals(replay(t, applied), cut.partition(), what + " k = " + k);
                    assertArrayEquals(cut.partition().labels(), t.cutLabelsAtK(k));
                    assertArrayEquals(t.cutLabelsAtK(k), all[k - 1]);
                    assertTrue(cut.low() <= cut.chosen());
                    if (cut.reproducibleByHeight()) {
                        assertTrue(cut.chosen() < cut.high());
                        assertEquals(cut.partition(), t.cutAtHeight(cut.chosen()), what + " chosen, k = " + k);
                    }
                }
                double[] subtreeMax = new double[Math.max(0, n - 1)];
                for (int s = 0; s < n - 1; s++) {
                    subtreeMax[s] = t.height(s);
                    for (int child : new int[] {t.left(s), t.right(s)}) {
                        if (child >= n) {
                            subtreeMax[s] = Math.max(subtreeMax[s], subtreeMax[child - n]);
                        }
                    }
                }
                for (int s = 0; s < n - 1; s++) {
                    double h = t.height(s);
                    boolean[] applied = new boolean[n - 1];
                    for (int r = 0; r < n - 1; r++) {
                        applied[r] = subtreeMax[r] <= h;
                    }
                    assertEquals(replay(t, applied), t.cutAtHeight(h), what + " cut at " + h);
                }
                assertCladesAndCophenetic(t, d, what);
            }
        }
    }

    private static void assertCladesAndCophenetic(MergeTree t, CondensedDistances d, String what) {
        int n = t.leaves();
        int[] order = t.leafOrder();
        int[] sorted = order.clone();
        Arrays.sort(sorted);
        for (int i = 0; i < n; i++) {
            assertEquals(i, sorted[i], what + ": leaf order is a permutation");
        }
        double[] expected = new double[CondensedDistances.length(n)];
        for (int s = 0; s < n - 1; s++) {
            int[] members = t.cladeMembers(s);
            assertEquals(t.size(s), members.length);
            assertEquals(t.size(s), t.cladeEnd(s) - t.cladeStart(s));
            int[] run = Arrays.copyOfRange(order, t.cladeStart(s), t.cladeEnd(s));
            Arrays.sort(run);
            assertArrayEquals(members, run, what + ": clade " + s + " is a run of the leaf order");
            int[] a = members(t, t.left(s));
            int[] b = members(t, t.right(s));
            int[] union = new int[a.length + b.length];
            System.arraycopy(a, 0, union, 0, a.length);
            System.arraycopy(b, 0, union, a.length, b.length);
            Arrays.sort(union);
            assertArrayEquals(union, members, what + ": clade " + s + " is the union of its parts");
            // left part first in the leaf order
            assertEquals(t.cladeStart(s), a.length == 1 ? indexOf(order, a[0]) : t.cladeStart(t.left(s) - n));
            for (int i : a) {
                for (int j : b) {
                    expected[CondensedDistances.index(n, i, j)] = t.height(s);
                }
            }
        }
        assertArrayEquals(expected, t.copheneticCondensed(), what);
        if (n > 2) {
            double r = HandWorkedExampleTest.pearson(expected, d.toCondensedArray());
            double fast = t.copheneticCorrelation(d);
            if (Double.isNaN(r)) {
                assertTrue(Double.isNaN(fast), what);
            } else {
                assertEquals(r, fast, 1e-12, what + ": cophenetic correlation");
            }
        }
    }

    private static int[] members(MergeTree t, int node) {
        return node < t.leaves() ? new int[] {node} : t.cladeMembers(node - t.leaves());
    }

    private static int indexOf(int[] a, int v) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] == v) {
                return i;
            }
        }
        return -1;
    }

    /** Single linkage on points with growing gaps: merge s joins leaf s+1 to all before it. */
    private static MergeTree caterpillar(int n) {
        int[] left = new int[n - 1];
        int[] right = new int[n - 1];
        double[] h = new double[n - 1];
        for (int s = 0; s < n - 1; s++) {
            left[s] = s == 0 ? 0 : s + 1;
            right[s] = s == 0 ? 1 : n + s - 1;
            h[s] = s + 1;
        }
        return MergeTree.of(n, left, right, h);
    }

    @Test
    void singleLinkageOnALineIsACaterpillar() {
        int n = 2000;
        double[][] x = new double[n][1];
        for (int i = 0; i < n; i++) {
            x[i][0] = i + i * (double) i / n; // gaps grow, so item i+1 joins after item i
        }
        CondensedDistances d = TreeFixtures.euclidean(x);
        MergeTree t = Linkage.SINGLE.cluster(d);
        MergeTree shape = caterpillar(n);
        for (int s = 0; s < n - 1; s++) {
            assertEquals(shape.left(s), t.left(s));
            assertEquals(shape.right(s), t.right(s));
        }
        assertArrayEquals(shape.leafOrder(), t.leafOrder());
        assertEquals(HandWorkedExampleTest.pearson(t.copheneticCondensed(), d.toCondensedArray()),
                t.copheneticCorrelation(d), 1e-12);
    }

    /** A tree of depth n = 100 000 (far beyond any call stack) through every view; nothing recurses. */
    @Test
    void deepTreesNeedNoRecursion() {
        int n = 100_000;
        MergeTree t = caterpillar(n);
        int[] order = t.leafOrder();
        // root = (leaf n-1, merge n-3): n-1 first, then down the spine, ending 0, 1
        assertEquals(n - 1, order[0]);
        assertEquals(2, order[n - 3]);
        assertEquals(0, order[n - 2]);
        assertEquals(1, order[n - 1]);
        assertEquals(0, t.cladeStart(n - 2));
        assertEquals(n, t.cladeEnd(n - 2));
        assertEquals(n - 2, t.cladeStart(0));
        assertArrayEquals(new int[] {0, 1, 2, 3}, t.cladeMembers(2));
        KCut cut = t.cutAtK(3);
        assertEquals(n - 3, cut.low());
        assertEquals(n - 2, cut.high());
        assertEquals(t.cutAtHeight(n - 2.5), cut.partition());
        int[] labels = cut.partition().labels();
        assertEquals(0, labels[n - 3]);
        assertEquals(1, labels[n - 2]);
        assertEquals(2, labels[n - 1]);
        assertEquals(10, t.cutLabelsUpTo(10).length);
        assertEquals(n, t.cutAtK(n).partition().clusterCount());
        assertEquals(1, t.cutAtHeight(n).clusterCount());
    }

    @Test
    void tiesAtTheCutAreReported() {
        // three merges at 1, 1, 2: the 3-cluster state depends on which tied merge went first
        MergeTree t = MergeTree.of(4, new int[] {0, 2, 4}, new int[] {1, 3, 5}, new double[] {1, 1, 2});
        KCut three = t.cutAtK(3);
        assertTrue(three.tieDependent());
        assertFalse(three.reproducibleByHeight());
        assertEquals(1, three.chosen());
        assertFalse(t.cutAtK(2).tieDependent());
        assertEquals(1.5, t.cutAtK(2).chosen());
        // k = n is never tie-dependent, even with a zero-height merge (duplicates)
        MergeTree dup = MergeTree.of(3, new int[] {0, 2}, new int[] {1, 3}, new double[] {0, 1});
        assertFalse(dup.cutAtK(3).tieDependent());
        assertFalse(dup.cutAtK(3).reproducibleByHeight());
        assertEquals(3, dup.cutAtK(3).partition().clusterCount());
    }

    @Test
    void rejectsMalformedMerges() {
        assertThrows(IllegalArgumentException.class, () -> MergeTree.of(0, new int[0], new int[0], new double[0]));
        assertThrows(IllegalArgumentException.class, () -> MergeTree.of(3, new int[] {0}, new int[] {1}, new double[] {1}));
        // left must be below right
        assertThrows(IllegalArgumentException.class,
                () -> MergeTree.of(3, new int[] {1, 2}, new int[] {0, 3}, new double[] {1, 2}));
        // a cluster that does not exist yet
        assertThrows(IllegalArgumentException.class,
                () -> MergeTree.of(3, new int[] {0, 2}, new int[] {3, 4}, new double[] {1, 2}));
        // a cluster used twice
        assertThrows(IllegalArgumentException.class,
                () -> MergeTree.of(3, new int[] {0, 0}, new int[] {1, 3}, new double[] {1, 2}));
        assertThrows(IllegalArgumentException.class,
                () -> MergeTree.of(2, new int[] {0}, new int[] {1}, new double[] {Double.NaN}));
        assertThrows(IllegalArgumentException.class,
                () -> MergeTree.of(2, new int[] {0}, new int[] {1}, new double[] {-1}));
        MergeTree t = MergeTree.of(2, new int[] {0}, new int[] {1}, new double[] {1});
        assertThrows(IllegalArgumentException.class, () -> t.cutAtK(0));
        assertThrows(IllegalArgumentException.class, () -> t.cutAtK(3));
        assertThrows(IllegalArgumentException.class, () -> t.cutAtHeight(Double.NaN));
        assertThrows(IndexOutOfBoundsException.class, () -> t.height(1));
        assertThrows(IllegalArgumentException.class,
                () -> t.copheneticCorrelation(CondensedDistances.of(3, new double[] {1, 1, 1})));
        assertThrows(IllegalArgumentException.class,
                () -> new KCut(2, Partition.of(new int[] {0, 0}), 0, 1, 0.5, false));
    }

    @Test
    void copiesItsInputsAndComparesByValue() {
        int[] left = {0, 2};
        int[] right = {1, 3};
        double[] h = {1, 2};
        MergeTree t = MergeTree.of(3, left, right, h);
        left[1] = 1;
        h[0] = 5;
        assertEquals(2, t.left(1));
        assertEquals(1, t.height(0));
        t.heights()[0] = 7;
        t.leafOrder()[0] = 7;
        assertEquals(1, t.height(0));
        assertEquals(MergeTree.of(3, new int[] {0, 2}, new int[] {1, 3}, new double[] {1, 2}), t);
        assertNotEquals(MergeTree.of(3, new int[] {0, 2}, new int[] {1, 3}, new double[] {1, 3}), t);
        assertTrue(Double.isNaN(t.copheneticCorrelation(CondensedDistances.of(3, new double[] {1, 1, 1}))),
                "no variance in the distances");
    }
}
