package org.treeproof.study;

import java.util.List;
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
 */
public record LinkageEvidence(Linkage linkage, MergeTree tree, double copheneticCorrelation, GapResult gap,
        List<KEvidence> byK, double[] branchSupport, ConsensusMatrix consensus) {

    public LinkageEvidence {
        byK = List.copyOf(byK);
        branchSupport = branchSupport.clone();
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
