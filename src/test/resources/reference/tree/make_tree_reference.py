#!/usr/bin/python3
"""Writes the reference values the org.treeproof.tree tests compare with.

Run from the repository root with the system Python (scikit-learn 1.2.1, scipy 1.10.1, numpy 1.24.2):

    /usr/bin/python3 src/test/resources/reference/tree/make_tree_reference.py

Outputs (all overwritten):
  src/test/resources/reference/iris.csv                 Fisher's Iris data as shipped in scikit-learn
  src/test/resources/reference/tree/iris_linkage.json   scipy results for every linkage on Iris, raw and z-scored
  src/test/resources/reference/tree/small_linkage.json  scipy results on the hand-worked examples and small random sets

Distances are computed here as sqrt(sum over features, in order, of (x_i - x_j)^2), the loop the Java
tests use, and checked to equal scipy.spatial.distance.pdist bit for bit, so both sides cluster the
very same doubles. The z-scored Iris matrix (population SD, ddof=0) is stored in full precision for
the same reason. JSON numbers are written with repr(), which round-trips doubles exactly.
"""
import json
import os
import sys

import numpy as np
import scipy
import sklearn
from scipy.cluster.hierarchy import cophenet, fcluster, leaves_list, linkage
from scipy.spatial.distance import pdist
from sklearn.datasets import load_iris

METHODS = ["single", "complete", "average", "weighted", "ward", "centroid", "median"]
MONOTONE = {"single", "complete", "average", "weighted", "ward"}
HERE = os.path.dirname(os.path.abspath(__file__))
REFERENCE = os.path.dirname(HERE)


def condensed(x):
    n, p = x.shape
    i, j = np.triu_indices(n, 1)
    s = np.zeros(len(i))
    for f in range(p):
        diff = x[i, f] - x[j, f]
        s += diff * diff
    d = np.sqrt(s)
    if not np.array_equal(d, pdist(x)):
        sys.exit("distance loop does not reproduce pdist exactly")
    return d


def k_state(z, n, k):
    """Labels after the first n-k rows of z, replayed with a union-find (the definition of a cut at k)."""
    parent = list(range(2 * n - 1))

    def find(a):
        while parent[a] != a:
            a = parent[a]
        return a

    for s in range(n - k):
        parent[find(int(z[s, 0]))] = n + s
        parent[find(int(z[s, 1]))] = n + s
    return [find(i) for i in range(n)]


def describe(d, n, method, max_k, with_cophenetic_vector):
    z = linkage(d, method=method)
    h = z[:, 2]
    out = {
        "merges": [[int(r[0]), int(r[1]), float(r[2]), int(r[3])] for r in z],
        "copheneticCorrelation": float(cophenet(z, d)[0]) if n > 2 else None,
        "leafOrder": [int(v) for v in leaves_list(z)],
    }
    if with_cophenetic_vector:
        out["cophenetic"] = [float(v) for v in cophenet(z)]
    cuts = []
    for k in range(2, min(max_k, n - 1) + 1):
        low, high = float(h[n - k - 1]), float(h[n - k])
        cut = {"k": k, "low": low, "high": high, "tie": low == high, "state": k_state(z, n, k)}
        if method in MONOTONE and low < high:
            # scipy's own k-cluster cut; equal to the state above when no heights tie at the cut. In scipy
            # 1.10 its binary search can stop short and return fewer than k clusters for k close to n
            # (scipy issue gh-12651, fixed by gh-21121 in 1.15); such results are left out.
            labels = fcluster(z, k, criterion="maxclust")
            if len(set(labels)) == k:
                cut["maxclust"] = [int(v) for v in labels]
        cuts.append(cut)
    out["kCuts"] = cuts
    thresholds = [0.0]
    for c in cuts:
        thresholds += [c["high"], (c["low"] + c["high"]) / 2]
    if method not in MONOTONE:
        thresholds += [float(v) for v in np.quantile(h, [0.5, 0.9, 0.99])]
    out["heightCuts"] = [{"height": t, "labels": [int(v) for v in fcluster(z, t, criterion="distance")]}
                         for t in thresholds]
    return out


def variant(x, max_k, with_cophenetic_vector=False):
    d = condensed(x)
    n = x.shape[0]
    return {"points": x.tolist(),
            "linkages": {m: describe(d, n, m, max_k, with_cophenetic_vector) for m in METHODS}}


def main():
    iris = load_iris()
    x = iris.data
    with open(os.path.join(REFERENCE, "iris.csv"), "w") as f:
        f.write("sepal_length,sepal_width,petal_length,petal_width,species\n")
        for row, t in zip(x, iris.target):
            f.write(",".join(repr(float(v)) for v in row) + "," + iris.target_names[t] + "\n")
    versions = {"python": sys.version.split()[0], "numpy": np.__version__, "scipy": scipy.__version__,
                "scikit-learn": sklearn.__version__}
    zscored = (x - x.mean(axis=0)) / x.std(axis=0)  # population SD
    iris_out = {"source": "sklearn.datasets.load_iris(); scipy.cluster.hierarchy.linkage, cophenet, fcluster, "
                          "leaves_list; script make_tree_reference.py",
                "versions": versions,
                "variants": {"raw": variant(x, 8), "zscore": variant(zscored, 8)}}
    iris_out["variants"]["raw"].pop("points")  # the tests read the raw data from iris.csv
    with open(os.path.join(HERE, "iris_linkage.json"), "w") as f:
        json.dump(iris_out, f)

    rng = np.random.default_rng(20240611)
    small = {"source": "scipy.cluster.hierarchy on hand-worked examples and seeded random points "
                       "(numpy default_rng(20240611)); script make_tree_reference.py",
             "versions": versions,
             "sets": {
                 "line5": variant(np.array([[0.0], [2.0], [3.0], [7.0], [13.0]]), 4, True),
                 "triangle": variant(np.array([[0.0, 0.0], [2.0, 0.0], [1.0, 1.8]]), 2, True),
                 "random30": variant(rng.normal(size=(30, 3)), 8, True),
                 "grid40": variant(rng.integers(0, 4, size=(40, 2)).astype(float), 8, True),
             }}
    with open(os.path.join(HERE, "small_linkage.json"), "w") as f:
        json.dump(small, f)


if __name__ == "__main__":
    main()
