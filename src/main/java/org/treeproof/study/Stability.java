package org.treeproof.study;

import org.treeproof.score.ReplicateSummary;

/**
 * The stability of one linkage's solution at one k.
 *
 * @param ari           adjusted Rand index (Hubert & Arabie 1985) of each replicate's cut with the reference cut,
 *                      over the samples the replicate holds: mean, SD and 95% percentile interval
 * @param pac           proportion of ambiguous clustering of the consensus matrix (Şenbabaoğlu et al. 2014)
 * @param nullModel     the same measures on null data, or {@code null} when null calibration was not run
 */
public record Stability(ReplicateSummary ari, double pac, NullStability nullModel) {
    /** Whether the observed mean ARI beats the null at the given level (false when there is no null). */
    public boolean beatsNull(double alpha) {
        return nullModel != null && nullModel.pValueAri() <= alpha;
    }
}
