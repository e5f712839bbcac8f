package org.treeproof.io;

import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.treeproof.data.InputException;
import org.treeproof.data.InputSource;
import org.treeproof.distance.CondensedDistances;

/**
 * Reads a square table of pairwise distances: a header row of ids (its first cell may hold anything), then one
 * row per id, starting with the same id in the same order, then the distances to every id.
 *
 * <p>The table must be complete (no missing-value token), finite and non-negative off the diagonal. With
 * {@code L} the largest distance in the table, it must be symmetric to within {@code 1e-12 * L}
 * ({@value #RELATIVE_TOLERANCE}; the two copies are then averaged) and its diagonal must be 0 to within
 * {@code 1e-12 * L}. The tolerance is relative to the table's scale, not to each pair, because the rounding of
 * the computation that made the table is on that scale: {@code 1 - r} with {@code r} a correlation near 1
 * differs between the two triangles by a few units in the last place of 1, which is large relative to the
 * small distance itself. Anything larger is a real asymmetry and is refused, naming the pair that differs most.
 * Negative distances are refused however small, because no clustering method here is defined for them. Text
 * handling is that of {@link TableText}; every refusal names {@code file:line:column}.
 */
public final class DistanceTableReader {
    /**
     * The tolerance of the symmetry and zero-diagonal checks, relative to the largest distance in the table (the
     * messages say "1e-12").
     */
    public static final double RELATIVE_TOLERANCE = 1e-12;

    private final Character delimiter;

    /** @param delimiter the field delimiter, or {@code null} to choose it from the file name */
    public DistanceTableReader(Character delimiter) {
        this.delimiter = delimiter == null ? null : Cells.checkDelimiter(delimiter);
    }

    /**
     * Reads {@code file}; messages name it as given.
     *
     * @throws InputException when the file cannot be read or is not a valid distance table
     */
    public DistanceTable read(Path file) {
        return TableText.parse(file, delimiter, text -> new Parse(text).run());
    }

    /**
     * Reads a distance table from {@code in}, which is closed afterwards; {@code source} names it in messages.
     *
     * @throws InputException when the bytes are not a valid distance table
     */
    public DistanceTable read(String source, InputStream in) {
        return TableText.parse(source, in, delimiter, text -> new Parse(text).run());
    }

    /** The state of reading one table. */
    private static final class Parse {
        private final TableText text;
        private final String src;
        private final List<String> ids = new ArrayList<>();
        private int headerLine;
        private int[] rowLines;
        private double[] diagonal;
        private double[] condensed = new double[0];
        private double largest;
        private int rows;
        /** The pair whose two copies differ most, as its lower-triangle row and column; -1 while none differ. */
        private int worstRow = -1;
        private int worstColumn;
        private double worstLower;
        private double worstUpper;

        Parse(TableText text) {
            this.text = text;
            this.src = text.source();
        }

        DistanceTable run() {
            TableText.Row header = text.header();
            readHeader(header);
            int n = ids.size();
            rowLines = new int[n];
            diagonal = new double[n];
            for (TableText.Row row = text.next(); row != null; row = text.next()) {
                readRow(row);
            }
            if (rows < n) {
                throw new InputException(src + ": the header lists " + n + " ids but " + rows + " row"
                        + (rows == 1 ? " follows" : "s follow") + "; a distance table is square");
            }
            double tolerance = RELATIVE_TOLERANCE * largest;
            if (worstRow >= 0 && !(Math.abs(worstLower - worstUpper) <= tolerance)) {
                int i = worstRow, j = worstColumn;
                throw new InputException(src + ":" + rowLines[i] + ":" + (j + 2) + ": distance " + worstLower
                        + " (between '" + ids.get(i) + "' and '" + ids.get(j) + "') differs from " + worstUpper
                        + " at line " + rowLines[j] + ", column " + (i + 2) + "; the table must be symmetric (to within"
                        + " 1e-12 of its largest distance)");
            }
            for (int i = 0; i < n; i++) {
                if (!(Math.abs(diagonal[i]) <= tolerance)) {
                    throw new InputException(src + ":" + rowLines[i] + ":" + (i + 2) + ": the diagonal value of '"
                            + ids.get(i) + "' is " + diagonal[i] + ", not 0 (to within 1e-12 of the largest"
                            + " distance)");
                }
            }
            InputSource source = text.finish();
            int length = CondensedDistances.length(n);
            return new DistanceTable(ids, CondensedDistances.of(n, condensed.length == length ? condensed
                    : Arrays.copyOf(condensed, length)), source);
        }

