package org.treeproof.study;

import java.math.BigDecimal;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReferenceData;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.resample.ReplicateTask;
import org.treeproof.resample.Resampling;
import org.treeproof.resample.Seeds;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.Silhouette;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.SizedCut;

/**
 * One null data set of stability calibration as a task: drawn from its seed, its distances and reference trees,
 * its replicates, and its mean ARI, PAC and silhouette for every linkage and k, all on the thread that runs it.
 * Null sets are independent of each other, so an executor runs them side by side (or on other machines) and the
 * study's threads stay busy through what used to be serial steps of each set (its silhouettes, consensus
 * matrices and reference trees). The result is a pure function of the index: the same bits on any thread.
 *
 * <p>Row 0 of the result holds the index, row 1 the set's values in the order of {@link #pack}: for each linkage
 * and k = 2..maxK, mean ARI, PAC and silhouette (NaN where the set's tree has no cut at k).
 */
record NullSetTask(ReferenceData generator, Metric metric, List<Linkage> linkages, int maxK, int minSize,
        int replicates, Resampling resampling, double sampleFraction, double featureFraction, long masterSeed,
        double pacLow, double pacHigh) implements ReplicateTask<double[][]> {

    NullSetTask {
        linkages = List.copyOf(linkages);
    }

    static NullSetTask of(ReferenceData generator, StudySettings s, int minSize) {
        return new NullSetTask(generator, s.metric(), s.linkages(), s.maxK(), minSize, s.nullReplicates(),
                s.resampling(), s.sampleFraction(), s.featureFraction(), s.seed(), s.pacLow(), s.pacHigh());
    }

    private boolean resamplesFeatures() {
        return featureFraction < 1.0;
    }

    @Override
    public double[][] apply(int j) {
        return run(j, null, 1, new LocalExecutor(1));
    }

    /**
     * Set {@code j} with its parts spread over threads instead: distances on {@code threads} threads, reference
     * trees on {@code here}, replicates through {@code replicates} (null: one after another on this thread). For a
     * set too large to run side by side with another; the same result as {@link #apply}.
     */
    double[][] run(int j, ReplicateExecutor replicates, int threads, LocalExecutor here) {
        long seed = Seeds.seedFor(masterSeed, Seeds.Purpose.NULL_DATA, j);
        // Without feature resampling only distances matter, and Euclidean ones are the same in the null's
        // principal coordinates (an exact rotation), which skips the back-transform to the features.
        DataMatrix nullData = metric.rotationInvariant() && !resamplesFeatures()
                ? generator.drawCoordinates(seed) : generator.draw(seed);
        CondensedDistances nd = metric.compute(nullData, threads);
        List<ReferenceSolution> nullRefs = ReferenceSolution.all(linkages, nd, maxK, minSize, here);
        int n = nd.size();
        var planner = new ReplicatePlanner(n, nullData.features(), resampling, sampleFraction, featureFraction,
                Seeds.seedFor(masterSeed, Seeds.Purpose.NULL_REPLICATE, j), Seeds.Purpose.REPLICATE);
        var work = new ReplicateWork(nullData, nd, metric, linkages, null, planner, maxK, minSize, n);
        var tally = new StabilityTally(nullRefs, n, maxK, this.replicates, false);
        if (replicates == null) {
            for (int r = 0; r < this.replicates; r++) {
                tally.add(work.apply(r));
            }
        } else {
            replicates.run(0, this.replicates, work, tally::add);
        }
        int links = linkages.size();
        double[][][] meanAri = new double[links][maxK - 1][1];
        double[][][] pac = new double[links][maxK - 1][1];
        double[][][] sil = new double[links][maxK - 1][1];
        BigDecimal low = BigDecimal.valueOf(pacLow);
        BigDecimal high = BigDecimal.valueOf(pacHigh);
        Silhouette.Result[] widths = silhouettes(nd, nullRefs, maxK);
        for (int l = 0; l < links; l++) {
            ConsensusMatrix cm = tally.consensus(l);
            for (int k = 2; k <= maxK; k++) {
                SizedCut cut = nullRefs.get(l).cut(k);
                double[] a = tally.ari(l, k);
                meanAri[l][k - 2][0] = cut == null ? Double.NaN : mean(a);
                pac[l][k - 2][0] = cm.pac(k, low, high);
                sil[l][k - 2][0] = cut == null ? Double.NaN : widths[l * (maxK - 1) + k - 2].mean();
            }
        }
        return new double[][] {{j}, pack(0, meanAri, pac, sil)};
    }

    /**
     * The silhouette of every linkage's cut at k = 2..maxK, at {@code [l·(maxK-1) + k-2]} (null where there is no
     * cut), in one pass over the distances.
     */
    static Silhouette.Result[] silhouettes(CondensedDistances d, List<ReferenceSolution> refs, int maxK) {
        var cuts = new org.treeproof.partition.Clustering[refs.size() * (maxK - 1)];
        for (int l = 0; l < refs.size(); l++) {
            for (int k = 2; k <= maxK; k++) {
                SizedCut cut = refs.get(l).cut(k);
                cuts[l * (maxK - 1) + k - 2] = cut == null ? null : cut.clustering();
            }
        }
        return Silhouette.computeEach(d, cuts);
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return v.length == 0 ? Double.NaN : s / v.length;
    }

    /** Set {@code j}'s results as a row: mean ARI, PAC and silhouette for every linkage and k. */
    static double[] pack(int j, double[][][] meanAri, double[][][] pac, double[][][] sil) {
        int l = meanAri.length;
        int ks = meanAri[0].length;
        double[] row = new double[3 * l * ks];
        int t = 0;
        for (int a = 0; a < l; a++) {
            for (int k = 0; k < ks; k++) {
                row[t++] = meanAri[a][k][j];
                row[t++] = pac[a][k][j];
                row[t++] = sil[a][k][j];
            }
        }
        return row;
    }

    /** Stores a row of {@link #pack} as set {@code j}. */
    static void unpack(double[] row, int j, double[][][] meanAri, double[][][] pac, double[][][] sil) {
        int l = meanAri.length;
        int ks = meanAri[0].length;
        if (row.length != 3 * l * ks) {
            throw new IllegalStateException("a null-set row has the wrong length");
        }
        int t = 0;
        for (int a = 0; a < l; a++) {
            for (int k = 0; k < ks; k++) {
                meanAri[a][k][j] = row[t++];
                pac[a][k][j] = row[t++];
                sil[a][k][j] = row[t++];
            }
        }
    }
}
