"""Reference values for DipTestTest: the dip of Hartigan and Hartigan (1985, doi:10.1214/aos/1176346577) solved
from its definition as linear programmes with scipy (HiGHS), independently of the algorithm under test.

dip = inf over unimodal G of sup |F_n - G|. A unimodal G may be taken piecewise linear between the distinct sorted
values v_1 < ... < v_m with a slope sequence that rises and then falls (convex left of the mode, concave right of
it); F_n is constant between values, so the largest departure is at the values, on either side of each jump:
|g_j - below_j / n| <= d and |g_j - upto_j / n| <= d, where below_j and upto_j count the samples < v_j and <= v_j.
Minimising d over g and every position of the mode gives the dip exactly (ties are single jumps).

Also a simulation of sqrt(n) * dip for uniform samples (numpy default_rng, an implementation of the dip of our own
in numpy written for bench/judgement/tried/distance-dip/dipfast.py, which agrees with these programmes) at a few n,
to check the table the tool reads its p-values from (DipTableTest).

Run from this folder with python3 (numpy, scipy); writes dip_reference.json.
"""
import json, os, sys
import numpy as np
import scipy
from scipy.optimize import linprog

HERE = os.path.dirname(os.path.abspath(__file__))


def dip_lp(x):
    x = np.sort(np.asarray(x, float))
    n = len(x)
    v, upto = np.unique(x, return_counts=True)
    upto = np.cumsum(upto)
    below = upto - np.unique(x, return_counts=True)[1]
    m = len(v)
    if m < 2:
        return 0.0
    best = 1.0
    h = np.diff(v)
    for mode in range(max(1, m - 1)):
        A, b = [], []

        def row(coefs):
            r = np.zeros(m + 1)
            for k, c in coefs:
                r[k] += c
            return r
        for j in range(m):
            A.append(row([(j, 1), (m, -1)])); b.append(below[j] / n)
            A.append(row([(j, -1), (m, -1)])); b.append(-upto[j] / n)
        for j in range(m - 1):
            A.append(row([(j, 1), (j + 1, -1)])); b.append(0)
        for j in range(m - 2):
            c1 = [(j + 1, 1 / h[j]), (j, -1 / h[j])]
            c2 = [(j + 2, 1 / h[j + 1]), (j + 1, -1 / h[j + 1])]
            if j + 1 <= mode:
                A.append(row(c1 + [(k, -c) for k, c in c2])); b.append(0)
            else:
                A.append(row(c2 + [(k, -c) for k, c in c1])); b.append(0)
        c = np.zeros(m + 1); c[m] = 1
        r = linprog(c, A_ub=np.array(A), b_ub=np.array(b), bounds=[(0, 1)] * (m + 1), method="highs")
        if r.status == 0:
            best = min(best, r.x[m])
    return float(best)


def main():
    rng = np.random.default_rng(20261203)
    cases = []
    for t in range(24):
        n = int(rng.integers(10, 31))
        kind = ["uniform", "two-normals", "t2", "rounded"][t % 4]
        if kind == "uniform":
            x = rng.uniform(size=n)
        elif kind == "two-normals":
            x = np.concatenate([rng.normal(0, 1, n // 2), rng.normal(rng.uniform(1, 8), 1, n - n // 2)])
        elif kind == "t2":
            x = rng.standard_t(2, size=n)
        else:
            x = np.round(rng.normal(0, 2, size=n))  # ties
        cases.append({"kind": kind, "values": [float(v) for v in x], "dip": dip_lp(x)})
    sys.path.insert(0, os.path.join(HERE, "../../../../../bench/judgement/tried/distance-dip"))
    from dipfast import dip
    sim = []
    for n, reps in [(50, 4000), (200, 4000)]:
        s = np.sort([np.sqrt(n) * dip(rng.uniform(size=n)) for _ in range(reps)])
        sim.append({"n": n, "samples": reps, "level": [0.1, 0.05, 0.01],
                    "quantile": [float(np.quantile(s, 1 - p)) for p in (0.1, 0.05, 0.01)]})
    out = {"source": "scipy.optimize.linprog (HiGHS) on the definition; numpy simulation of uniform samples",
           "numpy": np.__version__, "scipy": scipy.__version__, "cases": cases, "uniform": sim}
    with open(os.path.join(HERE, "dip_reference.json"), "w") as f:
        json.dump(out, f, indent=1)


if __name__ == "__main__":
    main()
