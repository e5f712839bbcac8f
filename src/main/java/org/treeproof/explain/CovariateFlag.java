package org.treeproof.explain;

import java.util.Objects;

/**
 * A covariate the clusters largely follow ({@link CovariateRule}): a typed fact for the decision's reasons and
 * the report's first section, which words it ({@code report.ReasonWords.covariate}).
 *
 * @param covariate the covariate's name
 * @param kind      categorical or numeric
 * @param test      the test that found the association
 * @param effect    Cramér's V or epsilon-squared
 * @param qValue    the q-value over the covariates
 */
public record CovariateFlag(String covariate, CovariateKind kind, CovariateTest test, double effect, double qValue) {
    public CovariateFlag {
        Objects.requireNonNull(covariate, "covariate");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(test, "test");
    }

    /** The effect's name. */
    public String effectName() {
        return kind == CovariateKind.CATEGORICAL ? "Cramér's V" : "epsilon-squared";
    }
}
