"""Six wide, expression-like sets drawn on 3 December 2026 (ninth session), after the excess over the null took the
data's own replicate spread into account, to check that change on data it was not tuned on. Each feature is
standard normal noise; groups are raised on their own block of features. Writes NAME.csv (samples in rows) and
NAME.truth.csv (the planted groups) into the folder given.

  W1-3g-p5000           200 x 5000, groups of 70/70/60, two raised by 1.2 on 150 features each
  W2-4g-unequal-p10000  240 x 10000, groups of 100/60/50/30, three raised by 1.5 on 200 features each
  W3-2g-p3000           150 x 3000, two groups of 75, one raised by 1.0 on 100 features (weak)
  W4-none-p8000         300 x 8000, no groups
  W5-nested-p5000       200 x 5000, two families of 100 (1.5 on 300 features), each of two subgroups of 50 (1.2 on
                        100 features)
  W6-3g-batch-p6000     180 x 6000, groups of 60 raised by 1.3 on 150 features each, every second sample shifted
                        by 0.5 on every feature (a batch stronger than the groups); W6-3g-batch-p6000.batch.tsv
                        holds each sample's run, for --covariates and --center-within batch
"""
import os
import sys

import numpy as np

out = sys.argv[1]
os.makedirs(out, exist_ok=True)


def write(name, x, truth):
    n, p = x.shape
    with open(f"{out}/{name}.csv", "w") as f:
        f.write("id," + ",".join(f"g{j}" for j in range(p)) + "\n")
        for i in range(n):
            f.write(f"s{i}," + ",".join(f"{v:.3f}" for v in x[i]) + "\n")
    with open(f"{out}/{name}.truth.csv", "w") as f:
        f.write("id,group\n")
        for i in range(n):
            f.write(f"s{i},{truth[i]}\n")


def groups(rng, sizes, p, feats, shift):
    x = rng.standard_normal((sum(sizes), p))
    t = np.repeat(np.arange(len(sizes)), sizes)
    for g in range(1, len(sizes)):
        x[t == g, (g - 1) * feats:g * feats] += shift
    return x, t


x, t = groups(np.random.default_rng(11), [70, 70, 60], 5000, 150, 1.2)
write("W1-3g-p5000", x, t)
x, t = groups(np.random.default_rng(12), [100, 60, 50, 30], 10000, 200, 1.5)
write("W2-4g-unequal-p10000", x, t)
x, t = groups(np.random.default_rng(13), [75, 75], 3000, 100, 1.0)
write("W3-2g-p3000", x, t)
write("W4-none-p8000", np.random.default_rng(14).standard_normal((300, 8000)), np.zeros(300, int))
rng = np.random.default_rng(15)
x = rng.standard_normal((200, 5000))
t = np.repeat([0, 1, 2, 3], 50)
x[t >= 2, :300] += 1.5
x[t == 1, 300:400] += 1.2
x[t == 3, 400:500] += 1.2
write("W5-nested-p5000", x, t)
x, t = groups(np.random.default_rng(16), [60, 60, 60], 6000, 150, 1.3)
x[::2] += 0.5
write("W6-3g-batch-p6000", x, t)
# the processing run of each W6 sample, for --covariates (and --center-within batch); .tsv, so run.sh skips it
with open(f"{out}/W6-3g-batch-p6000.batch.tsv", "w") as f:
    f.write("id\tbatch\n")
    for i in range(len(t)):
        f.write(f"s{i}\t{'run-2' if i % 2 == 0 else 'run-1'}\n")
