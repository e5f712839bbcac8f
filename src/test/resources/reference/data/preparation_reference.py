#!/usr/bin/python3
"""Reference values for org.treeproof.data.Preparation, written to preparation_reference.json.

Run with the interpreter that has scikit-learn: /usr/bin/python3 preparation_reference.py
Conventions reproduced here (see Preparation's javadoc): missing policy, then log2(x + 1), then the N features
of largest population variance (ties by input order, kept in input order), then scaling with population
(ddof=0) standard deviations; constant features are dropped before z-scoring.
Iris: R. A. Fisher (1936), "The use of multiple measurements in taxonomic problems", Annals of Eugenics 7(2),
179-188, doi:10.1111/j.1469-1809.1936.tb02137.x, as bundled with scikit-learn (load_iris).
"""
import json
import numpy as np
import scipy
import sklearn
from sklearn.datasets import load_iris
from sklearn.preprocessing import StandardScaler

NAN = float("nan")

# 7 samples x 6 features. F5 is constant, F6 is missing everywhere, F2 has an even number of observed values.
SMALL = np.array([
    [1.0, 10.0, 0.5, 3.0, 2.0, NAN],
    [2.0, NAN, 0.25, 3.5, 2.0, NAN],
    [4.0, 30.0, NAN, 1.0, 2.0, NAN],
    [8.0, 20.0, 0.75, NAN, 2.0, NAN],
    [16.0, NAN, 1.0, 2.5, 2.0, NAN],
    [3.0, 60.0, 0.0, 4.0, 2.0, NAN],
    [5.0, 40.0, 2.0, 0.5, 2.0, NAN],
])
SMALL_SAMPLES = ["s%d" % (i + 1) for i in range(SMALL.shape[0])]
SMALL_FEATURES = ["F%d" % (j + 1) for j in range(SMALL.shape[1])]


def impute_median(x, names):
    keep = [j for j in range(x.shape[1]) if not np.all(np.isnan(x[:, j]))]
    y = x[:, keep].copy()
    med = np.nanmedian(y, axis=0)
    rows, cols = np.where(np.isnan(y))
    y[rows, cols] = med[cols]
    return y, [names[j] for j in keep]


def drop_features(x, names):
    keep = [j for j in range(x.shape[1]) if not np.any(np.isnan(x[:, j]))]
    return x[:, keep], [names[j] for j in keep]


def drop_samples(x, ids):
    keep = [i for i in range(x.shape[0]) if not np.any(np.isnan(x[i, :]))]
    return x[keep, :], [ids[i] for i in keep]


def top_variable(x, names, n):
    var = np.var(x, axis=0)  # ddof=0
    order = np.argsort(-var, kind="stable")
    keep = sorted(order[:n])
    return x[:, keep], [names[j] for j in keep]


def zscore(x, names):
    keep = [j for j in range(x.shape[1]) if np.ptp(x[:, j]) > 0]
    y = x[:, keep]
    return (y - y.mean(axis=0)) / y.std(axis=0), [names[j] for j in keep]


def center(x):
    return x - x.mean(axis=0)


def as_json(x):
    return [[None if np.isnan(v) else float(v) for v in row] for row in x]


def case(name, prep, samples, features, x, out_samples, out_features, y, **extra):
    c = {"name": name, "preparation": prep, "samples": samples, "features": features, "values": as_json(x),
         "expected": {"samples": out_samples, "features": out_features, "values": as_json(y)}}
    c["expected"].update(extra)
    return c


cases = []
S, F, X = SMALL_SAMPLES, SMALL_FEATURES, SMALL

y, f = impute_median(X, F)
cases.append(case("impute-median", {"missing": "impute-median", "log2": False, "scale": "none", "topVariable": 0},
                  S, F, X, S, f, y, medians=[float(v) for v in np.nanmedian(X[:, :5], axis=0)]))

y, f = impute_median(X, F)
y = np.log2(y + 1)
y, f = top_variable(y, f, 3)
y, f = zscore(y, f)
cases.append(case("impute-median, log2, top 3, zscore",
                  {"missing": "impute-median", "log2": True, "scale": "zscore", "topVariable": 3}, S, F, X, S, f, y))

y, f = impute_median(X, F)
y, f = zscore(y, f)
cases.append(case("impute-median, zscore (constant F5 dropped)",
                  {"missing": "impute-median", "log2": False, "scale": "zscore", "topVariable": 0}, S, F, X, S, f, y))

y, f = impute_median(X, F)
y = center(np.log2(y + 1))
cases.append(case("impute-median, log2, center",
                  {"missing": "impute-median", "log2": True, "scale": "center", "topVariable": 0}, S, F, X, S, f, y))

y, f = drop_features(X, F)
cases.append(case("drop-features", {"missing": "drop-features", "log2": False, "scale": "none", "topVariable": 0},
                  S, F, X, S, f, y))

# Without the all-missing F6 some samples are complete.
x5 = X[:, :5]
y, s = drop_samples(x5, S)
y2, f2 = zscore(y, F[:5])
cases.append(case("drop-samples, zscore", {"missing": "drop-samples", "log2": False, "scale": "zscore", "topVariable": 0},
                  S, F[:5], x5, s, f2, y2))

iris = load_iris()
IX = iris.data
IS = ["iris-%03d" % (i + 1) for i in range(IX.shape[0])]
IF = list(iris.feature_names)
cases.append(case("iris zscore (scikit-learn StandardScaler)",
                  {"missing": "error", "log2": False, "scale": "zscore", "topVariable": 0}, IS, IF, IX, IS, IF,
                  StandardScaler().fit_transform(IX)))
y, f = top_variable(IX, IF, 2)
cases.append(case("iris top 2 by variance", {"missing": "error", "log2": False, "scale": "none", "topVariable": 2},
                  IS, IF, IX, IS, f, y, variances=[float(v) for v in np.var(IX, axis=0)]))
y = np.log2(IX + 1)
y, f = top_variable(y, IF, 3)
cases.append(case("iris log2, top 3, center", {"missing": "error", "log2": True, "scale": "center", "topVariable": 3},
                  IS, IF, IX, IS, f, center(y)))

out = {"generator": "src/test/resources/reference/data/preparation_reference.py",
       "versions": {"numpy": np.__version__, "scipy": scipy.__version__, "scikit-learn": sklearn.__version__},
       "cases": cases}
with open("preparation_reference.json", "w") as fh:
    json.dump(out, fh, indent=1)
    fh.write("\n")
