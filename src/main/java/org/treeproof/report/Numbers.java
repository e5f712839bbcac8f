package org.treeproof.report;

import java.math.BigDecimal;
import java.util.Locale;

/**
 * How the report prints numbers: always {@link Locale#ROOT}, a fixed precision per measure, and a dash for a
 * value that is not a finite number (never "NaN" or "Infinity").
 */
final class Numbers {
    /** Printed for a value that is not available. */
    static final String MISSING = "–";

    private Numbers() {
    }

    /** {@code v} with {@code digits} decimals, or {@link #MISSING}. */
    static String fixed(double v, int digits) {
        if (!Double.isFinite(v)) {
            return MISSING;
        }
        String s = String.format(Locale.ROOT, "%." + digits + "f", v);
        // a tiny negative value would print as "-0.00", which reads as a sign that is not there
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }

    /**
     * A height or other value of the data's own scale, with four significant digits (plain decimals from 0.001
     * to below 10 000, scientific notation beyond).
     */
    static String scaled(double v) {
        if (!Double.isFinite(v)) {
            return MISSING;
        }
        double a = Math.abs(v);
        if (a == 0) {
            return "0";
        }
        if (a < 1e-3 || a >= 1e4) {
            return String.format(Locale.ROOT, "%.3e", v);
        }
        int magnitude = (int) Math.floor(Math.log10(a));
        return fixed(v, Math.max(0, 3 - magnitude));
    }

    /** A p-value with three decimals. */
    static String p(double v) {
        return fixed(v, 3);
    }

    /** A p-value with three decimals, or "< 0.001" (a no-break space: a table cell does not wrap there) below that; the missing mark when not a number. */
    static String smallP(double v) {
        return Double.isNaN(v) ? MISSING : v < 0.001 ? "<\u00A00.001" : fixed(v, 3);
    }

    /** A share as a whole percentage ("87%"). */
    static String percent(double share) {
        if (!Double.isFinite(share)) {
            return MISSING;
        }
        String whole = fixed(100 * share, 0);
        // a share strictly between 0 and 1 never reads as none or all: 199 of 200 is "99.5%", not "100%"
        if (share > 0 && share < 1 && (whole.equals("0") || whole.equals("100"))) {
            String tenth = fixed(100 * share, 1);
            return tenth.equals("0.0") ? "<0.1%" : tenth.equals("100.0") ? ">99.9%" : tenth + "%";
        }
        return whole + "%";
    }

    /** A setting as the user would type it: the shortest plain decimal ("0.8", "1", "0.05"). */
    static String plain(double v) {
        return Double.isFinite(v) ? BigDecimal.valueOf(v).stripTrailingZeros().toPlainString() : MISSING;
    }

    /** Wall-clock seconds ("12.3 s"). */
    static String seconds(double s) {
        return fixed(s, 1) + " s";
    }
}
