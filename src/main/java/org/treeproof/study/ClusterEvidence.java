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

    /**
     * The clusters of a cut with their sizes in {@code solution}, the recommended clusters as delivered: samples set
     * aside after the cut leave their cluster; the stability figures stay the cut's.
     */
    public static java.util.List<ClusterEvidence> sizedBy(java.util.List<ClusterEvidence> cut,
            org.treeproof.partition.Clustering solution) {
        int[] sizes = new int[cut.size()];
        for (int label : solution.labels()) {
            if (label >= 0) {
                sizes[label]++;
            }
        }
        return cut.stream().map(c -> new ClusterEvidence(c.id(), sizes[c.id() - 1], c.jaccard(), c.dissolvedShare(),
                c.recoveredShare(), c.status())).toList();
    }
}
