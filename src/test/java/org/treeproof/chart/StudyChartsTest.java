package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.Metric;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.Recommendation;
import org.treeproof.study.StudyInput;
import org.treeproof.study.Verdict;
import org.treeproof.tree.MergeTree;

/** {@link StudyCharts} on the results of small real studies (the real runner and recommender). */
class StudyChartsTest {
    /** Three groups of 15 in 6 dimensions, each 8 SD out along its own two features. */
    private static StudyFixtures.Run separated;

    @BeforeAll
    static void study() {
        DataMatrix data = StudyFixtures.groups(new int[] {15, 15, 15}, 6, 2, 8.0, 3);
        separated = StudyFixtures.run(data, StudyFixtures.small());
    }

    @Test
    void aSupportedStudyGetsEveryFigureAtItsRenderersSize(@TempDir Path dir) throws Exception {
        Recommendation r = separated.recommendation();
        // precondition: three groups this far apart are what the decision rule supports
        assertEquals(3, r.k());
        assertEquals(Verdict.SUPPORTED, r.verdict());
        List<Figure> figures = StudyCharts.drawAll(separated.evidence(), r, separated.data(), dir);

        assertEquals(StudyCharts.FIGURE_IDS, figures.stream().map(Figure::id).toList());
        Map<String, Figure> byId = byId(figures);
        // renderer sizes: fixed ones from the renderers' constants; the tree of 45 leaves stays at the base
        // width, since 350 + 9 * 45 < 1200
        Map<String, int[]> fixed = Map.of("dendrogram", new int[] {DendrogramChart.BASE_WIDTH, DendrogramChart.HEIGHT},
                "silhouette", new int[] {SilhouetteChart.WIDTH, SilhouetteChart.HEIGHT},
                "stability", new int[] {StabilityChart.WIDTH, StabilityChart.HEIGHT},
                "gap", new int[] {GapChart.WIDTH, GapChart.HEIGHT},
                "consensus", new int[] {ConsensusChart.WIDTH, ConsensusChart.HEIGHT},
                "jaccard", new int[] {JaccardChart.WIDTH, JaccardChart.HEIGHT},
                "consensus-cdf", new int[] {ConsensusCdfChart.WIDTH, ConsensusCdfChart.HEIGHT});
        Set<String> vector = Set.of("dendrogram", "silhouette", "stability", "gap", "consensus-cdf", "jaccard",
                "linkages");
        Set<String> written = new TreeSet<>();
        for (Figure f : figures) {
            assertTrue(f.drawn(), f.id() + ": " + f.note());
            List<String> expected = vector.contains(f.id()) ? List.of(f.id() + ".png", f.id() + ".svg")
                    : List.of(f.id() + ".png");
            assertEquals(expected, f.files());
            written.addAll(f.files());
            BufferedImage png = readPng(dir, f);
            if (fixed.containsKey(f.id())) {
                assertArrayEquals(fixed.get(f.id()), new int[] {f.width(), f.height()}, f.id());
            }
            assertEquals(f.width(), png.getWidth(), f.id());
            assertEquals(f.height(), png.getHeight(), f.id());
            assertTrue(RenderChecks.nonWhiteShare(png) > 0.01, f.id() + " is nearly blank");
            for (String file : f.files()) {
                assertTrue(Files.size(dir.resolve(file)) > 1000, file + " is nearly empty");
            }
        }
        assertEquals(written, list(dir), "files no figure lists");
        assertEquals(LinkageComparisonChart.WIDTH, byId.get("linkages").width());
        assertEquals(DataHeatmapChart.WIDTH, byId.get("heatmap").width());

        String linkage = r.linkage().id();
        for (String id : List.of("dendrogram", "silhouette", "stability", "gap", "consensus", "jaccard", "heatmap")) {
            assertTrue(byId.get(id).title().contains(linkage), id + " title names the linkage: " + byId.get(id).title());
        }
        for (String id : List.of("stability", "consensus", "jaccard")) {
            assertTrue(byId.get(id).title().contains("k = 3"), byId.get(id).title());
        }
        assertTrue(byId.get("dendrogram").title().contains("3 clusters"));
        assertTrue(byId.get("heatmap").title().contains("45 samples and 6 features"));

        // the tree is coloured by the recommended cut: three cluster colours, not a fourth
        BufferedImage tree = readPng(dir, byId.get("dendrogram"));
        for (int c = 0; c < 3; c++) {
            assertTrue(RenderChecks.count(tree, ChartColors.cluster(c)) > 100, "cluster " + (c + 1));
        }
        assertEquals(0, RenderChecks.count(tree, ChartColors.cluster(3)));
    }

