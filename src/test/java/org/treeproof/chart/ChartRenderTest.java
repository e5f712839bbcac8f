package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Every renderer at about 150 samples: file names, pixel size, parseable SVG, determinism, colours used. */
class ChartRenderTest {
    private static final int N = 150;
    private static final int K = 5;
    private static double[][] points;
    private static ChartTree tree;
    private static int[] cut;

    @BeforeAll
    static void fixture() {
        SplittableRandom rnd = new SplittableRandom(150);
        int[] truth = new int[N];
        points = Synthetic.points(rnd, N, 6, K, 1.6, truth);
        tree = Synthetic.average(points);
        cut = Synthetic.cut(tree, K);
    }

    @Test
    void dendrogramWidensForNamesAndColoursEveryCluster(@TempDir Path tmp) throws Exception {
        DendrogramInput in = new DendrogramInput("Tree", tree, Synthetic.names("S", N), cut,
                Synthetic.cutHeight(tree, K), Synthetic.support(new SplittableRandom(1), tree), "Height (distance)");
        DendrogramChart chart = new DendrogramChart(in);
        assertEquals(350 + 9 * N, chart.width());
        BufferedImage img = RenderChecks.check(chart::write, tmp, "tree", 350 + 9 * N, DendrogramChart.HEIGHT, true);
        for (int c = 0; c < K; c++) {
            assertTrue(RenderChecks.count(img, ChartColors.cluster(c)) > 200, "cluster " + c + " not drawn");
        }
        assertTrue(RenderChecks.count(img, ChartColors.ABOVE_CUT) > 50, "branches above the cut not grey");
    }

    @Test
    void dendrogramWithInversionsStillRenders(@TempDir Path tmp) throws Exception {
        SplittableRandom rnd = new SplittableRandom(7);
        int[] truth = new int[60];
        ChartTree centroid = Synthetic.centroid(Synthetic.points(rnd, 60, 4, 4, 2.4, truth));
        assertTrue(centroid.inversions() > 0, "the fixture should hold an inversion");
        DendrogramInput in = new DendrogramInput("Centroid", centroid, Synthetic.names("S", 60),
                Synthetic.cut(centroid, 4), Double.NaN, null, "Height");
        DendrogramChart chart = new DendrogramChart(in);
        RenderChecks.check(chart::write, tmp, "centroid", chart.width(), DendrogramChart.HEIGHT, true);
    }

    @Test
    void denseLeavesBecomeWedgesNotASmear(@TempDir Path tmp) throws Exception {
        // 600 leaves in about 830 pixels: closer than the 2.5-pixel limit, so small groups are drawn as wedges
        SplittableRandom rnd = new SplittableRandom(600);
        int[] truth = new int[600];
        ChartTree big = Synthetic.average(Synthetic.points(rnd, 600, 6, K, 1.6, truth));
        int[] bigCut = Synthetic.cut(big, K);
        DendrogramChart chart = new DendrogramChart(new DendrogramInput("Tree", big, Synthetic.names("S", 600), bigCut,
                Synthetic.cutHeight(big, K), null, "Height"));
        BufferedImage img = RenderChecks.check(chart::write, tmp, "dense", DendrogramChart.BASE_WIDTH,
                DendrogramChart.HEIGHT, true);
        int strip = RenderChecks.stripTop(img, K);
        assertTrue(strip > DendrogramChart.HEIGHT / 2, "cluster strip under the leaves not found");
        RenderChecks.assertNoSmear(img, strip - 8, K);
    }

    @Test
    void silhouette(@TempDir Path tmp) throws Exception {
        SilhouetteInput in = new SilhouetteInput("Silhouette", Synthetic.silhouette(points, cut, K), cut);
        BufferedImage img = RenderChecks.check(new SilhouetteChart(in)::write, tmp, "sil", SilhouetteChart.WIDTH,
                SilhouetteChart.HEIGHT, true);
        for (int c = 0; c < K; c++) {
            assertTrue(RenderChecks.count(img, ChartColors.cluster(c)) > 500, "cluster " + c + " not drawn");
        }
    }

