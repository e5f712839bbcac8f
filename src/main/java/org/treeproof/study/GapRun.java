package org.treeproof.study;

import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.OwnedDistances;
import org.treeproof.resample.ReferenceData;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicateTask;
import org.treeproof.resample.Seeds;
import org.treeproof.score.GapResult;
import org.treeproof.score.GapStatistic;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/**
 * The gap statistic of every linkage (R. Tibshirani, G. Walther, T. Hastie, "Estimating the number of
 * clusters in a data set via the gap statistic", J. R. Stat. Soc. B 63 (2001) 411-423,
 * doi:10.1111/1467-9868.00293): each reference set is drawn, its distances computed and clustered with
 * every linkage, and log W_k recorded for k = 1..maxK; reference sets run in parallel.
 *
 * <p>W_k = Σ_r D_r / (2 n_r) with D_r the sum of d over ordered pairs in cluster r. The paper takes d as
 * squared Euclidean distance, so for the rotation-invariant (Euclidean) metrics W_k is the pooled within-cluster sum of
 * squares around the centroids; for any other metric d is that metric's dissimilarity.
 */
final class GapRun {
    private final DataMatrix data;
    private final CondensedDistances distances;
    private final StudySettings settings;
    private final List<ReferenceSolution> refs;
    private final ReplicateExecutor executor;
    private final StudyProgress progress;
    private final Checkpoint checkpoint;
    private final java.util.function.Supplier<org.treeproof.resample.PrincipalAxes> axes;

    GapRun(DataMatrix data, CondensedDistances distances, StudySettings settings, List<ReferenceSolution> refs,
            ReplicateExecutor executor, StudyProgress progress, Checkpoint checkpoint,
            java.util.function.Supplier<org.treeproof.resample.PrincipalAxes> axes) {
        this.axes = axes;
        this.checkpoint = checkpoint;
        this.data = data;
        this.distances = distances;
        this.settings = settings;
        this.refs = refs;
        this.executor = executor;
        this.progress = progress;
    }

    GapResult[] run() {
        int maxK = settings.maxK();
        int b = settings.referenceSets();
        int l = refs.size();
        double[][][] refLogW = new double[l][b][];
        ReferenceData generator = settings.gapReference().prepare(data, axes);
        progress.stage("reference data sets (gap statistic)", b);
        int first = 0;
        for (double[] kept : checkpoint.rows(Checkpoint.Stage.GAP_SETS)) {
            if (first >= b) {
                break;
            }
            for (int li = 0; li < l; li++) {
                refLogW[li][first] = java.util.Arrays.copyOfRange(kept, li * maxK, (li + 1) * maxK);
            }
            first++;
            progress.step();
        }
        var task = new ReferenceSet(generator, settings.metric(), settings.seed(), maxK, settings.linkages());
        executor.run(first, b, task, row -> {
            int index = (int) row[0][0];
            double[] flat = new double[l * maxK];
            for (int li = 0; li < l; li++) {
                refLogW[li][index] = row[li + 1];
                System.arraycopy(row[li + 1], 0, flat, li * maxK, maxK);
            }
            checkpoint.rowDone(Checkpoint.Stage.GAP_SETS, index, flat);
            progress.step();
        });
        GapResult[] out = new GapResult[l];
        for (int li = 0; li < l; li++) {
            MergeTree tree = refs.get(li).tree();
            double[] observed = logW(settings.metric(), data, distances, tree, maxK);
            out[li] = GapStatistic.compute(observed, refLogW[li]);
        }
        return out;
    }

    /**
     * One reference set as a task: drawn from its seed, its distances computed, clustered with every linkage.
     * Row 0 of the result holds the index; row 1 + l the log W_k of linkage l for k = 1..maxK. Carries the
     * generator (a few vectors and the principal axes), so it can run on another machine.
     */
    private record ReferenceSet(ReferenceData generator, Metric metric, long masterSeed, int maxK,
            List<Linkage> linkages) implements ReplicateTask<double[][]> {
        ReferenceSet {
            linkages = List.copyOf(linkages);
        }

        @Override
        public double[][] apply(int index) {
            long seed = referenceSeed(masterSeed, index);
            // Euclidean distances and sums of squares are the same in the reference's own coordinates (an exact
            // rotation), which skips the back-transform to the features.
            DataMatrix ref = metric.rotationInvariant() ? generator.drawCoordinates(seed) : generator.draw(seed);
            double[][] out = new double[linkages.size() + 1][];
            out[0] = new double[] {index};
            if (!metric.rotationInvariant()) {
                CondensedDistances rd = metric.compute(ref, 1);   // W_k is then read from the distances
                for (int li = 0; li < linkages.size(); li++) {
                    out[li + 1] = logW(metric, ref, rd, linkages.get(li).cluster(rd), maxK);
                }
                return out;
            }
            // W_k comes from the coordinates, so the trees may overwrite the distances: every linkage but the
            // last works on one copy (overwritten in turn), the last in place, instead of a fresh copy each
            OwnedDistances rd = metric.computeOwned(ref, 1);
            double[] work = linkages.size() > 1 ? new double[CondensedDistances.length(rd.size())] : null;
            List<MergeTree> trees = Linkage.clusterEach(linkages, rd, work);
            for (int li = 0; li < linkages.size(); li++) {
                out[li + 1] = logW(metric, ref, null, trees.get(li), maxK);
            }
            return out;
        }
    }

    /** The seed of reference set {@code index}: the one place that says how reference sets are seeded. */
    static long referenceSeed(long masterSeed, int index) {
        return Seeds.seedFor(masterSeed, Seeds.Purpose.GAP_REFERENCE, index);
    }

    /** log W_k for k = 1..maxK; {@code d} is read only for a metric that is not rotation-invariant (else null). */
    private static double[] logW(Metric metric, DataMatrix x, CondensedDistances d, MergeTree tree, int maxK) {
        double[] out = new double[maxK];
        if (metric.rotationInvariant()) {
            double[] w = GapStatistic.withinSumsOfSquaresNested(x, tree.cutLabelsUpTo(maxK));
            for (int k = 1; k <= maxK; k++) {
                out[k - 1] = StrictMath.log(w[k - 1]);
            }
            return out;
        }
        for (int k = 1; k <= maxK; k++) {
            int[] labels = tree.cutLabelsAtK(k);
            out[k - 1] = StrictMath.log(within(d, labels, k));
        }
        return out;
    }

    private static double within(CondensedDistances d, int[] labels, int k) {
        // Σ_r (1 / n_r) Σ_{i<i' in r} d(i, i')
        int n = labels.length;
        int[] size = new int[k];
        for (int lab : labels) {
            size[lab]++;
        }
        double[] sum = new double[k];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (labels[i] == labels[j]) {
                    sum[labels[i]] += d.get(i, j);
                }
            }
        }
        double w = 0;
        for (int c = 0; c < k; c++) {
            w += sum[c] / size[c];
        }
        return w;
    }
}
