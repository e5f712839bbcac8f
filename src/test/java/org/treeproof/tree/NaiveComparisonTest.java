package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;

/**
 * The fast algorithms (minimum spanning tree, nearest-neighbour chain, generic with a neighbour list;
 * Müllner 2011, arXiv:1109.2378) against the primitive O(n³) Lance-Williams agglomeration of
 * {@link NaiveLanceWilliams}, on seeded random points.
 *
 * <p>Without ties (Gaussian points) the dendrogram is unique, so heights and every cut must agree. With
 * ties (points on a small integer grid, many duplicates) several dendrograms are valid, so the checks are
 * tie-invariant: replaying the fast tree's merges through the naive recurrence, each merge must join two
 * clusters at exactly its reported height, and no other pair may then be closer (the defining property
 * of the greedy agglomeration); for single linkage, the multiset of heights (the minimum spanning tree's
 * edge lengths) and every cut by height are unique and must match.
 */
class NaiveComparisonTest {
    private static final double REL = 1e-10;

    private static CondensedDistances gaussian(SplittableRandom rnd, int n, int dims) {
        double[][] x = new double[n][dims];
        for (double[] row : x) {
            for (int f = 0; f < dims; f++) {
                row[f] = rnd.nextGaussian() * (1 + f);
            }
        }
        return TreeFixtures.euclidean(x);
    }

    private static CondensedDistances grid(SplittableRandom rnd, int n, int dims, int levels) {
        double[][] x = new double[n][dims];
        for (double[] row : x) {
            for (int f = 0; f < dims; f++) {
                row[f] = rnd.nextInt(levels);
            }
        }
        return TreeFixtures.euclidean(x);
    }

    private static void assertClose(double expected, double actual, double scale, String what) {
        assertTrue(Math.abs(expected - actual) <= REL * Math.max(scale, Math.abs(expected)),
                () -> what + ": expected " + expected + " but was " + actual);
    }

    @Test
    void tieFreeInputsGiveTheNaiveTree() {
        SplittableRandom rnd = new SplittableRandom(0x5eed_0001L);
        int cases = 0;
        for (int c = 0; c < 300; c++) {
            int n = c < 3 ? c + 1 : 1 + rnd.nextInt(c < 285 ? 30 : 64);
            CondensedDistances d = gaussian(rnd, n, 1 + rnd.nextInt(4));
            for (Linkage l : Linkage.values()) {
                MergeTree fast = l.cluster(d);
                MergeTree naive = NaiveLanceWilliams.cluster(l, d);
                String what = l.id() + " case " + c + " (n = " + n + ")";
                assertEquals(n, fast.leaves());
                for (int s = 0; s < n - 1; s++) {
                    assertClose(naive.height(s), fast.height(s), 1.0, what + " height " + s);
                }
                for (int k = 1; k <= n; k++) {
                    assertEquals(naive.cutAtK(k).partition(), fast.cutAtK(k).partition(), what + " k = " + k);
                }
                if (l.monotone()) {
                    assertTrue(fast.monotone(), what);
                }
                cases++;
            }
        }
        assertEquals(300 * Linkage.values().length, cases);
    }

    @Test
    void tiedInputsGiveAValidGreedyTree() {
        SplittableRandom rnd = new SplittableRandom(0x5eed_0002L);
        for (int c = 0; c < 300; c++) {
            int n = c < 3 ? c + 1 : 2 + rnd.nextInt(c < 285 ? 30 : 64);
            CondensedDistances d = grid(rnd, n, 1 + rnd.nextInt(2), 2 + rnd.nextInt(3));
            for (Linkage l : Linkage.values()) {
                MergeTree fast = l.cluster(d);
                String what = l.id() + " case " + c + " (n = " + n + ")";
                assertReplaysGreedily(l, d, fast, what);
                if (l.monotone()) {
                    assertTrue(fast.monotone(), what);
                }
                for (int k = 1; k <= n; k++) {
                    assertEquals(k, fast.cutAtK(k).partition().clusterCount(), what);
                }
            }
            MergeTree single = Linkage.SINGLE.cluster(d);
            MergeTree naive = NaiveLanceWilliams.cluster(Linkage.SINGLE, d);
            double[] a = single.heights();
            double[] b = naive.heights();
            Arrays.sort(b);
            for (int s = 0; s < n - 1; s++) {
                assertClose(b[s], a[s], 1.0, "single linkage height " + s + ", case " + c);
            }
            // the naive recurrence's min(a,b) = a/2 + b/2 - |a-b|/2 is off by an ulp at times: cut between heights
            double[] distinct = Arrays.stream(a).distinct().toArray();
            for (int u = 0; u <= distinct.length; u++) {
                double h = u == 0 ? -1 : u == distinct.length ? distinct[u - 1] + 1 : (distinct[u - 1] + distinct[u]) / 2;
                assertEquals(naive.cutAtHeight(h), single.cutAtHeight(h), "single cut at " + h + ", case " + c);
            }
        }
    }

    /**
     * Replays the tree's merges in row order through the general recurrence: each must join two current
     * clusters at its reported height, and be a closest pair at that moment.
     */
    private static void assertReplaysGreedily(Linkage l, CondensedDistances distances, MergeTree tree, String what) {
        int n = distances.size();
        boolean squared = l.requiresEuclidean();
        double[][] d = NaiveLanceWilliams.square(distances, squared);
        double scale = 0;
        for (int t = 0; t < CondensedDistances.length(n); t++) {
            scale = Math.max(scale, distances.at(t));
        }
        double workScale = squared ? scale * scale : scale;
        int[] slot = new int[2 * n - 1];
        boolean[] active = new boolean[n];
        int[] size = new int[n];
        for (int i = 0; i < n; i++) {
            slot[i] = i;
            active[i] = true;
            size[i] = 1;
        }
        for (int s = 0; s < n - 1; s++) {
            int i = slot[tree.left(s)];
            int j = slot[tree.right(s)];
            assertTrue(active[i] && active[j], what + ": merge " + s + " joins a cluster that is gone");
            double dij = d[i][j];
            double reported = squared ? tree.height(s) * tree.height(s) : tree.height(s);
            assertClose(dij, reported, workScale, what + ": height of merge " + s);
            for (int a = 0; a < n; a++) {
                for (int b = a + 1; b < n; b++) {
                    if (active[a] && active[b]) {
                        assertTrue(d[a][b] >= dij - REL * Math.max(workScale, dij),
                                what + ": merge " + s + " at " + dij + " but " + a + "," + b + " at " + d[a][b]);
                    }
                }
            }
            for (int k = 0; k < n; k++) {
                if (active[k] && k != i && k != j) {
                    double v = l.coefficients(size[i], size[j], size[k]).apply(d[k][i], d[k][j], dij);
                    d[k][j] = v;
                    d[j][k] = v;
                }
            }
            active[i] = false;
            size[j] += size[i];
            slot[n + s] = j;
        }
    }
}
