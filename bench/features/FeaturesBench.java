import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.treeproof.data.DataMatrix;
import org.treeproof.explain.ContrastTest;
import org.treeproof.explain.FeatureContrast;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.Solution;
import org.treeproof.io.ExplainCsv;

/**
 * Times features.csv: every feature compared between each cluster and the rest (FeatureContrast) and the CSV text
 * (ExplainCsv.features), on seeded normal data with k planted clusters of equal size, 20 markers each.
 * Usage: FeaturesBench N P K THREADS REPS TEST; prints one tab-separated line per run:
 * n, p, k, threads, test, compute s, csv s, total s, csv MB, process CPU s of the run (all threads).
 */
public class FeaturesBench {
    public static void main(String[] a) {
        int n = Integer.parseInt(a[0]);
        int p = Integer.parseInt(a[1]);
        int k = Integer.parseInt(a[2]);
        int threads = Integer.parseInt(a[3]);
        int reps = Integer.parseInt(a[4]);
        ContrastTest test = ContrastTest.parse(a[5]);
        var r = new SplittableRandom(42);
        double[] v = new double[n * p];
        int[] labels = new int[n];
        var ids = new ArrayList<String>(n);
        var names = new ArrayList<String>(p);
        for (int j = 0; j < p; j++) {
            names.add("gene-" + j);
        }
        for (int i = 0; i < n; i++) {
            labels[i] = i * k / n + 1;
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                // values rounded to 3 decimals, as measured data are: ties happen
                double x = r.nextGaussian() + (j / 20 == labels[i] - 1 ? 2 : 0);
                v[i * p + j] = Math.round(x * 1000) / 1000.0;
            }
        }
        DataMatrix data = new DataMatrix(ids, names, v);
        Solution s = Solution.of(labels);
        var os = (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                .getOperatingSystemMXBean();
        for (int rep = 0; rep < reps; rep++) {
            long c0 = os.getProcessCpuTime();
            long t0 = System.nanoTime();
            FeatureTable t = FeatureContrast.of(data, s, test, threads).compute();
            long t1 = System.nanoTime();
            byte[] csv = ExplainCsv.features(t).getBytes(StandardCharsets.UTF_8);
            long t2 = System.nanoTime();
            long c2 = os.getProcessCpuTime();
            System.out.printf(java.util.Locale.ROOT, "%d\t%d\t%d\t%d\t%s\t%.3f\t%.3f\t%.3f\t%.1f\t%.3f%n", n, p, k,
                    threads, test.id(), (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t2 - t0) / 1e9, csv.length / 1e6,
                    (c2 - c0) / 1e9);
        }
    }
}
