package org.treeproof.study;

import java.util.List;
import org.treeproof.partition.Clustering;
import org.treeproof.tree.Linkage;

/**
 * The decision drawn from a study's evidence, with its reasons.
 *
 * @param linkage         the recommended linkage
 * @param k               the recommended number of clusters (1 when the verdict is unsupported); outliers not counted
 * @param cutHeight       the heights that give the solution on the linkage's tree and the chosen one
 * @param verdict         how well the evidence supports the solution
 * @param levels          the supported numbers of clusters of the recommended linkage, in increasing order (nested
 *                        levels when more than one); empty when the verdict is tentative or unsupported
 * @param reasons         typed reasons: which evidence carried the decision and which disagreed
 * @param criteria        each criterion's own choice of k for the recommended linkage
 * @param clusters        the recommended clusters with their sizes in the final solution (samples set aside as far
 *                        after the cut left out) and their stability; empty when the verdict is unsupported
 * @param flaggedSamples  samples with low stability or negative silhouette in the recommended solution
 * @param linkages        per linkage: its own best k and key figures
 * @param agreement       ARI between the linkages' own solutions, {@code [a][b]} in the order of {@code linkages}
 * @param rule            the thresholds used
 * @param assessments     the rule's assessment of every (linkage, k) solution, in linkage order and increasing k
 * @param structureTest   the test of any cluster structure, or {@code null} without null data
 * @param clustering      the recommended clusters and outliers (for unsupported: one cluster and the samples the
 *                        tree sets aside before its first split into two large branches)
 * @param minClusterSize  the smallest cluster
 * @param votes           per k, the share of replicates that give that k their vote among the recommended
 *                        linkage's solutions with the recommended verdict (supported: the finest level the
 *                        replicate reproduces, ARI at least the stable band, so the shares can sum to less than 1;
 *                        tentative: the largest excess with the replicate's own ARI), every such k listed, in
 *                        increasing k (empty without null data)
 */
public record Recommendation(Linkage linkage, int k, CutHeight cutHeight, Verdict verdict, List<Integer> levels,
        List<Reason> reasons, List<CriterionChoice> criteria, List<ClusterEvidence> clusters,
        List<SampleFlag> flaggedSamples, List<LinkageSummary> linkages, double[][] agreement, DecisionRule rule,
        List<Assessment> assessments, StructureTest structureTest, Clustering clustering, int minClusterSize,
        List<KShare> votes) {

    public Recommendation {
        levels = List.copyOf(levels);
        reasons = List.copyOf(reasons);
        criteria = List.copyOf(criteria);
        clusters = List.copyOf(clusters);
        flaggedSamples = List.copyOf(flaggedSamples);
        linkages = List.copyOf(linkages);
        assessments = List.copyOf(assessments);
        votes = List.copyOf(votes);
        double[][] a = new double[agreement.length][];
        for (int i = 0; i < a.length; i++) {
            a[i] = agreement[i].clone();
        }
        agreement = a;
        if (verdict == Verdict.UNSUPPORTED && k != 1) {
            throw new IllegalArgumentException("an unsupported verdict recommends k = 1");
        }
    }

    @Override
    public double[][] agreement() {
        double[][] a = new double[agreement.length][];
        for (int i = 0; i < a.length; i++) {
            a[i] = agreement[i].clone();
        }
        return a;
    }

    /** The recommended clusters below Hennig's stable band, with their sizes in the final solution. */
    public List<ClusterEvidence> flaggedClusters() {
        return clusters.stream().filter(c -> c.status() != org.treeproof.score.JaccardStability.Status.STABLE).toList();
    }

    /** The assessment of one solution, or {@code null} when that linkage has no cut at k. */
    public Assessment assessment(Linkage l, int k) {
        for (Assessment a : assessments) {
            if (a.linkage() == l && a.k() == k) {
                return a;
            }
        }
        return null;
    }

    /** The ids of the samples set aside as outliers, in input order. */
    public int outlierCount() {
        return clustering.outlierCount();
    }

    /** One criterion's choice of k. */
    public record CriterionChoice(Criterion criterion, String name, int k, String basis) {
    }

    /** A share of replicates. */
    public record KShare(int k, double share) {
    }

    /**
     * A sample flagged in the recommended solution; cluster is 1-based.
     *
     * @param unstable           it stays with its cluster-mates in fewer replicates than the rule's
     *                           {@link DecisionRule#unstableSample()}
     * @param negativeSilhouette it is closer, on average, to another cluster than to its own
     */
    public record SampleFlag(int sample, String sampleId, int cluster, double stability, double silhouette,
            boolean unstable, boolean negativeSilhouette) {
    }

    /** One linkage's own best solution under the decision rule. */
    public record LinkageSummary(Linkage linkage, double copheneticCorrelation, int k, Verdict verdict, double ariMean,
            double pac, double silhouette, double worstJaccard) {
    }
}
