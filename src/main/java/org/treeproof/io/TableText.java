package org.treeproof.io;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PushbackInputStream;
import java.io.PushbackReader;
import java.io.UncheckedIOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.Objects;
import java.util.function.Function;
import java.util.zip.GZIPInputStream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.treeproof.data.InputException;
import org.treeproof.data.InputSource;

/**
 * The rows of a delimited text table, each with the line it starts on, read from raw bytes that may be
 * gzip-compressed, with a SHA-256 of the bytes as read.
 *
 * <p>Gzip is recognised by its magic bytes, not the file name. The text is UTF-8, or UTF-16 when it starts with
 * that byte-order mark; a UTF-8 byte-order mark is skipped. The CSV syntax is RFC 4180 with the given delimiter:
 * {@code "} quotes, {@code ""} inside quotes is a quote, LF, CR LF and CR all end a row, spaces around fields
 * are ignored. The parser is lenient about an unclosed quote and text after a closing quote so that the
 * readers, which refuse any cell with a line break and any malformed number, can name the exact cell instead of
 * an approximate position. Rows whose cells are all blank (empty lines, or {@code ,,,} as spreadsheets export
 * empty rows) are skipped. A first line {@code sep=X}, which spreadsheets write to declare the delimiter, is
 * honoured: {@code X} is the delimiter, whatever the file name or {@code --delimiter} says, and the table starts
 * on line 2.
 */
final class TableText implements Closeable {
    private final String source;
    private final char delimiter;
    /** 1 when a {@code sep=} first line was read before the parser started, else 0. */
    private final int lineOffset;
    private final HashingInputStream hashed;
    private final CSVParser parser;
    private final Iterator<CSVRecord> records;
    private long lastLineEnd;

    /** A row of the table: its cells and the 1-based line it is on. */
    record Row(int line, CSVRecord cells) {
        int size() {
            return cells.size();
        }

        String cell(int k) {
            return cells.get(k);
        }
    }

    /**
     * @param delimiter the delimiter, or {@code null} to take it from a {@code sep=} first line or else from the
     *                  source's name
     */
    private TableText(String source, Character delimiter, InputStream raw) {
        this.source = source;
        this.hashed = new HashingInputStream(raw);
        try {
            PushbackReader text = new PushbackReader(openText(), SEP_LINE_MAX);
            Character declared = declaredDelimiter(text);
            this.delimiter = declared != null ? declared
                    : delimiter != null ? delimiter : Cells.delimiterFor(source);
            this.lineOffset = declared == null ? 0 : 1;
            this.lastLineEnd = lineOffset;
            CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(this.delimiter).setQuote('"')
                    .setIgnoreEmptyLines(false).setIgnoreSurroundingSpaces(true).setTrailingData(true)
                    .setLenientEof(true).get();
            parser = format.parse(text);
        } catch (IOException e) {
            Sources.closeQuietly(raw);
            throw new InputException(message(e));
        } catch (InputException e) {
            Sources.closeQuietly(raw);
            throw e;
        }
        records = parser.iterator();
    }

    /** The longest first line that is read as a delimiter declaration: {@code sep=X} and a line break. */
    private static final int SEP_LINE_MAX = 7;

    /**
     * Reads a first line {@code sep=X} (as spreadsheets write to declare the delimiter, e.g. {@code sep=;}) and
     * returns {@code X}, leaving the text after that line; anything else is left unread and gives {@code null}.
     *
     * @throws InputException when the declared delimiter cannot delimit CSV fields
     */
    private Character declaredDelimiter(PushbackReader text) throws IOException {
        char[] head = new char[SEP_LINE_MAX];
        int got = 0;
        while (got < head.length) {
            int r = text.read(head, got, head.length - got);
            if (r < 0) {
                break;
            }
            got += r;
        }
        String start = new String(head, 0, got);
        boolean declared = got >= 5 && start.regionMatches(true, 0, "sep=", 0, 4)
                && (got == 5 || head[5] == '\n' || head[5] == '\r');
        if (!declared) {
            text.unread(head, 0, got);
            return null;
        }
        int end = 5;
        if (got > 5) {
            end = head[5] == '\r' && got > 6 && head[6] == '\n' ? 7 : 6;
        }
        text.unread(head, end, got - end);
        char d = head[4];
        if (d == '"' || d == '\n' || d == '\r' || (d < 0x20 && d != '\t')) {
            throw new InputException(source + ":1:5: the first line declares " + Cells.shown(String.valueOf(d))
                    + " as the delimiter (sep=), which cannot delimit fields");
        }
        return d;
    }

