package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Small and degenerate inputs still give charts of the documented size. */
class ChartEdgeCaseTest {

    @Test
    void twoLeavesOneClusterAndFlatTree(@TempDir Path tmp) throws Exception {
        ChartTree two = ChartTree.leftFirst(2, new int[] {0}, new int[] {1}, new double[] {0});
        DendrogramChart d = new DendrogramChart(new DendrogramInput("Two identical samples", two,
                new String[] {"a", "b"}, new int[] {0, 0}, 0.0, new double[] {1}, "Height"));
        RenderChecks.check(d::write, tmp, "two", DendrogramChart.BASE_WIDTH, DendrogramChart.HEIGHT, true);
    }

    @Test
    void manyClustersLongNamesAndALongTitle(@TempDir Path tmp) throws Exception {
        SplittableRandom rnd = new SplittableRandom(9);
        int n = 80;
        int[] truth = new int[n];
        ChartTree t = Synthetic.average(Synthetic.points(rnd, n, 3, 20, 0.5, truth));
        int[] cut = Synthetic.cut(t, 20);
        String[] names = new String[n];
        Arrays.setAll(names, i -> "a-very-long-sample-identifier-from-a-lab-system-" + i);
        String title = "A title far longer than anyone should write for a chart, which must still fit its width"
                + " without running off the edge of the picture";
        DendrogramChart d = new DendrogramChart(new DendrogramInput(title, t, names, cut, Synthetic.cutHeight(t, 20),
                null, "Height"));
        RenderChecks.check(d::write, tmp, "many", d.width(), DendrogramChart.HEIGHT, true);
        RenderChecks.check(new SilhouetteChart(new SilhouetteInput(title, new double[n], cut))::write, tmp, "sil",
                SilhouetteChart.WIDTH, SilhouetteChart.HEIGHT, true);
        double[] jac = new double[20];
        int[] sizes = Clusters.sizes(cut, 20);
        Arrays.fill(jac, 1.0);
        RenderChecks.check(new JaccardChart(new JaccardInput(title, jac, sizes))::write, tmp, "jac",
                JaccardChart.WIDTH, JaccardChart.HEIGHT, true);
    }

    @Test
    void singlePointsAndSingleLinkage(@TempDir Path tmp) throws Exception {
        RenderChecks.check(new GapChart(new GapInput("Gap", new double[] {0.3}, new double[] {0.05}, 1))::write, tmp,
                "gap", GapChart.WIDTH, GapChart.HEIGHT, true);
        IntervalSeries one = new IntervalSeries("average", new double[] {0.5}, new double[] {0.4},
                new double[] {0.6});
        RenderChecks.check(new StabilityChart(new StabilityInput("Stability", new int[] {2}, List.of(one), null, 0,
                null))::write, tmp, "stab", StabilityChart.WIDTH, StabilityChart.HEIGHT, true);
        LinkageComparisonChart c = new LinkageComparisonChart(new LinkageComparisonInput("One",
                List.of(new LinkageComparisonInput.Row("ward", 1, 0.7, Double.NaN, Double.NaN)),
                new double[][] {{1}}));
        assertEquals(206 + 56, c.height());
        RenderChecks.check(c::write, tmp, "cmp", LinkageComparisonChart.WIDTH, c.height(), true);
    }

    @Test
    void aLinkageWithoutSomeKLeavesAGap(@TempDir Path tmp) throws Exception {
        // average linkage has no cut at k = 4 and 6 (no cut into that many clusters of the smallest size); the chart
        // is still drawn on the axis of every k assessed (it was refused, and left out of the report, before)
        double nan = Double.NaN;
        IntervalSeries average = new IntervalSeries("average", new double[] {0.8, 0.7, nan, 0.6, nan},
                new double[] {0.7, 0.6, nan, 0.5, nan}, new double[] {0.9, 0.8, nan, 0.7, nan});
        IntervalSeries ward = new IntervalSeries("ward", new double[] {0.9, 0.8, 0.7, 0.6, 0.5},
                new double[] {0.8, 0.7, 0.6, 0.5, 0.4}, new double[] {0.95, 0.9, 0.8, 0.7, 0.6});
        assertEquals(List.of(List.of(0, 1), List.of(3, 3)), average.runs().stream()
                .map(r -> List.of(r[0], r[1])).toList());
        RenderChecks.check(new StabilityChart(new StabilityInput("Stability", new int[] {2, 3, 4, 5, 6},
                List.of(average, ward), average, 3, "average"))::write, tmp, "gaps", StabilityChart.WIDTH,
                StabilityChart.HEIGHT, true);
    }

    @Test
    void oneFeatureWithoutTreeAndMissingValues(@TempDir Path tmp) throws Exception {
        ChartTree t = ChartTree.leftFirst(3, new int[] {0, 3}, new int[] {1, 2}, new double[] {1, 2});
        DataHeatmapChart h = new DataHeatmapChart(new DataHeatmapInput("Data", 3, 1, new double[] {1, Double.NaN, 3},
                new String[] {"a", "b", "c"}, new String[] {"f"}, t, null, null));
        RenderChecks.check(h::write, tmp, "data", DataHeatmapChart.WIDTH, h.height(), false);
        ConsensusChart c = new ConsensusChart(new ConsensusInput("Pairs", 3, new double[] {Double.NaN, 0.2, 0.9},
                t.leafOrder(), new int[] {0, 0, 1}));
        RenderChecks.check(c::write, tmp, "cons", ConsensusChart.WIDTH, ConsensusChart.HEIGHT, false);
    }
}
