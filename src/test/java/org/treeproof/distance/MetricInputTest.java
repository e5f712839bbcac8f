package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/** Names the user types, and data a metric cannot take: each refusal names the sample (and feature). */
class MetricInputTest {
    private static DataMatrix matrix(double[][] rows) {
        int p = rows[0].length;
        double[] v = new double[rows.length * p];
        for (int i = 0; i < rows.length; i++) {
            System.arraycopy(rows[i], 0, v, i * p, p);
        }
        List<String> ids = List.of("alpha", "beta", "gamma", "delta").subList(0, rows.length);
        List<String> names = List.of("g1", "g2", "g3", "g4").subList(0, p);
        return new DataMatrix(ids, names, v);
    }

    private static void assertRefused(Metric metric, DataMatrix data, String... fragments) {
        InputException e = assertThrows(InputException.class, () -> metric.compute(data, 2));
        for (String f : fragments) {
            assertTrue(e.getMessage().contains(f), e.getMessage() + " should contain " + f);
        }
        assertTrue(!e.getMessage().contains("\n"), "one line");
    }

    @Test
    void parsesNamesAndAliasesIgnoringCase() {
        assertEquals(Metric.EUCLIDEAN, Metric.parse("Euclidean"));
        assertEquals(Metric.SQEUCLIDEAN, Metric.parse("SQEUCLIDEAN"));
        assertEquals(Metric.MANHATTAN, Metric.parse("cityblock"));
        assertEquals(Metric.MANHATTAN, Metric.parse(" Manhattan "));
        assertEquals(Metric.CHEBYSHEV, Metric.parse("chebyshev"));
        assertEquals(Metric.COSINE, Metric.parse("COSINE"));
        assertEquals(Metric.PEARSON, Metric.parse("Correlation"));
        assertEquals(Metric.PEARSON, Metric.parse("pearson"));
        assertEquals(Metric.SPEARMAN, Metric.parse("Spearman"));
        assertEquals(Metric.JACCARD, Metric.parse("jaccard"));
        assertEquals(Metric.HAMMING, Metric.parse("HAMMING"));
        for (Metric m : Metric.values()) {
            assertEquals(m, Metric.parse(m.id()));
            for (String alias : m.aliases()) {
                assertEquals(m, Metric.parse(alias.toUpperCase(java.util.Locale.ROOT)));
            }
        }
    }

    @Test
    void unknownNameListsTheValidOnes() {
        InputException e = assertThrows(InputException.class, () -> Metric.parse("eucldean"));
        assertTrue(e.getMessage().contains("'eucldean'"), e.getMessage());
        for (Metric m : Metric.values()) {
            assertTrue(e.getMessage().contains(m.id()), e.getMessage());
        }
        assertTrue(e.getMessage().contains("cityblock") && e.getMessage().contains("correlation"), e.getMessage());
    }

    @Test
    void missingValueIsRefusedNamingSampleAndFeature() {
        DataMatrix data = matrix(new double[][] {{1, 2, 3}, {4, Double.NaN, 6}, {7, 8, 9}});
        for (Metric m : List.of(Metric.EUCLIDEAN, Metric.PEARSON, Metric.SPEARMAN, Metric.COSINE, Metric.CHEBYSHEV)) {
            assertRefused(m, data, "'beta'", "'g2'", "missing");
        }
        assertRefused(Metric.MANHATTAN, matrix(new double[][] {{1, 2}, {3, Double.POSITIVE_INFINITY}}), "'beta'", "'g2'", "infinite");
    }

    @Test
    void missingValueOutsideTheSelectedFeaturesDoesNotMatter() {
        DataMatrix data = matrix(new double[][] {{1, 2, 3}, {4, Double.NaN, 6}, {7, 8, 9}});
        CondensedDistances d = Metric.EUCLIDEAN.compute(data, new int[] {2, 0}, 1);
        assertEquals(Math.sqrt(18), d.get(0, 1), 1e-15);
        InputException e = assertThrows(InputException.class, () -> Metric.EUCLIDEAN.compute(data, new int[] {1}, 1));
        assertTrue(e.getMessage().contains("'beta'") && e.getMessage().contains("'g2'"), e.getMessage());
    }

