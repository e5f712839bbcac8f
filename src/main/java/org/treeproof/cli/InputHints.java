package org.treeproof.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.GZIPInputStream;
import org.treeproof.data.InputException;
import org.treeproof.io.DataTable;
import org.treeproof.io.DataTableReader;

/**
 * Clearer words for input mistakes whose plain message misleads: standard input or a pipe given as a file, a missing
 * labels file, a spreadsheet's {@code sep=} line above the header, and a data table given with {@code --distances}.
 */
final class InputHints {
    private static final Pattern SEP_LINE = Pattern.compile("^\uFEFF?(sep=.)\r?\n");

    private InputHints() {
    }

    /**
     * Refuses, before any work, what cannot be read as a table file.
     *
     * @param option "INPUT" or the option that named the file
     */
    static void requireReadable(Path file, String option) {
        if (file.toString().equals("-")) {
            throw new InputException(option + " -: reading a table from standard input is not supported; save it to a "
                    + "file and give the file's name");
        }
        if (option.startsWith("--") && !Files.exists(file)) {
            throw new InputException(option + " " + file + ": no such file");
        }
        if (Files.exists(file) && !Files.isDirectory(file) && !Files.isRegularFile(file)) {
            throw new InputException(file + ": is a pipe or device, not a regular file; treeproof cannot read tables "
                    + "from pipes or standard input: save the table to a file first");
        }
    }

    /** {@code e} with a hint added when the input's shape explains it better, or {@code e} itself. */
    static InputException explain(Path input, InputException e, InputOptions options) {
        String sep = sepLine(input);
        if (sep != null) {
            return new InputException(input + ":1: the first line '" + sep + "' is a spreadsheet's delimiter hint, "
                    + "not part of the table; delete that line (treeproof takes the delimiter from the file name or "
                    + "--delimiter)", e);
        }
        if (options.distances()) {
            try {
                DataTable t = new DataTableReader(options.delimiter().orElse(null), false).read(input);
                if (!t.matrix().sampleIds().equals(t.matrix().featureNames())) {
                    return new InputException(e.getMessage() + "; the file reads as a data table (" + t.matrix().samples()
                            + " samples, " + t.matrix().features() + " features): drop --distances", e);
                }
            } catch (InputException notADataTable) {
                // neither reading works: the distance table's own message stands
            }
        }
        return e;
    }

    /** The {@code sep=X} first line of the file, or null. */
    private static String sepLine(Path input) {
        try (InputStream raw = Files.newInputStream(input);
                InputStream in = input.toString().toLowerCase(java.util.Locale.ROOT).endsWith(".gz")
                        ? new GZIPInputStream(raw) : raw) {
            String head = new String(in.readNBytes(16), StandardCharsets.UTF_8);
            Matcher m = SEP_LINE.matcher(head);
            return m.find() ? m.group(1) : null;
        } catch (IOException | RuntimeException unreadable) {
            return null;
        }
    }
}
