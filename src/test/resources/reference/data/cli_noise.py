"""Writes src/test/resources/cli/noise-120x6.csv: 120 samples of 6 independent standard normal features
(numpy default_rng(20261203)), values to 6 significant digits. Used by AssessIT: on these data, with default
options, average linkage has no cut into 10 clusters of at least 5 samples, so the stability chart must draw a
linkage that lacks some k. Made with numpy 2.4.6 (run from the repository root:
python3 src/test/resources/reference/data/cli_noise.py)."""
import numpy as np

rng = np.random.default_rng(20261203)
X = rng.normal(size=(120, 6))
with open("src/test/resources/cli/noise-120x6.csv", "w") as f:
    f.write("id," + ",".join("f%d" % j for j in range(6)) + "\n")
    for i, r in enumerate(X):
        f.write("n%03d," % i + ",".join("%.6g" % v for v in r) + "\n")
