#!/usr/bin/python3
"""Reference values of the adjusted Rand index from scikit-learn's adjusted_rand_score.

Run with /usr/bin/python3 (scikit-learn 1.2.1, numpy 1.24.2) from this directory:
    /usr/bin/python3 ari_sklearn.py
Writes ari_sklearn.json: the library versions and, per case, the two label vectors (arbitrary
integers, not canonical) and the index. Random cases come from a seeded numpy generator.
"""
import json
import platform

import numpy as np
import sklearn
from sklearn.metrics import adjusted_rand_score

rng = np.random.default_rng(20240611)
cases = []


def add(name, a, b):
    a = [int(x) for x in a]
    b = [int(x) for x in b]
    cases.append({"name": name, "a": a, "b": b, "ari": float(adjusted_rand_score(a, b))})


# edge cases of the convention (both trivial, identical, fewer than two items)
add("one item", [3], [7])
add("two items, same", [0, 0], [5, 5])
add("two items, split vs joined", [0, 1], [2, 2])
add("both one cluster", [1] * 6, [4] * 6)
add("both all singletons", list(range(6)), [10 - x for x in range(6)])
add("one cluster vs all singletons", [0] * 6, list(range(6)))
add("identical relabelled", [2, 2, 0, 0, 1], [9, 9, 4, 4, 6])
add("one cluster vs two", [0] * 8, [0, 0, 0, 0, 1, 1, 1, 1])

# random pairs: small to moderate n, few to many clusters, labels drawn independently or perturbed
for t in range(300):
    n = int(rng.integers(2, 80))
    ka = int(rng.integers(1, 9))
    kb = int(rng.integers(1, 9))
    a = rng.integers(0, ka, size=n) * 3 + 5          # non-canonical label values
    if t % 3 == 0:
        b = a.copy()
        flip = rng.random(n) < 0.2
        b[flip] = rng.integers(0, kb, size=int(flip.sum()))
    else:
        b = rng.integers(0, kb, size=n) - 2
    add("random %d" % t, a, b)

# large tables: many clusters, so the contingency table is held sparsely
for t in range(3):
    n = 3000
    a = rng.integers(0, 1500, size=n)
    b = np.where(rng.random(n) < 0.5, a, rng.integers(0, 1500, size=n))
    add("many clusters %d" % t, a, b)

out = {
    "source": "sklearn.metrics.adjusted_rand_score",
    "versions": {"python": platform.python_version(), "numpy": np.__version__,
                 "scikit-learn": sklearn.__version__},
    "cases": cases,
}
with open("ari_sklearn.json", "w") as f:
    json.dump(out, f, separators=(",", ":"))
    f.write("\n")
