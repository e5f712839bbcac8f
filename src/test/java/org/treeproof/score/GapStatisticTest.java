package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.partition.Partition;

class GapStatisticTest {

    /** Values written by src/test/resources/reference/gap/make_reference.py (numpy, direct formulas). */
    private static JsonNode fixture() throws IOException {
        try (InputStream in = GapStatisticTest.class.getResourceAsStream("/reference/gap/gap_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    private static double[] doubles(JsonNode array) {
        double[] d = new double[array.size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = array.get(i).doubleValue();
        }
        return d;
    }

    static DataMatrix matrix(int n, int p, double[] values) {
        List<String> ids = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, values);
    }

    @Test
    void handWorkedTable() {
        // Formulas of Tibshirani, Walther & Hastie (2001), worked by hand for K = 3, B = 2:
        //   log W      = 2.0, 1.0, 0.7
        //   log W*_k1  = 2.1, 1.6, 1.1       log W*_k2 = 2.3, 1.8, 1.5
        //   mean       = 2.2, 1.7, 1.3
        //   Gap        = 0.2, 0.7, 0.6
        //   sd (1/B)   = 0.1, 0.1, 0.2       (deviations ±0.1, ±0.1, ±0.2)
        //   s = sd·sqrt(1 + 1/2) = 0.1224745, 0.1224745, 0.2449490
        //   k = 1: 0.2 >= 0.7 − 0.1224745 = 0.5775255 ? no
        //   k = 2: 0.7 >= 0.6 − 0.2449490 = 0.3550510 ? yes  -> k̂ = 2
        GapResult g = GapStatistic.compute(new double[] {2.0, 1.0, 0.7},
                new double[][] {{2.1, 1.6, 1.1}, {2.3, 1.8, 1.5}});
        assertArrayEquals(new double[] {2.2, 1.7, 1.3}, g.referenceMeanLogW(), 1e-12);
        assertArrayEquals(new double[] {0.2, 0.7, 0.6}, g.gap(), 1e-12);
        assertArrayEquals(new double[] {0.1, 0.1, 0.2}, g.sd(), 1e-12);
        assertArrayEquals(new double[] {0.1224744871391589, 0.1224744871391589, 0.2449489742783178}, g.se(), 1e-12);
        assertEquals(2, g.chosenK());
        assertTrue(g.ruleMet());
        assertEquals(2, g.referenceSets());
        assertEquals(3, g.maxK());
        assertEquals(0.7, g.gapAt(2), 1e-12);
        assertEquals(0.2449489742783178, g.seAt(3), 1e-12);
    }

    @Test
    void flatGapChoosesOne() {
        // Hand case: the observed log W equals the reference mean at every k, so Gap = 0 everywhere and
        // k = 1 already satisfies 0 >= 0 − s_2 (the paper allows k̂ = 1 for structureless data).
        GapResult g = GapStatistic.compute(new double[] {3.0, 2.5, 2.25},
                new double[][] {{3.25, 2.75, 2.25}, {2.75, 2.25, 2.25}});
        assertArrayEquals(new double[] {0, 0, 0}, g.gap(), 1e-15);
        assertEquals(1, g.chosenK());
        assertTrue(g.ruleMet());
    }

    @Test
    void risingGapIsFlaggedAtK() {
        // Hand case: references constant (sd 0), observed falling by 1 per k, so Gap = 0, 1, 2 rises and no
        // k < K = 3 meets the rule: the result is K with the flag down.
        GapResult g = GapStatistic.compute(new double[] {3, 2, 1}, new double[][] {{3, 3, 3}, {3, 3, 3}});
        assertArrayEquals(new double[] {0, 1, 2}, g.gap(), 0);
        assertEquals(3, g.chosenK());
        assertFalse(g.ruleMet());
        GapResult one = GapStatistic.compute(new double[] {1.0}, new double[][] {{1.5}});
        assertEquals(1, one.chosenK());
        assertFalse(one.ruleMet(), "with K = 1 the rule cannot be checked");
    }

    @Test
    void tiesCountAsMeetingTheRule() {
        // The rule is Gap(k) >= Gap(k+1) − s_{k+1}, so equality chooses k. With B = 1 every sd is 0.
        GapResult g = GapStatistic.compute(new double[] {1, 0.5, 0}, new double[][] {{1, 1, 1}});
        // Gap = 0, 0.5, 1 rises, so no k < 3 qualifies; then Gap = 0, 0.5, 0.5, where Gap(2) = Gap(3) − 0:
        assertEquals(3, g.chosenK());
        assertFalse(g.ruleMet());
        GapResult tie = GapStatistic.compute(new double[] {1, 0.5, 0.5}, new double[][] {{1, 1, 1}});
        assertEquals(2, tie.chosenK());
        assertTrue(tie.ruleMet());
    }

    @Test
    void matchesNumpyOnRandomTables() throws IOException {
        for (JsonNode t : fixture().get("gapTables")) {
            String name = t.get("name").asText();
            JsonNode refNode = t.get("referenceLogW");
            double[][] ref = new double[refNode.size()][];
            for (int b = 0; b < ref.length; b++) {
                ref[b] = doubles(refNode.get(b));
            }
            GapResult g = GapStatistic.compute(doubles(t.get("logW")), ref);
            // Reference: numpy transcription of the paper's formulas in make_reference.py.
            assertArrayEquals(doubles(t.get("referenceMeanLogW")), g.referenceMeanLogW(), 1e-12, name);
            assertArrayEquals(doubles(t.get("gap")), g.gap(), 1e-12, name);
            assertArrayEquals(doubles(t.get("sd")), g.sd(), 1e-12, name);
            assertArrayEquals(doubles(t.get("se")), g.se(), 1e-12, name);
            assertEquals(t.get("chosenK").asInt(), g.chosenK(), name);
            assertEquals(t.get("ruleMet").asBoolean(), g.ruleMet(), name);
            assertEquals(ref.length, g.referenceSets());
        }
    }

    @Test
    void refusesUnusableLogW() {
        InputException e = assertThrows(InputException.class, () -> GapStatistic.compute(
                new double[] {1, Double.NEGATIVE_INFINITY}, new double[][] {{1, 1}}));
        assertTrue(e.getMessage().contains("k = 2"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> GapStatistic.compute(new double[] {1, Double.NaN}, new double[][] {{1, 1}}));
        assertThrows(IllegalArgumentException.class,
                () -> GapStatistic.compute(new double[] {1, 2}, new double[][] {{1}}));
        assertThrows(IllegalArgumentException.class, () -> GapStatistic.compute(new double[] {1}, new double[0][]));
    }

    @Test
    void resultCopiesItsArrays() {
        double[] logW = {2, 1};
        GapResult g = GapStatistic.compute(logW, new double[][] {{2, 2}, {2, 1.5}});
        logW[0] = 100;
        assertEquals(2, g.logW()[0]);
        g.gap()[0] = 100;
        assertEquals(0, g.gapAt(1), 0);
        assertThrows(IllegalArgumentException.class, () -> new GapResult(new double[] {1, 2}, new double[] {1, 2},
                new double[] {0, 0}, new double[] {0, 0}, new double[] {0, 0}, 1, 1, false));
    }

    @Test
    void withinSumOfSquaresHandCases() {
        // 1-D: {0, 2} and {10}: centroid 1 gives 1² + 1², the singleton 0, so W = 2.
        DataMatrix line = matrix(3, 1, new double[] {0, 2, 10});
        assertEquals(2.0, GapStatistic.withinSumOfSquares(line, new int[] {0, 0, 1}), 1e-15);
        // Unit square corners scaled by 2, one cluster: pairwise form Σ_{ordered pairs} d² / (2n)
        // = 2·(4·4 + 2·8) / 8 = 8, and centroid form 4 corners × squared distance 2 = 8.
        DataMatrix square = matrix(4, 2, new double[] {0, 0, 2, 0, 0, 2, 2, 2});
        assertEquals(8.0, GapStatistic.withinSumOfSquares(square, new int[4]), 1e-15);
        assertEquals(4.0, GapStatistic.withinSumOfSquares(square, Partition.of(new int[] {5, 5, 9, 9})), 1e-15);
        assertEquals(0.0, GapStatistic.withinSumOfSquares(square, new int[] {0, 1, 2, 3}), 0);
    }

    @Test
    void withinSumOfSquaresMatchesNumpyPairwiseForm() throws IOException {
        for (JsonNode c : fixture().get("withinSumOfSquares")) {
            int n = c.get("n").asInt();
            int p = c.get("p").asInt();
            JsonNode l = c.get("labels");
            int[] labels = new int[n];
            for (int i = 0; i < n; i++) {
                labels[i] = l.get(i).asInt();
            }
            double w = c.get("w").doubleValue();
            // Reference: numpy, Σ_r Σ_{i,i'∈r} ||x_i − x_i'||² / (2 n_r) (the paper's definition), one case
            // with a common offset of 1e8 where a one-pass formula would lose every digit.
            double mine = GapStatistic.withinSumOfSquares(matrix(n, p, doubles(c.get("data"))), labels);
            assertEquals(w, mine, 1e-11 * w, c.get("name").asText());
        }
    }

    @Test
    void withinSumOfSquaresInvariants() {
        // Seeded invariants: relabelling changes nothing, merging clusters never lowers W, W_1 is largest.
        SplittableRandom rng = new SplittableRandom(21);
        for (int trial = 0; trial < 30; trial++) {
            int n = 2 + rng.nextInt(30);
            int p = 1 + rng.nextInt(6);
            double[] v = new double[n * p];
            for (int a = 0; a < v.length; a++) {
                v[a] = rng.nextDouble() * 10 - 5;
            }
            DataMatrix x = matrix(n, p, v);
            int k = 1 + rng.nextInt(n);
            int[] labels = new int[n];
            for (int i = 0; i < n; i++) {
                labels[i] = rng.nextInt(k);
            }
            double w = GapStatistic.withinSumOfSquares(x, labels);
            int[] permuted = new int[n];
            int[] merged = new int[n];
            for (int i = 0; i < n; i++) {
                permuted[i] = k - 1 - labels[i];
                merged[i] = labels[i] / 2;
            }
            assertEquals(w, GapStatistic.withinSumOfSquares(x, permuted), 1e-10 * (1 + w));
            assertTrue(GapStatistic.withinSumOfSquares(x, merged) >= w - 1e-10 * (1 + w));
            assertTrue(GapStatistic.withinSumOfSquares(x, new int[n]) >= w - 1e-10 * (1 + w));
        }
    }

    @Test
    void withinSumOfSquaresValidates() {
        DataMatrix x = matrix(2, 1, new double[] {1, 2});
        assertThrows(IllegalArgumentException.class, () -> GapStatistic.withinSumOfSquares(x, new int[] {0}));
        assertThrows(IllegalArgumentException.class, () -> GapStatistic.withinSumOfSquares(x, new int[] {0, -1}));
        assertThrows(IllegalArgumentException.class, () -> GapStatistic.withinSumOfSquares(x, new int[] {0, 2}));
        DataMatrix gap = matrix(2, 1, new double[] {1, Double.NaN});
        InputException e = assertThrows(InputException.class,
                () -> GapStatistic.withinSumOfSquares(gap, new int[] {0, 0}));
        assertTrue(e.getMessage().contains("'s1'") && e.getMessage().contains("'f0'"), e.getMessage());
    }

    @Test
    void logWithinByKStartsWithTheTotalSumOfSquares() {
        DataMatrix square = matrix(4, 2, new double[] {0, 0, 2, 0, 0, 2, 2, 2});
        double[] logW = GapStatistic.logWithinByK(square, new int[][] {{0, 0, 1, 1}, {0, 1, 2, 2}});
        // W_1 = 8, W_2 = 4 (two pairs at distance 2), W_3 = 2 (one pair at distance 2); see the hand cases.
        assertArrayEquals(new double[] {Math.log(8), Math.log(4), Math.log(2)}, logW, 1e-15);
        assertThrows(IllegalArgumentException.class,
                () -> GapStatistic.logWithinByK(square, new int[][] {{0, 0, 0, 0}}), "a k = 2 cut with one cluster");
        assertThrows(IllegalArgumentException.class,
                () -> GapStatistic.logWithinByK(square, new int[][] {{0, 0, 2, 2}}), "label outside 0..k−1");
    }
}
