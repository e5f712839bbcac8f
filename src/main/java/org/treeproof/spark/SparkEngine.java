package org.treeproof.spark;

import java.util.Locale;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.treeproof.data.InputException;
import org.treeproof.resample.ReplicateExecutor;

/**
 * A Spark context for one study and the executor that runs its replicates there; closing it stops the context.
 *
 * <p>Everything comes from the usual Spark configuration ({@code spark-submit} options, {@code --conf},
 * {@code spark-defaults.conf}): the master, the executors and their memory, retries. Two settings of treeproof's
 * own are read from it:
 * <ul>
 *   <li>{@value #DISTANCES}: {@code executor} (default) computes the full distance matrix once per executor from the
 *       broadcast data, and every replicate gathers from it; {@code replicate} has each replicate compute its own
 *       distances over its samples, which saves 8·n(n−1)/2 bytes per executor at the price of computing the
 *       distances again for every replicate. Results are identical either way.</li>
 *   <li>{@value #CHUNK}: indices per Spark job (default: twice the default parallelism, at least 16), which
 *       bounds the results the driver holds.</li>
 * </ul>
 */
public final class SparkEngine implements AutoCloseable {
    /** The configuration key that chooses where distances are computed. */
    public static final String DISTANCES = "spark.treeproof.distances";
    /** The configuration key for indices per Spark job. */
    public static final String CHUNK = "spark.treeproof.chunk";

    private final JavaSparkContext context;
    private final SparkExecutor executor;

    private SparkEngine(JavaSparkContext context, SparkExecutor executor) {
        this.context = context;
        this.executor = executor;
    }

    /**
     * Starts a context from the Spark configuration of this JVM (as {@code spark-submit} sets it up).
     *
     * @param appName the application name, unless the configuration names one
     * @throws InputException if the configuration is unusable (no master, a bad treeproof setting)
     */
    public static SparkEngine start(String appName) {
        SparkConf conf = new SparkConf().setIfMissing("spark.app.name", appName);
        SparkExecutor.Preparation preparation = preparation(conf.get(DISTANCES, "executor"));
        int chunk = chunk(conf.get(CHUNK, "0"));
        if (!conf.contains("spark.master")) {
            throw new InputException("--engine spark: no Spark master is configured; run treeproof with "
                    + "spark-submit --master ... (or set spark.master)");
        }
        JavaSparkContext context = new JavaSparkContext(conf);
        try {
            return new SparkEngine(context, new SparkExecutor(context, preparation, chunk));
        } catch (RuntimeException e) {
            context.stop();
            throw e;
        }
    }

    private static SparkExecutor.Preparation preparation(String value) {
        String v = value.strip().toLowerCase(Locale.ROOT);
        for (SparkExecutor.Preparation p : SparkExecutor.Preparation.values()) {
            if (p.configName().equals(v)) {
                return p;
            }
        }
        throw new InputException(DISTANCES + " must be executor or replicate, got '" + value + "'");
    }

    private static int chunk(String value) {
        try {
            int c = Integer.parseInt(value.strip());
            if (c >= 0) {
                return c;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InputException(CHUNK + " must be a whole number of at least 1, got '" + value + "'");
    }

    /** The executor that runs replicates on this context. */
    public ReplicateExecutor executor() {
        return executor;
    }

    /** The master URL, for messages. */
    public String master() {
        return context.master();
    }

    /** The default parallelism (cores across executors), for messages. */
    public int parallelism() {
        return context.defaultParallelism();
    }

    /** Stops the context. */
    @Override
    public void close() {
        context.stop();
    }
}
