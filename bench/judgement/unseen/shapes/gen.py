"""Eight two- and three-feature shapes from scikit-learn's sample generators (the sets its clustering examples
compare methods on), 500 samples each, with the generators' labels as the planted groups. Needs scikit-learn (Debian:
apt-get install python3-sklearn; run with /usr/bin/python3). Writes NAME.csv and NAME.truth.csv into the folder given.

  moons        two interleaved half circles (make_moons, noise 0.05)            2 groups, not convex
  circles      a ring inside a ring (make_circles, factor 0.5, noise 0.05)      2 groups, not convex
  varied       three blobs of SD 1, 2.5 and 0.5 (make_blobs)                    3 groups of unlike spread
  aniso        three blobs sheared into parallel stretched groups                3 groups, elongated side by side
  blobs        three round blobs (make_blobs, random_state 8)                   3 groups
  uniform2d    uniform in the unit square                                        no groups
  scurve       an S-shaped sheet in three features (make_s_curve)               no groups, a continuum
  swissroll    a rolled sheet in three features (make_swiss_roll)               no groups, a continuum
"""
import os
import sys

import numpy as np
from sklearn import datasets

out = sys.argv[1]
os.makedirs(out, exist_ok=True)


def save(name, x, y):
    with open(f"{out}/{name}.csv", "w") as f:
        f.write("id," + ",".join(f"x{j}" for j in range(x.shape[1])) + "\n")
        for i in range(len(x)):
            f.write(f"s{i}," + ",".join(f"{v:.5f}" for v in x[i]) + "\n")
    with open(f"{out}/{name}.truth.csv", "w") as f:
        f.write("id,group\n")
        for i in range(len(x)):
            f.write(f"s{i},{y[i]}\n")


n = 500
save("moons", *datasets.make_moons(n_samples=n, noise=0.05, random_state=170))
save("circles", *datasets.make_circles(n_samples=n, factor=0.5, noise=0.05, random_state=170))
save("varied", *datasets.make_blobs(n_samples=n, cluster_std=[1.0, 2.5, 0.5], random_state=170))
x, y = datasets.make_blobs(n_samples=n, random_state=170)
save("aniso", x @ np.array([[0.6, -0.6], [-0.4, 0.8]]), y)
save("blobs", *datasets.make_blobs(n_samples=n, random_state=8))
save("uniform2d", np.random.RandomState(170).rand(n, 2), np.zeros(n, int))
save("scurve", datasets.make_s_curve(n_samples=n, noise=0.05, random_state=1)[0], np.zeros(n, int))
save("swissroll", datasets.make_swiss_roll(n_samples=n, noise=0.05, random_state=1)[0], np.zeros(n, int))
