#!/usr/bin/env python3
"""Writes the benchmark points: n rows of p = 10 features, a seeded mixture of five Gaussian clusters.

    make_points.py N OUT      -> OUT holds n*p little-endian float64 values, row-major

Both benchmark harnesses (scipy and Java) read this file, so they cluster identical data.
"""
import sys

import numpy as np

n, out = int(sys.argv[1]), sys.argv[2]
p = 10
rng = np.random.default_rng(1000 + n)
centres = rng.normal(scale=4.0, size=(5, p))
x = centres[rng.integers(0, 5, size=n)] + rng.normal(size=(n, p))
x.astype("<f8").tofile(out)
