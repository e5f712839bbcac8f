#!/usr/bin/python3
"""Writes the open data sets of the judgement suite from scikit-learn's bundled copies.

Run with the system Python that has scikit-learn (apt-get install -y python3-sklearn):
    /usr/bin/python3 src/test/resources/judgement/make_open_sets.py
Writes open/<name>.csv (or .csv.gz), open/<name>-truth.csv and open/VERSIONS.txt beside this script.
Every table has samples in rows: an `id` column, then one column per feature, values exactly as scikit-learn ships
them (shortest round-trip decimal). The truth file has `id,class` with the class names scikit-learn gives.
Gzip output is written with a zero timestamp so that re-running the script gives identical bytes.
"""
import gzip
import io
import os
import platform
import re

import numpy
import scipy
import sklearn
from sklearn import datasets

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "open")


def column_name(raw):
    """'sepal length (cm)' -> 'sepal_length_cm': plain names, one per column."""
    return re.sub(r"[^A-Za-z0-9]+", "_", raw).strip("_")


def number(x):
    v = float(x)
    return str(int(v)) if v.is_integer() else repr(v)


def write(name, bunch, prefix, gz):
    x, y = bunch.data, bunch.target
    names = getattr(bunch, "feature_names", None)
    if names is None or len(names) != x.shape[1]:
        names = ["f%02d" % j for j in range(x.shape[1])]
    names = [column_name(str(n)) for n in names]
    classes = [str(c) for c in bunch.target_names]
    ids = ["%s%04d" % (prefix, i + 1) for i in range(x.shape[0])]
    buf = io.StringIO()
    buf.write("id," + ",".join(names) + "\n")
    for i in range(x.shape[0]):
        buf.write(ids[i] + "," + ",".join(number(v) for v in x[i]) + "\n")
    data = buf.getvalue().encode("utf-8")
    if gz:
        path = os.path.join(OUT, name + ".csv.gz")
        with open(path, "wb") as raw:
            with gzip.GzipFile(filename="", mode="wb", fileobj=raw, mtime=0, compresslevel=9) as f:
                f.write(data)
    else:
        path = os.path.join(OUT, name + ".csv")
        with open(path, "wb") as f:
            f.write(data)
    with open(os.path.join(OUT, name + "-truth.csv"), "w", newline="\n") as f:
        f.write("id,class\n")
        for i in range(x.shape[0]):
            f.write("%s,%s\n" % (ids[i], classes[int(y[i])]))
    counts = numpy.bincount(y)
    return "%s: %d samples, %d features, classes %s" % (
        os.path.basename(path), x.shape[0], x.shape[1],
        ", ".join("%s=%d" % (classes[c], counts[c]) for c in range(len(classes))))


def main():
    os.makedirs(OUT, exist_ok=True)
    lines = [
        write("iris", datasets.load_iris(), "iris", False),
        write("wine", datasets.load_wine(), "wine", False),
        write("breast-cancer", datasets.load_breast_cancer(), "bcw", True),
        write("digits", datasets.load_digits(), "dig", True),
    ]
    with open(os.path.join(OUT, "VERSIONS.txt"), "w", newline="\n") as f:
        f.write("Made by make_open_sets.py with\n")
        f.write("python %s, scikit-learn %s, numpy %s, scipy %s\n" % (
            platform.python_version(), sklearn.__version__, numpy.__version__, scipy.__version__))
        for line in lines:
            f.write(line + "\n")
    print(open(os.path.join(OUT, "VERSIONS.txt")).read(), end="")


if __name__ == "__main__":
    main()
