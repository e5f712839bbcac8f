package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

/** Consensus matrix, its distributions and PAC on hand-worked replicates. */
class ConsensusAccumulatorTest {

    static Partition p(int... labels) {
        return Partition.of(labels);
    }

    /**
     * Six items, item 5 never drawn, cuts at k = 2 and 3 (nested, as one tree's are):
     * <pre>
     *   R0 items 0 1 2 3      k=2 {0,1}{2,3}   k=3 {0,1}{2}{3}
     *   R1 items 0 1 2 4      k=2 {0,1,2}{4}   k=3 {0}{1,2}{4}
     *   R2 items 1 2 3 4      k=2 {1,2}{3,4}   k=3 {1,2}{3}{4}
     *   R3 items 4 0 3 0 3    (bootstrap: 0 and 3 drawn twice) first occurrences give
     *                         k=2 {4}{0,3}     k=3 {4}{0}{3}
     * </pre>
     * The second copy of item 0 carries k=2 label 0 (with item 4); counted once with its first
     * occurrence's labels, it is with item 3.
     */
    static List<Object[]> handReplicates() {
        List<Object[]> r = new ArrayList<>();
        r.add(new Object[] {new int[] {0, 1, 2, 3}, new Partition[] {p(0, 0, 1, 1), p(0, 0, 1, 2)}});
        r.add(new Object[] {new int[] {0, 1, 2, 4}, new Partition[] {p(0, 0, 0, 1), p(0, 1, 1, 2)}});
        r.add(new Object[] {new int[] {1, 2, 3, 4}, new Partition[] {p(0, 0, 1, 1), p(0, 0, 1, 2)}});
        r.add(new Object[] {new int[] {4, 0, 3, 0, 3}, new Partition[] {p(0, 1, 1, 0, 1), p(0, 1, 2, 0, 2)}});
        return r;
    }

    static ConsensusMatrix hand(boolean nested) {
        ConsensusAccumulator acc = ConsensusAccumulator.create(6, 3, 4);
        for (Object[] r : handReplicates()) {
            if (nested) {
                acc.addNestedCuts((int[]) r[0], (Partition[]) r[1]);
            } else {
                acc.add((int[]) r[0], (Partition[]) r[1]);
            }
        }
        return acc.finish();
    }

    @Test
    void handWorkedCounts() {
        // co-sampled (by hand from the table above): (1,2) in R0 R1 R2 = 3; every other pair among 0..4
        // in exactly two replicates; pairs with item 5 never
        // co-clustered at k=2: (0,1) R0 R1; (0,2) R1; (0,3) R3; (1,2) R1 R2; (2,3) R0; (3,4) R2
        // co-clustered at k=3: (0,1) R0; (1,2) R1 R2
        for (boolean nested : new boolean[] {true, false}) {
            ConsensusMatrix m = hand(nested);
            assertEquals(4, m.replicates());
            assertEquals(3, m.coSampled(1, 2));
            assertEquals(2, m.coSampled(0, 4));
            assertEquals(0, m.coSampled(0, 5));
            assertEquals(10, m.coSampledPairs());
            assertEquals(5, m.neverCoSampledPairs());
            int[][] k2 = {{0, 1, 2}, {0, 2, 1}, {0, 3, 1}, {0, 4, 0}, {1, 2, 2}, {1, 3, 0}, {1, 4, 0}, {2, 3, 1},
                {2, 4, 0}, {3, 4, 1}};
            for (int[] e : k2) {
                assertEquals(e[2], m.coClustered(2, e[0], e[1]), "k=2 pair " + e[0] + "," + e[1]);
                assertEquals(e[2], m.coClustered(2, e[1], e[0]));
            }
            assertEquals(1, m.coClustered(3, 0, 1));
            assertEquals(2, m.coClustered(3, 1, 2));
            assertEquals(0, m.coClustered(3, 2, 3));
            assertEquals(1.0, m.consensus(2, 0, 1));
            assertEquals(2.0 / 3, m.consensus(2, 1, 2));
            assertEquals(0.5, m.consensus(3, 0, 1));
            assertTrue(Double.isNaN(m.consensus(2, 3, 5)));
        }
    }

