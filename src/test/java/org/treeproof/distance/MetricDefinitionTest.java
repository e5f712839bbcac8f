package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;

/**
 * Small cases worked by hand from the definitions quoted in {@link Metric}'s documentation (those of
 * scipy.spatial.distance), so each expected value can be checked with pencil and paper.
 */
class MetricDefinitionTest {
    private static final double EPS = 1e-15;

    @Test
    void minkowskiFamilyOnA345Triangle() {
        double[] x = {0, 0};
        double[] y = {3, 4};
        // Pythagoras: sqrt(9 + 16) = 5
        assertEquals(5.0, Metric.EUCLIDEAN.between(x, y), 0.0);
        assertEquals(25.0, Metric.SQEUCLIDEAN.between(x, y), 0.0);
        // |3| + |4|
        assertEquals(7.0, Metric.MANHATTAN.between(x, y), 0.0);
        // max(|3|, |4|)
        assertEquals(4.0, Metric.CHEBYSHEV.between(x, y), 0.0);
    }

    @Test
    void cosineOfOrthogonalParallelAndOppositeVectors() {
        // cos 90 degrees = 0, cos 0 = 1, cos 180 degrees = -1
        assertEquals(1.0, Metric.COSINE.between(new double[] {1, 0}, new double[] {0, 5}), EPS);
        assertEquals(0.0, Metric.COSINE.between(new double[] {1, 1}, new double[] {2, 2}), EPS);
        assertEquals(2.0, Metric.COSINE.between(new double[] {1, 0}, new double[] {-3, 0}), EPS);
        // (1,2).(2,1) = 4, |x||y| = 5: 1 - 4/5
        assertEquals(0.2, Metric.COSINE.between(new double[] {1, 2}, new double[] {2, 1}), EPS);
    }

    @Test
    void pearsonIgnoresOffsetAndScale() {
        // r = 1 for y = 2x + 7, r = -1 for a reversed order
        assertEquals(0.0, Metric.PEARSON.between(new double[] {1, 2, 3}, new double[] {9, 11, 13}), EPS);
        assertEquals(2.0, Metric.PEARSON.between(new double[] {1, 2, 3}, new double[] {3, 2, 1}), EPS);
        // centred x = (-1, 0, 1), centred y = (-1, 2, -1): dot 0, r = 0
        assertEquals(1.0, Metric.PEARSON.between(new double[] {1, 2, 3}, new double[] {0, 3, 0}), EPS);
    }

    @Test
    void spearmanUsesAverageRanksForTies() {
        // any increasing relation has rho = 1
        assertEquals(0.0, Metric.SPEARMAN.between(new double[] {1, 2, 3, 4}, new double[] {1, 4, 9, 100}), EPS);
        // x = (1, 2, 2, 3) has ranks (1, 2.5, 2.5, 4); y ranks (1, 2, 3, 4). Centred: (-1.5, 0, 0, 1.5) and
        // (-1.5, -0.5, 0.5, 1.5); dot 4.5, squared norms 4.5 and 5, so rho = 4.5 / sqrt(22.5) = sqrt(0.9)
        assertEquals(1 - Math.sqrt(0.9), Metric.SPEARMAN.between(new double[] {1, 2, 2, 3}, new double[] {10, 20, 30, 40}), EPS);
        // -0.0 and 0.0 are the same value, so they tie
        assertEquals(Metric.SPEARMAN.between(new double[] {0.0, 0.0, 1}, new double[] {1, 2, 3}),
                Metric.SPEARMAN.between(new double[] {-0.0, 0.0, 1}, new double[] {1, 2, 3}), 0.0);
    }

    @Test
    void averageRanksMatchTheTextbookConvention() {
        // rankdata([3, 1, 4, 1, 5], 'average') = [3, 1.5, 4, 1.5, 5]
        double[] row = {3, 1, 4, 1, 5};
        float[] ranks = new float[5];
        RowSource.Ranks.averageRanks(row, new int[5], new int[5], ranks, 0);
        assertEquals(List.of(3f, 1.5f, 4f, 1.5f, 5f), List.of(ranks[0], ranks[1], ranks[2], ranks[3], ranks[4]));
    }

    @Test
    void jaccardAndHammingCountDisagreements() {
        double[] x = {1, 0, 1, 1, 0};
        double[] y = {1, 1, 0, 1, 0};
        // features 2 and 3 differ; 4 features have a 1 in either row: 2/4. Hamming: 2 of 5 differ.
        assertEquals(0.5, Metric.JACCARD.between(x, y), 0.0);
        assertEquals(0.4, Metric.HAMMING.between(x, y), 0.0);
        // no 1 in either row: 0/0, which SciPy (since 1.2) and treeproof define as 0
        assertEquals(0.0, Metric.JACCARD.between(new double[] {0, 0, 0}, new double[] {0, 0, 0}), 0.0);
        assertEquals(1.0, Metric.JACCARD.between(new double[] {0, 0, 0}, new double[] {0, 1, 0}), 0.0);
    }

    @Test
    void matrixLayoutIsTheCondensedUpperTriangle() {
        DataMatrix data = new DataMatrix(List.of("a", "b", "c"), List.of("u"), new double[] {0, 1, 3});
        CondensedDistances d = Metric.MANHATTAN.compute(data, 1);
        // pdist order: (a,b), (a,c), (b,c)
        assertEquals(1.0, d.at(0), 0.0);
        assertEquals(3.0, d.at(1), 0.0);
        assertEquals(2.0, d.at(2), 0.0);
        assertEquals(1, Metric.EUCLIDEAN.compute(new DataMatrix(List.of("a"), List.of("u"), new double[] {4}), 1).size());
    }

    @Test
    void onlyEuclideanServesWardCentroidAndMedian() {
        for (Metric m : Metric.values()) {
            if (m == Metric.EUCLIDEAN) {
                assertTrue(m.euclidean());
            } else {
                assertFalse(m.euclidean(), m.id());
            }
        }
    }

    @Test
    void theEmbeddingHasTheMetricsGeometry() {
        // rows (1, 2, 3) and (1, 3, 2): Pearson r = 0.5 by hand (centred (-1, 0, 1) and (-1, 1, 0), dot 1, norms
        // sqrt 2), so 1 - r = 0.5; centred and scaled to unit length they are (-1, 0, 1)/sqrt 2 and (-1, 1, 0)/sqrt 2,
        // whose squared Euclidean distance (0, -1, 1)/sqrt 2 squared is 1 = 2 (1 - r)
        var data = new DataMatrix(List.of("x", "y"), List.of("a", "b", "c"), new double[] {1, 2, 3, 1, 3, 2});
        DataMatrix e = Metric.PEARSON.embedding(data);
        double s = 1 / Math.sqrt(2);
        double[] x = {-s, 0, s};
        double[] y = {-s, s, 0};
        for (int j = 0; j < 3; j++) {
            assertEquals(x[j], e.get(0, j), 1e-15);
            assertEquals(y[j], e.get(1, j), 1e-15);
        }
        // cosine: (3, 4) scaled to unit length is (0.6, 0.8)
        DataMatrix c = Metric.COSINE.embedding(new DataMatrix(List.of("x"), List.of("a", "b"), new double[] {3, 4}));
        assertEquals(0.6, c.get(0, 0), 1e-15);
        assertEquals(0.8, c.get(0, 1), 1e-15);
        // Euclidean and Manhattan compare the data as they are
        assertTrue(Metric.EUCLIDEAN.embedding(data) == data);
        assertTrue(Metric.MANHATTAN.embedding(data) == data);
    }
}
