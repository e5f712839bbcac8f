#!/usr/bin/env python3
"""Times scipy.cluster.hierarchy.linkage on benchmark points (see make_points.py).

    bench_scipy.py REPS FILE N [FILE N ...]

Prints one tab-separated line per (n, method): n, method, median wall-clock seconds, median process
CPU seconds, sum of heights. Distances
come from pdist, outside the timed region (the Java harness sums the same squared differences in the
same order, which gives the same doubles); the timed call is linkage(d, method) on the condensed
matrix, which runs on one thread.
"""
import statistics
import sys
import time

import numpy as np
import scipy
from scipy.cluster.hierarchy import linkage
from scipy.spatial.distance import pdist

METHODS = ["single", "complete", "average", "weighted", "ward", "centroid", "median"]

reps = int(sys.argv[1])
args = sys.argv[2:]
print("# scipy", scipy.__version__, "numpy", np.__version__, file=sys.stderr)
for path, n in zip(args[0::2], args[1::2]):
    n = int(n)
    x = np.fromfile(path, dtype="<f8").reshape(n, -1)
    d = pdist(x)
    for m in METHODS:
        wall, cpu = [], []
        for _ in range(reps):
            c0, t0 = time.process_time(), time.perf_counter()
            z = linkage(d, method=m)
            wall.append(time.perf_counter() - t0)
            cpu.append(time.process_time() - c0)
        print(f"{n}\t{m}\t{statistics.median(wall):.4f}\t{statistics.median(cpu):.4f}\t{z[:, 2].sum()!r}",
              flush=True)
