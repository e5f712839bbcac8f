package org.treeproof.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.treeproof.data.InputException;
import org.treeproof.io.DataTable;
import org.treeproof.io.DataTableReader;

/**
 * Clearer words for input mistakes whose plain message misleads: standard input or a pipe given as a file, a missing
 * labels file, and a data table given with {@code --distances}.
 */
final class InputHints {

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
        // a sep= first line is honoured by the table reader (TableText), so it never explains a failure
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
}
