package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Qn against statsmodels' {@code qn_scale(x, c=1.0)} (the k-th smallest pairwise distance), values made by
 * {@code src/test/resources/reference/scale/qn_reference.py} (numpy 1.24.2, scipy 1.10.1, statsmodels 0.13.5),
 * and the consistency factor 1 / (√2 Φ⁻¹(5/8)) from scipy's {@code norm.ppf}.
 */
class QnScaleTest {

    @Test
    void equalsStatsmodelsKthPairwiseDistanceTimesTheNormalConsistencyFactor() throws Exception {
        JsonNode ref;
        try (InputStream in = QnScaleTest.class.getResourceAsStream("/reference/scale/qn_reference.json")) {
            ref = new ObjectMapper().readTree(in);
        }
        double c = ref.get("consistency").asDouble();
        assertEquals(c, QnScale.CONSISTENCY, 1e-15);
        for (Map.Entry<String, JsonNode> e : (Iterable<Map.Entry<String, JsonNode>>) ref.get("cases")::fields) {
            JsonNode values = e.getValue().get("values");
            double[] x = new double[values.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = values.get(i).asDouble();
            }
            // the k-th distance is one of the computed differences: exact, not approximate
            assertEquals(c * e.getValue().get("kth").asDouble(), QnScale.of(x), 0, e.getKey());
        }
    }

    @Test
    void handWorkedThreeValues() {
        // distances 2, 1, 1; h = 2, k = C(2, 2) = 1: the smallest distance, 1
        assertEquals(QnScale.CONSISTENCY, QnScale.of(new double[] {3, 1, 2}), 0);
        assertEquals(0, QnScale.of(new double[] {7}), 0);
        assertEquals(0, QnScale.of(new double[] {4, 4, 4, 4}), 0);
    }

    @Test
    void twoModesDoNotInflateItAsTheyInflateTheMad() throws Exception {
        // 200 values near -5 and 200 near 5 (fixture case "two-modes-400"): the normalised MAD is about 7.2 (the
        // distance of the modes from the median), Qn about 2.2 (distances within a mode); statsmodels' values
        JsonNode ref;
        try (InputStream in = QnScaleTest.class.getResourceAsStream("/reference/scale/qn_reference.json")) {
            ref = new ObjectMapper().readTree(in);
        }
        JsonNode two = ref.get("cases").get("two-modes-400");
        double[] x = new double[two.get("values").size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = two.get("values").get(i).asDouble();
        }
        double qn = QnScale.of(x);
        assertTrue(qn < 2.5 && two.get("mad_normalised").asDouble() > 7, "Qn " + qn);
    }
}