    /** Opens {@code raw} for reading; the caller closes the result, which closes {@code raw}. */
    static TableText open(String source, InputStream raw, Character delimiter) {
        return new TableText(source, delimiter == null ? null : Cells.checkDelimiter(delimiter), raw);
    }

    /**
     * Reads {@code file} with {@code parse} and closes it; the file is named in messages as given, and gives the
     * delimiter by its name unless one is given.
     */
    static <T> T parse(Path file, Character delimiter, Function<TableText, T> parse) {
        Objects.requireNonNull(file, "file");
        InputStream in = Sources.open(file);
        try {
            return parse(file.toString(), in, delimiter, parse);
        } finally {
            Sources.closeQuietly(in);
        }
    }

    /** Reads {@code in} with {@code parse} and closes it; {@code source} names it and, unless given, the delimiter. */
    static <T> T parse(String source, InputStream in, Character delimiter, Function<TableText, T> parse) {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(in, "in");
        try (TableText text = open(source, in, delimiter)) {
            return parse.apply(text);
        }
    }

    String source() {
        return source;
    }

    char delimiter() {
        return delimiter;
    }

    private CheckedTextReader openText() throws IOException {
        try {
            InputStream in = new BufferedInputStream(hashed, 1 << 16);
            in.mark(2);
            boolean gzip = in.read() == 0x1f && in.read() == 0x8b;
            in.reset();
            if (gzip) {
                // Not wrapped in a BufferedInputStream: its reads keep going until an error, which would drop the
                // text decompressed before a truncation and so the position of the problem.
                in = new GZIPInputStream(in, 1 << 16);
            }
            PushbackInputStream text = new PushbackInputStream(in, 3);
            byte[] head = text.readNBytes(3);
            int bom = bomLength(head);
            text.unread(head, bom, head.length - bom);
            Charset charset = bom != 2 ? StandardCharsets.UTF_8
                    : head[0] == (byte) 0xff ? StandardCharsets.UTF_16LE : StandardCharsets.UTF_16BE;
            return new CheckedTextReader(source, text, charset.newDecoder());
        } catch (IOException e) {
            throw CheckedTextReader.problem(source, 1, 1, e);
        }
    }

    /** 3 for a UTF-8 byte-order mark, 2 for a UTF-16 one (either byte order), else 0. */
    private static int bomLength(byte[] head) {
        int b0 = head.length > 0 ? head[0] & 0xff : -1;
        int b1 = head.length > 1 ? head[1] & 0xff : -1;
        int b2 = head.length > 2 ? head[2] & 0xff : -1;
        if (b0 == 0xef && b1 == 0xbb && b2 == 0xbf) {
            return 3;
        }
        return (b0 == 0xff && b1 == 0xfe) || (b0 == 0xfe && b1 == 0xff) ? 2 : 0;
    }

    /**
     * The first row, which is the header.
     *
     * @throws InputException when there is none, or as {@link #next()}
     */
    Row header() {
        Row header = next();
        if (header == null) {
            throw new InputException(source + ": holds no table (the file is empty or has only blank lines)");
        }
        return header;
    }

    /**
     * The next row that has a non-blank cell, or {@code null} at the end. No cell of a returned row holds a line
     * break: a quoted field over several lines is far more often an unclosed quote than a wanted name.
     *
     * @throws InputException when the bytes are not readable text or a cell holds a line break
     */
    Row next() {
        try {
            while (records.hasNext()) {
                CSVRecord r = records.next();
                // Empty lines are not skipped by the parser, so rows are contiguous: each starts on the line after
                // the previous one ended, however many lines a quoted field spans.
                long start = lastLineEnd + 1;
                lastLineEnd = parser.getCurrentLineNumber() + lineOffset;
                if (!blank(r)) {
                    if (start > Integer.MAX_VALUE) {
                        throw new InputException(source + ": more than " + Integer.MAX_VALUE + " lines");
                    }
                    Row row = new Row((int) start, r);
                    refuseLineBreaks(row);
                    return row;
                }
            }
            return null;
        } catch (UncheckedIOException e) {
            throw new InputException(message(e.getCause()));
        }
    }

