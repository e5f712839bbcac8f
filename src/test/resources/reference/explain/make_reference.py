"""Reference values for org.treeproof.explain (cluster-versus-rest feature tests, covariate association).

Run from this folder with the system Python (scipy, scikit-learn and statsmodels from Debian's packages):
    /usr/bin/python3 make_reference.py
Writes explain_reference.json with the library versions. Every data set is made here from a seeded numpy
generator and written into the fixture, so the Java tests need no Python.

Sources of each value:
- rank-sum p: scipy.stats.mannwhitneyu(x, y, alternative="two-sided", method="asymptotic", use_continuity=True)
  (normal approximation, tie-corrected variance, continuity correction 0.5)
- AUC: sklearn.metrics.roc_auc_score(in_cluster, values)
- Welch p: scipy.stats.ttest_ind(x, y, equal_var=False)
- Cohen's d: numpy, (mean_x - mean_y) / sqrt(((nx-1) var_x + (ny-1) var_y) / (nx+ny-2)), var with ddof=1
  (the published formula, J. Cohen 1988, computed independently of the Java code)
- q-values: statsmodels.stats.multitest.multipletests(p, method="fdr_bh")
- chi-square: scipy.stats.chi2_contingency(table, correction=False); Cramer's V:
  scipy.stats.contingency.association(table, method="cramer", correction=False)
- Fisher's exact test: scipy.stats.fisher_exact(table, alternative="two-sided")
- Kruskal-Wallis: scipy.stats.kruskal(*groups); epsilon-squared = H / ((N^2 - 1) / (N + 1)) (Tomczak & Tomczak
  2014, formula from memory), on scipy's H
"""
import json

import numpy as np
import scipy
import sklearn
import statsmodels
from scipy import stats
from scipy.stats import contingency
from sklearn.metrics import roc_auc_score
from statsmodels.stats.multitest import multipletests


def feature_case(seed, n, m, k, outliers, round_to):
    rng = np.random.default_rng(seed)
    labels = rng.integers(1, k + 1, size=n)
    labels[:k] = np.arange(1, k + 1)  # every cluster non-empty
    if outliers:
        labels[rng.choice(np.arange(k, n), size=outliers, replace=False)] = 0
    x = rng.normal(size=(n, m))
    for c in range(1, k + 1):
        x[labels == c, c % m] += 1.5  # a marker per cluster
    if round_to is not None:
        x = np.round(x, round_to)  # ties
    rows = []
    for c in range(1, k + 1):
        inside = labels == c
        rest = (labels > 0) & ~inside
        ps_w, ps_t = [], []
        per = []
        for j in range(m):
            a, b = x[inside, j], x[rest, j]
            pw = stats.mannwhitneyu(a, b, alternative="two-sided", method="asymptotic", use_continuity=True).pvalue
            pt = stats.ttest_ind(a, b, equal_var=False).pvalue
            mask = labels > 0
            auc = roc_auc_score(inside[mask].astype(int), x[mask, j])
            na, nb = len(a), len(b)
            sp = np.sqrt(((na - 1) * a.var(ddof=1) + (nb - 1) * b.var(ddof=1)) / (na + nb - 2))
            per.append({"feature": j, "auc": float(auc), "effect": float((a.mean() - b.mean()) / sp),
                        "meanIn": float(a.mean()), "meanElsewhere": float(b.mean()),
                        "pWilcoxon": float(pw), "pWelch": float(pt)})
            ps_w.append(pw)
            ps_t.append(pt)
        qw = multipletests(ps_w, method="fdr_bh")[1]
        qt = multipletests(ps_t, method="fdr_bh")[1]
        for j in range(m):
            per[j]["qWilcoxon"] = float(qw[j])
            per[j]["qWelch"] = float(qt[j])
        rows.append({"cluster": c, "features": per})
    return {"seed": seed, "labels": labels.tolist(), "data": x.tolist(), "clusters": rows}


def categorical_case(name, table):
    table = np.asarray(table)
    chi2, p, dof, expected = stats.chi2_contingency(table, correction=False)
    v = contingency.association(table, method="cramer", correction=False)
    out = {"name": name, "table": table.tolist(), "chi2": float(chi2), "pChi2": float(p), "df": int(dof),
           "minExpected": float(expected.min()), "cramersV": float(v)}
    if table.shape == (2, 2):
        out["pFisher"] = float(stats.fisher_exact(table, alternative="two-sided")[1])
    return out


def kruskal_case(seed, sizes, shift, round_to):
    rng = np.random.default_rng(seed)
    groups = [np.round(rng.normal(loc=shift * g, size=s), round_to) for g, s in enumerate(sizes)]
    h, p = stats.kruskal(*groups)
    n = sum(sizes)
    return {"seed": seed, "groups": [g.tolist() for g in groups], "h": float(h), "p": float(p),
            "epsilonSquared": float(h / ((n * n - 1) / (n + 1)))}


def main():
    rng = np.random.default_rng(11)
    bh_p = np.concatenate([rng.uniform(size=30) ** 3, [0.01, 0.01, 0.5, 1.0]])
    out = {
        "versions": {"scipy": scipy.__version__, "numpy": np.__version__, "sklearn": sklearn.__version__,
                     "statsmodels": statsmodels.__version__},
        "features": [feature_case(1, 60, 6, 3, 0, None), feature_case(2, 45, 5, 4, 5, 1),
                     feature_case(3, 80, 4, 2, 3, 0)],
        "bh": {"p": bh_p.tolist(), "q": multipletests(bh_p, method="fdr_bh")[1].tolist()},
        "categorical": [
            categorical_case("3x2 large", [[40, 10], [12, 38], [25, 25]]),
            categorical_case("2x3 large", [[30, 20, 10], [10, 20, 30]]),
            categorical_case("2x2 large", [[30, 10], [12, 28]]),
            categorical_case("2x2 small", [[8, 1], [2, 6]]),
            categorical_case("2x2 small skewed", [[3, 0], [1, 10]]),
        ],
        "kruskal": [kruskal_case(5, [12, 15, 9], 0.8, 1), kruskal_case(6, [30, 25, 20, 10], 0.3, 3),
                    kruskal_case(7, [6, 6], 1.5, 0)],
    }
    with open("explain_reference.json", "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()
