package org.treeproof.explain;

import java.util.List;

/**
 * Everything the explanation of a solution found, each part {@code null} when it was not run, with the reason in
 * {@code notes}.
 *
 * @param solution    the solution explained ({@code null} when there was none to explain)
 * @param features    the feature comparison, or {@code null}
 * @param covariates  the covariate associations, or {@code null} when no covariates were given
 * @param sensitivity the alternative analyses, or {@code null} when not asked for
 * @param notes       plain sentences on what was not run and why
 */
public record Explanation(Solution solution, FeatureTable features, List<CovariateResult> covariates,
        SensitivityResult sensitivity, List<String> notes) {

    public Explanation {
        covariates = covariates == null ? null : List.copyOf(covariates);
        notes = List.copyOf(notes);
    }

    /** The covariates the clusters largely follow, in the order given. */
    public List<CovariateFlag> flags() {
        return covariates == null ? List.of()
                : covariates.stream().flatMap(c -> c.flag().stream()).toList();
    }
}
