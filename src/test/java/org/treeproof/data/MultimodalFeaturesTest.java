package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** {@link MultimodalFeatures} on planted features. */
class MultimodalFeaturesTest {
    private static DataMatrix matrix(double[][] columns, List<String> names) {
        int n = columns[0].length;
        int p = columns.length;
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                v[i * p + j] = columns[j][i];
            }
        }
        return new DataMatrix(ids, names, v);
    }

    @Test
    void separatedModesAreFlaggedUnimodalAndDiscreteFeaturesAreNot() {
        var rng = new SplittableRandom(11);
        int n = 200;
        double[] row = new double[n];      // five groups of 40, centres 6 apart, SD 1
        double[] normal = new double[n];
        double[] lognormal = new double[n]; // one long tail, one mode
        double[] answers = new double[n];   // a 1-5 scale: every value held by many samples, so not tested
        for (int i = 0; i < n; i++) {
            row[i] = 6 * (i / 40) + rng.nextGaussian();
            normal[i] = rng.nextGaussian();
            lognormal[i] = Math.exp(rng.nextGaussian());
            answers[i] = 1 + rng.nextInt(5);
        }
        var r = MultimodalFeatures.of(matrix(new double[][] {normal, row, lognormal, answers},
                List.of("normal", "row", "lognormal", "answers")));
        assertEquals(3, r.tested());
        assertEquals(1, r.flags().size());
        assertEquals("row", r.flags().get(0).feature());
        // flagged: its p-value times the 3 features tested is at most 0.01
        assertTrue(r.flags().get(0).test().pValue() * 3 <= 0.01);
    }

    @Test
    void theFamilyWiseLevelIsSplitOverTheFeaturesTested() {
        // A feature whose p-value lies between 0.01 / 200 and 0.01 / 2 is flagged among 2 tested features and not
        // among 200. Two modes of 12 and 12 samples, 5 SDs apart, give such a dip.
        var rng = new SplittableRandom(5);
        int n = 24;
        double[] two = new double[n];
        for (int i = 0; i < n; i++) {
            two[i] = (i < 12 ? 0 : 5.0) + rng.nextGaussian();
        }
        double p = DipTest.test(two).pValue();
        assertTrue(p > 0.01 / 200 && p <= 0.01 / 2, "p " + p);
        double[][] few = new double[2][];
        few[0] = two;
        few[1] = gaussian(rng, n);
        assertEquals(1, MultimodalFeatures.of(matrix(few, List.of("two", "g"))).flags().size());
        double[][] many = new double[200][];
        var names = new ArrayList<String>();
        many[0] = two;
        names.add("two");
        for (int j = 1; j < 200; j++) {
            many[j] = gaussian(rng, n);
            names.add("g" + j);
        }
        var r = MultimodalFeatures.of(matrix(many, names));
        assertEquals(200, r.tested());
        assertTrue(r.flags().stream().noneMatch(f -> f.feature().equals("two")));
    }

    private static double[] gaussian(SplittableRandom rng, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = rng.nextGaussian();
        }
        return x;
    }
}
