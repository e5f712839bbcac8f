package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.Preparation;
import org.treeproof.distance.Metric;
import org.treeproof.explain.ContrastTest;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureContrast;
import org.treeproof.explain.Sensitivity;
import org.treeproof.explain.Solution;
import org.treeproof.tree.Linkage;

/**
 * The explanation's charts at 5 and at 40 clusters: drawn, sized to stay readable (cells of at least 18 × 16
 * pixels), one row per shown feature. Set the environment variable {@code TREEPROOF_CHART_DIR} to keep the PNGs for a look.
 */
class ExplainChartsTest {

    @ParameterizedTest
    @ValueSource(ints = {5, 40})
    void featuresAndSensitivityAreDrawnReadably(int k, @org.junit.jupiter.api.io.TempDir Path tmp) throws Exception {
        System.setProperty("java.awt.headless", "true");
        Path dir = System.getenv("TREEPROOF_CHART_DIR") == null ? tmp
                : Path.of(System.getenv("TREEPROOF_CHART_DIR"), "k" + k);
        int perCluster = 12;
        int n = k * perCluster;
        int m = 60;
        var r = new SplittableRandom(k);
        double[] v = new double[n * m];
        int[] labels = new int[n];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            labels[i] = i / perCluster + 1;
            ids.add("sample-" + i);
            for (int j = 0; j < m; j++) {
                v[i * m + j] = 5 + r.nextGaussian() + (j % k == labels[i] - 1 ? 4 : 0);
            }
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < m; j++) {
            names.add(j == 0 ? "a-rather-long-feature-name-that-needs-clipping-" + j : "feature-" + j);
        }
        DataMatrix data = new DataMatrix(ids, names, v);
        Solution s = Solution.of(labels);
        var features = FeatureContrast.of(data, s, ContrastTest.WILCOXON, 1).compute();
        var sens = Sensitivity.of(data, Preparation.defaults(), Metric.EUCLIDEAN, Linkage.AVERAGE, s, ids, 0.75, 1)
                .compute();
        List<Figure> figs = ExplainCharts.drawAll(new Explanation(s, features, null, sens, List.of()), dir);
        assertEquals(List.of("features", "sensitivity"), figs.stream().map(Figure::id).toList());
        BufferedImage img = ImageIO.read(dir.resolve("features.png").toFile());
        int rows = Math.min(40, k * org.treeproof.report.ExplainFigures.perCluster(k));
        assertTrue(img.getWidth() >= 230 + 18 * k, "width " + img.getWidth());
        assertTrue(img.getHeight() >= 96 + 16 * rows, "height " + img.getHeight());
        assertTrue(img.getWidth() <= 1400 && img.getHeight() <= 1000, img.getWidth() + " x " + img.getHeight());
        assertTrue(ImageIO.read(dir.resolve("sensitivity.png").toFile()).getHeight() > 100);
    }
}
