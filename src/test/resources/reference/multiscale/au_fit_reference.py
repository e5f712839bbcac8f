"""Reference values for the multiscale-bootstrap fit (AU p-values).

Run from this folder:  /usr/bin/python3 au_fit_reference.py  (writes au_fit_reference.json)

Implements the published formula directly, independently of the Java code:
  H. Shimodaira, Systematic Biology 51 (2002) 492-508, doi:10.1080/10635150290069913;
  H. Shimodaira, Annals of Statistics 32 (2004) 2616-2641, doi:10.1214/009053604000000823;
  R. Suzuki & H. Shimodaira, Bioinformatics 22 (2006) 1540-1542, doi:10.1093/bioinformatics/btl117.
At scale r, bp_r = C_r / B_r and z_r = Phi^-1(1 - bp_r); fit z_r = v sqrt(r) + c / sqrt(r) by weighted least
squares with weights 1 / var(z_r), var(z_r) = bp_r (1 - bp_r) / (B_r phi(z_r)^2), over scales with 0 < C_r < B_r.
au = 1 - Phi(v - c), bp = 1 - Phi(v + c); standard errors by the delta method from (X' W X)^-1; the fit's
chi-square is the weighted residual sum of squares on (scales used - 2) degrees of freedom.

The counts of the fixture cases are invented: two are rounded from the model itself at chosen (v, c), one has
degenerate scales (0 or all) that must be left out, one does not follow the model.
"""
import json

import numpy as np
import scipy
from scipy.stats import chi2, norm

SCALES = [0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4]


def model_counts(v, c, b):
    r = np.array(SCALES)
    bp = 1 - norm.cdf(v * np.sqrt(r) + c / np.sqrt(r))
    return [int(round(b * p)) for p in bp]


def fit(scales, reps, counts):
    r = np.asarray(scales, float)
    b = np.asarray(reps, float)
    cnt = np.asarray(counts, float)
    use = (cnt > 0) & (cnt < b)
    r, b, cnt = r[use], b[use], cnt[use]
    bp = cnt / b
    z = norm.ppf(1 - bp)
    var = bp * (1 - bp) / (b * norm.pdf(z) ** 2)
    w = 1 / var
    x = np.column_stack([np.sqrt(r), 1 / np.sqrt(r)])
    xtwx = x.T @ (w[:, None] * x)
    cov = np.linalg.inv(xtwx)
    beta = cov @ (x.T @ (w * z))
    v, c = beta
    resid = z - x @ beta
    rss = float(np.sum(w * resid ** 2))
    df = int(use.sum()) - 2
    au = 1 - norm.cdf(v - c)
    bpf = 1 - norm.cdf(v + c)
    g_au = norm.pdf(v - c) * np.array([-1.0, 1.0])
    g_bp = norm.pdf(v + c) * np.array([-1.0, -1.0])
    return {
        "v": float(v), "c": float(c), "au": float(au), "bp": float(bpf),
        "auSE": float(np.sqrt(g_au @ cov @ g_au)), "bpSE": float(np.sqrt(g_bp @ cov @ g_bp)),
        "chiSquare": rss, "df": df, "fitPValue": float(chi2.sf(rss, df)), "scalesUsed": int(use.sum()),
    }


cases = []
for name, v, c, b in [("model v=1.2 c=0.3", 1.2, 0.3, 1000), ("model v=-0.4 c=0.5", -0.4, 0.5, 500)]:
    counts = model_counts(v, c, b)
    cases.append({"name": name, "scales": SCALES, "replicates": [b] * len(SCALES), "counts": counts})
# a strong branch, rounded from the model with few replicates: the largest scales count all replicates and are
# left out of the fit
deg = model_counts(-2.5, 0.2, 100)
cases.append({"name": "degenerate large scales", "scales": SCALES, "replicates": [100] * 10, "counts": deg})
# not the model: bootstrap shares that go up and down with the scale
cases.append({"name": "poor fit", "scales": SCALES, "replicates": [1000] * 10,
              "counts": [100, 600, 150, 700, 120, 650, 200, 750, 100, 800]})
for case in cases:
    case["expected"] = fit(case["scales"], case["replicates"], case["counts"])

out = {"source": "au_fit_reference.py: the published formula with numpy " + np.__version__ + " and scipy "
       + scipy.__version__, "cases": cases}
with open("au_fit_reference.json", "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
