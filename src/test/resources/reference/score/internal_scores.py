#!/usr/bin/python3
"""Reference values of internal cluster scores on Iris cuts and on small edge-case data sets.

Run with /usr/bin/python3 (scikit-learn 1.2.1, scipy 1.10.1, numpy 1.24.2) from this directory:
    /usr/bin/python3 internal_scores.py
Writes internal_scores.json. Per data set: the data (row-major), the condensed Euclidean distances
(scipy.spatial.distance.pdist), and per partition the labels and
  - silhouette_samples / silhouette_score (scikit-learn, metric="precomputed" on the same distances),
  - calinski_harabasz_score and davies_bouldin_score (scikit-learn, on the data),
  - the Dunn index and Tibshirani's pooled W_k, from the independent numpy code below (scikit-learn
    has neither): Dunn = min distance between samples of different clusters / max distance between
    samples of one cluster; W_k = sum over clusters r of (1 / (2 n_r)) * sum over all ordered pairs
    (i, i') in r of the squared Euclidean distance, literally as Tibshirani, Walther & Hastie (2001)
    write it (no centroids).
Iris is Fisher's (1936) data as shipped by sklearn.datasets.load_iris. Its partitions are cuts of
scipy.cluster.hierarchy.linkage (average on Euclidean distances, and ward) made with cut_tree, so the
Java tests need no tree code.
"""
import json
import platform

import numpy as np
import scipy
import sklearn
from scipy.cluster.hierarchy import cut_tree, linkage
from scipy.spatial.distance import cdist, pdist, squareform
from sklearn.datasets import load_iris
from sklearn.metrics import (calinski_harabasz_score, davies_bouldin_score, silhouette_samples,
                             silhouette_score)


def dunn(D, labels):
    same = labels[:, None] == labels[None, :]
    off = ~np.eye(len(labels), dtype=bool)
    diameter = D[same & off].max() if (same & off).any() else 0.0
    separation = D[~same].min()
    return float(separation / diameter), float(separation), float(diameter)


def pooled_w(X, labels):
    total = 0.0
    for r in np.unique(labels):
        members = X[labels == r]
        total += cdist(members, members, "sqeuclidean").sum() / (2 * len(members))
    return float(total)


def entry(name, X, labels):
    labels = np.asarray(labels)
    D = squareform(pdist(X))
    k = len(np.unique(labels))
    e = {"name": name, "labels": [int(x) for x in labels], "k": k}
    e["silhouetteSamples"] = [float(x) for x in silhouette_samples(D, labels, metric="precomputed")]
    e["silhouette"] = float(silhouette_score(D, labels, metric="precomputed"))
    e["calinskiHarabasz"] = float(calinski_harabasz_score(X, labels))
    e["daviesBouldin"] = float(davies_bouldin_score(X, labels))
    e["dunn"], e["dunnSeparation"], e["dunnDiameter"] = dunn(D, labels)
    e["pooledW"] = pooled_w(X, labels)
    return e


def dataset(name, X, partitions):
    return {"name": name, "samples": X.shape[0], "features": X.shape[1],
            "data": [float(v) for v in X.ravel()], "condensed": [float(v) for v in pdist(X)],
            "partitions": partitions}


sets = []

iris = load_iris().data
parts = []
for method in ("average", "ward"):
    Z = linkage(iris, method=method, metric="euclidean")
    cuts = cut_tree(Z, n_clusters=list(range(2, 7)))
    for col, k in enumerate(range(2, 7)):
        labels = cuts[:, col]
        assert len(np.unique(labels)) == k
        parts.append(entry("iris %s k=%d" % (method, k), iris, labels))
sets.append(dataset("iris", iris, parts))

# edge cases: a singleton cluster, duplicate rows split across clusters, unequal cluster sizes
rng = np.random.default_rng(7)
X = np.vstack([rng.normal(0, 1, (6, 3)), rng.normal(4, 1, (5, 3)), [[10.0, -3.0, 2.0]]])
X = np.vstack([X, X[0]])              # row 12 duplicates row 0
labels = np.array([0] * 6 + [1] * 5 + [2] + [1])
parts = [entry("singleton and split duplicate", X, labels),
         entry("two clusters", X, np.array([0] * 6 + [1] * 7)),
         entry("interleaved", X, np.arange(13) % 3)]
sets.append(dataset("edge", X, parts))

out = {
    "source": "scikit-learn silhouette_samples, silhouette_score, calinski_harabasz_score, "
              "davies_bouldin_score; Dunn and pooled W_k by the numpy code in internal_scores.py",
    "versions": {"python": platform.python_version(), "numpy": np.__version__, "scipy": scipy.__version__,
                 "scikit-learn": sklearn.__version__},
    "datasets": sets,
}
with open("internal_scores.json", "w") as f:
    json.dump(out, f, separators=(",", ":"))
    f.write("\n")
