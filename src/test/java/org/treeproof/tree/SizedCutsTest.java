package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;
import org.treeproof.partition.Clustering;

/**
 * Cuts into clusters of a minimum size on a hand-built tree of 8 samples: two groups of three, {0, 1, 2} and
 * {3, 4, 5}, joined at height 4, then sample 6 at height 6 and sample 7 at height 9 (far points).
 */
class SizedCutsTest {
    private static final int O = Clustering.OUTLIER;

    private static MergeTree tree() {
        int[] left = {0, 3, 2, 5, 10, 6, 7};
        int[] right = {1, 4, 8, 9, 11, 12, 13};
        double[] h = {1, 1.5, 2, 2.5, 4, 6, 9};
        return MergeTree.of(8, left, right, h);
    }

    @Test
    void twoClustersAreTheFirstCutWithTwoLargeBranchesAndTheFarPointsAreOutliers() {
        SizedCuts cuts = SizedCuts.of(tree(), 3, 4);
        SizedCut two = cuts.at(2);
        // by hand: undoing the merges at 9 and 6 sheds samples 7 and 6; undoing the one at 4 splits 6 into 3 + 3
        assertEquals(4, two.branches());
        assertArrayEquals(new int[] {0, 0, 0, 1, 1, 1, O, O}, two.clustering().labels());
        assertEquals(2.5, two.low());
        assertEquals(4, two.high());
        assertEquals(3.25, two.chosen());
        assertFalse(two.tieDependent());
        assertEquals(2, two.clustering().outlierCount());
    }

    @Test
    void aCountNeverReachedHasNoCutAndReplicatesRepeatTheLastState() {
        SizedCuts cuts = SizedCuts.of(tree(), 3, 4);
        // undoing the merge at 2.5 sheds 5 and leaves {3, 4} too small: one large branch, never three
        assertNull(cuts.at(3));
        assertEquals(2, cuts.reachableK());
        int[][] up = cuts.labelsUpTo(3);
        assertArrayEquals(new int[] {0, 0, 0, 0, 0, 0, 0, 0}, up[0]);
        assertArrayEquals(up[1], up[2]);
    }

    @Test
    void withoutAMinimumTheCutsAreTheOrdinaryOnes() {
        MergeTree t = tree();
        SizedCuts cuts = SizedCuts.of(t, 1, 5);
        for (int k = 1; k <= 5; k++) {
            assertArrayEquals(t.cutLabelsAtK(k), cuts.at(k).clustering().labels());
            assertEquals(k, cuts.at(k).branches());
        }
    }

    @Test
    void oneClusterKeepsOnlyTheSamplesThatJoinFarAboveTheFirstLargeSplit() {
        SizedCuts cuts = SizedCuts.of(tree(), 3, 2);
        // the first split into two large branches is at height 4; 7 joins at 9 and 6 at 6
        assertArrayEquals(new int[] {0, 0, 0, 0, 0, 0, O, O}, cuts.oneClusterWithOutliers(1.5).labels());
        assertArrayEquals(new int[] {0, 0, 0, 0, 0, 0, 0, O}, cuts.oneClusterWithOutliers(2).labels());
        assertArrayEquals(new int[] {0, 0, 0, 0, 0, 0, 0, 0}, cuts.oneClusterWithOutliers(3).labels());
    }
}
