package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Clustering;

/**
 * {@link Silhouette#computeEach} against {@link Silhouette#of} and {@link Silhouette#compute} one clustering at a
 * time: the same widths and mean up to rounding (the shared pass adds the same distances in another order), for
 * clusterings with and without outliers, with one cluster (undefined), singletons and a missing clustering; and
 * the same bits whatever the order of the clusterings.
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
            Silhouette.Result alone = Silhouette.of(d, cs[q]).compute();
            assertEquals(alone.mean(), each[q].mean(), 1e-14, "clustering " + q);
            for (int i = 0; i < n; i++) {
                assertEquals(alone.value(i), each[q].value(i), 1e-14, "clustering " + q + ", sample " + i);
            }
        }
        assertNull(each[6]);
        Clustering[] reversed = new Clustering[cs.length];
        for (int q = 0; q < cs.length; q++) {
            reversed[q] = cs[cs.length - 1 - q];
        }
        Silhouette.Result[] back = Silhouette.computeEach(d, reversed);
        for (int q = 0; q < cs.length; q++) {
            assertEquals(each[q], back[cs.length - 1 - q], "clustering " + q + " in reverse order");
        }
    }

    @Test
    void nestedCutsOfOneTreeShareFewBlocksAndMatchTheirOwnPasses() {
        // 200 items on a line in 8 runs of 25; the cuts at k = 2, 4, 8 are nested, so their refinement has 8 blocks
        var rnd = new SplittableRandom(11);
        int n = 200;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (i / 25) * 10 + rnd.nextDouble();
        }
        double[] v = new double[CondensedDistances.length(n)];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                v[t++] = Math.abs(x[i] - x[j]);
            }
        }
        CondensedDistances d = CondensedDistances.of(n, v);
        Clustering[] cs = new Clustering[3];
        for (int q = 0; q < 3; q++) {
            int runs = 8 >> (2 - q);          // 2, 4, 8 clusters
            int[] labels = new int[n];
            for (int i = 0; i < n; i++) {
                labels[i] = (i / 25) / (8 / runs);
            }
            cs[q] = Clustering.of(labels);
        }
        Silhouette.Result[] each = Silhouette.computeEach(d, cs);
        for (int q = 0; q < 3; q++) {
            Silhouette.Result alone = Silhouette.of(d, cs[q]).compute();
            assertEquals(alone.mean(), each[q].mean(), 1e-14, "clustering " + q);
        }
    }
}
