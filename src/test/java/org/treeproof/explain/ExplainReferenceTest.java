package org.treeproof.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;

/**
 * The feature tests, effect sizes, q-values and covariate tests against scipy 1.10.1, scikit-learn 1.2.1 and
 * statsmodels 0.13.5 ({@code reference/explain/make_reference.py}; each source is named at its check).
 */
class ExplainReferenceTest {
    private static JsonNode ref;

    @BeforeAll
    static void load() throws IOException {
        try (InputStream in = ExplainReferenceTest.class.getResourceAsStream("/reference/explain/explain_reference.json")) {
            ref = new ObjectMapper().readTree(in);
        }
    }

    private static void close(double expected, double actual, double rel, String what) {
        double tol = rel * Math.max(Math.abs(expected), 1e-300) + 1e-15;
        assertTrue(Math.abs(expected - actual) <= tol, what + ": expected " + expected + ", got " + actual);
    }

    private static FeatureTable table(JsonNode c, ContrastTest test, int threads) {
        JsonNode data = c.get("data");
        int n = data.size();
        int m = data.get(0).size();
        double[] v = new double[n * m];
        var samples = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            samples.add("s" + i);
            for (int j = 0; j < m; j++) {
                v[i * m + j] = data.get(i).get(j).asDouble();
            }
        }
        var features = new ArrayList<String>();
        for (int j = 0; j < m; j++) {
            features.add("f" + j);
        }
        int[] labels = new int[n];
        for (int i = 0; i < n; i++) {
            labels[i] = c.get("labels").get(i).asInt();
        }
        return FeatureContrast.of(new DataMatrix(samples, features, v), Solution.of(labels), test, threads).compute();
    }

    @Test
    void rankSumAucCohensDAndQValuesMatchScipySklearnStatsmodels() {
        for (JsonNode c : ref.get("features")) {
            FeatureTable w = table(c, ContrastTest.WILCOXON, 1);
            FeatureTable t = table(c, ContrastTest.WELCH, 2);
            for (JsonNode cl : c.get("clusters")) {
                int k = cl.get("cluster").asInt();
                for (JsonNode f : cl.get("features")) {
                    int j = f.get("feature").asInt();
                    String at = "seed " + c.get("seed") + " cluster " + k + " feature " + j;
                    // scipy.stats.mannwhitneyu, asymptotic with continuity correction
                    close(f.get("pWilcoxon").asDouble(), w.pValue(k, j), 1e-9, at + " rank-sum p");
                    // statsmodels multipletests fdr_bh
                    close(f.get("qWilcoxon").asDouble(), w.qValue(k, j), 1e-9, at + " rank-sum q");
                    // scipy.stats.ttest_ind(equal_var=False)
                    close(f.get("pWelch").asDouble(), t.pValue(k, j), 1e-7, at + " Welch p");
                    close(f.get("qWelch").asDouble(), t.qValue(k, j), 1e-7, at + " Welch q");
                    // sklearn roc_auc_score
                    close(f.get("auc").asDouble(), w.auc(k, j), 1e-12, at + " AUC");
                    // numpy, Cohen's pooled-SD formula
                    close(f.get("effect").asDouble(), w.effect(k, j), 1e-9, at + " Cohen's d");
                    close(f.get("meanIn").asDouble(), w.meanIn(k, j), 1e-12, at + " mean in");
                    close(f.get("meanElsewhere").asDouble(), w.meanElsewhere(k, j), 1e-12, at + " mean elsewhere");
                }
            }
        }
    }

    @Test
    void benjaminiHochbergMatchesStatsmodels() {
        JsonNode bh = ref.get("bh");
        double[] p = new double[bh.get("p").size()];
        for (int i = 0; i < p.length; i++) {
            p[i] = bh.get("p").get(i).asDouble();
        }
        double[] q = FalseDiscovery.benjaminiHochberg(p);
        for (int i = 0; i < p.length; i++) {
            close(bh.get("q").get(i).asDouble(), q[i], 1e-12, "q " + i);
        }
    }

    private static Solution rowsAsClusters(int[][] table) {
        var labels = new ArrayList<Integer>();
        for (int r = 0; r < table.length; r++) {
            for (int c = 0; c < table[r].length; c++) {
                for (int x = 0; x < table[r][c]; x++) {
                    labels.add(r + 1);
                }
            }
        }
        return Solution.of(labels.stream().mapToInt(Integer::intValue).toArray());
    }

    private static String[] columnsAsCategories(int[][] table) {
        var cats = new ArrayList<String>();
        for (int[] row : table) {
            for (int c = 0; c < row.length; c++) {
                for (int x = 0; x < row[c]; x++) {
                    cats.add("level" + c);
                }
            }
        }
        return cats.toArray(String[]::new);
    }

    @Test
    void chiSquareCramersVAndFisherMatchScipy() {
        for (JsonNode c : ref.get("categorical")) {
            JsonNode tj = c.get("table");
            int[][] table = new int[tj.size()][tj.get(0).size()];
            for (int r = 0; r < table.length; r++) {
                for (int q = 0; q < table[r].length; q++) {
                    table[r][q] = tj.get(r).get(q).asInt();
                }
            }
            String name = c.get("name").asText();
            CovariateResult r = CovariateAssociation.of(rowsAsClusters(table),
                    List.of(Covariate.categorical("x", columnsAsCategories(table))), 1).compute().get(0);
            // scipy.stats.chi2_contingency(correction=False)
            close(c.get("chi2").asDouble(), r.statistic(), 1e-10, name + " chi-square");
            // scipy.stats.contingency.association(method="cramer", correction=False)
            close(c.get("cramersV").asDouble(), r.effect(), 1e-10, name + " Cramér's V");
            if (c.get("minExpected").asDouble() >= 5) {
                assertEquals(CovariateTest.CHI_SQUARE, r.test(), name);
                close(c.get("pChi2").asDouble(), r.pValue(), 1e-8, name + " chi-square p");
            } else {
                assertEquals(CovariateTest.FISHER_EXACT, r.test(), name);
                // scipy.stats.fisher_exact, two-sided
                close(c.get("pFisher").asDouble(), r.pValue(), 1e-9, name + " Fisher p");
            }
            if (table.length == 2 && table[0].length == 2) {
                close(c.get("pFisher").asDouble(), CovariateAssociation.fisher2x2(table), 1e-9, name + " Fisher");
            }
        }
    }

    @Test
    void kruskalWallisAndEpsilonSquaredMatchScipy() {
        for (JsonNode c : ref.get("kruskal")) {
            var labels = new ArrayList<Integer>();
            var values = new ArrayList<Double>();
            int g = 0;
            for (JsonNode group : c.get("groups")) {
                g++;
                for (JsonNode v : group) {
                    labels.add(g);
                    values.add(v.asDouble());
                }
            }
            CovariateResult r = CovariateAssociation.of(Solution.of(labels.stream().mapToInt(Integer::intValue)
                    .toArray()), List.of(Covariate.numeric("x", values.stream().mapToDouble(Double::doubleValue)
                            .toArray())), 1).compute().get(0);
            String at = "seed " + c.get("seed");
            assertEquals(CovariateTest.KRUSKAL_WALLIS, r.test());
            // scipy.stats.kruskal (tie-corrected H)
            close(c.get("h").asDouble(), r.statistic(), 1e-10, at + " H");
            close(c.get("p").asDouble(), r.pValue(), 1e-8, at + " p");
            // Tomczak & Tomczak (2014) on scipy's H
            close(c.get("epsilonSquared").asDouble(), r.effect(), 1e-10, at + " epsilon-squared");
        }
    }
}
