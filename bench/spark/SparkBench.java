import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.treeproof.data.DataMatrix;
import org.treeproof.io.SummaryJson;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.spark.SparkExecutor;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommender;
import org.treeproof.study.StudyInput;
import org.treeproof.study.StudyProgress;
import org.treeproof.study.StudyRunner;
import org.treeproof.study.StudySettings;

/**
 * Wall time of one study run in process (LocalExecutor, 2 threads) and as Spark tasks on local[2], the same
 * JVM, alternating, after a small warm-up of both. Prints one tab-separated line per run and stage:
 * {@code engine  run  stage  seconds}, and checks that every run's summary.json bytes are the same.
 * Run by run.sh; arguments: n p runs replicates nullSets nullReplicates referenceSets distances(executor|replicate)
 * chunk (indices per Spark job, 0 for the default).
 */
public class SparkBench {

    /** Four groups in p dimensions, separated along the first 20 features; the rest is noise. */
    static DataMatrix data(int n, int p, long seed) {
        var rng = new SplittableRandom(seed);
        double[] v = new double[n * p];
        for (int i = 0; i < n; i++) {
            int g = i % 4;
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (j < 20 && j % 4 == g ? 2.5 : 0) + rng.nextGaussian();
            }
        }
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    /** Wall time per stage of the study, from the progress calls. */
    static final class StageClock implements StudyProgress {
        final Map<String, Double> seconds = new LinkedHashMap<>();
        private String current;
        private long since;

        @Override
        public void stage(String name, int total) {
            close();
            current = name;
            since = System.nanoTime();
        }

        @Override
        public void step() {
        }

        void close() {
            if (current != null) {
                seconds.merge(current, (System.nanoTime() - since) / 1e9, Double::sum);
            }
            current = null;
        }
    }

    static byte[] run(DataMatrix data, StudySettings settings, ReplicateExecutor executor, String engine, int r) {
        var clock = new StageClock();
        long t0 = System.nanoTime();
        Evidence e = new StudyRunner(StudyInput.of(data), settings, executor, 2, clock).run();
        clock.close();
        double total = (System.nanoTime() - t0) / 1e9;
        if (r >= 0) {
            for (var s : clock.seconds.entrySet()) {
                System.out.printf("%s\t%d\t%s\t%.3f%n", engine, r, s.getKey(), s.getValue());
            }
            System.out.printf("%s\t%d\ttotal\t%.3f%n", engine, r, total);
            System.out.flush();
        }
        var provenance = new SummaryJson.Provenance("treeproof", "bench", "generated", "0".repeat(64), List.of(),
                List.of(), null);
        var rec = Recommender.of(e, DecisionRule.DEFAULT).recommend();
        return new SummaryJson(e, rec, provenance, new org.treeproof.report.ReasonWords(rec.rule())::word).toBytes();
    }

    public static void main(String[] args) {
        int n = Integer.parseInt(args[0]);
        int p = Integer.parseInt(args[1]);
        int runs = Integer.parseInt(args[2]);
        StudySettings settings = StudySettings.builder().replicates(Integer.parseInt(args[3]))
                .nullSets(Integer.parseInt(args[4])).nullReplicates(Integer.parseInt(args[5]))
                .referenceSets(Integer.parseInt(args[6])).seed(1).build();
        SparkExecutor.Preparation preparation = args[7].equals("replicate") ? SparkExecutor.Preparation.NONE
                : SparkExecutor.Preparation.ONCE_PER_EXECUTOR;

        long c0 = System.nanoTime();
        JavaSparkContext context = new JavaSparkContext(new SparkConf().setMaster("local[2]").setAppName("bench")
                .set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1")
                .set("spark.ui.enabled", "false").set("spark.ui.showConsoleProgress", "false"));
        System.out.printf("spark\t-1\tcontext start\t%.3f%n", (System.nanoTime() - c0) / 1e9);
        try {
            var local = new LocalExecutor(2);
            var spark = new SparkExecutor(context, preparation, Integer.parseInt(args[8]));
            StudySettings small = StudySettings.builder().replicates(20).nullSets(2).nullReplicates(4).referenceSets(4)
                    .seed(1).build();
            DataMatrix warm = data(300, Math.min(p, 100), 2);
            run(warm, small, local, "local", -1);
            run(warm, small, spark, "spark", -1);

            DataMatrix x = data(n, p, 1);
            byte[] first = null;
            for (int r = 0; r < runs; r++) {
                // alternate which engine goes first, so neither always runs on a warmer machine
                boolean localFirst = r % 2 == 0;
                byte[] a = run(x, settings, localFirst ? local : spark, localFirst ? "local" : "spark", r);
                byte[] b = run(x, settings, localFirst ? spark : local, localFirst ? "spark" : "local", r);
                if (first == null) {
                    first = a;
                }
                if (!Arrays.equals(first, a) || !Arrays.equals(first, b)) {
                    throw new IllegalStateException("summary.json differs between runs");
                }
            }
            System.out.println("same\t-1\tsummary.json of every run identical\t1");
        } finally {
            context.stop();
        }
    }
}
