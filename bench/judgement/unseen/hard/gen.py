#!/usr/bin/env python3
"""Hard data sets for judging treeproof's verdict (fresh kinds, not in bench/judgement/unseen/gen.py).

Usage: python3 gen.py [OUTDIR]   (default ./hard-data)

Every set gets its own numpy Generator from SeedSequence(20261208).spawn(...), in the fixed order of SETS below,
so adding a set at the end leaves the earlier ones unchanged. Writes per set:
  NAME.csv      samples in rows (id column + features), or features in rows for sets with --samples-in-columns
  NAME.truth.csv  id,class  (only when groups are planted; usable as --labels)
  NAME.opts     the options the data genuinely need (e.g. --log2 --samples-in-columns, --missing impute-median)
  answers.tsv   name, planted, right answer, reason
Names: N-... no groups planted, S<k>-... k groups planted.
"""
import os
import sys

import numpy as np

OUT = sys.argv[1] if len(sys.argv) > 1 else "hard-data"
os.makedirs(OUT, exist_ok=True)
MASTER = 20261208
SETS = []          # (name, function)
ANSWERS = []       # (name, planted, right, reason)


def register(name, planted, right, reason):
    def deco(fn):
        SETS.append((name, fn))
        ANSWERS.append((name, planted, right, reason))
        return fn
    return deco


def fmt(v):
    if isinstance(v, float) and np.isnan(v):
        return "NA"
    if float(v).is_integer() and abs(v) < 1e15:
        return str(int(v))
    return f"{v:.5f}"


def save(name, X, truth=None, opts=None):
    n, p = X.shape
    ids = [f"s{i+1:04d}" for i in range(n)]
    with open(os.path.join(OUT, name + ".csv"), "w") as f:
        f.write("id," + ",".join(f"f{j+1:03d}" for j in range(p)) + "\n")
        for i in range(n):
            f.write(ids[i] + "," + ",".join(fmt(float(v)) for v in X[i]) + "\n")
    extras(name, ids, truth, opts)


def save_cols(name, G, truth=None, opts="--samples-in-columns --log2"):
    """Counts with genes in rows, samples in columns."""
    ids = [f"s{i+1:03d}" for i in range(G.shape[1])]
    with open(os.path.join(OUT, name + ".csv"), "w") as f:
        f.write("gene," + ",".join(ids) + "\n")
        for j in range(G.shape[0]):
            f.write(f"g{j+1:04d}," + ",".join(str(int(x)) for x in G[j]) + "\n")
    extras(name, ids, truth, opts)


def extras(name, ids, truth, opts):
    for ext in (".truth", ".truth.csv", ".opts"):
        if os.path.exists(os.path.join(OUT, name + ext)):
            os.remove(os.path.join(OUT, name + ext))
    if truth is not None:
        with open(os.path.join(OUT, name + ".truth.csv"), "w") as f:
            f.write("id,class\n")
            for i, t in zip(ids, truth):
                f.write(f"{i},g{int(t)}\n")
    if opts:
        with open(os.path.join(OUT, name + ".opts"), "w") as f:
            f.write(opts + "\n")


def equicorr(p, rho):
    return np.full((p, p), rho) + (1 - rho) * np.eye(p)


def ar1(p, rho):
    return rho ** np.abs(np.subtract.outer(np.arange(p), np.arange(p)))


def unit_dirs(r, k, p, norm):
    C = r.standard_normal((k, p))
    return C / np.linalg.norm(C, axis=1)[:, None] * norm


# ------------------------------------------------------------------ no groups planted (N-)

@register("N-blockcorr-p60", "200 Gaussian samples, 60 features in 6 blocks of 10 with within-block correlation 0.85",
          "none", "one multivariate normal: strong correlation makes it elongated, but it is unimodal")
def n_blockcorr(r):
    S = np.kron(np.eye(6), equicorr(10, 0.85))
    return dict(X=r.standard_normal((200, 60)) @ np.linalg.cholesky(S).T)


@register("N-sheet-p300", "150 samples uniform on a 2-D square, mapped smoothly (random sinusoids) into 300 features + noise 0.3",
          "none", "a uniform sheet on a low-dimensional manifold: no density gaps, only a curved continuum")
