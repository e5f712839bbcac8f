package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.treeproof.explain.FeatureTable;

/**
 * The top features per cluster as a grid: one row per feature (each cluster's top features, grouped by the
 * cluster they distinguish most, marked by that cluster's colour at the left), one column per cluster, each cell
 * coloured by the feature's AUC in that cluster against the rest on a blue-white-red scale (0.5 white), a frame on
 * the cells of a column's own top features, the AUC printed in the cell when it fits. Sized from the numbers of
 * clusters and rows so it reads from 2 to 40 of each.
 */
final class FeatureChart {
    private static final double LEFT_LABELS = 230;
    private static final double TOP = 96;
    private static final double LEGEND = 190;

    private final FeatureTable t;
    private final int perCluster;
    private final List<Integer> rows = new ArrayList<>();
    private final List<Integer> owner = new ArrayList<>();
    private final double cellW;
    private final double cellH;
    private final int width;
    private final int height;

    FeatureChart(FeatureTable t, int perCluster) {
        this.t = t;
        this.perCluster = perCluster;
        Map<Integer, Integer> firstOwner = new LinkedHashMap<>();
        for (int c = 1; c <= t.clusters(); c++) {
            for (int r = 1; r <= Math.min(perCluster, t.features().size()); r++) {
                firstOwner.putIfAbsent(t.featureAtRank(c, r), c);
            }
        }
        // grouped by the owning cluster, in rank order within it
        for (int c = 1; c <= t.clusters(); c++) {
            for (var e : firstOwner.entrySet()) {
                if (e.getValue() == c) {
                    rows.add(e.getKey());
                    owner.add(c);
                }
            }
        }
        int k = t.clusters();
        cellW = Math.max(18, Math.min(78, 640.0 / k));
        cellH = Math.max(16, Math.min(30, 560.0 / rows.size()));
        width = (int) Math.ceil(LEFT_LABELS + 20 + k * cellW + LEGEND);
        height = (int) Math.ceil(TOP + rows.size() * cellH + 70);
    }

    List<String> write(Path dir, String base) throws IOException {
        return ChartFiles.write(dir, base, width, height, true, this::paint);
    }

    int width() {
        return width;
    }

    int height() {
        return height;
    }

    private boolean isTop(int c, int j) {
        for (int r = 1; r <= Math.min(perCluster, t.features().size()); r++) {
            if (t.featureAtRank(c, r) == j) {
                return true;
            }
        }
        return false;
    }

    void paint(Graphics2D g) {
        int k = t.clusters();
        double top = Look.title(g, "What sets each cluster apart: AUC of its top features", width, 12) + 10;
        double x0 = LEFT_LABELS + 20;
        double y0 = TOP;
        // column heads: the cluster's colour, its number and size
        g.setFont(Look.font(cellW >= 30 ? Look.TICK_SIZE : Look.SMALL_SIZE));
        for (int c = 1; c <= k; c++) {
            double cx = x0 + (c - 0.5) * cellW;
            g.setColor(ChartColors.cluster(c - 1));
            g.fill(new Rectangle2D.Double(x0 + (c - 1) * cellW + 1, y0 - 14, cellW - 2, 9));
            g.setColor(Look.INK);
            if (cellW >= 26 || c % 5 == 0 || c == 1) {
                Look.textCentredBelow(g, Integer.toString(c), cx, y0 - 36);
            }
        }
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, "Cluster", x0 + k * cellW / 2, top);
        // rows
        float labelSize = cellH >= 22 ? Look.TICK_SIZE : Look.SMALL_SIZE;
        for (int r = 0; r < rows.size(); r++) {
            int j = rows.get(r);
            double y = y0 + r * cellH;
            g.setColor(ChartColors.cluster(owner.get(r) - 1));
            g.fill(new Rectangle2D.Double(x0 - 12, y + 1, 7, cellH - 2));
            g.setFont(Look.font(labelSize));
            g.setColor(Look.INK);
            Look.textRight(g, Look.clipMiddle(t.features().get(j), 30), x0 - 18, y + cellH / 2);
            for (int c = 1; c <= k; c++) {
                double auc = t.auc(c, j);
                Color fill = ColorScale.DIVERGING.color(Double.isFinite(auc) ? auc : Double.NaN);
                Rectangle2D cell = new Rectangle2D.Double(x0 + (c - 1) * cellW, y, cellW, cellH);
                g.setColor(fill);
                g.fill(cell);
                if (isTop(c, j)) {
                    g.setColor(Look.INK);
                    g.setStroke(new BasicStroke(2f));
                    g.draw(new Rectangle2D.Double(cell.getX() + 2.5, cell.getY() + 2.5, cellW - 5, cellH - 5));
                }
                if (cellW >= 44 && cellH >= 20 && Double.isFinite(auc)) {
                    g.setFont(Look.font(Look.SMALL_SIZE));
                    g.setColor(ChartColors.textOn(fill));
                    String v = Ticks.number(auc, 2);
                    Look.textLeft(g, v, cell.getCenterX() - Look.width(g, v) / 2, cell.getCenterY());
                }
            }
        }
        g.setColor(Color.WHITE);
        g.setStroke(new BasicStroke(1f));
        for (int c = 0; c <= k; c++) {
            double x = x0 + c * cellW;
            g.draw(new java.awt.geom.Line2D.Double(x, y0, x, y0 + rows.size() * cellH));
        }
        // legend: the colour scale of the AUC
        double lx = x0 + k * cellW + 40;
        double ly = y0;
        double lh = Math.min(220, Math.max(120, rows.size() * cellH));
        for (int s = 0; s < 100; s++) {
            double a = 1 - s / 99.0;
            g.setColor(ColorScale.DIVERGING.color(a));
            g.fill(new Rectangle2D.Double(lx, ly + s * lh / 100, 18, lh / 100 + 1));
        }
        g.setColor(Look.AXIS);
        g.draw(new Rectangle2D.Double(lx, ly, 18, lh));
        g.setFont(Look.font(Look.SMALL_SIZE));
        g.setColor(Look.INK);
        Look.textLeft(g, "1  higher in", lx + 24, ly + 6);
        Look.textLeft(g, "    the cluster", lx + 24, ly + 20);
        Look.textLeft(g, "0.5  no difference", lx + 24, ly + lh / 2);
        Look.textLeft(g, "0  lower in", lx + 24, ly + lh - 20);
        Look.textLeft(g, "    the cluster", lx + 24, ly + lh - 6);
        g.setFont(Look.bold(Look.SMALL_SIZE));
        Look.textLeft(g, "AUC", lx, ly - 12);
        g.setFont(Look.font(Look.SMALL_SIZE));
        g.setColor(Look.MUTED);
        double ry = ly + lh + 24;
        g.setColor(Look.INK);
        g.setStroke(new BasicStroke(2f));
        g.draw(new Rectangle2D.Double(lx + 1, ry - 8, 16, 16));
        g.setColor(Look.MUTED);
        Look.textLeft(g, "a top feature", lx + 24, ry);
        Look.textLeft(g, "of this cluster", lx + 24, ry + 14);
        g.setFont(Look.font(Look.NOTE_SIZE));
        Look.textCentredBelow(g, "Descriptive: found in the data that formed the clusters.", width / 2.0,
                y0 + rows.size() * cellH + 16);
    }
}
