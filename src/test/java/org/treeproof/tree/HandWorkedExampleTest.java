package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.treeproof.tree.TreeFixtures.assertRelative;

import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/**
 * Merge sequences derived by hand from the definitions of the linkages and the Lance-Williams recurrence
 * (G. N. Lance and W. T. Williams, The Computer Journal 9 (1967) 373-380, doi:10.1093/comjnl/9.4.373).
 * The same points are in
 * reference/tree/small_linkage.json ("line5", "triangle"), where scipy 1.10.1 gives these very rows;
 * {@link ScipyReferenceTest} checks that too.
 *
 * <p>Five points on a line: A=0, B=2, C=3, D=7, E=13 (ids 0..4). Distances: AB 2, AC 3, AD 7, AE 13,
 * BC 1, BD 5, BE 11, CD 4, CE 10, DE 6. Every linkage first merges B and C at 1 (cluster 5).
 * <ul>
 * <li>single: A–{BC} = min(2,3) = 2, D–{BC} = min(5,4) = 4, DE = 6: merge (0,5) at 2 → 6 = ABC;
 * then 6–D = 4 vs DE 6: (3,6) at 4 → 7 = ABCD; then 7–E = min(10, 6) = 6: (4,7) at 6.</li>
 * <li>complete: A–{BC} = 3, D–{BC} = 5, DE = 6: (0,5) at 3 → 6; 6–D = 7, DE = 6: (3,4) at 6 → 7 = DE;
 * 6–7 = max(7, 13) = 13: (6,7) at 13.</li>
 * <li>average: A–{BC} = 2.5: (0,5) at 2.5; 6–D = (7+5+4)/3 = 16/3 < DE 6: (3,6) at 16/3;
 * 7–E = (13+11+10+6)/4 = 10: (4,7) at 10.</li>
 * <li>weighted: (0,5) at 2.5; 6–D = (7 + 4.5)/2 = 5.75 < 6: (3,6) at 5.75; 6–E = (13 + 10.5)/2 = 11.75,
 * 7–E = (11.75 + 6)/2 = 8.875: (4,7) at 8.875.</li>
 * <li>ward, height sqrt(2·|P||Q|/(|P|+|Q|))·|centroid P − centroid Q|: A–{BC} = sqrt(4/3)·2.5 = 5/√3 ≈ 2.887
 * (centroid 2.5) beats {BC}–D = sqrt(4/3)·4.5 and DE = 6: (0,5) at 5/√3, centroid 5/3; then
 * 6–D = sqrt(3/2)·16/3 ≈ 6.53 > DE = 6: (3,4) at 6, centroid 10; 6–7 = sqrt(12/5)·(10 − 5/3)
 * = sqrt(12/5)·25/3 ≈ 12.91.</li>
 * <li>centroid, the distance between centroids: (0,5) at 2.5 (centroid 5/3); 6–D = 16/3 < 6: (3,6) at
 * 16/3 (centroid 12/4 = 3); 7–E = 10.</li>
 * <li>median, the distance between median points (a merge's median point is the midpoint of its parts'):
 * (0,5) at 2.5, median 1.25; 6–D = 5.75 < 6: (3,6) at 5.75, median 4.125; 7–E = 13 − 4.125 = 8.875.</li>
 * </ul>
 */
class HandWorkedExampleTest {
    private static final double REL = 1e-14;
    private static final CondensedDistances LINE = TreeFixtures.euclidean(
            new double[][] {{0}, {2}, {3}, {7}, {13}});

    private static void assertMerges(Linkage linkage, int[][] rows, double[] heights) {
        MergeTree tree = linkage.cluster(LINE);
        assertEquals(rows.length, tree.merges());
        for (int s = 0; s < rows.length; s++) {
            assertEquals(rows[s][0], tree.left(s), linkage.id() + " left of merge " + s);
            assertEquals(rows[s][1], tree.right(s), linkage.id() + " right of merge " + s);
            assertRelative(heights[s], tree.height(s), REL, linkage.id() + " height of merge " + s);
        }
    }

