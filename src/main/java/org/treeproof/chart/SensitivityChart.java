package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.treeproof.explain.SensitivityResult;

/**
 * The alternative analyses, one row each: on the left a bar of the adjusted Rand index with the recommended
 * solution (0 to 1), on the right one dot per recommended cluster at the Jaccard similarity of its best match, in
 * the cluster's colour, with the line at which a cluster counts as found again.
 */
final class SensitivityChart {
    private static final int WIDTH = 980;
    private static final double LABELS = 200;

    private final SensitivityResult s;
    private final List<SensitivityResult.Row> rows;
    private final double rowH;
    private final int height;

    SensitivityChart(SensitivityResult s) {
        this.s = s;
        this.rows = s.ran();
        this.rowH = rows.size() > 20 ? 22 : 30;
        this.height = (int) Math.ceil(80 + rows.size() * rowH + 70);
    }

    List<String> write(Path dir, String base) throws IOException {
        return ChartFiles.write(dir, base, WIDTH, height, true, this::paint);
    }

    int width() {
        return WIDTH;
    }

    int height() {
        return height;
    }

    void paint(Graphics2D g) {
        double top = Look.title(g, "Does another analysis find the same clusters?", WIDTH, 12) + 34;
        double barX = LABELS + 16;
        double barW = 300;
        double dotX = barX + barW + 70;
        double dotW = WIDTH - dotX - 40;
        double bottom = top + rows.size() * rowH;
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, "Adjusted Rand index with the chosen clusters", barX + barW / 2, top - 30);
        Look.textCentredBelow(g, "Jaccard of each cluster's best match", dotX + dotW / 2, top - 30);
        for (double t : new double[] {0, 0.25, 0.5, 0.75, 1}) {
            g.setColor(Look.GRID);
            g.draw(new Line2D.Double(barX + t * barW, top, barX + t * barW, bottom));
            g.draw(new Line2D.Double(dotX + t * dotW, top, dotX + t * dotW, bottom));
            g.setFont(Look.font(Look.SMALL_SIZE));
            g.setColor(Look.MUTED);
            Look.textCentredBelow(g, Ticks.number(t, 2), barX + t * barW, bottom + 6);
            Look.textCentredBelow(g, Ticks.number(t, 2), dotX + t * dotW, bottom + 6);
        }
        g.setColor(Look.RULE);
        g.setStroke(Look.DASHED);
        double sx = dotX + s.survives() * dotW;
        g.draw(new Line2D.Double(sx, top - 4, sx, bottom));
        g.setFont(Look.font(Look.SMALL_SIZE));
        Look.textCentredBelow(g, "found again at " + Ticks.number(s.survives(), 2) + " or more", sx, bottom + 24);
        g.setStroke(new BasicStroke(1f));
        double r = Math.min(5, Math.max(3, 60.0 / Math.max(1, s.k())));
        for (int i = 0; i < rows.size(); i++) {
            SensitivityResult.Row row = rows.get(i);
            double y = top + i * rowH;
            double mid = y + rowH / 2;
            g.setFont(Look.font(rowH >= 30 ? Look.TICK_SIZE : Look.SMALL_SIZE));
            g.setColor(Look.INK);
            Look.textRight(g, Look.clipMiddle(row.name(), 28), LABELS, mid);
            double ari = Math.max(0, row.ari());
            g.setColor(ChartColors.series(0));
            g.fill(new Rectangle2D.Double(barX, y + 5, ari * barW, rowH - 10));
            g.setColor(Look.INK);
            g.setFont(Look.font(Look.SMALL_SIZE));
            Look.textLeft(g, Ticks.number(row.ari(), 2), barX + ari * barW + 5, mid);
            double[] jac = row.jaccard();
            for (int c = 0; c < jac.length; c++) {
                // clusters spread a little within the row so that equal values stay visible
                double dy = jac.length == 1 ? 0 : (c / (jac.length - 1.0) - 0.5) * (rowH - 12);
                g.setColor(ChartColors.cluster(c));
                g.fill(new Ellipse2D.Double(dotX + jac[c] * dotW - r, mid + dy - r, 2 * r, 2 * r));
            }
            g.setColor(Look.GRID);
            g.draw(new Line2D.Double(LABELS - 100, y + rowH, WIDTH - 40, y + rowH));
        }
        g.setColor(Look.MUTED);
        g.setFont(Look.font(Look.NOTE_SIZE));
        Look.textCentredBelow(g, String.format(java.util.Locale.ROOT, "%s linkage at k = %d; one dot per cluster, in "
                + "the cluster's colour", s.linkage(), s.k()), WIDTH / 2.0, bottom + 44);
    }
}
