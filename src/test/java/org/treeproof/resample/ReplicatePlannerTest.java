package org.treeproof.resample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HashSet;
import org.junit.jupiter.api.Test;
import org.treeproof.data.InputException;

class ReplicatePlannerTest {

    @Test
    void seedsArePureFunctionsAndDistinctAcrossPurposesAndIndices() {
        var seen = new HashSet<Long>();
        for (Seeds.Purpose p : Seeds.Purpose.values()) {
            for (int i = 0; i < 1000; i++) {
                long s = Seeds.seedFor(42, p, i);
                assertEquals(s, Seeds.seedFor(42, p, i));
                assertTrue(seen.add(s), "seed collision at " + p + " " + i);
            }
        }
        assertNotEquals(Seeds.seedFor(1, Seeds.Purpose.REPLICATE, 0), Seeds.seedFor(2, Seeds.Purpose.REPLICATE, 0));
    }

    @Test
    void splitMixFinaliserMatchesPublishedConstants() {
        // SplitMix64 (Steele, Lea & Flood 2014): the first output of a generator seeded with 0 is
        // mix(0 + golden gamma) = 0xE220A8397B1DCDAF, as in the reference C code by S. Vigna (from memory,
        // checked against java.util.SplittableRandom below, which uses the same finaliser).
        assertEquals(0xE220A8397B1DCDAFL, Seeds.mix(0x9E3779B97F4A7C15L));
        assertEquals(new java.util.SplittableRandom(0).nextLong(), Seeds.mix(0x9E3779B97F4A7C15L));
    }

    @Test
    void subsampleHasTheRoundedFractionOfDistinctSortedSamples() {
        var planner = new ReplicatePlanner(101, 7, Resampling.SUBSAMPLE, 0.8, 1.0, 9, Seeds.Purpose.REPLICATE);
        for (int b = 0; b < 50; b++) {
            ReplicatePlan p = planner.plan(b);
            assertEquals(81, p.distinct().length);
            assertArrayEquals(p.distinct(), p.draws());
            assertNull(p.features());
            assertEquals(p, planner.plan(b));
        }
        assertNotEquals(Arrays.toString(planner.plan(0).draws()), Arrays.toString(planner.plan(1).draws()));
    }

    @Test
    void subsampleIsUniformOverSamples() {
        // Each sample is held with probability m/n = 0.5; over 4000 plans of 10 from 20 the count per
        // sample is Binomial(4000, 0.5): mean 2000, SD 31.6. A 6-SD band cannot fail by chance in practice.
        var planner = new ReplicatePlanner(20, 0, Resampling.SUBSAMPLE, 0.5, 1.0, 5, Seeds.Purpose.REPLICATE);
        int[] count = new int[20];
        for (int b = 0; b < 4000; b++) {
            for (int i : planner.plan(b).distinct()) {
                count[i]++;
            }
        }
        for (int c : count) {
            assertTrue(Math.abs(c - 2000) < 190, "count " + c);
        }
    }

    @Test
    void bootstrapDrawsNWithReplacementAndMapsDrawsToDistinct() {
        var planner = new ReplicatePlanner(200, 0, Resampling.BOOTSTRAP, 1.0, 1.0, 3, Seeds.Purpose.REPLICATE);
        double distinctShare = 0;
        for (int b = 0; b < 100; b++) {
            ReplicatePlan p = planner.plan(b);
            assertEquals(200, p.drawCount());
            int[] map = p.drawToDistinct();
            for (int a = 0; a < map.length; a++) {
                assertEquals(p.draws()[a], p.distinct()[map[a]]);
            }
            distinctShare += p.distinct().length / 200.0 / 100;
        }
        // Expected share of distinct samples is 1 - (1 - 1/n)^n = 0.6330 for n = 200.
        assertEquals(1 - Math.pow(1 - 1 / 200.0, 200), distinctShare, 0.01);
    }

    @Test
    void featureResamplingKeepsTheRoundedFraction() {
        var planner = new ReplicatePlanner(30, 500, Resampling.SUBSAMPLE, 0.8, 0.6, 3, Seeds.Purpose.REPLICATE);
        ReplicatePlan p = planner.plan(4);
        assertEquals(300, p.features().length);
        for (int a = 1; a < 300; a++) {
            assertTrue(p.features()[a] > p.features()[a - 1]);
        }
    }

    @Test
    void rejectsImpossiblePlans() {
        assertThrows(IllegalArgumentException.class,
                () -> new ReplicatePlanner(10, 5, Resampling.SUBSAMPLE, 0, 1, 1, Seeds.Purpose.REPLICATE));
        assertThrows(IllegalArgumentException.class,
                () -> new ReplicatePlanner(10, 5, Resampling.SUBSAMPLE, 0.5, 1.5, 1, Seeds.Purpose.REPLICATE));
        assertThrows(IllegalArgumentException.class,
                () -> new ReplicatePlanner(10, 0, Resampling.SUBSAMPLE, 0.5, 0.5, 1, Seeds.Purpose.REPLICATE));
        assertThrows(InputException.class, () -> Resampling.parse("jackknife"));
        assertEquals(Resampling.BOOTSTRAP, Resampling.parse(" Bootstrap"));
    }
}
