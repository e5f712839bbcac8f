package org.treeproof.explain;

import java.util.Locale;
import java.util.Objects;

/**
 * A covariate the clusters largely follow ({@link CovariateRule}): a typed fact for the decision's reasons and
 * the report's first section.
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

    /** The fact as one plain sentence; the covariate's name is quoted as given. */
    public String reason() {
        String q = qValue < 0.001 ? "q < 0.001" : String.format(Locale.ROOT, "q = %.3f", qValue);
        return String.format(Locale.ROOT, "The clusters largely follow the covariate '%s' (%s %.2f, %s): they may "
                + "reflect how the samples were collected or processed rather than a difference between them; check "
                + "this before reading the clusters as groups.", covariate, effectName(), effect, q);
    }
}
