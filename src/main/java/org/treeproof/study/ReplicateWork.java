package org.treeproof.study;

import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.distance.OwnedDistances;
import org.treeproof.resample.ReplicatePlan;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.resample.ReplicateTask;
import org.treeproof.score.BranchSupport;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;
import org.treeproof.tree.SizedCuts;

/**
 * The replicate function: a pure function of (data, distances, linkages, plan) that draws the replicate,
 * reclusters it with every linkage and cuts it into k = 1..maxK clusters of at least the (scaled) minimum size,
 * smaller branches marked as outliers ({@link SizedCuts}).
 *
 * <p>Sample replicates gather their rows of the full distance matrix and never recompute a distance;
 * feature replicates recompute distances over their features, on one thread (the replicates themselves
 * run in parallel). Memory per running replicate: one condensed matrix over its draws, one working copy that
 * every linkage but the last overwrites in turn (the last works in place on the matrix), and O(n · maxK) labels;
 * both arrays are kept for the next replicate of this work object (two per thread at most).
 *
 * <p><b>Shipped to other machines</b>, the work carries the data table but not the full n² matrix (unless
 * there is no table, as for an input of distances). A copy without the matrix computes each replicate's
 * distances over its distinct samples, or, once {@link #prepare}d, the full matrix once and gathers from it as
 * here. Either way it gives the same bits: the kernel folds every pair alone, in feature order, so a pair's
 * distance does not depend on which other samples are computed with it.
 */
final class ReplicateWork implements ReplicateTask<ReplicateOutcome> {
    private static final long serialVersionUID = 1L;

    private final DataMatrix data;
    private final CondensedDistances distances;
    private final Metric metric;
    private final List<Linkage> linkages;
    private final List<BranchSupport> supports;
    private final ReplicatePlanner planner;
    private final int maxK;
    private final int minClusterSize;
    private final int samples;
    /**
     * Condensed arrays of finished replicates, for the next ones to overwrite instead of allocating (and zeroing)
     * two matrices per replicate; at most two per thread that ran one. Not shipped: a copy starts empty.
     */
    private final transient java.util.Queue<double[]> spare = new java.util.concurrent.ConcurrentLinkedQueue<>();

    /**
     * @param data      the data table, or {@code null} when only distances are known
     * @param distances the full matrix under {@code metric}, or {@code null} to compute distances from {@code data}
     * @param supports  per linkage, the branch-support counter of its reference tree, or {@code null} to skip
     *                  branch support
     * @param minClusterSize the study's smallest cluster, scaled to each replicate by
     *                  {@link StudySettings#minClusterSizeFor}
     * @param samples   the number of samples of the study
     */
    ReplicateWork(DataMatrix data, CondensedDistances distances, Metric metric, List<Linkage> linkages,
            List<BranchSupport> supports, ReplicatePlanner planner, int maxK, int minClusterSize, int samples) {
        if (data == null && distances == null) {
            throw new IllegalArgumentException("replicate work needs data or distances");
        }
        if (planner.resamplesFeatures() && data == null) {
            throw new IllegalArgumentException("feature replicates need the data table");
        }
        this.data = data;
        this.distances = distances;
        this.metric = metric;
        this.linkages = List.copyOf(linkages);
        this.supports = supports == null ? null : List.copyOf(supports);
        this.planner = planner;
        this.maxK = maxK;
        this.minClusterSize = minClusterSize;
        this.samples = samples;
    }

    @Override
    public ReplicateOutcome apply(int index) {
        ReplicatePlan plan = planner.plan(index);
        int[] draws = plan.draws();
        int[] distinct = plan.distinct();
        OwnedDistances d;
        double[] gathered = null;
        double[] work = null;
        if (plan.resamplesFeatures() || distances == null) {
            DataMatrix rows = data.selectSamples(distinct);
            OwnedDistances onDistinct = plan.resamplesFeatures() ? metric.computeOwned(rows, plan.features(), 1)
                    : metric.computeOwned(rows, 1);
            d = draws.length == distinct.length ? onDistinct
                    : onDistinct.freeze().gatherOwned(plan.drawToDistinct());
        } else {
            gathered = borrow(CondensedDistances.length(draws.length));
            d = distances.gatherOwned(draws, gathered);
        }
        int[] firstDrawOf = firstDrawOfDistinct(plan);
        int[][][] labels = new int[linkages.size()][][];
        BranchSupport.Replicate[] support = supports == null ? null : new BranchSupport.Replicate[linkages.size()];
        if (linkages.size() > 1) {
            work = borrow(CondensedDistances.length(draws.length));
        }
        // every linkage but the last overwrites the one working copy in turn; the last takes the replicate's matrix
        List<MergeTree> trees = Linkage.clusterEach(linkages, d, work);
        for (int l = 0; l < linkages.size(); l++) {
            MergeTree tree = trees.get(l);
            int minSize = StudySettings.minClusterSizeFor(minClusterSize, samples, tree.leaves());
            int[][] cuts = SizedCuts.of(tree, minSize, maxK).labelsUpTo(maxK);
            labels[l] = new int[maxK][];
            for (int k = 1; k <= maxK; k++) {
                int[] onDraws = cuts[k - 1];
                labels[l][k - 1] = firstDrawOf == null ? onDraws : onDistinct(onDraws, firstDrawOf);
            }
            if (support != null) {
                support[l] = supports.get(l).score(draws, tree);
            }
        }
        // every tree is built: no linkage holds the arrays any longer
        if (work != null) {
            spare.add(work);
        }
        if (gathered != null) {
            spare.add(gathered);
        }
        return new ReplicateOutcome(index, distinct, labels, support);
    }

    /** A spare array of {@code length} values (old contents), or a new one; spares of another length are dropped. */
    private double[] borrow(int length) {
        for (double[] a = spare.poll(); a != null; a = spare.poll()) {
            if (a.length == length) {
                return a;
            }
        }
        return new double[length];
    }

    /**
     * With the data but not the full matrix, the same work holding the full matrix, computed once here with
     * {@code threads} threads: each replicate then gathers instead of recomputing (worth it when a JVM runs more
     * than one or two replicates; it costs one n² matrix). Feature replicates recompute anyway.
     */
    @Override
    public ReplicateTask<ReplicateOutcome> prepare(int threads) {
        if (distances != null || planner.resamplesFeatures()) {
            return this;
        }
        return new ReplicateWork(data, metric.compute(data, threads), metric, linkages, supports, planner, maxK,
                minClusterSize, samples);
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
        return org.treeproof.partition.Clustering.of(raw).labels();
    }

    /** The data travel; the full matrix only when there is no data table to compute it from. */
    private Object writeReplace() {
        return new SerialForm(data, data == null ? distances : null, metric, linkages, supports, planner, maxK,
                minClusterSize, samples);
    }

    private void readObject(ObjectInputStream in) throws java.io.InvalidObjectException {
        throw new java.io.InvalidObjectException("replicate work is read through its serial form");
    }

    private record SerialForm(DataMatrix data, CondensedDistances distances, Metric metric, List<Linkage> linkages,
            List<BranchSupport> supports, ReplicatePlanner planner, int maxK, int minClusterSize, int samples)
            implements Serializable {
        private Object readResolve() {
            return new ReplicateWork(data, distances, metric, linkages, supports, planner, maxK, minClusterSize,
                    samples);
        }
    }
}
