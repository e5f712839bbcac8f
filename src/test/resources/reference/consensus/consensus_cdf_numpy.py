"""Reference CDF of consensus values, its area and the change in area (Monti et al. 2003,
Machine Learning 52:91, doi:10.1023/A:1023949509487), computed with numpy from invented replicates.

Run from this folder:  python3 consensus_cdf_numpy.py  (writes consensus_cdf_numpy.json)

Replicates: 14 items, 40 replicates; each holds a random subset of 10 items and gives each of them a label for
k = 2, 3, 4 (random labels, every label used). Consensus of a pair at k = (replicates in which both were held
and got the same label) / (replicates in which both were held), over pairs held together at least once.
F(x) = share of those pairs with consensus <= x; area = integral of F over [0, 1] of the step function;
deltaArea(2) = area(2), deltaArea(k) = (area(k) - area(k-1)) / area(k-1).
"""
import json

import numpy as np

rng = np.random.default_rng(20031)
N, B, HELD, KS = 14, 40, 10, [2, 3, 4]
replicates = []
same = {k: np.zeros((N, N)) for k in KS}
both = np.zeros((N, N))
for _ in range(B):
    items = np.sort(rng.choice(N, HELD, replace=False))
    labels = {}
    for k in KS:
        lab = np.concatenate([np.arange(k), rng.integers(0, k, HELD - k)])
        rng.shuffle(lab)
        labels[k] = lab
        eq = (lab[:, None] == lab[None, :]).astype(float)
        same[k][np.ix_(items, items)] += eq
    both[np.ix_(items, items)] += 1
    replicates.append({"items": items.tolist(), "labels": [labels[k].tolist() for k in KS]})

iu = np.triu_indices(N, 1)
held = both[iu] > 0
out_k = []
prev = None
for k in KS:
    c = same[k][iu][held] / both[iu][held]
    xs = np.unique(c)
    f = np.array([np.mean(c <= x) for x in xs])
    widths = np.append(np.diff(xs), 1 - xs[-1])
    area = float(np.sum(widths * f))
    delta = area if prev is None else (area - prev) / prev
    out_k.append({"k": k, "x": xs.tolist(), "f": f.tolist(), "area": area, "deltaArea": float(delta),
                  "oneMinusMean": float(1 - c.mean())})
    prev = area

with open("consensus_cdf_numpy.json", "w") as fh:
    json.dump({"source": "consensus_cdf_numpy.py with numpy " + np.__version__, "n": N, "ks": KS,
               "replicates": replicates, "expected": out_k}, fh, indent=1)
    fh.write("\n")