        private void readHeader(TableText.Row header) {
            headerLine = header.line();
            Map<String, Integer> columnOf = new HashMap<>();
            for (int k = 1; k < header.size(); k++) {
                String id = header.cell(k).strip();
                String at = src + ":" + header.line() + ":" + (k + 1) + ": ";
                if (id.isEmpty()) {
                    throw new InputException(at + "empty id in the header");
                }
                Integer first = columnOf.putIfAbsent(id, k + 1);
                if (first != null) {
                    throw new InputException(at + "duplicate id '" + id + "' (first in column " + first + ")");
                }
                ids.add(id);
            }
            if (ids.size() < 2) {
                throw new InputException(src + ":" + header.line() + ":1: the header lists " + ids.size() + " id"
                        + (ids.size() == 1 ? "" : "s") + "; clustering needs at least 2");
            }
            try {
                CondensedDistances.length(ids.size());
            } catch (IllegalArgumentException e) {
                throw new InputException(src + ":" + header.line() + ": " + e.getMessage());
            }
        }

        private void readRow(TableText.Row row) {
            int n = ids.size();
            int i = rows;
            String at = src + ":" + row.line() + ":";
            if (i >= n) {
                throw new InputException(at + "1: one row more than the " + n + " ids of the header; a distance"
                        + " table is square");
            }
            text.requireWidth(row, n + 1);
            String id = row.cell(0).strip();
            if (!id.equals(ids.get(i))) {
                throw new InputException(at + "1: row id '" + id + "' does not match column id '" + ids.get(i)
                        + "' (line " + headerLine + ", column " + (i + 2) + "); rows and columns must list the same"
                        + " ids in the same order");
            }
            rowLines[i] = row.line();
            if (i < n - 1) {
                ensureRoom(CondensedDistances.index(n, i, n - 1) + 1);
            }
            for (int j = 0; j < n; j++) {
                String where = at + (j + 2);
                String pair = j == i ? "(the diagonal of '" + id + "')"
                        : "(between '" + id + "' and '" + ids.get(j) + "')";
                double v;
                try {
                    v = Cells.parse(row.cell(j + 1));
                } catch (Cells.NotANumber e) {
                    throw e.at(where, pair);
                }
                if (Double.isNaN(v)) {
                    throw new InputException(where + ": missing distance " + pair
                            + "; a distance table must be complete");
                }
                if (j == i) {
                    diagonal[i] = v;
                    continue;
                }
                if (v < 0) {
                    throw new InputException(where + ": negative distance " + v + " " + pair);
                }
                largest = Math.max(largest, v);
                int t = CondensedDistances.index(n, i, j);
                if (j > i) {
                    condensed[t] = v;
                } else {
                    double u = condensed[t];
                    if (u != v) {
                        if (worstRow < 0 || Math.abs(u - v) > Math.abs(worstLower - worstUpper)) {
                            worstRow = i;
                            worstColumn = j;
                            worstLower = v;
                            worstUpper = u;
                        }
                        condensed[t] = u / 2 + v / 2;
                    }
                }
            }
            rows++;
        }

        /** Grows the condensed array as rows arrive, so a wrong file fails before a large allocation. */
        private void ensureRoom(int length) {
            if (condensed.length < length) {
                int full = CondensedDistances.length(ids.size());
                condensed = Arrays.copyOf(condensed, (int) Math.min(full, Math.max(length, 2L * condensed.length)));
            }
        }
    }
}
