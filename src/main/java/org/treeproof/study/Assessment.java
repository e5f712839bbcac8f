package org.treeproof.study;

import java.util.List;
import org.treeproof.tree.Linkage;

/**
 * The decision rule's reading of one (linkage, k) solution: the facts it used, the conditions met and failed,
 * and the verdict. Made only by {@link DecisionRule#assess}.
 *
 * @param facts   what the rule read
 * @param verdict the verdict of this solution
 * @param met     conditions met, in the rule's order
 * @param failed  conditions failed, in the rule's order
 */
public record Assessment(Facts facts, Verdict verdict, List<Condition> met, List<Condition> failed) {
    public Assessment {
        met = List.copyOf(met);
        failed = List.copyOf(failed);
    }

    public Linkage linkage() {
        return facts.linkage();
    }

    public int k() {
        return facts.k();
    }

    /**
     * The facts of one solution that the rule reads.
     *
     * @param linkage      the linkage
     * @param k            clusters (outliers not counted)
     * @param outliers     samples set aside as outliers
     * @param meanAri      mean ARI of the replicates with the solution
     * @param worstJaccard the smallest mean Jaccard of its clusters
     * @param noneDissolved no cluster's status is dissolved or not assessed
     * @param doubtfulClusters clusters whose Jaccard status is doubtful (between Hennig's dissolved and stable bands)
     * @param silhouette   average silhouette of the clustered samples
     * @param leastClusterSilhouette the smallest mean silhouette width of one cluster's members (NaN when there
     *                     are no widths)
     * @param calibrated   whether null data were run
     * @param excess       excess over the null from all replicates (NaN without null data)
     * @param pAdjusted    max-statistic adjusted Monte Carlo p-value (NaN without null data)
     * @param cophenetic   the linkage tree's cophenetic correlation
     * @param separationP  the largest p-value of the dip tests of each cluster against its nearest
     *                     ({@link org.treeproof.score.Separation}); NaN when not assessed (only distances given)
     */
    public record Facts(Linkage linkage, int k, int outliers, double meanAri, double worstJaccard,
            boolean noneDissolved, int doubtfulClusters, double silhouette, double leastClusterSilhouette,
            boolean calibrated, double excess, double pAdjusted, double cophenetic, double separationP) {
        /** Every cluster's Jaccard status is stable (Hennig's band, decided by the score): none other. */
        public boolean allStable() {
            return noneDissolved && doubtfulClusters == 0;
        }

        /** Whether the separation of the clusters was assessed (it needs the feature table). */
        public boolean separationAssessed() {
            return !Double.isNaN(separationP);
        }
    }
}
