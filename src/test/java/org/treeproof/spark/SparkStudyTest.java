package org.treeproof.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.treeproof.resample.LocalExecutor;

/** A whole study run as Spark tasks on local[2] writes the summary.json of the in-process run, byte for byte. */
class SparkStudyTest {
    private static JavaSparkContext context;
    private static byte[] local;

    @BeforeAll
    static void start() {
        context = LocalSpark.start("local[2]");
        local = SmallStudy.summary(new LocalExecutor(2));
    }

    @AfterAll
    static void stop() {
        context.stop();
    }

    @Test
    void theStudyIsTheSameWhenExecutorsComputeTheDistancesOnce() throws IOException {
        byte[] spark = SmallStudy.summary(new SparkExecutor(context));
        // the study is not degenerate: it finds the three groups, with null calibration and the gap statistic
        JsonNode summary = new ObjectMapper().readTree(local);
        assertEquals(3, summary.at("/recommendation/k").asInt());
        assertTrue(summary.at("/linkages/0/byK/1/gap").isNumber());
        assertEquals(19, summary.at("/linkages/0/byK/1/stability/null/sets").asInt());
        assertEquals(10, summary.at("/settings/branchPValues/replicatesPerScale").asInt());
        assertTrue(summary.at("/linkages/0/branchSupport/0").has("au"));
        assertArrayEquals(local, spark);
    }

    @Test
    void theStudyIsTheSameWhenEveryReplicateComputesItsOwnDistances() {
        // small chunks: several Spark jobs per stage, two in flight
        assertArrayEquals(local, SmallStudy.summary(new SparkExecutor(context, SparkExecutor.Preparation.NONE, 4)));
    }
}
