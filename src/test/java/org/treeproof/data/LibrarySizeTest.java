package org.treeproof.data;

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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Library-size scaling on a table worked by hand, and against numpy's computation of the published formulas
 * ({@code src/test/resources/reference/data/library_size_reference.py}: Anders and Huber 2010, equation 5; the total
 * count scaling described by Dillies et al. 2013).
 */
class LibrarySizeTest {

    /**
     * Three samples, five features. Features a, b and d are above 0 in every sample; their geometric means are
     * (10 * 20 * 5)^(1/3) = 10, (20 * 40 * 10)^(1/3) = 20 and (40 * 80 * 20)^(1/3) = 40; c has a 0, so it takes no
     * part; e = 30 everywhere, geometric mean 30. Ratios: s1 {1, 1, 1, 1}, median 1; s2 {2, 2, 2, 1}, median 2;
     * s3 {0.5, 0.5, 0.5, 1}, median 0.5 (e, which differs from the others, does not move the medians).
     * Totals: 100, 175 and 66, mean 341/3, so the total-count factors are 300/341, 525/341 and 198/341.
     */
    private static DataMatrix handTable() {
        return new DataMatrix(List.of("s1", "s2", "s3"), List.of("a", "b", "c", "d", "e"), new double[] {
            10, 20, 0, 40, 30,
            20, 40, 5, 80, 30,
            5, 10, 1, 20, 30});
    }

    private static Preparation with(LibrarySize l, boolean log2) {
        return new Preparation(MissingPolicy.ERROR, l, log2, Scale.NONE, 0);
    }

    @Test
    void medianRatioFactorsByHand() {
        Prepared p = with(LibrarySize.MEDIAN_RATIO, false).apply(handTable());
        PreparationReport.SizeFactors f = p.report().sizeFactors().orElseThrow();
        assertEquals(List.of("s1", "s2", "s3"), f.samples());
        assertArrayEquals(new double[] {1, 2, 0.5}, f.factors().stream().mapToDouble(Double::doubleValue).toArray(),
                1e-14);
        assertArrayEquals(new double[] {10, 20, 0, 40, 30, 10, 20, 2.5, 40, 15, 10, 20, 2, 40, 60},
                p.matrix().rowMajorCopy(), 1e-12);
    }

    @Test
    void totalCountFactorsByHand() {
        Prepared p = with(LibrarySize.TOTAL, false).apply(handTable());
        double[] f = p.report().sizeFactors().orElseThrow().factors().stream().mapToDouble(Double::doubleValue)
                .toArray();
        assertArrayEquals(new double[] {300.0 / 341, 525.0 / 341, 198.0 / 341}, f, 1e-14);
        // every sample now sums to the mean total 341/3
        double[] v = p.matrix().rowMajorCopy();
        for (int i = 0; i < 3; i++) {
            double s = 0;
            for (int j = 0; j < 5; j++) {
                s += v[i * 5 + j];
            }
            assertEquals(341.0 / 3, s, 1e-12);
        }
    }

    @Test
    void scalingComesBeforeLog2() {
        // s2 / 2 = {10, 20, 2.5, 40, 15}; log2(x + 1) of 2.5 is log2(3.5)
        Prepared p = with(LibrarySize.MEDIAN_RATIO, true).apply(handTable());
        assertEquals(Math.log(3.5) / Math.log(2), p.matrix().rowMajorCopy()[7], 1e-14);
        assertEquals(List.of("Read 3 samples and 5 features.",
                "Divided each sample's counts by its size factor from the median-ratio method (Anders & Huber, 2010;"
                        + " size factors from 0.500 ('s3') to 2.00 ('s2')).",
                "Transformed every value to log2(x + 1).",
                "Left the features on their own scales (no scaling).",
                "Clustered 3 samples on 5 features."), p.report().steps());
    }

    @Test
    void noneLeavesTheCountsAndReportsNoFactors() {
        Prepared p = with(LibrarySize.NONE, false).apply(handTable());
        assertArrayEquals(handTable().rowMajorCopy(), p.matrix().rowMajorCopy(), 0);
        assertTrue(p.report().sizeFactors().isEmpty());
    }

