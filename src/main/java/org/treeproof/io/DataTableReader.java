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
 * of surrounding spaces and must be unique and non-empty. A table without an id column is read with
 * {@code noIds}: every column is a feature and the samples are named by their position, {@code 1} to {@code n}.
 *
 * <p>Two common mistakes are recognised rather than misread: a header row that holds numbers like data (after an
 * id cell that is itself a number, or with a decimal point or exponent in one of them) means the table has no
 * header row, and a first column of numbers with a decimal point or exponent means it has no id column (as in the
 * usual Iris file). Whole numbers are accepted as feature names and ids (wavelengths, years, row numbers). Text handling (gzip, byte-order marks, line ends,
 * quoting, blank rows) is described at {@link TableText}. Every refusal is an {@link InputException} whose
 * message starts with {@code file:line:column} (1-based, the header is line 1, the column counts fields)
 * wherever a position exists, e.g. {@code data.csv:7:3: 'abc' is not a number (sample 'S6', feature 'G2')}.
 */
public final class DataTableReader {
    private final Character delimiter;
    private final boolean samplesInColumns;
    private final boolean noIds;

    /**
     * @param delimiter        the field delimiter, or {@code null} to choose it from the file name ({@code .csv}
     *                         commas; {@code .tsv}, {@code .tab}, {@code .txt} tabs; also with {@code .gz})
     * @param samplesInColumns whether the file holds one feature per row
     * @throws InputException for a delimiter CSV cannot use (a quote or a line break)
     */
    public DataTableReader(Character delimiter, boolean samplesInColumns) {
        this(delimiter, samplesInColumns, false);
    }

    /**
     * @param delimiter        the field delimiter, or {@code null} to choose it from the file name
     * @param samplesInColumns whether the file holds one feature per row
     * @param noIds            whether the table (samples in rows) has no id column: samples are then named
     *                         {@code 1..n} in file order
     * @throws InputException for a delimiter CSV cannot use, or {@code noIds} with {@code samplesInColumns}
     */
    public DataTableReader(Character delimiter, boolean samplesInColumns, boolean noIds) {
        this.delimiter = delimiter == null ? null : Cells.checkDelimiter(delimiter);
        this.samplesInColumns = samplesInColumns;
        this.noIds = noIds;
        if (noIds && samplesInColumns) {
            throw new InputException("--no-ids applies to tables with one sample per row; it cannot be combined with"
                    + " --samples-in-columns");
        }
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
        /** The column of the first value: 0 without an id column, else 1. */
        private final int firstValue = noIds ? 0 : 1;
        /** Whether every id so far is a number, and whether one of them reads like a measurement. */
        private boolean idsAllNumbers = true;
        private boolean idsLikeMeasurements;
        private String firstIds = "";

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
            if (!noIds && !samplesInColumns && idsAllNumbers && idsLikeMeasurements) {
                throw new InputException(src + ": the first column holds numbers (" + firstIds + (rowNames.size() > 3
                        ? ", ..." : "") + ") where sample ids belong: the table seems to have no id column; add one,"
                        + " or give --no-ids to name the samples by row number");
            }
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
            if (header.size() < 1 + firstValue) {
                throw new InputException(src + ":" + header.line() + ":1: the header has no "
                        + (samplesInColumns ? "sample" : "feature") + " columns after the id column"
                        + text.delimiterHint(header));
            }
            refuseNumericHeader(header);
            for (int k = firstValue; k < header.size(); k++) {
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

        /**
         * Refuses a header row that reads like data: every name after the id column a number, and the id cell a
         * number too or one of the names a number with a decimal point or exponent.
         */
        private void refuseNumericHeader(TableText.Row header) {
            boolean measurement = false;
            var shown = new ArrayList<String>();
            for (int k = firstValue; k < header.size(); k++) {
                String name = header.cell(k).strip();
                if (!isNumber(name)) {
                    return;
                }
                measurement |= looksLikeMeasurement(name);
                if (shown.size() < 3) {
                    shown.add(Cells.shown(name));
                }
            }
            boolean idIsNumber = firstValue == 1 && isNumber(header.cell(0).strip());
            if (!(measurement || idIsNumber)) {
                return;
            }
            throw new InputException(src + ":" + header.line() + ": the header row holds numbers ("
                    + String.join(", ", shown) + (header.size() - firstValue > shown.size() ? ", ..." : "") + ") where "
                    + headerKind + "s belong: the table seems to have no header row; add one (a name for the id"
                    + " column, then one " + headerKind + " per column)");
        }

        private void readRow(TableText.Row row, int width) {
            text.requireWidth(row, width);
            String id = noIds ? Integer.toString(rowNames.size() + 1) : row.cell(0).strip();
            String at = src + ":" + row.line() + ":1: ";
            if (id.isEmpty()) {
                throw new InputException(at + "empty " + rowKind);
            }
            noteId(id);
            Integer first = lineOf.putIfAbsent(id, row.line());
            if (first != null) {
                throw new InputException(at + "duplicate " + rowKind + " '" + id + "' (first on line " + first + ")"
                        + noIdColumnHint());
            }
            int p = width - firstValue;
            int offset = ensureRoom((long) (rowNames.size() + 1) * p) - p;
            for (int k = firstValue; k < width; k++) {
                double v;
                try {
                    v = Cells.parse(row.cell(k));
                } catch (Cells.NotANumber e) {
                    String column = columnNames.get(k - firstValue);
                    InputException plain = e.at(src + ":" + row.line() + ":" + (k + 1), samplesInColumns
                            ? "(sample '" + column + "', feature '" + id + "')"
                            : "(sample '" + id + "', feature '" + column + "')");
                    throw new InputException(plain.getMessage() + noIdColumnHint());
                }
                if (Double.isNaN(v)) {
                    missing++;
                }
                values[offset + k - firstValue] = v;
            }
            rowNames.add(id);
        }

        private void noteId(String id) {
            if (noIds || !idsAllNumbers) {
                return;
            }
            if (!isNumber(id)) {
                idsAllNumbers = false;
                return;
            }
            idsLikeMeasurements |= looksLikeMeasurement(id);
            if (rowNames.size() < 3) {
                firstIds += (firstIds.isEmpty() ? "" : ", ") + Cells.shown(id);
            }
        }

        /** A hint for a table whose ids so far are all numbers like measurements, else "". */
        private String noIdColumnHint() {
            if (noIds || samplesInColumns || !idsAllNumbers || !idsLikeMeasurements) {
                return "";
            }
            return "; the first column holds numbers (" + firstIds + "), not sample ids: if the table has no id"
                    + " column, give --no-ids to name the samples by row number";
        }

        private static boolean isNumber(String cell) {
            try {
                return !Double.isNaN(Cells.parse(cell));
            } catch (Cells.NotANumber e) {
                return false;
            }
        }

        /** A number written with a decimal point or an exponent: a measurement rather than a name or a count. */
        private static boolean looksLikeMeasurement(String cell) {
            return cell.indexOf('.') >= 0 || cell.indexOf('e') >= 0 || cell.indexOf('E') >= 0;
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
