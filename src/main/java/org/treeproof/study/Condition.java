package org.treeproof.study;

/**
 * A condition of the decision rule ({@link DecisionRule}), met or failed by each (linkage, k) solution. The
 * report words each one; the rule alone decides which apply.
 */
public enum Condition {
    /**
     * Beats the null: its excess over the null data ({@link NullStability}) is reached by at most
     * {@code alpha} of the null sets' largest excess over every linkage and k (max-statistic adjusted p-value).
     */
    BEATS_NULL("beats-null"),
    /** No cluster dissolves: every cluster's mean Jaccard is above Hennig's dissolved band. */
    NO_CLUSTER_DISSOLVES("no-cluster-dissolves"),
    /**
     * Every cluster is cohesive: the mean silhouette width of each cluster's members is above 0 ({@link
     * Cohesion}); a cluster whose members lie on average closer to another cluster is a collection of scattered
     * samples, such as far samples that a linkage groups together, not a group.
     */
    EVERY_CLUSTER_COHESIVE("every-cluster-cohesive"),
    /**
     * Every cluster is separated from its nearest cluster by a dip in density: Hartigan's dip test, on the line
     * joining the two, rejects one mode at {@code alpha} ({@link org.treeproof.score.Separation}). Pieces cut from a
     * continuum (a chain, a gradient, a branching path) are stable and beat a unimodal null, but have no gap
     * between them. Applied only where the feature table is known.
     */
    EVERY_CLUSTER_SEPARATED("every-cluster-separated"),
    /**
     * At most one cluster is only doubtful (between Hennig's dissolved and stable bands) and every other is stable:
     * a solution most of whose clusters the replicates recover only in part is not a tentative finding but an
     * unstable one.
     */
    AT_MOST_ONE_DOUBTFUL("at-most-one-doubtful"),
    /** Every cluster is stable: every cluster's mean Jaccard is in Hennig's stable band. */
    EVERY_CLUSTER_STABLE("every-cluster-stable"),
    /** Without null data only: the replicates reproduce the solution, mean ARI at least the stable band. */
    REPRODUCED("reproduced"),
    /**
     * Without null data only: the clusters are separated, average silhouette above Kaufman and Rousseeuw's
     * "reasonable structure" reading; the one place a silhouette band is used, for want of a null.
     */
    SEPARATED_WITHOUT_NULL("separated-without-null");

    private final String id;

    Condition(String id) {
        this.id = id;
    }

    /** The identifier used in outputs. */
    public String id() {
        return id;
    }
}
