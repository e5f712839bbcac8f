package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

class AdjustedRandIndexTest {

    @Test
    void handWorkedTable() {
        // Hubert & Arabie (1985) formula, worked by hand on the table
        //          B1 B2 B3 | a
        //   A1      3  1  0 | 4
        //   A2      0  2  1 | 3
        //   A3      1  0  2 | 3
        //   b       4  3  3 | 10
        // Σ C(n_ij,2) = 3 + 1 + 1 = 5; Σ C(a_i,2) = 6 + 3 + 3 = 12; Σ C(b_j,2) = 12; C(10,2) = 45
        // expected = 12·12/45 = 3.2; max = (12 + 12)/2 = 12; ARI = (5 - 3.2)/(12 - 3.2) = 1.8/8.8 = 9/44
        // pair counts: tp = 5, together in A only = 12 - 5 = 7, in B only = 7, apart in both = 45 - 12 - 12 + 5 = 26
        Partition a = Partition.of(new int[] {0, 0, 0, 0, 1, 1, 1, 2, 2, 2});
        Partition b = Partition.of(new int[] {0, 0, 0, 1, 1, 1, 2, 0, 2, 2});
        AdjustedRandIndex.Result r = AdjustedRandIndex.of(a, b).compute();
        assertEquals(9.0 / 44.0, r.value(), 1e-15);
        assertEquals(5, r.togetherInBoth());
        assertEquals(7, r.togetherInFirst());
        assertEquals(7, r.togetherInSecond());
        assertEquals(26, r.apartInBoth());
        assertEquals(45, r.pairs());
    }

    @Test
    void matchesScikitLearn() {
        // reference: sklearn.metrics.adjusted_rand_score 1.2.1, values in ari_sklearn.json (script beside it)
        JsonNode cases = Fixtures.read("ari_sklearn.json").get("cases");
        assertTrue(cases.size() > 300);
        for (JsonNode c : cases) {
            Partition a = Partition.of(Fixtures.ints(c.get("a")));
            Partition b = Partition.of(Fixtures.ints(c.get("b")));
            double expected = c.get("ari").doubleValue();
            assertEquals(expected, AdjustedRandIndex.of(a, b).compute().value(), 1e-14, c.get("name").asText());
            assertEquals(expected, AdjustedRandIndex.of(b, a).compute().value(), 1e-14, c.get("name").asText());
        }
    }

    @Test
    void identicalPartitionsGiveExactlyOne() {
        // Hubert & Arabie (1985): the index is 1 for identical partitions; for the degenerate cases the
        // convention is scikit-learn's (1.0 when both partitions put the same pairs together)
        SplittableRandom rnd = new SplittableRandom(3);
        for (int t = 0; t < 200; t++) {
            int n = 1 + rnd.nextInt(60);
            int k = 1 + rnd.nextInt(n);
            int[] l = new int[n];
            int[] relabelled = new int[n];
            for (int i = 0; i < n; i++) {
                l[i] = rnd.nextInt(k);
                relabelled[i] = 100 - 7 * l[i];
            }
            assertEquals(1.0, AdjustedRandIndex.of(Partition.of(l), Partition.of(relabelled)).compute().value());
        }
        int[] ones = new int[5];
        int[] singles = {0, 1, 2, 3, 4};
        assertEquals(1.0, AdjustedRandIndex.of(Partition.of(ones), Partition.of(ones)).compute().value());
        assertEquals(1.0, AdjustedRandIndex.of(Partition.of(singles), Partition.of(singles)).compute().value());
        // one cluster against all singletons: expected index equals the observed one, so 0
        assertEquals(0.0, AdjustedRandIndex.of(Partition.of(ones), Partition.of(singles)).compute().value());
    }

    @Test
    void largeSizesStayExact() {
        // invariant: the pair counts of two 100 000-item partitions overflow a long product, and the
        // big-integer path gives the same value as the formula in doubles (well conditioned here)
        int n = 100_000;
        int[] a = new int[n];
        int[] b = new int[n];
        SplittableRandom rnd = new SplittableRandom(5);
        for (int i = 0; i < n; i++) {
            a[i] = i % 4;
            b[i] = rnd.nextInt(10) < 8 ? a[i] : rnd.nextInt(4);
        }
        AdjustedRandIndex.Result r = AdjustedRandIndex.of(Partition.of(a), Partition.of(b)).compute();
        double tp = r.togetherInBoth();
        double fn = r.togetherInFirst();
        double fp = r.togetherInSecond();
        double tn = r.apartInBoth();
        double approx = 2 * (tp * tn - fn * fp) / ((tp + fn) * (fn + tn) + (tp + fp) * (fp + tn));
        assertEquals(approx, r.value(), 1e-9);
        assertEquals((long) n * (n - 1) / 2, r.pairs());
        assertTrue(r.value() > 0.5 && r.value() < 1);
    }
}
