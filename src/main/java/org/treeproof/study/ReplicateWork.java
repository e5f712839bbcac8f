package org.treeproof.study;

import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReplicatePlan;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.score.BranchSupport;
import org.treeproof.tree.MergeTree;

/**
 * The replicate function: a pure function of (data, distances, reference solutions, plan) that draws
 * the replicate, reclusters it with every linkage and cuts it at k = 2..maxK.
 *
 * <p>Sample replicates gather their rows of the full distance matrix and never recompute a distance;
 * feature replicates recompute distances over their features, on one thread (the replicates themselves
 * run in parallel). Memory per running replicate: one condensed matrix over its draws, the linkage's
 * working copy of it, and O(n · maxK) labels.
 */
final class ReplicateWork {
    private final DataMatrix data;
    private final CondensedDistances distances;
    private final Metric metric;
    private final List<ReferenceSolution> references;
    private final List<BranchSupport> supports;
    private final ReplicatePlanner planner;
    private final int maxK;

    /**
     * @param supports per reference, the branch-support counter, or {@code null} to skip branch support
     */
    ReplicateWork(DataMatrix data, CondensedDistances distances, Metric metric, List<ReferenceSolution> references,
            List<BranchSupport> supports, ReplicatePlanner planner, int maxK) {
        this.data = data;
        this.distances = distances;
        this.metric = metric;
        this.references = references;
        this.supports = supports;
        this.planner = planner;
        this.maxK = maxK;
    }

    ReplicateOutcome run(int index) {
        ReplicatePlan plan = planner.plan(index);
        int[] draws = plan.draws();
        int[] distinct = plan.distinct();
        CondensedDistances d;
        if (plan.resamplesFeatures()) {
            CondensedDistances onDistinct = metric.compute(data.selectSamples(distinct), plan.features(), 1);
            d = draws.length == distinct.length ? onDistinct : onDistinct.gather(plan.drawToDistinct());
        } else {
            d = distances.gather(draws);
        }
        int[] firstDrawOf = firstDrawOfDistinct(plan);
        int[][][] labels = new int[references.size()][][];
        BranchSupport.Replicate[] support = supports == null ? null : new BranchSupport.Replicate[references.size()];
        for (int l = 0; l < references.size(); l++) {
            MergeTree tree = references.get(l).linkage().cluster(d);
            labels[l] = new int[maxK - 1][];
            for (int k = 2; k <= maxK; k++) {
                int[] onDraws = tree.cutLabelsAtK(k);
                labels[l][k - 2] = firstDrawOf == null ? onDraws : onDistinct(onDraws, firstDrawOf);
            }
            if (support != null) {
                support[l] = supports.get(l).score(draws, tree);
            }
        }
        return new ReplicateOutcome(index, distinct, labels, support);
    }

    /** For each distinct sample, the position of its first draw; null when there are no repeats. */
    private static int[] firstDrawOfDistinct(ReplicatePlan plan) {
        if (plan.drawCount() == plan.distinct().length) {
            return null;
        }
        int[] map = plan.drawToDistinct();
        int[] first = new int[plan.distinct().length];
        java.util.Arrays.fill(first, -1);
        for (int a = 0; a < map.length; a++) {
            if (first[map[a]] < 0) {
                first[map[a]] = a;
            }
        }
        return first;
    }

    /**
     * Labels of the distinct samples from labels of the draws, relabelled canonically. Copies of a sample
     * are at distance 0 and join before any cut at k <= maxK separates them, so the first copy speaks for all.
     */
    private static int[] onDistinct(int[] onDraws, int[] firstDrawOf) {
        int[] raw = new int[firstDrawOf.length];
        for (int a = 0; a < raw.length; a++) {
            raw[a] = onDraws[firstDrawOf[a]];
        }
        return org.treeproof.partition.Partition.of(raw).labels();
    }
}
