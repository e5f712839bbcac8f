package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import org.junit.jupiter.api.Test;

/**
 * {@link DipTest} against the dip solved from its definition as linear programmes by scipy
 * ({@code reference/data/dip_reference.py}), hand-worked values, and its table against an independent numpy
 * simulation.
 */
class DipTestTest {
    private static JsonNode reference() throws IOException {
        try (InputStream in = DipTestTest.class.getResourceAsStream("/reference/data/dip_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    @Test
    void dipMatchesTheLinearProgrammesOfItsDefinition() throws IOException {
        // scipy.optimize.linprog (HiGHS) over unimodal piecewise-linear distribution functions: 24 samples of
        // 10-30 values, uniform, two normals, t with 2 df, and rounded normals (ties)
        for (JsonNode c : reference().get("cases")) {
            double[] x = new double[c.get("values").size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = c.get("values").get(i).asDouble();
            }
            assertEquals(c.get("dip").asDouble(), DipTest.dip(x), 1e-7, c.get("kind").asText());
        }
    }

    @Test
    void handWorkedDips() {
        // Every value equal: the empirical function is one jump, itself unimodal: dip 0.
        assertEquals(0, DipTest.dip(new double[] {3, 3, 3, 3}), 0);
        // Two values, n/2 samples each: a unimodal G may jump only at its mode, so one of the two jumps of 1/2 is
        // missed by half of it: dip 1/4 (Hartigan and Hartigan's largest possible dip).
        assertEquals(0.25, DipTest.dip(new double[] {0, 0, 0, 0, 0, 1, 1, 1, 1, 1}), 1e-12);
        // Evenly spaced distinct values: the empirical function of n points, the uniform's, departs from the
        // uniform G by 1/n at the jumps, and the best unimodal fit halves that: dip 1/(2n) (their smallest value).
        double[] even = new double[20];
        for (int i = 0; i < even.length; i++) {
            even[i] = i;
        }
        assertEquals(1.0 / 40, DipTest.dip(even), 1e-12);
        // Shifting and scaling do not change the dip.
        double[] x = {0.3, 1.7, 2.2, 2.9, 5.5, 8.1, 8.4, 9.0, 9.3, 12.5, 13.1};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = -4 + 2.5 * x[i];
        }
        assertEquals(DipTest.dip(x), DipTest.dip(y), 1e-12);
    }

    @Test
    void tableAgreesWithAnIndependentSimulation() throws IOException {
        // numpy default_rng simulation of 4000 uniform samples at n = 50 and n = 200, with a dip of its own
        // (dip_reference.py); the table has 10^6 samples at these n. A 1% quantile from 4000 samples has a
        // Monte Carlo SD of roughly 2-3% of its value, so the table's p-value at the simulated quantiles must be
        // within a factor of 1.6 of the level.
        for (JsonNode s : reference().get("uniform")) {
            int n = s.get("n").asInt();
            for (int j = 0; j < s.get("level").size(); j++) {
                double level = s.get("level").get(j).asDouble();
                double q = s.get("quantile").get(j).asDouble();
                var r = DipTest.pValue(q / Math.sqrt(n), n);
                assertTrue(r.pValue() > level / 1.6 && r.pValue() < level * 1.6,
                        "n = " + n + ", level " + level + ": table p " + r.pValue());
            }
        }
    }

    @Test
    void pValuesFallAsTheDipGrowsAndStopAtTheTablesEnd() {
        double last = 1;
        for (double s = 0.2; s < 2; s += 0.05) {
            var r = DipTest.pValue(s / Math.sqrt(120), 120);
            assertTrue(r.pValue() <= last, "p-values must not rise with the dip");
            last = r.pValue();
        }
        var far = DipTest.pValue(0.25, 200);
        assertTrue(far.pBelow());
        assertEquals(DipTest.smallestLevel(200), far.pValue(), 0);
        // two far-apart halves of 100: dip 1/4 - 1/200... far beyond any uniform sample
        double[] halves = new double[200];
        for (int i = 0; i < 200; i++) {
            halves[i] = i < 100 ? i * 1e-3 : 1000 + i * 1e-3;
        }
        assertTrue(DipTest.test(halves).pBelow());
    }
}