    @Test
    void lineMergesByHand() {
        int[][] chain = {{1, 2}, {0, 5}, {3, 6}, {4, 7}};
        int[][] twoGroups = {{1, 2}, {0, 5}, {3, 4}, {6, 7}};
        assertMerges(Linkage.SINGLE, chain, new double[] {1, 2, 4, 6});
        assertMerges(Linkage.COMPLETE, twoGroups, new double[] {1, 3, 6, 13});
        assertMerges(Linkage.AVERAGE, chain, new double[] {1, 2.5, 16.0 / 3, 10});
        assertMerges(Linkage.WEIGHTED, chain, new double[] {1, 2.5, 5.75, 8.875});
        assertMerges(Linkage.WARD, twoGroups, new double[] {1, 5 / Math.sqrt(3), 6, Math.sqrt(12.0 / 5) * 25 / 3});
        assertMerges(Linkage.CENTROID, chain, new double[] {1, 2.5, 16.0 / 3, 10});
        assertMerges(Linkage.MEDIAN, chain, new double[] {1, 2.5, 5.75, 8.875});
    }

    @Test
    void lineSizesLeafOrderAndClades() {
        MergeTree chain = Linkage.SINGLE.cluster(LINE);
        assertArrayEquals(new int[] {2, 3, 4, 5}, new int[] {chain.size(0), chain.size(1), chain.size(2), chain.size(3)});
        // pre-order, left first: root (4,7) → E, then 7 = (3,6) → D, 6 = (0,5) → A, 5 = (1,2) → B, C
        assertArrayEquals(new int[] {4, 3, 0, 1, 2}, chain.leafOrder());
        assertEquals(2, chain.cladeStart(1));
        assertEquals(5, chain.cladeEnd(1));
        assertArrayEquals(new int[] {0, 1, 2}, chain.cladeMembers(1));

        MergeTree groups = Linkage.COMPLETE.cluster(LINE);
        assertArrayEquals(new int[] {0, 1, 2, 3, 4}, groups.leafOrder());
        assertEquals(3, groups.cladeStart(2));
        assertEquals(5, groups.cladeEnd(2));
        assertArrayEquals(new int[] {3, 4}, groups.cladeMembers(2));
        assertArrayEquals(new int[] {0, 1, 2, 3, 4}, groups.cladeMembers(3));
    }

    @Test
    void lineCutsByHand() {
        MergeTree complete = Linkage.COMPLETE.cluster(LINE);
        // k = 2 after merges at 1, 3, 6: {A,B,C} {D,E}; interval [6, 13), drawn at 9.5
        KCut two = complete.cutAtK(2);
        assertEquals(Partition.of(new int[] {0, 0, 0, 1, 1}), two.partition());
        assertEquals(6, two.low());
        assertEquals(13, two.high());
        assertEquals(9.5, two.chosen());
        assertFalse(two.tieDependent());
        assertTrue(two.reproducibleByHeight());
        // k = 3: {A,B,C} {D} {E} in [3, 6)
        KCut three = complete.cutAtK(3);
        assertEquals(Partition.of(new int[] {0, 0, 0, 1, 2}), three.partition());
        assertEquals(4.5, three.chosen());
        // k = n: no merge applied, [0, 1); k = 1: everything, [13, +inf), drawn at 13
        assertEquals(0.5, complete.cutAtK(5).chosen());
        assertEquals(5, complete.cutAtK(5).partition().clusterCount());
        assertEquals(13, complete.cutAtK(1).chosen());
        assertEquals(Double.POSITIVE_INFINITY, complete.cutAtK(1).high());
        // at a merge's own height the merge is joined
        assertEquals(Partition.of(new int[] {0, 0, 0, 1, 1}), complete.cutAtHeight(6));
        assertEquals(Partition.of(new int[] {0, 0, 0, 1, 2}), complete.cutAtHeight(5.999));
        assertEquals(Partition.of(new int[] {0, 1, 2, 3, 4}), complete.cutAtHeight(-1));
    }

