package org.treeproof.chart;

import java.nio.file.Path;
import java.util.SplittableRandom;

/**
 * Renders every chart from seeded synthetic inputs at about 150 and about 2000 samples, for looking at
 * by eye: {@code java ... org.treeproof.chart.ChartLookDemo /tmp/chart-look}. Not a test.
 */
public final class ChartLookDemo {
    private ChartLookDemo() {
    }

    public static void main(String[] args) throws Exception {
        System.setProperty("java.awt.headless", "true");
        Path out = Path.of(args.length > 0 ? args[0] : "/tmp/chart-look");
        for (int n : new int[] {150, 2000}) {
            SplittableRandom rnd = new SplittableRandom(20240 + n);
            int[] truth = new int[n];
            double[][] x = Synthetic.points(rnd, n, 6, 5, 1.6, truth);
            ChartTree tree = Synthetic.average(x);
            int k = 5;
            int[] cut = Synthetic.cut(tree, k);
            DendrogramInput d = new DendrogramInput("Tree of " + n + " samples, average linkage", tree,
                    Synthetic.names("S", n), cut, Synthetic.cutHeight(tree, k), Synthetic.support(rnd, tree),
                    "Merge height (Euclidean distance)");
            new DendrogramChart(d).write(out, "dendrogram-" + n);
            new SilhouetteChart(new SilhouetteInput("Silhouette of " + k + " clusters, average linkage",
                    Synthetic.silhouette(x, cut, k), cut)).write(out, "silhouette-" + n);
            int[] ks = {2, 3, 4, 5, 6, 7, 8, 9, 10};
            java.util.List<IntervalSeries> curves = java.util.List.of(
                    Synthetic.stabilityCurve(rnd, "average", ks, 5, 0.93),
                    Synthetic.stabilityCurve(rnd, "complete", ks, 4, 0.8),
                    Synthetic.stabilityCurve(rnd, "ward", ks, 5, 0.88));
            new StabilityChart(new StabilityInput("Stability of the clusters over 200 replicates (" + n
                    + " samples)", ks, curves, Synthetic.referenceCurve(ks), 5, "average"))
                    .write(out, "stability-" + n);
            int kMax = n > 1000 ? 12 : 10;
            double[] gap = new double[kMax];
            double[] se = new double[kMax];
            for (int i = 0; i < kMax; i++) {
                gap[i] = 0.2 + 0.9 * Math.min(i, 4) / 4.0 + 0.02 * (i - 4) * (i > 4 ? 1 : 0) + 0.03 * rnd.nextDouble();
                se[i] = 0.03 + 0.01 * rnd.nextDouble();
            }
            new GapChart(new GapInput("Gap statistic, average linkage (" + n + " samples)", gap, se, 5))
                    .write(out, "gap-" + n);
            new ConsensusChart(new ConsensusInput("Consensus of 200 replicates at k = " + k + " (" + n + " samples)", n,
                    Synthetic.consensus(rnd, cut), tree.leafOrder(), cut)).write(out, "consensus-" + n);
            int jk = n > 1000 ? 14 : k;
            double[] jac = new double[jk];
            int[] sizes = new int[jk];
            for (int c = 0; c < jk; c++) {
                jac[c] = Math.min(1, 0.3 + 0.7 * rnd.nextDouble());
                sizes[c] = 5 + rnd.nextInt(n / jk * 2);
            }
            new JaccardChart(new JaccardInput("How well each cluster is found again (k = " + jk + ")", jac, sizes))
                    .write(out, "jaccard-" + n);
            String[] names = n > 1000 ? new String[] {"average", "complete", "ward", "single", "weighted",
                "centroid", "median"} : new String[] {"average", "complete", "ward"};
            java.util.List<LinkageComparisonInput.Row> rows = new java.util.ArrayList<>();
            int m = names.length;
            double[][] agree = new double[m][m];
            for (int a = 0; a < m; a++) {
                rows.add(new LinkageComparisonInput.Row(names[a], 3 + rnd.nextInt(4), 0.5 + 0.45 * rnd.nextDouble(),
                        0.3 + 0.65 * rnd.nextDouble(), names[a].equals("single") ? -0.08 : 0.2 + 0.4 * rnd.nextDouble()));
                agree[a][a] = 1;
                for (int b = 0; b < a; b++) {
                    agree[a][b] = 0.2 + 0.75 * rnd.nextDouble();
                    agree[b][a] = agree[a][b];
                }
            }
            new LinkageComparisonChart(new LinkageComparisonInput("Linkage methods compared at their best k", rows,
                    agree)).write(out, "linkages-" + n);
            int p = n > 1000 ? 500 : 40;
            double[][] w = Synthetic.loadings(rnd, 6, p);
            new DataHeatmapChart(new DataHeatmapInput("Data of " + n + " samples and " + p + " features", n, p,
                    Synthetic.data(rnd, x, w), Synthetic.names("S", n), Synthetic.names("gene-", p), tree,
                    Synthetic.average(w), cut)).write(out, "data-" + n);
        }
        SplittableRandom rnd = new SplittableRandom(7);
        int[] truth = new int[150];
        double[][] x = Synthetic.points(rnd, 150, 4, 4, 2.4, truth);
        ChartTree tree = Synthetic.centroid(x);
        int[] cut = Synthetic.cut(tree, 4);
        new DendrogramChart(new DendrogramInput("Tree of 150 samples, centroid linkage", tree,
                Synthetic.names("S", 150), cut, Double.NaN, null, "Merge height (Euclidean distance)"))
                .write(out, "dendrogram-centroid-150");

        // awkward cases: twenty clusters, long names, a long title, a one-point gap curve
        int[] many = new int[80];
        ChartTree t20 = Synthetic.average(Synthetic.points(new SplittableRandom(9), 80, 3, 20, 0.5, many));
        int[] cut20 = Synthetic.cut(t20, 20);
        String[] longNames = new String[80];
        java.util.Arrays.setAll(longNames, i -> "a-very-long-sample-identifier-from-a-lab-system-" + i);
        String longTitle = "A title far longer than anyone should write for a chart, which must still fit its width"
                + " without running off the edge of the picture";
        new DendrogramChart(new DendrogramInput(longTitle, t20, longNames, cut20, Synthetic.cutHeight(t20, 20), null,
                "Merge height (Euclidean distance)")).write(out, "edge-dendrogram-k20");
        new SilhouetteChart(new SilhouetteInput("Silhouette of 20 clusters", Synthetic.silhouette(
                Synthetic.points(new SplittableRandom(9), 80, 3, 20, 0.5, many), cut20, 20), cut20))
                .write(out, "edge-silhouette-k20");
        new GapChart(new GapInput("Gap statistic with one k", new double[] {0.3}, new double[] {0.05}, 1))
                .write(out, "edge-gap-one");
    }
}
