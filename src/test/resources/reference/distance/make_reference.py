#!/usr/bin/env python3
"""Reference distances for org.treeproof.distance tests, from scipy.spatial.distance.pdist.

Run with the interpreter that has SciPy 1.10.1 (here /usr/bin/python3):
    /usr/bin/python3 make_reference.py > pdist_reference.json
Every dataset is drawn from numpy.random.default_rng(seed); the data are written in full (shortest
round-trip decimal), so the Java tests need no generator and no Python.

spearman has no pdist metric: it is 1 - Spearman's rho, computed as pdist 'correlation' on each row's
average ranks (scipy.stats.rankdata, method='average'), and checked here against scipy.stats.spearmanr.
jaccard is pdist on the boolean view of 0/1 data (SciPy >= 1.2 returns 0 for two all-zero rows); the
script checks that the float view gives the same values.
"""
import json
import platform
import sys

import numpy as np
import scipy
from scipy.spatial.distance import pdist
from scipy.stats import rankdata, spearmanr

REAL = ["euclidean", "sqeuclidean", "cityblock", "chebyshev", "cosine", "correlation", "spearman"]
BINARY = ["euclidean", "sqeuclidean", "cityblock", "chebyshev", "jaccard", "hamming"]


def distances(x, metric):
    if metric == "spearman":
        return pdist(rankdata(x, method="average", axis=1), "correlation")
    if metric == "jaccard":
        d = pdist(x.astype(bool), "jaccard")
        assert np.array_equal(d, pdist(x, "jaccard"))
        return d
    return pdist(x, metric)


def check_spearman(x, d):
    n = x.shape[0]
    t = 0
    for i in range(n):
        for j in range(i + 1, n):
            if (i + j) % 7 == 0:
                rho = spearmanr(x[i], x[j]).correlation
                assert abs((1 - rho) - d[t]) < 1e-12, (i, j, 1 - rho, d[t])
            t += 1


def dataset(name, seed, x, metrics, features=None, note=""):
    sub = x if features is None else x[:, features]
    out = {"name": name, "seed": seed, "note": note, "samples": x.shape[0], "features": x.shape[1],
           "data": x.tolist(), "featureIndices": features, "distances": {}}
    for m in metrics:
        d = distances(sub, m)
        if m == "spearman":
            check_spearman(sub, d)
        assert np.all(np.isfinite(d)), (name, m)
        out["distances"][m] = d.tolist()
    return out


def main():
    sets = []
    rng = np.random.default_rng(20240601)
    sets.append(dataset("gaussian", 20240601, rng.normal(1.0, 3.0, size=(40, 37)), REAL,
                        note="N(1, 3^2); 37 features: not a multiple of 4 and more than one 32-feature chunk"))
    rng = np.random.default_rng(20240602)
    sets.append(dataset("wide-block", 20240602, rng.standard_normal((131, 45)), ["euclidean", "correlation"],
                        note="131 samples: more than one 128-sample block"))
    rng = np.random.default_rng(20240603)
    sets.append(dataset("offset", 20240603, 1000.0 + rng.standard_normal((20, 25)), REAL,
                        note="1000 + N(0,1): a large common offset, cosine distances near 0"))
    rng = np.random.default_rng(20240604)
    sets.append(dataset("ties", 20240604, rng.integers(0, 5, size=(25, 15)).astype(float), REAL,
                        note="integers 0..4: many ties within rows (average ranks)"))
    rng = np.random.default_rng(20240605)
    b = (rng.random((30, 21)) < 0.3).astype(float)
    b[4, :] = 0.0
    b[11, :] = 0.0
    b[17, :] = 1.0
    sets.append(dataset("binary", 20240605, b, BINARY,
                        note="0/1 with P(1) = 0.3; samples 4 and 11 all zero (jaccard 0/0 -> 0), sample 17 all one"))
    rng = np.random.default_rng(20240606)
    g = rng.normal(0.0, 2.0, size=(24, 30))
    idx = [int(v) for v in rng.permutation(30)[:13]]
    sets.append(dataset("subset", 20240606, g, REAL, features=idx,
                        note="distances over the listed feature indices, in that order"))
    rng = np.random.default_rng(20240607)
    bs = (rng.random((22, 40)) < 0.5).astype(float)
    idx = [int(v) for v in rng.permutation(40)[:17]]
    sets.append(dataset("binary-subset", 20240607, bs, BINARY, features=idx,
                        note="0/1 with P(1) = 0.5, distances over the listed feature indices"))
    doc = {
        "generator": "src/test/resources/reference/distance/make_reference.py",
        "python": platform.python_version(),
        "numpy": np.__version__,
        "scipy": scipy.__version__,
        "datasets": sets,
    }
    json.dump(doc, sys.stdout, indent=None, separators=(",", ":"))
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