    @Test
    void stabilityUsesTheLinkageColours(@TempDir Path tmp) throws Exception {
        SplittableRandom rnd = new SplittableRandom(5);
        int[] k = {2, 3, 4, 5, 6, 7, 8};
        List<IntervalSeries> s = List.of(Synthetic.stabilityCurve(rnd, "average", k, 4, 0.9),
                Synthetic.stabilityCurve(rnd, "ward", k, 3, 0.8));
        StabilityInput in = new StabilityInput("Stability", k, s, Synthetic.referenceCurve(k), 4, "average");
        BufferedImage img = RenderChecks.check(new StabilityChart(in)::write, tmp, "stab", StabilityChart.WIDTH,
                StabilityChart.HEIGHT, true);
        assertTrue(RenderChecks.count(img, ChartColors.linkage("average", 0)) > 100);
        assertTrue(RenderChecks.count(img, ChartColors.linkage("ward", 1)) > 100);
    }

    @Test
    void gap(@TempDir Path tmp) throws Exception {
        GapInput in = new GapInput("Gap", new double[] {0.2, 0.5, 0.8, 0.85, 0.86}, new double[] {0.02, 0.03, 0.03,
            0.03, 0.04}, 3);
        BufferedImage img = RenderChecks.check(new GapChart(in)::write, tmp, "gap", GapChart.WIDTH, GapChart.HEIGHT,
                true);
        assertTrue(RenderChecks.count(img, ChartColors.series(0)) > 100);
        BufferedImage none = ChartFiles.image(GapChart.WIDTH, GapChart.HEIGHT, g -> new GapChart(new GapInput("Gap",
                in.gap(), in.standardError(), 0)).chart().paint(g, GapChart.WIDTH, GapChart.HEIGHT));
        assertTrue(RenderChecks.count(img, Look.INK) > RenderChecks.count(none, Look.INK) + 40,
                "the chosen k marker and its key entry are missing");
    }

    @Test
    void gapTakesItsLinkagesColourAndNoOther(@TempDir Path tmp) throws Exception {
        GapInput in = new GapInput("Gap, ward linkage", new double[] {0.2, 0.5, 0.8, 0.85, 0.86}, new double[] {0.02,
            0.03, 0.03, 0.03, 0.04}, 3, "ward");
        BufferedImage img = RenderChecks.check(new GapChart(in)::write, tmp, "gap", GapChart.WIDTH, GapChart.HEIGHT,
                true);
        assertTrue(RenderChecks.count(img, ChartColors.linkage("ward", 0)) > 100);
        for (String other : new String[] {"average", "complete"}) {
            assertEquals(0, RenderChecks.count(img, ChartColors.linkage(other, 0)), other + "'s colour on ward's chart");
        }
    }

    @Test
    void consensusShowsFullAndNoAgreementInTheScaleEnds(@TempDir Path tmp) throws Exception {
        ConsensusInput in = new ConsensusInput("Consensus", N, exactConsensus(cut), tree.leafOrder(), cut);
        BufferedImage img = RenderChecks.check(new ConsensusChart(in)::write, tmp, "cons", ConsensusChart.WIDTH,
                ConsensusChart.HEIGHT, false);
        int side = Pooling.side(N, ConsensusChart.MAX_SIDE);
        long area = (long) side * side;
        // within-cluster pairs (about a fifth of all pairs for five similar clusters) at the dark end,
        // the rest at the pale end
        assertTrue(RenderChecks.count(img, ColorScale.SEQUENTIAL.color(1)) > area / 10);
        assertTrue(RenderChecks.count(img, ColorScale.SEQUENTIAL.color(0)) > area / 2);
    }

