#!/usr/bin/env python3
"""Writes the study benchmark table: n samples in 4 planted groups (group g shifts features 10g..10g+9 by 1.5),
p features, standard normal noise, seed 7. Writes both a CSV (for the jar) and raw little-endian float64
row-major (for the replicate harnesses).

    python3 make_data.py N P OUT_PREFIX      # writes OUT_PREFIX.csv and OUT_PREFIX.f64
"""
import sys

import numpy as np

n, p, prefix = int(sys.argv[1]), int(sys.argv[2]), sys.argv[3]
rng = np.random.default_rng(7)
x = rng.standard_normal((n, p))
for i in range(n):
    g = i % 4
    x[i, 10 * g:10 * g + 10] += 1.5
x.astype("<f8").tofile(prefix + ".f64")
with open(prefix + ".csv", "w") as f:
    f.write("id," + ",".join(f"f{j}" for j in range(p)) + "\n")
    for i in range(n):
        f.write(f"s{i}," + ",".join(repr(float(v)) for v in x[i]) + "\n")
