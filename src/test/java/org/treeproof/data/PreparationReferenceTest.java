package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Preparations against values computed by numpy 1.24.2 and scikit-learn 1.2.1 (StandardScaler) in
 * {@code src/test/resources/reference/data/preparation_reference.py}: nanmedian imputation, log2(x + 1), population
 * variance for the top-variable choice, and population z-scores, on a small table with missing cells and on Iris
 * (Fisher 1936, doi:10.1111/j.1469-1809.1936.tb02137.x).
 */
class PreparationReferenceTest {
    /** numpy sums pairwise and Preparation with a corrected two-pass sum: they agree to rounding. */
    private static final double TOLERANCE = 1e-12;

    static JsonNode fixture() throws IOException {
        try (InputStream in = PreparationReferenceTest.class.getResourceAsStream(
                "/reference/data/preparation_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    static Stream<JsonNode> cases() throws IOException {
        List<JsonNode> list = new ArrayList<>();
        fixture().get("cases").forEach(list::add);
        return list.stream();
    }

    private static List<String> strings(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(n -> out.add(n.asText()));
        return out;
    }

    private static double[] values(JsonNode rows) {
        List<Double> out = new ArrayList<>();
        rows.forEach(r -> r.forEach(v -> out.add(v.isNull() ? Double.NaN : v.asDouble())));
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void matchesNumpy(JsonNode c) {
        JsonNode p = c.get("preparation");
        Preparation prep = new Preparation(MissingPolicy.fromUserName(p.get("missing").asText()),
                p.get("log2").asBoolean(), Scale.fromUserName(p.get("scale").asText()), p.get("topVariable").asInt());
        DataMatrix raw = new DataMatrix(strings(c.get("samples")), strings(c.get("features")), values(c.get("values")));
        Prepared out = prep.apply(raw);
        JsonNode e = c.get("expected");
        assertEquals(strings(e.get("samples")), out.matrix().sampleIds());
        assertEquals(strings(e.get("features")), out.matrix().featureNames());
        double[] expected = values(e.get("values"));
        double[] actual = out.matrix().rowMajorCopy();
        assertEquals(expected.length, actual.length);
        for (int k = 0; k < expected.length; k++) {
            assertEquals(expected[k], actual[k], TOLERANCE * Math.max(1, Math.abs(expected[k])), c.get("name") + " cell " + k);
        }
    }

    @Test
    void mediansAreNumpysNanmedian() throws IOException {
        JsonNode c = fixture().get("cases").get(0);
        assertEquals("impute-median", c.get("name").asText());
        double[] raw = values(c.get("values"));
        int p = c.get("features").size();
        JsonNode medians = c.get("expected").get("medians");
        for (int j = 0; j < medians.size(); j++) {
            double[] column = new double[raw.length / p];
            for (int i = 0; i < column.length; i++) {
                column[i] = raw[i * p + j];
            }
            assertEquals(medians.get(j).asDouble(), MissingPolicy.medianOfObserved(column), 0.0, "feature " + j);
        }
    }

    @Test
    void variancesAreNumpysPopulationVariances() throws IOException {
        JsonNode c = fixture().get("cases").get(7);
        assertEquals("iris top 2 by variance", c.get("name").asText());
        DataMatrix iris = new DataMatrix(strings(c.get("samples")), strings(c.get("features")), values(c.get("values")));
        WorkingTable t = new WorkingTable(iris);
        double[] var = t.variances(t.means());
        JsonNode expected = c.get("expected").get("variances");
        for (int j = 0; j < var.length; j++) {
            assertEquals(expected.get(j).asDouble(), var[j], 1e-13, "feature " + j);
        }
        PreparationReport.TopVariable top = new Preparation(MissingPolicy.ERROR, false, Scale.NONE, 2).apply(iris)
                .report().topVariable().orElseThrow();
        // Sepal length 0.6811 is the second largest variance, after petal length 3.0955.
        assertEquals(expected.get(0).asDouble(), top.cutoffVariance(), 1e-13);
        assertEquals(4, top.candidates());
    }
}