    @Test
    void refusesNegativeValuesNamingTheCell() {
        DataMatrix m = new DataMatrix(List.of("s1", "s2"), List.of("a", "b"), new double[] {1, 2, -3, 4});
        InputException e = assertThrows(InputException.class, () -> with(LibrarySize.TOTAL, false)
                .apply(m, CellLocator.unplaced("counts.csv")));
        assertTrue(e.getMessage().contains("-3.0 is negative (sample 's2', feature 'a')"), e.getMessage());
        assertTrue(e.getMessage().contains("--library-size total scales counts"), e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(strings = {"total", "median-ratio"})
    void refusesASampleWithoutCountsNamingIt(String method) {
        // under median-ratio the empty sample is the cause of "no feature above 0 everywhere", and is named as such
        DataMatrix m = new DataMatrix(List.of("s1", "s2"), List.of("a", "b"), new double[] {1, 2, 0, 0});
        InputException e = assertThrows(InputException.class, () -> with(LibrarySize.fromUserName(method), false)
                .apply(m));
        assertEquals("input: sample 's2' has no counts (every value is 0), so --library-size " + method + " cannot"
                + " scale it; remove the sample from the table", e.getMessage());
    }

    @Test
    void overflowAdvisesDroppingTheOptionNotLog2() {
        // factors 2e308 / mean ~ 2 and 1 / mean: the small sample's 1e308 is divided by about 1/1e308 * ... -> inf
        DataMatrix m = new DataMatrix(List.of("s1", "s2"), List.of("a", "b"), new double[] {1e308, 1e308, 1, 1});
        InputException e = assertThrows(InputException.class, () -> with(LibrarySize.TOTAL, true).apply(m));
        assertTrue(e.getMessage().endsWith("too large for a double; values this large are not read counts; drop"
                + " --library-size"), e.getMessage());
    }

    @Test
    void refusesMedianRatioWithoutAFeatureAboveZeroEverywhere() {
        DataMatrix m = new DataMatrix(List.of("s1", "s2"), List.of("a", "b"), new double[] {0, 2, 3, 0});
        InputException e = assertThrows(InputException.class, () -> with(LibrarySize.MEDIAN_RATIO, false).apply(m));
        assertTrue(e.getMessage().contains("no feature is above 0 in every sample"), e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(strings = {"median-ratio", "total"})
    void matchesNumpyOnNegativeBinomialCounts(String method) throws IOException {
        JsonNode ref;
        try (InputStream in = getClass().getResourceAsStream("/reference/data/library_size_reference.json")) {
            ref = new ObjectMapper().readTree(in);
        }
        List<String> samples = strings(ref.get("samples"));
        List<String> features = strings(ref.get("features"));
        DataMatrix raw = new DataMatrix(samples, features, flat(ref.get("counts")));
        Prepared p = with(LibrarySize.fromUserName(method), false).apply(raw);
        double[] expected = new double[samples.size()];
        for (int i = 0; i < expected.length; i++) {
            expected[i] = ref.get(method).get("factors").get(i).asDouble();
        }
        double[] got = p.report().sizeFactors().orElseThrow().factors().stream().mapToDouble(Double::doubleValue)
                .toArray();
        // numpy's median and sums may round differently in the last bits
        assertArrayEquals(expected, got, 1e-12);
        assertArrayEquals(flat(ref.get(method).get("scaled")), p.matrix().rowMajorCopy(), 1e-9);
    }

    @Test
    void countTotalsAreNotedOnlyForWholeNumbersUnderLog2WithoutScaling() {
        Preparation log2Only = with(LibrarySize.NONE, true);
        PreparationReport.Totals t = log2Only.apply(handTable()).report().countTotals().orElseThrow();
        assertEquals(66, t.smallest());
        assertEquals("s3", t.smallestSample());
        assertEquals(175, t.largest());
        assertEquals("s2", t.largestSample());
        assertTrue(t.uneven());   // 175 / 66 = 2.65 >= 2
        assertTrue(with(LibrarySize.MEDIAN_RATIO, true).apply(handTable()).report().countTotals().isEmpty());
        assertTrue(with(LibrarySize.NONE, false).apply(handTable()).report().countTotals().isEmpty());
        DataMatrix fractions = new DataMatrix(List.of("s1", "s2"), List.of("a"), new double[] {0.5, 3});
        assertTrue(log2Only.apply(fractions).report().countTotals().isEmpty());
        DataMatrix even = new DataMatrix(List.of("s1", "s2"), List.of("a", "b"), new double[] {10, 9, 11, 8});
        assertFalse(log2Only.apply(even).report().countTotals().orElseThrow().uneven());   // 19 and 19
    }

    @Test
    void userNames() {
        assertEquals(LibrarySize.MEDIAN_RATIO, LibrarySize.fromUserName(" Median-Ratio "));
        assertEquals("none, total, median-ratio", LibrarySize.names());
        InputException e = assertThrows(InputException.class, () -> LibrarySize.fromUserName("cpm"));
        assertEquals("unknown library-size method 'cpm'; use one of none, total, median-ratio", e.getMessage());
    }

    private static List<String> strings(JsonNode a) {
        var out = new ArrayList<String>();
        a.forEach(n -> out.add(n.asText()));
        return out;
    }

    private static double[] flat(JsonNode rows) {
        var out = new ArrayList<Double>();
        rows.forEach(r -> r.forEach(v -> out.add(v.asDouble())));
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