def n_sheet(r):
    Z = r.uniform(0, 3, (150, 2))
    W = r.normal(0, 0.6, (2, 300)); ph = r.uniform(0, 2 * np.pi, 300)
    return dict(X=np.sin(Z @ W + ph) + 0.3 * r.standard_normal((150, 300)))


@register("N-mixed-types", "200 samples: 6 Gaussian, 4 binary (p 0.3-0.6), 4 ordinal 1-5, 2 Poisson(3) features, all independent",
          "none", "independent features of mixed kinds; discrete values tie but no features co-vary, so no groups")
def n_mixed(r):
    n = 200
    cont = r.standard_normal((n, 6))
    binf = (r.random((n, 4)) < r.uniform(0.3, 0.6, 4)).astype(float)
    ordf = np.clip(np.round(3 + 1.1 * r.standard_normal((n, 4))), 1, 5)
    cnt = r.poisson(3, (n, 2)).astype(float)
    return dict(X=np.hstack([cont, binf, ordf, cnt]))


@register("N-duplicates", "120 Gaussian samples (p 8); 30 of them present twice and 8 of them 5 times (exact copies), n 182",
          "none", "duplicated records are copies, not subtypes; five identical copies reach the default minimum cluster size of 5")
def n_dup(r):
    B = r.standard_normal((120, 8))
    rows = list(range(120)) + list(range(30)) + [i for i in range(30, 38) for _ in range(4)]
    rows = np.array(rows); r.shuffle(rows)
    return dict(X=B[rows])


@register("N-floor-ceiling", "200 respondents x 12 percentages (AR(1) 0.5 Gaussian, mean 50, SD 45) clipped to 0-100 and rounded",
          "none", "floor and ceiling effects pile about 13% of each feature on 0 and on 100 (ties), but the law is one Gaussian")
def n_floor(r):
    Z = r.standard_normal((200, 12)) @ np.linalg.cholesky(ar1(12, 0.5)).T
    return dict(X=np.round(np.clip(50 + 45 * Z, 0, 100)))


@register("N-fork-p6", "240 samples along a Y-shaped branching trajectory (trunk 6 long, two arms 7.2 long) in a random plane of 6 features, noise 0.6",
          "none", "a continuum with a fork: the arms meet the trunk without a gap; cuts are segments of a path")
def n_fork(r):
    n = 240
    L1, L2 = 6.0, np.hypot(6, 4)
    s = r.uniform(0, L1 + 2 * L2, n)
    P = np.zeros((n, 2))
    trunk = s < L1; P[trunk, 0] = s[trunk]
    for k, sign in ((0, 1), (1, -1)):
        m = (s >= L1 + k * L2) & (s < L1 + (k + 1) * L2)
        u = (s[m] - L1 - k * L2) / L2
        P[m, 0] = 6 + 6 * u; P[m, 1] = sign * 4 * u
    Q, _ = np.linalg.qr(r.standard_normal((6, 2)))
    return dict(X=P @ Q.T + 0.6 * r.standard_normal((n, 6)))


@register("N-missing-10pct", "200 Gaussian samples, 15 features AR(1) 0.6, 10% of cells missing at random (NA); run with --missing impute-median",
          "none", "one Gaussian; imputed medians tie values at the centre but make no groups")
def n_missing(r):
    X = r.standard_normal((200, 15)) @ np.linalg.cholesky(ar1(15, 0.6)).T
    X[r.random(X.shape) < 0.10] = np.nan
    return dict(X=X, opts="--missing impute-median")


@register("N-counts-pseudotime-cols", "counts, 500 genes x 80 samples (genes in rows): 100 genes rise 8-fold and 100 fall 8-fold along a uniform pseudotime, library sizes log-SD 0.3",
          "none", "a continuous developmental gradient, no groups")
def n_pseudotime(r):
    G, n = 500, 80
    t = r.uniform(0, 1, n)
    base = np.exp(r.normal(3, 1.2, (G, 1)))
    lf = np.zeros((G, n)); lf[:100] = 3 * t[None, :] * np.log(2); lf[100:200] = 3 * (1 - t[None, :]) * np.log(2)
    mu = base * np.exp(lf) * np.exp(r.normal(0, 0.3, (1, n)))
    return dict(G=r.negative_binomial(5, 5 / (5 + mu)))


