#!/usr/bin/env python3
"""Writes the reference values that the gap-statistic, principal-axes and reference-data tests compare with.

Run from this directory:  python3 make_reference.py
Everything here is computed independently of the Java code: numpy.linalg.svd for the principal axes, the
pairwise-distance form of W_k, a direct transcription of the gap formulas of Tibshirani, Walther & Hastie
(2001, J. R. Stat. Soc. B 63:411-423, doi:10.1111/1467-9868.00293), and a separate implementation of the
SplitMix64 generator behind java.util.SplittableRandom (Steele, Lea & Flood 2014, doi:10.1145/2660193.2660195;
constants and the nextDouble recipe written from memory of the JDK source, confirmed only by the Java test
reproducing the stream bit for bit).
"""
import json
import math
import platform
import sys

import numpy as np

VERSIONS = {"python": platform.python_version(), "numpy": np.__version__}
MASK = (1 << 64) - 1


def sign_rule(vt):
    """Orient each row so its largest-|.| component (first on ties) is positive."""
    out = vt.copy()
    for c in range(out.shape[0]):
        j = int(np.argmax(np.abs(out[c])))
        if out[c, j] < 0:
            out[c] = -out[c]
    return out


def axes_case(name, x, rank):
    n, p = x.shape
    means = x.mean(axis=0)
    u, s, vt = np.linalg.svd(x - means, full_matrices=False)
    return {
        "name": name, "n": n, "p": p, "data": x.ravel().tolist(), "rank": rank,
        "means": means.tolist(),
        "singularValues": s[:rank].tolist(),
        "variances": (s[:rank] ** 2 / (n - 1)).tolist(),
        "axes": sign_rule(vt[:rank]).ravel().tolist(),
        "allSingularValues": s.tolist(),
    }


def principal_axes(rng):
    cases = []
    # Tall: distinct column scales keep the singular values well apart, so axes are well defined.
    x = rng.standard_normal((60, 8)) * np.array([9.0, 7.0, 5.5, 4.0, 3.0, 2.0, 1.2, 0.5]) + 3.0
    cases.append(axes_case("tall", x, 8))
    # Wide: 12 samples, 40 features; centring leaves rank 11.
    x = rng.standard_normal((12, 40)) * np.linspace(3.0, 0.5, 40) - 1.5
    cases.append(axes_case("wide", x, 11))
    # Tall and rank-deficient: feature 5 = feature 0 + feature 1, so rank 5 of 6.
    x = rng.standard_normal((30, 6)) * np.array([4.0, 3.0, 2.0, 1.5, 1.0, 1.0])
    x[:, 5] = x[:, 0] + x[:, 1]
    cases.append(axes_case("tall-deficient", x, 5))
    # Wide with a large common offset, to exercise the centring.
    x = rng.standard_normal((9, 25)) * np.linspace(2.0, 0.2, 25) + 1.0e4
    cases.append(axes_case("wide-offset", x, 8))
    return cases


def gap_formulas(log_w, ref):
    """Direct transcription of the paper's definitions."""
    b = ref.shape[0]
    mean = ref.mean(axis=0)
    gap = mean - log_w
    sd = np.sqrt(((ref - mean) ** 2).mean(axis=0))
    se = sd * math.sqrt(1 + 1 / b)
    chosen, met = len(log_w), False
    for k in range(len(log_w) - 1):
        if gap[k] >= gap[k + 1] - se[k + 1]:
            chosen, met = k + 1, True
            break
    return mean, gap, sd, se, chosen, met


def gap_tables(rng):
    tables = []
    for t, (kmax, b) in enumerate([(8, 10), (6, 25), (10, 3), (5, 1), (7, 50)]):
        # Observed log W falling faster than the references for a while gives an interior choice.
        ref = 5.0 - 0.35 * np.arange(kmax) + 0.05 * rng.standard_normal((b, kmax))
        drop = rng.integers(1, kmax)
        log_w = 5.0 - 0.35 * np.arange(kmax) - np.minimum(np.arange(kmax), drop) * rng.uniform(0.05, 0.4)
        log_w = log_w + 0.02 * rng.standard_normal(kmax)
        mean, gap, sd, se, chosen, met = gap_formulas(log_w, ref)
        tables.append({"name": "random-%d" % t, "logW": log_w.tolist(), "referenceLogW": ref.tolist(),
                       "referenceMeanLogW": mean.tolist(), "gap": gap.tolist(), "sd": sd.tolist(),
                       "se": se.tolist(), "chosenK": chosen, "ruleMet": met})
    # A gap that rises steadily with no noise: no k < K meets the rule.
    kmax, b = 6, 4
    ref = np.tile(4.0 - 0.1 * np.arange(kmax), (b, 1)) + 1e-3 * rng.standard_normal((b, kmax))
    log_w = 4.0 - 0.6 * np.arange(kmax)
    mean, gap, sd, se, chosen, met = gap_formulas(log_w, ref)
    tables.append({"name": "rising", "logW": log_w.tolist(), "referenceLogW": ref.tolist(),
                   "referenceMeanLogW": mean.tolist(), "gap": gap.tolist(), "sd": sd.tolist(),
                   "se": se.tolist(), "chosenK": chosen, "ruleMet": met})
    return tables


