package org.treeproof.study;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.resample.Resampling;
import org.treeproof.resample.Seeds;
import org.treeproof.score.BranchSupport;
import org.treeproof.tree.Linkage;

/**
 * The same replicate work as replicate_scipy.py, done by treeproof's own code path (ReplicateWork, then the
 * StabilityTally that scores every replicate: ARI at k = 2..10, consensus counters, cluster-wise Jaccard,
 * per-sample stability, branch support), average linkage only, on the given number of threads.
 * Prints: kind, threads, replicates per second (median of rounds), seconds per replicate.
 *
 *   java -cp bench-classes:target/treeproof.jar org.treeproof.study.ReplicateBench DATA.f64 N P REPLICATES FF THREADS
 */
public final class ReplicateBench {
    public static void main(String[] a) throws IOException {
        Path path = Path.of(a[0]);
        int n = Integer.parseInt(a[1]);
        int p = Integer.parseInt(a[2]);
        int reps = Integer.parseInt(a[3]);
        double ff = Double.parseDouble(a[4]);
        int threads = Integer.parseInt(a[5]);
        double[] v = new double[n * p];
        ByteBuffer.wrap(Files.readAllBytes(path)).order(ByteOrder.LITTLE_ENDIAN).asDoubleBuffer().get(v);
        var ids = new ArrayList<String>();
        var names = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        DataMatrix data = new DataMatrix(ids, names, v);
        CondensedDistances d = Metric.EUCLIDEAN.compute(data, threads);
        List<ReferenceSolution> refs = List.of(ReferenceSolution.of(Linkage.AVERAGE, d, 10));
        var supports = List.of(BranchSupport.of(refs.get(0).tree(), 1));
        for (String kind : List.of("sample", "feature")) {
            double fraction = kind.equals("sample") ? 1.0 : ff;
            var planner = new ReplicatePlanner(n, p, Resampling.SUBSAMPLE, 0.8, fraction, 1, Seeds.Purpose.REPLICATE);
            var work = new ReplicateWork(data, d, Metric.EUCLIDEAN, List.of(Linkage.AVERAGE), supports, planner, 10);
            var executor = new LocalExecutor(threads);
            double[] rates = new double[5];
            for (int round = 0; round < rates.length + 1; round++) {
                var tally = new StabilityTally(refs, n, 10, reps, true);
                long t0 = System.nanoTime();
                executor.run(0, reps, work, tally::add);
                double s = (System.nanoTime() - t0) / 1e9;
                if (round > 0) {    // round 0 warms the JIT up
                    rates[round - 1] = reps / s;
                }
            }
            Arrays.sort(rates);
            double median = rates[rates.length / 2];
            System.out.printf(java.util.Locale.ROOT, "%s\t%d\t%.2f\t%.4f%n", kind, threads, median, 1 / median);
        }
    }
}
