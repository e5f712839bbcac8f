package org.treeproof.explain;

/**
 * When the association of a covariate with the clusters is strong enough to flag: the clusters then largely
 * follow the covariate, the classic sign of a batch or site artefact.
 *
 * <p>A covariate is flagged when its q-value (Benjamini-Hochberg over the covariates) is at most
 * {@link #MAX_Q} <em>and</em> its effect reaches the bar for its kind: Cramér's V at least
 * {@link #MIN_CRAMERS_V} for a categorical covariate, epsilon-squared at least {@link #MIN_EPSILON_SQUARED} for a
 * numeric one. Both bars ask that the covariate account for about a quarter of the variation (V² and ε² are
 * both shares of variation; 0.5 is the value J. Cohen, Statistical Power Analysis for the Behavioral Sciences,
 * 1988, calls a large correlation, and 0.25 its square). The q bar alone would flag weak associations in large
 * studies; the effect bar alone would flag chance in small ones. These two numbers are our convention, common
 * practice in spirit but with no single published source.
 */
public final class CovariateRule {
    /** The largest q-value that can flag a covariate. */
    public static final double MAX_Q = 0.05;
    /** The smallest Cramér's V that flags a categorical covariate. */
    public static final double MIN_CRAMERS_V = 0.5;
    /** The smallest epsilon-squared that flags a numeric covariate. */
    public static final double MIN_EPSILON_SQUARED = 0.25;

    private CovariateRule() {
    }

    /** Whether a covariate of this kind with this q-value and effect is flagged. */
    public static boolean flags(CovariateKind kind, double q, double effect) {
        double bar = kind == CovariateKind.CATEGORICAL ? MIN_CRAMERS_V : MIN_EPSILON_SQUARED;
        return q <= MAX_Q && effect >= bar;
    }
}
