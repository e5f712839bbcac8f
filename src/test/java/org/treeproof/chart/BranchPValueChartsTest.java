package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The AU marks on the tree and the consensus-CDF chart. */
class BranchPValueChartsTest {
    static {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void highAuForksAreFilledAndLowOnesHollow(@TempDir Path dir) throws Exception {
        var rnd = new SplittableRandom(4);
        double[][] x = Synthetic.points(rnd, 40, 2, 3, 0.4, new int[40]);
        ChartTree t = Synthetic.average(x);
        int[] cut = Synthetic.cut(t, 3);
        double[] high = new double[39];
        double[] low = new double[39];
        Arrays.fill(high, 0.99);
        Arrays.fill(low, 0.5);
        long[] ink = new long[2];
        int i = 0;
        for (double[] au : List.of(high, low)) {
            var in = new DendrogramInput("Tree", t, Synthetic.names("S", 40), cut, Synthetic.cutHeight(t, 3), null, au,
                    "Merge height");
            new DendrogramChart(in).write(dir, "tree" + i);
            BufferedImage png = ImageIO.read(dir.resolve("tree" + i + ".png").toFile());
            ink[i++] = RenderChecks.count(png, Look.INK);
        }
        // each filled 8 x 8 square adds its inside in ink; 30 forks carry one
        assertTrue(ink[0] > ink[1] + 30 * 20, "filled squares: " + ink[0] + " vs hollow " + ink[1]);
    }

    @Test
    void cdfChartDrawsAndRefusesWhatIsNotACdf(@TempDir Path dir) throws Exception {
        double[][] k2 = {{0, 0.3}, {0.5, 0.6}, {1, 1}};
        double[][] k3 = {{0, 0.6}, {1, 1}};
        var in = new ConsensusCdfInput("CDF", new int[] {2, 3}, List.of(k2, k3), new double[] {0.4, 0.5}, 3);
        List<String> files = new ConsensusCdfChart(in).write(dir, "cdf");
        assertEquals(List.of("cdf.png", "cdf.svg"), files);
        BufferedImage png = ImageIO.read(dir.resolve("cdf.png").toFile());
        assertEquals(ConsensusCdfChart.WIDTH, png.getWidth());
        assertTrue(RenderChecks.count(png, Look.INK) > 200, "the chosen k is drawn in ink");
        double[][] falling = {{0, 0.6}, {1, 0.5}};
        assertThrows(IllegalArgumentException.class, () -> new ConsensusCdfInput("CDF", new int[] {2},
                List.<double[][]>of(falling), new double[] {0.4}, 0));
        assertThrows(IllegalArgumentException.class, () -> new ConsensusCdfInput("CDF", new int[] {2, 4},
                List.of(k2, k3), new double[] {0.4, 0.5}, 0));
        assertThrows(IllegalArgumentException.class, () -> new ConsensusCdfInput("CDF", new int[] {2, 3},
                List.of(k2, k3), new double[] {0.4, 0.5}, 5));
    }
}
