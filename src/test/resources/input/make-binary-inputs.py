#!/usr/bin/env python3
"""Writes the compressed and UTF-16 variants of the accepted inputs (run from this directory; standard library only).

Every variant holds the same table as plain.csv; gzip members are written with mtime=0 so the files are
byte-identical on every run.
"""
import gzip

CSV = open("plain.csv", "rb").read()
TSV = CSV.decode("utf-8").replace(",", "\t").replace('"S3\t rep"', "S3, rep").encode("utf-8")


def gz(data):
    return gzip.compress(data, compresslevel=9, mtime=0)


def write(name, data):
    with open(name, "wb") as f:
        f.write(data)


write("plain.csv.gz", gz(CSV))
write("plain.tsv.gz", gz(TSV))
# Two gzip members one after the other, as `cat a.gz b.gz` makes: one stream of text.
half = CSV.index(b"S2")
write("two-members.csv.gz", gz(CSV[:half]) + gz(CSV[half:]))
# A byte-order mark inside the compressed text.
write("bom-inside.csv.gz", gz(b"\xef\xbb\xbf" + CSV.replace(b"\n", b"\r\n")))
# What spreadsheets save as "Unicode text": UTF-16 little-endian with a byte-order mark, tab-separated.
write("utf16le-bom.txt", "\ufeff".encode("utf-16-le") + TSV.decode("utf-8").replace("\n", "\r\n").encode("utf-16-le"))
write("utf16be-bom.tsv", "\ufeff".encode("utf-16-be") + TSV.decode("utf-8").encode("utf-16-be"))
