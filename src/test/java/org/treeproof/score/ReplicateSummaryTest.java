package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

class ReplicateSummaryTest {

    @Test
    void matchesNumpy() {
        // reference: numpy 1.24.2 mean, std(ddof=1), percentile (default "linear"), summary_numpy.json
        JsonNode cases = Fixtures.read("summary_numpy.json").get("cases");
        for (JsonNode c : cases) {
            String name = c.get("name").asText();
            double[] v = Fixtures.doubles(c.get("values"));
            ReplicateSummary s = ReplicateSummary.of(v, c.get("levelPercent").doubleValue() / 100);
            assertEquals(v.length, s.count(), name);
            assertEquals(c.get("mean").doubleValue(), s.mean(), 1e-14, name);
            if (c.get("sd").isNull()) {
                assertTrue(Double.isNaN(s.sd()), name);
            } else {
                assertEquals(c.get("sd").doubleValue(), s.sd(), 1e-14, name);
            }
            assertEquals(c.get("low").doubleValue(), s.low(), 1e-14, name);
            assertEquals(c.get("high").doubleValue(), s.high(), 1e-14, name);
        }
        assertTrue(cases.size() >= 10);
    }

    @Test
    void linearInterpolationByHand() {
        // Hyndman & Fan (1996) definition 7 on 0, 1, 2, 3, 4 (m = 5): h = 4 q; q = 0.025 -> 0.1; q = 0.975 -> 3.9
        ReplicateSummary s = ReplicateSummary.of(new double[] {4, 0, 3, 1, 2});
        assertEquals(0.1, s.low(), 1e-15);
        assertEquals(3.9, s.high(), 1e-15);
        assertEquals(2.0, s.mean());
        assertEquals(Math.sqrt(2.5), s.sd(), 1e-15);   // (4 + 1 + 0 + 1 + 4) / 4
        assertEquals(0.95, s.level());
    }

    @Test
    void emptyAndInvalidInput() {
        ReplicateSummary empty = ReplicateSummary.of(new double[0]);
        assertEquals(0, empty.count());
        assertTrue(Double.isNaN(empty.mean()) && Double.isNaN(empty.low()));
        assertThrows(IllegalArgumentException.class, () -> ReplicateSummary.of(new double[] {0.1, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> ReplicateSummary.of(new double[] {0.1}, 1.0));
    }
}
