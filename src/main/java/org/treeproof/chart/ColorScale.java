package org.treeproof.chart;

import java.awt.Color;

/**
 * A continuous colour scale over {@code [0, 1]}: evenly spaced stops joined by straight lines in sRGB.
 *
 * <p>Both scales come from P. Tol, "Colour Schemes", SRON technical note SRON/EPS/TN/09-002, issue 3.2
 * (2021), https://personal.sron.nl/~pault/data/colourschemes.pdf, which designs them to keep their order
 * for colour-blind readers and in grey-scale print:
 * <ul>
 *   <li>{@link #SEQUENTIAL}: "YlOrBr", nine stops from pale yellow (0) to dark brown (1), lightness falling
 *       steadily; used for shares in [0, 1] such as consensus values and agreement.</li>
 *   <li>{@link #DIVERGING}: "BuRd", nine stops from blue (0) through near-white (0.5) to red (1); used for
 *       z-scores centred at 0.</li>
 * </ul>
 * Each scale carries the "no value" colour the same note pairs with it (recalled from the note, not
 * re-checked), so missing data never looks like a real value.
 */
public final class ColorScale {
    /** Tol YlOrBr, 0 = pale yellow, 1 = dark brown. */
    public static final ColorScale SEQUENTIAL = new ColorScale(new int[] {
        0xFFFFE5, 0xFFF7BC, 0xFEE391, 0xFEC44F, 0xFB9A29, 0xEC7014, 0xCC4C02, 0x993404, 0x662506
    }, 0x888888);

    /** Tol BuRd, 0 = blue, 0.5 = near-white, 1 = red. */
    public static final ColorScale DIVERGING = new ColorScale(new int[] {
        0x2166AC, 0x4393C3, 0x92C5DE, 0xD1E5F0, 0xF7F7F7, 0xFDDBC7, 0xF4A582, 0xD6604D, 0xB2182B
    }, 0xFFEE99);

    private final int[] stops;
    private final int missing;

    private ColorScale(int[] stops, int missing) {
        this.stops = stops.clone();
        this.missing = missing;
    }

    /** The number of stops. */
    public int stopCount() {
        return stops.length;
    }

    /** Stop {@code i}, which the scale reaches at {@code i / (stopCount() - 1)}. */
    public Color stop(int i) {
        return new Color(stops[i]);
    }

    /** The colour shown where there is no value. */
    public Color missing() {
        return new Color(missing);
    }

    /** The colour at {@code t}; values outside [0, 1] are clamped, NaN gives {@link #missing()}. */
    public Color color(double t) {
        return new Color(rgb(t));
    }

    /** {@link #color(double)} as packed 0xRRGGBB, for filling images without allocating. */
    public int rgb(double t) {
        if (Double.isNaN(t)) {
            return missing;
        }
        double pos = Math.min(1.0, Math.max(0.0, t)) * (stops.length - 1);
        int i = (int) Math.floor(pos);
        if (i >= stops.length - 1) {
            return stops[stops.length - 1];
        }
        double f = pos - i;
        int a = stops[i];
        int b = stops[i + 1];
        return (lerp(a >> 16, b >> 16, f) << 16) | (lerp(a >> 8, b >> 8, f) << 8) | lerp(a, b, f);
    }

    private static int lerp(int a, int b, double f) {
        int x = a & 0xFF;
        int y = b & 0xFF;
        return (int) Math.round(x + (y - x) * f);
    }
}
