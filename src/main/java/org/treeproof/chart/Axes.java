package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;

/** A data rectangle with linear scales, and the plain axes (ticks, labels, titles) of the hand-drawn charts. */
final class Axes {
    final Rectangle2D plot;
    final double xMin;
    final double xMax;
    final double yMin;
    final double yMax;

    Axes(Rectangle2D plot, double xMin, double xMax, double yMin, double yMax) {
        this.plot = plot;
        this.xMin = xMin;
        this.xMax = xMax > xMin ? xMax : xMin + 1;
        this.yMin = yMin;
        this.yMax = yMax > yMin ? yMax : yMin + 1;
    }

    double x(double v) {
        return plot.getX() + (v - xMin) / (xMax - xMin) * plot.getWidth();
    }

    double y(double v) {
        return plot.getMaxY() - (v - yMin) / (yMax - yMin) * plot.getHeight();
    }

    /** Horizontal grid lines at the ticks. */
    void gridY(Graphics2D g, double[] ticks) {
        g.setColor(Look.GRID);
        g.setStroke(new BasicStroke(1f));
        for (double t : ticks) {
            g.draw(new Line2D.Double(plot.getX(), y(t), plot.getMaxX(), y(t)));
        }
    }

    /** Vertical grid lines at the ticks. */
    void gridX(Graphics2D g, double[] ticks) {
        g.setColor(Look.GRID);
        g.setStroke(new BasicStroke(1f));
        for (double t : ticks) {
            g.draw(new Line2D.Double(x(t), plot.getY(), x(t), plot.getMaxY()));
        }
    }

    /** The left axis: line, ticks with labels, and a title set upright along it. */
    void left(Graphics2D g, double[] ticks, String[] labels, String title) {
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(plot.getX(), plot.getY(), plot.getX(), plot.getMaxY()));
        g.setFont(Look.font(Look.TICK_SIZE));
        double widest = 0;
        for (int i = 0; i < ticks.length; i++) {
            double ty = y(ticks[i]);
            g.setColor(Look.AXIS);
            g.draw(new Line2D.Double(plot.getX() - 5, ty, plot.getX(), ty));
            g.setColor(Look.INK);
            Look.textRight(g, labels[i], plot.getX() - 8, ty);
            widest = Math.max(widest, Look.width(g, labels[i]));
        }
        if (title != null) {
            g.setFont(Look.font(Look.LABEL_SIZE));
            g.setColor(Look.INK);
            Look.textUp(g, title, plot.getX() - 16 - widest, plot.getCenterY());
        }
    }

    /** The bottom axis: line, ticks with labels, and a title centred below; returns the bottom of the title. */
    double bottom(Graphics2D g, double[] ticks, String[] labels, String title) {
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(plot.getX(), plot.getMaxY(), plot.getMaxX(), plot.getMaxY()));
        g.setFont(Look.font(Look.TICK_SIZE));
        double below = plot.getMaxY() + 8;
        for (int i = 0; i < ticks.length; i++) {
            double tx = x(ticks[i]);
            g.setColor(Look.AXIS);
            g.draw(new Line2D.Double(tx, plot.getMaxY(), tx, plot.getMaxY() + 5));
            g.setColor(Look.INK);
            Look.textCentredBelow(g, labels[i], tx, below);
        }
        double y = below + g.getFontMetrics().getHeight() + 6;
        if (title != null) {
            g.setFont(Look.font(Look.LABEL_SIZE));
            g.setColor(Look.INK);
            Look.textCentredBelow(g, title, plot.getCenterX(), y);
            y += g.getFontMetrics().getHeight();
        }
        return y;
    }

    /** Tick labels for {@code ticks} spaced by their step. */
    static String[] labels(double[] ticks) {
        double step = ticks.length > 1 ? ticks[1] - ticks[0] : Math.max(Math.abs(ticks[0]), 1);
        String[] s = new String[ticks.length];
        for (int i = 0; i < ticks.length; i++) {
            s[i] = Ticks.label(ticks[i], step);
        }
        return s;
    }
}
