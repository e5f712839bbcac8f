#!/usr/bin/python3
"""Distance tables for DistanceTableReaderTest and the condensed arrays scipy makes of them.

Run with the interpreter that has scikit-learn: /usr/bin/python3 distance_table_reference.py
Writes ../../input/distances/iris-head-euclidean.csv (squareform(pdist(...)) of the first 12 Iris flowers, every
value with repr's shortest round-trip digits), ../../input/distances/iris-head-correlation.csv (1 - np.corrcoef,
computed as a full matrix, so its diagonal and symmetry carry rounding noise) and distance_table_reference.json
with scipy's condensed arrays (scipy.spatial.distance.pdist, the layout CondensedDistances uses).
Iris: R. A. Fisher (1936), Annals of Eugenics 7(2), 179-188, doi:10.1111/j.1469-1809.1936.tb02137.x,
as bundled with scikit-learn (load_iris).
"""
import json
import numpy as np
import scipy
from scipy.spatial.distance import pdist, squareform
import sklearn
from sklearn.datasets import load_iris

X = load_iris().data[:12]
ids = ["iris-%03d" % (i + 1) for i in range(X.shape[0])]


def write_table(path, ids, d):
    with open(path, "w") as fh:
        fh.write("," + ",".join(ids) + "\n")
        for i, row in zip(ids, d):
            fh.write(i + "," + ",".join(repr(float(v)) for v in row) + "\n")


euclid = pdist(X, "euclidean")
write_table("../../input/distances/iris-head-euclidean.csv", ids, squareform(euclid))

full = 1.0 - np.corrcoef(X)
write_table("../../input/distances/iris-head-correlation.csv", ids, full)
diag_noise = float(np.max(np.abs(np.diag(full))))
asym = float(np.max(np.abs(full - full.T)))

out = {"generator": "src/test/resources/reference/io/distance_table_reference.py",
       "versions": {"numpy": np.__version__, "scipy": scipy.__version__, "scikit-learn": sklearn.__version__},
       "ids": ids,
       "euclidean": [float(v) for v in euclid],
       "correlation": [float(v) for v in pdist(X, "correlation")],
       "correlationTableDiagonalNoise": diag_noise,
       "correlationTableLargestAsymmetry": asym}
with open("distance_table_reference.json", "w") as fh:
    json.dump(out, fh, indent=1)
    fh.write("\n")