    @Test
    void binaryMetricsRefuseOtherValues() {
        DataMatrix data = matrix(new double[][] {{1, 0, 1}, {0, 1, 0}, {1, 0.5, 0}});
        assertRefused(Metric.JACCARD, data, "'gamma'", "'g2'", "0.5", "0/1");
        assertRefused(Metric.HAMMING, data, "'gamma'", "'g2'", "0/1");
        assertRefused(Metric.JACCARD, matrix(new double[][] {{1, 0}, {2, 1}}), "'beta'", "'g1'");
    }

    @Test
    void correlationMetricsRefuseRowsWithoutSpread() {
        DataMatrix data = matrix(new double[][] {{1, 2, 3}, {0.1, 0.1, 0.1}, {3, 1, 2}});
        assertRefused(Metric.PEARSON, data, "'beta'", "same value");
        assertRefused(Metric.SPEARMAN, data, "'beta'", "same value");
        // constant only over the selected features
        DataMatrix partly = matrix(new double[][] {{1, 2, 3}, {5, 5, 6}, {3, 1, 2}});
        assertEquals(3, Metric.PEARSON.compute(partly, 1).size());
        InputException e = assertThrows(InputException.class, () -> Metric.PEARSON.compute(partly, new int[] {0, 1}, 1));
        assertTrue(e.getMessage().contains("'beta'") && e.getMessage().contains("2 features"), e.getMessage());
    }

    @Test
    void cosineRefusesAllZeroRows() {
        assertRefused(Metric.COSINE, matrix(new double[][] {{1, 2}, {3, 4}, {0, -0.0}}), "'gamma'", "zero");
    }

    @Test
    void overflowingDistanceNamesBothSamples() {
        DataMatrix data = matrix(new double[][] {{0, 1}, {1e200, 1}, {-1e200, 1}});
        assertRefused(Metric.SQEUCLIDEAN, data, "'alpha'", "'beta'", "too large");
        // the first overflowing pair in condensed order, whatever the thread count
        assertRefused(Metric.MANHATTAN, matrix(new double[][] {{0, 1}, {1, 1}, {Double.MAX_VALUE, 1}, {-Double.MAX_VALUE, 1}}),
                "'gamma'", "'delta'");
        // the scaled rows of cosine and pearson do not overflow
        assertEquals(2.0, Metric.COSINE.compute(data, 1).get(1, 2), 1e-15);
        assertEquals(0.0, Metric.PEARSON.between(new double[] {1e300, -1e300, 0}, new double[] {1, -1, 0}), 1e-15);
    }

    @Test
    void emptyInputsAreRefused() {
        DataMatrix noFeatures = new DataMatrix(List.of("a", "b"), List.of(), new double[0]);
        assertRefused(Metric.EUCLIDEAN, noFeatures, "no features");
        DataMatrix noSamples = new DataMatrix(List.of(), List.of("f"), new double[0]);
        assertRefused(Metric.EUCLIDEAN, noSamples, "no samples");
        DataMatrix data = matrix(new double[][] {{1, 2}, {3, 4}});
        assertThrows(IllegalArgumentException.class, () -> Metric.EUCLIDEAN.compute(data, new int[0], 1));
        assertThrows(IndexOutOfBoundsException.class, () -> Metric.EUCLIDEAN.compute(data, new int[] {2}, 1));
        assertThrows(IllegalArgumentException.class, () -> Metric.EUCLIDEAN.compute(data, 0));
        assertThrows(IllegalArgumentException.class, () -> Metric.EUCLIDEAN.between(new double[2], new double[3]));
    }
}
