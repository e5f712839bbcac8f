#!/usr/bin/env python3
"""Reference size factors for treeproof's --library-size (LibrarySizeReferenceTest).

Draws a small table of counts (numpy default_rng(20261203): 12 samples of depth 0.4-2.5 times a base, 40 features
with negative-binomial counts, two features zero in some samples, one feature raised fourfold in half the samples)
and computes, with numpy only, as the publications state them:

* median-ratio size factors: S. Anders and W. Huber, Genome Biology 11 (2010) R106, equation 5: for each sample
  the median, over the features with a count above 0 in every sample, of count / geometric mean of the feature's
  counts over the samples;
* total-count factors: each sample's total divided by the mean total of the samples (the "total count"
  normalisation in M.-A. Dillies et al., Briefings in Bioinformatics 14 (2013) 671-683, as remembered);

and each sample's counts divided by its factor. Writes library_size_reference.json next to this script.
Versions are recorded in the output.
"""
import json
import os
import sys

import numpy as np

rng = np.random.default_rng(20261203)
n, p = 12, 40
depth = rng.uniform(0.4, 2.5, n)
base = rng.gamma(2.0, 20.0, p)
mean = np.outer(depth, base)
mean[: n // 2, 7] *= 4.0                       # a feature that differs between groups
counts = rng.negative_binomial(5, 5 / (5 + mean)).astype(float)
counts[[2, 9], 3] = 0                           # zeros: this feature cannot form a ratio
counts[5, 11] = 0

positive = (counts > 0).all(axis=0)
log_geo = np.log(counts[:, positive]).mean(axis=0)
median_ratio = np.exp(np.median(np.log(counts[:, positive]) - log_geo, axis=1))
total = counts.sum(axis=1) / counts.sum(axis=1).mean()

out = {
    "made_by": "library_size_reference.py",
    "versions": {"python": sys.version.split()[0], "numpy": np.__version__},
    "samples": [f"s{i + 1:02d}" for i in range(n)],
    "features": [f"f{j + 1:02d}" for j in range(p)],
    "counts": counts.tolist(),
    "median-ratio": {"factors": median_ratio.tolist(), "scaled": (counts / median_ratio[:, None]).tolist()},
    "total": {"factors": total.tolist(), "scaled": (counts / total[:, None]).tolist()},
}
with open(os.path.join(os.path.dirname(os.path.abspath(__file__)), "library_size_reference.json"), "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
