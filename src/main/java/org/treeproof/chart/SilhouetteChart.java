package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * Per-sample silhouette widths (P. J. Rousseeuw, "Silhouettes: a graphical aid to the interpretation and
 * validation of cluster analysis", J. Comput. Appl. Math. 20 (1987) 53-65, doi:10.1016/0377-0427(87)90125-7)
 * as horizontal bars, grouped by cluster and sorted within it, with the overall average as a dashed line.
 *
 * <p>Each cluster is filled as one outline traced along its sorted bars, so at thousands of samples the
 * bars become a clean shape instead of thousands of hairlines. {@value #WIDTH} by {@value #HEIGHT} pixels;
 * writes PNG and SVG.
 */
public final class SilhouetteChart {
    public static final int WIDTH = 1000;
    public static final int HEIGHT = 720;

    private final SilhouetteInput in;

    public SilhouetteChart(SilhouetteInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, true, this::paint);
    }

    void paint(Graphics2D g) {
        double[] s = in.silhouette();
        int[] label = in.clusterOfSample();
        int n = s.length;
        int k = in.clusterCount();
        double top = Look.title(g, in.title(), WIDTH, 14) + 30;
        Rectangle2D plot = new Rectangle2D.Double(150, top, WIDTH - 150 - 290, HEIGHT - top - 76);

        double min = Arrays.stream(s).min().orElse(0);
        double xMin = Math.min(0, Math.floor(min * 10 - 1e-9) / 10);
        int gap = Math.max(1, (int) Math.round(n * 0.02));
        double rows = n + gap * (k - 1);
        Axes axes = new Axes(plot, xMin, 1, 0, rows);
        double[] ticks = Ticks.between(xMin, 1, 7);
        axes.gridX(g, ticks);

        int[][] members = members(label, k);
        double[] means = new double[k];
        int negative = 0;
        double row = 0;
        double lastLabel = Double.NEGATIVE_INFINITY;
        g.setFont(Look.font(Look.TICK_SIZE));
        for (int c = 0; c < k; c++) {
            int[] m = members[c];
            double[] v = new double[m.length];
            for (int i = 0; i < m.length; i++) {
                v[i] = s[m[i]];
                means[c] += v[i] / m.length;
                negative += v[i] < 0 ? 1 : 0;
            }
            Arrays.sort(v);
            // rows run from the top: the widest bar of each cluster first
            Path2D.Double shape = new Path2D.Double();
            double y0 = axes.y(rows - row);
            shape.moveTo(axes.x(0), y0);
            for (int i = 0; i < v.length; i++) {
                double value = v[v.length - 1 - i];
                shape.lineTo(axes.x(value), axes.y(rows - row - i));
                shape.lineTo(axes.x(value), axes.y(rows - row - i - 1));
            }
            shape.lineTo(axes.x(0), axes.y(rows - row - v.length));
            shape.closePath();
            g.setColor(ChartColors.cluster(c));
            g.fill(shape);
            double mid = (axes.y(rows - row) + axes.y(rows - row - v.length)) / 2;
            // a name wherever it keeps clear of the one above; the key names every cluster anyway
            if (mid - lastLabel >= 15) {
                g.setColor(Look.INK);
                Look.textRight(g, Clusters.name(c), plot.getX() - 10, mid);
                lastLabel = mid;
            }
            row += v.length + gap;
        }

        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(axes.x(0), plot.getY(), axes.x(0), plot.getMaxY()));
        double avg = in.average();
        g.setColor(Look.RULE);
        g.setStroke(Look.DASHED);
        g.draw(new Line2D.Double(axes.x(avg), plot.getY() - 6, axes.x(avg), plot.getMaxY()));
        g.setFont(Look.font(Look.NOTE_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, "average " + Ticks.number(avg, 2), axes.x(avg), plot.getY() - 24);

        axes.bottom(g, ticks, Axes.labels(ticks),
                "Silhouette width: closeness to own cluster against the nearest other (\u22121 to 1)");
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        Look.textUp(g, n + " samples, grouped by cluster, widest first", 30, plot.getCenterY());

        int[] sizes = Clusters.sizes(label, k);
        List<Key.Entry> entries = new ArrayList<>();
        for (Key.Entry e : Clusters.entries(sizes, "samples")) {
            entries.add(e);
        }
        for (int c = 0; c < Math.min(k, entries.size()); c++) {
            Key.Entry e = entries.get(c);
            if (e.kind() == Key.Kind.FILL) {
                entries.set(c, Key.Entry.fill(e.color(), e.text() + ", mean " + Ticks.number(means[c], 2)));
            }
        }
        entries.add(Key.Entry.line(Look.RULE, Look.DASHED, "average over all samples: " + Ticks.number(avg, 2)));
        if (negative > 0) {
            entries.add(Key.Entry.note(negative + (negative == 1 ? " sample has" : " samples have")
                    + " a negative width: closer to another cluster than to its own."));
        }
        Key.list(g, plot.getMaxX() + 30, plot.getY(), 250, "Clusters (k = " + k + ")", entries);
    }

    private static int[][] members(int[] label, int k) {
        int[] sizes = Clusters.sizes(label, k);
        int[][] m = new int[k][];
        for (int c = 0; c < k; c++) {
            m[c] = new int[sizes[c]];
        }
        int[] fill = new int[k];
        for (int i = 0; i < label.length; i++) {
            m[label[i]][fill[label[i]]++] = i;
        }
        return m;
    }
}
