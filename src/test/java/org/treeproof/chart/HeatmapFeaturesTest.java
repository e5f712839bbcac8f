package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;

/**
 * The heat map's columns against scipy 1.10.1 and numpy 1.24.2, values written by
 * {@code reference/chart/make_heatmap_reference.py} into {@code reference/chart/heatmap_features.json}.
 */
class HeatmapFeaturesTest {
    private static final JsonNode REF = json("/reference/chart/heatmap_features.json");

    @Test
    void irisFeaturesClusterAsScipyClustersThem() throws Exception {
        // Fisher (1936) Iris, doi:10.1111/j.1469-1809.1936.tb02137.x, as committed under reference/iris.csv
        DataMatrix iris = iris();
        HeatmapFeatures f = HeatmapFeatures.of(iris, 1);
        assertArrayEquals(new int[] {0, 1, 2, 3}, f.columns());
        assertFalse(f.selected());
        assertTree(REF.get("iris").get("tree"), f.tree());
    }

    @Test
    void moreThanFiveHundredFeaturesKeepTheMostVariableAsNumpyRanksThem() {
        JsonNode sel = REF.get("selection");
        int n = sel.get("samples").asInt();
        int p = sel.get("features").asInt();
        double[] v = new double[n * p];
        for (int t = 0; t < v.length; t++) {
            v[t] = sel.get("values").get(t).asDouble();
        }
        DataMatrix data = new DataMatrix(StudyFixtures.names("s", n), StudyFixtures.names("f", p), v);
        HeatmapFeatures f = HeatmapFeatures.of(data, 2);
        assertArrayEquals(ints(sel.get("chosen")), f.columns());
        assertTrue(f.selected());
        assertEquals(p, f.total());
        // the 500th and 501st variances differ by this much, far beyond rounding: no tie decided the choice
        assertTrue(sel.get("gapAtLimit").asDouble() > 1e-6);
        assertFalse(f.tiedAtLimit());
        assertTree(sel.get("tree"), f.tree());
    }

    @Test
    void equalVariancesAfterZScoringKeepTheFirstFeaturesAndSaySo() {
        // hand-made: every feature is a permutation of the same values, so all variances are equal
        int n = 8;
        int p = HeatmapFeatures.MAX_FEATURES + 20;
        var rnd = new SplittableRandom(4);
        double[] v = new double[n * p];
        for (int j = 0; j < p; j++) {
            int[] perm = IntStream.range(0, n).toArray();
            for (int i = n - 1; i > 0; i--) {
                int s = rnd.nextInt(i + 1);
                int t = perm[i];
                perm[i] = perm[s];
                perm[s] = t;
            }
            for (int i = 0; i < n; i++) {
                v[i * p + j] = perm[i] - 3.5;
            }
        }
        HeatmapFeatures f = HeatmapFeatures.of(new DataMatrix(StudyFixtures.names("s", n),
                StudyFixtures.names("f", p), v), 1);
        assertArrayEquals(IntStream.range(0, HeatmapFeatures.MAX_FEATURES).toArray(), f.columns());
        assertTrue(f.tiedAtLimit());
    }

    @Test
    void missingValuesLeaveTheFeaturesInInputOrderWithoutATree() {
        double[] v = {1, 2, Double.NaN, 4, 5, 6, 7, 8, 9};
        HeatmapFeatures f = HeatmapFeatures.of(new DataMatrix(StudyFixtures.names("s", 3),
                StudyFixtures.names("f", 3), v), 1);
        assertArrayEquals(new int[] {0, 1, 2}, f.columns());
        assertNull(f.tree());
        HeatmapFeatures one = HeatmapFeatures.of(new DataMatrix(StudyFixtures.names("s", 3),
                StudyFixtures.names("f", 1), new double[] {1, 2, 3}), 1);
        assertNull(one.tree(), "one feature has no tree");
    }

    @Test
    void aConstantFeatureSitsWithTheOthersAtItsZeroProfile() {
        // hand-worked: after z-scoring, f1 = (-1.22, 0, 1.22) and f2 = 2 * f1 standardise to the same profile
        // (distance 0); the constant f3 is all 0, at distance sqrt(3) from both; average linkage joins f1 and
        // f2 at 0, then f3 at sqrt(3)
        double[] v = {1, 2, 5, 2, 4, 5, 3, 6, 5};
        HeatmapFeatures f = HeatmapFeatures.of(new DataMatrix(StudyFixtures.names("s", 3),
                StudyFixtures.names("f", 3), v), 1);
        ChartTree t = f.tree();
        assertArrayEquals(new int[] {0, 2}, t.left());
        assertArrayEquals(new int[] {1, 3}, t.right());
        assertEquals(0.0, t.height()[0], 1e-12);
        assertEquals(Math.sqrt(3), t.height()[1], 1e-12);
    }

    private static void assertTree(JsonNode ref, ChartTree t) {
        assertArrayEquals(ints(ref.get("left")), t.left());
        assertArrayEquals(ints(ref.get("right")), t.right());
        assertArrayEquals(ints(ref.get("leafOrder")), t.leafOrder());
        double[] h = t.height();
        for (int s = 0; s < h.length; s++) {
            double expected = ref.get("height").get(s).asDouble();
            // z-scores summed in another order than numpy's differ in the last bits
            assertEquals(expected, h[s], 1e-12 * Math.max(1, expected), "height of merge " + s);
        }
    }

    private static int[] ints(JsonNode a) {
        int[] out = new int[a.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = a.get(i).asInt();
        }
        return out;
    }

    private static DataMatrix iris() throws Exception {
        List<String> ids = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        List<String> features;
        try (InputStream in = HeatmapFeaturesTest.class.getResourceAsStream("/reference/iris.csv");
                Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            var parser = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).build().parse(r);
            features = parser.getHeaderNames().subList(0, 4);
            for (CSVRecord rec : parser) {
                ids.add("flower" + (ids.size() + 1));
                for (int j = 0; j < 4; j++) {
                    values.add(Double.parseDouble(rec.get(j)));
                }
            }
        }
        return new DataMatrix(ids, features, values.stream().mapToDouble(Double::doubleValue).toArray());
    }

    private static JsonNode json(String resource) {
        try (InputStream in = HeatmapFeaturesTest.class.getResourceAsStream(resource)) {
            return new ObjectMapper().readTree(in);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
