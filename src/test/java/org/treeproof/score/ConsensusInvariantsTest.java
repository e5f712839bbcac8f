package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.apache.commons.math3.fraction.BigFraction;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

/**
 * Consensus counts against a direct count over seeded random replicates: nested cuts (packed and
 * level-by-level), arbitrary partitions, more replicates than one byte holds, and any arrival order.
 */
class ConsensusInvariantsTest {

    record Rep(int[] items, Partition[] cuts, boolean nested) {
    }

    /** Nested cuts of m positions for k = 2..maxK: a random maxK-clustering merged down pair by pair. */
    static Partition[] nestedCuts(SplittableRandom rnd, int m, int maxK) {
        int[] labels = new int[m];
        int k = Math.min(maxK, m);
        for (int a = 0; a < m; a++) {
            labels[a] = a < k ? a : rnd.nextInt(k);
        }
        Partition[] cuts = new Partition[maxK - 1];
        int clusters = k;
        for (int level = maxK; level >= 2; level--) {
            while (clusters > level) {
                int x = rnd.nextInt(clusters);
                int y = rnd.nextInt(clusters - 1);
                if (y >= x) {
                    y++;
                }
                int keep = Math.min(x, y);
                int gone = Math.max(x, y);
                for (int a = 0; a < m; a++) {
                    if (labels[a] == gone) {
                        labels[a] = keep;
                    } else if (labels[a] == clusters - 1) {
                        labels[a] = gone;
                    }
                }
                clusters--;
            }
            cuts[level - 2] = Partition.of(labels);
        }
        return cuts;
    }

    static Partition[] anyCuts(SplittableRandom rnd, int m, int maxK) {
        Partition[] cuts = new Partition[maxK - 1];
        for (int level = 2; level <= maxK; level++) {
            int[] labels = new int[m];
            for (int a = 0; a < m; a++) {
                labels[a] = rnd.nextInt(level);
            }
            cuts[level - 2] = Partition.of(labels);
        }
        return cuts;
    }

