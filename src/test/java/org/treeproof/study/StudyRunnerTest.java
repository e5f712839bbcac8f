package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.tree.Linkage;

class StudyRunnerTest {

    /** Three spherical Gaussian groups in 5 dimensions, centres 8 SD apart: an unmistakable k = 3. */
    static DataMatrix threeGroups(int perGroup, long seed) {
        var rng = new SplittableRandom(seed);
        int p = 5;
        int n = 3 * perGroup;
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            int g = i % 3;
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (j == g ? 8 : 0) + gaussian(rng);
            }
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    static double gaussian(SplittableRandom rng) {
        double u;
        double w;
        double s;
        do {
            u = 2 * rng.nextDouble() - 1;
            w = 2 * rng.nextDouble() - 1;
            s = u * u + w * w;
        } while (s >= 1 || s == 0);
        return u * Math.sqrt(-2 * Math.log(s) / s);
    }

    static StudySettings small() {
        return StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).maxK(5).replicates(30)
                .referenceSets(10).nullSets(5).nullReplicates(10).seed(7).build();
    }

    @Test
    void threeSeparatedGroupsAreStableAtThreeAndTheGapRuleSaysThree() {
        var data = threeGroups(20, 3);
        Evidence e = new StudyRunner(StudyInput.of(data), small(), new LocalExecutor(2), 2, StudyProgress.SILENT).run();
        for (LinkageEvidence le : e.linkages()) {
            KEvidence k3 = le.at(3);
            assertEquals(1.0, k3.stability().ari().mean(), 1e-12, le.linkage().id());
            assertEquals(0.0, k3.stability().pac(), 1e-12);
            assertEquals(3, le.gapChoice());
            assertTrue(k3.silhouette() > 0.7);
            for (ClusterEvidence c : k3.clusters()) {
                assertEquals(1.0, c.jaccard(), 1e-12);
            }
            assertTrue(k3.stability().nullModel().pValueAdjusted() <= 1.0 / 6 + 1e-12);
        }
    }

    @Test
    void evidenceIsIdenticalForOneAndTwoThreads() {
        var data = threeGroups(15, 5);
        Evidence one = new StudyRunner(StudyInput.of(data), small(), new LocalExecutor(1), 1, StudyProgress.SILENT).run();
        Evidence two = new StudyRunner(StudyInput.of(data), small(), new LocalExecutor(2), 2, StudyProgress.SILENT).run();
        for (int l = 0; l < one.linkages().size(); l++) {
            assertEquals(one.linkages().get(l).byK().size(), two.linkages().get(l).byK().size());
            for (int t = 0; t < one.linkages().get(l).byK().size(); t++) {
                KEvidence a = one.linkages().get(l).byK().get(t);
                KEvidence b = two.linkages().get(l).byK().get(t);
                assertEquals(a.clustering(), b.clustering());
                assertEquals(a.stability(), b.stability());
                assertEquals(a.clusters(), b.clusters());
                assertArrayEquals(a.sampleStability(), b.sampleStability());
                assertArrayEquals(a.sampleConsensus(), b.sampleConsensus());
                assertEquals(a.gap(), b.gap());
            }
            assertArrayEquals(one.linkages().get(l).branchSupport(), two.linkages().get(l).branchSupport());
        }
    }
}
