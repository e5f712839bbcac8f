package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Preparation on small tables computed by hand (each expected value is worked out in a comment). */
class PreparationTest {
    private static final double NA = Double.NaN;

    /** A table with features a, b, c... and samples s1, s2, ..., given row by row. */
    private static DataMatrix table(int features, double... rowMajor) {
        int n = rowMajor.length / features;
        List<String> samples = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            samples.add("s" + (i + 1));
        }
        List<String> names = new ArrayList<>();
        for (int j = 0; j < features; j++) {
            names.add(String.valueOf((char) ('a' + j)));
        }
        return new DataMatrix(samples, names, rowMajor);
    }

    private static Preparation prep(MissingPolicy m, boolean log2, Scale s, int top) {
        return new Preparation(m, log2, s, top);
    }

    @Test
    void zscoreUsesThePopulationStandardDeviation() {
        // a = {1, 2, 3}: mean 2, population SD sqrt(2/3), so z = -+sqrt(3/2) = -+1.2247448713915890 and 0.
        // b = {2, 4, 12}: mean 6, SD sqrt((16 + 4 + 36) / 3) = sqrt(56/3), z(12) = 6 / sqrt(56/3) = 1.3887301496588270.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(table(2, 1, 2, 2, 4, 3, 12));
        double r = Math.sqrt(1.5);
        assertArrayEquals(new double[] {-r, -4 / Math.sqrt(56.0 / 3), 0, -2 / Math.sqrt(56.0 / 3), r,
            1.3887301496588270}, p.matrix().rowMajorCopy(), 1e-15);
    }

    @Test
    void robustScalingDividesByQnAndFallsBackToTheStandardDeviationWhereQnIsZero() {
        // a = {1, 2, 3, 4, 5}: median 3; Qn's k = C(3, 2) = 3 (h = 5/2 + 1 = 3), and the sorted pairwise distances
        // are 1, 1, 1, 1, 2, ..., so the third is 1 and Qn = 1 / (sqrt(2) * Phi^-1(5/8)) = 2.2191444659850757
        // (Rousseeuw & Croux 1993, eq. for Qn; the factor to 16 digits from scipy.stats.norm.ppf(0.625)).
        // b = {0, 0, 1, 1, 1}: 1 + 3 = 4 pairs tie, so the third smallest distance is 0 and Qn = 0: b is divided by
        // its population SD sqrt(0.24) (mean 0.6; (2 * 0.36 + 3 * 0.16) / 5 = 0.24) after subtracting its median 1.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.ROBUST, 0)
                .apply(table(2, 1, 0, 2, 0, 3, 1, 4, 1, 5, 1));
        double q = 2.2191444659850757;
        double sd = Math.sqrt(0.24);
        assertArrayEquals(new double[] {-2 / q, -1 / sd, -1 / q, -1 / sd, 0, 0, 1 / q, 0, 2 / q, 0},
                p.matrix().rowMajorCopy(), 1e-15);
        assertTrue(p.report().steps().contains(Scale.ROBUST.sentence()));
    }

    @Test
    void robustScalingOfHugeValuesAndOfAnAllConstantTable() {
        // a = {1, 2, 3, 4, 1e308}: median 3, the third smallest pairwise distance 1, so Qn = 2.2191444659850757 and
        // 1e308 becomes (1e308 - 3) / Qn = 4.506e307, finite (the power-of-two step keeps the differences in range).
        double q = 2.2191444659850757;
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.ROBUST, 0).apply(table(1, 1, 2, 3, 4, 1e308));
        assertArrayEquals(new double[] {-2 / q, -1 / q, 0, 1 / q, 1e308 / q}, p.matrix().rowMajorCopy(), 1e293);
        InputException e = assertThrows(InputException.class,
                () -> prep(MissingPolicy.ERROR, false, Scale.ROBUST, 0).apply(table(2, 1, 2, 1, 2)));
        assertTrue(e.getMessage().contains("so --scale robust leaves nothing to cluster"), e.getMessage());
    }

    @Test
    void robustScalingKeepsTheSeparationOfTwoModesThatZscoresShrink() {
        // c = {0, 0.1, 0.2, 10, 10.1, 10.2}: two modes 10 apart. n = 6, h = 4, k = C(4, 2) = 6: the six distances
        // within the modes are 0.1 (four times) and 0.2 (twice), so the sixth is 0.2 and Qn = 0.2 * 2.2191444659850757.
        // The modes end (10 - 0.2) / Qn = 22.08 apart; as z-scores (population SD 5.000667, numpy std) only 1.96 apart.
        Prepared robust = prep(MissingPolicy.ERROR, false, Scale.ROBUST, 0).apply(table(1, 0, 0.1, 0.2, 10, 10.1, 10.2));
        Prepared z = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(table(1, 0, 0.1, 0.2, 10, 10.1, 10.2));
        double[] r = robust.matrix().rowMajorCopy();
        double[] s = z.matrix().rowMajorCopy();
        assertEquals(9.8 / (0.2 * 2.2191444659850757), r[3] - r[2], 1e-9);
        assertEquals(9.8 / 5.000666622228147, s[3] - s[2], 1e-9);
    }

    @Test
    void centerSubtractsTheMeanAndLeavesConstantFeaturesAtExactZero() {
        // a = {1, 2, 6}: mean 3. b = {0.1, 0.1, 0.1} is constant: its mean is taken as 0.1 exactly.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.CENTER, 0).apply(table(2, 1, 0.1, 2, 0.1, 6, 0.1));
        assertArrayEquals(new double[] {-2, 0, -1, 0, 3, 0}, p.matrix().rowMajorCopy(), 0.0);
        assertTrue(p.report().droppedFeatures().isEmpty());
    }

    @Test
    void log2OfXPlusOne() {
        // log2(0 + 1) = 0, log2(1 + 1) = 1, log2(3 + 1) = 2, log2(7 + 1) = 3.
        Prepared p = prep(MissingPolicy.ERROR, true, Scale.NONE, 0).apply(table(2, 0, 1, 3, 7));
        assertArrayEquals(new double[] {0, 1, 2, 3}, p.matrix().rowMajorCopy(), 1e-15);
    }

    @Test
    void negativeValuesAreRefusedUnderLog2EvenAboveMinusOne() {
        InputException e = assertThrows(InputException.class,
                () -> prep(MissingPolicy.ERROR, true, Scale.NONE, 0).apply(table(2, 1, 2, 3, -0.5)));
        assertEquals("input: -0.5 is negative (sample 's2', feature 'b'); --log2 takes log2(x + 1), which needs"
                + " values >= 0", e.getMessage());
    }

    @Test
    void missingValuesAreImputedBeforeLog2() {
        // a = {1, NA, 3}: the median 2 is imputed, then log2(2 + 1) = 1.5849625007211563 (the median of the logs
        // would have been (1 + 2) / 2 = 1.5).
        Prepared p = prep(MissingPolicy.IMPUTE_MEDIAN, true, Scale.NONE, 0).apply(table(1, 1, NA, 3));
        assertEquals(1.5849625007211563, p.matrix().get(1, 0), 1e-15);
        assertEquals(1, p.report().imputedCells());
        assertEquals(1, p.report().imputedFeatures());
        assertEquals(1, p.report().missingCells());
    }

    @Test
    void topVariableIsChosenAfterLog2() {
        // a = {1, 3, 7}: raw variance 56/9 = 6.22, after log2(x + 1) {1, 2, 3} variance 2/3.
        // b = {0, 0, 3}: raw variance 2, after log2 {0, 0, 2} variance 8/9. So b is the most variable after log2.
        DataMatrix m = table(2, 1, 0, 3, 0, 7, 3);
        assertEquals(List.of("b"), prep(MissingPolicy.ERROR, true, Scale.NONE, 1).apply(m).matrix().featureNames());
        assertEquals(List.of("a"), prep(MissingPolicy.ERROR, false, Scale.NONE, 1).apply(m).matrix().featureNames());
    }

    @Test
    void topVariableBreaksTiesByInputOrderAndKeepsInputOrder() {
        // a {5, 5, 5} var 0; b {1, 2, 3} var 2/3; c {0, 10, 20} var 200/3; d {4, 5, 6} var 2/3 (tied with b).
        DataMatrix m = table(4, 5, 1, 0, 4, 5, 2, 10, 5, 5, 3, 20, 6);
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.NONE, 2).apply(m);
        assertEquals(List.of("b", "c"), p.matrix().featureNames());
        PreparationReport.TopVariable t = p.report().topVariable().orElseThrow();
        assertEquals(List.of("b", "c"), t.kept());
        assertEquals(2.0 / 3, t.cutoffVariance(), 1e-15);
        assertTrue(t.tieAtCutoff());
        assertEquals(4, t.candidates());
        assertEquals(2, p.report().features());
    }

    @Test
    void topVariableLargerThanTheFeatureCountKeepsAllAndSaysSo() {
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.NONE, 10).apply(table(2, 1, 2, 3, 5));
        PreparationReport.TopVariable t = p.report().topVariable().orElseThrow();
        assertEquals(10, t.requested());
        assertEquals(List.of("a", "b"), t.kept());
        assertFalse(t.tieAtCutoff());
        assertEquals(Optional.empty(), prep(MissingPolicy.ERROR, false, Scale.NONE, 0).apply(table(1, 1, 2))
                .report().topVariable());
    }

    @Test
    void zscoreDropsConstantFeaturesAfterTopVariableAndReportsThem() {
        // a {1, 2, 4} variance 42/27, b {7, 7, 7} constant, c {0, 5, 1} variance 14/3. The top 2 are {a, c}, so
        // z-scoring has nothing to drop; with all three kept, z-scoring drops b as constant.
        DataMatrix m = table(3, 1, 7, 0, 2, 7, 5, 4, 7, 1);
        assertTrue(prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 2).apply(m).report().droppedFeatures().isEmpty());
        Prepared all = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(m);
        assertEquals(List.of("a", "c"), all.matrix().featureNames());
        assertEquals(List.of(new PreparationReport.Removal("b", PreparationReport.Reason.CONSTANT, 0)),
                all.report().droppedFeatures());
        InputException e = assertThrows(InputException.class,
                () -> prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(table(2, 1, 2, 1, 2)));
        assertTrue(e.getMessage().contains("every feature is constant"), e.getMessage());
    }

    @Test
    void errorPolicyCountsMissingCellsAndNamesTheFirstInReadingOrder() {
        DataMatrix m = table(2, 1, NA, NA, 4, 5, 6);
        InputException e = assertThrows(InputException.class, () -> Preparation.asRead().apply(m));
        assertEquals("input: missing value (sample 's1', feature 'b'), the first of 2; choose --missing drop-features,"
                + " drop-samples or impute-median to go on", e.getMessage());
        // In a feature-by-sample source the file is read feature by feature: the first is (s2, a).
        CellLocator featureMajor = new CellLocator() {
            @Override
            public String source() {
                return "t.csv";
            }

            @Override
            public String locate(String sampleId, String featureName) {
                return "t.csv@" + sampleId + "/" + featureName;
            }

            @Override
            public boolean featureMajor() {
                return true;
            }
        };
        e = assertThrows(InputException.class, () -> Preparation.asRead().apply(m, featureMajor));
        assertTrue(e.getMessage().startsWith("t.csv@s2/a: missing value (sample 's2', feature 'a')"), e.getMessage());
    }

    @Test
    void dropFeaturesAndDropSamplesReportWhatTheyDropped() {
        // s1 {1, NA, 3}, s2 {4, 5, NA}, s3 {7, 8, 9}, s4 {1, 2, 3}.
        DataMatrix m = table(3, 1, NA, 3, 4, 5, NA, 7, 8, 9, 1, 2, 3);
        Prepared f = prep(MissingPolicy.DROP_FEATURES, false, Scale.NONE, 0).apply(m);
        assertEquals(List.of("a"), f.matrix().featureNames());
        assertEquals(List.of(new PreparationReport.Removal("b", PreparationReport.Reason.MISSING_VALUES, 1),
                new PreparationReport.Removal("c", PreparationReport.Reason.MISSING_VALUES, 1)),
                f.report().droppedFeatures());
        Prepared s = prep(MissingPolicy.DROP_SAMPLES, false, Scale.NONE, 0).apply(m);
        assertEquals(List.of("s3", "s4"), s.matrix().sampleIds());
        assertArrayEquals(new double[] {7, 8, 9, 1, 2, 3}, s.matrix().rowMajorCopy(), 0.0);
        assertEquals(List.of("s1", "s2"), s.report().droppedSamples().stream().map(PreparationReport.Removal::name)
                .toList());
        assertEquals(2, s.report().missingCells());
        InputException e = assertThrows(InputException.class,
                () -> prep(MissingPolicy.DROP_SAMPLES, false, Scale.NONE, 0).apply(table(1, NA, 1, NA)));
        assertTrue(e.getMessage().contains("leaves 1 of 3 samples"), e.getMessage());
    }

    @Test
    void imputeMedianDropsFeaturesWithNothingObserved() {
        // a {1, NA, 4, 10}: median of {1, 4, 10} = 4. b all missing: dropped. c {NA, 2, 3, NA}: median 2.5.
        DataMatrix m = table(3, 1, NA, NA, NA, NA, 2, 4, NA, 3, 10, NA, NA);
        Prepared p = prep(MissingPolicy.IMPUTE_MEDIAN, false, Scale.NONE, 0).apply(m);
        assertEquals(List.of("a", "c"), p.matrix().featureNames());
        assertArrayEquals(new double[] {1, 2.5, 4, 2, 4, 3, 10, 2.5}, p.matrix().rowMajorCopy(), 0.0);
        assertEquals(List.of(new PreparationReport.Removal("b", PreparationReport.Reason.NO_OBSERVED_VALUES, 4)),
                p.report().droppedFeatures());
        assertEquals(3, p.report().imputedCells());
        assertEquals(2, p.report().imputedFeatures());
    }

    @Test
    void tooFewSamplesOrNoFeaturesAreRefused() {
        assertThrows(InputException.class, () -> Preparation.asRead().apply(table(2, 1, 2)));
        assertThrows(InputException.class,
                () -> Preparation.asRead().apply(new DataMatrix(List.of("x", "y"), List.of(), new double[0])));
        InputException e = assertThrows(InputException.class, () -> prep(MissingPolicy.ERROR, false, Scale.NONE, -1));
        assertTrue(e.getMessage().startsWith("--top-variable"), e.getMessage());
    }

    @Test
    void theInputIsNeverChanged() {
        DataMatrix m = table(2, 1, NA, 3, 4, 5, 6);
        double[] before = m.rowMajorCopy();
        prep(MissingPolicy.IMPUTE_MEDIAN, true, Scale.ZSCORE, 1).apply(m);
        assertArrayEquals(before, m.rowMajorCopy(), 0.0);
    }

    @Test
    void zscoresHaveMeanZeroAndUnitVarianceOnRandomTables() {
        var rng = new SplittableRandom(7);
        for (int trial = 0; trial < 200; trial++) {
            int n = 2 + rng.nextInt(30), p = 1 + rng.nextInt(10);
            double[] v = new double[n * p];
            for (int k = 0; k < v.length; k++) {
                v[k] = rng.nextInt(5) == 0 ? NA : Math.exp(rng.nextDouble(-5, 5)) * (rng.nextBoolean() ? 100 : 1);
            }
            DataMatrix m = table(p, v);
            Prepared out;
            try {
                out = prep(MissingPolicy.IMPUTE_MEDIAN, true, Scale.ZSCORE, rng.nextInt(p + 2)).apply(m);
            } catch (InputException e) {
                continue; // e.g. every feature constant after imputation: allowed, and tested above
            }
            DataMatrix z = out.matrix();
            for (int j = 0; j < z.features(); j++) {
                double[] c = z.column(j);
                double mean = Arrays.stream(c).average().orElseThrow();
                double var = Arrays.stream(c).map(x -> (x - mean) * (x - mean)).sum() / c.length;
                assertEquals(0, mean, 1e-12);
                assertEquals(1, var, 1e-12);
            }
            PreparationReport r = out.report();
            assertEquals(n, r.samples());
            assertEquals(0, z.missingCount());
        }
    }

    @Test
    void userNames() {
        for (MissingPolicy p : MissingPolicy.values()) {
            assertEquals(p, MissingPolicy.fromUserName(p.userName()));
        }
        for (Scale s : Scale.values()) {
            assertEquals(s, Scale.fromUserName(s.userName()));
        }
        assertEquals(Scale.ZSCORE, Scale.fromUserName("Standardise"));
        assertEquals(MissingPolicy.DROP_SAMPLES, MissingPolicy.fromUserName(" drop_samples "));
        assertThrows(InputException.class, () -> MissingPolicy.fromUserName("impute"));
        assertThrows(InputException.class, () -> Scale.fromUserName("minmax"));
    }

    @Test
    void zscoreOfAFeatureHoldingOneHugeValueIsComputedNotZeroed() {
        // a = {1, 1e308, 2, 3, 4}: mean m = 2e307 + 2; deviations -2e307 (four times, to 1 part in 1e307) and 8e307;
        // population SD sqrt((4 * 4e614 + 64e614) / 5) = 4e307; so z = -0.5, 2, -0.5, -0.5, -0.5 (worked by hand).
        // Before, (x - m)^2 overflowed to infinity, the SD was infinite and every z-score became 0.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(table(1, 1, 1e308, 2, 3, 4));
        assertArrayEquals(new double[] {-0.5, 2, -0.5, -0.5, -0.5}, p.matrix().rowMajorCopy(), 1e-12);
        assertTrue(p.report().steps().contains(Scale.ZSCORE.sentence()));
    }

    @Test
    void zscoreOfSubnormalValuesEqualsThatOfTheSameValuesAtOrdinaryScale() {
        // z-scores do not change when a feature is multiplied by a constant, so {1, 2, 3, 1, 5} x 1e-310 has the
        // z-scores of {1, 2, 3, 1, 5}: mean 2.4, population variance 11.2 / 5 = 2.24. Before, the squares underflowed
        // to 0, the SD was 0 and the values became infinite.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0)
                .apply(table(1, 1e-310, 2e-310, 3e-310, 1e-310, 5e-310));
        double sd = Math.sqrt(2.24);
        double[] expected = {-1.4 / sd, -0.4 / sd, 0.6 / sd, -1.4 / sd, 2.6 / sd};
        // 1e-310 holds about 44 significant bits, so agreement to 1e-9 is what the input allows.
        assertArrayEquals(expected, p.matrix().rowMajorCopy(), 1e-9);
    }

    @Test
    void centringTheLargestDoublesIsExactOrRefusedAtTheCell() {
        // {1e308, 1e308, -1e308}: the plain sum overflows; the mean is 1e308 / 3 and the centred values fit.
        Prepared p = prep(MissingPolicy.ERROR, false, Scale.CENTER, 0).apply(table(1, 1e308, 1e308, -1e308));
        double m = 1e308 / 3;
        assertArrayEquals(new double[] {1e308 - m, 1e308 - m, -1e308 - m}, p.matrix().rowMajorCopy(), 1e295);
        // {1.7e308, -1.7e308, -1.7e308}: mean -0.567e308, and 1.7e308 - mean exceeds the largest double.
        InputException e = assertThrows(InputException.class, () -> prep(MissingPolicy.ERROR, false, Scale.CENTER, 0)
                .apply(table(1, 1.7e308, -1.7e308, -1.7e308)));
        assertTrue(e.getMessage().contains("centring makes this value (sample 's1', feature 'a') too large"),
                e.getMessage());
    }

    @Test
    void scalingOrdinaryValuesGivesTheSameBitsAsThePlainFormula() {
        // Dividing by a power of two is exact, so the stable z-scores equal (x - mean) / sd computed directly.
        SplittableRandom rng = new SplittableRandom(3);
        double[] x = new double[40];
        for (int i = 0; i < x.length; i++) {
            x[i] = rng.nextDouble() * 1000 - 300;
        }
        double[] z = prep(MissingPolicy.ERROR, false, Scale.ZSCORE, 0).apply(table(1, x)).matrix().rowMajorCopy();
        double sum = 0;
        for (double v : x) {
            sum += v;
        }
        double mean = sum / x.length;
        double residual = 0;
        for (double v : x) {
            residual += v - mean;
        }
        mean += residual / x.length;
        double ss = 0;
        for (double v : x) {
            ss += (v - mean) * (v - mean);
        }
        double sd = Math.sqrt(ss / x.length);
        for (int i = 0; i < x.length; i++) {
            assertEquals((x[i] - mean) / sd, z[i], 0.0);
        }
    }
}