    @Test
    void lineCopheneticByHand() {
        // average: pairs AB AC AD AE BC BD BE CD CE DE meet at 2.5 2.5 16/3 10 1 16/3 10 16/3 10 10
        double[] expected = {2.5, 2.5, 16.0 / 3, 10, 1, 16.0 / 3, 10, 16.0 / 3, 10, 10};
        MergeTree average = Linkage.AVERAGE.cluster(LINE);
        assertArrayEquals(expected, average.copheneticCondensed(), 1e-15);
        // Pearson r of that vector with the distances, written out: scipy's cophenet gives 0.8865343893178782
        double[] d = LINE.toCondensedArray();
        assertRelative(pearson(expected, d), average.copheneticCorrelation(LINE), 1e-13, "cophenetic r");
        assertRelative(0.8865343893178782, average.copheneticCorrelation(LINE), 1e-13, "scipy cophenet");
    }

    /**
     * A = (0,0), B = (2,0), C = (1,1.8): AB = 2 < AC = BC = sqrt(4.24) ≈ 2.059, so A and B merge first at
     * 2. Then C joins at sqrt(4.24) for single, complete, average and weighted (both distances equal), at
     * sqrt(2·2·1/3)·1.8 = sqrt(4/3)·1.8 for Ward, and at 1.8, the distance from C to the centroid (and
     * median point) (1,0), for centroid and median: an inversion, 1.8 < 2. By the recurrence on squares for
     * median: ½·4.24 + ½·4.24 − ¼·4 = 3.24 = 1.8².
     */
    @Test
    void triangleInversionByHand() {
        CondensedDistances d = TreeFixtures.euclidean(new double[][] {{0, 0}, {2, 0}, {1, 1.8}});
        for (Linkage l : new Linkage[] {Linkage.SINGLE, Linkage.COMPLETE, Linkage.AVERAGE, Linkage.WEIGHTED}) {
            assertRelative(Math.sqrt(4.24), l.cluster(d).height(1), REL, l.id());
        }
        assertRelative(Math.sqrt(4.0 / 3) * 1.8, Linkage.WARD.cluster(d).height(1), REL, "ward");
        for (Linkage l : new Linkage[] {Linkage.CENTROID, Linkage.MEDIAN}) {
            MergeTree t = l.cluster(d);
            assertEquals(2, t.height(0));
            assertRelative(1.8, t.height(1), REL, l.id());
            assertFalse(t.monotone());
            assertEquals(3, t.right(1));
            // k = 2 keeps {A,B},{C}; merges applied reach 2, the one left out is at 1.8: no height gives it
            KCut two = t.cutAtK(2);
            assertEquals(Partition.of(new int[] {0, 0, 1}), two.partition());
            assertEquals(2, two.low());
            assertRelative(1.8, two.high(), REL, "high");
            assertFalse(two.reproducibleByHeight());
            assertFalse(two.tieDependent());
            assertEquals(2, two.chosen());
            // by height, a cluster is whole only when its whole subtree lies at or below h
            assertEquals(3, t.cutAtHeight(1.9).clusterCount());
            assertEquals(1, t.cutAtHeight(2).clusterCount());
        }
    }

    /** Pearson's r, two-pass with compensated (Neumaier) sums so it is exact enough to judge others by. */
    static double pearson(double[] x, double[] y) {
        double mx = sum(x, null, 0, 0) / x.length;
        double my = sum(y, null, 0, 0) / y.length;
        double sxy = sum(x, y, mx, my);
        double sxx = sum(x, x, mx, mx);
        double syy = sum(y, y, my, my);
        return sxy / Math.sqrt(sxx * syy);
    }

    /** Σ x (when y is null) or Σ (x - mx)(y - my), with Neumaier's compensation. */
    private static double sum(double[] x, double[] y, double mx, double my) {
        double s = 0;
        double c = 0;
        for (int i = 0; i < x.length; i++) {
            double v = y == null ? x[i] : (x[i] - mx) * (y[i] - my);
            double t = s + v;
            c += Math.abs(s) >= Math.abs(v) ? (s - t) + v : (v - t) + s;
            s = t;
        }
        return s + c;
    }
}
