package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class ColorScaleTest {

    @Test
    void sequentialHitsTolYlOrBrStopsAtZeroHalfAndOne() {
        // stops of "YlOrBr" in P. Tol, "Colour Schemes", SRON/EPS/TN/09-002 issue 3.2 (2021), nine colours
        assertEquals(new Color(0xFFFFE5), ColorScale.SEQUENTIAL.color(0.0));
        assertEquals(new Color(0xFB9A29), ColorScale.SEQUENTIAL.color(0.5));
        assertEquals(new Color(0x662506), ColorScale.SEQUENTIAL.color(1.0));
    }

    @Test
    void divergingHitsTolBuRdStopsAtZeroHalfAndOne() {
        // stops of "BuRd" in the same note: blue end, near-white centre, red end
        assertEquals(new Color(0x2166AC), ColorScale.DIVERGING.color(0.0));
        assertEquals(new Color(0xF7F7F7), ColorScale.DIVERGING.color(0.5));
        assertEquals(new Color(0xB2182B), ColorScale.DIVERGING.color(1.0));
    }

    @Test
    void everyStopIsReachedAtItsEvenlySpacedPosition() {
        for (ColorScale s : new ColorScale[] {ColorScale.SEQUENTIAL, ColorScale.DIVERGING}) {
            int last = s.stopCount() - 1;
            for (int i = 0; i <= last; i++) {
                assertEquals(s.stop(i), s.color((double) i / last), "stop " + i);
            }
        }
    }

    @Test
    void halfwayBetweenTwoStopsIsTheirChannelMean() {
        // linear interpolation in sRGB: at 1/16 the scale is halfway between stops 0 (FFFFE5) and 1 (FFF7BC)
        Color c = ColorScale.SEQUENTIAL.color(1.0 / 16);
        assertEquals(0xFF, c.getRed());
        assertEquals(Math.round((0xFF + 0xF7) / 2.0), c.getGreen());
        assertEquals(Math.round((0xE5 + 0xBC) / 2.0), c.getBlue());
    }

    @Test
    void outOfRangeIsClampedAndNaNIsTheMissingColour() {
        assertEquals(ColorScale.SEQUENTIAL.color(0), ColorScale.SEQUENTIAL.color(-4));
        assertEquals(ColorScale.SEQUENTIAL.color(1), ColorScale.SEQUENTIAL.color(7));
        assertEquals(ColorScale.SEQUENTIAL.missing(), ColorScale.SEQUENTIAL.color(Double.NaN));
        assertEquals(ColorScale.DIVERGING.missing(), ColorScale.DIVERGING.color(Double.NaN));
        for (int i = 0; i <= 100; i++) {
            assertNotEquals(ColorScale.DIVERGING.missing(), ColorScale.DIVERGING.color(i / 100.0));
        }
    }

    @Test
    void sequentialLightnessFallsSteadily() {
        // relative luminance as defined in WCAG 2.1 (W3C, 2018), section "relative luminance"
        double previous = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= 200; i++) {
            double l = luminance(ColorScale.SEQUENTIAL.color(i / 200.0));
            assertTrue(l <= previous + 1e-12, "luminance rises at " + i / 200.0);
            previous = l;
        }
    }

    @Test
    void clusterColoursAreNineDistinctThenRepeat() {
        Set<Color> seen = new HashSet<>();
        for (int c = 0; c < ChartColors.clusterColorCount(); c++) {
            seen.add(ChartColors.cluster(c));
        }
        assertEquals(9, seen.size());
        // Tol "muted": rose first, indigo second
        assertEquals(new Color(0xCC6677), ChartColors.cluster(0));
        assertEquals(new Color(0x332288), ChartColors.cluster(1));
        assertEquals(ChartColors.cluster(0), ChartColors.cluster(9));
        assertEquals(ChartColors.OUTLIER, ChartColors.cluster(-1));
        assertThrows(IllegalArgumentException.class, () -> ChartColors.cluster(-2));
    }

    @Test
    void linkageColoursAreFixedByNameWithAliases() {
        // Okabe-Ito blue and vermillion for the first two names
        assertEquals(new Color(0x0072B2), ChartColors.linkage("average", 5));
        assertEquals(new Color(0x0072B2), ChartColors.linkage("UPGMA", 5));
        assertEquals(new Color(0xD55E00), ChartColors.linkage("Complete", 0));
        assertEquals(ChartColors.linkage("weighted", 0), ChartColors.linkage("wpgma", 3));
        assertEquals(ChartColors.series(3), ChartColors.linkage("my own method", 3));
        Set<Color> seen = new HashSet<>();
        for (String n : new String[] {"average", "complete", "ward", "single", "weighted", "centroid", "median"}) {
            seen.add(ChartColors.linkage(n, 0));
        }
        assertEquals(7, seen.size());
    }

    @Test
    void textOnPicksTheColourWithMoreContrast() {
        // WCAG 2.1 contrast ratio (L1 + 0.05) / (L2 + 0.05): white wins on dark brown, black on pale yellow
        assertEquals(Color.WHITE, ChartColors.textOn(ColorScale.SEQUENTIAL.color(1)));
        assertEquals(new Color(0x111111), ChartColors.textOn(ColorScale.SEQUENTIAL.color(0)));
        for (int i = 0; i <= 50; i++) {
            Color bg = ColorScale.SEQUENTIAL.color(i / 50.0);
            Color t = ChartColors.textOn(bg);
            Color other = t.equals(Color.WHITE) ? Color.BLACK : Color.WHITE;
            assertTrue(contrast(bg, t) >= contrast(bg, other) - 0.2, "poor text contrast at " + i / 50.0);
        }
    }

    private static double contrast(Color a, Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    private static double luminance(Color c) {
        return 0.2126 * lin(c.getRed()) + 0.7152 * lin(c.getGreen()) + 0.0722 * lin(c.getBlue());
    }

    private static double lin(int v) {
        double c = v / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }
}
