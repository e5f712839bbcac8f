package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/** Keys (legends) for the hand-drawn charts: swatch lists and colour bars, set outside the data. */
final class Key {
    private static final double SWATCH = 14;
    private static final double GAP = 8;

    /** What an entry shows beside its words. */
    enum Kind { FILL, LINE, SAMPLE_TEXT, NONE }

    /** One entry: a swatch (or a sample of text) and the words that explain it. */
    record Entry(Kind kind, Color color, Stroke stroke, String sample, String text) {
        static Entry fill(Color c, String text) {
            return new Entry(Kind.FILL, c, null, null, text);
        }

        static Entry line(Color c, Stroke s, String text) {
            return new Entry(Kind.LINE, c, s, null, text);
        }

        static Entry sample(String sample, String text) {
            return new Entry(Kind.SAMPLE_TEXT, Look.INK, null, sample, text);
        }

        static Entry note(String text) {
            return new Entry(Kind.NONE, Look.MUTED, null, null, text);
        }
    }

    private Key() {
    }

    /** Draws a heading and entries in a column {@code width} wide from {@code top}; returns the bottom. */
    static double list(Graphics2D g, double x, double top, double width, String heading, List<Entry> entries) {
        double y = top;
        if (heading != null) {
            g.setFont(Look.bold(Look.NOTE_SIZE));
            g.setColor(Look.INK);
            for (String line : wrap(g, heading, width)) {
                FontMetrics fm = g.getFontMetrics();
                Look.draw(g, line, (float) x, (float) (y + fm.getAscent()));
                y += fm.getHeight();
            }
            y += 4;
        }
        g.setFont(Look.font(Look.NOTE_SIZE));
        FontMetrics fm = g.getFontMetrics();
        double textX = x + SWATCH + GAP;
        for (Entry e : entries) {
            double textWidth = e.kind() == Kind.NONE ? width : width - SWATCH - GAP;
            List<String> lines = wrap(g, e.text(), textWidth);
            double rowTop = y;
            double mid = rowTop + fm.getHeight() / 2.0;
            switch (e.kind()) {
                case FILL -> {
                    g.setColor(e.color());
                    g.fill(new Rectangle2D.Double(x, mid - SWATCH / 2, SWATCH, SWATCH));
                }
                case LINE -> {
                    g.setColor(e.color());
                    g.setStroke(e.stroke());
                    g.draw(new Line2D.Double(x, mid, x + SWATCH + 2, mid));
                    g.setStroke(new BasicStroke(1f));
                }
                case SAMPLE_TEXT -> {
                    g.setFont(Look.font(Look.SMALL_SIZE));
                    g.setColor(e.color());
                    Look.textLeft(g, e.sample(), x, mid);
                    g.setFont(Look.font(Look.NOTE_SIZE));
                }
                case NONE -> {
                }
            }
            g.setColor(e.kind() == Kind.NONE ? Look.MUTED : Look.INK);
            double tx = e.kind() == Kind.NONE ? x : textX;
            if (e.kind() == Kind.SAMPLE_TEXT) {
                tx = Math.max(textX, x + sampleWidth(g, e.sample()) + 6);
            }
            for (String line : lines) {
                Look.draw(g, line, (float) tx, (float) (y + fm.getAscent()));
                y += fm.getHeight();
            }
            y += 3;
        }
        return y;
    }

    private static double sampleWidth(Graphics2D g, String sample) {
        var saved = g.getFont();
        g.setFont(Look.font(Look.SMALL_SIZE));
        double w = Look.width(g, sample);
        g.setFont(saved);
        return w;
    }

    /**
     * A vertical colour bar from {@code lo} (bottom) to {@code hi} (top) with labelled ticks on its right and
     * a heading above it; returns the bottom of what it drew.
     */
    static double colourBar(Graphics2D g, ColorScale scale, double x, double top, double barHeight,
            String heading, double headingWidth, double lo, double hi, double[] ticks, String[] labels) {
        double y = top;
        g.setFont(Look.bold(Look.NOTE_SIZE));
        g.setColor(Look.INK);
        FontMetrics hm = g.getFontMetrics();
        for (String line : wrap(g, heading, headingWidth)) {
            Look.draw(g, line, (float) x, (float) (y + hm.getAscent()));
            y += hm.getHeight();
        }
        y += 14;
        double barWidth = 16;
        int steps = (int) Math.max(2, Math.round(barHeight));
        double stepHeight = barHeight / steps;
        for (int i = 0; i < steps; i++) {
            double t = 1 - (i + 0.5) / steps;
            g.setColor(scale.color(t));
            g.fill(new Rectangle2D.Double(x, y + i * stepHeight, barWidth, stepHeight + 0.6));
        }
        g.setColor(Look.AXIS);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(x, y, barWidth, barHeight));
        g.setFont(Look.font(Look.TICK_SIZE));
        for (int i = 0; i < ticks.length; i++) {
            double ty = y + (hi - ticks[i]) / (hi - lo) * barHeight;
            g.setColor(Look.AXIS);
            g.draw(new Line2D.Double(x + barWidth, ty, x + barWidth + 4, ty));
            g.setColor(Look.INK);
            Look.textLeft(g, labels[i], x + barWidth + 7, ty);
        }
        return y + barHeight;
    }

    /** Greedy word wrap of {@code text} into lines no wider than {@code width} in the current font. */
    static List<String> wrap(Graphics2D g, String text, double width) {
        List<String> lines = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        for (String word : text.split(" ")) {
            String trial = cur.length() == 0 ? word : cur + " " + word;
            if (cur.length() > 0 && Look.width(g, trial) > width) {
                lines.add(cur.toString());
                cur = new StringBuilder(word);
            } else {
                cur = new StringBuilder(trial);
            }
        }
        if (cur.length() > 0) {
            lines.add(cur.toString());
        }
        return lines;
    }
}
