package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The data as a heat map: each feature standardised over the samples (z-score, clipped at +-{@value #CLIP}),
 * on the diverging scale {@link ColorScale#DIVERGING} centred at 0, rows in the sample tree's order with that
 * tree at the left, columns in the feature tree's order with that tree on top, and an optional strip of
 * sample clusters.
 *
 * <p>The matrix is one image: with more rows or columns than pixels, each pixel is the mean of the clipped
 * values it covers. Sample names are printed when rows are at least 7 pixels tall, feature names when there
 * are at most {@value #MAX_FEATURE_LABELS} features. {@value #WIDTH} pixels wide and {@link #height()} high (it depends on
 * the numbers of rows and features), PNG only.
 */
public final class DataHeatmapChart {
    public static final int WIDTH = 1320;
    /** z-scores beyond this are shown at the end colours. */
    public static final double CLIP = 3.0;
    /** Most features whose names are printed. */
    public static final int MAX_FEATURE_LABELS = 100;

    private static final int MAX_HEAT_WIDTH = 760;
    private static final int MAX_HEAT_HEIGHT = 720;
    private static final double NAME_ROOM = 112;
    private static final double TITLE_ROOM = 56;
    /** Enough for the key beside a short matrix. */
    private static final int MIN_HEIGHT = 700;
    private static final Color TREE_INK = new Color(0x555555);

    private final DataHeatmapInput in;

    public DataHeatmapChart(DataHeatmapInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} into {@code dir}; returns the file name. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, WIDTH, height(), false, this::paint);
    }

    /** Pixel height: the title, the feature tree, the matrix, feature names if printed, the axis title. */
    public int height() {
        int heatH = Pooling.side(in.sampleCount(), MAX_HEAT_HEIGHT);
        double h = TITLE_ROOM + treeHeight() + 8 + heatH + 6 + featureNameBand() + 44;
        return (int) Math.max(MIN_HEIGHT, Math.ceil(h));
    }

    private double treeHeight() {
        return in.featureTree() == null ? 0 : 100;
    }

    private boolean featureNames() {
        int p = in.featureCount();
        return p <= MAX_FEATURE_LABELS && (double) Pooling.side(p, MAX_HEAT_WIDTH) / p >= 7;
    }

    private float featureNameSize() {
        return (float) Math.min(11, (double) Pooling.side(in.featureCount(), MAX_HEAT_WIDTH) / in.featureCount() * 0.9);
    }

    private int featureNameChars() {
        return (int) (NAME_ROOM / (featureNameSize() * 0.62));
    }

    /** Room under the matrix for the feature names: the longest printed name, at most {@code NAME_ROOM}. */
    private double featureNameBand() {
        if (!featureNames()) {
            return 0;
        }
        double widest = 0;
        var font = Look.font(featureNameSize());
        for (int j = 0; j < in.featureCount(); j++) {
            widest = Math.max(widest, Look.measure(font, Look.clipMiddle(in.featureLabelAt(j), featureNameChars())));
        }
        return Math.min(NAME_ROOM, widest + 6);
    }

    /**
     * Each feature as z-scores over the samples: (x - mean) / standard deviation (n - 1 in the denominator),
     * missing values left out and kept as NaN; a feature with no spread is all 0.
     */
    static double[] zScores(DataHeatmapInput in) {
        int n = in.sampleCount();
        int p = in.featureCount();
        double[] z = new double[n * p];
        for (int j = 0; j < p; j++) {
            double sum = 0;
            int count = 0;
            for (int i = 0; i < n; i++) {
                double v = in.valueAt(i, j);
                if (!Double.isNaN(v)) {
                    sum += v;
                    count++;
                }
            }
            double mean = count == 0 ? 0 : sum / count;
            double ss = 0;
            for (int i = 0; i < n; i++) {
                double v = in.valueAt(i, j);
                if (!Double.isNaN(v)) {
                    ss += (v - mean) * (v - mean);
                }
            }
            double sd = count > 1 ? Math.sqrt(ss / (count - 1)) : 0;
            for (int i = 0; i < n; i++) {
                double v = in.valueAt(i, j);
                z[i * p + j] = Double.isNaN(v) ? Double.NaN : sd > 0 ? (v - mean) / sd : 0.0;
            }
        }
        return z;
    }

    void paint(Graphics2D g) {
        int n = in.sampleCount();
        int p = in.featureCount();
        Look.title(g, in.title(), WIDTH, 14);
        double top = TITLE_ROOM;
        int heatW = Pooling.side(p, MAX_HEAT_WIDTH);
        int heatH = Pooling.side(n, MAX_HEAT_HEIGHT);
        boolean sampleNames = (double) heatH / n >= 7;
        boolean featureNames = featureNames();
        boolean strip = in.clusterView() != null;
        double treeW = 130;
        double treeH = treeHeight();
        double x0 = 24 + treeW + (strip ? 20 : 6);
        double y0 = top + treeH + 8;

        int[] rowOrder = in.sampleTree().leafOrder();
        int[] colOrder = in.featureTree() == null ? identity(p) : in.featureTree().leafOrder();
        double[] z = zScores(in);
        double[] pooled = Pooling.means(n, p, heatH, heatW, (r, c) -> {
            double v = z[rowOrder[r] * p + colOrder[c]];
            return Double.isNaN(v) ? v : Math.max(-CLIP, Math.min(CLIP, v));
        });
        ColorScale scale = ColorScale.DIVERGING;
        BufferedImage img = Pooling.image(pooled, heatW, heatH, v -> scale.rgb((v + CLIP) / (2 * CLIP)));
        g.drawImage(img, (int) x0, (int) y0, null);
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(x0, y0, heatW, heatH));

        int k = strip ? Check.count(in.clusterView()) : 0;
        TreeDrawing samples = new TreeDrawing(in.sampleTree(), in.clusterView());
        double[] sr = samples.heightRange();
        samples.place(new Rectangle2D.Double(24, y0, treeW, heatH), Math.min(0, sr[0]), sr[1],
                TreeDrawing.Leaves.RIGHT).draw(g, strip ? Clusters.colours(k) : new Color[] {TREE_INK},
                ChartColors.ABOVE_CUT, 1f);
        if (strip) {
            double cell = (double) heatH / n;
            for (int[] run : Clusters.runs(in.clusterView(), rowOrder)) {
                g.setColor(ChartColors.cluster(run[2]));
                g.fill(new Rectangle2D.Double(x0 - 14, y0 + run[0] * cell, 10, (run[1] - run[0]) * cell));
            }
        }
        if (in.featureTree() != null) {
            TreeDrawing features = new TreeDrawing(in.featureTree(), null);
            double[] fr = features.heightRange();
            features.place(new Rectangle2D.Double(x0, top, heatW, treeH - 2), Math.min(0, fr[0]), fr[1],
                    TreeDrawing.Leaves.BOTTOM).draw(g, new Color[] {TREE_INK}, TREE_INK, 1f);
        }

        double below = y0 + heatH + 6;
        if (featureNames) {
            g.setFont(Look.font(featureNameSize()));
            g.setColor(Look.INK);
            int chars = featureNameChars();
            for (int c = 0; c < p; c++) {
                Look.textDown(g, Look.clipMiddle(in.featureLabelAt(colOrder[c]), chars), x0 + (c + 0.5) * heatW / p, below);
            }
            below += featureNameBand();
        }
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        String featureTitle = p + (p == 1 ? " feature" : " features") + (in.featureTree() == null ? ", in input order"
                : ", in tree order") + (featureNames ? "" : " (names left out: too many to print)");
        Look.textCentredBelow(g, featureTitle, x0 + heatW / 2.0, below + 4);
        double right = x0 + heatW + 8;
        if (sampleNames) {
            float size = (float) Math.min(11, (double) heatH / n * 0.9);
            g.setFont(Look.font(size));
            g.setColor(Look.INK);
            int chars = (int) (NAME_ROOM / (size * 0.62));
            for (int r = 0; r < n; r++) {
                Look.textLeft(g, Look.clipMiddle(in.sampleLabelAt(rowOrder[r]), chars), right, y0 + (r + 0.5) * heatH / n);
            }
            right += NAME_ROOM;
        }
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        Look.textUp(g, n + " samples, in tree order" + (sampleNames ? "" : " (names left out)"), 16,
                y0 + heatH / 2.0);

        key(g, Math.max(right + 24, x0 + MAX_HEAT_WIDTH + 40), y0, pooled, n, p, heatW, heatH, k);
    }

    private void key(Graphics2D g, double kx, double top, double[] pooled, int n, int p, int heatW, int heatH,
            int k) {
        double kw = WIDTH - kx - 20;
        double[] ticks = {-3, -2, -1, 0, 1, 2, 3};
        String[] labels = {"\u2264 \u22123", "\u22122", "\u22121", "0 (feature mean)", "1", "2", "\u2265 3"};
        double y = Key.colourBar(g, ColorScale.DIVERGING, kx, top, 260,
                "Value as z-score within its feature (standard deviations from the mean)", kw, -CLIP, CLIP, ticks,
                labels);
        List<Key.Entry> entries = new ArrayList<>();
        if (k > 0) {
            entries.addAll(Clusters.entries(Clusters.sizes(in.clusterView(), k), "samples"));
            entries.addAll(Clusters.outlierEntry(in.clusterView(), "samples"));
            entries.add(Key.Entry.line(ChartColors.ABOVE_CUT, new BasicStroke(2f), "branches that join clusters"));
        }
        boolean missing = false;
        for (double v : pooled) {
            missing |= Double.isNaN(v);
        }
        if (missing) {
            entries.add(Key.Entry.fill(ColorScale.DIVERGING.missing(), "no value"));
        }
        long perRow = Math.round((double) n / heatH);
        long perColumn = Math.round((double) p / heatW);
        if (n > heatH && p > heatW) {
            entries.add(Key.Entry.note("Each pixel is the mean of about " + perRow + " samples \u00d7 " + perColumn
                    + " features."));
        } else if (n > heatH) {
            entries.add(Key.Entry.note("Each pixel row is the mean of about " + perRow + " samples."));
        } else if (p > heatW) {
            entries.add(Key.Entry.note("Each pixel column is the mean of about " + perColumn + " features."));
        }
        if (!entries.isEmpty()) {
            Key.list(g, kx, y + 34, kw, k > 0 ? "Sample clusters (k = " + k + ")" : null, entries);
        }
    }

    private static int[] identity(int p) {
        int[] o = new int[p];
        for (int j = 0; j < p; j++) {
            o[j] = j;
        }
        return o;
    }
}
