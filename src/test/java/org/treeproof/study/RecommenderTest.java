package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.tree.Linkage;

/** The decision rule on studies whose answer is known by construction. */
class RecommenderTest {

    /** 19 null sets: the fewest with which a Monte Carlo p-value can reach 0.05 (1/20). */
    static StudySettings settings(int maxK) {
        return StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).maxK(maxK).replicates(30)
                .referenceSets(10).nullSets(19).nullReplicates(5).seed(11).build();
    }

    static Recommendation decide(DataMatrix data, int maxK) {
        Evidence e = new StudyRunner(StudyInput.of(data), settings(maxK), new LocalExecutor(2), 2, StudyProgress.SILENT)
                .run();
        return Recommender.of(e, DecisionRule.DEFAULT).recommend();
    }

    /** Groups of {@code size} points around the given centres, unit Gaussian noise, in centres[0].length dims. */
    static DataMatrix groups(double[][] centres, int size, long seed) {
        var rng = new SplittableRandom(seed);
        int p = centres[0].length;
        int n = centres.length * size;
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                v[i * p + j] = centres[i % centres.length][j] + StudyRunnerTest.gaussian(rng);
            }
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    @Test
    void threeSeparatedGroupsAreSupportedAtThree() {
        Recommendation r = decide(StudyRunnerTest.threeGroups(20, 21), 6);
        assertEquals(Verdict.SUPPORTED, r.verdict());
        assertEquals(3, r.k());
        assertEquals(List.of(3), r.levels());
        assertTrue(r.flaggedClusters().isEmpty());
        assertTrue(r.cutHeight().low() < r.cutHeight().chosen() && r.cutHeight().chosen() < r.cutHeight().high());
        assertTrue(r.reasons().get(0) instanceof Reason.Structure s && s.found());
        assertTrue(r.reasons().stream().anyMatch(x -> x instanceof Reason.Chosen c && c.assessment().k() == 3));
        assertEquals(0, r.outlierCount());
    }

    @Test
    void oneGaussianIsUnsupportedWithKOne() {
        Recommendation r = decide(groups(new double[][] {{0, 0, 0, 0, 0}}, 60, 4), 6);
        assertEquals(Verdict.UNSUPPORTED, r.verdict());
        assertEquals(1, r.k());
        assertTrue(r.levels().isEmpty());
        assertTrue(r.reasons().get(0) instanceof Reason.Structure s && !s.found(), r.reasons().toString());
    }

    @Test
    void twoFamiliesOfTwoShowBothLevels() {
        // families 24 apart on axis 0; within each, two strains 10 apart on axis 1 (family 0) or 2 (family 1)
        double[][] centres = {{0, 0, 0, 0}, {0, 10, 0, 0}, {24, 0, 0, 0}, {24, 0, 10, 0}};
        DataMatrix data = groups(centres, 15, 8);
        Evidence e = new StudyRunner(StudyInput.of(data), settings(6), new LocalExecutor(2), 2, StudyProgress.SILENT).run();
        Recommendation r = Recommender.of(e, DecisionRule.DEFAULT).recommend();
        assertTrue(r.levels().contains(2) && r.levels().contains(4), "levels " + r.levels());
        assertFalse(r.levels().contains(3), "k = 3 splits only one family: " + r.levels());
        assertEquals(Verdict.SUPPORTED, r.verdict());
        assertEquals(4, r.k(), "the finest supported level is recommended");
        // Votes, counted here by hand: each replicate goes to the finest level it reproduces, its ARI with that
        // cut at least 0.75 (Hennig's stable band, 2007).
        LinkageEvidence le = e.linkages().stream().filter(x -> x.linkage() == r.linkage()).findFirst().orElseThrow();
        int replicates = le.at(2).replicateAri().length;
        assertEquals(r.levels(), r.votes().stream().map(Recommendation.KShare::k).toList());
        for (Recommendation.KShare share : r.votes()) {
            int count = 0;
            for (int i = 0; i < replicates; i++) {
                boolean reproduced = le.at(share.k()).replicateAri()[i] >= 0.75;
                boolean finerReproduced = false;
                for (int finer : r.levels()) {
                    finerReproduced |= finer > share.k() && le.at(finer).replicateAri()[i] >= 0.75;
                }
                count += reproduced && !finerReproduced ? 1 : 0;
            }
            assertEquals(count / (double) replicates, share.share(), 1e-12, "k = " + share.k());
        }
    }

    @Test
    void everyCriterionStatesItsChoice() {
        Recommendation r = decide(StudyRunnerTest.threeGroups(15, 2), 5);
        var names = r.criteria().stream().map(Recommendation.CriterionChoice::name).toList();
        assertEquals(List.of("excess over the null", "stability (mean ARI)", "PAC", "smallest cluster Jaccard",
                "silhouette", "Calinski-Harabasz", "Davies-Bouldin", "Dunn", "gap statistic"), names);
        assertEquals(2, r.linkages().size());
        assertEquals(1.0, r.agreement()[0][0]);
    }
}
