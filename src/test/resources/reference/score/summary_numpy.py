#!/usr/bin/python3
"""Reference mean, sample standard deviation and percentile interval from numpy.

Run from this directory with python3 (numpy 1.24.2):
    /usr/bin/python3 summary_numpy.py
Writes summary_numpy.json: per case the values, numpy.mean, numpy.std(ddof=1) (null for one value)
and numpy.percentile at 2.5 and 97.5 with numpy's default method ("linear").
"""
import json
import platform

import numpy as np

rng = np.random.default_rng(99)
cases = []


def add(name, v, q=(2.5, 97.5)):
    v = np.asarray(v, dtype=float)
    cases.append({
        "name": name,
        "values": [float(x) for x in v],
        "mean": float(np.mean(v)),
        "sd": float(np.std(v, ddof=1)) if len(v) > 1 else None,
        "levelPercent": q[1] - q[0],
        "low": float(np.percentile(v, q[0])),
        "high": float(np.percentile(v, q[1])),
    })


add("one value", [0.42])
add("two values", [0.9, 0.1])
add("constant", [0.7] * 9)
add("ties", [0.2, 0.5, 0.5, 0.5, 0.9, 0.9])
for m in (3, 5, 10, 40, 41, 199, 200, 1000):
    add("uniform m=%d" % m, rng.uniform(-0.5, 1.0, m))
add("ari-like", np.clip(rng.normal(0.8, 0.1, 200), -0.5, 1.0))
add("80% interval", rng.normal(0, 1, 57), (10.0, 90.0))

out = {
    "source": "numpy.mean, numpy.std(ddof=1), numpy.percentile (method='linear')",
    "versions": {"python": platform.python_version(), "numpy": np.__version__},
    "cases": cases,
}
with open("summary_numpy.json", "w") as f:
    json.dump(out, f, separators=(",", ":"))
    f.write("\n")