    @Test
    void jaccardBarsTakeClusterColours(@TempDir Path tmp) throws Exception {
        JaccardInput in = new JaccardInput("Jaccard", new double[] {0.9, 0.62, 0.3}, new int[] {40, 30, 8});
        BufferedImage img = RenderChecks.check(new JaccardChart(in)::write, tmp, "jac", JaccardChart.WIDTH,
                JaccardChart.HEIGHT, true);
        for (int c = 0; c < 3; c++) {
            assertTrue(RenderChecks.count(img, ChartColors.cluster(c)) > 1000);
        }
        // Hennig (2007): stable from 0.75, dissolved at 0.5 or less, as JaccardStability's statuses
        assertEquals("stable", JaccardChart.band(0.75));
        assertEquals("doubtful", JaccardChart.band(0.5001));
        assertEquals("doubtful", JaccardChart.band(0.7499));
        assertEquals("dissolved", JaccardChart.band(0.5));
    }

    @Test
    void linkageComparisonGrowsWithTheNumberOfLinkages(@TempDir Path tmp) throws Exception {
        List<LinkageComparisonInput.Row> rows = new ArrayList<>();
        String[] names = {"average", "complete", "ward", "single"};
        double[][] agree = new double[4][4];
        for (int a = 0; a < 4; a++) {
            rows.add(new LinkageComparisonInput.Row(names[a], 2 + a, 0.9 - 0.1 * a, 0.8 - 0.2 * a,
                    a == 3 ? Double.NaN : 0.5 - 0.3 * a));
            for (int b = 0; b < 4; b++) {
                agree[a][b] = a == b ? 1 : a + b == 5 ? Double.NaN : 0.3;
            }
        }
        LinkageComparisonChart chart = new LinkageComparisonChart(new LinkageComparisonInput("Compare", rows, agree));
        assertEquals(206 + 56 * 4, chart.height());
        BufferedImage img = RenderChecks.check(chart::write, tmp, "cmp", LinkageComparisonChart.WIDTH, chart.height(),
                true);
        for (String n : names) {
            assertTrue(RenderChecks.count(img, ChartColors.linkage(n, 0)) > 300, n + " bars missing");
        }
    }

    @Test
    void dataHeatmapWithFeatureNames(@TempDir Path tmp) throws Exception {
        SplittableRandom rnd = new SplittableRandom(11);
        double[][] w = Synthetic.loadings(rnd, 6, 40);
        DataHeatmapInput in = new DataHeatmapInput("Data", N, 40, Synthetic.data(rnd, points, w),
                Synthetic.names("S", N), Synthetic.names("gene-", 40), tree, Synthetic.average(w), cut);
        DataHeatmapChart chart = new DataHeatmapChart(in);
        BufferedImage img = RenderChecks.check(chart::write, tmp, "data", DataHeatmapChart.WIDTH, chart.height(),
                false);
        assertTrue(RenderChecks.count(img, ColorScale.DIVERGING.stop(0)) + RenderChecks.count(img,
                ColorScale.DIVERGING.stop(8)) > 0, "no value reached the clipped ends");
    }

    @Test
    void baseNamesCannotLeaveTheDirectory(@TempDir Path tmp) {
        JaccardChart chart = new JaccardChart(new JaccardInput("J", new double[] {0.5}, new int[] {3}));
        assertThrows(IllegalArgumentException.class, () -> chart.write(tmp, "../escape"));
        assertThrows(IllegalArgumentException.class, () -> chart.write(tmp, "a/b"));
        assertThrows(IllegalArgumentException.class, () -> chart.write(tmp, ""));
    }

    /** 1 within clusters, 0 between: the two ends of the scale. */
    static double[] exactConsensus(int[] label) {
        int n = label.length;
        double[] c = new double[n * (n - 1) / 2];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                c[t++] = label[i] == label[j] ? 1 : 0;
            }
        }
        return c;
    }
}
