package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Two panels for one linkage, after S. Monti, P. Tamayo, J. Mesirov and T. Golub, Machine Learning 52 (2003) 91-118,
 * doi:10.1023/A:1023949509487: on the left the empirical CDF of the consensus values at each k as step curves, from
 * light (small k) to dark (large k); on the right the relative change in the area under the CDF from k − 1 to k as
 * stems, the chosen k drawn in ink. Drawn with XChart; {@value #WIDTH} by {@value #HEIGHT} pixels, PNG and SVG.
 */
public final class ConsensusCdfChart {
    public static final int WIDTH = 1200;
    public static final int HEIGHT = 560;
    private static final int LEFT_WIDTH = 700;

    private final ConsensusCdfInput in;

    public ConsensusCdfChart(ConsensusCdfInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        XYChart left = curves();
        XYChart right = changes();
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, true, g -> paint(g, left, right));
    }

    private static void paint(Graphics2D g, XYChart left, XYChart right) {
        left.paint(g, LEFT_WIDTH, HEIGHT);
        g.translate(LEFT_WIDTH, 0);
        right.paint(g, WIDTH - LEFT_WIDTH, HEIGHT);
        g.translate(-LEFT_WIDTH, 0);
    }

    /** The colour of curve i of m: the sequential scale from a visible light tone to its darkest. */
    static Color shade(int i, int m) {
        double t = m == 1 ? 1 : 0.25 + 0.75 * i / (m - 1.0);
        return ColorScale.SEQUENTIAL.color(t);
    }

    XYChart curves() {
        XYChart chart = XCharts.xy(LEFT_WIDTH, HEIGHT, in.title(), "Consensus value x",
                "Share of sample pairs with consensus at most x");
        int[] ks = in.ks();
        for (int i = 0; i < ks.length; i++) {
            double[][] pts = in.curveAt(i);
            int m = pts.length;
            double[] x = new double[2 * m + 1];
            double[] y = new double[2 * m + 1];
            x[0] = 0;
            y[0] = 0;
            for (int j = 0; j < m; j++) {
                x[2 * j + 1] = pts[j][0];
                y[2 * j + 1] = j == 0 ? 0 : pts[j - 1][1];
                x[2 * j + 2] = pts[j][0];
                y[2 * j + 2] = pts[j][1];
            }
            boolean chosen = ks[i] == in.chosenK();
            XYSeries s = chart.addSeries("k = " + ks[i] + (chosen ? " (chosen)" : ""), x, y);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            Color c = chosen ? Look.INK : shade(i, ks.length);
            s.setLineColor(c);
            s.setLineStyle(new BasicStroke(chosen ? 2.6f : 1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
        }
        var st = chart.getStyler();
        st.setXAxisMin(0.0);
        st.setXAxisMax(1.0);
        st.setYAxisMin(0.0);
        st.setYAxisMax(1.0);
        st.setXAxisDecimalPattern("0.0");
        st.setYAxisDecimalPattern("0.0");
        return chart;
    }

    XYChart changes() {
        XYChart chart = XCharts.xy(WIDTH - LEFT_WIDTH, HEIGHT, "Change in area under the CDF", "Number of clusters k",
                "Relative change from k \u2212 1 (at k = 2: the area)");
        int[] ks = in.ks();
        double[] d = in.deltaArea();
        double lo = 0;
        double hi = 0;
        for (int i = 0; i < ks.length; i++) {
            if (!Double.isFinite(d[i])) {
                continue;
            }
            lo = Math.min(lo, d[i]);
            hi = Math.max(hi, d[i]);
            boolean chosen = ks[i] == in.chosenK();
            Color c = chosen ? Look.INK : shade(i, ks.length);
            XYSeries stem = chart.addSeries("stem " + ks[i], new double[] {ks[i], ks[i]}, new double[] {0, d[i]});
            stem.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            stem.setLineColor(c);
            stem.setLineStyle(new BasicStroke(chosen ? 5f : 4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
            stem.setMarker(SeriesMarkers.NONE);
            stem.setShowInLegend(false);
            XYSeries head = chart.addSeries("head " + ks[i], new double[] {ks[i]}, new double[] {d[i]});
            head.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            head.setMarker(SeriesMarkers.SQUARE);
            head.setMarkerColor(c);
            head.setShowInLegend(false);
        }
        if (hi == lo) {
            hi = lo + 1;
        }
        double pad = (hi - lo) * 0.08;
        var st = chart.getStyler();
        st.setLegendVisible(false);
        st.setYAxisMin(lo - (lo < 0 ? pad : 0));
        st.setYAxisMax(hi + pad);
        st.setYAxisDecimalPattern(XCharts.decimalPattern(lo, hi + pad));
        st.setXAxisMin(ks[0] - 0.6);
        st.setXAxisMax(ks[ks.length - 1] + 0.6);
        st.setXAxisDecimalPattern("#0");
        st.setMarkerSize(9);
        chart.addAnnotation(new AnnotationLine(0, false, false));
        return chart;
    }
}