    private void refuseLineBreaks(Row row) {
        for (int k = 0; k < row.size(); k++) {
            String cell = row.cell(k);
            if (cell.indexOf('\n') >= 0 || cell.indexOf('\r') >= 0) {
                throw new InputException(source + ":" + row.line() + ":" + (k + 1)
                        + ": a quoted field runs over more than one line (is a quote left open?)");
            }
        }
    }

    /**
     * Refuses a row without exactly {@code width} fields, pointing at the first missing or extra field.
     *
     * @throws InputException for a ragged row
     */
    void requireWidth(Row row, int width) {
        if (row.size() != width) {
            throw new InputException(source + ":" + row.line() + ":" + (Math.min(row.size(), width) + 1)
                    + ": this row has " + row.size() + " field" + (row.size() == 1 ? "" : "s") + " but the header has "
                    + width + (row.size() == 1 ? delimiterHint(row) : ""));
        }
    }

    /**
     * "; it holds tab characters, read with ',' as the delimiter: give --delimiter" when a row read as a single
     * field holds another usual delimiter, so a wrong guess from the file name is easy to see.
     */
    String delimiterHint(Row row) {
        String cell = row.cell(0);
        for (char c : new char[] {'\t', ',', ';', '|'}) {
            if (c != delimiter && cell.indexOf(c) >= 0) {
                return "; it holds " + Cells.delimiterName(c) + " characters, read with "
                        + Cells.delimiterName(delimiter) + " as the delimiter: give --delimiter";
            }
        }
        return "";
    }

    private static boolean blank(CSVRecord r) {
        for (String s : r) {
            if (!s.isBlank()) {
                return false;
            }
        }
        return true;
    }

    private String message(IOException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof CheckedTextReader.NotTextException) {
                return t.getMessage();
            }
        }
        return source + ":" + Math.max(1, parser == null ? 1 : parser.getCurrentLineNumber() + lineOffset)
                + ": could not be read: "
                + e.getMessage();
    }

    /**
     * Reads whatever is left of the raw bytes (so the digest covers the whole file, even bytes after the end of a
     * gzip stream) and returns the source's provenance.
     */
    InputSource finish() {
        try {
            hashed.transferTo(OutputStream.nullOutputStream());
        } catch (IOException e) {
            throw new InputException(source + ": could not be read to its end: " + e.getMessage());
        }
        return new InputSource(source, HexFormat.of().formatHex(hashed.digest.digest()), hashed.count);
    }

    @Override
    public void close() {
        try {
            parser.close();
        } catch (IOException e) {
            // Closing a file that was read only loses nothing; the reading itself succeeded or already failed.
        }
    }

    /** Passes bytes through while hashing and counting them. */
    private static final class HashingInputStream extends FilterInputStream {
        final MessageDigest digest;
        long count;

        HashingInputStream(InputStream in) {
            super(in);
            try {
                digest = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException("every Java platform has SHA-256", e);
            }
        }

        @Override
        public int read() throws IOException {
            int b = in.read();
            if (b >= 0) {
                digest.update((byte) b);
                count++;
            }
            return b;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            int n = in.read(b, off, len);
            if (n > 0) {
                digest.update(b, off, n);
                count += n;
            }
            return n;
        }

        @Override
        public long skip(long n) throws IOException {
            // Skipping would leave bytes out of the digest; read them instead.
            byte[] buf = new byte[(int) Math.min(n, 8192)];
            int r = read(buf, 0, buf.length);
            return Math.max(r, 0);
        }

        @Override
        public boolean markSupported() {
            return false;
        }
    }
}
