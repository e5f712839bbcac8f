#!/usr/bin/python3
"""Reference values for org.treeproof.resample.QnScale, written to qn_reference.json.

Run with Debian's interpreter, which has statsmodels (apt-get install python3-statsmodels):
    /usr/bin/python3 qn_reference.py
statsmodels.robust.scale.qn_scale(x, c=1.0) is the k-th smallest pairwise distance |x_i - x_j|, i < j,
k = C(floor(n/2) + 1, 2) (Rousseeuw and Croux 1993, doi:10.1080/01621459.1993.10476408), with no consistency
factor and no small-sample factor; the Java class multiplies it by 1 / (sqrt(2) * Phi^-1(5/8)), which is given
here from scipy.
"""
import json
import math
import numpy as np
import scipy
import statsmodels
from scipy.stats import norm
from statsmodels.robust.scale import qn_scale

rng = np.random.default_rng(20261202)
cases = {
    "tiny": [3.0, 1.0, 2.0],
    "ties": [1.0, 1.0, 1.0, 2.0, 5.0, 5.0],
    "normal-50": rng.normal(size=50).tolist(),
    "normal-51-far": (rng.normal(size=46).tolist() + [40.0, -35.0, 55.0, 60.0, 80.0]),
    "two-modes-400": (rng.normal(-5, 1, 200).tolist() + rng.normal(5, 1, 200).tolist()),
    "t3-1000": rng.standard_t(3, 1000).tolist(),
    "uniform-999": rng.uniform(-1, 1, 999).tolist(),
}
out = {
    "generator": "qn_reference.py",
    "versions": {"numpy": np.__version__, "scipy": scipy.__version__, "statsmodels": statsmodels.__version__},
    "consistency": 1 / (math.sqrt(2) * norm.ppf(5 / 8)),
    "cases": {name: {"values": v, "kth": float(qn_scale(np.array(v), c=1.0)),
                     "mad_normalised": float(1.482602218505602 * np.median(np.abs(np.array(v) - np.median(v))))}
              for name, v in cases.items()},
}
with open("qn_reference.json", "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
