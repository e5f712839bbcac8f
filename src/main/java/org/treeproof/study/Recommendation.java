package org.treeproof.study;

import java.util.List;
import org.treeproof.tree.Linkage;

/**
 * The decision drawn from a study's evidence, with its reasons.
 *
 * @param linkage         the recommended linkage
 * @param k               the recommended number of clusters (1 when the verdict is unsupported)
 * @param cutHeight       the heights that give k clusters on the linkage's tree and the chosen one
 * @param verdict         how well the evidence supports the solution
 * @param levels          the numbers of clusters of the recommended linkage that are each supported with all
 *                        clusters stable, in increasing order (nested levels when more than one)
 * @param reasons         plain sentences: which evidence carried the decision and which disagreed
 * @param criteria        each criterion's own choice of k for the recommended linkage
 * @param flaggedClusters clusters of the recommended solution below Hennig's stable band
 * @param flaggedSamples  samples with low stability or negative silhouette in the recommended solution
 * @param linkages        per linkage: its own best k and key figures
 * @param agreement       ARI between the linkages' own solutions, {@code [a][b]} in the order of {@code linkages}
 * @param rule            the thresholds used
 */
public record Recommendation(Linkage linkage, int k, CutHeight cutHeight, Verdict verdict, List<Integer> levels,
        List<String> reasons, List<CriterionChoice> criteria, List<ClusterEvidence> flaggedClusters,
        List<SampleFlag> flaggedSamples, List<LinkageSummary> linkages, double[][] agreement, DecisionRule rule) {

    public Recommendation {
        levels = List.copyOf(levels);
        reasons = List.copyOf(reasons);
        criteria = List.copyOf(criteria);
        flaggedClusters = List.copyOf(flaggedClusters);
        flaggedSamples = List.copyOf(flaggedSamples);
        linkages = List.copyOf(linkages);
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

    /** One criterion's choice of k. */
    public record CriterionChoice(String criterion, int k, String basis) {
    }

    /** A sample flagged in the recommended solution; cluster is 1-based. */
    public record SampleFlag(int sample, String sampleId, int cluster, double stability, double silhouette,
            List<String> reasons) {
        public SampleFlag {
            reasons = List.copyOf(reasons);
        }
    }

    /** One linkage's own best solution under the decision rule. */
    public record LinkageSummary(Linkage linkage, double copheneticCorrelation, int k, Verdict verdict, double ariMean,
            double pac, double silhouette, double worstJaccard) {
    }
}
