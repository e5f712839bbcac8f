"""Checks dipfast.dip against the linear-programming definition (diplp.dip_lp) on 150 random samples of 4-12 values
(uniform, two normals, t with 2 df). Prints the number of mismatches beyond 1e-7 (0 with numpy 2.4.6, scipy 1.17.1)."""
import os
import numpy as np, sys
sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from diplp import dip_lp
from dipfast import dip
rng = np.random.default_rng(1)
bad = 0
for t in range(150):
    n = rng.integers(4, 13)
    kind = t % 3
    if kind == 0: x = rng.uniform(size=n)
    elif kind == 1: x = np.concatenate([rng.normal(0,1,n//2), rng.normal(rng.uniform(0,6),1,n-n//2)])
    else: x = rng.standard_t(2, size=n)
    a, b = dip_lp(x), dip(x)
    if abs(a-b) > 1e-7:
        bad += 1
        if bad < 8: print(n, kind, round(a,6), round(b,6))
print("mismatches", bad)
