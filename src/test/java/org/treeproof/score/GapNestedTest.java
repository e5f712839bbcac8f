package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.Metric;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/** The one-pass W_1..W_K of nested cuts equals W_k computed for each cut on its own (Huygens' decomposition). */
class GapNestedTest {

    @Test
    void nestedSumsEqualTheDirectTwoPassSumsOnSeededData() {
        var rng = new SplittableRandom(17);
        for (int round = 0; round < 50; round++) {
            int n = 5 + rng.nextInt(60);
            int p = 1 + rng.nextInt(8);
            double offset = round % 5 == 0 ? 1e6 : 0;   // a large offset tests the cancellation the centroids avoid
            double[] v = new double[n * p];
            var ids = new ArrayList<String>();
            var names = new ArrayList<String>();
            for (int i = 0; i < n; i++) {
                ids.add("s" + i);
                for (int j = 0; j < p; j++) {
                    v[i * p + j] = offset + (i % 3) * 4 + rng.nextDouble();
                }
            }
            for (int j = 0; j < p; j++) {
                names.add("f" + j);
            }
            DataMatrix data = new DataMatrix(ids, names, v);
            MergeTree tree = Linkage.AVERAGE.cluster(Metric.EUCLIDEAN.compute(data, 1));
            int maxK = Math.min(n, 8);
            int[][] cuts = tree.cutLabelsUpTo(maxK);
            double[] nested = GapStatistic.withinSumsOfSquaresNested(data, cuts);
            for (int k = 1; k <= maxK; k++) {
                double direct = GapStatistic.withinSumOfSquares(data, cuts[k - 1]);
                assertEquals(direct, nested[k - 1], 1e-9 * Math.max(1, direct), "round " + round + " k " + k);
            }
        }
    }

    @Test
    void refusesPartitionsThatAreNotNested() {
        var data = new DataMatrix(java.util.List.of("a", "b", "c", "d"), java.util.List.of("x"), new double[] {0, 1, 5, 6});
        int[][] notNested = {{0, 0, 0, 0}, {0, 1, 0, 1}, {0, 1, 2, 2}};
        assertThrows(IllegalArgumentException.class, () -> GapStatistic.withinSumsOfSquaresNested(data, notNested));
    }
}