    @Test
    void theSameResultsGiveTheSameFiles(@TempDir Path tmp) throws Exception {
        List<Figure> a = StudyCharts.drawAll(separated.evidence(), separated.recommendation(), separated.data(),
                tmp.resolve("a"));
        List<Figure> b = StudyCharts.drawAll(separated.evidence(), separated.recommendation(), separated.data(),
                tmp.resolve("b"), 2);
        assertEquals(a, b);
        for (Figure f : a) {
            for (String file : f.files()) {
                assertArrayEquals(Files.readAllBytes(tmp.resolve("a").resolve(file)),
                        Files.readAllBytes(tmp.resolve("b").resolve(file)), file);
            }
        }
    }

    @Test
    void distancesAloneSkipHeatmapAndGapAndSayWhy(@TempDir Path dir) throws Exception {
        DataMatrix data = StudyFixtures.groups(new int[] {15, 15, 15}, 6, 2, 8.0, 3);
        var input = StudyInput.ofDistances(data.sampleIds(), Metric.EUCLIDEAN.compute(data, 1));
        StudyFixtures.Run run = StudyFixtures.run(input, null, StudyFixtures.small(), 2);
        List<Figure> figures = StudyCharts.drawAll(run.evidence(), run.recommendation(), null, dir);
        Map<String, Figure> byId = byId(figures);

        for (String id : List.of("heatmap", "gap")) {
            Figure f = byId.get(id);
            assertFalse(f.drawn(), id);
            assertEquals(0, f.width());
            assertFalse(f.note().isBlank(), id + " says why it is missing");
            assertFalse(Files.exists(dir.resolve(id + ".png")));
        }
        assertTrue(byId.get("gap").note().contains("distances alone"), byId.get("gap").note());
        for (String id : List.of("dendrogram", "stability", "consensus", "linkages")) {
            assertTrue(byId.get(id).drawn(), id + ": " + byId.get(id).note());
        }
        // without a data table there are no null data sets, and the stability chart says so
        assertTrue(byId.get("stability").note().contains("no null data"), byId.get("stability").note());
    }

    @Test
    void anUnsupportedStudyStillDrawsTreeStabilityConsensusAndLinkages(@TempDir Path dir) throws Exception {
        StudyFixtures.Run noise = StudyFixtures.run(StudyFixtures.noise(45, 5, 17), StudyFixtures.small());
        Recommendation r = noise.recommendation();
        // precondition: uniform noise holds no cluster structure the rule accepts
        assertEquals(Verdict.UNSUPPORTED, r.verdict());
        Map<String, Figure> byId = byId(StudyCharts.drawAll(noise.evidence(), r, noise.data(), dir));

        for (String id : List.of("dendrogram", "stability", "consensus", "linkages", "gap", "heatmap")) {
            assertTrue(byId.get(id).drawn(), id + ": " + byId.get(id).note());
        }
        for (String id : List.of("silhouette", "jaccard")) {
            assertFalse(byId.get(id).drawn(), id);
            assertTrue(byId.get(id).note().contains("single cluster"), byId.get(id).note());
        }
        // one colour for the whole tree, no cut line
        BufferedImage tree = readPng(dir, byId.get("dendrogram"));
        assertTrue(RenderChecks.count(tree, ChartColors.cluster(0)) > 100);
        assertEquals(0, RenderChecks.count(tree, ChartColors.cluster(1)));
        assertTrue(byId.get("dendrogram").title().contains("no split"));
        // the consensus is shown at the most stable k and says that no k is supported
        int k = StudyChartInputs.strongestK(chosen(noise.evidence(), r), r);
        assertTrue(k >= 2);
        assertTrue(byId.get("consensus").title().contains("k = " + k + " (no k is supported"),
                byId.get("consensus").title());
        assertTrue(byId.get("stability").title().contains("no number of clusters is supported"));
    }

    @Test
    void anInputAChartRefusesSkipsThatFigureAlone(@TempDir Path dir) throws Exception {
        Evidence e = separated.evidence();
        Recommendation r = separated.recommendation();
        LinkageEvidence le = chosen(e, r);
        KEvidence ke = le.at(r.k());
        double[] nan = new double[e.samples()];
        Arrays.fill(nan, Double.NaN);
        KEvidence broken = new KEvidence(ke.k(), ke.cutHeight(), ke.tieDependent(), ke.clustering(), ke.branches(),
                ke.silhouette(), ke.calinskiHarabasz(), ke.daviesBouldin(), ke.dunn(), ke.gap(), ke.gapSE(),
                ke.stability(), ke.clusters(), nan, ke.sampleStability(), ke.sampleConsensus(), ke.replicateAri(),
                ke.separation());
        var byK = new ArrayList<>(le.byK());
        byK.set(le.byK().indexOf(ke), broken);
        var linkages = new ArrayList<LinkageEvidence>();
        for (LinkageEvidence l : e.linkages()) {
            linkages.add(l != le ? l : new LinkageEvidence(l.linkage(), l.tree(), l.copheneticCorrelation(), l.gap(),
                    byK, l.branchSupport(), l.consensus()));
        }
        Evidence degenerate = new Evidence(e.sampleIds(), e.features(), e.settings(), linkages, e.minClusterSize(),
                e.structureTest());

        Map<String, Figure> byId = byId(StudyCharts.drawAll(degenerate, r, separated.data(), dir));
        Figure sil = byId.get("silhouette");
        assertFalse(sil.drawn());
        assertTrue(sil.note().startsWith("not drawn: the chart refused the values"), sil.note());
        assertTrue(sil.note().contains("NaN"), sil.note());
        assertFalse(Files.exists(dir.resolve("silhouette.png")));
        assertFalse(Files.exists(dir.resolve("silhouette.svg")));
        assertEquals(8, byId.values().stream().filter(Figure::drawn).count());
    }

