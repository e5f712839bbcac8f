package org.treeproof.explain;

import java.util.List;
import java.util.Objects;

/**
 * One covariate's association with the clusters.
 *
 * @param name       the covariate
 * @param kind       categorical or numeric
 * @param test       the test used ({@link CovariateTest#NONE} when it could not be tested)
 * @param statistic  the chi-square statistic or Kruskal-Wallis H (NaN when untested)
 * @param pValue     the test's p-value (NaN when untested)
 * @param qValue     Benjamini-Hochberg over the tested covariates (NaN when untested)
 * @param effect     Cramér's V (categorical) or epsilon-squared (numeric); NaN when untested
 * @param flagged    whether {@link CovariateRule} flags it
 * @param used       samples that entered the test (clustered and with a value)
 * @param categories the categories in order of first appearance (categorical), else empty
 * @param counts     {@code [cluster - 1][category]} sample counts (categorical), else empty
 * @param medians    per cluster the median value, NaN for a cluster without values (numeric), else empty
 */
public record CovariateResult(String name, CovariateKind kind, CovariateTest test, double statistic, double pValue,
        double qValue, double effect, boolean flagged, int used, List<String> categories, int[][] counts,
        double[] medians) {

    public CovariateResult {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(test, "test");
        categories = List.copyOf(categories);
        int[][] c = new int[counts.length][];
        for (int r = 0; r < c.length; r++) {
            c[r] = counts[r].clone();
        }
        counts = c;
        medians = medians.clone();
    }

    /** The name of the effect size, as outputs write it. */
    public String effectName() {
        return kind == CovariateKind.CATEGORICAL ? "Cramér's V" : "epsilon-squared";
    }

    @Override
    public int[][] counts() {
        int[][] c = new int[counts.length][];
        for (int r = 0; r < c.length; r++) {
            c[r] = counts[r].clone();
        }
        return c;
    }

    @Override
    public double[] medians() {
        return medians.clone();
    }

    /** The typed fact the decision and the report carry when this covariate is flagged; empty otherwise. */
    public java.util.Optional<CovariateFlag> flag() {
        return flagged ? java.util.Optional.of(new CovariateFlag(name, kind, test, effect, qValue))
                : java.util.Optional.empty();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CovariateResult r && r.name.equals(name) && r.kind == kind && r.test == test
                && Double.compare(r.statistic, statistic) == 0 && Double.compare(r.pValue, pValue) == 0
                && Double.compare(r.qValue, qValue) == 0 && Double.compare(r.effect, effect) == 0
                && r.flagged == flagged && r.used == used && r.categories.equals(categories)
                && java.util.Arrays.deepEquals(r.counts, counts) && java.util.Arrays.equals(r.medians, medians);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, kind, test, statistic, pValue, qValue, effect, flagged, used);
    }

    @Override
    public String toString() {
        return "CovariateResult[" + name + ", " + test.id() + ", p=" + pValue + ", effect=" + effect + "]";
    }
}