    @Test
    void handWorkedDistributionsAndPac() {
        // k=2 consensus values: 0 for (0,4)(1,3)(1,4)(2,4); 1/2 for (0,2)(0,3)(2,3)(3,4); 2/3 for (1,2);
        // 1 for (0,1). CDF over the 10 co-sampled pairs: 0.4, 0.8, 0.9, 1.0.
        // PAC (0.1, 0.9] = (4 + 1)/10 = 0.5 (Şenbabaoğlu et al. 2014 definition)
        // k=3: 0 for eight pairs, 1/2 for (0,1), 2/3 for (1,2): PAC = 2/10
        ConsensusMatrix m = hand(true);
        ConsensusDistribution d2 = m.distribution(2);
        assertArrayEquals(new int[] {0, 1, 2, 1}, d2.numerators());
        assertArrayEquals(new int[] {1, 2, 3, 1}, d2.denominators());
        assertArrayEquals(new long[] {4, 4, 1, 1}, d2.counts());
        assertArrayEquals(new double[] {0, 0.5, 2.0 / 3, 1}, d2.values(), 0);
        assertArrayEquals(new double[] {0.4, 0.8, 0.9, 1.0}, d2.cumulativeShares(), 1e-15);
        assertEquals(10, d2.pairs());
        assertEquals(0.5, m.pac(2), 1e-15);
        assertEquals(0.8, d2.shareAtMost(new BigDecimal("0.5")), 1e-15);
        assertEquals(0.4, d2.shareAtMost(new BigDecimal("0.4999")), 1e-15);
        assertArrayEquals(new long[] {8, 1, 1}, m.distribution(3).counts());
        assertEquals(0.2, m.pac(3), 1e-15);
        // the general entry point gives the same matrix for nested cuts
        ConsensusMatrix g = hand(false);
        for (int k = 2; k <= 3; k++) {
            assertEquals(m.distribution(k), g.distribution(k));
        }
    }

    @Test
    void itemConsensusByHand() {
        // Monti et al. (2003) item consensus at k=2 with reference {0,1,2}{3,4}{5}, values from above:
        // item 0: (c01 + c02)/2 = (1 + 1/2)/2; item 1: (1 + 2/3)/2; item 2: (1/2 + 2/3)/2;
        // items 3, 4: c34 = 1/2; item 5: alone (and never drawn) -> NaN
        double[] ic = hand(true).itemConsensus(2, p(0, 0, 0, 1, 1, 2));
        assertArrayEquals(new double[] {0.75, 5.0 / 6, 7.0 / 12, 0.5, 0.5}, java.util.Arrays.copyOf(ic, 5), 1e-15);
        assertTrue(Double.isNaN(ic[5]));
    }

    @Test
    void nonNestedPartitionsThroughTheGeneralEntry() {
        // k=2 {0,1}{2,3}; k=3 {0}{1}{2,3}; k=4 {0,1}{2}{3}: (0,1) together at k=2 and 4 but not 3, which
        // no tree's cuts do; (2,3) together at k=2 and 3. By hand: counts (0,1): 1,0,1; (2,3): 1,1,0.
        Partition[] cuts = {p(0, 0, 1, 1), p(0, 1, 2, 2), p(0, 0, 1, 2)};
        ConsensusAccumulator acc = ConsensusAccumulator.create(4, 4, 3);
        assertThrows(IllegalArgumentException.class, () -> acc.addNestedCuts(new int[] {0, 1, 2, 3}, cuts));
        acc.add(new int[] {0, 1, 2, 3}, cuts);
        ConsensusMatrix m = acc.finish();
        assertEquals(1, m.coClustered(2, 0, 1));
        assertEquals(0, m.coClustered(3, 0, 1));
        assertEquals(1, m.coClustered(4, 0, 1));
        assertEquals(1, m.coClustered(2, 2, 3));
        assertEquals(1, m.coClustered(3, 2, 3));
        assertEquals(0, m.coClustered(4, 2, 3));
        assertEquals(0, m.coClustered(2, 0, 2));
    }

    /**
     * Four items drawn in all ten replicates, k = 2 only: {0,1}{2,3} three times, {0,1,3}{2} six
     * times, {0,2}{1,3} once. By hand: (0,1) 9/10, (0,2) 1/10, (0,3) 6/10, (1,2) 0, (1,3) 7/10,
     * (2,3) 3/10.
     */
    static ConsensusMatrix tenths() {
        ConsensusAccumulator acc = ConsensusAccumulator.create(4, 2, 10);
        int[] all = {0, 1, 2, 3};
        for (int r = 0; r < 10; r++) {
            Partition cut = r < 3 ? p(0, 0, 1, 1) : r < 9 ? p(0, 0, 1, 0) : p(0, 1, 0, 1);
            acc.addNestedCuts(all, new Partition[] {cut});
        }
        return acc.finish();
    }