    static List<Rep> replicates(SplittableRandom rnd, int n, int maxK, int count, boolean mixNonNested) {
        List<Rep> reps = new ArrayList<>();
        for (int r = 0; r < count; r++) {
            int m = 2 + rnd.nextInt(n - 1);
            int[] items = new int[m];
            boolean bootstrap = rnd.nextInt(3) == 0;
            List<Integer> pool = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                pool.add(i);
            }
            Collections.shuffle(pool, new java.util.Random(rnd.nextLong()));
            for (int a = 0; a < m; a++) {
                items[a] = bootstrap ? rnd.nextInt(n) : pool.get(a);
            }
            boolean nested = !mixNonNested || rnd.nextBoolean();
            reps.add(new Rep(items, nested ? nestedCuts(rnd, m, maxK) : anyCuts(rnd, m, maxK), nested));
        }
        return reps;
    }

    static ConsensusMatrix accumulate(int n, int maxK, int capacity, List<Rep> reps, boolean nestedEntry) {
        ConsensusAccumulator acc = ConsensusAccumulator.create(n, maxK, capacity);
        for (Rep r : reps) {
            if (r.nested && nestedEntry) {
                acc.addNestedCuts(r.items, r.cuts);
            } else {
                acc.add(r.items, r.cuts);
            }
        }
        return acc.finish();
    }

    /** The direct count: first occurrence of each item, every pair, every k. */
    static void assertMatchesDirectCount(int n, int maxK, List<Rep> reps, ConsensusMatrix m) {
        int[][] co = new int[n][n];
        int[][][] together = new int[maxK + 1][n][n];
        for (Rep r : reps) {
            int[] first = new int[n];
            java.util.Arrays.fill(first, -1);
            for (int a = 0; a < r.items.length; a++) {
                if (first[r.items[a]] < 0) {
                    first[r.items[a]] = a;
                }
            }
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (first[i] < 0 || first[j] < 0) {
                        continue;
                    }
                    co[i][j]++;
                    for (int k = 2; k <= maxK; k++) {
                        if (r.cuts[k - 2].label(first[i]) == r.cuts[k - 2].label(first[j])) {
                            together[k][i][j]++;
                        }
                    }
                }
            }
        }
        long coSampledPairs = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                assertEquals(co[i][j], m.coSampled(i, j));
                coSampledPairs += co[i][j] > 0 ? 1 : 0;
                for (int k = 2; k <= maxK; k++) {
                    assertEquals(together[k][i][j], m.coClustered(k, i, j), "k=" + k + " pair " + i + "," + j);
                }
            }
        }
        assertEquals(coSampledPairs, m.coSampledPairs());
        for (int k = 2; k <= maxK; k++) {
            Map<BigFraction, Long> direct = new TreeMap<>();
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (co[i][j] > 0) {
                        direct.merge(new BigFraction(together[k][i][j], co[i][j]), 1L, Long::sum);
                    }
                }
            }
            ConsensusDistribution d = m.distribution(k);
            assertEquals(direct.size(), d.counts().length);
            int t = 0;
            for (Map.Entry<BigFraction, Long> e : direct.entrySet()) {
                assertEquals(e.getKey(), new BigFraction(d.numerators()[t], d.denominators()[t]));
                assertEquals(e.getValue().longValue(), d.counts()[t]);
                t++;
            }
        }
    }

    @Test
    void nestedCutsPackedMatchDirectCount() {
        SplittableRandom rnd = new SplittableRandom(101);
        int n = 25;
        int maxK = 6;
        List<Rep> reps = replicates(rnd, n, maxK, 60, false);
        assertMatchesDirectCount(n, maxK, reps, accumulate(n, maxK, 60, reps, true));
    }

    @Test
    void nestedCutsTooWideToPackMatchDirectCount() {
        // k = 2..20 needs 1+2+2+3·4+4·8+5·4 = 69 label bits, more than a long: the level-by-level scan
        SplittableRandom rnd = new SplittableRandom(202);
        int n = 40;
        int maxK = 20;
        List<Rep> reps = replicates(rnd, n, maxK, 25, false);
        assertMatchesDirectCount(n, maxK, reps, accumulate(n, maxK, 25, reps, true));
    }

    @Test
    void arbitraryPartitionsAndMixedEntriesMatchDirectCount() {
        SplittableRandom rnd = new SplittableRandom(303);
        int n = 20;
        int maxK = 5;
        List<Rep> reps = replicates(rnd, n, maxK, 50, true);
        assertMatchesDirectCount(n, maxK, reps, accumulate(n, maxK, 50, reps, true));
        assertMatchesDirectCount(n, maxK, reps, accumulate(n, maxK, 50, reps, false));
    }

    @Test
    void countsBeyondOneByteStayExact() {
        // 700 replicates: two-byte counters, with carries through the high byte in both directions
        SplittableRandom rnd = new SplittableRandom(404);
        int n = 6;
        int maxK = 4;
        List<Rep> reps = replicates(rnd, n, maxK, 700, true);
        assertMatchesDirectCount(n, maxK, reps, accumulate(n, maxK, 700, reps, true));
        // all six items in every replicate and one cluster at each k: every pair reaches 700 of 700
        ConsensusAccumulator acc = ConsensusAccumulator.create(n, 3, 700);
        Partition one = Partition.of(new int[6]);
        for (int r = 0; r < 700; r++) {
            acc.addNestedCuts(new int[] {5, 4, 3, 2, 1, 0}, new Partition[] {one, one});
        }
        ConsensusMatrix m = acc.finish();
        assertEquals(700, m.coSampled(0, 5));
        assertEquals(700, m.coClustered(3, 1, 4));
        assertEquals(1.0, m.consensus(2, 2, 3));
    }

    @Test
    void resultDoesNotDependOnArrivalOrder() {
        // counts are sums, so any order of the same replicates gives the same matrix
        SplittableRandom rnd = new SplittableRandom(505);
        int n = 18;
        int maxK = 5;
        List<Rep> reps = replicates(rnd, n, maxK, 40, true);
        ConsensusMatrix forward = accumulate(n, maxK, 40, reps, true);
        List<Rep> shuffled = new ArrayList<>(reps);
        Collections.shuffle(shuffled, new java.util.Random(7));
        ConsensusMatrix other = accumulate(n, maxK, 40, shuffled, true);
        for (int k = 2; k <= maxK; k++) {
            assertEquals(forward.distribution(k), other.distribution(k));
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    assertEquals(forward.coClustered(k, i, j), other.coClustered(k, i, j));
                }
            }
        }
    }
}
