package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.data.CellLocator;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/** Behaviour of the data-table reader beyond the corpora: provenance, positions, gzip detection, round trips. */
class DataTableReaderTest {

    private static Path input(String name) throws URISyntaxException {
        return Path.of(DataTableReaderTest.class.getResource("/input/" + name).toURI());
    }

    private static DataTable read(String name, byte[] bytes) {
        return DataTableReader.byFileName().read(name, new ByteArrayInputStream(bytes));
    }

    @Test
    void sha256AndSizeAreThoseOfTheBytesAsRead() throws Exception {
        // Reference: GNU coreutils sha256sum of the committed files (run by hand, values pasted here).
        DataTable plain = DataTableReader.byFileName().read(input("plain.csv"));
        assertEquals("583bfe38899b7955fa8f21a50393df2bd9eed49f26507a0b310170aa8af6bbfb", plain.source().sha256());
        assertEquals(55, plain.source().bytes());
        DataTable gz = DataTableReader.byFileName().read(input("plain.csv.gz"));
        assertEquals("ce4e679eed25032f73a9748d61074132bf3e8448f839811e351bdbd4de6cc4b4", gz.source().sha256());
        assertEquals(73, gz.source().bytes());
    }

    @Test
    void bytesAfterTheGzipStreamAreHashedToo() throws Exception {
        byte[] gz = Files.readAllBytes(input("plain.csv.gz"));
        byte[] withTail = new byte[gz.length + 5];
        System.arraycopy(gz, 0, withTail, 0, gz.length);
        DataTable t = read("x.csv.gz", withTail);
        assertEquals(withTail.length, t.source().bytes());
        assertFalse(t.source().sha256().equals(read("x.csv.gz", gz).source().sha256()));
    }

    @Test
    void gzipIsRecognisedByItsBytesNotItsName() throws Exception {
        byte[] text = Files.readAllBytes(input("plain.csv"));
        byte[] gz = Files.readAllBytes(input("plain.csv.gz"));
        assertEquals(3, read("named-plain.csv", gz).matrix().samples());
        assertEquals(3, read("named-compressed.csv.gz", text).matrix().samples());
    }

    @Test
    void locatorGivesEveryCellsLineAndColumn() throws Exception {
        Path rows = input("plain.csv");
        CellLocator byRow = DataTableReader.byFileName().read(rows).locator();
        assertEquals(rows.toString(), byRow.source());
        assertFalse(byRow.featureMajor());
        assertEquals(rows + ":2:2", byRow.locate("S1", "G1"));
        assertEquals(rows + ":4:2", byRow.locate("S3, rep", "G1"));
        assertEquals(rows + ":3:4", byRow.locate("S2", "G3"));

        Path columns = input("samples-in-columns.csv");
        CellLocator byColumn = new DataTableReader(null, true).read(columns).locator();
        assertTrue(byColumn.featureMajor());
        assertEquals(columns + ":2:4", byColumn.locate("S3, rep", "G1"));
        assertEquals(columns + ":4:3", byColumn.locate("S2", "G3"));
    }

    @Test
    void blankLinesKeepLineNumbersRight() {
        byte[] text = "\n\nid,G1,G2\n\nS1,1,2\n,,\nS2,3,x\n".getBytes(StandardCharsets.UTF_8);
        InputException e = assertThrows(InputException.class, () -> read("b.csv", text));
        assertEquals("b.csv:7:3: 'x' is not a number (sample 'S2', feature 'G2')", e.getMessage());
    }

    @Test
    void longCellsAreShortenedAndLineBreaksShownInMessages() {
        String longCell = "x".repeat(100);
        InputException e = assertThrows(InputException.class,
                () -> read("l.csv", ("id,G1\nS1,1\nS2," + longCell + "\n").getBytes(StandardCharsets.UTF_8)));
        assertTrue(e.getMessage().startsWith("l.csv:3:2: '" + "x".repeat(37) + "...' is not a number"), e.getMessage());
        assertTrue(e.getMessage().length() < 120, e.getMessage());
    }

