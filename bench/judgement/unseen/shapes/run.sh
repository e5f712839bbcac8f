#!/usr/bin/env bash
# Runs a default `assess` on each shape of gen.py (needs scikit-learn: /usr/bin/python3 with python3-sklearn) and prints
# verdict, k, linkage, cluster sizes, outliers, the ARI with the generators' labels and the levels (../fresh/run.sh).
# Usage: bench/judgement/unseen/shapes/run.sh [JAR]   (default target/treeproof.jar; KEEP=DIR keeps data and outputs)
here="$(cd "$(dirname "$0")" && pwd)"
GEN="$here/gen.py" PYTHON=/usr/bin/python3 exec "$here/../fresh/run.sh" "$@"
