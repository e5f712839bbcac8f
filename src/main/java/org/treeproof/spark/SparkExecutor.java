package org.treeproof.spark;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import org.apache.spark.api.java.JavaFutureAction;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.api.java.function.Function;
import org.apache.spark.broadcast.Broadcast;
import org.treeproof.data.InputException;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicateTask;

/**
 * Runs replicate tasks as Spark tasks, one index per task, and hands the results to the driver in index order.
 *
 * <p>Per {@link #run}: the task (for a study, the data table and the settings, never the n² distances) is
 * serialized once and broadcast, so each executor receives it once; the indices are cut into chunks, each chunk
 * is one Spark job with one partition per index, and at most two chunks are in flight (the second keeps the
 * cluster busy while the first one's last tasks finish). The driver decodes a finished chunk's results one by
 * one in index order, so it holds at most two chunks of results. A chunk is {@code 2 ×} the default parallelism
 * (one wave per core and one waiting) and at least 16 indices, smaller when the results seen so far suggest a chunk would exceed a
 * quarter of {@code spark.driver.maxResultSize}; the first chunks are one wave, before any size is known.
 *
 * <p>Spark retries failed tasks ({@code spark.task.maxFailures}); a task is a pure function of its index, so a
 * retried task gives the same result and the outcome of a study does not change. Tasks and results cross Spark as
 * Java-serialized bytes, whatever serializer the cluster uses.
 */
public final class SparkExecutor implements ReplicateExecutor {

    /** Whether executors {@link ReplicateTask#prepare prepare} a shipped task before running its indices. */
    public enum Preparation {
        /**
         * Each executor prepares the task once and shares it among its task threads: for a study, computes the
         * full distance matrix from the data once, after which every replicate gathers from it, as on one machine.
         * Costs 8·n(n−1)/2 bytes per executor.
         */
        ONCE_PER_EXECUTOR("executor") {
            @Override
            <T> ReplicateTask<T> apply(ReplicateTask<T> task, int threads) {
                return task.prepare(threads);
            }
        },
        /** Every task runs the shipped form as is: for a study, each replicate computes its own distances. */
        NONE("replicate") {
            @Override
            <T> ReplicateTask<T> apply(ReplicateTask<T> task, int threads) {
                return task;
            }
        };

        private final String configName;

        Preparation(String configName) {
            this.configName = configName;
        }

        /** The value of {@link SparkEngine#DISTANCES} that selects it: where a study computes distances. */
        public String configName() {
            return configName;
        }

        abstract <T> ReplicateTask<T> apply(ReplicateTask<T> task, int threads);
    }

    private static final int IN_FLIGHT = 2;
    /** Below this many indices per job, a job's own cost (some milliseconds) starts to show on small clusters. */
    private static final int MIN_DEFAULT_CHUNK = 16;

    private final JavaSparkContext context;
    private final Preparation preparation;
    private final int chunk;
    private final long resultBudget;

    /**
     * @param context     the running context; its master, resources and retry policy come from its configuration
     * @param preparation whether executors prepare tasks once
     * @param chunk       indices per Spark job, at least 1; 0 for twice the default parallelism (at least 16)
     */
    public SparkExecutor(JavaSparkContext context, Preparation preparation, int chunk) {
        this.context = Objects.requireNonNull(context, "context");
        this.preparation = Objects.requireNonNull(preparation, "preparation");
        if (chunk < 0) {
            throw new IllegalArgumentException("chunk must be at least 1 (or 0 for the default): " + chunk);
        }
        this.chunk = chunk == 0 ? Math.max(MIN_DEFAULT_CHUNK, 2 * context.defaultParallelism()) : chunk;
        long maxResult = context.getConf().getSizeAsBytes("spark.driver.maxResultSize", "1g");
        this.resultBudget = maxResult <= 0 ? Long.MAX_VALUE : Math.max(1, maxResult / 4);
    }

    /** Executors prepare tasks once; chunks of the default size. */
    public SparkExecutor(JavaSparkContext context) {
        this(context, Preparation.ONCE_PER_EXECUTOR, 0);
    }

    /** Indices per Spark job, before any reduction for large results. */
    public int chunk() {
        return chunk;
    }

    @Override
    public <T> void run(int first, int count, ReplicateTask<T> task, Consumer<? super T> inOrder) {
        if (first >= count) {
            return;
        }
        Shipment<T> shipment = Shipment.of(task, preparation);
        Broadcast<Shipment<T>> shared = context.broadcast(shipment);
        var inFlight = new ArrayDeque<JavaFutureAction<List<byte[]>>>();
        try {
            int next = first;
            // one wave first: result sizes are unknown until some have come back
            int size = Math.min(chunk, Math.max(1, context.defaultParallelism()));
            long largest = 0;
            while (next < count && inFlight.size() < IN_FLIGHT) {
                inFlight.add(submit(shared, next, Math.min(count, next + size)));
                next = Math.min(count, next + size);
            }
            while (!inFlight.isEmpty()) {
                List<byte[]> results = await(inFlight.poll());
                for (byte[] r : results) {
                    largest = Math.max(largest, r.length);
                }
                size = (int) Math.max(1, Math.min(chunk, resultBudget / Math.max(1, largest)));
                if (next < count) {
                    inFlight.add(submit(shared, next, Math.min(count, next + size)));
                    next = Math.min(count, next + size);
                }
                for (byte[] r : results) {
                    @SuppressWarnings("unchecked")
                    T value = (T) Codec.decode(r);
                    inOrder.accept(value);
                }
            }
        } finally {
            for (JavaFutureAction<List<byte[]>> f : inFlight) {
                f.cancel(true);
            }
            shared.destroy();
        }
    }

    /** One job over indices {@code from..to-1}, one partition each; collect keeps partition (index) order. */
    private <T> JavaFutureAction<List<byte[]>> submit(Broadcast<Shipment<T>> shared, int from, int to) {
        var indices = new ArrayList<Integer>(to - from);
        for (int i = from; i < to; i++) {
            indices.add(i);
        }
        context.setJobDescription("treeproof tasks " + from + ".." + (to - 1));
        return context.parallelize(indices, indices.size()).map(new RunIndex<>(shared)).collectAsync();
    }

    private static List<byte[]> await(JavaFutureAction<List<byte[]>> job) {
        try {
            return job.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for Spark tasks", e);
        } catch (ExecutionException e) {
            // a user's error (say, data a metric refuses) keeps its one-line message; Spark passes it as the cause
            for (Throwable c = e.getCause(); c != null; c = c.getCause()) {
                if (c instanceof InputException input) {
                    throw new InputException(input.getMessage());
                }
            }
            throw new IllegalStateException("Spark tasks failed: " + firstLine(e.getCause()), e.getCause());
        }
    }

    private static String firstLine(Throwable t) {
        String m = t == null ? "unknown failure" : String.valueOf(t.getMessage());
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }

    /** The function each Spark task runs: the broadcast task at one index, its result as bytes. */
    private record RunIndex<T>(Broadcast<Shipment<T>> shared) implements Function<Integer, byte[]> {
        private static final long serialVersionUID = 1L;

        @Override
        public byte[] call(Integer index) {
            return Codec.encode(shared.value().task().apply(index));
        }
    }
}
