package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.data.InputException;

/** The labels file is read with the delimiter its own name implies, and its problems name --labels. */
class LabelsReaderTest {
    @TempDir
    Path dir;

    @Test
    void theDelimiterComesFromTheLabelsFilesOwnName() throws Exception {
        // A ';'-delimited data table (--delimiter ';') with a tab-separated labels file: before, the labels were
        // read with ';' and every row was one field.
        Path tsv = Files.writeString(dir.resolve("classes.tsv"), "id\tclass\nS1\tx\nS2\ty\n");
        assertArrayEquals(new String[] {"y", "x"}, LabelsReader.read(tsv, ';', List.of("S2", "S1")));
        // a name that implies no delimiter takes the one given for the data
        Path dat = Files.writeString(dir.resolve("classes.dat"), "id;class\nS1;x\nS2;y\n");
        assertArrayEquals(new String[] {"x", "y"}, LabelsReader.read(dat, ';', List.of("S1", "S2")));
        InputException e = assertThrows(InputException.class, () -> LabelsReader.read(dat, null, List.of("S1")));
        assertTrue(e.getMessage().startsWith("--labels " + dat + ": cannot tell the labels file's delimiter"),
                e.getMessage());
    }

    @Test
    void aMissingLabelsFileNamesTheOption() {
        Path missing = dir.resolve("nowhere.csv");
        InputException e = assertThrows(InputException.class, () -> LabelsReader.read(missing, null, List.of("S1")));
        assertTrue(e.getMessage().equals("--labels " + missing + ": no such file"), e.getMessage());
    }
}
