#!/usr/bin/env python3
"""Cuts of scipy's trees for the local-separation trial (bench/judgement/README.md, "both sides ... local").

    python3 prep_cuts.py DATA.csv OUT_PREFIX [OPTIONS]

Reads a treeproof data table (ids in the first column, a header row), applies `samples-in-columns` and `log2`
when OPTIONS names them, drops features with missing values, z-scores every feature (ddof = 1, as treeproof's
default) and writes OUT_PREFIX.x (the prepared rows) and OUT_PREFIX.lab: for Ward, average and complete linkage
(scipy.cluster.hierarchy.linkage, whose trees treeproof's match) and k = 2-7, the finest cut with k branches of at
least max(5, round(1% of n)) samples, smaller branches labelled 0 (outliers), like treeproof's minimum cluster size.
Made with numpy and scipy as installed for python3 (numpy 2.4.6 and scipy 1.17.1 on 3 December 2026).
"""
import csv
import sys

import numpy as np
from scipy.cluster.hierarchy import fcluster, linkage

src, out = sys.argv[1], sys.argv[2]
opts = sys.argv[3] if len(sys.argv) > 3 else ''
rows = list(csv.reader(open(src)))
X = np.array([[float(v) if v not in ('', 'NA', 'nan') else np.nan for v in r[1:]] for r in rows[1:]])
if 'samples-in-columns' in opts:
    X = X.T
if 'log2' in opts:
    X = np.log2(X + 1)
if np.isnan(X).any():
    X = X[:, ~np.isnan(X).any(0)]
sd = X.std(0, ddof=1)
X = (X - X.mean(0)) / np.where(sd > 0, sd, 1)
np.savetxt(out + '.x', X, delimiter=',', fmt='%.8g')
minsize = max(5, int(round(0.01 * len(X))))
with open(out + '.lab', 'w') as f:
    for method in ['ward', 'average', 'complete']:
        Z = linkage(X, method)
        for k in range(2, 8):
            lab = None
            for kk in range(k, min(len(X), 60)):
                cut = fcluster(Z, kk, 'maxclust')
                big = [c for c in set(cut) if (cut == c).sum() >= minsize]
                if len(big) == k:
                    lab = cut
                    break
                if len(big) > k:
                    break
            if lab is None:
                continue
            f.write(f"{method}-k{k}," + ",".join(str(int(c) if c in big else 0) for c in lab) + "\n")