def within_ss(rng):
    cases = []
    for t, (n, p, k, offset) in enumerate([(25, 3, 4, 0.0), (40, 7, 1, 0.0), (18, 2, 5, 1.0e8), (12, 30, 3, -50.0)]):
        x = rng.standard_normal((n, p)) * rng.uniform(0.5, 3.0, p) + offset
        labels = rng.integers(0, k, n)
        labels[:k] = np.arange(k)  # every label used
        w = 0.0
        for r in range(k):
            m = x[labels == r]
            if len(m) == 0:
                continue
            # Pairwise form of the paper: D_r / (2 n_r), D_r summed over ordered pairs.
            diff = m[:, None, :] - m[None, :, :]
            w += (diff ** 2).sum() / (2 * len(m))
        cases.append({"name": "case-%d" % t, "n": n, "p": p, "data": x.ravel().tolist(),
                      "labels": labels.tolist(), "w": w})
    return cases


class SplitMix64:
    """The generator of java.util.SplittableRandom(seed): seed += GOLDEN_GAMMA, then mix64."""
    GAMMA = 0x9E3779B97F4A7C15

    def __init__(self, seed):
        self.seed = seed & MASK

    def next_long(self):
        self.seed = (self.seed + self.GAMMA) & MASK
        z = self.seed
        z = ((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9) & MASK
        z = ((z ^ (z >> 27)) * 0x94D049BB133111EB) & MASK
        return z ^ (z >> 31)

    def next_double(self):
        return (self.next_long() >> 11) * 2.0 ** -53


class Polar:
    """Marsaglia-Bray polar method, both values of each accepted pair used in turn."""

    def __init__(self, gen):
        self.gen, self.spare = gen, None

    def next(self):
        if self.spare is not None:
            v, self.spare = self.spare, None
            return v
        while True:
            u = 2 * self.gen.next_double() - 1
            v = 2 * self.gen.next_double() - 1
            s = u * u + v * v
            if 0 < s < 1:
                break
        m = math.sqrt(-2 * math.log(s) / s)
        self.spare = v * m
        return u * m


def reference_streams(rng):
    seed = -4242424242424242
    x = np.round(rng.uniform(-5, 5, (7, 3)), 3)
    lo, hi = x.min(axis=0), x.max(axis=0)
    g = SplitMix64(seed)
    feature_range = [min(hi[j], lo[j] + (hi[j] - lo[j]) * g.next_double()) for i in range(7) for j in range(3)]
    # One feature: the single principal axis is +1, so method (b) is uniform over [min, max] of x - mean
    # shifted back, and the Gaussian null is mean + sd * z.
    y = np.round(rng.uniform(0, 10, (9, 1)), 3)
    mean = float(y.mean())
    c = y[:, 0] - mean
    g = SplitMix64(seed)
    box = [mean + min(c.max(), c.min() + (c.max() - c.min()) * g.next_double()) for _ in range(9)]
    sd = float(np.linalg.svd(y - mean, compute_uv=False)[0] / math.sqrt(8))
    pol = Polar(SplitMix64(seed))
    gauss = [mean + sd * pol.next() for _ in range(9)]
    return {"seed": seed,
            "multi": {"n": 7, "p": 3, "data": x.ravel().tolist(), "featureRange": feature_range},
            "single": {"n": 9, "data": y.ravel().tolist(), "principalBox": box, "gaussian": gauss}}


def main():
    rng = np.random.default_rng(20010411)
    out = {
        "source": "make_reference.py; numpy.linalg.svd and direct formulas",
        "versions": VERSIONS,
        "principalAxes": principal_axes(rng),
        "gapTables": gap_tables(rng),
        "withinSumOfSquares": within_ss(rng),
        "referenceStreams": reference_streams(rng),
    }
    with open("gap_reference.json", "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print("wrote gap_reference.json with numpy", np.__version__, file=sys.stderr)


if __name__ == "__main__":
    main()