    @Test
    void theInputsCarryTheEvidenceUnchanged() {
        Evidence e = separated.evidence();
        Recommendation r = separated.recommendation();
        LinkageEvidence le = chosen(e, r);
        int n = e.samples();
        for (int k = 2; k <= 3; k++) {
            double[] c = StudyChartInputs.condensed(le.consensus(), k);
            assertEquals(n * (n - 1) / 2, c.length);
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    // the conventional condensed index, as scipy's squareform lays it out
                    int t = n * i - i * (i + 1) / 2 + (j - i - 1);
                    assertEquals(le.consensus().consensus(k, i, j), c[t], 0.0);
                }
            }
        }
        MergeTree t = le.tree();
        ChartTree ct = StudyChartInputs.chartTree(t);
        assertEquals(t.leaves(), ct.leafCount());
        assertArrayEquals(t.heights(), ct.height());
        assertArrayEquals(t.leafOrder(), ct.leafOrder());
        for (int s = 0; s < t.merges(); s++) {
            assertEquals(t.left(s), ct.left()[s]);
            assertEquals(t.right(s), ct.right()[s]);
        }
        // the k the unsupported consensus falls back on is the rule's strongest solution of that linkage
        int strongest = r.assessments().stream().filter(a -> a.linkage() == le.linkage()).sorted(r.rule().order())
                .findFirst().orElseThrow().k();
        assertEquals(strongest, StudyChartInputs.strongestK(le, r));
    }

    @Test
    void onlyRoundingIsPutBackInRange() {
        assertEquals(1.0, StudyChartInputs.inRange(1 + 1e-15, -1));
        assertEquals(-1.0, StudyChartInputs.inRange(-1 - 1e-15, -1));
        assertEquals(0.0, StudyChartInputs.inRange(-1e-15, 0));
        assertEquals(1.2, StudyChartInputs.inRange(1.2, 0));
        assertEquals(-0.5, StudyChartInputs.inRange(-0.5, 0));
        assertTrue(Double.isNaN(StudyChartInputs.inRange(Double.NaN, 0)));
    }

    @Test
    void dataOfOtherSamplesOrNoThreadsAreRefused(@TempDir Path dir) {
        DataMatrix noise = StudyFixtures.noise(45, 6, 1);
        DataMatrix other = new DataMatrix(StudyFixtures.names("x", 45), noise.featureNames(), noise.rowMajorCopy());
        assertThrows(IllegalArgumentException.class, () -> StudyCharts.drawAll(separated.evidence(),
                separated.recommendation(), other, dir));
        assertThrows(IllegalArgumentException.class, () -> StudyCharts.drawAll(separated.evidence(),
                separated.recommendation(), separated.data(), dir, 0));
    }

    @Test
    void aFigureIsDrawnWithASizeOrSkippedWithAReason() {
        assertThrows(IllegalArgumentException.class, () -> new Figure("gap", "Gap", List.of(), 0, 0, ""));
        assertThrows(IllegalArgumentException.class, () -> new Figure("gap", "Gap", List.of("gap.png"), 0, 0, ""));
        assertTrue(new Figure("gap", "Gap", List.of("gap.png"), 9, 9, "").drawn());
        assertFalse(new Figure("gap", "Gap", List.of(), 0, 0, "not computed").drawn());
    }

    private static LinkageEvidence chosen(Evidence e, Recommendation r) {
        return e.linkages().stream().filter(l -> l.linkage() == r.linkage()).findFirst().orElseThrow();
    }

    private static Map<String, Figure> byId(List<Figure> figures) {
        return figures.stream().collect(Collectors.toMap(Figure::id, Function.identity()));
    }

    private static BufferedImage readPng(Path dir, Figure f) throws Exception {
        BufferedImage img = ImageIO.read(dir.resolve(f.files().get(0)).toFile());
        assertTrue(img != null, f.id() + " is not a PNG");
        return img;
    }

    private static Set<String> list(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
        }
    }
}
