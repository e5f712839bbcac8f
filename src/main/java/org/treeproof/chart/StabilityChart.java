package org.treeproof.chart;

import java.awt.BasicStroke;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Stability against the number of clusters: per linkage the mean adjusted Rand index between replicate and
 * full-data clusterings as a line, its 95% interval over replicates as a shaded band, the no-structure
 * reference as a grey band with a dashed line, and the chosen k as a vertical rule named in the key. The
 * adjusted Rand index is that of L. Hubert and P. Arabie, "Comparing partitions", J. Classification 2 (1985)
 * 193-218, doi:10.1007/BF01908075. Drawn with XChart; {@value #WIDTH} by {@value #HEIGHT} pixels, PNG and SVG.
 */
public final class StabilityChart {
    public static final int WIDTH = 1000;
    public static final int HEIGHT = 620;

    private final StabilityInput in;

    public StabilityChart(StabilityInput input) {
        this.in = Objects.requireNonNull(input, "input");
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        XYChart chart = chart();
        return ChartFiles.write(dir, baseName, WIDTH, HEIGHT, true, g -> chart.paint(g, WIDTH, HEIGHT));
    }

    XYChart chart() {
        XYChart chart = XCharts.xy(WIDTH, HEIGHT, in.title(), "Number of clusters k",
                "Adjusted Rand index (line: mean, band: middle 95% of replicates)");
        double[] x = XCharts.asDoubles(in.k());
        double yMin = 0;
        IntervalSeries ref = in.reference();
        // a series may lack some k (no cut into that many clusters of the smallest size): each run of consecutive
        // k with values is drawn on its own, so no line bridges a k that has no value
        if (ref != null) {
            for (int[] r : ref.runs()) {
                XCharts.band(chart, "reference band " + r[0], part(x, r), part(ref.low(), r), part(ref.high(), r),
                        ChartColors.withAlpha(ChartColors.REFERENCE, 0.28));
            }
            yMin = Math.min(yMin, lowest(ref.low()));
        }
        List<IntervalSeries> series = in.linkages();
        for (int i = 0; i < series.size(); i++) {
            IntervalSeries s = series.get(i);
            for (int[] r : s.runs()) {
                XCharts.band(chart, s.name() + " band " + r[0], part(x, r), part(s.low(), r), part(s.high(), r),
                        ChartColors.withAlpha(ChartColors.linkage(s.name(), i), 0.15));
            }
            yMin = Math.min(yMin, lowest(s.low()));
        }
        if (ref != null) {
            boolean first = true;
            for (int[] r : ref.runs()) {
                XYSeries line = XCharts.line(chart, first ? "no-structure reference" : "no-structure reference " + r[0],
                        part(x, r), part(ref.mean(), r), ChartColors.REFERENCE, 2f);
                line.setLineStyle(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                        new float[] {7f, 5f}, 0f));
                line.setShowInLegend(first);
                first = false;
            }
        }
        for (int i = 0; i < series.size(); i++) {
            IntervalSeries s = series.get(i);
            boolean chosen = s.name().equals(in.chosenLinkage());
            String name = chosen ? s.name() + " (chosen)" : s.name();
            boolean first = true;
            for (int[] r : s.runs()) {
                XYSeries line = XCharts.line(chart, first ? name : name + " " + r[0], part(x, r), part(s.mean(), r),
                        ChartColors.linkage(s.name(), i), chosen ? 3.2f : 2f);
                line.setShowInLegend(first);
                first = false;
            }
        }
        var st = chart.getStyler();
        st.setYAxisMin(Math.floor(yMin * 10) / 10);
        st.setYAxisMax(1.0);
        st.setYAxisDecimalPattern("0.0");
        int[] k = in.k();
        double pad = k.length > 1 ? 0.3 : 0.5;
        st.setXAxisMin(k[0] - pad);
        st.setXAxisMax(k[k.length - 1] + pad);
        st.setXAxisDecimalPattern("#0");
        if (in.chosenK() > 0) {
            // a series rather than a label beside the rule: a label near the top sits on the curves, which
            // crowd towards 1 exactly where the chosen k is; the key has room. It runs past both ends of the
            // axis, as the plot clips it, so that it spans the plot's padding too
            double c = in.chosenK();
            XYSeries rule = chart.addSeries("chosen k = " + in.chosenK(), new double[] {c, c},
                    new double[] {st.getYAxisMin() - 1, 2.0});
            rule.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            rule.setMarker(SeriesMarkers.NONE);
            rule.setLineColor(Look.RULE);
            rule.setLineStyle(Look.DASHED);
        }
        return chart;
    }

    /** The values of {@code a} in the run {from, to}. */
    private static double[] part(double[] a, int[] run) {
        return java.util.Arrays.copyOfRange(a, run[0], run[1] + 1);
    }

    /** The smallest value that is a number; +infinity when none is. */
    private static double lowest(double[] a) {
        double m = Double.POSITIVE_INFINITY;
        for (double v : a) {
            if (!Double.isNaN(v)) {
                m = Math.min(m, v);
            }
        }
        return m;
    }
}
