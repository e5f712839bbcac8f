#!/usr/bin/env python3
"""Writes the benchmark matrix: n x p standard normal values, seed 7, raw little-endian float64, row-major.

    python3 gen_data.py N P OUT_FILE
"""
import sys

import numpy as np

n, p, out = int(sys.argv[1]), int(sys.argv[2]), sys.argv[3]
np.random.default_rng(7).standard_normal((n, p)).astype("<f8").tofile(out)
