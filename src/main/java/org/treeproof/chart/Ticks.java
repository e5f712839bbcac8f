package org.treeproof.chart;

import java.util.Locale;

/**
 * Round tick values and their labels.
 *
 * <p>Tick steps are 1, 2 or 5 times a power of ten, as in P. S. Heckbert, "Nice numbers for graph
 * labels", in Graphics Gems (A. S. Glassner, ed., Academic Press, 1990), pp. 61-63. Labels carry as many
 * decimals as the step needs and a true minus sign.
 */
final class Ticks {
    private Ticks() {
    }

    /** About {@code target} round ticks inside {@code [lo, hi]} (at least one when the range is empty). */
    static double[] between(double lo, double hi, int target) {
        if (!(hi > lo)) {
            return new double[] {lo};
        }
        double step = step(lo, hi, target);
        double first = Math.ceil(lo / step - 1e-9) * step;
        int count = (int) Math.floor((hi - first) / step + 1e-9) + 1;
        double[] t = new double[Math.max(count, 0)];
        for (int i = 0; i < t.length; i++) {
            t[i] = clean(first + i * step, step);
        }
        return t;
    }

    /** The round step that gives about {@code target} ticks across {@code [lo, hi]}. */
    static double step(double lo, double hi, int target) {
        double raw = (hi - lo) / Math.max(1, target - 1);
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / mag;
        double nice = f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10;
        return nice * mag;
    }

    /** {@code v} labelled for ticks {@code step} apart. */
    static String label(double v, double step) {
        int decimals = (int) Math.max(0, Math.min(6, Math.ceil(-Math.log10(step) - 1e-9)));
        return number(v, decimals);
    }

    /** {@code v} with {@code decimals} decimals, a true minus sign, and no negative zero. */
    static String number(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.matches("-0(\\.0*)?")) {
            s = s.substring(1);
        }
        return s.replace('-', '\u2212');
    }

    /** A value for display where the scale is unknown: about three significant digits. */
    static String compact(double v) {
        double a = Math.abs(v);
        if (a == 0 || (a >= 0.01 && a < 1e5)) {
            int decimals = a >= 100 ? 0 : a >= 10 ? 1 : 2;
            return number(v, decimals);
        }
        return String.format(Locale.ROOT, "%.2e", v).replace('-', '\u2212');
    }

    private static double clean(double v, double step) {
        // removes float noise such as 0.30000000000000004 so that labels and grid lines agree
        double q = Math.round(v / step);
        return Math.abs(v - q * step) < step * 1e-6 ? q * step : v;
    }
}
