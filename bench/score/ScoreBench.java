import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.score.CalinskiHarabasz;
import org.treeproof.score.ConsensusAccumulator;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.DaviesBouldin;
import org.treeproof.score.DunnIndex;
import org.treeproof.score.JaccardStability;
import org.treeproof.score.SampleStability;
import org.treeproof.score.Separation;
import org.treeproof.score.Silhouette;
import org.treeproof.score.WithinClusterSumOfSquares;

/**
 * Rough timings (thread CPU time) of the scores at the study's sizes. Build, then run from the repository root:
 * <pre>
 *   mvn -q -o compile
 *   java -Xmx4g -cp target/classes bench/score/ScoreBench.java [n] [features] [replicates] [rounds]
 * </pre>
 * Defaults: n = 2000, 50 features, 200 replicates, 3 rounds of the per-cut scores, k = 2..10. Data and cuts are random (seeded);
 * the cuts are nested like a tree's but come from random merges, so no tree code is needed.
 */
public class ScoreBench {
    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
        int p = args.length > 1 ? Integer.parseInt(args[1]) : 50;
        int replicates = args.length > 2 ? Integer.parseInt(args[2]) : 200;
        int rounds = args.length > 3 ? Integer.parseInt(args[3]) : 3;
        int maxK = 10;
        SplittableRandom rnd = new SplittableRandom(1);
        double[] x = new double[n * p];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();
        }
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        List<String> names = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        DataMatrix data = new DataMatrix(ids, names, x);
        double[] d = new double[(int) ((long) n * (n - 1) / 2)];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = 0;
                for (int f = 0; f < p; f++) {
                    double u = x[i * p + f] - x[j * p + f];
                    s += u * u;
                }
                d[t++] = Math.sqrt(s);
            }
        }
        CondensedDistances dist = CondensedDistances.of(n, d);
        Partition[] cuts = nestedCuts(rnd, n, maxK);
        System.out.printf("n=%d features=%d replicates=%d k=2..%d%n", n, p, replicates, maxK);

        for (int round = 0; round < rounds; round++) {   // the first rounds warm the JIT up
            long t0 = cpu();
            double sink = 0;
            for (Partition c : cuts) {
                sink += Silhouette.of(dist, c).compute().mean();
            }
            long t1 = cpu();
            for (Partition c : cuts) {
                sink += DunnIndex.of(dist, c).compute().value();
            }
            long t2 = cpu();
            for (Partition c : cuts) {
                sink += CalinskiHarabasz.of(data, c).compute().value() + DaviesBouldin.of(data, c).compute().value()
                        + WithinClusterSumOfSquares.of(data, c).compute().total();
            }
            long t3 = cpu();
            for (Partition c : cuts) {
                sink += Separation.of(data, org.treeproof.partition.Clustering.of(c)).clusters().size();
            }
            long t4 = cpu();
            System.out.printf("round %d, per cut: silhouette %.2f ms, Dunn %.2f ms, CH+DB+W_k %.2f ms, separation "
                    + "(dip tests) %.2f ms (%s)%n", round, (t1 - t0) / 9e6, (t2 - t1) / 9e6, (t3 - t2) / 9e6,
                    (t4 - t3) / 9e6, sink > 0 ? "ok" : "?");
        }

        int m = (int) Math.round(0.8 * n);
        long bytes = ConsensusAccumulator.bytesFor(n, maxK, replicates);
        ConsensusAccumulator acc = ConsensusAccumulator.create(n, maxK, replicates);
        JaccardStability.Accumulator jac = JaccardStability.accumulator(cuts[1]);
        SampleStability.Accumulator stay = SampleStability.accumulator(cuts[1]);
        long add = 0;
        long other = 0;
        double ari = 0;
        for (int r = 0; r < replicates; r++) {
            int[] items = subsample(rnd, n, m);
            Partition[] rc = nestedCuts(rnd, m, maxK);
            long a0 = cpu();
            acc.addNestedCuts(items, rc);
            long a1 = cpu();
            jac.add(r, items, rc[1]);
            stay.add(items, rc[1]);
            ari += AdjustedRandIndex.of(cuts[1].restrict(items), rc[1]).compute().value();
            other += cpu() - a1;
            add += a1 - a0;
        }
        long f0 = cpu();
        ConsensusMatrix cm = acc.finish();
        long f1 = cpu();
        double pac = cm.pac(3);
        System.out.printf("consensus: %d MB of counters, %.2f ms per replicate added, finish %.0f ms; "
                + "Jaccard+sample stability+ARI %.2f ms per replicate (PAC k=3 %.3f, mean ARI %.3f, %s)%n",
                bytes >> 20, add / 1e6 / replicates, (f1 - f0) / 1e6, other / 1e6 / replicates, pac, ari / replicates,
                jac.result().cluster(0).status().label());
    }

    /** CPU time of this thread: the machine is shared, so wall time would measure the neighbours. */
    static long cpu() {
        return java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    static int[] subsample(SplittableRandom rnd, int n, int m) {
        int[] perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = i;
        }
        for (int i = 0; i < m; i++) {
            int j = i + rnd.nextInt(n - i);
            int tmp = perm[i];
            perm[i] = perm[j];
            perm[j] = tmp;
        }
        return java.util.Arrays.copyOf(perm, m);
    }

    /** Nested cuts for k = 2..maxK from random merges of a random maxK-clustering. */
    static Partition[] nestedCuts(SplittableRandom rnd, int m, int maxK) {
        int[] labels = new int[m];
        for (int a = 0; a < m; a++) {
            labels[a] = a < maxK ? a : rnd.nextInt(maxK);
        }
        Partition[] cuts = new Partition[maxK - 1];
        int clusters = maxK;
        for (int level = maxK; level >= 2; level--) {
            while (clusters > level) {
                int gone = clusters - 1;
                int keep = rnd.nextInt(gone);
                for (int a = 0; a < m; a++) {
                    if (labels[a] == gone) {
                        labels[a] = keep;
                    }
                }
                clusters--;
            }
            cuts[level - 2] = new Partition(labels, clusters).restrict(identity(m));
        }
        return cuts;
    }

    static int[] identity(int m) {
        int[] id = new int[m];
        for (int i = 0; i < m; i++) {
            id[i] = i;
        }
        return id;
    }
}
