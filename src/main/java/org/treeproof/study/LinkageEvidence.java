package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.score.ConsensusCdf;
import org.treeproof.score.ConsensusDistribution;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.GapResult;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/**
 * Everything a study found for one linkage.
 *
 * @param linkage               the linkage
 * @param tree                  its tree on all samples
 * @param copheneticCorrelation Sokal & Rohlf's (1962) cophenetic correlation of the tree with the distances
 * @param gap                   the gap statistic for k = 1..maxK, or {@code null} when not computed
 * @param byK                   the evidence for each k from 2 to maxK that the tree can be cut into (k clusters of
 *                              the minimum size), in increasing k
 * @param branchSupport         per merge of {@code tree}, the share of replicates reproducing its clade
 * @param consensus             the consensus matrix for k = 2..maxK
 * @param consensusCdf          the CDF of the consensus values and its change in area, for k = 2..maxK
 * @param branchPValues         the multiscale bootstrap's branch p-values, or {@code null} when not computed
 */
public record LinkageEvidence(Linkage linkage, MergeTree tree, double copheneticCorrelation, GapResult gap,
        List<KEvidence> byK, double[] branchSupport, ConsensusMatrix consensus, List<ConsensusCdf> consensusCdf,
        BranchPValues branchPValues) {

    public LinkageEvidence {
        byK = List.copyOf(byK);
        branchSupport = branchSupport.clone();
        consensusCdf = List.copyOf(consensusCdf);
    }

    /** Without branch p-values; the consensus CDFs are derived from {@code consensus}. */
    public LinkageEvidence(Linkage linkage, MergeTree tree, double copheneticCorrelation, GapResult gap,
            List<KEvidence> byK, double[] branchSupport, ConsensusMatrix consensus) {
        this(linkage, tree, copheneticCorrelation, gap, byK, branchSupport, consensus, cdfs(consensus), null);
    }

    /** The CDFs of the consensus values of {@code consensus} for k = 2..maxK, with their changes in area. */
    public static List<ConsensusCdf> cdfs(ConsensusMatrix consensus) {
        var d = new ArrayList<ConsensusDistribution>();
        for (int k = 2; k <= consensus.maxK(); k++) {
            d.add(consensus.distribution(k));
        }
        return ConsensusCdf.series(d);
    }

    /** The consensus CDF at {@code k}. */
    public ConsensusCdf cdfAt(int k) {
        ConsensusCdf c = consensusCdf.get(k - 2);
        if (c.k() != k) {
            throw new IllegalStateException("consensusCdf is out of order");
        }
        return c;
    }

    /**
     * The branch of each cluster of the cut at {@code k} with its AU p-value (fits {@code null} when branch
     * p-values were not computed), in cluster order.
     */
    public List<ClusterBranch> clusterBranches(int k) {
        KEvidence e = at(k);
        return e == null ? List.of() : ClusterBranch.of(tree, e.clustering(), branchPValues);
    }

    @Override
    public double[] branchSupport() {
        return branchSupport.clone();
    }

    /** The evidence at {@code k}, or {@code null} when the tree has no cut into k clusters of the minimum size. */
    public KEvidence at(int k) {
        for (KEvidence e : byK) {
            if (e.k() == k) {
                return e;
            }
        }
        return null;
    }

    /** The gap statistic's choice of k (1..maxK), or 0 when it was not computed. */
    public int gapChoice() {
        return gap == null ? 0 : gap.chosenK();
    }
}
