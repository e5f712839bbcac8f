package org.treeproof.chart;

import java.awt.Color;

/**
 * The colours every chart uses, chosen to stay distinguishable with the common colour-vision deficiencies.
 *
 * <ul>
 *   <li>Clusters: Paul Tol's "muted" qualitative set of nine (rose, indigo, sand, green, cyan, wine, teal,
 *       olive, purple), from P. Tol, "Colour Schemes", SRON technical note SRON/EPS/TN/09-002, issue 3.2
 *       (2021), https://personal.sron.nl/~pault/data/colourschemes.pdf. Beyond nine clusters the colours
 *       repeat; the cluster number is always printed as well.</li>
 *   <li>Linkage methods (one line per method): the Okabe-Ito set without its yellow, which is too pale
 *       for thin lines on white: M. Okabe and K. Ito, "Color Universal Design (CUD): how to make figures
 *       and presentations that are friendly to colorblind people" (2002, revised 2008),
 *       https://jfly.uni-koeln.de/color/.</li>
 *   <li>Parts of a tree above the cut and reference bands: neutral greys that no cluster uses.</li>
 * </ul>
 * Two families for two roles, so a linkage line is never mistaken for a cluster.
 */
public final class ChartColors {
    /** Tol muted, in the order of the technical note. */
    private static final int[] CLUSTER = {
        0xCC6677, 0x332288, 0xDDCC77, 0x117733, 0x88CCEE, 0x882255, 0x44AA99, 0x999933, 0xAA4499
    };
    /** Okabe-Ito blue, vermillion, bluish green, reddish purple, orange, sky blue, black. */
    private static final int[] SERIES = {0x0072B2, 0xD55E00, 0x009E73, 0xCC79A7, 0xE69F00, 0x56B4E9, 0x000000};

    /** Branches above the cut, which belong to no single cluster. */
    public static final Color ABOVE_CUT = new Color(0x8A8A8A);
    /** The no-structure reference band and other context that must recede. */
    public static final Color REFERENCE = new Color(0x9A9A9A);

    private ChartColors() {
    }

    /** The number of distinct cluster colours before they repeat. */
    public static int clusterColorCount() {
        return CLUSTER.length;
    }

    /** The colour of samples set aside as outliers (label -1): a light neutral grey, unlike any cluster's. */
    public static final Color OUTLIER = new Color(0xBDBDBD);

    /**
     * The colour of cluster {@code label} (0-based); repeats after {@link #clusterColorCount()}. Label -1, an
     * outlier, is {@link #OUTLIER}.
     */
    public static Color cluster(int label) {
        if (label == -1) {
            return OUTLIER;
        }
        if (label < 0) {
            throw new IllegalArgumentException("cluster label must be -1 (outlier) or non-negative, got " + label);
        }
        return new Color(CLUSTER[label % CLUSTER.length]);
    }

    /** The number of distinct series colours before they repeat. */
    public static int seriesColorCount() {
        return SERIES.length;
    }

    /** The colour of series {@code index} (0-based), used for linkage methods; repeats after seven. */
    public static Color series(int index) {
        if (index < 0) {
            throw new IllegalArgumentException("series index must be non-negative, got " + index);
        }
        return new Color(SERIES[index % SERIES.length]);
    }

    /**
     * The colour of a linkage method, fixed by name so that a method has the same colour on every chart and in
     * every report: average, complete, ward, single, weighted, centroid, median take the seven series colours
     * in that order (aliases upgma and wpgma too). Other names take {@link #series(int)} of
     * {@code fallbackIndex}.
     */
    public static Color linkage(String name, int fallbackIndex) {
        String key = name.trim().toLowerCase(java.util.Locale.ROOT);
        String[][] known = {{"average", "upgma"}, {"complete"}, {"ward"}, {"single"}, {"weighted", "wpgma"},
            {"centroid"}, {"median"}};
        for (int i = 0; i < known.length; i++) {
            for (String alias : known[i]) {
                if (key.equals(alias) || key.startsWith(alias + " ") || key.startsWith(alias + "(")) {
                    return series(i);
                }
            }
        }
        return series(fallbackIndex);
    }

    /** {@code c} with the given opacity (0 to 1), for shaded intervals. */
    static Color withAlpha(Color c, double alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), (int) Math.round(255 * alpha));
    }

    /** {@code c} mixed with white; {@code amount} 0 keeps the colour, 1 gives white. */
    static Color tint(Color c, double amount) {
        return new Color(mix(c.getRed(), amount), mix(c.getGreen(), amount), mix(c.getBlue(), amount));
    }

    private static int mix(int channel, double amount) {
        return (int) Math.round(channel + (255 - channel) * amount);
    }

    /** Black or white, whichever reads better on {@code background} (WCAG relative luminance). */
    static Color textOn(Color background) {
        double l = 0.2126 * linear(background.getRed()) + 0.7152 * linear(background.getGreen())
                + 0.0722 * linear(background.getBlue());
        // contrast with black is (l + 0.05) / 0.05, with white 1.05 / (l + 0.05); they are equal near l = 0.179
        return l > 0.179 ? new Color(0x111111) : Color.WHITE;
    }

    private static double linear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }
}
