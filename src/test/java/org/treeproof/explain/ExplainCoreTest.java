package org.treeproof.explain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.Preparation;
import org.treeproof.distance.Metric;
import org.treeproof.tree.Linkage;

/** Hand-worked cases and invariants of the explanation core. */
class ExplainCoreTest {

    static DataMatrix matrix(double[][] x) {
        int n = x.length;
        int m = x[0].length;
        var s = new ArrayList<String>();
        var f = new ArrayList<String>();
        double[] v = new double[n * m];
        for (int i = 0; i < n; i++) {
            s.add("s" + i);
            System.arraycopy(x[i], 0, v, i * m, m);
        }
        for (int j = 0; j < m; j++) {
            f.add("f" + j);
        }
        return new DataMatrix(s, f, v);
    }

    /** Three clusters of 30 in 50 features; feature 10 + c is raised in cluster c, the rest is noise. */
    static double[][] planted(long seed, double shift) {
        var r = new SplittableRandom(seed);
        double[][] x = new double[90][50];
        for (int i = 0; i < 90; i++) {
            for (int j = 0; j < 50; j++) {
                x[i][j] = r.nextGaussian();
            }
            x[i][10 + i / 30 + 1] += shift;
        }
        return x;
    }

    static int[] plantedLabels() {
        int[] l = new int[90];
        for (int i = 0; i < 90; i++) {
            l[i] = i / 30 + 1;
        }
        return l;
    }

    @Test
    void plantedMarkersRankFirstInTheirClusters() {
        FeatureTable t = FeatureContrast.of(matrix(planted(3, 3)), Solution.of(plantedLabels()),
                ContrastTest.WILCOXON, 1).compute();
        for (int c = 1; c <= 3; c++) {
            assertEquals(10 + c, t.featureAtRank(c, 1), "cluster " + c);
            assertTrue(t.qValue(c, 10 + c) < 1e-6);
            assertTrue(t.auc(c, 10 + c) > 0.9);
            assertTrue(t.effect(c, 10 + c) > 1.5);
        }
    }

    @Test
    void resultDoesNotDependOnThreadsAndOutliersTakeNoPart() {
        double[][] x = planted(5, 1);
        int[] labels = plantedLabels();
        labels[0] = 0;
        labels[45] = 0;
        FeatureTable a = FeatureContrast.of(matrix(x), Solution.of(labels), ContrastTest.WILCOXON, 1).compute();
        FeatureTable b = FeatureContrast.of(matrix(x), Solution.of(labels), ContrastTest.WILCOXON, 3).compute();
        // the outliers' values changed wildly: nothing may move
        x[0][11] = 1e6;
        x[45][12] = -1e6;
        FeatureTable c = FeatureContrast.of(matrix(x), Solution.of(labels), ContrastTest.WILCOXON, 2).compute();
        assertEquals(88, a.clustered());
        for (int k = 1; k <= 3; k++) {
            for (int j = 0; j < 50; j++) {
                assertEquals(a.pValue(k, j), b.pValue(k, j));
                assertEquals(a.pValue(k, j), c.pValue(k, j));
                assertEquals(a.effect(k, j), c.effect(k, j), 1e-12);
                assertEquals(a.featureAtRank(k, j + 1), b.featureAtRank(k, j + 1));
            }
        }
    }

    @Test
    void aucIsOneForCompleteSeparationAndHalfForOneValue() {
        double[][] x = new double[8][2];
        for (int i = 0; i < 8; i++) {
            x[i][0] = i;
            x[i][1] = 3;
        }
        FeatureTable t = FeatureContrast.of(matrix(x), Solution.of(new int[] {1, 1, 1, 1, 2, 2, 2, 2}),
                ContrastTest.WILCOXON, 1).compute();
        assertEquals(0.0, t.auc(1, 0));
        assertEquals(1.0, t.auc(2, 0));
        assertEquals(0.5, t.auc(1, 1));
        assertEquals(1.0, t.pValue(1, 1));
        assertEquals(0, t.featureAtRank(1, 1));
    }

