package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.SplittableRandom;
import java.util.function.Function;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.Prepared;
import org.treeproof.data.Scale;

/**
 * Thousands of seeded mutations of valid tables (bit flips, deletions, insertions of delimiters, quotes, line
 * breaks, NUL and invalid UTF-8 bytes, duplicated segments, truncations, gzip of the mutated text, damaged gzip)
 * must each give a valid table or an {@link InputException} with a one-line message naming the source: never any
 * other exception. Tables that are read must also survive a random preparation on the same terms.
 */
class ReaderFuzzTest {
    private static final byte[] DATA = ("id,G1,G2,\"G 3\",G4\r\n"
            + "S1,1.5,2,-3,NA\n"
            + "S2, 4 ,,0.6,1e-3\n"
            + "\"S3, rep\",7,8,9.25,\"12\"\n"
            + "S4,0,N/A,3,4\n"
            + "S5,2.5,6,#N/A,8\n"
            + "S6,11,12,13,14\n\n").getBytes(StandardCharsets.UTF_8);
    private static final byte[] DISTANCES = (",A,B,C,D\n"
            + "A,0,1.5,2,3\n"
            + "B,1.5,0,2.5,1\n"
            + "C,2,2.5,0,0.5\n"
            + "D,3,1,0.5,0\n").getBytes(StandardCharsets.UTF_8);
    private static final byte[] INSERTS = {',', '"', '\n', '\r', '\t', ';', ' ', 0, (byte) 0xff, (byte) 0xc3,
        (byte) 0xef, 'e', '-', '.', 'N', 'A', '1'};

    @Test
    void dataReaderReturnsATableOrRefusesCleanly() {
        var rng = new SplittableRandom(0x5eed_da7aL);
        int read = 0;
        for (int k = 0; k < 6000; k++) {
            byte[] input = mutate(DATA, rng);
            boolean columns = rng.nextInt(4) == 0;
            String name = rng.nextBoolean() ? "fuzz.csv" : "fuzz.csv.gz";
            DataTable t = attempt(k, input, name, b -> new DataTableReader(null, columns).read(name,
                    new ByteArrayInputStream(b)));
            if (t != null) {
                read++;
                check(t.matrix(), t.missingCells());
                Preparation p = new Preparation(MissingPolicy.values()[rng.nextInt(4)], rng.nextBoolean(),
                        Scale.values()[rng.nextInt(3)], rng.nextInt(4));
                Prepared prepared = attempt(k, input, name, b -> p.apply(t.matrix(), t.locator()));
                if (prepared != null) {
                    check(prepared.matrix(), 0);
                    assertEquals(0, prepared.matrix().missingCount());
                }
            }
        }
        // Some mutations leave a valid table (a flipped digit, an extra space): the check above ran on them.
        assertTrue(read > 300, "only " + read + " mutated tables were readable");
    }

    @Test
    void distanceReaderReturnsATableOrRefusesCleanly() {
        var rng = new SplittableRandom(0xd15_7a2cL);
        int read = 0;
        for (int k = 0; k < 4000; k++) {
            byte[] input = mutate(DISTANCES, rng);
            DistanceTable t = attempt(k, input, "fuzz.csv", b -> new DistanceTableReader(null).read("fuzz.csv",
                    new ByteArrayInputStream(b)));
            if (t != null) {
                read++;
                assertEquals(t.ids().size(), t.distances().size());
                assertTrue(t.ids().size() >= 2);
                for (int i = 0; i < t.distances().size(); i++) {
                    for (int j = 0; j < t.distances().size(); j++) {
                        double d = t.distances().get(i, j);
                        assertTrue(d >= 0 && Double.isFinite(d) && d == t.distances().get(j, i));
                    }
                }
            }
        }
        // Symmetry leaves few mutations valid (a doubled space, a trailing blank line); there must be some.
        assertTrue(read > 10, "only " + read + " mutated tables were readable");
    }

    /** The result, or null after a clean refusal; any other throwable fails the test with the input shown. */
    private static <T> T attempt(int k, byte[] input, String name, Function<byte[], T> f) {
        try {
            return f.apply(input);
        } catch (InputException e) {
            String m = e.getMessage();
            assertFalse(m.contains("\n") || m.contains("\r"), "two lines: " + m);
            assertTrue(m.startsWith(name) || m.startsWith("input") || m.startsWith("--"), "unnamed source: " + m);
            return null;
        } catch (Throwable e) {
            fail("mutation " + k + " threw " + e + " for " + HexFormat.of().formatHex(input), e);
            return null;
        }
    }

    private static void check(DataMatrix m, long missing) {
        assertTrue(m.samples() >= 2 && m.features() >= 1, m.toString());
        assertEquals(missing, m.missingCount());
        for (double v : m.rowMajorCopy()) {
            assertFalse(Double.isInfinite(v));
        }
    }

    static byte[] mutate(byte[] base, SplittableRandom rng) {
        byte[] b = base.clone();
        int edits = 1 + rng.nextInt(4);
        for (int e = 0; e < edits && b.length > 0; e++) {
            int at = rng.nextInt(b.length);
            switch (rng.nextInt(6)) {
                case 0 -> b[at] ^= (byte) (1 << rng.nextInt(8));
                case 1 -> b = splice(b, at, Math.min(b.length, at + 1 + rng.nextInt(8)), new byte[0]);
                case 2 -> b = splice(b, at, at, new byte[] {INSERTS[rng.nextInt(INSERTS.length)]});
                case 3 -> {
                    int end = Math.min(b.length, at + 1 + rng.nextInt(20));
                    b = splice(b, at, at, Arrays.copyOfRange(b, at, end));
                }
                case 4 -> b = Arrays.copyOf(b, at);
                default -> b[at] = (byte) rng.nextInt(256);
            }
        }
        int wrap = rng.nextInt(10);
        if (wrap < 2) {
            b = gzip(b);
            if (wrap == 1 && b.length > 0) {
                int at = rng.nextInt(b.length);
                b = rng.nextBoolean() ? Arrays.copyOf(b, at) : flip(b, at, rng);
            }
        } else if (wrap == 2) {
            byte[][] marks = {{(byte) 0xef, (byte) 0xbb, (byte) 0xbf}, {(byte) 0xff, (byte) 0xfe},
                {(byte) 0xfe, (byte) 0xff}};
            b = splice(b, 0, 0, marks[rng.nextInt(marks.length)]);
        }
        return b;
    }

    private static byte[] flip(byte[] b, int at, SplittableRandom rng) {
        b[at] ^= (byte) (1 << rng.nextInt(8));
        return b;
    }

    private static byte[] splice(byte[] b, int from, int to, byte[] insert) {
        byte[] r = new byte[b.length - (to - from) + insert.length];
        System.arraycopy(b, 0, r, 0, from);
        System.arraycopy(insert, 0, r, from, insert.length);
        System.arraycopy(b, to, r, from + insert.length, b.length - to);
        return r;
    }

    static byte[] gzip(byte[] b) {
        try {
            var out = new ByteArrayOutputStream();
            try (var gz = new GZIPOutputStream(out)) {
                gz.write(b);
            }
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
