package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.partition.Partition;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.tree.Linkage;

/** Branch p-values through the study: planted clades, thread counts, resuming, and bad settings. */
class MultiscaleRunTest {

    /**
     * {@code g} groups of {@code per} samples in {@code p} features: each group has a random centre (every
     * coordinate normal with SD {@code shift}), samples scatter around it with SD 1, so each feature carries a
     * little of the grouping and a draw of fewer features carries less.
     */
    static DataMatrix plantedGroups(int g, int per, int p, double shift, long seed) {
        var rng = new SplittableRandom(seed);
        int n = g * per;
        double[][] centre = new double[g][p];
        for (int c = 0; c < g; c++) {
            for (int j = 0; j < p; j++) {
                centre[c][j] = shift * StudyRunnerTest.gaussian(rng);
            }
        }
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                v[i * p + j] = centre[i % g][j] + StudyRunnerTest.gaussian(rng);
            }
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    static StudySettings settings(int perScale, List<Linkage> linkages) {
        return StudySettings.builder().linkages(linkages).maxK(4).replicates(10).referenceSets(0).nullSets(0)
                .seed(3).branchPValues(new BranchPValueSettings(BranchPValueSettings.DEFAULT_SCALES, perScale)).build();
    }

    static Partition planted(int n, int g) {
        int[] l = new int[n];
        for (int i = 0; i < n; i++) {
            l[i] = i % g;
        }
        return Partition.of(l);
    }

    /**
     * Three planted groups that each feature separates only weakly: the groups are branches of the average-linkage
     * tree, the ordinary bootstrap share at scale 1 is well below 1 (0.6-0.9), and the AU p-value, which corrects
     * the bootstrap's bias, reaches 0.98 or more for each, as the method promises for a real cluster.
     */
    @Test
    void plantedGroupsReachAnAuNearOne() {
        var data = plantedGroups(3, 10, 40, 0.9, 11);
        Evidence e = new StudyRunner(StudyInput.of(data), settings(100, List.of(Linkage.AVERAGE)), new LocalExecutor(2),
                2, StudyProgress.SILENT).run();
        LinkageEvidence le = e.linkages().get(0);
        List<ClusterBranch> groups = ClusterBranch.of(le.tree(), planted(30, 3), le.branchPValues());
        for (ClusterBranch cb : groups) {
            assertEquals(MultiscaleFit.Status.FITTED, cb.fit().status(), cb.toString());
            assertTrue(cb.au() >= 0.98, cb.toString());
            assertTrue(cb.fit().bp() < cb.au(), cb.toString());
            assertTrue(!cb.lowAu());
        }
        // the cut at k = 3 is the planted grouping, and the per-cluster lookup finds the same branches
        List<ClusterBranch> atThree = le.clusterBranches(3);
        assertEquals(3, atThree.size());
        for (ClusterBranch cb : atThree) {
            assertTrue(groups.stream().anyMatch(g -> g.merge() == cb.merge()), cb.toString());
        }
    }

    @Test
    void countsAndFitsAreIdenticalForAnyThreadCountAndAfterAResume() {
        var data = plantedGroups(3, 8, 12, 0.8, 5);
        StudySettings s = settings(20, List.of(Linkage.AVERAGE, Linkage.WARD));
        var recorded = new Recording();
        BranchPValues[] one = pvalues(new StudyRunner(StudyInput.of(data), s, new LocalExecutor(1), 1,
                StudyProgress.SILENT).withCheckpoint(recorded).run());
        BranchPValues[] three = pvalues(new StudyRunner(StudyInput.of(data), s, new LocalExecutor(3), 3,
                StudyProgress.SILENT).run());
        assertEquals(200, recorded.rows.size());
        // resume from the first 77 replicates kept
        var resumed = new Recording();
        resumed.kept = recorded.rows.subList(0, 77);
        BranchPValues[] again = pvalues(new StudyRunner(StudyInput.of(data), s, new LocalExecutor(2), 2,
                StudyProgress.SILENT).withCheckpoint(resumed).run());
        assertEquals(200 - 77, resumed.rows.size());
        for (int l = 0; l < one.length; l++) {
            for (BranchPValues other : new BranchPValues[] {three[l], again[l]}) {
                assertArrayEquals(one[l].counts(), other.counts());
                assertEquals(one[l].fits(), other.fits());
                assertArrayEquals(one[l].scales(), other.scales());
            }
        }
    }

    @Test
    void scalesThatRoundToTooFewFeatureCountsAreAnInputError() {
        var data = plantedGroups(2, 5, 1, 1, 1);
        StudySettings s = StudySettings.builder().linkages(List.of(Linkage.AVERAGE)).maxK(3).replicates(10)
                .referenceSets(0).nullSets(0).branchPValues(BranchPValueSettings.DEFAULT).build();
        var e = assertThrows(InputException.class, () -> new StudyRunner(StudyInput.of(data), s, new LocalExecutor(1),
                1, StudyProgress.SILENT));
        assertTrue(e.getMessage().startsWith("--branch-scales: with 1 feature the scales give only 1 different"), e.getMessage());
    }

    @Test
    void everyProblemOfTheSettingsIsReportedTogether() {
        var e = assertThrows(InputException.class, () -> StudySettings.builder().maxK(1)
                .branchPValues(new BranchPValueSettings(List.of(0.5, 0.5, -1.0), 5)).build());
        String m = e.getMessage();
        assertTrue(m.contains("--max-k"), m);
        assertTrue(m.contains("every scale must be in (0, 10], got -1.0"), m);
        assertTrue(m.contains("at least 3 different scales, got 2"), m);
        assertTrue(m.contains("--branch-replicates must be between 10 and 100000, got 5"), m);
    }

    private static BranchPValues[] pvalues(Evidence e) {
        return e.linkages().stream().map(LinkageEvidence::branchPValues).toArray(BranchPValues[]::new);
    }

    /** Keeps the multiscale rows in memory and replays {@link #kept}. */
    private static final class Recording implements Checkpoint {
        final List<double[]> rows = new ArrayList<>();
        List<double[]> kept = List.of();

        @Override
        public List<ReplicateOutcome> replicates() {
            return List.of();
        }

        @Override
        public void replicateDone(ReplicateOutcome outcome) {
        }

        @Override
        public List<double[]> rows(Stage stage) {
            return stage == Stage.MULTISCALE ? kept : List.of();
        }

        @Override
        public void rowDone(Stage stage, int index, double[] row) {
            if (stage == Stage.MULTISCALE) {
                rows.add(row.clone());
            }
        }
    }
}
