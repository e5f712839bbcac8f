package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.io.SummaryJson;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.resample.ReplicateTask;
import org.treeproof.resample.Resampling;
import org.treeproof.resample.Seeds;
import org.treeproof.score.BranchSupport;
import org.treeproof.tree.Linkage;

/**
 * Replicate work that crosses a JVM boundary (Java serialization, as an executor on other machines receives it)
 * gives the results of the work that never left: the same outcome for every replicate, and the same summary.json
 * bytes for a whole study. The shipped work must carry the data table and not the n² distances.
 */
class ShippedWorkTest {

    @SuppressWarnings("unchecked")
    static <T> T roundTrip(T value) {
        try {
            var bytes = new ByteArrayOutputStream();
            try (var out = new ObjectOutputStream(bytes)) {
                out.writeObject(value);
            }
            try (var in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
                return (T) in.readObject();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ClassNotFoundException e) {
            throw new IllegalStateException(e);
        }
    }

    static int serializedSize(Object value) {
        var bytes = new ByteArrayOutputStream();
        try (var out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.size();
    }

    /** Runs every task in this JVM, but only after a serialization round trip of the task and of each result. */
    record ShippingExecutor(boolean prepare) implements ReplicateExecutor {
        @Override
        public <T> void run(int first, int count, ReplicateTask<T> task, Consumer<? super T> inOrder) {
            ReplicateTask<T> shipped = roundTrip(task);
            ReplicateTask<T> ready = prepare ? shipped.prepare(2) : shipped;
            for (int i = first; i < count; i++) {
                inOrder.accept(roundTrip(ready.apply(i)));
            }
        }
    }

    private static ReplicateWork work(DataMatrix data, CondensedDistances d, Resampling scheme, double featureFraction,
            List<Linkage> linkages) {
        var planner = new ReplicatePlanner(d.size(), data == null ? 0 : data.features(), scheme, 0.8, featureFraction,
                21, Seeds.Purpose.REPLICATE);
        var supports = new ArrayList<BranchSupport>();
        for (int l = 0; l < linkages.size(); l++) {
            supports.add(BranchSupport.of(ReferenceSolution.of(linkages.get(l), d, 6, 5).tree(), 100 + l));
        }
        return new ReplicateWork(data, d, Metric.EUCLIDEAN, linkages, supports, planner, 6, 5, d.size());
    }

    private static void assertSameOutcome(ReplicateOutcome want, ReplicateOutcome got, String what) {
        assertEquals(want.index(), got.index(), what);
        assertArrayEquals(want.distinct(), got.distinct(), what);
        assertTrue(java.util.Arrays.deepEquals(want.labels(), got.labels()), what + ": labels");
        assertEquals(want.support().length, got.support().length, what);
        for (int l = 0; l < want.support().length; l++) {
            assertArrayEquals(want.support()[l].counted(), got.support()[l].counted(), what);
            assertArrayEquals(want.support()[l].supported(), got.support()[l].supported(), what);
        }
    }

    @Test
    void shippedReplicatesEqualTheGatheredOnesForEveryScheme() {
        DataMatrix data = StudyRunnerTest.threeGroups(70, 31);
        CondensedDistances d = Metric.EUCLIDEAN.compute(data, 2);
        var linkages = List.of(Linkage.AVERAGE, Linkage.WARD, Linkage.SINGLE);
        for (Resampling scheme : Resampling.values()) {
            for (double features : new double[] {1.0, 0.6}) {
                ReplicateWork here = work(data, d, scheme, features, linkages);
                ReplicateTask<ReplicateOutcome> shipped = roundTrip(here);
                ReplicateTask<ReplicateOutcome> prepared = shipped.prepare(2);
                for (int b = 0; b < 12; b++) {
                    ReplicateOutcome want = here.apply(b);
                    String what = scheme + ", feature fraction " + features + ", replicate " + b;
                    assertSameOutcome(want, shipped.apply(b), what + " (shipped)");
                    assertSameOutcome(want, prepared.apply(b), what + " (shipped and prepared)");
                }
            }
        }
    }

    @Test
    void theDataTravelsAndTheDistancesStayBehindUnlessThereIsNoTable() {
        DataMatrix data = StudyRunnerTest.threeGroups(100, 32);
        CondensedDistances d = Metric.EUCLIDEAN.compute(data, 2);
        var linkages = List.of(Linkage.AVERAGE);
        int withData = serializedSize(work(data, d, Resampling.SUBSAMPLE, 1.0, linkages));
        long matrix = CondensedDistances.bytesFor(d.size());
        // 300 x 5 values are 12 000 bytes; the matrix alone would be 358 800
        assertTrue(withData < matrix / 4, withData + " bytes shipped");

        ReplicateWork distancesOnly = work(null, d, Resampling.BOOTSTRAP, 1.0, linkages);
        assertTrue(serializedSize(distancesOnly) > matrix, "distances travel when there is no table");
        ReplicateTask<ReplicateOutcome> shipped = roundTrip(distancesOnly);
        for (int b = 0; b < 5; b++) {
            assertSameOutcome(distancesOnly.apply(b), shipped.apply(b), "distance input, replicate " + b);
        }
    }

    static byte[] summary(StudyInput input, StudySettings settings, ReplicateExecutor executor) {
        Evidence e = new StudyRunner(input, settings, executor, 2, StudyProgress.SILENT).run();
        var provenance = new SummaryJson.Provenance("treeproof", "test", "groups.csv", "0".repeat(64),
                List.of("Read the table."), List.of(), null);
        Recommendation r = Recommender.of(e, DecisionRule.DEFAULT).recommend();
        return new SummaryJson(e, r, provenance, new org.treeproof.report.ReasonWords(r.rule())::word).toBytes();
    }

    @Test
    void aStudyWhoseTasksAreShippedWritesTheSameSummary() {
        DataMatrix data = StudyRunnerTest.threeGroups(14, 33);
        StudySettings settings = StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).maxK(5)
                .replicates(20).referenceSets(5).nullSets(3).nullReplicates(4).seed(9).build();
        byte[] local = summary(StudyInput.of(data), settings, new LocalExecutor(2));
        assertArrayEquals(local, summary(StudyInput.of(data), settings, new ShippingExecutor(false)));
        assertArrayEquals(local, summary(StudyInput.of(data), settings, new ShippingExecutor(true)));

        StudySettings features = StudySettings.builder().linkages(List.of(Linkage.COMPLETE)).maxK(4).replicates(15)
                .featureFraction(0.6).resampling(Resampling.BOOTSTRAP).referenceSets(3).nullSets(2).nullReplicates(3)
                .seed(10).build();
        assertArrayEquals(summary(StudyInput.of(data), features, new LocalExecutor(2)),
                summary(StudyInput.of(data), features, new ShippingExecutor(true)));

        StudyInput distances = StudyInput.ofDistances(data.sampleIds(), Metric.EUCLIDEAN.compute(data, 1));
        StudySettings noData = StudySettings.builder().linkages(List.of(Linkage.AVERAGE)).maxK(4).replicates(15)
                .referenceSets(0).nullSets(0).seed(11).build();
        assertArrayEquals(summary(distances, noData, new LocalExecutor(2)),
                summary(distances, noData, new ShippingExecutor(false)));
    }
}
