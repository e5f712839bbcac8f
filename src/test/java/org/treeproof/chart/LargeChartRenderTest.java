package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The size-dependent charts at 2000 samples: pooled images, no leaf names, and no smear of branches. Tagged
 * slow (about 20 s); run with {@code mvn -o test -DexcludedTestGroups=}.
 */
@Tag("slow")
class LargeChartRenderTest {
    private static final int N = 2000;
    private static final int K = 5;
    private static double[][] points;
    private static ChartTree tree;
    private static int[] cut;

    @BeforeAll
    static void fixture() {
        SplittableRandom rnd = new SplittableRandom(2000);
        int[] truth = new int[N];
        points = Synthetic.points(rnd, N, 6, K, 1.6, truth);
        tree = Synthetic.average(points);
        cut = Synthetic.cut(tree, K);
    }

    @Test
    void denseDendrogramDrawsWedgesNotASmear(@TempDir Path tmp) throws Exception {
        DendrogramInput in = new DendrogramInput("Tree", tree, Synthetic.names("S", N), cut,
                Synthetic.cutHeight(tree, K), Synthetic.support(new SplittableRandom(2), tree), "Height");
        DendrogramChart chart = new DendrogramChart(in);
        assertEquals(DendrogramChart.BASE_WIDTH, chart.width());
        BufferedImage img = RenderChecks.check(chart::write, tmp, "tree", DendrogramChart.BASE_WIDTH,
                DendrogramChart.HEIGHT, true);
        int strip = RenderChecks.stripTop(img, K);
        assertTrue(strip > 0, "cluster strip under the leaves not found");
        // just above the leaves, where 2000 stems would merge into solid colour, most pixels must be wedge tints
        RenderChecks.assertNoSmear(img, strip - 8, K);
    }

    @Test
    void consensusIsPooledToOneImage(@TempDir Path tmp) throws Exception {
        ConsensusInput in = new ConsensusInput("Consensus", N, ChartRenderTest.exactConsensus(cut), tree.leafOrder(),
                cut);
        BufferedImage img = RenderChecks.check(new ConsensusChart(in)::write, tmp, "cons", ConsensusChart.WIDTH,
                ConsensusChart.HEIGHT, false);
        long area = (long) ConsensusChart.MAX_SIDE * ConsensusChart.MAX_SIDE;
        // blocks of pairs that are all 1 (or all 0) pool to exactly 1 (or 0)
        assertTrue(RenderChecks.count(img, ColorScale.SEQUENTIAL.color(1)) > area / 10);
        assertTrue(RenderChecks.count(img, ColorScale.SEQUENTIAL.color(0)) > area / 2);
    }

    @Test
    void silhouetteAtTwoThousand(@TempDir Path tmp) throws Exception {
        SilhouetteInput in = new SilhouetteInput("Silhouette", Synthetic.silhouette(points, cut, K), cut);
        BufferedImage img = RenderChecks.check(new SilhouetteChart(in)::write, tmp, "sil", SilhouetteChart.WIDTH,
                SilhouetteChart.HEIGHT, true);
        int[] sizes = Clusters.sizes(cut, K);
        for (int c = 0; c < K; c++) {
            // a cluster of a few outliers may have widths near 0 and so almost no bar; big ones must show
            if (sizes[c] >= 50) {
                assertTrue(RenderChecks.count(img, ChartColors.cluster(c)) > 2000, "cluster " + c + " not drawn");
            }
        }
    }

    @Test
    void dataHeatmapOfTwoThousandByFiveHundred(@TempDir Path tmp) throws Exception {
        SplittableRandom rnd = new SplittableRandom(12);
        double[][] w = Synthetic.loadings(rnd, 6, 500);
        DataHeatmapInput in = new DataHeatmapInput("Data", N, 500, Synthetic.data(rnd, points, w),
                Synthetic.names("S", N), Synthetic.names("gene-", 500), tree, Synthetic.average(w), cut);
        DataHeatmapChart chart = new DataHeatmapChart(in);
        RenderChecks.check(chart::write, tmp, "data", DataHeatmapChart.WIDTH, chart.height(), false);
    }
}
