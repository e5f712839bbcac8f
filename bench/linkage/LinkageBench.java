import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/**
 * In-process timing of Linkage.cluster on the benchmark points (see make_points.py); not a test.
 *
 * <pre>
 * java -cp target/classes:bench/out/linkage LinkageBench REPS FILE N [FILE N ...]
 * java -cp target/classes:bench/out/linkage LinkageBench cophenetic N
 * </pre>
 *
 * The first form warms up on small data, then prints, per (n, linkage), the medians of REPS runs of
 * wall-clock seconds and of the thread's CPU seconds, and the sum of heights (to check the result
 * against scipy's). Run it with a fixed heap (-Xms = -Xmx) so collections stay out of the way. The second builds n random points, single linkage and the
 * streaming cophenetic correlation, and reports times and the heap in use.
 */
public final class LinkageBench {
    /** CPU time of the running thread, in nanoseconds (the algorithms are single-threaded). */
    private static final java.lang.management.ThreadMXBean CPU = java.lang.management.ManagementFactory.getThreadMXBean();

    private LinkageBench() {
    }

    public static void main(String[] args) throws IOException {
        if (args[0].equals("cophenetic")) {
            cophenetic(Integer.parseInt(args[1]));
            return;
        }
        int reps = Integer.parseInt(args[0]);
        warmUp();
        for (int a = 1; a + 1 < args.length; a += 2) {
            int n = Integer.parseInt(args[a + 1]);
            double[] x = read(Path.of(args[a]), n);
            CondensedDistances d = distances(x, n, x.length / n);
            for (Linkage l : Linkage.values()) {
                double[] wall = new double[reps];
                double[] cpu = new double[reps];
                double sum = 0;
                for (int r = 0; r < reps; r++) {
                    long c0 = CPU.getCurrentThreadCpuTime();
                    long t0 = System.nanoTime();
                    MergeTree tree = l.cluster(d);
                    wall[r] = (System.nanoTime() - t0) / 1e9;
                    cpu[r] = (CPU.getCurrentThreadCpuTime() - c0) / 1e9;
                    sum = Arrays.stream(tree.heights()).sum();
                }
                Arrays.sort(wall);
                Arrays.sort(cpu);
                System.out.printf("%d\t%s\t%.4f\t%.4f\t%s%n", n, l.id(), wall[reps / 2], cpu[reps / 2],
                        Double.toString(sum));
            }
        }
    }

    /** Runs every linkage on small random data first, so the timed runs measure compiled code. */
    private static void warmUp() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(1);
        int n = 1500;
        double[] x = new double[n * 10];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();
        }
        CondensedDistances d = distances(x, n, 10);
        for (int rep = 0; rep < 3; rep++) {
            for (Linkage l : Linkage.values()) {
                l.cluster(d);
            }
        }
    }

    private static double[] read(Path file, int n) throws IOException {
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(file)).order(ByteOrder.LITTLE_ENDIAN);
        double[] x = new double[b.remaining() / Double.BYTES];
        b.asDoubleBuffer().get(x);
        if (x.length % n != 0) {
            throw new IllegalArgumentException(file + " does not hold " + n + " rows");
        }
        return x;
    }

    /** The scipy pdist loop: squared differences summed feature by feature, then the root. */
    private static CondensedDistances distances(double[] x, int n, int p) {
        double[] d = new double[CondensedDistances.length(n)];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = 0;
                for (int f = 0; f < p; f++) {
                    double diff = x[i * p + f] - x[j * p + f];
                    s += diff * diff;
                }
                d[t++] = Math.sqrt(s);
            }
        }
        return CondensedDistances.of(n, d);
    }

    private static void cophenetic(int n) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(n);
        int p = 10;
        double[] x = new double[n * p];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian() + (i / p % 5) * 3;
        }
        long t0 = System.nanoTime();
        CondensedDistances d = distances(x, n, p);
        long t1 = System.nanoTime();
        MergeTree tree = Linkage.SINGLE.cluster(d);
        long t2 = System.nanoTime();
        System.gc();
        Runtime rt = Runtime.getRuntime();
        long before = rt.totalMemory() - rt.freeMemory();
        double r = tree.copheneticCorrelation(d);
        long t3 = System.nanoTime();
        long after = rt.totalMemory() - rt.freeMemory();
        System.out.printf("n=%d matrix %.2f GB (max heap %.2f GB): distances %.2f s, single linkage %.2f s, "
                        + "cophenetic correlation %.2f s (r = %.6f); heap in use %.2f GB before, %.2f GB after%n",
                n, CondensedDistances.bytesFor(n) / 1e9, rt.maxMemory() / 1e9, (t1 - t0) / 1e9, (t2 - t1) / 1e9,
                (t3 - t2) / 1e9, r, before / 1e9, after / 1e9);
    }
}
