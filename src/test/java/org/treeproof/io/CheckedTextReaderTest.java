package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The strict decoder on its own: reads of any size give the text back, and bad bytes are placed exactly. */
class CheckedTextReaderTest {

    private static CheckedTextReader reader(byte[] bytes) {
        return new CheckedTextReader("t.csv", new ByteArrayInputStream(bytes), StandardCharsets.UTF_8.newDecoder());
    }

    @Test
    void oneCharacterReadsGiveSurrogatePairsWhole() throws IOException {
        // U+1F600 needs two UTF-16 chars; a reader asked for one at a time must still return both, in order.
        String text = "a\uD83D\uDE00b\r\nc";
        var r = reader(text.getBytes(StandardCharsets.UTF_8));
        var got = new StringBuilder();
        for (int c = r.read(); c >= 0; c = r.read()) {
            got.append((char) c);
        }
        assertEquals(text, got.toString());
    }

    @Test
    void positionsCountCrLfCrAndLfAsOneLineEach() {
        // Lines: "a" (CR LF), "b" (CR), "c" (LF), then "dé" and the bad byte in column 3 of line 4.
        byte[] bytes = {'a', '\r', '\n', 'b', '\r', 'c', '\n', 'd', (byte) 0xc3, (byte) 0xa9, (byte) 0xff};
        var r = reader(bytes);
        var e = assertThrows(CheckedTextReader.NotTextException.class, () -> r.read(new char[64], 0, 64));
        assertEquals("t.csv:4:3: byte 0xFF is not valid UTF-8 text; save the table as UTF-8", e.getMessage());
    }

    @Test
    void aSequenceCutByTheEndOfTheFileIsMalformed() {
        var r = reader(new byte[] {'x', (byte) 0xe2, (byte) 0x82});
        var e = assertThrows(CheckedTextReader.NotTextException.class, () -> {
            char[] buf = new char[8];
            while (r.read(buf, 0, 8) >= 0) {
                continue;
            }
        });
        assertEquals("t.csv:1:2: byte 0xE2 is not valid UTF-8 text; save the table as UTF-8", e.getMessage());
    }
}
