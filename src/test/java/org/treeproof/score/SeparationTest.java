package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.DipTest;
import org.treeproof.partition.Clustering;

/**
 * {@link Separation} on one-feature data whose positions on the line between two clusters are worked by hand; the
 * dip of those positions is {@link DipTest}'s, which {@code DipTestTest} checks against the dip solved from its
 * definition by scipy.
 */
class SeparationTest {
    private static DataMatrix column(double... v) {
        var ids = new ArrayList<String>();
        for (int i = 0; i < v.length; i++) {
            ids.add("s" + i);
        }
        return new DataMatrix(ids, List.of("f"), v.clone());
    }

    /** 0 .. big - 1, then 100 .. 104. */
    private static double[] row(int big) {
        double[] v = new double[big + 5];
        for (int i = 0; i < v.length; i++) {
            v[i] = i < big ? i : 100 + i - big;
        }
        return v;
    }

    /** The first {@code big} in one cluster, the last five in another (labelled first-seen, so B is cluster 0). */
    private static int[] labels(int big) {
        int[] l = new int[big + 5];
        for (int i = 0; i < big; i++) {
            l[i] = 1;
        }
        return l;
    }

    @Test
    void twoBlocksWithAGapAreSeparated() {
        // A = 0..4 (mean 2), B = 20..24 (mean 22), equal sizes: A is the smaller by label, all of B is taken.
        // A sample x of A: own centroid without it (10 - x)/4, midpoint ((10 - x)/4 + 22)/2, and the line points
        // from B to A, so its position is midpoint - x: 12.25, 11.125, 10, 8.875, 7.75. B's by symmetry, negated.
        var data = column(0, 1, 2, 3, 4, 20, 21, 22, 23, 24);
        var c = Clustering.of(new int[] {0, 0, 0, 0, 0, 1, 1, 1, 1, 1});
        double[] hand = {12.25, 11.125, 10, 8.875, 7.75, -7.75, -8.875, -10, -11.125, -12.25};
        Separation.Result r = Separation.of(data, c);
        assertEquals(2, r.clusters().size());
        for (Separation.Pair p : r.clusters()) {
            assertEquals(10, p.samples());
            assertEquals(DipTest.dip(hand), p.dip(), 1e-12);
            assertEquals(DipTest.test(hand).pValue(), p.pValue(), 1e-12);
        }
        assertEquals(0, r.clusters().get(0).cluster());
        assertEquals(1, r.clusters().get(0).nearest());
        assertTrue(r.pValue() < 0.05, "two blocks 16 apart: " + r.pValue());
    }

    @Test
    void aCutThroughAnEvenRowIsNotSeparated() {
        // 0..19 cut at 9.5: the positions run on without a gap, one mode
        double[] v = new double[20];
        int[] labels = new int[20];
        for (int i = 0; i < 20; i++) {
            v[i] = i;
            labels[i] = i < 10 ? 0 : 1;
        }
        Separation.Result r = Separation.of(column(v), Clustering.of(labels));
        assertTrue(r.pValue() > 0.5, "a cut through a continuum: " + r.pValue());
    }

    @Test
    void aSmallClusterIsComparedWithTheNearestPartOfALargeOne() {
        // A = 100..104 (5, mean 102) beside B = 0..19 (20, mean 9.5): the 5 of B nearest to 102 are 15..19.
        // A's x: own centroid without it (510 - x)/4, midpoint with 9.5, position x - midpoint: 44, 45.125, 46.25,
        // 47.375, 48.5. B's y: own centroid without it (190 - y)/19, midpoint with 102, position y - midpoint (the
        // line points from A to B, and the sign is turned so that A is positive): y = 15 gives 15 - (175/19 + 102)/2.
        Separation.Result r = Separation.of(column(row(20)), Clustering.of(labels(20)));
        double[] hand = new double[10];
        double[] a = {44, 45.125, 46.25, 47.375, 48.5};
        System.arraycopy(a, 0, hand, 0, 5);
        for (int y = 15; y <= 19; y++) {
            hand[5 + y - 15] = y - ((190.0 - y) / 19 + 102) / 2;
        }
        assertEquals(-40.605263157894736, hand[5], 1e-12);
        Separation.Pair p = r.clusters().get(0);
        assertEquals(10, p.samples());
        assertEquals(DipTest.dip(hand), p.dip(), 1e-12);
        assertTrue(r.pValue() < 0.05);
    }

    @Test
    void outliersTakeNoPartAndTinyClustersAreNotAssessed() {
        // an outlier at 1000 between nothing: it changes no centroid
        var with = Separation.of(column(0, 1, 2, 3, 4, 20, 21, 22, 23, 24, 1000),
                Clustering.of(new int[] {0, 0, 0, 0, 0, 1, 1, 1, 1, 1, -1}));
        var without = Separation.of(column(0, 1, 2, 3, 4, 20, 21, 22, 23, 24),
                Clustering.of(new int[] {0, 0, 0, 0, 0, 1, 1, 1, 1, 1}));
        assertEquals(without.pValue(), with.pValue(), 0);
        // clusters of 4 give 8 positions, fewer than the dip test takes: not assessed
        var tiny = Separation.of(column(0, 1, 2, 3, 20, 21, 22, 23), Clustering.of(new int[] {0, 0, 0, 0, 1, 1, 1, 1}));
        assertFalse(tiny.assessed());
        assertTrue(Double.isNaN(tiny.pValue()));
    }

    @Test
    void aLargeClusterIsSampledByItsNearestQuarterAndBothSidesWeighEqually() {
        // A = 100..104 (5) beside B = 0..39 (40, mean 19.5): a quarter of B, 10 samples (30..39), is taken; each of
        // A's positions counts round(10/5) = 2 times; the p-value is read at 4 * 5 * 10 / (5 + 10) = 13.3, i.e. 13.
        // A's x: own centroid without it (510 - x)/4, midpoint with 19.5, position x - midpoint: 100 - (102.5 + 19.5)/2
        // = 39, then 40.125, 41.25, 42.375, 43.5. B's y: own centroid without it (780 - y)/39, position
        // y - ((780 - y)/39 + 102)/2.
        Separation.Result r = Separation.of(column(row(40)), Clustering.of(labels(40)));
        double[] a = {39, 40.125, 41.25, 42.375, 43.5};
        double[] hand = new double[20];
        for (int i = 0; i < 5; i++) {
            hand[2 * i] = a[i];
            hand[2 * i + 1] = a[i];
        }
        for (int y = 30; y <= 39; y++) {
            hand[10 + y - 30] = y - ((780.0 - y) / 39 + 102) / 2;
        }
        Separation.Pair p = r.clusters().get(0);
        assertEquals(15, p.samples());
        double dip = DipTest.dip(hand);
        assertEquals(dip, p.dip(), 1e-12);
        assertEquals(DipTest.pValue(dip, 13).pValue(), p.pValue(), 1e-12);
        assertEquals(13, Separation.effectiveSize(5, 10));
        assertEquals(43, Separation.effectiveSize(12, 100));   // 4800 / 112 = 42.86
        assertEquals(20, Separation.effectiveSize(10, 10));
    }
}