    @Test
    void cramersVByHand() {
        // 2 x 3 table [[20,10,10],[10,10,20]]: expected 15,10,15 per row; chi-square = 4 * 25/15 = 6.667;
        // V = sqrt(6.667 / (80 * 1)) = 0.288675 (hand-worked)
        Solution s = ExplainReferenceTestAccess.rows(new int[][] {{20, 10, 10}, {10, 10, 20}});
        String[] cats = ExplainReferenceTestAccess.columns(new int[][] {{20, 10, 10}, {10, 10, 20}});
        CovariateResult r = CovariateAssociation.of(s, List.of(Covariate.categorical("b", cats)), 1).compute().get(0);
        assertEquals(20.0 / 3, r.statistic(), 1e-12);
        assertEquals(Math.sqrt(1.0 / 12), r.effect(), 1e-12);
        // a batch that is the clusters: V = 1
        Solution s2 = ExplainReferenceTestAccess.rows(new int[][] {{10, 0}, {0, 10}});
        String[] c2 = ExplainReferenceTestAccess.columns(new int[][] {{10, 0}, {0, 10}});
        assertEquals(1.0, CovariateAssociation.of(s2, List.of(Covariate.categorical("b", c2)), 1).compute().get(0)
                .effect(), 1e-12);
    }

    @Test
    void kruskalWallisByHand() {
        // groups {1,2,3} and {4,5,6}: H = 12/(6*7) * (6²/3 + 15²/3) - 3*7 = 27/7; epsilon² = H/(N-1) = 27/35
        CovariateResult r = CovariateAssociation.of(Solution.of(new int[] {1, 1, 1, 2, 2, 2}),
                List.of(Covariate.numeric("age", new double[] {1, 2, 3, 4, 5, 6})), 1).compute().get(0);
        assertEquals(27.0 / 7, r.statistic(), 1e-12);
        assertEquals(27.0 / 35, r.effect(), 1e-12);
        assertArrayEquals(new double[] {2, 5}, r.medians());
    }

    @Test
    void smallLargeTablesUseASeededMonteCarloTest() {
        var r = new SplittableRandom(9);
        int n = 40;
        int[] labels = new int[n];
        String[] site = new String[n];
        for (int i = 0; i < n; i++) {
            labels[i] = i % 3 + 1;
            site[i] = i % 3 == 0 ? "a" : r.nextInt(4) == 0 ? "c" : "b";
        }
        site[5] = null;
        List<Covariate> covs = List.of(Covariate.categorical("site", site));
        CovariateResult a = CovariateAssociation.of(Solution.of(labels), covs, 7).compute().get(0);
        CovariateResult b = CovariateAssociation.of(Solution.of(labels), covs, 7).compute().get(0);
        assertEquals(CovariateTest.MONTE_CARLO_CHI_SQUARE, a.test());
        assertEquals(a, b);
        assertEquals(39, a.used());
        assertTrue(a.pValue() < 0.01, "site a is all of cluster 1: p " + a.pValue());
        assertTrue(a.pValue() >= 1.0 / (1 + CovariateAssociation.PERMUTATIONS));
    }

    @Test
    void flagNeedsBothASmallQAndALargeEffect() {
        assertTrue(CovariateRule.flags(CovariateKind.CATEGORICAL, 0.01, 0.6));
        assertFalse(CovariateRule.flags(CovariateKind.CATEGORICAL, 0.01, 0.3));
        assertFalse(CovariateRule.flags(CovariateKind.CATEGORICAL, 0.2, 0.9));
        assertTrue(CovariateRule.flags(CovariateKind.NUMERIC, 0.01, 0.3));
        assertFalse(CovariateRule.flags(CovariateKind.NUMERIC, 0.01, 0.2));
    }

    @Test
    void batchIsFlaggedAndAnUnrelatedCovariateIsNot() {
        var r = new SplittableRandom(4);
        int n = 120;
        int[] labels = new int[n];
        String[] batch = new String[n];
        String[] sex = new String[n];
        double[] age = new double[n];
        for (int i = 0; i < n; i++) {
            labels[i] = i < 60 ? 1 : 2;
            batch[i] = (i < 60) == (r.nextInt(20) != 0) ? "run1" : "run2";
            sex[i] = r.nextBoolean() ? "f" : "m";
            age[i] = 20 + 50 * r.nextDouble();
        }
        List<CovariateResult> res = CovariateAssociation.of(Solution.of(labels), List.of(
                Covariate.categorical("batch", batch), Covariate.categorical("sex", sex), Covariate.numeric("age", age)),
                1).compute();
        assertTrue(res.get(0).flagged());
        String said = org.treeproof.report.ReasonWords.covariate(res.get(0).flag().orElseThrow());
        assertTrue(said.contains("'batch'"), said);
        // a flagged covariate may be the processing (an artefact) or a known property of the samples (a finding):
        // the sentence leaves that to the reader instead of calling every covariate a processing artefact
        assertTrue(said.contains("if it records how the samples were collected or processed")
                && said.contains("if it is a known property of the samples"), said);
        assertFalse(res.get(1).flagged());
        assertFalse(res.get(2).flagged());
    }

