package org.treeproof.study;

import org.treeproof.score.JaccardStability;

/**
 * The stability of one cluster of a reference solution.
 *
 * @param id             the cluster's number, 1-based, in order of its first sample in the input
 * @param size           its number of samples
 * @param jaccard        mean over replicates of the best Jaccard match (Hennig 2007); NaN if never held
 * @param dissolvedShare share of replicates in which it dissolved (best match <= 0.5)
 * @param recoveredShare share of replicates in which it was recovered (best match >= 0.75)
 * @param status         the reading of {@code jaccard} against Hennig's bands
 */
public record ClusterEvidence(int id, int size, double jaccard, double dissolvedShare, double recoveredShare,
        JaccardStability.Status status) {
}
