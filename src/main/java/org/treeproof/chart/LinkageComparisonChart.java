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
import java.util.function.ToDoubleFunction;

/**
 * Linkage methods side by side, each at its own best k: three small panels of horizontal bars (cophenetic
 * correlation, stability as mean adjusted Rand index, average silhouette), each bar in the linkage's colour
 * from {@link ChartColors#linkage}, and a matrix of the adjusted Rand index between the linkages' chosen
 * clusterings with the value printed in each cell. Cophenetic correlation: R. R. Sokal and F. J. Rohlf,
 * Taxon 11 (1962) 33-40, doi:10.2307/1217208. {@value #WIDTH} pixels wide
 * and {@link #height()} high, PNG and SVG.
 */
public final class LinkageComparisonChart {
    public static final int WIDTH = 1320;
    private static final double ROW_HEIGHT = 56;
    private static final double TOP = 96;

    private final LinkageComparisonInput in;

    public LinkageComparisonChart(LinkageComparisonInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Pixel height: grows with the number of linkages, {@code 206 + 56 m}. */
    public int height() {
        return (int) (TOP + ROW_HEIGHT * in.rows().size() + 110);
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, WIDTH, height(), true, this::paint);
    }

    void paint(Graphics2D g) {
        List<LinkageComparisonInput.Row> rows = in.rows();
        int m = rows.size();
        Look.title(g, in.title(), WIDTH, 14);
        double top = TOP;
        double rowsLeft = 150;
        double panelWidth = 180;
        double panelGap = 36;
        double rowHeight = ROW_HEIGHT;
        double panelHeight = rowHeight * m;

        g.setFont(Look.font(Look.TICK_SIZE));
        g.setColor(Look.INK);
        for (int r = 0; r < m; r++) {
            LinkageComparisonInput.Row row = rows.get(r);
            double mid = top + (r + 0.5) * rowHeight;
            Look.textRight(g, row.linkage(), rowsLeft - 12, mid - 7);
            g.setColor(Look.MUTED);
            g.setFont(Look.font(Look.SMALL_SIZE));
            Look.textRight(g, row.k() > 1 ? "best k = " + row.k() : "k = 1: no split", rowsLeft - 12, mid + 8);
            g.setFont(Look.font(Look.TICK_SIZE));
            g.setColor(Look.INK);
        }
        String[] titles = {"Cophenetic correlation", "Stability (mean ARI)", "Average silhouette"};
        List<ToDoubleFunction<LinkageComparisonInput.Row>> measures = List.of(
                LinkageComparisonInput.Row::copheneticCorrelation, LinkageComparisonInput.Row::stability,
                LinkageComparisonInput.Row::silhouette);
        for (int p = 0; p < 3; p++) {
            double x = rowsLeft + p * (panelWidth + panelGap);
            panel(g, new Rectangle2D.Double(x, top, panelWidth, panelHeight), titles[p], rows, measures.get(p),
                    rowHeight);
        }
        g.setFont(Look.font(Look.NOTE_SIZE));
        g.setColor(Look.MUTED);
        Look.textLeft(g, "Higher is better in each panel. Each linkage is shown at its own best k.",
                rowsLeft, top + panelHeight + 52);

        double mx = rowsLeft + 3 * (panelWidth + panelGap) + 40;
        matrix(g, mx, top, WIDTH - mx - 30, rowHeight, rows);
    }

    private void panel(Graphics2D g, Rectangle2D box, String title, List<LinkageComparisonInput.Row> rows,
            ToDoubleFunction<LinkageComparisonInput.Row> measure, double rowHeight) {
        double min = 0;
        for (LinkageComparisonInput.Row r : rows) {
            double v = measure.applyAsDouble(r);
            if (!Double.isNaN(v)) {
                min = Math.min(min, v);
            }
        }
        double lo = Math.floor(min * 4) / 4;
        Axes axes = new Axes(box, lo, 1, 0, 1);
        g.setFont(Look.bold(Look.NOTE_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, title, box.getCenterX(), box.getY() - 26);
        double[] ticks = Ticks.between(lo, 1, 3);
        axes.gridX(g, ticks);
        for (int r = 0; r < rows.size(); r++) {
            double v = measure.applyAsDouble(rows.get(r));
            double y0 = box.getY() + r * rowHeight + rowHeight * 0.2;
            double h = rowHeight * 0.6;
            g.setFont(Look.font(Look.SMALL_SIZE));
            if (Double.isNaN(v)) {
                g.setColor(Look.MUTED);
                Look.textLeft(g, rows.get(r).k() == 1 ? "not defined for one cluster" : "not defined", axes.x(0) + 4,
                        y0 + h / 2);
                continue;
            }
            double a = Math.min(axes.x(0), axes.x(v));
            double b = Math.max(axes.x(0), axes.x(v));
            g.setColor(ChartColors.linkage(rows.get(r).linkage(), r));
            g.fill(new Rectangle2D.Double(a, y0, Math.max(1, b - a), h));
            String label = Ticks.number(v, 2);
            g.setColor(Look.INK);
            double lw = Look.width(g, label);
            if (axes.x(v) + 4 + lw <= box.getMaxX() + 2) {
                Look.textLeft(g, label, Math.max(axes.x(v), axes.x(0)) + 4, y0 + h / 2);
            } else {
                g.setColor(ChartColors.textOn(ChartColors.linkage(rows.get(r).linkage(), r)));
                Look.textRight(g, label, axes.x(v) - 4, y0 + h / 2);
            }
        }
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(axes.x(0), box.getY(), axes.x(0), box.getMaxY()));
        axes.bottom(g, ticks, Axes.labels(ticks), null);
    }

