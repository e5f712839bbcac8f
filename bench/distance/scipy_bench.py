#!/usr/bin/env python3
"""Times scipy.spatial.distance.pdist on the benchmark matrix; prints one tab-separated line per metric:
metric, median seconds, repetitions, scipy version.

    python3 scipy_bench.py DATA_FILE N P REPS METRIC [METRIC ...]
"""
import statistics
import sys
import time

import numpy as np
import scipy
from scipy.spatial.distance import pdist

path, n, p, reps = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), int(sys.argv[4])
x = np.fromfile(path, dtype="<f8").reshape(n, p)
for metric in sys.argv[5:]:
    times = []
    for _ in range(reps):
        t0 = time.perf_counter()
        pdist(x, metric)
        times.append(time.perf_counter() - t0)
    print(f"{metric}\t{statistics.median(times):.4f}\t{reps}\tscipy {scipy.__version__}", flush=True)
