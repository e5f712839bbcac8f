package org.treeproof.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicateTask;

/**
 * A task whose first attempt fails is retried by Spark and the study's result does not change. Plain local mode
 * never retries; "local[2,4]" runs two task threads and allows four attempts per task.
 */
class SparkRetryTest {
    /** First attempts made to fail; Spark runs tasks in this JVM in local mode, so they can be counted here. */
    private static final AtomicInteger INJECTED = new AtomicInteger();
    private static JavaSparkContext context;

    @BeforeAll
    static void start() {
        context = LocalSpark.start("local[2,4]");
    }

    @AfterAll
    static void stop() {
        context.stop();
    }

    /** Fails the first attempt of one index's Spark task, then behaves as {@code inner}. */
    record FailFirstAttempt<T>(ReplicateTask<T> inner, int victim) implements ReplicateTask<T> {
        @Override
        public T apply(int index) {
            if (index == victim && TaskContext.get().attemptNumber() == 0) {
                INJECTED.incrementAndGet();
                throw new IllegalStateException("injected failure of the first attempt of task " + index);
            }
            return inner.apply(index);
        }

        @Override
        public ReplicateTask<T> prepare(int threads) {
            return new FailFirstAttempt<>(inner.prepare(threads), victim);
        }
    }

    /** Spark, with one index of every run (replicates, null sets, reference sets) failing once. */
    record Flaky(SparkExecutor spark) implements ReplicateExecutor {
        @Override
        public <T> void run(int first, int count, ReplicateTask<T> task, Consumer<? super T> inOrder) {
            int victim = first + (count - first) / 2;
            spark.run(first, count, new FailFirstAttempt<>(task, victim), inOrder);
        }
    }

    @Test
    void aRetriedTaskLeavesTheSummaryUnchanged() {
        byte[] local = SmallStudy.summary(new LocalExecutor(2));
        INJECTED.set(0);
        byte[] spark = SmallStudy.summary(new Flaky(new SparkExecutor(context)));
        // the stability run, the null sets (one run of 19 tasks) and the gap run each lost a first attempt
        assertTrue(INJECTED.get() >= 3, INJECTED.get() + " failures injected");
        assertArrayEquals(local, spark);
    }
}
