package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class ChartTreeTest {
    // Five leaves, hand-made: merge 0 = {1,3} at 1.0 (node 5), merge 1 = {0,4} at 2.0 (node 6),
    // merge 2 = {5,2} at 3.0 (node 7), merge 3 = {6,7} at 5.0 (root 8).
    private static final int[] LEFT = {1, 0, 5, 6};
    private static final int[] RIGHT = {3, 4, 2, 7};
    private static final double[] HEIGHT = {1, 2, 3, 5};

    @Test
    void leftFirstOrderVisitsLeftPartsFirst() {
        ChartTree t = ChartTree.leftFirst(5, LEFT, RIGHT, HEIGHT);
        // root -> (6 -> 0, 4), (7 -> (5 -> 1, 3), 2)
        assertArrayEquals(new int[] {0, 4, 1, 3, 2}, t.leafOrder());
        assertEquals(0, t.inversions());
    }

    @Test
    void rejectsMalformedMerges() {
        int[] ord = {0, 4, 1, 3, 2};
        assertThrows(IllegalArgumentException.class, () -> new ChartTree(5, new int[] {1, 0, 5}, RIGHT, HEIGHT, ord));
        // node 5 used before it exists
        assertThrows(IllegalArgumentException.class,
                () -> new ChartTree(5, new int[] {5, 0, 1, 6}, new int[] {3, 4, 2, 7}, HEIGHT, ord));
        // leaf 1 joined twice
        assertThrows(IllegalArgumentException.class,
                () -> new ChartTree(5, new int[] {1, 1, 5, 6}, new int[] {3, 4, 2, 7}, HEIGHT, ord));
        assertThrows(IllegalArgumentException.class,
                () -> new ChartTree(5, LEFT, RIGHT, new double[] {1, Double.NaN, 3, 5}, ord));
        assertThrows(IllegalArgumentException.class, () -> new ChartTree(1, new int[0], new int[0], new double[0],
                new int[] {0}));
    }

    @Test
    void rejectsAnOrderThatIsNotAPermutationOrSplitsASubtree() {
        assertThrows(IllegalArgumentException.class, () -> new ChartTree(5, LEFT, RIGHT, HEIGHT, new int[] {0, 4, 1, 3, 3}));
        // {1, 3} (merge 0) split by 2
        assertThrows(IllegalArgumentException.class, () -> new ChartTree(5, LEFT, RIGHT, HEIGHT, new int[] {0, 4, 1, 2, 3}));
        // a mirrored but contiguous order is fine
        new ChartTree(5, LEFT, RIGHT, HEIGHT, new int[] {2, 3, 1, 4, 0});
    }

    @Test
    void countsInversions() {
        // merge 2 at 0.5 lies below merge 0 (1.0) that it joins: one inversion (centroid linkage can do this)
        ChartTree t = ChartTree.leftFirst(5, LEFT, RIGHT, new double[] {1, 2, 0.5, 5});
        assertEquals(1, t.inversions());
    }

    @Test
    void copiesItsArrays() {
        int[] left = LEFT.clone();
        double[] h = HEIGHT.clone();
        ChartTree t = ChartTree.leftFirst(5, left, RIGHT, h);
        left[0] = 99;
        h[0] = 99;
        t.height()[1] = 42;
        assertArrayEquals(LEFT, t.left());
        assertArrayEquals(HEIGHT, t.height());
    }

    @Test
    void drawingPlacesForksMidwayAndKnowsPureClusters() {
        ChartTree t = ChartTree.leftFirst(5, LEFT, RIGHT, HEIGHT);
        int[] cluster = {0, 1, 1, 1, 0};
        TreeDrawing d = new TreeDrawing(t, cluster);
        assertEquals(1, d.clusterOf(5));
        assertEquals(0, d.clusterOf(6));
        assertEquals(1, d.clusterOf(7));
        assertEquals(-1, d.clusterOf(8));
        assertArrayEquals(new double[] {0, 5}, d.heightRange(), 0);
        var placed = d.place(new java.awt.geom.Rectangle2D.Double(0, 0, 50, 100), 0, 5, TreeDrawing.Leaves.BOTTOM);
        // leaves at positions 0..4 are 10 px apart; node 7 joins node 5 (centre of positions 2,3 = 30 px) and leaf 2
        // (position 4, 45 px): 37.5 px, at height 3 of 5 = 40 px from the top
        assertEquals(37.5, placed.point(7).getX(), 1e-9);
        assertEquals(40.0, placed.point(7).getY(), 1e-9);
    }

    @Test
    void syntheticClusteringIsAValidTreeForManySeeds() {
        for (int seed = 0; seed < 20; seed++) {
            SplittableRandom rnd = new SplittableRandom(seed);
            int n = 5 + rnd.nextInt(40);
            int[] truth = new int[n];
            ChartTree t = Synthetic.average(Synthetic.points(rnd, n, 3, 3, 1.0, truth));
            double[] h = t.height();
            for (int s = 1; s < h.length; s++) {
                assertEquals(true, h[s] >= h[s - 1], "average linkage heights never fall");
            }
            int k = 1 + rnd.nextInt(Math.min(5, n));
            assertEquals(k, Check.count(Synthetic.cut(t, k)));
        }
    }
}