    @Test
    void pacBoundariesAreExact() {
        // PAC (Şenbabaoğlu et al. 2014) over (0.1, 0.9]: 0.9 is in, 0.1 is out, so (0,1) 0.9, (0,3) 0.6,
        // (1,3) 0.7, (2,3) 0.3 count and (0,2) 0.1, (1,2) 0 do not: 4/6
        ConsensusMatrix m = tenths();
        assertEquals(0.1, m.consensus(2, 0, 2));
        assertEquals(0.9, m.consensus(2, 0, 1));
        assertEquals(4.0 / 6, m.pac(2), 1e-15);
        ConsensusDistribution d = m.distribution(2);
        // (0.3, 0.7]: 0.6 and 0.7 in, 0.3 out
        assertEquals(2.0 / 6, d.pac(new BigDecimal("0.3"), new BigDecimal("0.7")), 1e-15);
        // (0.1, 0.3]: only 0.3, exactly at the inclusive end; as doubles the bounds read as decimals
        assertEquals(1.0 / 6, d.pac(0.1, 0.3), 1e-15);
        // (0, 0.1]: only 0.1
        assertEquals(1.0 / 6, d.pac(BigDecimal.ZERO, new BigDecimal("0.1")), 1e-15);
        // a hair either side of 0.9 moves (0,1) in or out
        assertEquals(3.0 / 6, d.pac(new BigDecimal("0.1"), new BigDecimal("0.8999999999999999999")), 1e-15);
        assertEquals(4.0 / 6, d.pac(new BigDecimal("0.1"), new BigDecimal("0.9000000000000000001")), 1e-15);
        assertEquals(5.0 / 6, d.pac(new BigDecimal("0.0999999999999999999"), new BigDecimal("0.9")), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> d.pac(0.9, 0.1));
        assertThrows(IllegalArgumentException.class, () -> d.pac(-0.1, 0.9));
        assertThrows(IllegalArgumentException.class, () -> d.pac(0.1, 1.1));
    }

    @Test
    void valuesJustInsideTheDefaultWindowCount() {
        // Four pairs, each drawn only with its partner (so cross pairs are never co-sampled):
        // (0,1) together in 10 of 11 replicates, (2,3) in 1 of 9, (4,5) in 8 of 9, (6,7) in 1 of 11.
        // Over (0.1, 0.9]: 1/9 > 0.1 and 8/9 <= 0.9 count; 10/11 > 0.9 and 1/11 <= 0.1 do not: PAC = 2/4
        int[][] plan = {{0, 1, 11, 10}, {2, 3, 9, 1}, {4, 5, 9, 8}, {6, 7, 11, 1}};
        ConsensusAccumulator acc = ConsensusAccumulator.create(8, 2, 40);
        for (int[] pair : plan) {
            for (int r = 0; r < pair[2]; r++) {
                Partition cut = r < pair[3] ? p(0, 0) : p(0, 1);
                acc.addNestedCuts(new int[] {pair[0], pair[1]}, new Partition[] {cut});
            }
        }
        ConsensusMatrix m = acc.finish();
        assertEquals(4, m.coSampledPairs());
        assertEquals(24, m.neverCoSampledPairs());
        assertEquals(10.0 / 11, m.consensus(2, 0, 1), 1e-15);
        assertEquals(1.0 / 9, m.consensus(2, 2, 3), 1e-15);
        assertEquals(0.5, m.pac(2));
        assertArrayEquals(new int[] {1, 1, 8, 10}, m.distribution(2).numerators());
        assertArrayEquals(new int[] {11, 9, 9, 11}, m.distribution(2).denominators());
    }

    @Test
    void errorsAreReported() {
        ConsensusAccumulator acc = ConsensusAccumulator.create(4, 3, 1);
        Partition[] two = {p(0, 0, 1), p(0, 1, 2)};
        assertThrows(IllegalArgumentException.class, () -> acc.add(new int[] {0, 1, 2}, new Partition[] {two[0]}));
        assertThrows(IllegalArgumentException.class, () -> acc.add(new int[] {0, 1, 4}, two));
        assertThrows(IllegalArgumentException.class, () -> acc.add(new int[] {0, 1}, two));
        acc.add(new int[] {0, 1, 2}, two);
        assertThrows(IllegalStateException.class, () -> acc.add(new int[] {0, 1, 2}, two));
        ConsensusMatrix m = acc.finish();
        assertThrows(IllegalStateException.class, acc::finish);
        assertThrows(IllegalArgumentException.class, () -> m.consensus(4, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> m.consensus(2, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> ConsensusAccumulator.create(1, 3, 10));
        // no replicates: no pair co-sampled, no consensus values, PAC undefined
        ConsensusMatrix none = ConsensusAccumulator.create(3, 2, 5).finish();
        assertEquals(3, none.neverCoSampledPairs());
        assertEquals(0, none.distribution(2).pairs());
        assertTrue(Double.isNaN(none.pac(2)));
        assertThrows(IllegalArgumentException.class, () -> ConsensusAccumulator.create(10, 3, 10_001));
    }

    @Test
    void memoryEstimate() {
        // one byte per pair and counter array up to 255 replicates, two beyond: 20 000 items, k = 2..10
        long pairs = 20_000L * 19_999 / 2;
        assertEquals(10 * pairs, ConsensusAccumulator.bytesFor(20_000, 10, 200));
        assertEquals(20 * pairs, ConsensusAccumulator.bytesFor(20_000, 10, 1000));
    }
}
