package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.treeproof.data.DataMatrix;

/**
 * Every metric against {@code scipy.spatial.distance.pdist} (SciPy 1.10.1, NumPy 1.24.2; versions are
 * read from the fixture) on seeded random data written by
 * {@code src/test/resources/reference/distance/make_reference.py}. Spearman's reference is pdist
 * 'correlation' on {@code scipy.stats.rankdata} average ranks, checked in the script against
 * {@code scipy.stats.spearmanr}.
 *
 * <p>Tolerances: 1e-12 relative for all metrics. For cosine, Pearson and Spearman, which are 1 minus a
 * similarity and so lose relative accuracy as the distance nears 0, an absolute 1e-12 is allowed as
 * well (the similarity itself is computed to a few ulp; SciPy divides the dot product by the norms,
 * treeproof takes the dot product of rows already scaled to unit length). Jaccard and Hamming are ratios
 * of exact counts, so they must match to the bit.
 */
class MetricScipyReferenceTest {
    private static final double RELATIVE = 1e-12;
    private static final double ABSOLUTE_NEAR_ZERO = 1e-12;

    private static JsonNode fixture() throws IOException {
        try (InputStream in = MetricScipyReferenceTest.class.getResourceAsStream("/reference/distance/pdist_reference.json")) {
            assertTrue(in != null, "fixture pdist_reference.json on the test class path");
            return new ObjectMapper().readTree(in);
        }
    }

    private static DataMatrix matrix(JsonNode set) {
        int n = set.get("samples").asInt();
        int p = set.get("features").asInt();
        double[] v = new double[n * p];
        JsonNode rows = set.get("data");
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                v[i * p + j] = rows.get(i).get(j).doubleValue();
            }
        }
        List<String> ids = IntStream.range(0, n).mapToObj(i -> "s" + i).toList();
        List<String> names = IntStream.range(0, p).mapToObj(j -> "f" + j).toList();
        return new DataMatrix(ids, names, v);
    }

    @Test
    void fixtureRecordsTheLibraryVersions() throws IOException {
        JsonNode doc = fixture();
        // the brief for these references: SciPy 1.10's definitions, in particular jaccard's 0/0 case
        assertEquals("1.10.1", doc.get("scipy").asText());
        assertTrue(doc.get("numpy").asText().startsWith("1."));
    }

    @TestFactory
    Stream<DynamicTest> agreesWithScipyPdist() throws IOException {
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonNode set : fixture().get("datasets")) {
            DataMatrix data = matrix(set);
            JsonNode idx = set.get("featureIndices");
            int[] features = idx.isNull() ? null : IntStream.range(0, idx.size()).map(k -> idx.get(k).asInt()).toArray();
            set.get("distances").fields().forEachRemaining(e -> {
                // scipy's names: cityblock and correlation are our aliases for manhattan and pearson
                Metric metric = Metric.parse(e.getKey());
                tests.add(DynamicTest.dynamicTest(set.get("name").asText() + " / " + e.getKey(),
                        () -> check(metric, data, features, e.getValue())));
            });
        }
        assertTrue(tests.size() >= 40, "fixture holds all datasets");
        return tests.stream();
    }

    private static void check(Metric metric, DataMatrix data, int[] features, JsonNode expected) {
        CondensedDistances d = features == null ? metric.compute(data, 2) : metric.compute(data, features, 2);
        assertEquals(expected.size(), CondensedDistances.length(d.size()));
        boolean exactCounts = metric == Metric.JACCARD || metric == Metric.HAMMING;
        boolean oneMinusSimilarity = metric == Metric.COSINE || metric == Metric.PEARSON || metric == Metric.SPEARMAN;
        for (int t = 0; t < expected.size(); t++) {
            double want = expected.get(t).doubleValue();
            double got = d.at(t);
            if (exactCounts) {
                assertEquals(want, got, 0.0, metric + " at condensed position " + t);
            } else {
                double tol = RELATIVE * Math.abs(want) + (oneMinusSimilarity ? ABSOLUTE_NEAR_ZERO : 0.0);
                assertEquals(want, got, tol, metric + " at condensed position " + t);
            }
        }
    }
}
