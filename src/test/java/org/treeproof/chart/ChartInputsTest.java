package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class ChartInputsTest {
    private static final ChartTree TREE = ChartTree.leftFirst(5, new int[] {1, 0, 5, 6}, new int[] {3, 4, 2, 7},
            new double[] {1, 2, 3, 5});
    private static final String[] NAMES = {"a", "b", "c", "d", "e"};

    @Test
    void dendrogramInputChecksLengthsLabelsCutAndSupport() {
        int[] cut = {0, 1, 1, 1, 0};
        new DendrogramInput("t", TREE, NAMES, cut, Double.NaN, null, "h");
        assertThrows(IllegalArgumentException.class,
                () -> new DendrogramInput("t", TREE, new String[] {"a"}, cut, 2.5, null, "h"));
        assertThrows(IllegalArgumentException.class,
                () -> new DendrogramInput("t", TREE, NAMES, new int[] {0, 2, 2, 2, 0}, 2.5, null, "h"));
        assertThrows(IllegalArgumentException.class,
                () -> new DendrogramInput("t", TREE, NAMES, cut, Double.POSITIVE_INFINITY, null, "h"));
        assertThrows(IllegalArgumentException.class,
                () -> new DendrogramInput("t", TREE, NAMES, cut, 2.5, new double[] {0.1, 1.2, 0.5, 0.5}, "h"));
        assertThrows(IllegalArgumentException.class,
                () -> new DendrogramInput("t", TREE, NAMES, cut, 2.5, new double[] {0.1, 0.2}, "h"));
        assertThrows(IllegalArgumentException.class, () -> new DendrogramInput(" ", TREE, NAMES, cut, 2.5, null, "h"));
        assertThrows(NullPointerException.class, () -> new DendrogramInput("t", null, NAMES, cut, 2.5, null, "h"));
        DendrogramInput d = new DendrogramInput("t", TREE, NAMES, cut, 2.5,
                new double[] {0.1, Double.NaN, 0.5, 1}, "h");
        assertEquals(2, d.clusterCount());
        assertTrue(Double.isNaN(d.support()[1]));
    }

    @Test
    void inputsCopyWhatTheyAreGiven() {
        int[] cut = {0, 1, 1, 1, 0};
        String[] names = NAMES.clone();
        DendrogramInput d = new DendrogramInput("t", TREE, names, cut, 2.5, null, "h");
        cut[0] = 1;
        names[0] = "changed";
        d.clusterOfLeaf()[1] = 0;
        assertArrayEquals(new int[] {0, 1, 1, 1, 0}, d.clusterOfLeaf());
        assertEquals("a", d.leafLabels()[0]);

        double[] s = {0.5, -0.2, 0.9};
        SilhouetteInput si = new SilhouetteInput("t", s, new int[] {0, 0, 1});
        s[0] = 1;
        assertEquals(0.5, si.silhouette()[0]);
    }

    @Test
    void silhouetteInputRejectsNaNOutOfRangeAndGappedLabels() {
        assertThrows(IllegalArgumentException.class,
                () -> new SilhouetteInput("t", new double[] {0.5, Double.NaN}, new int[] {0, 1}));
        assertThrows(IllegalArgumentException.class,
                () -> new SilhouetteInput("t", new double[] {0.5, 1.5}, new int[] {0, 1}));
        assertThrows(IllegalArgumentException.class,
                () -> new SilhouetteInput("t", new double[] {0.5, 0.1}, new int[] {0, 2}));
        assertThrows(IllegalArgumentException.class,
                () -> new SilhouetteInput("t", new double[] {0.5, 0.1}, new int[] {0}));
        assertEquals(0.3, new SilhouetteInput("t", new double[] {0.5, 0.1}, new int[] {0, 1}).average(), 1e-12);
    }

    @Test
    void intervalAndStabilityInputsCheckShapesAndChoices() {
        int[] k = {2, 3, 4};
        IntervalSeries a = new IntervalSeries("average", new double[] {0.8, 0.9, 0.7},
                new double[] {0.7, 0.8, 0.6}, new double[] {0.9, 0.95, 0.8});
        assertThrows(IllegalArgumentException.class, () -> new IntervalSeries("x", new double[] {0.5},
                new double[] {0.6}, new double[] {0.9}));
        assertThrows(IllegalArgumentException.class, () -> new IntervalSeries("x", new double[] {0.5},
                new double[] {0.4, 0.3}, new double[] {0.9}));
        assertThrows(IllegalArgumentException.class, () -> new IntervalSeries("x", new double[] {Double.NaN},
                new double[] {0.4}, new double[] {0.9}));
        // a position with no value has no mean and no interval
        new IntervalSeries("x", new double[] {Double.NaN}, new double[] {Double.NaN}, new double[] {Double.NaN});
        assertThrows(IllegalArgumentException.class, () -> new IntervalSeries("x", new double[] {0.5},
                new double[] {Double.NaN}, new double[] {0.9}));
        new StabilityInput("t", k, List.of(a), null, 3, "average");
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", new int[] {2, 3}, List.of(a), null,
                0, null));
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", new int[] {2, 4, 3}, List.of(a),
                null, 0, null));
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", k, List.of(a), null, 5, null));
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", k, List.of(a), null, 3, "ward"));
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", k, List.of(a, a), null, 3, null));
        assertThrows(IllegalArgumentException.class, () -> new StabilityInput("t", k, List.of(), null, 3, null));
    }

    @Test
    void gapInputChecksValuesAndChoice() {
        new GapInput("t", new double[] {0.1, 0.4, 0.5}, new double[] {0.01, 0.02, 0.02}, 2);
        new GapInput("t", new double[] {0.1, 0.4, 0.5}, new double[] {0.01, 0.02, 0.02}, 0);
        assertThrows(IllegalArgumentException.class, () -> new GapInput("t", new double[] {0.1, Double.NaN},
                new double[] {0.01, 0.02}, 1));
        assertThrows(IllegalArgumentException.class, () -> new GapInput("t", new double[] {0.1, 0.2},
                new double[] {0.01, -0.02}, 1));
        assertThrows(IllegalArgumentException.class, () -> new GapInput("t", new double[] {0.1, 0.2},
                new double[] {0.01}, 1));
        assertThrows(IllegalArgumentException.class, () -> new GapInput("t", new double[] {0.1, 0.2},
                new double[] {0.01, 0.01}, 3));
    }

    @Test
    void consensusInputChecksTheCondensedLayout() {
        double[] c = {0.9, 0.1, 0.2};
        ConsensusInput in = new ConsensusInput("t", 3, c, new int[] {2, 0, 1}, new int[] {0, 0, 1});
        // pair (0,1) at 0, (0,2) at 1, (1,2) at 2: the layout of scipy's pdist
        assertEquals(0.9, in.value(1, 0));
        assertEquals(0.1, in.value(0, 2));
        assertEquals(0.2, in.value(2, 1));
        assertEquals(1.0, in.value(1, 1));
        assertThrows(IllegalArgumentException.class, () -> new ConsensusInput("t", 3, new double[] {0.9, 0.1},
                new int[] {2, 0, 1}, new int[] {0, 0, 1}));
        assertThrows(IllegalArgumentException.class, () -> new ConsensusInput("t", 3, new double[] {0.9, 1.1, 0},
                new int[] {2, 0, 1}, new int[] {0, 0, 1}));
        assertThrows(IllegalArgumentException.class, () -> new ConsensusInput("t", 3, c, new int[] {2, 0, 0},
                new int[] {0, 0, 1}));
        new ConsensusInput("t", 3, new double[] {Double.NaN, 0, 1}, new int[] {0, 1, 2}, new int[] {0, 0, 1});
    }

    @Test
    void jaccardAndComparisonInputsCheckRangesAndSymmetry() {
        new JaccardInput("t", new double[] {0.9, 0.4}, new int[] {10, 3});
        assertThrows(IllegalArgumentException.class, () -> new JaccardInput("t", new double[] {0.9, 1.4},
                new int[] {10, 3}));
        assertThrows(IllegalArgumentException.class, () -> new JaccardInput("t", new double[] {0.9, 0.4},
                new int[] {10, 0}));
        assertThrows(IllegalArgumentException.class, () -> new JaccardInput("t", new double[] {0.9, 0.4},
                new int[] {10}));
        var rows = List.of(new LinkageComparisonInput.Row("average", 3, 0.8, 0.7, 0.4),
                new LinkageComparisonInput.Row("ward", 4, 0.7, 0.6, Double.NaN));
        new LinkageComparisonInput("t", rows, new double[][] {{1, 0.5}, {0.5, 1}});
        assertThrows(IllegalArgumentException.class,
                () -> new LinkageComparisonInput("t", rows, new double[][] {{1, 0.5}, {0.4, 1}}));
        assertThrows(IllegalArgumentException.class,
                () -> new LinkageComparisonInput("t", rows, new double[][] {{0.9, 0.5}, {0.5, 1}}));
        assertThrows(IllegalArgumentException.class,
                () -> new LinkageComparisonInput("t", rows, new double[][] {{1, 0.5}}));
        assertThrows(IllegalArgumentException.class, () -> new LinkageComparisonInput.Row("x", 0, 0.5, 0.5, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new LinkageComparisonInput.Row("x", 2, 1.5, 0.5, 0.5));
        double[][] agree = {{1, 0.5}, {0.5, 1}};
        LinkageComparisonInput in = new LinkageComparisonInput("t", rows, agree);
        agree[0][1] = 0;
        assertEquals(0.5, in.agreement()[0][1]);
    }

    @Test
    void dataHeatmapInputChecksShapeValuesAndTrees() {
        ChartTree features = ChartTree.leftFirst(2, new int[] {0}, new int[] {1}, new double[] {1});
        double[] v = new double[10];
        new DataHeatmapInput("t", 5, 2, v, NAMES, new String[] {"f", "g"}, TREE, features, null);
        new DataHeatmapInput("t", 5, 2, v, NAMES, new String[] {"f", "g"}, TREE, null, new int[] {0, 0, 1, 1, 0});
        assertThrows(IllegalArgumentException.class,
                () -> new DataHeatmapInput("t", 5, 2, new double[9], NAMES, new String[] {"f", "g"}, TREE, null, null));
        double[] bad = new double[10];
        bad[3] = Double.NEGATIVE_INFINITY;
        assertThrows(IllegalArgumentException.class,
                () -> new DataHeatmapInput("t", 5, 2, bad, NAMES, new String[] {"f", "g"}, TREE, null, null));
        assertThrows(IllegalArgumentException.class,
                () -> new DataHeatmapInput("t", 5, 3, new double[15], NAMES, new String[] {"f", "g", "h"}, TREE,
                        features, null));
        assertThrows(IllegalArgumentException.class,
                () -> new DataHeatmapInput("t", 4, 2, new double[8], new String[] {"a", "b", "c", "d"},
                        new String[] {"f", "g"}, TREE, null, null));
    }
}
