"""Twenty-six sets drawn on 4 December 2026 (tenth session) before any verdict on them was seen, in the kinds of data
a user brings that are hardest for the rule: far samples, heavy tails, skew, wide data with few informative features,
small real groups, nested groups, groups in heavy-tailed noise, groups beside a batch, counts with features in rows.
The right answer of each is written in README.md (written with this file, before the first run). Writes NAME.csv,
NAME.truth.csv (planted groups; "far" for planted far samples) and, where a set needs options, NAME.opts.

Usage: python3 gen.py OUT_DIR
"""
import os
import sys

import numpy as np

out = sys.argv[1]
os.makedirs(out, exist_ok=True)


def write(name, x, truth, opts=None, rows_are_features=False):
    n, p = x.shape
    with open(f"{out}/{name}.csv", "w") as f:
        if rows_are_features:
            f.write("gene," + ",".join(f"s{i}" for i in range(n)) + "\n")
            for j in range(p):
                f.write(f"g{j}," + ",".join(f"{int(v)}" for v in x[:, j]) + "\n")
        else:
            f.write("id," + ",".join(f"f{j}" for j in range(p)) + "\n")
            for i in range(n):
                f.write(f"s{i}," + ",".join(f"{v:.4f}" for v in x[i]) + "\n")
    with open(f"{out}/{name}.truth.csv", "w") as f:
        f.write("id,group\n")
        for i in range(n):
            f.write(f"s{i},{truth[i]}\n")
    if opts:
        with open(f"{out}/{name}.opts", "w") as f:
            f.write(opts + "\n")


def far(rng, x, t, m, lo, hi):
    """Moves m random samples to a radius between lo and hi from the data's centre, in random directions."""
    idx = rng.choice(len(x), m, replace=False)
    d = rng.standard_normal((m, x.shape[1]))
    d /= np.linalg.norm(d, axis=1)[:, None]
    x[idx] = x.mean(axis=0) + d * rng.uniform(lo, hi, (m, 1))
    t = t.astype(object)
    t[idx] = "far"
    return x, t


def t_noise(rng, n, p, df):
    return rng.standard_normal((n, p)) / np.sqrt(rng.chisquare(df, (n, 1)) / df)


def blobs(rng, sizes, centres, noise=None):
    t = np.repeat(np.arange(len(sizes)), sizes)
    centres = np.asarray(centres, float)
    e = rng.standard_normal((len(t), centres.shape[1])) if noise is None else noise(len(t), centres.shape[1])
    return centres[t] + e, t


def spread(rng, k, p, dist):
    """k centres in p features, every pair at least dist apart (rejection from a wide Gaussian)."""
    while True:
        c = rng.standard_normal((k, p)) * dist
        d = np.linalg.norm(c[:, None] - c[None], axis=2)
        if np.all(d[np.triu_indices(k, 1)] >= dist):
            return c


r = np.random.default_rng(20261204)
# ---- no groups
x = r.standard_normal((400, 12)); x, t = far(r, x, np.zeros(400, int), 8, 8, 12)
write("Y01-none-far-2pct", x, t)
write("Y02-none-t3-p40", t_noise(r, 250, 40, 3), np.zeros(250, int))
write("Y03-none-lognormal-p25", np.exp(r.standard_normal((200, 25))), np.zeros(200, int))
write("Y04-none-uniform-p4", r.uniform(0, 1, (300, 4)), np.zeros(300, int))
z = r.standard_normal((300, 30))
for j in range(1, 30):
    z[:, j] = 0.8 * z[:, j - 1] + 0.6 * z[:, j]
write("Y05-none-ar08-p30", z, np.zeros(300, int))
write("Y06-none-gamma2-p8", r.gamma(2.0, 1.0, (300, 8)), np.zeros(300, int))
# ---- groups
t = np.repeat([0, 1, 2], 60); x = r.standard_normal((180, 3000))
for g in range(3):
    x[t == g, g * 200:(g + 1) * 200] += 0.8
