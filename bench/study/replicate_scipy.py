#!/usr/bin/env python3
"""The replicate work of a stability study done with scipy/numpy, timed per replicate:
gather the 80% subsample's rows of the full condensed matrix (sample replicates) or recompute pdist on the
subsample and a feature subset (feature replicates), average linkage, cuts at k = 2..10 (fcluster maxclust),
and the adjusted Rand index of each cut with the full-data cut (numpy contingency table).

    python3 replicate_scipy.py DATA.f64 N P REPLICATES FEATURE_FRACTION
Prints: kind <TAB> median seconds per replicate <TAB> replicates <TAB> library versions
"""
import sys
import time

import numpy as np
import scipy
from scipy.cluster.hierarchy import fcluster, linkage
from scipy.spatial.distance import pdist


def ari(a, b):
    _, ai = np.unique(a, return_inverse=True)
    _, bi = np.unique(b, return_inverse=True)
    table = np.zeros((ai.max() + 1, bi.max() + 1))
    np.add.at(table, (ai, bi), 1)
    c2 = lambda v: v * (v - 1) / 2
    s, sa, sb = c2(table).sum(), c2(table.sum(1)).sum(), c2(table.sum(0)).sum()
    e = sa * sb / c2(len(a))
    d = 0.5 * (sa + sb) - e
    return 1.0 if d == 0 else (s - e) / d


def gather(d, n, idx):
    i, j = np.triu_indices(len(idx), 1)
    a, b = idx[i], idx[j]
    return d[n * a - a * (a + 1) // 2 + (b - a - 1)]


def main():
    path, n, p, reps, ff = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), int(sys.argv[4]), float(sys.argv[5])
    x = np.fromfile(path, dtype="<f8").reshape(n, p)
    d = pdist(x)
    ref = {k: fcluster(linkage(d, "average"), k, "maxclust") for k in range(2, 11)}
    rng = np.random.default_rng(3)
    m = round(0.8 * n)
    for kind in ("sample", "feature"):
        times = []
        for b in range(reps):
            idx = np.sort(rng.choice(n, m, replace=False))
            t0 = time.perf_counter()
            if kind == "sample":
                dr = gather(d, n, idx)
            else:
                feats = np.sort(rng.choice(p, round(ff * p), replace=False))
                dr = pdist(x[np.ix_(idx, feats)])
            z = linkage(dr, "average")
            for k in range(2, 11):
                ari(ref[k][idx], fcluster(z, k, "maxclust"))
            times.append(time.perf_counter() - t0)
        print(f"{kind}\t{np.median(times):.4f}\t{reps}\tscipy {scipy.__version__}, numpy {np.__version__}")


main()
