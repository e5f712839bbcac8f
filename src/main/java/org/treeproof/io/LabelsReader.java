package org.treeproof.io;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.treeproof.data.InputException;

/**
 * Reads known classes of the samples ({@code --labels FILE}): a header row, then one row per sample with its
 * id in the first column and its class in the second; further columns are ignored. Every sample of the study
 * needs a class; ids the study does not hold are ignored (they may have been dropped by the preparation).
 */
public final class LabelsReader {
    private LabelsReader() {
    }

    /**
     * The class of each study sample, in study order. The file's delimiter comes from its own name ({@code .csv}
     * commas; {@code .tsv}, {@code .tab}, {@code .txt} tabs), not from the data table's; {@code fallback} is used
     * only when the name implies none. Every message starts with {@code --labels FILE}.
     *
     * @param fallback the delimiter for a file whose name implies none, or {@code null} to refuse such a name
     * @throws InputException naming the option, file, line and column for a missing or unreadable file, a
     *                        malformed row, a repeated id, or a missing sample
     */
    public static String[] read(Path file, Character fallback, List<String> sampleIds) {
        try {
            return classes(file, fallback, sampleIds);
        } catch (InputException e) {
            throw new InputException("--labels " + e.getMessage());
        }
    }

    private static String[] classes(Path file, Character fallback, List<String> sampleIds) {
        Character delimiter = Cells.delimiterOf(file.toString());
        if (delimiter == null) {
            if (fallback == null) {
                throw new InputException(file + ": cannot tell the labels file's delimiter from its name; name it"
                        + " .csv (commas) or .tsv (tabs)");
            }
            delimiter = fallback;
        }
        Map<String, String> classes = TableText.parse(file, delimiter, text -> {
            var out = new HashMap<String, String>();
            var firstLine = new HashMap<String, Integer>();
            TableText.Row header = text.header();
            if (header == null) {
                throw new InputException(file + ": the labels file is empty; it needs a header row and a row per sample");
            }
            for (TableText.Row row = text.next(); row != null; row = text.next()) {
                if (row.size() < 2) {
                    throw new InputException(file + ":" + row.line() + ":" + (row.size() + 1)
                            + ": a labels row needs a sample id and a class");
                }
                String id = row.cell(0).strip();
                String cls = row.cell(1).strip();
                if (id.isEmpty()) {
                    throw new InputException(file + ":" + row.line() + ":1: empty sample id");
                }
                if (cls.isEmpty()) {
                    throw new InputException(file + ":" + row.line() + ":2: empty class for sample '" + id + "'");
                }
                Integer before = firstLine.putIfAbsent(id, row.line());
                if (before != null) {
                    throw new InputException(file + ":" + row.line() + ":1: sample '" + id
                            + "' is listed again (first at line " + before + ")");
                }
                out.put(id, cls);
            }
            return out;
        });
        String[] result = new String[sampleIds.size()];
        int missing = 0;
        String first = null;
        for (int i = 0; i < result.length; i++) {
            result[i] = classes.get(sampleIds.get(i));
            if (result[i] == null) {
                missing++;
                if (first == null) {
                    first = sampleIds.get(i);
                }
            }
        }
        if (missing > 0) {
            throw new InputException(file + ": " + missing + " sample(s) of the study have no class, the first is '"
                    + first + "'");
        }
        return result;
    }
}
