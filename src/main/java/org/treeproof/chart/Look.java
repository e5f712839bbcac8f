package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.font.GlyphVector;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.Styler;

/**
 * The shared look: fonts, greys, strokes and text placement, for the hand-drawn charts and the XChart ones
 * alike, so that all charts of a report read as one set.
 */
final class Look {
    /** Installed with fontconfig's fonts-dejavu-core; named outright so output does not depend on aliases. */
    static final String FAMILY = "DejaVu Sans";
    static final Color INK = new Color(0x222222);
    static final Color MUTED = new Color(0x5A5A5A);
    static final Color AXIS = new Color(0x6E6E6E);
    static final Color GRID = new Color(0xE6E6E6);
    static final Color RULE = new Color(0x333333);

    static final float TITLE_SIZE = 17f;
    static final float LABEL_SIZE = 13f;
    static final float TICK_SIZE = 12f;
    static final float NOTE_SIZE = 11.5f;
    static final float SMALL_SIZE = 10f;

    static final BasicStroke HAIRLINE = new BasicStroke(1f);
    static final BasicStroke DASHED = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {6f, 4f}, 0f);

    private Look() {
    }

    static Font font(float size) {
        return new Font(FAMILY, Font.PLAIN, 1).deriveFont(size);
    }

    static Font bold(float size) {
        return new Font(FAMILY, Font.BOLD, 1).deriveFont(size);
    }

    /** Anti-aliased shapes and text, exact stroke placement; the same hints for PNG and SVG. */
    static void hints(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    }

    /** Our look on an XChart axes chart: white, quiet grid, DejaVu fonts, no boxes. */
    static void style(AxesChartStyler s) {
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderVisible(false);
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(bold(TITLE_SIZE));
        s.setChartFontColor(INK);
        s.setChartPadding(14);
        s.setChartTitlePadding(12);
        s.setAxisTitleFont(font(LABEL_SIZE));
        s.setAxisTickLabelsFont(font(TICK_SIZE));
        s.setAxisTickLabelsColor(INK);
        s.setAxisTickMarksColor(AXIS);
        s.setAxisTitlePadding(8);
        s.setPlotGridLinesColor(GRID);
        s.setPlotGridLinesStroke(new BasicStroke(1f));
        s.setLegendFont(font(NOTE_SIZE));
        s.setLegendBorderColor(Color.WHITE);
        s.setLegendBackgroundColor(Color.WHITE);
        s.setLegendPadding(8);
        s.setAnnotationTextFont(font(NOTE_SIZE));
        s.setAnnotationTextFontColor(INK);
        s.setAnnotationLineColor(RULE);
        s.setAnnotationLineStroke(DASHED);
        s.setAntiAlias(true);
        s.setToolTipsEnabled(false);
        s.setLegendPosition(Styler.LegendPosition.OutsideE);
    }

    /** Draws a centred, bold title (shrunk to fit {@code width}) with its top at {@code top}; returns its bottom. */
    static double title(Graphics2D g, String text, double width, double top) {
        Font f = fit(g, bold(TITLE_SIZE), text, width - 28);
        g.setFont(f);
        g.setColor(INK);
        FontMetrics fm = g.getFontMetrics();
        double w = fm.getStringBounds(text, g).getWidth();
        Look.draw(g, text, (float) ((width - w) / 2), (float) (top + fm.getAscent()));
        return top + fm.getAscent() + fm.getDescent();
    }

    /** {@code f} shrunk in half-point steps (not below 8 pt) until {@code text} fits in {@code width}. */
    static Font fit(Graphics2D g, Font f, String text, double width) {
        Font cur = f;
        while (cur.getSize2D() > 8f && g.getFontMetrics(cur).getStringBounds(text, g).getWidth() > width) {
            cur = cur.deriveFont(cur.getSize2D() - 0.5f);
        }
        return cur;
    }

    /**
     * Draws {@code text} with its baseline starting at ({@code x}, {@code y}) by filling the glyph outlines, as
     * XChart does: the PNG and the SVG then show the same shapes, and the SVG needs no installed font.
     */
    static void draw(Graphics2D g, String text, double x, double y) {
        if (text.isEmpty()) {
            return;
        }
        GlyphVector gv = g.getFont().createGlyphVector(g.getFontRenderContext(), text);
        g.fill(gv.getOutline((float) x, (float) y));
    }

    /** The width of {@code text} in {@code f}, measured without a drawing surface (for layout in advance). */
    static double measure(Font f, String text) {
        return f.getStringBounds(text, new java.awt.font.FontRenderContext(null, true, true)).getWidth();
    }

    static double width(Graphics2D g, String text) {
        return g.getFontMetrics().getStringBounds(text, g).getWidth();
    }

    /** Text with its left end at {@code x} and its vertical middle at {@code yMid}. */
    static void textLeft(Graphics2D g, String text, double x, double yMid) {
        FontMetrics fm = g.getFontMetrics();
        Look.draw(g, text, (float) x, (float) (yMid + (fm.getAscent() - fm.getDescent()) / 2.0));
    }

    /** Text with its right end at {@code x} and its vertical middle at {@code yMid}. */
    static void textRight(Graphics2D g, String text, double x, double yMid) {
        textLeft(g, text, x - width(g, text), yMid);
    }

    /** Text centred on {@code x} with its top at {@code top}. */
    static void textCentredBelow(Graphics2D g, String text, double x, double top) {
        FontMetrics fm = g.getFontMetrics();
        Look.draw(g, text, (float) (x - width(g, text) / 2), (float) (top + fm.getAscent()));
    }

    /** Text turned a quarter turn anticlockwise, centred on {@code yMid}, its baseline at {@code xBaseline}. */
    static void textUp(Graphics2D g, String text, double xBaseline, double yMid) {
        AffineTransform saved = g.getTransform();
        g.translate(xBaseline, yMid);
        g.rotate(-Math.PI / 2);
        Look.draw(g, text, (float) (-width(g, text) / 2), 0f);
        g.setTransform(saved);
    }

    /**
     * Text turned a quarter turn clockwise (reading downwards), starting at {@code top} and centred across
     * {@code xMid}: the usual way to set many narrow column labels.
     */
    static void textDown(Graphics2D g, String text, double xMid, double top) {
        FontMetrics fm = g.getFontMetrics();
        AffineTransform saved = g.getTransform();
        g.translate(xMid - (fm.getAscent() - fm.getDescent()) / 2.0, top);
        g.rotate(Math.PI / 2);
        Look.draw(g, text, 0f, 0f);
        g.setTransform(saved);
    }

    /** A white plate behind a small label so that lines under it do not cut the digits. */
    static void plate(Graphics2D g, Rectangle2D r) {
        g.setColor(new Color(255, 255, 255, 225));
        g.fill(r);
    }

    /**
     * {@code s} cut to {@code max} characters with an ellipsis in the middle: sample names often share a long
     * prefix and differ at the end, so both ends are kept.
     */
    static String clipMiddle(String s, int max) {
        if (s.length() <= max) {
            return s;
        }
        int keep = Math.max(2, max - 1);
        int head = keep * 2 / 5;
        int tail = keep - head;
        return s.substring(0, head) + "\u2026" + s.substring(s.length() - tail);
    }

    /** {@code s} cut to {@code max} characters with an ellipsis, for labels that must fit a column. */
    static String clip(String s, int max) {
        return s.length() <= max ? s : s.substring(0, Math.max(1, max - 1)) + "\u2026";
    }
}
