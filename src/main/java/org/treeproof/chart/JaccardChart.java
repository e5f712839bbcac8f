package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * Cluster-wise stability: one bar per cluster, in the cluster's colour, showing its mean Jaccard similarity
 * to its best match over the replicates, against three shaded bands split at 0.5 and 0.75. The measure and
 * the two thresholds follow C. Hennig, "Cluster-wise assessment of cluster stability", Computational
 * Statistics &amp; Data Analysis 52 (2007) 258-271, doi:10.1016/j.csda.2006.11.025; the band names are
 * ours ({@link #band}). {@value #WIDTH} by {@value #HEIGHT} pixels, PNG and SVG.
 */
public final class JaccardChart {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 580;
    /** At or below this a cluster is dissolved (Hennig's dissolution threshold, from the score). */
    public static final double LOW = org.treeproof.score.JaccardStability.DISSOLVED_AT;
    /** At or above this a cluster is stable (Hennig's stable band, from the score). */
    public static final double HIGH = org.treeproof.score.JaccardStability.STABLE_FROM;

    private static final Color[] BAND_FILL = {new Color(0xE8E8E8), new Color(0xF4F4F4), Color.WHITE};

    private final JaccardInput in;

    public JaccardChart(JaccardInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /**
     * The band of a mean Jaccard value in the words of the score's statuses, as the tables print them: dissolved (at
     * or below {@link #LOW}), doubtful, stable (from {@link #HIGH}).
     */
    public static String band(double jaccard) {
        return (jaccard <= LOW ? org.treeproof.score.JaccardStability.Status.DISSOLVED : jaccard < HIGH
                ? org.treeproof.score.JaccardStability.Status.DOUBTFUL
                : org.treeproof.score.JaccardStability.Status.STABLE).label();
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, true, this::paint);
    }

    void paint(Graphics2D g) {
        int k = in.clusterCount();
        double[] j = in.jaccard();
        int[] size = in.clusterSize();
        double top = Look.title(g, in.title(), WIDTH, 14) + 20;
        Rectangle2D plot = new Rectangle2D.Double(96, top, WIDTH - 96 - 200, HEIGHT - top - 92);
        Axes axes = new Axes(plot, 0, k, 0, 1);

        double[][] bands = {{0, LOW}, {LOW, HIGH}, {HIGH, 1}};
        String[] words = {band(LOW), band((LOW + HIGH) / 2), band(HIGH)};
        String[] ranges = {Ticks.number(LOW, 1) + " or less", "above " + Ticks.number(LOW, 1) + ", below "
                + Ticks.number(HIGH, 2), Ticks.number(HIGH, 2) + " and above"};
        for (int b = 0; b < 3; b++) {
            g.setColor(BAND_FILL[b]);
            g.fill(new Rectangle2D.Double(plot.getX(), axes.y(bands[b][1]), plot.getWidth(),
                    axes.y(bands[b][0]) - axes.y(bands[b][1])));
        }
        double[] ticks = {0, 0.25, 0.5, 0.75, 1};
        axes.gridY(g, ticks);
        g.setColor(Look.RULE);
        g.setStroke(Look.DASHED);
        for (double t : new double[] {LOW, HIGH}) {
            g.draw(new Line2D.Double(plot.getX(), axes.y(t), plot.getMaxX(), axes.y(t)));
        }
        for (int b = 0; b < 3; b++) {
            double mid = axes.y((bands[b][0] + bands[b][1]) / 2);
            g.setFont(Look.bold(Look.NOTE_SIZE));
            g.setColor(Look.INK);
            Look.textLeft(g, words[b], plot.getMaxX() + 14, mid - 8);
            g.setFont(Look.font(Look.NOTE_SIZE));
            g.setColor(Look.MUTED);
            Look.textLeft(g, ranges[b], plot.getMaxX() + 14, mid + 8);
        }

        double slot = plot.getWidth() / k;
        double barWidth = Math.min(70, slot * 0.62);
        boolean full = slot >= 64;
        for (int c = 0; c < k; c++) {
            double cx = axes.x(c + 0.5);
            double yTop = axes.y(j[c]);
            g.setColor(ChartColors.cluster(c));
            g.fill(new Rectangle2D.Double(cx - barWidth / 2, yTop, barWidth, plot.getMaxY() - yTop));
            g.setFont(Look.font(slot >= 34 ? Look.TICK_SIZE : Look.SMALL_SIZE));
            String value = Ticks.number(j[c], 2);
            double vw = Look.width(g, value);
            Look.plate(g, new Rectangle2D.Double(cx - vw / 2 - 2, yTop - 18, vw + 4, g.getFontMetrics().getHeight()));
            g.setColor(Look.INK);
            Look.textCentredBelow(g, value, cx, yTop - 18);
            g.setFont(Look.font(Look.TICK_SIZE));
            Look.textCentredBelow(g, full ? Clusters.name(c) : Integer.toString(c + 1), cx, plot.getMaxY() + 8);
            g.setFont(Look.font(Look.SMALL_SIZE));
            g.setColor(Look.MUTED);
            Look.textCentredBelow(g, (full ? "n = " : "") + size[c], cx, plot.getMaxY() + 26);
        }
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(plot.getX(), plot.getMaxY(), plot.getMaxX(), plot.getMaxY()));
        axes.left(g, ticks, new String[] {"0", "0.25", "0.5", "0.75", "1"},
                "Mean Jaccard similarity to its best match");
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        String xTitle = full ? "Cluster and its number of samples"
                : "Cluster number (below it: number of samples)";
        Look.textCentredBelow(g, xTitle, plot.getCenterX(), plot.getMaxY() + 48);
    }
}
