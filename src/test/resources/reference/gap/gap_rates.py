#!/usr/bin/env python3
"""How often the gap rule picks each k on seeded simulated data, with scipy's average linkage doing the
clustering. The Java slow test runs the same experiment on its own random data and compares the rates.

Run from this directory:  python3 gap_rates.py   (about two minutes)

Gap statistic, rule and reference methods (a) "feature-range" and (b) "principal-box" as written in
Tibshirani, Walther & Hastie (2001), J. R. Stat. Soc. B 63:411-423, doi:10.1111/1467-9868.00293.
Simulated designs after the paper's section 6 (from memory): a null of uniform points in 2 and in
10 dimensions, and three standard-normal clusters centred at (0,0), (0,5), (5,-3), sized 1:1:2.
Sizes are 60 points here, B = 20 reference sets, K = 6.
"""
import json
import platform

import numpy as np
import scipy
from scipy.cluster.hierarchy import cut_tree, linkage

K, B, N, RUNS = 6, 20, 60, 200


def log_w(x):
    cuts = cut_tree(linkage(x, "average"), n_clusters=list(range(1, K + 1)))
    out = []
    for k in range(K):
        lab = cuts[:, k]
        w = sum(((x[lab == r] - x[lab == r].mean(0)) ** 2).sum() for r in np.unique(lab))
        out.append(np.log(w))
    return np.array(out)


def reference(x, kind, rng):
    if kind == "feature-range":
        return rng.uniform(x.min(0), x.max(0), x.shape)
    m = x.mean(0)
    _, _, vt = np.linalg.svd(x - m, full_matrices=False)
    xp = (x - m) @ vt.T
    return rng.uniform(xp.min(0), xp.max(0), xp.shape) @ vt + m


def chosen_k(x, kind, rng):
    lw = log_w(x)
    ref = np.array([log_w(reference(x, kind, rng)) for _ in range(B)])
    gap = ref.mean(0) - lw
    s = ref.std(0) * np.sqrt(1 + 1 / B)
    for k in range(K - 1):
        if gap[k] >= gap[k + 1] - s[k + 1]:
            return k + 1
    return K


def designs(rng):
    return {
        "uniform-2d": lambda: rng.uniform(size=(N, 2)),
        "uniform-10d": lambda: rng.uniform(size=(N, 10)),
        "three-groups": lambda: np.vstack([rng.standard_normal((15, 2)), rng.standard_normal((15, 2)) + [0, 5],
                                           rng.standard_normal((30, 2)) + [5, -3]]),
    }


def main():
    rng = np.random.default_rng(2001)
    rates = []
    for kind in ["feature-range", "principal-box"]:
        for name, make in designs(rng).items():
            counts = np.bincount([chosen_k(make(), kind, rng) for _ in range(RUNS)], minlength=K + 1)[1:]
            rates.append({"design": name, "kind": kind, "runs": RUNS, "countsByK": counts.tolist()})
    out = {"source": "gap_rates.py; scipy.cluster.hierarchy average linkage", "n": N, "B": B, "maxK": K,
           "versions": {"python": platform.python_version(), "numpy": np.__version__, "scipy": scipy.__version__},
           "rates": rates}
    with open("gap_rates.json", "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()
