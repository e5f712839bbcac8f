package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The consensus matrix as a heat map in tree order, on the sequential scale {@link ColorScale#SEQUENTIAL}
 * (pale = never together, dark = always together), with each cluster's diagonal block outlined and cluster
 * colour strips along the top and left.
 *
 * <p>The matrix is drawn as one image of at most {@value #MAX_SIDE} pixels a side: with more samples than
 * that, each pixel is the mean of the pairs it covers. {@value #WIDTH} by {@value #HEIGHT} pixels, PNG only
 * (a vector copy would only wrap the same image).
 */
public final class ConsensusChart {
    public static final int WIDTH = 1060;
    public static final int HEIGHT = 800;
    /** Largest side of the matrix image in pixels. */
    public static final int MAX_SIDE = 660;

    private final ConsensusInput in;

    public ConsensusChart(ConsensusInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} into {@code dir}; returns the file name. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, false, this::paint);
    }

    void paint(Graphics2D g) {
        int n = in.n();
        int k = in.clusterCount();
        int[] order = in.orderView();
        double top = Look.title(g, in.title(), WIDTH, 14);
        int side = Pooling.side(n, MAX_SIDE);
        double x0 = 118 + (MAX_SIDE - side) / 2.0;
        double y0 = top + 44 + (MAX_SIDE - side) / 2.0;
        x0 = Math.round(x0);
        y0 = Math.round(y0);

        double[] pooled = Pooling.means(n, n, side, side, (r, c) -> in.value(order[r], order[c]));
        ColorScale scale = ColorScale.SEQUENTIAL;
        BufferedImage img = Pooling.image(pooled, side, side, scale::rgb);
        g.drawImage(img, (int) x0, (int) y0, null);

        double cell = (double) side / n;
        List<int[]> runs = Clusters.runs(in.clusterView(), order);
        g.setFont(Look.font(Look.TICK_SIZE));
        for (int[] run : runs) {
            double a = run[0] * cell;
            double b = run[1] * cell;
            g.setColor(ChartColors.cluster(run[2]));
            g.fill(new Rectangle2D.Double(x0 + a, y0 - 14, b - a, 10));
            g.fill(new Rectangle2D.Double(x0 - 14, y0 + a, 10, b - a));
            if (b - a >= 16) {
                g.setColor(Look.INK);
                Look.textCentredBelow(g, Clusters.stripText(run[2]), x0 + (a + b) / 2, y0 - 32);
            }
        }
        g.setColor(Look.RULE);
        g.setStroke(new BasicStroke(1.3f));
        for (int[] run : runs) {
            double a = run[0] * cell;
            double b = run[1] * cell;
            g.draw(new Rectangle2D.Double(x0 + a, y0 + a, b - a, b - a));
        }
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(x0, y0, side, side));

        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        String axis = n + " samples, in tree order";
        Look.textCentredBelow(g, axis, x0 + side / 2.0, y0 + side + 10);
        Look.textUp(g, axis, x0 - 26, y0 + side / 2.0);
        g.setFont(Look.font(Look.NOTE_SIZE));
        Look.textCentredBelow(g, "cluster", x0 - 40, y0 - 32);

        double kx = 118 + MAX_SIDE + 44;
        double kw = WIDTH - kx - 20;
        double[] ticks = {0, 0.25, 0.5, 0.75, 1};
        String[] labels = {"0 (never)", "0.25", "0.5", "0.75", "1 (always)"};
        double y = Key.colourBar(g, scale, kx, top + 30, 240, "Share of replicates that put the two samples in"
                + " the same cluster", kw, 0, 1, ticks, labels);
        List<Key.Entry> entries = new ArrayList<>(Clusters.entries(Clusters.sizes(in.clusterView(), k), "samples"));
        entries.addAll(Clusters.outlierEntry(in.clusterView(), "samples"));
        entries.add(Key.Entry.line(Look.RULE, new BasicStroke(1.3f), "outline: a cluster's own pairs"));
        if (hasMissing()) {
            entries.add(Key.Entry.fill(scale.missing(), "pairs never drawn in the same replicate"));
        }
        if (n > side) {
            entries.add(Key.Entry.note("Each pixel is the mean of about " + Math.round((double) n / side) + " \u00d7 "
                    + Math.round((double) n / side) + " sample pairs."));
        }
        Key.list(g, kx, y + 30, kw, "Clusters (k = " + k + ")", entries);
    }

    private boolean hasMissing() {
        for (int i = 0; i < in.n(); i++) {
            for (int j = i + 1; j < in.n(); j++) {
                if (Double.isNaN(in.value(i, j))) {
                    return true;
                }
            }
        }
        return false;
    }
}
