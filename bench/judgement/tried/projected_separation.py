#!/usr/bin/env python3
"""Tried and rejected (3 December 2026): a separation check on the line between two merging clusters.

For a cut of a tree into k clusters, every merge above the cut joins two branches A and B. The samples of A and B
are projected on the line through the two branch centroids, and two one-dimensional statistics are computed:

* critical bandwidth (Silverman 1981, doi:10.1111/j.2517-6161.1981.tb01155.x): the smallest Gaussian-kernel
  bandwidth, in units of the projection's SD, at which the kernel density has one mode (found by bisection on a
  1024-bin histogram); larger means more clearly bimodal. The statistic of a cut is the smallest over its merges.
* valley depth: the kernel density (Silverman's rule-of-thumb bandwidth, 0.9 min(SD, IQR/1.34) m^-1/5, from the
  pooled within-branch spread; Silverman 1986, eq. 3.31, from memory) at its lowest point between the two branch
  medians, divided by the lower of the two peaks on either side; 0 is an empty gap, 1 no valley. The statistic of a
  cut is the largest over its merges.
* valley test: the points within one bandwidth of that lowest point (c_v) against those within one bandwidth of
  the lower peak (c_p), one-sided binomial test of equal density, P(Binomial(c_v + c_p, 1/2) <= c_v) (our
  construction, for this trial); the statistic of a cut is the largest p over its merges.

Each is compared with the same statistic on 10 Gaussian data sets with the data's covariance (numpy, seed 1), cut
by the same linkage at the same k (a simpler null than treeproof's robust elliptical one). Data are z-scored,
trees are scipy's (which treeproof's match). Usage:

    python3 bench/judgement/tried/projected_separation.py DATA.csv [DATA.csv ...]

Made with numpy and scipy as installed for python3 (versions printed first). See bench/judgement/README.md,
"Tried and rejected: a separation check between merging clusters", for what it showed.
"""
import csv
import sys

import numpy as np
import scipy
from scipy.cluster.hierarchy import linkage
from scipy.ndimage import gaussian_filter1d
from scipy.stats import binom


def load(path):
    rows = list(csv.reader(open(path)))
    return np.array([[float(v) for v in r[1:]] for r in rows[1:]])


def zscore(x):
    return (x - x.mean(0)) / x.std(0, ddof=1)


def modes(hist, sigma_bins):
    d = gaussian_filter1d(hist.astype(float), sigma_bins, mode="constant", truncate=5)
    dd = np.diff(d)
    dd[np.abs(dd) < 1e-12] = 0
    s = np.sign(dd)
    s = s[s != 0]
    return int(np.sum((s[:-1] > 0) & (s[1:] < 0)))


def critical_bandwidth(v):
    v = (v - v.mean()) / v.std()
    lo, hi = v.min() - 1, v.max() + 1
    hist, _ = np.histogram(v, bins=1024, range=(lo, hi))
    w = (hi - lo) / 1024
    a, b = 0.01, 2.0
    if modes(hist, a / w) <= 1:
        return a
    for _ in range(25):
        m = (a + b) / 2
        if modes(hist, m / w) > 1:
            a = m
        else:
            b = m
    return b


def valley(va, vb):
    if np.median(va) > np.median(vb):
        va, vb = vb, va
    v = np.r_[va, vb]

    def spread(u):
        q = np.subtract(*np.percentile(u, [75, 25])) / 1.34
        s = u.std(ddof=1)
        return min(s, q) if q > 0 else s

    sw = np.sqrt((spread(va) ** 2 * len(va) + spread(vb) ** 2 * len(vb)) / len(v))
    h = 0.9 * sw * len(v) ** -0.2
    g = np.linspace(v.min(), v.max(), 400)
    f = np.exp(-0.5 * ((g[:, None] - v[None, :]) / h) ** 2).sum(1)
    inside = np.where((g >= np.median(va)) & (g <= np.median(vb)))[0]
    if len(inside) == 0:
        return 1.0, 1.0
    t = inside[np.argmin(f[inside])]
    left, right = np.argmax(f[: t + 1]), t + np.argmax(f[t:])
    peak = left if f[left] <= f[right] else right
    cv, cp = np.sum(np.abs(v - g[t]) <= h), np.sum(np.abs(v - g[peak]) <= h)
    return f[t] / f[peak], binom.cdf(cv, cv + cp, 0.5)


def top_merges(z, n, k):
    members = {}

    def of(i):
        i = int(i)
        if i < n:
            return [i]
        if i not in members:
            r = z[i - n]
            members[i] = of(r[0]) + of(r[1])
        return members[i]

    return [(of(r[0]), of(r[1])) for r in z[-(k - 1):]]


def cut_statistics(x, method, ks, min_size=5):
    z = linkage(x, method)
    out = {}
    for k in ks:
        bands, valleys, tests = [], [], []
        for a, b in top_merges(z, len(x), k):
            if len(a) < min_size or len(b) < min_size:
                continue  # a branch below the minimum cluster size is outliers, not a cluster
            d = x[b].mean(0) - x[a].mean(0)
            bands.append(critical_bandwidth(np.r_[x[a] @ d, x[b] @ d]))
            depth, p = valley(x[a] @ d, x[b] @ d)
            valleys.append(depth)
            tests.append(p)
        out[k] = (min(bands) if bands else np.nan, max(valleys) if valleys else np.nan,
                  max(tests) if tests else np.nan)
    return out


def main(paths):
    print(f"numpy {np.__version__}, scipy {scipy.__version__}")
    print("set method k | critical bandwidth: data, null max | valley: data, null min | valley test: largest p")
    ks = range(2, 6)
    for path in paths:
        x = zscore(load(path))
        rng = np.random.default_rng(1)
        cov = np.cov(x.T)
        for method in ("ward", "average", "complete"):
            obs = cut_statistics(x, method, ks)
            nulls = [cut_statistics(zscore(rng.multivariate_normal(np.zeros(x.shape[1]), cov, size=len(x))),
                                    method, ks) for _ in range(10)]
            for k in ks:
                nb = np.array([s[k][0] for s in nulls])
                nv = np.array([s[k][1] for s in nulls])
                print(f"{path.split('/')[-1]} {method} {k} | {obs[k][0]:.2f} {np.nanmax(nb):.2f} | "
                      f"{obs[k][1]:.2f} {np.nanmin(nv):.2f} | {obs[k][2]:.3f}")


if __name__ == "__main__":
    main(sys.argv[1:])
