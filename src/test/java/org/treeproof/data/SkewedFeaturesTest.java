package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** {@link SkewedFeatures} on hand-worked values. */
class SkewedFeaturesTest {
    @Test
    void skewnessIsTheFisherPearsonCoefficient() {
        // nine 0s and one 10: mean 1, m2 = (9 * 1 + 81) / 10 = 9, m3 = (9 * -1 + 729) / 10 = 72,
        // g1 = 72 / 9^1.5 = 72 / 27 = 2.667 (scipy.stats.skew(bias=True) gives the same by its definition)
        assertEquals(72.0 / 27.0, SkewedFeatures.skewness(new double[] {0, 0, 0, 0, 0, 0, 0, 0, 0, 10}), 1e-12);
        // symmetric values: 0; the mirror image: the negative
        assertEquals(0, SkewedFeatures.skewness(new double[] {-2, -1, 0, 1, 2}), 1e-15);
        assertEquals(-72.0 / 27.0, SkewedFeatures.skewness(new double[] {0, 0, 0, 0, 0, 0, 0, 0, 0, -10}), 1e-12);
        assertTrue(Double.isNaN(SkewedFeatures.skewness(new double[] {3, 3, 3})));
        // scaling does not change it
        assertEquals(72.0 / 27.0, SkewedFeatures.skewness(new double[] {5, 5, 5, 5, 5, 5, 5, 5, 5, 25}), 1e-12);
    }

    @Test
    void featuresBeyondTheLimitEitherWayAreFlagged() {
        // columns: a (g1 = 2.667), b (symmetric), c (one 0 among 1s: g1 = -2.667), d (three 10s among 0s:
        // mean 3, m2 = (7 * 9 + 3 * 49) / 10 = 21, m3 = (7 * -27 + 3 * 343) / 10 = 84, g1 = 84 / 21^1.5 = 0.873)
        double[][] cols = {
            {0, 0, 0, 0, 0, 0, 0, 0, 0, 10},
            {-2, -1, 0, 1, 2, -2, -1, 0, 1, 2},
            {1, 1, 1, 1, 1, 1, 1, 1, 1, 0},
            {0, 0, 0, 0, 0, 0, 0, 10, 10, 10}};
        double[] v = new double[40];
        for (int i = 0; i < 10; i++) {
            for (int j = 0; j < 4; j++) {
                v[i * 4 + j] = cols[j][i];
            }
        }
        var ids = new java.util.ArrayList<String>();
        for (int i = 0; i < 10; i++) {
            ids.add("s" + i);
        }
        var flags = SkewedFeatures.of(new DataMatrix(ids, List.of("a", "b", "c", "d"), v));
        // a and c reach the largest skewness ten values can have, (n - 2) / sqrt(n - 1) = 8 / 3, in either direction
        assertEquals(2, flags.size());
        var byName = new java.util.TreeMap<String, Double>();
        flags.forEach(f -> byName.put(f.feature(), f.skewness()));
        assertEquals(List.of("a", "c"), List.copyOf(byName.keySet()));
        assertEquals(8.0 / 3.0, byName.get("a"), 1e-12);
        assertEquals(-8.0 / 3.0, byName.get("c"), 1e-12);
    }
}
