#!/usr/bin/python3
"""Writes the reference values for the feature side of the data heat map (org.treeproof.chart).

Run from the repository root with the system Python (scipy 1.10.1, numpy 1.24.2):

    /usr/bin/python3 src/test/resources/reference/chart/make_heatmap_reference.py

Output (overwritten): src/test/resources/reference/chart/heatmap_features.json with two cases.

  iris      Fisher's Iris (src/test/resources/reference/iris.csv), its four measurements: each feature
            z-scored over the 150 flowers (population SD, ddof=0), features clustered by Euclidean
            distance between their profiles and average linkage; scipy's linkage matrix and leaves_list.
  selection A seeded table of 12 samples by 505 features, feature j scaled by its own factor, so the
            variances differ clearly: the 500 with the largest population variance (numpy argsort,
            stable, on minus the variance), in input order, then the same clustering of those 500.

JSON numbers are written with repr(), which round-trips doubles exactly.
"""
import csv
import json
import os

import numpy as np
import scipy
from scipy.cluster.hierarchy import leaves_list, linkage
from scipy.spatial.distance import pdist

HERE = os.path.dirname(os.path.abspath(__file__))
LIMIT = 500


def feature_tree(x):
    """Z-scores the columns of x (ddof=0, constant columns to 0), clusters the columns."""
    sd = x.std(axis=0)
    z = np.where(sd > 0, (x - x.mean(axis=0)) / np.where(sd > 0, sd, 1), 0.0)
    zl = linkage(pdist(z.T, "euclidean"), method="average")
    return zl, leaves_list(zl)


def as_json_tree(zl, order):
    return {
        "left": [int(a) for a in zl[:, 0]],
        "right": [int(b) for b in zl[:, 1]],
        "height": [float(h) for h in zl[:, 2]],
        "leafOrder": [int(i) for i in order],
    }


def main():
    with open(os.path.join(HERE, "..", "iris.csv")) as f:
        rows = list(csv.reader(f))
    iris = np.array([[float(v) for v in r[:4]] for r in rows[1:]])
    iris_tree = as_json_tree(*feature_tree(iris))

    rng = np.random.default_rng(20240611)
    n, p = 12, 505
    scale = rng.uniform(0.5, 2.0, size=p)
    x = rng.normal(size=(n, p)) * scale
    var = x.var(axis=0)
    chosen = np.sort(np.argsort(-var, kind="stable")[:LIMIT])
    sel_tree = as_json_tree(*feature_tree(x[:, chosen]))
    ranked = np.sort(var)[::-1]

    out = {
        "generator": "src/test/resources/reference/chart/make_heatmap_reference.py",
        "versions": {"numpy": np.__version__, "scipy": scipy.__version__},
        "iris": {"features": rows[0][:4], "tree": iris_tree},
        "selection": {
            "samples": n,
            "features": p,
            "values": [float(v) for v in x.reshape(-1)],
            "chosen": [int(c) for c in chosen],
            "gapAtLimit": float(ranked[LIMIT - 1] - ranked[LIMIT]),
            "tree": sel_tree,
        },
    }
    with open(os.path.join(HERE, "heatmap_features.json"), "w") as f:
        json.dump(out, f)
        f.write("\n")


if __name__ == "__main__":
    main()
