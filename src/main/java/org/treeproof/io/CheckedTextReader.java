package org.treeproof.io;

import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.util.zip.ZipException;

/**
 * Decodes bytes strictly and refuses anything that is not text, knowing the line and column of each problem.
 *
 * <p>{@link java.io.InputStreamReader} replaces or reports bad bytes somewhere inside a buffer; here every
 * character handed out is counted, so a malformed byte, a NUL or other control character, or a broken gzip
 * stream is reported at its own line and column (1-based, column counted in characters). Line breaks are
 * counted as the CSV parser counts them: LF, CR and CR LF each end one line.
 */
final class CheckedTextReader extends Reader {
    private final String source;
    private final InputStream in;
    private final CharsetDecoder decoder;
    private final ByteBuffer bytes = ByteBuffer.allocate(1 << 16);
    private boolean endOfBytes;
    private boolean flushed;
    private long line = 1;
    private long column = 1;
    private boolean afterCarriageReturn;
    /** The second half of a surrogate pair decoded for a one-character read, or -1. */
    private int pending = -1;

    /**
     * @param source  the name used in messages
     * @param in      the (already decompressed) bytes, positioned after any byte-order mark
     * @param decoder a fresh decoder for the text's charset
     */
    CheckedTextReader(String source, InputStream in, CharsetDecoder decoder) {
        this.source = source;
        this.in = in;
        this.decoder = decoder.onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        bytes.flip();
    }

    @Override
    public int read(char[] cbuf, int off, int len) throws IOException {
        if (len == 0) {
            return 0;
        }
        if (pending >= 0) {
            cbuf[off] = (char) pending;
            pending = -1;
            return 1;
        }
        if (flushed) {
            return -1;
        }
        CharBuffer out = CharBuffer.wrap(cbuf, off, len);
        while (true) {
            CoderResult r = decoder.decode(bytes, out, endOfBytes);
            int produced = out.position() - off;
            scan(cbuf, off, produced);
            if (r.isError()) {
                int bad = bytes.get(bytes.position()) & 0xff;
                throw new NotTextException(String.format("%s:%d:%d: byte 0x%02X is not valid %s text; save the table"
                        + " as UTF-8", source, line, column, bad, decoder.charset().name()));
            }
            if (produced > 0) {
                return produced;
            }
            if (r.isOverflow()) {
                // One character of room and a surrogate pair to give: hand out its first half now.
                char[] pair = new char[2];
                int n = read(pair, 0, 2);
                cbuf[off] = pair[0];
                pending = n == 2 ? pair[1] : -1;
                return 1;
            }
            if (endOfBytes) {
                flushed = true;
                decoder.flush(out);
                produced = out.position() - off;
                scan(cbuf, off, produced);
                return produced > 0 ? produced : -1;
            }
            fill();
        }
    }

    private void fill() throws NotTextException {
        bytes.compact();
        try {
            int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
            if (n < 0) {
                endOfBytes = true;
            } else {
                bytes.position(bytes.position() + n);
            }
        } catch (IOException e) {
            throw problem(source, line, column, e);
        } finally {
            bytes.flip();
        }
    }

    /** Advances the position over characters just decoded, refusing control characters a table cannot hold. */
    private void scan(char[] cbuf, int off, int count) throws NotTextException {
        for (int k = off; k < off + count; k++) {
            char c = cbuf[k];
            if (c == '\n') {
                if (!afterCarriageReturn) {
                    line++;
                }
                column = 1;
                afterCarriageReturn = false;
            } else if (c == '\r') {
                line++;
                column = 1;
                afterCarriageReturn = true;
            } else {
                if (c < 0x20 && c != '\t') {
                    String what = c == 0 ? "contains a NUL byte"
                            : String.format("contains the control character U+%04X", (int) c);
                    throw new NotTextException(String.format("%s:%d:%d: %s; this is not a text table (a binary,"
                            + " compressed or UTF-16 file without byte-order mark?)", source, line, column, what));
                }
                column++;
                afterCarriageReturn = false;
            }
        }
    }

    /**
     * The user-facing form of a failure to read the underlying bytes at a text position: gzip streams end early
     * with {@link EOFException} and report damage with {@link ZipException}.
     */
    static NotTextException problem(String source, long line, long column, IOException e) {
        if (e instanceof NotTextException n) {
            return n;
        }
        String where = source + ":" + line + ":" + column + ": ";
        if (e instanceof EOFException) {
            return new NotTextException(where + "the gzip data is truncated (the file ends inside the compressed"
                    + " stream)");
        }
        if (e instanceof ZipException) {
            return new NotTextException(where + "the gzip data is corrupt (" + e.getMessage() + ")");
        }
        return new NotTextException(where + "could not be read: " + e.getMessage());
    }

    @Override
    public void close() throws IOException {
        in.close();
    }

    /** A problem with the bytes themselves; its message is a complete user-facing line. */
    static final class NotTextException extends IOException {
        private static final long serialVersionUID = 1L;

        NotTextException(String message) {
            super(message);
        }
    }
}