@register("N-random-walk", "200 time-ordered samples of a 10-feature random walk (steps SD 0.3) observed with noise SD 0.5",
          "none", "a slow continuous drift: consecutive samples are close, there are no discrete states")
def n_walk(r):
    steps = 0.3 * r.standard_normal((200, 10))
    return dict(X=np.cumsum(steps, axis=0) + 0.5 * r.standard_normal((200, 10)))


@register("N-n30-counts-cols", "counts, 300 genes x 30 samples (genes in rows), one population, library sizes log-SD 0.4",
          "none", "small n of counts from one population")
def n_n30_counts(r):
    mu = np.exp(r.normal(3, 1.4, (300, 1))) * np.exp(r.normal(0, 0.4, (1, 30)))
    return dict(G=r.negative_binomial(5, 5 / (5 + mu)))


# ------------------------------------------------------------------ groups planted (S<k>-)

@register("S3-sizes-400-40-12", "groups of 400, 40 and 12 in 10 features; small groups' centres 6 from the big one's, random directions",
          "k = 3", "three Gaussian groups, each pair at least ~6 SDs apart; 12 exceeds the minimum cluster size (5)")
def s_sizes(r):
    C = np.vstack([np.zeros(10), unit_dirs(r, 2, 10, 6.0)])
    sizes = [400, 40, 12]; t = np.repeat([0, 1, 2], sizes)
    return dict(X=r.standard_normal((sum(sizes), 10)) + C[t], truth=t)


@register("S2-variance-only", "two groups of 100 in 40 features with the same mean, SD 1 and SD 2",
          "k = 2", "the groups differ only in spread; in 40 features the tight group is a dense core (distances ~9) inside a broad shell (~18)")
def s_var(r):
    t = np.repeat([0, 1], 100)
    return dict(X=r.standard_normal((200, 40)) * np.where(t == 0, 1.0, 2.0)[:, None], truth=t)


@register("S3-manifold-p300", "three blobs (70/50/40) in a 2-D latent plane (centres 3 apart, SD 0.45) mapped smoothly into 300 features + noise 0.3",
          "k = 3", "groups separated by ~6.7 SDs on the manifold; all 300 features carry them")
def s_manifold(r):
    C = np.array([[0, 0], [3, 0], [1.5, 2.6]]); sizes = [70, 50, 40]; t = np.repeat([0, 1, 2], sizes)
    Z = C[t] + 0.45 * r.standard_normal((160, 2))
    W = r.normal(0, 0.6, (2, 300)); ph = r.uniform(0, 2 * np.pi, 300)
    return dict(X=np.sin(Z @ W + ph) + 0.3 * r.standard_normal((160, 300)), truth=t)


@register("S3-crossed-batch", "3 groups x 2 batches of 40 (240), 30 features: group g +4 on its own 5 features; batch 2 +2 on all 30",
          "k = 3 (k = 6 groups-within-batches defensible; k = 2 = batches is wrong)", "group centres 12.6 apart, batch shift 11 apart: the batch is as large as the biology")
def s_crossed(r):
    g = np.repeat(np.arange(3), 80); b = np.tile(np.repeat([0, 1], 40), 3)
    X = r.standard_normal((240, 30))
    for k in range(3):
        X[g == k, 5 * k:5 * k + 5] += 4
    X[b == 1] += 2
    return dict(X=X, truth=g)


@register("S2-mixed-types", "two groups (110/90): 5 binary (p 0.75 vs 0.25), 5 ordinal 1-5 (latent 2.2 vs 3.8), 5 Gaussian (shift 1.5), plus 5 Gaussian and 3 binary noise features",
          "k = 2", "the groups differ on 15 of 23 features of three kinds")
def s_mixed(r):
    t = np.repeat([0, 1], [110, 90]); n = 200
    binf = (r.random((n, 5)) < np.where(t == 0, 0.75, 0.25)[:, None]).astype(float)
    ordf = np.clip(np.round(np.where(t == 0, 2.2, 3.8)[:, None] + r.standard_normal((n, 5))), 1, 5)
    cont = r.standard_normal((n, 5)) + 1.5 * t[:, None]
    noise = r.standard_normal((n, 5)); nb = (r.random((n, 3)) < 0.5).astype(float)
    return dict(X=np.hstack([binf, ordf, cont, noise, nb]), truth=t)


