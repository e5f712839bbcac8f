package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** Small helpers for the charts drawn with XChart. */
final class XCharts {
    private XCharts() {
    }

    /** An XY chart in our look, with the given titles. */
    static XYChart xy(int width, int height, String title, String xTitle, String yTitle) {
        XYChart chart = new XYChart(width, height);
        chart.setTitle(title);
        chart.setXAxisTitle(xTitle);
        chart.setYAxisTitle(yTitle);
        Look.style(chart.getStyler());
        chart.getStyler().setMarkerSize(7);
        chart.getStyler().setLegendSeriesLineLength(26);
        return chart;
    }

    /** A filled band between {@code low} and {@code high}, drawn as one closed outline; not in the key. */
    static XYSeries band(XYChart chart, String name, double[] x, double[] low, double[] high, Color fill) {
        int m = x.length;
        double[] px = new double[2 * m];
        double[] py = new double[2 * m];
        for (int i = 0; i < m; i++) {
            px[i] = x[i];
            py[i] = high[i];
            px[2 * m - 1 - i] = x[i];
            py[2 * m - 1 - i] = low[i];
        }
        XYSeries s = chart.addSeries(name, px, py);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
        s.setFillColor(fill);
        s.setLineColor(fill);
        s.setLineWidth(0.1f);
        s.setMarker(SeriesMarkers.NONE);
        s.setShowInLegend(false);
        return s;
    }

    /** A line with round markers in {@code colour}. */
    static XYSeries line(XYChart chart, String name, double[] x, double[] y, Color colour, float width) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(colour);
        s.setMarkerColor(colour);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setLineStyle(new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        return s;
    }

    /**
     * A label just right of a vertical rule at {@code x}. XChart centres annotation text on its point, so the
     * point is moved right by half the text's width, converted to data units with the plot's approximate width.
     */
    static AnnotationText besideRule(String text, double x, double xRange, double plotWidthPx, double y) {
        Graphics2D g = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        g.setFont(Look.font(Look.NOTE_SIZE));
        double half = Look.width(g, text) / 2 + 8;
        g.dispose();
        return new AnnotationText(text, x + half * xRange / plotWidthPx, y, false);
    }

    /** A decimal pattern with as many decimals as round ticks across {@code [lo, hi]} need. */
    static String decimalPattern(double lo, double hi) {
        double step = Ticks.step(lo, hi, 10);
        int decimals = (int) Math.max(0, Math.min(6, Math.ceil(-Math.log10(step) - 1e-9)));
        return decimals == 0 ? "#0" : "0." + "0".repeat(decimals);
    }

    static double[] asDoubles(int[] a) {
        double[] d = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            d[i] = a[i];
        }
        return d;
    }
}
