package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;
import org.treeproof.score.JaccardStability.Status;

/** Hennig's (2007) cluster-wise Jaccard stability on hand-worked replicates. */
class JaccardStabilityTest {

    static ResampledPartition rep(int[] items, int... labels) {
        return new ResampledPartition(items, Partition.of(labels));
    }

    /**
     * Reference A = {0,1,2,3}, B = {4,5,6}, C = {7}. Replicates and best Jaccard per cluster (by hand,
     * |A' ∩ D| / |A' ∪ D| with A' the held part of A):
     * <pre>
     *   R0 holds 0 1 2 4 5 6, clusters {0,1,2}{4,5}{6}:        A' = {0,1,2} -> 3/3; B -> 2/3; C not held
     *   R1 holds 0 1 3 4 5 7, clusters {0,1}{3,4,5}{7}:        A' = {0,1,3} -> 2/3; B' = {4,5} -> 2/3; C -> 1
     *   R2 holds 1 2 3 5 6 7 7 (7 twice; first copy counts),
     *      clusters {1,2}{3,5,6}{7}:                           A' -> 2/3; B' = {5,6} -> 2/3; C -> 1
     *   R3 holds all, clusters {0,4}{1,5}{2,6}{3,7}:           A -> 1/5; B -> 1/4; C -> 1/2 (union {3,7})
     * </pre>
     * A: mean (1 + 2/3 + 2/3 + 1/5)/4 = 19/30, doubtful; dissolved 1/4 (the 1/5); recovered 1/4 (the 1).
     * B: mean (3·2/3 + 1/4)/4 = 9/16, doubtful; dissolved 1/4; recovered 0.
     * C: counted 3, mean (1 + 1 + 1/2)/3 = 5/6, stable; dissolved 1/3 (exactly 0.5 counts); recovered 2/3.
     */
    static List<ResampledPartition> handReplicates() {
        return List.of(
                rep(new int[] {0, 1, 2, 4, 5, 6}, 0, 0, 0, 1, 1, 2),
                rep(new int[] {0, 1, 3, 4, 5, 7}, 0, 0, 1, 1, 1, 2),
                rep(new int[] {1, 2, 3, 5, 6, 7, 7}, 0, 0, 1, 1, 1, 2, 0),
                rep(new int[] {0, 1, 2, 3, 4, 5, 6, 7}, 0, 1, 2, 3, 0, 1, 2, 3));
    }

    static final Partition REFERENCE = Partition.of(new int[] {0, 0, 0, 0, 1, 1, 1, 2});

    @Test
    void handWorkedExample() {
        JaccardStability.Result r = JaccardStability.of(REFERENCE, handReplicates()).compute();
        assertEquals(4, r.replicates());
        JaccardStability.Cluster a = r.cluster(0);
        assertEquals(4, a.size());
        assertEquals(4, a.counted());
        assertArrayEquals(new double[] {1, 2.0 / 3, 2.0 / 3, 0.2}, a.perReplicate(), 1e-15);
        assertEquals(19.0 / 30, a.mean(), 1e-15);
        assertEquals(0.25, a.dissolvedShare());
        assertEquals(0.25, a.recoveredShare());
        assertEquals(Status.DOUBTFUL, a.status());
        JaccardStability.Cluster b = r.cluster(1);
        assertEquals(9.0 / 16, b.mean(), 1e-15);
        assertEquals(0.25, b.dissolvedShare());
        assertEquals(0.0, b.recoveredShare());
        assertEquals(Status.DOUBTFUL, b.status());
        JaccardStability.Cluster c = r.cluster(2);
        assertEquals(3, c.counted());
        assertEquals(Double.NaN, c.perReplicate()[0]);
        assertEquals(5.0 / 6, c.mean(), 1e-15);
        assertEquals(1.0 / 3, c.dissolvedShare(), 1e-15);
        assertEquals(2.0 / 3, c.recoveredShare(), 1e-15);
        assertEquals(Status.STABLE, c.status());
    }

