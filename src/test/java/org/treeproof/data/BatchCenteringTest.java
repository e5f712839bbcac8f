package org.treeproof.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** {@link BatchCentering} through {@link Preparation}, on tables whose centred values are worked by hand. */
class BatchCenteringTest {
    private static DataMatrix table(List<String> features, double... rowMajor) {
        int p = features.size();
        var ids = new java.util.ArrayList<String>();
        for (int i = 0; i < rowMajor.length / p; i++) {
            ids.add("s" + (i + 1));
        }
        return new DataMatrix(ids, features, rowMajor);
    }

    private static Preparation centred(Scale scale, int top, Map<String, String> levels) {
        return new Preparation(MissingPolicy.ERROR, LibrarySize.NONE, false, scale, top,
                BatchCentering.of("batch", levels));
    }

    private static final Map<String, String> AABB = Map.of("s1", "A", "s2", "A", "s3", "B", "s4", "B");

    @Test
    void eachBatchsMeanIsRemovedFromEveryFeature() {
        // f = 1, 3 | 10, 14: batch means 2 and 12, so -1, 1 | -2, 2; g = 0, 2 | 4, 4: means 1 and 4, so -1, 1 | 0, 0
        DataMatrix raw = table(List.of("f", "g"), 1, 0, 3, 2, 10, 4, 14, 4);
        Prepared p = centred(Scale.NONE, 0, AABB).apply(raw);
        double[] row = new double[2];
        double[][] hand = {{-1, -1}, {1, 1}, {-2, 0}, {2, 0}};
        for (int i = 0; i < 4; i++) {
            p.matrix().copyRow(i, row, 0);
            assertArrayEquals(hand[i], row, 0, "sample " + (i + 1));
        }
        assertTrue(p.report().steps().contains(
                "Removed each level's mean of the covariate 'batch' (2 levels) from every feature (batch mean-centring)."),
                p.report().steps().toString());
    }

    @Test
    void batchesAreRemovedBeforeFeaturesAreRankedByVariance() {
        // h = 0, 0 | 20, 20 is all batch (variance 100 as read, 0 centred); f = 1, 3 | 10, 14 varies within the
        // batches (variance 2.5 centred) and g = 0, 2 | 4, 4 less (0.5): the most variable feature is f, not h
        DataMatrix raw = table(List.of("f", "g", "h"), 1, 0, 0, 3, 2, 0, 10, 4, 20, 14, 4, 20);
        Prepared p = centred(Scale.NONE, 1, AABB).apply(raw);
        assertEquals(List.of("f"), p.matrix().featureNames());
        Prepared without = new Preparation(MissingPolicy.ERROR, false, Scale.NONE, 1).apply(raw);
        assertEquals(List.of("h"), without.matrix().featureNames());
    }

    @Test
    void zScoresAreTakenWithinTheBatchesAfterCentring() {
        // f centred: -1, 1, -2, 2 (population SD sqrt(2.5)); z = -1/sqrt(2.5), ...
        DataMatrix raw = table(List.of("f", "g"), 1, 0, 3, 2, 10, 4, 14, 4);
        Prepared p = centred(Scale.ZSCORE, 0, AABB).apply(raw);
        double sd = Math.sqrt(2.5);
        double[] row = new double[2];
        p.matrix().copyRow(2, row, 0);
        assertEquals(-2 / sd, row[0], 1e-15);
    }

    @Test
    void aLoneSampleInABatchOneBatchAndAMissingBatchAreRefused() {
        DataMatrix raw = table(List.of("f"), 1, 2, 3, 4);
        var lone = assertThrows(InputException.class,
                () -> centred(Scale.NONE, 0, Map.of("s1", "A", "s2", "A", "s3", "A", "s4", "B")).apply(raw));
        assertTrue(lone.getMessage().contains("--center-within batch: level 'B' holds only sample 's4'"),
                lone.getMessage());
        var one = assertThrows(InputException.class,
                () -> centred(Scale.NONE, 0, Map.of("s1", "A", "s2", "A", "s3", "A", "s4", "A")).apply(raw));
        assertTrue(one.getMessage().contains("every sample is in the one level 'A'"), one.getMessage());
        var none = assertThrows(InputException.class,
                () -> centred(Scale.NONE, 0, Map.of("s1", "A", "s2", "A", "s3", "B")).apply(raw));
        assertTrue(none.getMessage().contains("sample 's4' has no value in that column"), none.getMessage());
    }

    @Test
    void theSettingsPrintAlikeWhateverOrderTheLevelsCameIn() {
        // the study's fingerprint (for --resume) is made from the preparation's text
        var forward = new LinkedHashMap<String, String>();
        var backward = new LinkedHashMap<String, String>();
        for (int i = 1; i <= 20; i++) {
            forward.put("s" + i, "b" + i % 3);
            backward.put("s" + (21 - i), "b" + (21 - i) % 3);
        }
        assertEquals(BatchCentering.of("batch", forward).toString(), BatchCentering.of("batch", backward).toString());
        assertEquals(3, BatchCentering.of("batch", forward).levelCount());
    }
}