write("Y07-wide-3g-p3000-weak", x, t)
t = np.repeat([0, 1], 80); x = r.standard_normal((160, 2000)); x[t == 1, :30] += 2.0
write("Y08-wide-2g-30of2000", x, t)
c = np.zeros((2, 10)); c[1] = r.standard_normal(10); c[1] *= 7 / np.linalg.norm(c[1])
x, t = blobs(r, [242, 8], c)
write("Y09-small-8of250", x, t)
t = np.repeat([0, 1], [580, 20]); x = r.standard_normal((600, 50)); x[t == 1, :10] += 2.5
write("Y10-small-20of600-p50", x, t)
fam = spread(r, 2, 10, 10.0)
sub = np.vstack([f + spread(r, 3, 10, 4.5) - 0 for f in fam])
x, t = blobs(r, [40] * 6, sub)
write("Y11-nested-2x3", x, t)
x, t = blobs(r, [60] * 4, spread(r, 4, 8, 8.0), noise=lambda n, p: t_noise(r, n, p, 3))
write("Y12-4g-t3-noise", x, t)
x, t = blobs(r, [80] * 3, spread(r, 3, 6, 7.0)); x, t = far(r, x, t, 12, 15, 25)
write("Y13-3g-far-5pct", x, t)
c = np.zeros((2, 20)); c[1, 0] = 6.0
x, t = blobs(r, [500, 50], c)
write("Y14-imbalanced-500-50", x, t)
x, t = blobs(r, [100, 100], spread(r, 2, 10, 6.0)); x[::2] += 0.75
write("Y15-2g-beside-batch", x, t)
G, n = 1000, 90; t = np.repeat([0, 1, 2], 30)
mu = np.exp(r.normal(3, 1.3, (G, 1))) * np.ones((1, n))
for g in range(3):
    mu[g * 60:(g + 1) * 60, t == g] *= 4
counts = r.negative_binomial(5, 5 / (5 + mu))
write("Y16-counts-rows-3subtypes", counts.T, t, opts="--samples-in-columns --log2", rows_are_features=True)
x, t = blobs(r, [50, 50, 50, 50, 50], spread(r, 5, 12, 5.5))
write("Y17-5g-p12", x, t)

# ---- a second batch, drawn the same day after the first had run (its answers written in README.md before its run)
r = np.random.default_rng(20261205)
x = r.standard_normal((120, 1000)); far_idx = r.choice(120, 4, replace=False); x[far_idx] *= 3
t = np.zeros(120, dtype=object); t[far_idx] = "far"
write("Z01-none-wide-4far", x, t)
write("Z02-none-cauchy-p6", t_noise(r, 200, 6, 1), np.zeros(200, int))
write("Z03-none-t2-p500", t_noise(r, 100, 500, 2), np.zeros(100, int))
x = r.standard_normal((200, 10)); x[17, 4] = 50.0
t = np.zeros(200, dtype=object); t[17] = "far"
write("Z04-none-one-huge-cell", x, t)
write("Z05-none-n20-p8", r.standard_normal((20, 8)), np.zeros(20, int))
c = np.zeros((2, 5)); c[1, 0] = 8.0
x, t = blobs(r, [100, 100], c); x[t == 1] = c[1] + 3 * (x[t == 1] - c[1])
write("Z06-2g-one-broad", x, t)
x = (r.random((200, 50)) < 0.1).astype(float)
write("Z07-none-binary-sparse", x, np.zeros(200, int), opts="--metric jaccard")
t = np.repeat([0, 1, 2], 60); x = r.standard_normal((180, 1000))
for g in range(3):
    x[t == g, g * 100:(g + 1) * 100] += 1.0
far_idx = r.choice(180, 5, replace=False); x[far_idx] *= 3; t = t.astype(object); t[far_idx] = "far"
write("Z08-wide-3g-5far", x, t)
t = np.repeat([0, 1], 12); x = r.standard_normal((24, 1000)); x[t == 1, :100] += 1.0
write("Z09-wide-n24-2g", x, t)
