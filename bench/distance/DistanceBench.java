import java.io.IOException;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;

/**
 * In-process timing of {@link Metric#compute} on the benchmark matrix written by gen_data.py. Prints one
 * tab-separated line per metric and thread count: metric, threads, median seconds, repetitions, a
 * checksum of the result (so the work cannot be skipped).
 *
 * <pre>java -Xmx4g -cp CLASSES DistanceBench DATA_FILE N P WARMUPS REPS THREADS[,THREADS..] METRIC [METRIC ..]</pre>
 */
public final class DistanceBench {
    public static void main(String[] args) throws IOException {
        Path path = Path.of(args[0]);
        int n = Integer.parseInt(args[1]);
        int p = Integer.parseInt(args[2]);
        int warmups = Integer.parseInt(args[3]);
        int reps = Integer.parseInt(args[4]);
        int[] threads = Arrays.stream(args[5].split(",")).mapToInt(Integer::parseInt).toArray();
        DataMatrix data = read(path, n, p);
        for (int a = 6; a < args.length; a++) {
            Metric metric = Metric.parse(args[a]);
            for (int t : threads) {
                for (int w = 0; w < warmups; w++) {
                    metric.compute(data, t);
                }
                double[] times = new double[reps];
                double checksum = 0;
                for (int r = 0; r < reps; r++) {
                    long t0 = System.nanoTime();
                    CondensedDistances d = metric.compute(data, t);
                    times[r] = (System.nanoTime() - t0) / 1e9;
                    checksum = d.at(0) + d.at(CondensedDistances.length(n) - 1);
                }
                Arrays.sort(times);
                System.out.printf("%s\t%d\t%.4f\t%d\t%.6f%n", metric.id(), t, times[reps / 2], reps, checksum);
            }
        }
    }

    private static DataMatrix read(Path path, int n, int p) throws IOException {
        double[] v = new double[n * p];
        try (FileChannel ch = FileChannel.open(path, StandardOpenOption.READ)) {
            if (ch.size() != (long) n * p * Double.BYTES) {
                throw new IllegalArgumentException(path + " holds " + ch.size() + " bytes, not " + n + " x " + p + " doubles");
            }
            ch.map(FileChannel.MapMode.READ_ONLY, 0, ch.size()).order(ByteOrder.LITTLE_ENDIAN).asDoubleBuffer().get(v);
        }
        List<String> ids = IntStream.range(0, n).mapToObj(i -> "s" + i).toList();
        List<String> names = IntStream.range(0, p).mapToObj(j -> "f" + j).toList();
        return new DataMatrix(ids, names, v);
    }
}