    private void matrix(Graphics2D g, double x, double top, double width, double rowHeight,
            List<LinkageComparisonInput.Row> rows) {
        int m = rows.size();
        double labelRoom = 86;
        double cell = Math.min(rowHeight, (width - labelRoom) / m);
        double x0 = x + labelRoom;
        // column names run upwards when they do not fit across a cell
        g.setFont(Look.font(Look.SMALL_SIZE));
        double widest = 0;
        for (LinkageComparisonInput.Row r : rows) {
            widest = Math.max(widest, Look.width(g, Look.clip(r.linkage(), 14)));
        }
        boolean upright = widest > cell - 4;
        double columnRoom = upright ? widest + 8 : 20;
        top += Math.max(0, columnRoom - 24);
        g.setFont(Look.bold(Look.NOTE_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, "Agreement of the chosen clusterings (ARI)", x0 + cell * m / 2,
                top - columnRoom - 22);
        ColorScale scale = ColorScale.SEQUENTIAL;
        for (int a = 0; a < m; a++) {
            g.setFont(Look.font(Look.TICK_SIZE));
            g.setColor(Look.INK);
            Look.textRight(g, rows.get(a).linkage(), x0 - 8, top + (a + 0.5) * cell);
            g.setFont(Look.font(Look.SMALL_SIZE));
            String name = Look.clip(rows.get(a).linkage(), 14);
            if (upright) {
                double ascent = g.getFontMetrics().getAscent();
                Look.textUp(g, name, x0 + (a + 0.5) * cell + ascent / 2 - 1, top - 6 - Look.width(g, name) / 2);
            } else {
                Look.textCentredBelow(g, name, x0 + (a + 0.5) * cell, top - 18);
            }
            for (int b = 0; b < m; b++) {
                double v = in.agreementAt(a, b);
                Color fill = Double.isNaN(v) ? scale.missing() : scale.color(v);
                Rectangle2D r = new Rectangle2D.Double(x0 + b * cell, top + a * cell, cell, cell);
                g.setColor(fill);
                g.fill(r);
                g.setColor(Color.WHITE);
                g.setStroke(new BasicStroke(1.5f));
                g.draw(r);
                g.setFont(Look.font(cell >= 44 ? Look.TICK_SIZE : Look.SMALL_SIZE));
                g.setColor(ChartColors.textOn(fill));
                String text = Double.isNaN(v) ? "\u2013" : Ticks.number(v, 2);
                Look.textLeft(g, text, r.getCenterX() - Look.width(g, text) / 2, r.getCenterY());
            }
        }
        double barTop = top + m * cell + 22;
        double barWidth = cell * m;
        int steps = (int) Math.max(2, Math.round(barWidth));
        for (int i = 0; i < steps; i++) {
            g.setColor(scale.color((i + 0.5) / steps));
            g.fill(new Rectangle2D.Double(x0 + i * barWidth / steps, barTop, barWidth / steps + 0.6, 10));
        }
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(x0, barTop, barWidth, 10));
        g.setFont(Look.font(Look.SMALL_SIZE));
        g.setColor(Look.INK);
        Look.textCentredBelow(g, "≤ 0", x0, barTop + 13);
        Look.textCentredBelow(g, "0.5", x0 + barWidth / 2, barTop + 13);
        Look.textCentredBelow(g, "1", x0 + barWidth, barTop + 13);
        g.setColor(Look.MUTED);
        Look.textCentredBelow(g, "1 = the same clusters, 0 = no more alike than chance", x0 + barWidth / 2,
                barTop + 28);
        if (hasUndefinedAgreement()) {
            Look.textCentredBelow(g, "\u2013 = not defined: one of the two is a single cluster", x0 + barWidth / 2,
                    barTop + 43);
        }
    }

    private boolean hasUndefinedAgreement() {
        int m = in.rows().size();
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                if (Double.isNaN(in.agreementAt(a, b))) {
                    return true;
                }
            }
        }
        return false;
    }
}
