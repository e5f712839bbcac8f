package org.treeproof.report;

import java.util.Objects;
import org.treeproof.study.CutHeight;
import org.treeproof.study.Verdict;

/**
 * One line of the evidence table: one linkage cut into k clusters. Values that were not computed are
 * {@code NaN} (the null-data columns without null calibration, the feature-space indices and the gap statistic
 * without a data table).
 *
 * @param k                the number of clusters
 * @param cutHeight        the heights that give k clusters, in the metric's units
 * @param tieDependent     true when tied merge heights make the k clusters depend on tie order
 * @param ariMean          mean adjusted Rand index of the replicates with the full-data solution
 * @param ariLow           its 95% percentile interval, lower end
 * @param ariHigh          its 95% percentile interval, upper end
 * @param replicates       replicates behind the ARI summary
 * @param nullAriMean      mean over null data sets of their mean ARI
 * @param nullAriLow       2.5% quantile of the null sets' mean ARI
 * @param nullAriHigh      97.5% quantile of the null sets' mean ARI
 * @param pac              proportion of ambiguous clustering of the consensus matrix
 * @param nullPac          mean PAC over the null sets
 * @param nullSilhouette   mean over null data sets of the average silhouette of their own cut at this k
 * @param excess           null-standardised stability plus separation (the decision rule's ordering)
 * @param pValueAdjusted   max-statistic Monte Carlo p-value of the excess, adjusted for the choice of linkage and k
 * @param separationP      the largest dip-test p-value of each cluster against its nearest (NaN when not assessed)
 * @param outliers         samples set aside as outliers in this solution
 * @param worstJaccard     the smallest mean Jaccard over the clusters
 * @param silhouette       average silhouette width
 * @param calinskiHarabasz Calinski-Harabasz index
 * @param daviesBouldin    Davies-Bouldin index
 * @param dunn             Dunn index
 * @param gap              Gap(k)
 * @param gapSE            s_k
 * @param verdict          the decision rule's verdict on this solution alone
 * @param recommended      true for the recommended solution
 */
public record EvidenceRow(int k, CutHeight cutHeight, boolean tieDependent, double ariMean, double ariLow,
        double ariHigh, int replicates, double nullAriMean, double nullAriLow, double nullAriHigh, double pac,
        double nullPac, double nullSilhouette, double excess, double pValueAdjusted, double separationP, int outliers, double worstJaccard,
        double silhouette, double calinskiHarabasz, double daviesBouldin, double dunn, double gap, double gapSE,
        Verdict verdict, boolean recommended) {

    public EvidenceRow {
        Objects.requireNonNull(cutHeight, "cutHeight");
        Objects.requireNonNull(verdict, "verdict");
        if (k < 2) {
            throw new IllegalArgumentException("evidence rows start at k = 2, got " + k);
        }
        if (recommended && verdict == Verdict.UNSUPPORTED) {
            throw new IllegalArgumentException("an unsupported solution cannot be the recommended one");
        }
    }

    /** Whether null calibration was run for this row. */
    public boolean calibrated() {
        return !Double.isNaN(pValueAdjusted);
    }
}