@register("S3-duplicates", "three groups of 50 (centres 6 from the origin in 8 features); 20 samples present twice, 6 present 5 times; n 194",
          "k = 3", "real groups plus duplicated records; copies should not become clusters of their own")
def s_dup(r):
    C = unit_dirs(r, 3, 8, 6.0); t0 = np.repeat([0, 1, 2], 50)
    B = r.standard_normal((150, 8)) + C[t0]
    pick = r.permutation(150)
    rows = list(range(150)) + list(pick[:20]) + [i for i in pick[20:26] for _ in range(4)]
    rows = np.array(rows); r.shuffle(rows)
    return dict(X=B[rows], truth=t0[rows])


@register("S2-n30", "n 30: two groups of 15 in 20 features, the second shifted 1.2 SD on every feature",
          "k = 2", "means 5.4 SDs apart along their difference; small n")
def s_n30(r):
    t = np.repeat([0, 1], 15)
    return dict(X=r.standard_normal((30, 20)) + 1.2 * t[:, None], truth=t)


@register("S3-counts-uneven-cols", "counts, 1000 genes x 53 samples (genes in rows), subtypes of 30/15/8 each 3-fold up on their own 50 genes, library sizes log-SD 0.2",
          "k = 3", "three subtypes on 15% of the genes; the smallest (8) exceeds the minimum cluster size")
def s_counts(r):
    sizes = [30, 15, 8]; t = np.repeat([0, 1, 2], sizes); n = sum(sizes)
    mu = np.exp(r.normal(3, 1.4, (1000, 1))) * np.ones((1000, n))
    for k in range(3):
        mu[50 * k:50 * k + 50][:, t == k] *= 3
    mu = mu * np.exp(r.normal(0, 0.2, (1, n)))
    return dict(G=r.negative_binomial(4, 4 / (4 + mu)), truth=t)


@register("S2-missing-15pct", "two groups (90/70), 12 features, shift 2.5 on 6 of them, 15% of cells missing at random; run with --missing impute-median",
          "k = 2", "groups 6.1 SDs apart; missing cells blur but do not remove them")
def s_missing(r):
    t = np.repeat([0, 1], [90, 70])
    X = r.standard_normal((160, 12)); X[t == 1, :6] += 2.5
    X[r.random(X.shape) < 0.15] = np.nan
    return dict(X=X, truth=t, opts="--missing impute-median")


@register("S3-tied-3levels", "three groups of 60, 15 features, +1.8 on its own 5 features (latent), every value quantised to -1/0/1 (cut at +-0.6)",
          "k = 3", "heavily tied calls (three levels) from three well-separated latent groups")
def s_tied(r):
    t = np.repeat([0, 1, 2], 60)
    Z = r.standard_normal((180, 15))
    for k in range(3):
        Z[t == k, 5 * k:5 * k + 5] += 1.8
    return dict(X=(Z > 0.6).astype(float) - (Z < -0.6).astype(float), truth=t)


@register("S2-contrast-correlated", "two groups of 100, 20 features equicorrelated 0.9; group 2 +0.6 on features 1-10 and -0.6 on 11-20",
          "k = 2", "along the contrast the noise SD is 0.32 and the groups are 2.7 apart (8.5 SDs): two long parallel cigars with a clear gap")
def s_contrast(r):
    t = np.repeat([0, 1], 100)
    X = r.standard_normal((200, 20)) @ np.linalg.cholesky(equicorr(20, 0.9)).T
    X[t == 1, :10] += 0.6; X[t == 1, 10:] -= 0.6
    return dict(X=X, truth=t)


def main():
    seqs = np.random.SeedSequence(MASTER).spawn(len(SETS))
    for (name, fn), ss in zip(SETS, seqs):
        d = fn(np.random.default_rng(ss))
        if "G" in d:
            save_cols(name, d["G"], d.get("truth"))
        else:
            save(name, d["X"], d.get("truth"), d.get("opts"))
    with open(os.path.join(OUT, "answers.tsv"), "w") as f:
        f.write("name\tplanted\tright\treason\n")
        for a in ANSWERS:
            f.write("\t".join(a) + "\n")
    print(f"wrote {len(SETS)} sets to {OUT}")


if __name__ == "__main__":
    main()
