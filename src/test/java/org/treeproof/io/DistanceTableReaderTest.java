package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.InputException;
import org.treeproof.distance.CondensedDistances;

/**
 * Distance tables: scipy's condensed layout and values for tables it wrote, the tolerances of the symmetry and
 * diagonal checks at their boundaries, and refusals.
 */
class DistanceTableReaderTest {

    private static JsonNode reference() throws IOException {
        try (InputStream in = DistanceTableReaderTest.class.getResourceAsStream(
                "/reference/io/distance_table_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    private static Path table(String name) throws URISyntaxException {
        return Path.of(DistanceTableReaderTest.class.getResource("/input/distances/" + name).toURI());
    }

    private static DistanceTable read(String text) {
        return new DistanceTableReader(null).read("d.csv", new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void euclideanTableGivesScipysCondensedArrayExactly() throws Exception {
        // Reference: scipy.spatial.distance.pdist (scipy 1.10.1) on the first 12 Iris flowers (Fisher 1936); the
        // table is squareform of the same array, written with shortest round-trip digits, so parsing is exact.
        JsonNode ref = reference();
        DistanceTable t = new DistanceTableReader(null).read(table("iris-head-euclidean.csv"));
        List<String> ids = new ArrayList<>();
        ref.get("ids").forEach(n -> ids.add(n.asText()));
        assertEquals(ids, t.ids());
        JsonNode pdist = ref.get("euclidean");
        assertEquals(pdist.size(), CondensedDistances.length(t.distances().size()));
        for (int k = 0; k < pdist.size(); k++) {
            assertEquals(pdist.get(k).asDouble(), t.distances().at(k), 0.0, "condensed position " + k);
        }
    }

    @Test
    void correlationTableWithRoundingNoiseIsAcceptedAndMatchesScipy() throws Exception {
        // Reference: 1 - numpy.corrcoef written as a full matrix: its diagonal and its two triangles differ from 0
        // and from each other by about 2.2e-16 (recorded in the fixture), within 1e-12 of its largest distance.
        JsonNode ref = reference();
        assertTrue(ref.get("correlationTableDiagonalNoise").asDouble() > 0);
        assertTrue(ref.get("correlationTableLargestAsymmetry").asDouble() > 0);
        DistanceTable t = new DistanceTableReader(null).read(table("iris-head-correlation.csv"));
        JsonNode pdist = ref.get("correlation");
        for (int k = 0; k < pdist.size(); k++) {
            // scipy's pdist computes the correlation distance by its own route: agreement to rounding, 1e-15.
            assertEquals(pdist.get(k).asDouble(), t.distances().at(k), 1e-15, "condensed position " + k);
        }
    }

    @Test
    void handWrittenTableInConventionalLayout() {
        DistanceTable t = read("x,A,B,C,D\nA,0,1,2,3\nB,1,0,4,5\nC,2,4,0,6\nD,3,5,6,0\n");
        assertEquals(List.of("A", "B", "C", "D"), t.ids());
        // Condensed order of (0,1) (0,2) (0,3) (1,2) (1,3) (2,3), as scipy's squareform writes it.
        double[] expected = {1, 2, 3, 4, 5, 6};
        for (int k = 0; k < expected.length; k++) {
            assertEquals(expected[k], t.distances().at(k));
        }
        assertEquals(6, t.distances().get(3, 2));
        assertEquals("d.csv", t.source().path());
    }

    @Test
    void asymmetryWithinToleranceIsAveragedAndBeyondIsRefused() {
        // Largest distance 1, so the tolerance is 1e-12 absolute.
        DistanceTable t = read(",A,B,C\nA,0,1,0.5\nB,1,0,0.25\nC,0.5000000000005,0.25,0\n");
        assertEquals(0.5 / 2 + 0.5000000000005 / 2, t.distances().get(0, 2), 0.0);
        InputException e = assertThrows(InputException.class,
                () -> read(",A,B,C\nA,0,1,0.5\nB,1,0,0.25\nC,0.500000000002,0.25,0\n"));
        assertTrue(e.getMessage().startsWith("d.csv:4:2: distance 0.500000000002 (between 'C' and 'A') differs from"
                + " 0.5 at line 2, column 4"), e.getMessage());
    }

    @Test
    void theWorstAsymmetricPairIsNamed() {
        InputException e = assertThrows(InputException.class,
                () -> read(",A,B,C\nA,0,1,2\nB,1.1,0,3\nC,2,3.5,0\n"));
        assertTrue(e.getMessage().startsWith("d.csv:4:3: distance 3.5 (between 'C' and 'B')"), e.getMessage());
    }

    @Test
    void diagonalWithinToleranceIsAcceptedAndBeyondIsRefused() {
        assertEquals(0.0, read(",A,B\nA,5e-13,1\nB,1,-5e-13\n").distances().get(0, 0));
        InputException e = assertThrows(InputException.class, () -> read(",A,B\nA,0,1\nB,1,2e-12\n"));
        assertTrue(e.getMessage().startsWith("d.csv:3:3: the diagonal value of 'B' is 2.0E-12, not 0"), e.getMessage());
        // With every distance 0 the tolerance is 0 too.
        assertEquals(0.0, read(",A,B\nA,0,0\nB,0,0\n").distances().get(0, 1));
        assertThrows(InputException.class, () -> read(",A,B\nA,0,0\nB,0,1e-300\n"));
    }

    @Test
    void explicitDelimiterAndGzip() {
        byte[] gz = ReaderFuzzTest.gzip(";A;B\nA;0;2\nB;2;0\n".getBytes(StandardCharsets.UTF_8));
        DistanceTable t = new DistanceTableReader(';').read("d.dat", new ByteArrayInputStream(gz));
        assertEquals(2.0, t.distances().get(0, 1));
        assertEquals(gz.length, t.source().bytes());
    }

    @Test
    void negativeOffDiagonalIsRefusedHoweverSmall() {
        InputException e = assertThrows(InputException.class, () -> read(",A,B\nA,0,-1e-300\nB,-1e-300,0\n"));
        assertTrue(e.getMessage().startsWith("d.csv:2:3: negative distance -1.0E-300 (between 'A' and 'B')"),
                e.getMessage());
    }

    @Test
    void missingFileIsNamed() {
        InputException e = assertThrows(InputException.class,
                () -> new DistanceTableReader(null).read(Path.of("no-such-dir", "d.csv")));
        assertEquals(Path.of("no-such-dir", "d.csv") + ": no such file", e.getMessage());
    }
}
