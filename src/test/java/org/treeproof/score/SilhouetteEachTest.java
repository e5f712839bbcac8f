package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Clustering;

/**
 * {@link Silhouette#computeEach} against {@link Silhouette#of} and {@link Silhouette#compute} one clustering at a
 * time: the same widths and mean, bit for bit (Result.equals compares the doubles' bits), for clusterings with and
 * without outliers, with one cluster (undefined), singletons and a missing clustering.
 */
class SilhouetteEachTest {

    @Test
    void oneSharedPassGivesEachClusteringsOwnBits() {
        var rnd = new SplittableRandom(7);
        int n = 61;
        double[] v = new double[CondensedDistances.length(n)];
        for (int t = 0; t < v.length; t++) {
            v[t] = rnd.nextDouble() * 10;
        }
        CondensedDistances d = CondensedDistances.of(n, v);
        Clustering[] cs = new Clustering[7];
        for (int q = 0; q < 5; q++) {
            int k = 2 + q;
            int[] labels = new int[n];
            for (int i = 0; i < n; i++) {
                labels[i] = q % 2 == 1 && i % 9 == 0 ? -1 : rnd.nextInt(k);   // odd q: some outliers
            }
            cs[q] = Clustering.of(labels);
        }
        int[] one = new int[n];
        cs[5] = Clustering.of(one);                    // one cluster: undefined
        cs[6] = null;                                  // no cut
        Silhouette.Result[] each = Silhouette.computeEach(d, cs);
        for (int q = 0; q < 6; q++) {
            assertEquals(Silhouette.of(d, cs[q]).compute(), each[q], "clustering " + q);
        }
        assertNull(each[6]);
    }
}
