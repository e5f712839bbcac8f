package org.treeproof.explain;

/** The test used for one covariate, with its name as outputs write it. */
public enum CovariateTest {
    /**
     * Pearson's chi-square test of independence on the clusters × categories table, without continuity
     * correction, p from the chi-square distribution with (r − 1)(c − 1) degrees of freedom (commons-math3).
     * K. Pearson, Philosophical Magazine 50 (1900) 157-175, doi:10.1080/14786440009463897. Used when every
     * expected count is at least 5 (W. G. Cochran, Biometrics 10 (1954) 417-451, doi:10.2307/3001616).
     */
    CHI_SQUARE("chi-square"),
    /**
     * Fisher's exact test of a 2 × 2 table with an expected count below 5: p sums the hypergeometric
     * probabilities (commons-math3) of the tables with the same margins that are no more probable than the one
     * observed (relative tolerance 10⁻⁷, as R and scipy do). R. A. Fisher, Journal of the Royal Statistical
     * Society 85 (1922) 87-94, doi:10.2307/2340521.
     */
    FISHER_EXACT("fisher-exact"),
    /**
     * A larger table with an expected count below 5: the chi-square statistic's p-value by Monte Carlo,
     * permuting the covariate over the samples ({@value CovariateAssociation#PERMUTATIONS} seeded permutations,
     * the margins kept), {@code p = (1 + b) / (1 + B)} with b permutations at least as extreme
     * (A. C. A. Hope, JRSS B 30 (1968) 582-598, doi:10.1111/j.2517-6161.1968.tb00759.x).
     */
    MONTE_CARLO_CHI_SQUARE("chi-square-monte-carlo"),
    /**
     * The Kruskal-Wallis test on the ranks of a numeric covariate across the clusters, with the tie correction,
     * p from the chi-square distribution with (groups − 1) degrees of freedom. W. H. Kruskal and W. A. Wallis,
     * JASA 47 (1952) 583-621, doi:10.1080/01621459.1952.10483441.
     */
    KRUSKAL_WALLIS("kruskal-wallis"),
    /** Not testable: fewer than two clusters or two categories (or values) among the samples with a value. */
    NONE("none");

    private final String id;

    CovariateTest(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }
}
