#!/usr/bin/env python3
"""Writes the binary cases of the bad-input corpus (run from this directory; Python standard library only).

Deterministic: gzip members are written with mtime=0, so the files are byte-identical on every run.
"""
import gzip

TABLE = b"id,G1,G2,G3\n" + b"".join(b"S%d,%d.5,%d,%d\n" % (i, i, 2 * i, 3 * i) for i in range(1, 41))


def gz(data):
    return gzip.compress(data, compresslevel=9, mtime=0)


def write(name, data):
    with open(name, "wb") as f:
        f.write(data)


full = gz(TABLE)
# The file stops half-way through the deflate stream.
write("truncated.csv.gz", full[: len(full) // 2])
# Only the 10-byte gzip header survives.
write("gzip-header-only.csv.gz", full[:10])
# The first deflate block header gets block type 3, which RFC 1951 reserves (an error).
write("corrupt.csv.gz", full[:10] + bytes([0x07]) + full[11:])
# The CRC-32 in the trailer (the 8 bytes before the last 4) is wrong.
crc = bytearray(full)
crc[-8] ^= 0xFF
write("bad-crc.csv.gz", bytes(crc))
# Compressed fine, but the text inside is ragged on line 3.
write("ragged-inside.tsv.gz", gz(b"id\tG1\tG2\nS1\t1\t2\nS2\t3\nS3\t4\t5\n"))
# A PNG signature and header chunk saved under a .csv name.
write("png-as-csv.csv", b"\x89PNG\r\n\x1a\n\x00\x00\x00\rIHDR\x00\x00\x00\x10")
# UTF-16 without a byte-order mark: every other byte is NUL.
write("utf16-without-bom.csv", "id,G1\nS1,1\nS2,2\n".encode("utf-16-le"))