    @Test
    void invisibleCharactersAreShownAsEscapes() {
        // A no-break space as a thousands separator, as spreadsheets in some locales write it.
        InputException e = assertThrows(InputException.class,
                () -> read("n.csv", "id,G1\nS1,1\nS2,1\u00a0234\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals("n.csv:3:2: '1\\u00A0234' is not a number (sample 'S2', feature 'G1')", e.getMessage());
    }

    @Test
    void randomTablesRoundTripExactly() {
        // Double.toString writes the shortest decimal that reads back as the same double (its javadoc), so the
        // reader must return every value bit for bit.
        var rng = new SplittableRandom(42);
        for (int trial = 0; trial < 20; trial++) {
            int n = 2 + rng.nextInt(40), p = 1 + rng.nextInt(30);
            boolean tsv = rng.nextBoolean();
            char d = tsv ? '\t' : ',';
            double[] v = new double[n * p];
            var out = new StringBuilder("id");
            for (int j = 0; j < p; j++) {
                out.append(d).append("f").append(j);
            }
            out.append(rng.nextBoolean() ? "\r\n" : "\n");
            for (int i = 0; i < n; i++) {
                out.append("s").append(i);
                for (int j = 0; j < p; j++) {
                    int kind = rng.nextInt(20);
                    v[i * p + j] = kind == 0 ? Double.NaN : kind == 1 ? rng.nextDouble() * 1e-300
                            : (rng.nextDouble() - 0.5) * Math.pow(10, rng.nextInt(-10, 10));
                    out.append(d).append(Double.isNaN(v[i * p + j]) ? "NA" : Double.toString(v[i * p + j]));
                }
                out.append("\n");
            }
            DataMatrix m = read(tsv ? "r.tsv" : "r.csv", out.toString().getBytes(StandardCharsets.UTF_8)).matrix();
            assertArrayEquals(v, m.rowMajorCopy(), 0.0);
            assertEquals(n, m.samples());
            assertEquals(p, m.features());
        }
    }

    @Test
    void transposedReadEqualsTransposeOfTheRowRead() {
        String text = "g,A,B,C\nx,1,2,3\ny,4,5,6\n";
        DataMatrix asRows = read("t.csv", text.getBytes(StandardCharsets.UTF_8)).matrix();
        DataMatrix asColumns = new DataTableReader(null, true).read("t.csv",
                new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8))).matrix();
        assertEquals(asRows.transpose().sampleIds(), asColumns.sampleIds());
        assertEquals(asRows.transpose().featureNames(), asColumns.featureNames());
        assertArrayEquals(asRows.transpose().rowMajorCopy(), asColumns.rowMajorCopy(), 0.0);
    }

    @Test
    void explicitDelimiterWinsOverTheName() {
        DataTable t = new DataTableReader(';', false).read("semi.csv",
                new ByteArrayInputStream("id;a;b\nS1;1;2\nS2;3;4\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(2, t.matrix().features());
    }

    @Test
    void unusableDelimitersAreRefused() {
        assertThrows(InputException.class, () -> new DataTableReader('"', false));
        assertThrows(InputException.class, () -> new DataTableReader('\n', false));
    }

    @Test
    void filesThatCannotBeOpenedAreNamed(@TempDir Path dir) {
        InputException missing = assertThrows(InputException.class,
                () -> DataTableReader.byFileName().read(dir.resolve("absent.csv")));
        assertEquals(dir.resolve("absent.csv") + ": no such file", missing.getMessage());
        InputException directory = assertThrows(InputException.class, () -> DataTableReader.byFileName().read(dir));
        assertEquals(dir + ": is a directory, not a table file", directory.getMessage());
    }

    @Test
    void utf8NamesAreKept() {
        byte[] text = "id,α-pinène,G2\nÉchantillon 1,1,2\n試料2,3,4\n".getBytes(StandardCharsets.UTF_8);
        DataMatrix m = read("u.csv", text).matrix();
        assertEquals("α-pinène", m.featureNames().get(0));
        assertEquals("試料2", m.sampleIds().get(1));
        var gz = new ByteArrayOutputStream();
        gz.writeBytes(ReaderFuzzTest.gzip(text));
        assertEquals(m.sampleIds(), read("u.csv.gz", gz.toByteArray()).matrix().sampleIds());
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void noIdsReadsEveryColumnAsAFeatureAndNumbersTheSamples() {
        DataTable t = new DataTableReader(null, false, true).read("iris.csv",
                new ByteArrayInputStream(utf8("sepal_length,sepal_width\n5.1,3.5\n4.9,3.0\n4.6,3.1\n4.6,3.4\n")));
        DataMatrix m = t.matrix();
        assertEquals(java.util.List.of("1", "2", "3", "4"), m.sampleIds());
        assertEquals(java.util.List.of("sepal_length", "sepal_width"), m.featureNames());
        assertArrayEquals(new double[] {5.1, 3.5, 4.9, 3.0, 4.6, 3.1, 4.6, 3.4}, m.rowMajorCopy(), 0.0);
        assertEquals("iris.csv:4:2", t.locator().locate("3", "sepal_width"));
    }

    @Test
    void wholeNumbersAreAcceptedAsFeatureNamesAndIds() {
        // Wavelengths as feature names and row numbers as ids are names, not a missing header or id column.
        DataMatrix m = read("w.csv", utf8("id,400,410\n1,0.5,0.7\n2,0.2,0.1\n")).matrix();
        assertEquals(java.util.List.of("400", "410"), m.featureNames());
        assertEquals(java.util.List.of("1", "2"), m.sampleIds());
    }

    @Test
    void aSepFirstLineSetsTheDelimiterAndLinesStillCountFromTheTopOfTheFile() {
        // A spreadsheet's "sep=;" before a ';' table in a .csv file: read with ';', and line 3 is the second row.
        DataMatrix m = read("excel.csv", utf8("sep=;\r\nid;a;b\r\nS1;1;2\r\nS2;3;4\r\n")).matrix();
        assertEquals(java.util.List.of("a", "b"), m.featureNames());
        assertArrayEquals(new double[] {1, 2, 3, 4}, m.rowMajorCopy(), 0.0);
        InputException e = assertThrows(InputException.class,
                () -> read("excel.csv", utf8("sep=;\nid;a;b\nS1;1;2\nS2;x;4\n")));
        assertTrue(e.getMessage().startsWith("excel.csv:4:2: 'x' is not a number"), e.getMessage());
        // without a name that tells the delimiter, the sep= line is enough
        assertEquals(2, read("standard input", utf8("sep=,\nid,a\nS1,1\nS2,2\n")).matrix().samples());
    }
}