    @Test
    void benjaminiHochbergIgnoresMissingPValues() {
        double[] q = FalseDiscovery.benjaminiHochberg(new double[] {0.01, Double.NaN, 0.04});
        assertEquals(0.02, q[0], 1e-15);
        assertTrue(Double.isNaN(q[1]));
        assertEquals(0.04, q[2], 1e-15);
    }

    @Test
    void solutionRefusesEmptyClusters() {
        assertThrows(IllegalArgumentException.class, () -> new Solution(new int[] {1, 1, 3}, 3));
        assertThrows(IllegalArgumentException.class, () -> Solution.of(new int[] {1, 1, 1}));
    }

    @Test
    void sensitivityAgreesOnPlantedClustersAndNotOnNoise() {
        Solution planted = Solution.of(plantedLabels());
        List<String> ids = matrix(planted(1, 0)).sampleIds();
        // three well-separated centres over every feature; positive data so that log2 can be switched on
        var rc = new SplittableRandom(11);
        double[][] centre = new double[3][50];
        for (double[] c : centre) {
            for (int j = 0; j < 50; j++) {
                c[j] = 3 * rc.nextGaussian();
            }
        }
        double[][] x = planted(11, 0);
        for (int i = 0; i < 90; i++) {
            for (int j = 0; j < 50; j++) {
                x[i][j] += 20 + centre[i / 30][j];
            }
        }
        SensitivityResult s = Sensitivity.of(matrix(x), Preparation.defaults(), Metric.EUCLIDEAN, Linkage.AVERAGE,
                planted, ids, 0.75, 2).compute();
        assertFalse(s.ran().isEmpty());
        assertTrue(s.rows().stream().anyMatch(r -> r.change().equals("metric")));
        assertTrue(s.rows().stream().anyMatch(r -> r.name().equals("log2: on")));
        for (SensitivityResult.Row r : s.ran()) {
            assertTrue(r.ari() > 0.9, r.toString());
            assertEquals(3, r.surviving(0.75), r.toString());
        }
        // noise, and a "solution" drawn from its own tree: other analyses find other groups
        double[][] noise = planted(12, 0);
        int[] own = Linkage.WARD.cluster(Metric.EUCLIDEAN.compute(Preparation.defaults().apply(matrix(noise)).matrix(),
                1)).cutLabelsAtK(3);
        for (int i = 0; i < own.length; i++) {
            own[i]++;
        }
        SensitivityResult sn = Sensitivity.of(matrix(noise), Preparation.defaults(), Metric.EUCLIDEAN, Linkage.WARD,
                Solution.of(own), ids, 0.75, 1).compute();
        double mean = sn.ran().stream().mapToDouble(SensitivityResult.Row::ari).average().orElseThrow();
        assertTrue(mean < 0.6, "noise mean ARI " + mean);
        // Ward needs Euclidean distances: no other metric is tried
        assertTrue(sn.rows().stream().noneMatch(r -> r.change().equals("metric")));
        assertTrue(sn.rows().stream().filter(r -> r.name().equals("log2: on")).allMatch(r -> !r.ran()));
    }

