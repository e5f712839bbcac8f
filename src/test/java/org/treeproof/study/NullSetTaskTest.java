package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReferenceData;

/**
 * A null data set gives the same row whichever way it is scheduled: as a task on one thread (side by side with
 * other sets) or with its distances, trees and replicates spread over threads (one set at a time). Rows are
 * compared as bits.
 */
class NullSetTaskTest {

    @Test
    void aSetOnOneThreadAndSpreadOverThreadsGiveTheSameBits() {
        DataMatrix data = StudyRunnerTest.threeGroups(25, 11);
        StudySettings s = StudyRunnerTest.small();
        var task = NullSetTask.of(ReferenceData.nullModel(s.metric(), data), s, s.minClusterSize(data.samples()));
        for (int j = 0; j < 3; j++) {
            double[][] alone = task.apply(j);
            double[][] spread = task.run(j, new LocalExecutor(2), 2, new LocalExecutor(2));
            assertEquals(j, (int) alone[0][0]);
            assertEquals(3 * s.linkages().size() * (s.maxK() - 1), alone[1].length);
            long[] a = new long[alone[1].length];
            long[] b = new long[spread[1].length];
            for (int t = 0; t < a.length; t++) {
                a[t] = Double.doubleToRawLongBits(alone[1][t]);
                b[t] = Double.doubleToRawLongBits(spread[1][t]);
            }
            assertArrayEquals(a, b, "null set " + j);
        }
    }
}
