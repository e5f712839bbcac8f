package org.treeproof.study;

import java.util.List;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.score.BranchSupport;
import org.treeproof.score.ConsensusAccumulator;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.JaccardStability;
import org.treeproof.score.SampleStability;

/**
 * Accumulates replicate outcomes, in index order, into the stability evidence of every linkage and k:
 * the adjusted Rand index of each replicate with the reference cut, the consensus matrix, cluster-wise
 * Jaccard, per-sample stability and branch support. One thread feeds it; the order is fixed, so the
 * result is the same for any executor.
 */
final class StabilityTally {
    private final List<ReferenceSolution> references;
    private final int maxK;
    private final boolean full;
    private final double[][][] ari;
    private final ConsensusAccumulator[] consensus;
    private final JaccardStability.Accumulator[][] jaccard;
    private final SampleStability.Accumulator[][] samples;
    private final BranchSupport.Tally[] support;
    private int added;

    /**
     * @param full whether to keep cluster-wise, per-sample and branch evidence (the observed data) or only
     *             what null calibration needs (ARI and the consensus matrix)
     */
    StabilityTally(List<ReferenceSolution> references, int n, int maxK, int replicates, boolean full) {
        this.references = references;
        this.maxK = maxK;
        this.full = full;
        int l = references.size();
        ari = new double[l][maxK - 1][replicates];
        consensus = new ConsensusAccumulator[l];
        jaccard = full ? new JaccardStability.Accumulator[l][maxK - 1] : null;
        samples = full ? new SampleStability.Accumulator[l][maxK - 1] : null;
        support = full ? new BranchSupport.Tally[l] : null;
        for (int i = 0; i < l; i++) {
            consensus[i] = ConsensusAccumulator.create(n, maxK, replicates);
            if (full) {
                support[i] = new BranchSupport.Tally(n - 1);
                for (int k = 2; k <= maxK; k++) {
                    Partition ref = references.get(i).cut(k).partition();
                    jaccard[i][k - 2] = JaccardStability.accumulator(ref);
                    samples[i][k - 2] = SampleStability.accumulator(ref);
                }
            }
        }
    }

    void add(ReplicateOutcome r) {
        if (r.index() != added) {
            throw new IllegalStateException("replicate " + r.index() + " arrived where " + added + " was expected");
        }
        int[] items = r.distinct();
        for (int l = 0; l < references.size(); l++) {
            Partition[] cuts = new Partition[maxK - 1];
            for (int k = 2; k <= maxK; k++) {
                Partition p = new Partition(r.labels()[l][k - 2], k);
                cuts[k - 2] = p;
                Partition ref = references.get(l).cut(k).partition().restrict(items);
                ari[l][k - 2][added] = AdjustedRandIndex.of(ref, p).compute().value();
                if (full) {
                    jaccard[l][k - 2].add(added, items, p);
                    samples[l][k - 2].add(items, p);
                }
            }
            consensus[l].addNestedCuts(items, cuts);
            if (full && r.support() != null) {
                support[l].add(r.support()[l]);
            }
        }
        added++;
    }

    int added() {
        return added;
    }

    /** Per-replicate ARI values of linkage {@code l} at {@code k}, in replicate order. */
    double[] ari(int l, int k) {
        return java.util.Arrays.copyOf(ari[l][k - 2], added);
    }

    ConsensusMatrix consensus(int l) {
        return consensus[l].finish();
    }

    JaccardStability.Result jaccard(int l, int k) {
        return jaccard[l][k - 2].result();
    }

    SampleStability.Result samples(int l, int k) {
        return samples[l][k - 2].result();
    }

    double[] branchSupport(int l) {
        return support[l].support();
    }
}