    @Test
    void statusBoundariesAreExact() {
        // reference A = 0..20 (21 items), B = 21..25; four replicates hold everything and give A the best
        // Jaccard 20/21, 18/21 (= 6/7), 6/21 (= 2/7), 19/21: exact mean 63/84 = 3/4, stable (Hennig's
        // 0.75), although the floating-point mean of the four doubles is 0.7499999999999999
        int[] ref = new int[26];
        for (int i = 21; i < 26; i++) {
            ref[i] = 1;
        }
        int[] all = new int[26];
        for (int i = 0; i < 26; i++) {
            all[i] = i;
        }
        int[][] labels = new int[4][26];
        for (int i = 0; i < 26; i++) {
            labels[0][i] = i < 20 ? 0 : 1;
            labels[1][i] = i < 18 ? 0 : 1;
            labels[2][i] = i < 18 ? i / 6 : 3;
            labels[3][i] = i < 19 ? 0 : 1;
        }
        List<ResampledPartition> reps = new ArrayList<>();
        for (int[] l : labels) {
            reps.add(rep(all, l));
        }
        JaccardStability.Cluster a = JaccardStability.of(Partition.of(ref), reps).compute().cluster(0);
        assertArrayEquals(new double[] {20.0 / 21, 6.0 / 7, 2.0 / 7, 19.0 / 21}, a.perReplicate(), 1e-15);
        assertEquals(0.75, a.mean(), 1e-15);
        assertTrue(a.mean() < 0.75, "the case only tests something if the double mean falls short");
        assertEquals(Status.STABLE, a.status());

        // exactly 1/2 on average is dissolved; just above is doubtful: A = {0,1}, B = {2,3}
        Partition small = Partition.of(new int[] {0, 0, 1, 1});
        ResampledPartition half = rep(new int[] {0, 1, 2, 3}, 0, 1, 0, 1);       // A best 1/3
        ResampledPartition whole = rep(new int[] {0, 1, 2, 3}, 0, 0, 1, 1);      // A best 1
        ResampledPartition twoThirds = rep(new int[] {0, 1, 2, 3}, 0, 0, 0, 1);  // A best 2/3
        // (1/3 + 2/3)/2 = 1/2 -> dissolved
        assertEquals(Status.DISSOLVED, JaccardStability.of(small, List.of(half, twoThirds)).compute().cluster(0).status());
        // (1/3 + 1)/2 = 2/3 -> doubtful; (1/3 + 1 + 1)/3 = 7/9 -> stable
        assertEquals(Status.DOUBTFUL, JaccardStability.of(small, List.of(half, whole)).compute().cluster(0).status());
        assertEquals(Status.STABLE,
                JaccardStability.of(small, List.of(half, whole, whole)).compute().cluster(0).status());
    }

    @Test
    void clusterNeverHeldIsNotAssessed() {
        JaccardStability.Result r = JaccardStability.of(REFERENCE, List.of(rep(new int[] {0, 4}, 0, 1))).compute();
        assertEquals(Status.NOT_ASSESSED, r.cluster(2).status());
        assertEquals(0, r.cluster(2).counted());
        assertEquals(Status.STABLE, r.cluster(0).status());
    }

    @Test
    void accumulatorTakesReplicatesInIndexOrder() {
        JaccardStability.Accumulator acc = JaccardStability.accumulator(REFERENCE);
        List<ResampledPartition> reps = handReplicates();
        acc.add(0, reps.get(0));
        assertThrows(IllegalArgumentException.class, () -> acc.add(2, reps.get(2)));
        for (int r = 1; r < reps.size(); r++) {
            acc.add(r, reps.get(r));
        }
        assertEquals(JaccardStability.of(REFERENCE, reps).compute(), acc.result());
    }

    @Test
    void matchesDirectSetComputationOnRandomReplicates() {
        // invariant: the counting implementation equals Hennig's definition computed with sets
        SplittableRandom rnd = new SplittableRandom(77);
        int n = 30;
        int[] refLabels = new int[n];
        for (int i = 0; i < n; i++) {
            refLabels[i] = rnd.nextInt(4);
        }
        Partition reference = Partition.of(refLabels);
        List<ResampledPartition> reps = new ArrayList<>();
        for (int r = 0; r < 40; r++) {
            int m = 1 + rnd.nextInt(n);
            int[] items = new int[m];
            int[] labels = new int[m];
            for (int a = 0; a < m; a++) {
                items[a] = rnd.nextInt(n);
                labels[a] = rnd.nextInt(1 + rnd.nextInt(5));
            }
            reps.add(rep(items, labels));
        }
        JaccardStability.Result result = JaccardStability.of(reference, reps).compute();
        for (int c = 0; c < reference.clusterCount(); c++) {
            double[] per = result.cluster(c).perReplicate();
            for (int r = 0; r < reps.size(); r++) {
                assertEquals(directBestJaccard(reference, c, reps.get(r)), per[r], 1e-15);
            }
        }
        // and the mean over shuffled replicates agrees (the per-replicate list is reordered)
        List<ResampledPartition> shuffled = new ArrayList<>(reps);
        Collections.shuffle(shuffled, new java.util.Random(3));
        JaccardStability.Result other = JaccardStability.of(reference, shuffled).compute();
        for (int c = 0; c < reference.clusterCount(); c++) {
            assertEquals(result.cluster(c).mean(), other.cluster(c).mean(), 1e-12);
            assertEquals(result.cluster(c).dissolvedShare(), other.cluster(c).dissolvedShare());
            assertEquals(result.cluster(c).status(), other.cluster(c).status());
        }
    }

    static double directBestJaccard(Partition reference, int c, ResampledPartition r) {
        int[] items = r.items();
        Set<Integer> seen = new HashSet<>();
        List<Set<Integer>> clusters = new ArrayList<>();
        for (int d = 0; d < r.partition().clusterCount(); d++) {
            clusters.add(new HashSet<>());
        }
        Set<Integer> restricted = new HashSet<>();
        for (int a = 0; a < items.length; a++) {
            if (seen.add(items[a])) {
                clusters.get(r.partition().label(a)).add(items[a]);
                if (reference.label(items[a]) == c) {
                    restricted.add(items[a]);
                }
            }
        }
        if (restricted.isEmpty()) {
            return Double.NaN;
        }
        double best = 0;
        for (Set<Integer> d : clusters) {
            Set<Integer> inter = new HashSet<>(d);
            inter.retainAll(restricted);
            Set<Integer> union = new HashSet<>(d);
            union.addAll(restricted);
            best = Math.max(best, (double) inter.size() / union.size());
        }
        return best;
    }
}
