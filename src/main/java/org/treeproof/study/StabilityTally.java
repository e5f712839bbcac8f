package org.treeproof.study;

import java.util.Arrays;
import java.util.List;
import org.treeproof.partition.Clustering;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.score.BranchSupport;
import org.treeproof.score.ConsensusAccumulator;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.JaccardStability;
import org.treeproof.score.SampleStability;
import org.treeproof.tree.SizedCut;

/**
 * Accumulates replicate outcomes, in index order, into the stability evidence of every linkage and k:
 * the adjusted Rand index of each replicate with the reference cut, the consensus matrix, cluster-wise
 * Jaccard, per-sample stability and branch support. One thread feeds it; the order is fixed, so the
 * result is the same for any executor.
 *
 * <p><b>Clusters a replicate did not draw.</b> A reference cluster is present in a replicate when the replicate
 * holds at least the replicate's minimum cluster size of its members ({@link StudySettings#minClusterSizeFor}).
 * The reference at k is compared with the replicate's own cut into as many clusters as the reference has
 * present, never more: a replicate is not made to split another cluster because one was not drawn. Members of
 * an absent cluster are left out of that replicate's Jaccard and per-sample counts.
 *
 * <p><b>Outliers.</b> For the adjusted Rand index and the consensus matrix an outlier is a cluster of its own
 * (together with nobody); reference outliers get no Jaccard or per-sample value of their own.
 */
final class StabilityTally {
    private final List<ReferenceSolution> references;
    private final int n;
    private final int maxK;
    private final boolean full;
    private final double[][][] ari;
    private final ConsensusAccumulator[] consensus;
    private final JaccardStability.Accumulator[][] jaccard;
    private final SampleStability.Accumulator[][] samples;
    private final BranchSupport.Tally[] support;
    /** Per linkage and k: the reference clustering, or null when the cut does not exist. */
    private final Clustering[][] refs;
    private int added;

    /**
     * @param full whether to keep cluster-wise, per-sample and branch evidence (the observed data) or only
     *             what null calibration needs (ARI and the consensus matrix)
     */
    StabilityTally(List<ReferenceSolution> references, int n, int maxK, int replicates, boolean full) {
        this.references = references;
        this.n = n;
        this.maxK = maxK;
        this.full = full;
        int l = references.size();
        ari = new double[l][maxK - 1][replicates];
        consensus = new ConsensusAccumulator[l];
        jaccard = full ? new JaccardStability.Accumulator[l][maxK - 1] : null;
        samples = full ? new SampleStability.Accumulator[l][maxK - 1] : null;
        support = full ? new BranchSupport.Tally[l] : null;
        refs = new Clustering[l][maxK - 1];
        for (int i = 0; i < l; i++) {
            consensus[i] = ConsensusAccumulator.create(n, maxK, replicates);
            if (full) {
                support[i] = new BranchSupport.Tally(n - 1);
            }
            for (int k = 2; k <= maxK; k++) {
                SizedCut cut = references.get(i).cut(k);
                if (cut == null) {
                    continue;
                }
                refs[i][k - 2] = cut.clustering();
                if (full) {
                    Partition ref = cut.clustering().withSingletons();
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
            int[][] own = r.labels()[l];
            if (own.length != maxK) {
                throw new IllegalStateException("a replicate holds cuts for " + own.length + " k, not " + maxK);
            }
            Partition[] cuts = new Partition[maxK - 1];
            for (int k = 2; k <= maxK; k++) {
                cuts[k - 2] = withSingletons(own[k - 1]);
            }
            int minSize = references.get(l).minSize();
            int present = StudySettings.minClusterSizeFor(minSize, n, items.length);
            for (int k = 2; k <= maxK; k++) {
                Clustering ref = refs[l][k - 2];
                if (ref == null) {
                    ari[l][k - 2][added] = Double.NaN;
                    continue;
                }
                int[] drawn = new int[ref.k()];
                for (int item : items) {
                    int c = ref.label(item);
                    if (c >= 0) {
                        drawn[c]++;
                    }
                }
                int kr = 0;
                for (int c : drawn) {
                    kr += c >= present ? 1 : 0;
                }
                kr = Math.max(1, kr);
                Partition mine = kr == k ? cuts[k - 2] : withSingletons(own[kr - 1]);
                Partition theirs = ref.restrict(items).withSingletons();
                ari[l][k - 2][added] = AdjustedRandIndex.of(theirs, mine).compute().value();
                if (full) {
                    int[] keep = presentPositions(items, ref, drawn, present);
                    int[] keptItems = new int[keep.length];
                    int[] keptLabels = new int[keep.length];
                    int[] mineLabels = mine.labels();
                    for (int t = 0; t < keep.length; t++) {
                        keptItems[t] = items[keep[t]];
                        keptLabels[t] = mineLabels[keep[t]];
                    }
                    Partition kept = keep.length == items.length ? mine : Partition.of(keptLabels);
                    jaccard[l][k - 2].add(added, keptItems, kept);
                    samples[l][k - 2].add(keptItems, kept);
                }
            }
            consensus[l].addNestedCuts(items, cuts);
            if (full && r.support() != null) {
                support[l].add(r.support()[l]);
            }
        }
        added++;
    }

    /** Positions of the items that are not members of a reference cluster absent from this replicate. */
    private static int[] presentPositions(int[] items, Clustering ref, int[] drawn, int present) {
        int[] out = new int[items.length];
        int t = 0;
        for (int a = 0; a < items.length; a++) {
            int c = ref.label(items[a]);
            if (c < 0 || drawn[c] >= present) {
                out[t++] = a;
            }
        }
        return t == out.length ? out : Arrays.copyOf(out, t);
    }

    /** Outlier-marked labels as a partition in which every outlier is a cluster of its own. */
    static Partition withSingletons(int[] labels) {
        int max = -1;
        for (int l : labels) {
            max = Math.max(max, l);
        }
        int[] raw = new int[labels.length];
        int next = max + 1;
        for (int i = 0; i < labels.length; i++) {
            raw[i] = labels[i] >= 0 ? labels[i] : next++;
        }
        return Partition.of(raw);
    }

    int added() {
        return added;
    }

    /** Per-replicate ARI values of linkage {@code l} at {@code k}, in replicate order (NaN: no such cut). */
    double[] ari(int l, int k) {
        return Arrays.copyOf(ari[l][k - 2], added);
    }

    ConsensusMatrix consensus(int l) {
        return consensus[l].finish();
    }

    /** Jaccard of the reference with singleton outliers; see {@link #clusterIds}. */
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
