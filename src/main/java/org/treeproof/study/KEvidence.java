package org.treeproof.study;

import java.util.List;
import org.treeproof.partition.Clustering;
import org.treeproof.score.Separation;

/**
 * The evidence for cutting one linkage's tree into k clusters. Per-sample arrays are in input order.
 *
 * @param k                 the number of clusters
 * @param cutHeight         the heights that give k clusters
 * @param tieDependent      true when tied merge heights make the k-cluster state depend on tie order
 * @param clustering        the reference solution: the cut of the tree on all samples into k clusters of at least
 *                          the minimum size, samples on smaller branches set aside as outliers
 * @param branches          the branches of the ordinary cut that gives it (k plus the outlier branches)
 * @param silhouette        average silhouette width (Rousseeuw 1987) under the study's metric, over the clustered
 *                          samples (outliers are left out of every fit measure)
 * @param calinskiHarabasz  Calinski-Harabasz index (1974) in the prepared feature space; NaN without data
 * @param daviesBouldin     Davies-Bouldin index (1979) in the prepared feature space; NaN without data
 * @param dunn              Dunn index (1974) under the study's metric
 * @param gap               Gap(k) (Tibshirani et al. 2001); NaN when not computed
 * @param gapSE             s_k for Gap(k); NaN when not computed
 * @param stability         resampling stability
 * @param clusters          per-cluster Jaccard stability
 * @param sampleSilhouette  per-sample silhouette width
 * @param sampleStability   per-sample share of replicates in which it stays with its cluster-mates
 * @param sampleConsensus   per-sample mean consensus with the other members of its cluster
 * @param replicateAri      per replicate, in replicate order, its adjusted Rand index with this solution
 * @param separation        whether each cluster is set apart from its nearest by a dip in density
 *                          ({@link Separation}); {@code null} without a feature table
 */
public record KEvidence(int k, CutHeight cutHeight, boolean tieDependent, Clustering clustering, int branches,
        double silhouette, double calinskiHarabasz, double daviesBouldin, double dunn, double gap, double gapSE,
        Stability stability, List<ClusterEvidence> clusters, double[] sampleSilhouette, double[] sampleStability,
        double[] sampleConsensus, double[] replicateAri, Separation.Result separation) {

    public KEvidence {
        clusters = List.copyOf(clusters);
        sampleSilhouette = sampleSilhouette.clone();
        sampleStability = sampleStability.clone();
        sampleConsensus = sampleConsensus.clone();
        replicateAri = replicateAri.clone();
    }

    @Override
    public double[] replicateAri() {
        return replicateAri.clone();
    }

    /** The solution's separation p-value (the largest over its clusters); NaN when not assessed. */
    public double separationP() {
        return separation == null ? Double.NaN : separation.pValue();
    }

    /** The number of samples set aside as outliers. */
    public int outliers() {
        return clustering.outlierCount();
    }

    @Override
    public double[] sampleSilhouette() {
        return sampleSilhouette.clone();
    }

    @Override
    public double[] sampleStability() {
        return sampleStability.clone();
    }

    @Override
    public double[] sampleConsensus() {
        return sampleConsensus.clone();
    }

    /** The smallest mean Jaccard over the clusters (NaN-safe: a never-held cluster counts as 0). */
    public double worstJaccard() {
        double w = 1;
        for (ClusterEvidence c : clusters) {
            w = Math.min(w, Double.isNaN(c.jaccard()) ? 0 : c.jaccard());
        }
        return w;
    }
}
