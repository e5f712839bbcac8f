package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

/** Per-sample stability (definition in {@link SampleStability}) on hand-worked replicates. */
class SampleStabilityTest {

    static ResampledPartition rep(int[] items, int... labels) {
        return new ResampledPartition(items, Partition.of(labels));
    }

    /**
     * Reference A = {0,1,2,3}, B = {4,5}, C = {6}.
     * <pre>
     *   R0 holds all, clusters {0,1,2}{3,4,5}{6}: 0, 1, 2 stay (the others of A are mostly in {0,1,2});
     *      3 does not (the rest of A is in {0,1,2}); 4 and 5 stay; 6 is alone in C, never counted
     *   R1 holds 0 1 3 4 6, clusters {0,3}{1}{4,6}: for 0 the others {1,3} split one-one, a tie: not
     *      staying; 1 (others {0,3} in {0,3}) and 3 (others {0,1}, a tie) do not stay; 4 has no other
     *      member of B held: not counted
     *   R2 holds 0 1 2 5 4 4 (4 twice; its first copy is with 5), clusters {0,1}{2,5,4}: 0 and 1 see
     *      a tie ({1 or 0} vs {2}): no; 2 (others {0,1} in {0,1}) no; 4 and 5 stay
     * </pre>
     * Stays/counted: 0: 1/3, 1: 1/3, 2: 1/2, 3: 0/2, 4: 2/2, 5: 2/2, 6: 0/0.
     */
    static List<ResampledPartition> handReplicates() {
        return List.of(
                rep(new int[] {0, 1, 2, 3, 4, 5, 6}, 0, 0, 0, 1, 1, 1, 2),
                rep(new int[] {0, 1, 3, 4, 6}, 0, 1, 0, 2, 2),
                rep(new int[] {0, 1, 2, 5, 4, 4}, 0, 0, 1, 1, 1, 0));
    }

    static final Partition REFERENCE = Partition.of(new int[] {0, 0, 0, 0, 1, 1, 2});

    @Test
    void handWorkedExample() {
        SampleStability.Result r = SampleStability.of(REFERENCE, handReplicates()).compute();
        assertArrayEquals(new int[] {1, 1, 1, 0, 2, 2, 0}, r.stays());
        assertArrayEquals(new int[] {3, 3, 2, 2, 2, 2, 0}, r.counted());
        assertEquals(1.0 / 3, r.stability(0), 1e-15);
        assertEquals(0.5, r.stability(2));
        assertEquals(0.0, r.stability(3));
        assertEquals(1.0, r.stability(5));
        assertTrue(Double.isNaN(r.stability(6)));
    }

    @Test
    void orderDoesNotMatter() {
        // invariant: stays and counts are sums over replicates; and the batch equals the accumulator
        SplittableRandom rnd = new SplittableRandom(9);
        int n = 25;
        int[] ref = new int[n];
        for (int i = 0; i < n; i++) {
            ref[i] = rnd.nextInt(3);
        }
        Partition reference = Partition.of(ref);
        List<ResampledPartition> reps = new ArrayList<>();
        for (int r = 0; r < 50; r++) {
            int m = 2 + rnd.nextInt(n - 1);
            int[] items = new int[m];
            int[] labels = new int[m];
            for (int a = 0; a < m; a++) {
                items[a] = rnd.nextInt(n);
                labels[a] = rnd.nextInt(3);
            }
            reps.add(rep(items, labels));
        }
        SampleStability.Result batch = SampleStability.of(reference, reps).compute();
        List<ResampledPartition> shuffled = new ArrayList<>(reps);
        Collections.shuffle(shuffled, new java.util.Random(4));
        SampleStability.Accumulator acc = SampleStability.accumulator(reference);
        shuffled.forEach(acc::add);
        assertEquals(batch, acc.result());
        assertEquals(50, acc.replicatesAdded());
        // and the counting implementation equals the definition applied sample by sample
        int[] stays = new int[n];
        int[] counted = new int[n];
        for (ResampledPartition r : reps) {
            direct(reference, r, stays, counted);
        }
        assertArrayEquals(stays, batch.stays());
        assertArrayEquals(counted, batch.counted());
    }

    /** The definition, literally: per sample, count the other held members of its cluster per replicate cluster. */
    static void direct(Partition reference, ResampledPartition r, int[] stays, int[] counted) {
        int n = reference.size();
        int[] first = new int[n];
        java.util.Arrays.fill(first, -1);
        int[] items = r.items();
        for (int a = 0; a < items.length; a++) {
            if (first[items[a]] < 0) {
                first[items[a]] = a;
            }
        }
        for (int i = 0; i < n; i++) {
            if (first[i] < 0) {
                continue;
            }
            int[] perCluster = new int[r.partition().clusterCount()];
            int others = 0;
            for (int j = 0; j < n; j++) {
                if (j != i && first[j] >= 0 && reference.label(j) == reference.label(i)) {
                    perCluster[r.partition().label(first[j])]++;
                    others++;
                }
            }
            if (others == 0) {
                continue;
            }
            counted[i]++;
            int own = r.partition().label(first[i]);
            boolean unique = true;
            for (int d = 0; d < perCluster.length; d++) {
                if (d != own && perCluster[d] >= perCluster[own]) {
                    unique = false;
                }
            }
            if (unique) {
                stays[i]++;
            }
        }
    }
}
