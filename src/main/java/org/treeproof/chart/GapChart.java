package org.treeproof.chart;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The gap statistic of R. Tibshirani, G. Walther and T. Hastie, "Estimating the number of clusters in a
 * data set via the gap statistic", J. R. Statist. Soc. B 63 (2001) 411-423, doi:10.1111/1467-9868.00293:
 * Gap(k) for k = 1..K with error bars of one standard error s_k, and the chosen k marked by a vertical rule
 * and a larger marker. Drawn with XChart; {@value #WIDTH} by {@value #HEIGHT} pixels, PNG and SVG.
 */
public final class GapChart {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 580;
    private static final double PLOT_WIDTH_GUESS = WIDTH - 300;

    private final GapInput in;

    public GapChart(GapInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        XYChart chart = chart();
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, true, g -> chart.paint(g, WIDTH, HEIGHT));
    }

    XYChart chart() {
        XYChart chart = XCharts.xy(WIDTH, HEIGHT, in.title(), "Number of clusters k",
                "Gap(k): log within-cluster dispersion, reference minus data");
        int kMax = in.maxK();
        double[] x = new double[kMax];
        for (int i = 0; i < kMax; i++) {
            x[i] = i + 1;
        }
        double[] gap = in.gap();
        double[] se = in.standardError();
        Color colour = in.linkage() == null ? ChartColors.series(0) : ChartColors.linkage(in.linkage(), 0);
        // the title names the linkage; a longer key entry would narrow the plot
        XYSeries s = chart.addSeries("Gap(k) \u00b1 one standard error", x, gap, se);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(colour);
        s.setMarkerColor(colour);
        s.setMarker(SeriesMarkers.CIRCLE);
        var st = chart.getStyler();
        st.setErrorBarsColorSeriesColor(true);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < kMax; i++) {
            lo = Math.min(lo, gap[i] - se[i]);
            hi = Math.max(hi, gap[i] + se[i]);
        }
        double pad = Math.max(1e-9, (hi - lo) * 0.08);
        st.setYAxisMin(lo - pad);
        st.setYAxisMax(hi + pad);
        st.setYAxisDecimalPattern(XCharts.decimalPattern(lo - pad, hi + pad));
        st.setXAxisMin(0.5);
        st.setXAxisMax(kMax + 0.5);
        st.setXAxisDecimalPattern("#0");
        if (in.chosenK() > 0) {
            int c = in.chosenK();
            XYSeries mark = chart.addSeries("gap rule's k = " + c, new double[] {c}, new double[] {gap[c - 1]});
            mark.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            mark.setMarker(SeriesMarkers.DIAMOND);
            // ink, not a series colour: another colour would read as another linkage
            mark.setMarkerColor(Look.INK);
            chart.addAnnotation(new AnnotationLine(c, true, false));
            chart.addAnnotation(XCharts.besideRule("gap rule's k = " + c, c, kMax, PLOT_WIDTH_GUESS,
                    hi + pad * 0.4));
        }
        st.setMarkerSize(9);
        return chart;
    }
}
