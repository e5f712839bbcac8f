package org.treeproof.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.treeproof.data.InputException;
import org.treeproof.resample.ReplicateTask;

class SparkExecutorTest {
    private static JavaSparkContext context;

    @BeforeAll
    static void start() {
        context = LocalSpark.start("local[2]");
    }

    @AfterAll
    static void stop() {
        context.stop();
    }

    /** Uneven work, so that later indices often finish first. */
    record Uneven(long salt) implements ReplicateTask<Integer> {
        @Override
        public Integer apply(int i) {
            long spin = new SplittableRandom(salt + i).nextInt(300_000);
            double x = 0;
            for (long s = 0; s < spin; s++) {
                x += Math.sqrt(s);
            }
            return x >= 0 ? i : -1;
        }
    }

    @Test
    void deliversResultsInIndexOrderAcrossChunks() {
        for (int chunk : new int[] {1, 3, 0}) {
            var executor = new SparkExecutor(context, SparkExecutor.Preparation.NONE, chunk);
            List<Integer> seen = new ArrayList<>();
            executor.run(5, 31, new Uneven(chunk), seen::add);
            List<Integer> expected = new ArrayList<>();
            for (int i = 5; i < 31; i++) {
                expected.add(i);
            }
            assertEquals(expected, seen, "chunk " + chunk);
        }
    }

    @Test
    void anEmptyRangeRunsNothing() {
        List<Integer> seen = new ArrayList<>();
        new SparkExecutor(context).run(7, 7, new Uneven(1), seen::add);
        assertEquals(List.of(), seen);
    }

    /** Refuses index 3 the way a metric refuses data. */
    record RefusesThree() implements ReplicateTask<Integer> {
        @Override
        public Integer apply(int i) {
            if (i == 3) {
                throw new InputException("sample 's3' has a missing value in feature 'f1'");
            }
            return i;
        }
    }

    @Test
    void aUsersErrorInATaskComesBackAsItsOneLine() {
        var e = assertThrows(InputException.class, () -> new SparkExecutor(context).run(0, 6, new RefusesThree(), r -> {
        }));
        assertEquals("sample 's3' has a missing value in feature 'f1'", e.getMessage());
    }

    /** Counts how often it was prepared: a fresh copy per shipment, in this JVM (local mode). */
    record Prepared(boolean ready) implements ReplicateTask<Boolean> {
        @Override
        public Boolean apply(int i) {
            return ready;
        }

        @Override
        public ReplicateTask<Boolean> prepare(int threads) {
            return new Prepared(true);
        }
    }

    @Test
    void executorsPrepareTheTaskOnlyWhenAsked() {
        List<Boolean> once = new ArrayList<>();
        new SparkExecutor(context, SparkExecutor.Preparation.ONCE_PER_EXECUTOR, 2).run(0, 5, new Prepared(false),
                once::add);
        assertEquals(List.of(true, true, true, true, true), once);
        List<Boolean> never = new ArrayList<>();
        new SparkExecutor(context, SparkExecutor.Preparation.NONE, 2).run(0, 5, new Prepared(false), never::add);
        assertEquals(List.of(false, false, false, false, false), never);
    }
}
