package org.treeproof.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.treeproof.data.InputException;
import org.treeproof.explain.Covariate;
import org.treeproof.explain.CovariateKind;

/**
 * Reads covariates of the samples ({@code --covariates FILE}): a header row naming the id column and one column
 * per covariate, then one row per sample with its id first. The delimiter comes from the file's name ({@code .csv}
 * commas; {@code .tsv}, {@code .tab}, {@code .txt} tabs; also with {@code .gz}). Every sample of the study needs a
 * row; ids the study does not hold are ignored (they may have been dropped by the preparation). A cell may be
 * missing (empty, {@code NA}, {@code N/A}, {@code #N/A}, {@code NaN}).
 *
 * <p>A column is numeric when every present value is a number and it has more than
 * {@link CovariateKind#MOST_CODED_LEVELS} distinct values, categorical otherwise; {@code kinds} overrides this
 * per column, and a column declared numeric must hold only numbers.
 */
public final class CovariatesReader {
    private CovariatesReader() {
    }

    /**
     * The covariates of the study's samples, in the file's column order, values in study order.
     *
     * @param kinds the kinds the user declared, by column name (may be empty)
     * @throws InputException naming file, line and column for a malformed file, a repeated id or column, a
     *                        missing sample, a non-number in a numeric column, or a declared column that is absent
     */
    public static List<Covariate> read(Path file, List<String> sampleIds, Map<String, CovariateKind> kinds) {
        char delimiter;
        try {
            delimiter = Cells.delimiterFor(file.getFileName().toString());
        } catch (InputException e) {
            throw new InputException("--covariates " + file + ": cannot tell the delimiter from the file name; name it "
                    + ".csv (commas) or .tsv, .tab, .txt (tabs), optionally with .gz");
        }
        return TableText.parse(file, delimiter, text -> parse(file, text, sampleIds, kinds));
    }

    private static List<Covariate> parse(Path file, TableText text, List<String> sampleIds,
            Map<String, CovariateKind> kinds) {
        TableText.Row header = text.header();
        if (header.size() < 2) {
            throw new InputException(file + ":" + header.line() + ": the covariates file needs an id column and at "
                    + "least one covariate column");
        }
        List<String> names = new ArrayList<>();
        var seen = new HashMap<String, Integer>();
        for (int c = 1; c < header.size(); c++) {
            String name = header.cell(c).strip();
            if (name.isEmpty()) {
                throw new InputException(file + ":" + header.line() + ":" + (c + 1) + ": empty covariate name");
            }
            Integer before = seen.putIfAbsent(name, c + 1);
            if (before != null) {
                throw new InputException(file + ":" + header.line() + ":" + (c + 1) + ": covariate '" + name
                        + "' is named again (first in column " + before + ")");
            }
            names.add(name);
        }
        for (String declared : kinds.keySet()) {
            if (!seen.containsKey(declared)) {
                throw new InputException("--covariate-kind: " + file + " has no covariate '" + declared + "'; it has "
                        + String.join(", ", names));
            }
        }
        Map<String, Integer> position = new HashMap<>();
        for (int i = 0; i < sampleIds.size(); i++) {
            position.put(sampleIds.get(i), i);
        }
        int m = names.size();
        String[][] cells = new String[m][sampleIds.size()];
        int[][] lines = new int[m][sampleIds.size()];
        boolean[] found = new boolean[sampleIds.size()];
        var firstLine = new HashMap<String, Integer>();
        for (TableText.Row row = text.next(); row != null; row = text.next()) {
            if (row.size() != header.size()) {
                throw new InputException(file + ":" + row.line() + ":" + (Math.min(row.size(), header.size()) + 1)
                        + ": " + row.size() + " cells; the header has " + header.size());
            }
            String id = row.cell(0).strip();
            if (id.isEmpty()) {
                throw new InputException(file + ":" + row.line() + ":1: empty sample id");
            }
            Integer before = firstLine.putIfAbsent(id, row.line());
            if (before != null) {
                throw new InputException(file + ":" + row.line() + ":1: sample '" + id + "' is listed again (first at "
                        + "line " + before + ")");
            }
            Integer at = position.get(id);
            if (at == null) {
                continue;
            }
            found[at] = true;
            for (int c = 0; c < m; c++) {
                String v = row.cell(c + 1).strip();
                cells[c][at] = Cells.isMissing(v) ? null : v;
                lines[c][at] = row.line();
            }
        }
        int missing = 0;
        String first = null;
        for (int i = 0; i < found.length; i++) {
            if (!found[i]) {
                missing++;
                first = first == null ? sampleIds.get(i) : first;
            }
        }
        if (missing > 0) {
            throw new InputException(file + ": " + missing + " sample(s) of the study have no row, the first is '"
                    + first + "'");
        }
        var out = new ArrayList<Covariate>(m);
        for (int c = 0; c < m; c++) {
            out.add(covariate(file, names.get(c), c + 2, cells[c], lines[c], kinds.get(names.get(c))));
        }
        return List.copyOf(out);
    }

    private static Covariate covariate(Path file, String name, int column, String[] cells, int[] lines,
            CovariateKind declared) {
        double[] values = new double[cells.length];
        boolean allNumbers = true;
        var distinct = new HashSet<Double>();
        for (int i = 0; i < cells.length; i++) {
            if (cells[i] == null) {
                values[i] = Double.NaN;
                continue;
            }
            try {
                values[i] = Cells.parse(cells[i]);
                distinct.add(values[i]);
            } catch (Cells.NotANumber e) {
                if (declared == CovariateKind.NUMERIC) {
                    throw new InputException(file + ":" + lines[i] + ":" + column + ": " + Cells.shown(cells[i])
                            + " is not a number, but covariate '" + name + "' is declared numeric");
                }
                allNumbers = false;
            }
        }
        CovariateKind kind = declared != null ? declared
                : allNumbers && distinct.size() > CovariateKind.MOST_CODED_LEVELS ? CovariateKind.NUMERIC
                        : CovariateKind.CATEGORICAL;
        return kind == CovariateKind.NUMERIC ? Covariate.numeric(name, values) : Covariate.categorical(name, cells);
    }

    /**
     * Parses {@code --covariate-kind} values, {@code NAME=categorical|numeric}, in order.
     *
     * @throws InputException for a malformed item, an unknown kind or a name given twice
     */
    public static Map<String, CovariateKind> kinds(List<String> items) {
        var out = new LinkedHashMap<String, CovariateKind>();
        for (String item : items) {
            int eq = item.lastIndexOf('=');
            if (eq <= 0 || eq == item.length() - 1) {
                throw new InputException("--covariate-kind: '" + item + "' is not NAME=categorical or NAME=numeric");
            }
            String name = item.substring(0, eq).strip();
            CovariateKind kind;
            try {
                kind = CovariateKind.parse(item.substring(eq + 1));
            } catch (InputException e) {
                throw new InputException("--covariate-kind: " + e.getMessage());
            }
            if (out.put(name, kind) != null) {
                throw new InputException("--covariate-kind: covariate '" + name + "' is given twice");
            }
        }
        return out;
    }
}
