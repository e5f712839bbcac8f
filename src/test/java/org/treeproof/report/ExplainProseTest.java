package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.SensitivityResult;

/** The explanation's prose counts only what was done (hand-built results). */
class ExplainProseTest {
    private static SensitivityResult.Row ran(String name, double ari) {
        return new SensitivityResult.Row(name, "scale", "none", "none", false, 0, "euclidean", ari, new double[] {0.9, 0.8},
                "");
    }

    @Test
    void alternativesThatCouldNotRunAreNotCountedAsRun() {
        var notRun = new SensitivityResult.Row("log2", "log2", "none", "zscore", true, 0, "euclidean", Double.NaN,
                new double[0], "not run: log2 needs positive values");
        var s = new SensitivityResult("ward", 2, 0.75, List.of(ran("scale: none", 0.9), notRun,
                ran("metric: manhattan", 0.7)));
        String text = String.join(" ", ExplainProse.methods(new Explanation(null, null, null, s, List.of()),
                new HashSet<>()));
        assertTrue(text.contains("rerun at k = 2 under 2 alternative analyses,"), text);
        assertTrue(text.contains("One more alternative was tried and could not run on these data: log2 (not run: "
                + "log2 needs positive values)."), text);
        // the result counts the same two: ARI 0.70 and 0.90, median 0.80 (hand-worked)
        assertEquals("Under 2 alternative analyses the adjusted Rand index with the recommended solution ranged from "
                + "0.70 to 0.90 (median 0.80); all 2 clusters were found again in 2 of them.",
                ExplainProse.sensitivity(s));
    }

    @Test
    void oneAlternativeIsSingular() {
        var s = new SensitivityResult("ward", 2, 0.75, List.of(ran("scale: none", 0.9)));
        String text = String.join(" ", ExplainProse.methods(new Explanation(null, null, null, s, List.of()),
                new HashSet<>()));
        assertTrue(text.contains("under 1 alternative analysis,") && !text.contains("could not run"), text);
    }
}
