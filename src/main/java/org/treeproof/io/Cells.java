package org.treeproof.io;

import java.util.Locale;
import java.util.regex.Pattern;
import org.treeproof.data.InputException;

/**
 * The reading of single cells shared by the table readers: numbers, missing-value tokens, and how a cell is
 * quoted in a message.
 *
 * <p>Missing: an empty cell, {@code NA}, {@code N/A}, {@code #N/A} (what spreadsheets show for a failed lookup)
 * or {@code NaN}, in any case. Anything else must be a plain decimal number, optionally signed, with an optional
 * exponent ({@code 1.5}, {@code -2}, {@code .5}, {@code 3e-4}). Java-only forms that {@link Double#parseDouble}
 * would also take ({@code 1d}, {@code 0x1p3}) are refused, and so are infinities ({@code Inf}, {@code Infinity})
 * and numbers too large for a double, because no distance can be computed from them.
 */
final class Cells {
    private static final Pattern DECIMAL_COMMA = Pattern.compile("[+-]?\\d+,\\d+");
    private static final int SHOWN = 40;

    private Cells() {
    }

    /** The outcome of reading a cell that is not a finite number or a missing-value token. */
    static final class NotANumber extends Exception {
        private static final long serialVersionUID = 1L;
        final String hint;

        NotANumber(String reason, String hint) {
            super(reason, null, false, false);
            this.hint = hint;
        }

        /** The message: {@code where: reason context[; hint]}. */
        InputException at(String where, String context) {
            return new InputException(where + ": " + getMessage() + " " + context
                    + (hint.isEmpty() ? "" : "; " + hint));
        }
    }

    /**
     * The value of a cell, {@code NaN} when it is a missing-value token.
     *
     * @throws NotANumber when the cell is neither
     */
    static double parse(String cell) throws NotANumber {
        String s = cell.strip();
        if (isMissing(s)) {
            return Double.NaN;
        }
        if (decimalCharacters(s)) {
            try {
                double v = Double.parseDouble(s);
                if (Double.isInfinite(v)) {
                    throw new NotANumber(shown(cell) + " is too large for a double", "");
                }
                return v;
            } catch (NumberFormatException e) {
                // not a number after all, e.g. "1.2.3"; reported below
            }
        }
        String unsigned = s.startsWith("+") || s.startsWith("-") ? s.substring(1) : s;
        String lower = unsigned.toLowerCase(Locale.ROOT);
        if (lower.equals("inf") || lower.equals("infinity")) {
            throw new NotANumber(shown(cell) + " is infinite", "values must be finite numbers");
        }
        String hint = DECIMAL_COMMA.matcher(s).matches() ? "decimal commas are not read, write " + s.replace(',', '.')
                : "";
        throw new NotANumber(shown(cell) + " is not a number", hint);
    }

    /**
     * Whether {@code s} has only digits, points, signs and exponent letters. Within these characters
     * {@link Double#parseDouble} accepts exactly the decimal forms, so its hexadecimal, suffixed and named forms
     * stay out without a regular expression on every cell.
     */
    private static boolean decimalCharacters(String s) {
        for (int k = 0; k < s.length(); k++) {
            char c = s.charAt(k);
            if (!((c >= '0' && c <= '9') || c == '.' || c == 'e' || c == 'E' || c == '+' || c == '-')) {
                return false;
            }
        }
        return true;
    }

    /** Whether a stripped cell is one of the missing-value tokens. */
    static boolean isMissing(String s) {
        return s.isEmpty() || s.equalsIgnoreCase("NA") || s.equalsIgnoreCase("N/A") || s.equalsIgnoreCase("#N/A")
                || s.equalsIgnoreCase("NaN");
    }

    /**
     * A cell as a message shows it: single-quoted, long ones shortened, and characters one cannot see written as
     * escapes: a tab as {@code \t}, others by their code point, such as the no-break space (U+00A0) that
     * spreadsheets put in numbers or a stray byte-order mark (U+FEFF).
     */
    static String shown(String cell) {
        String s = cell.length() > SHOWN ? cell.substring(0, SHOWN - 3) : cell;
        var out = new StringBuilder("'");
        for (int k = 0; k < s.length(); k++) {
            char c = s.charAt(k);
            if (c == '\t') {
                out.append("\\t");
            } else if (c < 0x20 || (Character.isSpaceChar(c) && c != ' ') || Character.getType(c) == Character.FORMAT) {
                out.append(String.format("\\u%04X", (int) c));
            } else {
                out.append(c);
            }
        }
        return out.append(cell.length() > SHOWN ? "...'" : "'").toString();
    }

    /**
     * The delimiter a file name implies: {@code ,} for {@code .csv}; tab for {@code .tsv}, {@code .tab} and
     * {@code .txt}; the same with {@code .gz} added.
     *
     * @throws InputException for any other name
     */
    static char delimiterFor(String name) {
        Character d = delimiterOf(name);
        if (d != null) {
            return d;
        }
        throw new InputException(name + ": cannot tell the delimiter from the file name (.csv is read with commas;"
                + " .tsv, .tab and .txt with tabs, also with .gz); give --delimiter");
    }

    /** The delimiter the file name implies (see {@link #delimiterFor}), or {@code null} when it implies none. */
    static Character delimiterOf(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        if (n.endsWith(".gz")) {
            n = n.substring(0, n.length() - 3);
        }
        if (n.endsWith(".csv")) {
            return ',';
        }
        if (n.endsWith(".tsv") || n.endsWith(".tab") || n.endsWith(".txt")) {
            return '\t';
        }
        return null;
    }

    /** How a delimiter is named in messages. */
    static String delimiterName(char d) {
        return switch (d) {
            case '\t' -> "tab";
            case ' ' -> "space";
            default -> "'" + d + "'";
        };
    }

    /**
     * Refuses a delimiter the CSV syntax cannot use.
     *
     * @throws InputException for a quote, a line break or another control character other than tab
     */
    static char checkDelimiter(char d) {
        if (d == '"' || d == '\n' || d == '\r' || (d < 0x20 && d != '\t')) {
            throw new InputException("--delimiter cannot be " + (d == '"' ? "the quote character '\"'"
                    : String.format("the control character U+%04X", (int) d)));
        }
        return d;
    }
}
