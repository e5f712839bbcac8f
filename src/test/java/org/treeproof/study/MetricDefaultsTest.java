package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReferenceData;
import org.treeproof.tree.Linkage;

/** Defaults that depend on the metric, and the count of distinct samples that bounds k. */
class MetricDefaultsTest {

    @Test
    void everyMetricBuildsWithDefaultStudyOptions() {
        // Ward is defined on Euclidean distances only, so it leaves the default linkages of every other metric;
        // the gap reference of the 0/1 metrics is 0/1 data. Before, every metric but euclidean failed here.
        for (Metric m : Metric.values()) {
            StudySettings s = StudySettings.builder().metric(m).build();
            assertEquals(m.euclidean() ? List.of(Linkage.AVERAGE, Linkage.COMPLETE, Linkage.WARD)
                    : List.of(Linkage.AVERAGE, Linkage.COMPLETE), s.linkages(), m.id());
            assertEquals(m.binaryOnly() ? ReferenceData.Kind.FEATURE_FREQUENCY : ReferenceData.Kind.PRINCIPAL_BOX,
                    s.gapReference(), m.id());
        }
    }

    @Test
    void aGapReferenceThatDoesNotFitTheMetricIsRefusedUnlessTheGapIsSkipped() {
        InputException e = assertThrows(InputException.class, () -> StudySettings.builder().metric(Metric.JACCARD)
                .gapReference(ReferenceData.Kind.PRINCIPAL_BOX).build());
        assertTrue(e.getMessage().contains("--gap-reference principal-box draws continuous values"), e.getMessage());
        StudySettings.builder().metric(Metric.JACCARD).gapReference(ReferenceData.Kind.PRINCIPAL_BOX).referenceSets(0)
                .build();
    }

    private static DataMatrix rows(double... v) {
        int n = v.length / 2;
        var ids = new java.util.ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        return new DataMatrix(ids, List.of("a", "b"), v);
    }

    @Test
    void distinctSamplesOfDataAndOfDistances() {
        // rows (1,2), (1,2), (0,3), (-0,3), (1,2): three copies of one, two of another (-0 equals 0) -> 2 distinct.
        assertEquals(2, DistinctSamples.count(StudyInput.of(rows(1, 2, 1, 2, 0, 3, -0.0, 3, 1, 2))));
        assertEquals(1, DistinctSamples.count(StudyInput.of(rows(4, 4, 4, 4, 4, 4))));
        assertEquals(3, DistinctSamples.count(StudyInput.of(rows(1, 2, 2, 1, 1, 1))));
        // distances over 4 samples, condensed (01 02 03 12 13 23): 0 and 1 coincide, 2 and 3 differ -> 3 distinct.
        CondensedDistances d = CondensedDistances.of(4, new double[] {0, 1, 2, 1, 2, 3});
        assertEquals(3, DistinctSamples.count(StudyInput.ofDistances(List.of("a", "b", "c", "d"), d)));
        CondensedDistances zero = CondensedDistances.of(3, new double[] {0, 0, 0});
        assertEquals(1, DistinctSamples.count(StudyInput.ofDistances(List.of("a", "b", "c"), zero)));
    }
}
