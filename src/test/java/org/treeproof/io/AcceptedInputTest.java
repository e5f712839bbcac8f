package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.treeproof.cli.InputOptions;
import org.treeproof.data.DataMatrix;

/**
 * Every accepted variant in {@code src/test/resources/input/} (listed in {@code accepted.tsv}: byte-order marks,
 * CR LF and mixed line ends, quoting, blank rows, spaces around numbers, every missing-value token, every
 * delimiter, gzip, UTF-16, feature-by-sample layout) reads as the same hand-written table.
 */
class AcceptedInputTest {
    /** The table every variant holds, written out by hand from plain.csv. */
    static final List<String> SAMPLES = List.of("S1", "S2", "S3, rep");
    static final List<String> FEATURES = List.of("G1", "G2", "G3");
    static final double[] VALUES = {1.5, 2, -3, 4, Double.NaN, 0.6, 7, 8, 9.25};

    record Case(String file, String args) {
        @Override
        public String toString() {
            return file + (args.isEmpty() ? "" : " " + args);
        }
    }

    static Path dir() throws URISyntaxException {
        return Path.of(AcceptedInputTest.class.getResource("/input/accepted.tsv").toURI()).getParent();
    }

    static List<Case> cases() throws IOException, URISyntaxException {
        return Files.readAllLines(dir().resolve("accepted.tsv"), StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank() && !l.startsWith("#"))
                .map(l -> l.split("\t", -1))
                .map(f -> new Case(f[0], f.length > 1 ? f[1] : ""))
                .collect(Collectors.toList());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void readsAsTheSameTable(Case c) throws IOException, URISyntaxException, NoSuchAlgorithmException {
        Path file = dir().resolve(c.file());
        InputOptions options = OptionsProbe.parse(c.args());
        DataTable t = new DataTableReader(options.delimiter().orElse(null), options.samplesInColumns()).read(file);
        DataMatrix m = t.matrix();
        assertEquals(SAMPLES, m.sampleIds());
        assertEquals(FEATURES, m.featureNames());
        assertArrayEquals(VALUES, m.rowMajorCopy(), 0.0);
        assertEquals(1, t.missingCells());
        byte[] bytes = Files.readAllBytes(file);
        assertEquals(bytes.length, t.source().bytes());
        assertEquals(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes)), t.source().sha256());
        assertEquals(file.toString(), t.source().path());
    }

    @Test
    void everyInputFileIsListed() throws IOException, URISyntaxException {
        Set<String> listed = cases().stream().map(Case::file).collect(Collectors.toCollection(TreeSet::new));
        Set<String> present;
        try (Stream<Path> files = Files.list(dir())) {
            present = files.filter(Files::isRegularFile).map(p -> p.getFileName().toString())
                    .filter(n -> !n.equals("accepted.tsv") && !n.endsWith(".py") && !n.startsWith("."))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(present, listed);
    }
}