    @Test
    void sensitivityKeepsTheBatchMeansOnceWhenTheyWereRemoved() {
        // three groups of 30 (feature block of the group raised by 4) crossed with two batches, the second raised by 6
        // on every feature: centred, the groups are the clusters; with the batch means kept, Ward at k = 3 splits by
        // batch first and the groups are not found again
        Solution planted = Solution.of(plantedLabels());
        double[][] x = planted(15, 0);
        var levels = new java.util.HashMap<String, String>();
        for (int i = 0; i < 90; i++) {
            for (int j = 0; j < 50; j++) {
                x[i][j] += (j / 10 == i / 30 ? 4 : 0) + (i % 2 == 1 ? 6 : 0);
            }
            levels.put("s" + i, "run-" + i % 2);
        }
        var chosen = new Preparation(org.treeproof.data.MissingPolicy.ERROR, org.treeproof.data.LibrarySize.NONE, false,
                org.treeproof.data.Scale.ZSCORE, 0, org.treeproof.data.BatchCentering.of("batch", levels));
        List<String> ids = matrix(x).sampleIds();
        SensitivityResult s = Sensitivity.of(matrix(x), chosen, Metric.EUCLIDEAN, Linkage.WARD, planted, ids, 0.75, 1)
                .compute();
        var kept = s.rows().stream().filter(r -> r.change().equals("center-within")).toList();
        assertEquals(List.of("center-within: off"), kept.stream().map(SensitivityResult.Row::name).toList());
        assertTrue(kept.get(0).ari() < 0.5, kept.get(0).toString());
        // every other alternative keeps the centring, and finds the groups again
        s.rows().stream().filter(r -> r.change().equals("scale"))
                .forEach(r -> assertEquals(3, r.surviving(0.75), r.toString()));
        // without centring chosen, no such alternative
        assertTrue(Sensitivity.of(matrix(x), Preparation.defaults(), Metric.EUCLIDEAN, Linkage.WARD, planted, ids,
                0.75, 1).compute().rows().stream().noneMatch(r -> r.change().equals("center-within")));
    }

    @Test
    void sensitivityTriesTheOtherLibrarySizeMethodsWhenOneWasChosen() {
        Solution planted = Solution.of(plantedLabels());
        List<String> ids = matrix(planted(1, 0)).sampleIds();
        // positive "counts": three groups of 30 on 50 features, each sample multiplied by its own depth (1 to 3)
        var rc = new SplittableRandom(12);
        double[][] x = planted(13, 0);
        for (int i = 0; i < 90; i++) {
            double depth = 1 + 2 * rc.nextDouble();
            for (int j = 0; j < 50; j++) {
                x[i][j] = Math.rint(depth * (50 + 5 * x[i][j] + (j / 10 == i / 30 ? 60 : 0)));
            }
        }
        var chosen = new Preparation(org.treeproof.data.MissingPolicy.ERROR,
                org.treeproof.data.LibrarySize.MEDIAN_RATIO, true, org.treeproof.data.Scale.ZSCORE, 0);
        SensitivityResult s = Sensitivity.of(matrix(x), chosen, Metric.EUCLIDEAN, Linkage.WARD, planted, ids, 0.75, 1)
                .compute();
        var library = s.rows().stream().filter(r -> r.change().equals("library-size")).toList();
        assertEquals(List.of("library-size: none", "library-size: total"),
                library.stream().map(SensitivityResult.Row::name).toList());
        assertEquals(List.of("none", "total"), library.stream().map(SensitivityResult.Row::librarySize).toList());
        // every other alternative keeps the chosen method
        s.rows().stream().filter(r -> !r.change().equals("library-size"))
                .forEach(r -> assertEquals("median-ratio", r.librarySize(), r.toString()));
        // total-count scaling finds the same groups here (the groups move only a fifth of the features)
        assertEquals(3, library.get(1).surviving(0.75), library.get(1).toString());
        // without a chosen method: none is tried without log2; with log2 of these counts both are
        SensitivityResult plain = Sensitivity.of(matrix(x), Preparation.defaults(), Metric.EUCLIDEAN, Linkage.WARD,
                planted, ids, 0.75, 1).compute();
        assertTrue(plain.rows().stream().noneMatch(r -> r.change().equals("library-size")));
        var logged = new Preparation(org.treeproof.data.MissingPolicy.ERROR, true, org.treeproof.data.Scale.ZSCORE, 0);
        SensitivityResult offered = Sensitivity.of(matrix(x), logged, Metric.EUCLIDEAN, Linkage.WARD, planted, ids,
                0.75, 1).compute();
        assertEquals(List.of("library-size: total", "library-size: median-ratio"), offered.rows().stream()
                .filter(r -> r.change().equals("library-size")).map(SensitivityResult.Row::name).toList());
        // values that are not whole numbers are no counts: nothing is offered
        double[][] y = planted(14, 0);
        for (double[] row : y) {
            for (int j = 0; j < row.length; j++) {
                row[j] = 50.5 + row[j];
            }
        }
        assertTrue(Sensitivity.of(matrix(y), logged, Metric.EUCLIDEAN, Linkage.WARD, planted, ids, 0.75, 1).compute()
                .rows().stream().noneMatch(r -> r.change().equals("library-size")));
    }
}
