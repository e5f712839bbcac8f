package org.treeproof.io;

import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.treeproof.data.CellLocator;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.data.InputSource;

/**
 * Reads a data table: a header row, then one row per sample whose first cell is the sample id and whose other
 * cells are numbers or missing-value tokens (see {@link Cells}). With {@code samplesInColumns} the file is a
 * feature-by-sample table (header row = sample ids, first column = feature names) and is transposed.
 *
 * <p>The header's first cell names the id column and may hold anything, or nothing. Ids and names are stripped
 * of surrounding spaces and must be unique and non-empty. Text handling (gzip, byte-order marks, line ends,
 * quoting, blank rows) is described at {@link TableText}. Every refusal is an {@link InputException} whose
 * message starts with {@code file:line:column} (1-based, the header is line 1, the column counts fields)
 * wherever a position exists, e.g. {@code data.csv:7:3: 'abc' is not a number (sample 'S6', feature 'G2')}.
 */
public final class DataTableReader {
    private final Character delimiter;
    private final boolean samplesInColumns;

    /**
     * @param delimiter        the field delimiter, or {@code null} to choose it from the file name ({@code .csv}
     *                         commas; {@code .tsv}, {@code .tab}, {@code .txt} tabs; also with {@code .gz})
     * @param samplesInColumns whether the file holds one feature per row
     * @throws InputException for a delimiter CSV cannot use (a quote or a line break)
     */
    public DataTableReader(Character delimiter, boolean samplesInColumns) {
        this.delimiter = delimiter == null ? null : Cells.checkDelimiter(delimiter);
        this.samplesInColumns = samplesInColumns;
    }

    /** A reader of sample-by-feature tables with the delimiter chosen by file name. */
    public static DataTableReader byFileName() {
        return new DataTableReader(null, false);
    }

    /**
     * Reads {@code file}; messages name it as given.
     *
     * @throws InputException when the file cannot be read or is not a valid table
     */
    public DataTable read(Path file) {
        return TableText.parse(file, delimiter, text -> new Parse(text).run());
    }

    /**
     * Reads a table from {@code in}, which is closed afterwards; {@code source} names it in messages and, when no
     * delimiter was given, chooses the delimiter by its ending.
     *
     * @throws InputException when the bytes are not a valid table
     */
    public DataTable read(String source, InputStream in) {
        return TableText.parse(source, in, delimiter, text -> new Parse(text).run());
    }

    /** The state of reading one table. */
    private final class Parse {
        private final TableText text;
        private final String src;
        private final String headerKind = samplesInColumns ? "sample id" : "feature name";
        private final String rowKind = samplesInColumns ? "feature name" : "sample id";
        private final List<String> columnNames = new ArrayList<>();
        private final Map<String, Integer> columnOf = new HashMap<>();
        private final List<String> rowNames = new ArrayList<>();
        private final Map<String, Integer> lineOf = new HashMap<>();
        private double[] values = new double[0];
        private long missing;

        Parse(TableText text) {
            this.text = text;
            this.src = text.source();
        }

        DataTable run() {
            TableText.Row header = text.header();
            readHeader(header);
            int width = header.size();
            for (TableText.Row row = text.next(); row != null; row = text.next()) {
                readRow(row, width);
            }
            if (rowNames.isEmpty()) {
                throw new InputException(src + ":" + header.line() + ": has a header row but no "
                        + (samplesInColumns ? "feature" : "sample") + " rows");
            }
            List<String> samples = samplesInColumns ? columnNames : rowNames;
            if (samples.size() < 2) {
                throw new InputException(src + ": has only 1 sample ('" + samples.get(0) + "'"
                        + (samplesInColumns ? ", in a column" : "") + "); clustering needs at least 2");
            }
            InputSource source = text.finish();
            int cells = rowNames.size() * columnNames.size();
            double[] read = values.length == cells ? values : Arrays.copyOf(values, cells);
            DataMatrix m = samplesInColumns
                    ? new DataMatrix(columnNames, rowNames, transpose(read, rowNames.size(), columnNames.size()))
                    : new DataMatrix(rowNames, columnNames, read);
            return new DataTable(m, source, missing, new Locator(src, lineOf, columnOf, samplesInColumns));
        }

        private void readHeader(TableText.Row header) {
            if (header.size() < 2) {
                throw new InputException(src + ":" + header.line() + ":1: the header has no "
                        + (samplesInColumns ? "sample" : "feature") + " columns after the id column"
                        + text.delimiterHint(header));
            }
            for (int k = 1; k < header.size(); k++) {
                String name = header.cell(k).strip();
                String at = src + ":" + header.line() + ":" + (k + 1) + ": ";
                if (name.isEmpty()) {
                    throw new InputException(at + "empty " + headerKind + " in the header"
                            + (k == header.size() - 1 ? " (a delimiter at the end of the line?)" : ""));
                }
                Integer first = columnOf.putIfAbsent(name, k + 1);
                if (first != null) {
                    throw new InputException(at + "duplicate " + headerKind + " '" + name + "' (first in column "
                            + first + ")");
                }
                columnNames.add(name);
            }
        }

        private void readRow(TableText.Row row, int width) {
            text.requireWidth(row, width);
            String id = row.cell(0).strip();
            String at = src + ":" + row.line() + ":1: ";
            if (id.isEmpty()) {
                throw new InputException(at + "empty " + rowKind);
            }
            Integer first = lineOf.putIfAbsent(id, row.line());
            if (first != null) {
                throw new InputException(at + "duplicate " + rowKind + " '" + id + "' (first on line " + first + ")");
            }
            int p = width - 1;
            int offset = ensureRoom((long) (rowNames.size() + 1) * p) - p;
            for (int k = 1; k < width; k++) {
                double v;
                try {
                    v = Cells.parse(row.cell(k));
                } catch (Cells.NotANumber e) {
                    String column = columnNames.get(k - 1);
                    throw e.at(src + ":" + row.line() + ":" + (k + 1), samplesInColumns
                            ? "(sample '" + column + "', feature '" + id + "')"
                            : "(sample '" + id + "', feature '" + column + "')");
                }
                if (Double.isNaN(v)) {
                    missing++;
                }
                values[offset + k - 1] = v;
            }
            rowNames.add(id);
        }

        /** Makes room for {@code cells} values and returns that count. */
        private int ensureRoom(long cells) {
            if (cells > Integer.MAX_VALUE - 8) {
                throw new InputException(src + ": has more than " + (Integer.MAX_VALUE - 8) + " cells, more than one"
                        + " table can hold");
            }
            if (values.length < cells) {
                long grown = Math.max(cells, 2L * values.length);
                values = Arrays.copyOf(values, (int) Math.min(Integer.MAX_VALUE - 8, grown));
            }
            return (int) cells;
        }

        private static double[] transpose(double[] values, int rows, int cols) {
            double[] t = new double[rows * cols];
            for (int r = 0; r < rows; r++) {
                for (int c = 0; c < cols; c++) {
                    t[c * rows + r] = values[r * cols + c];
                }
            }
            return t;
        }
    }

    /** Where each cell of a table read from text came from: rows by line, columns by field number. */
    private record Locator(String source, Map<String, Integer> lineOf, Map<String, Integer> columnOf,
            boolean featureMajor) implements CellLocator {
        @Override
        public String locate(String sampleId, String featureName) {
            Integer line = lineOf.get(featureMajor ? featureName : sampleId);
            Integer column = columnOf.get(featureMajor ? sampleId : featureName);
            return line == null || column == null ? source : source + ":" + line + ":" + column;
        }
    }
}
