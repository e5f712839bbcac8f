package org.treeproof.study;

import org.treeproof.score.ReplicateSummary;

/**
 * The stability of one linkage's solution at one k.
 *
 * @param ari           adjusted Rand index (Hubert & Arabie 1985) of each replicate's cut with the reference cut,
 *                      over the samples the replicate holds: mean, SD and the range of the middle 95% of replicates (not a confidence interval)
 * @param pac           proportion of ambiguous clustering of the consensus matrix (Şenbabaoğlu et al. 2014)
 * @param nullModel     the same measures on null data, or {@code null} when null calibration was not run
 */
public record Stability(ReplicateSummary ari, double pac, NullStability nullModel) {
}
