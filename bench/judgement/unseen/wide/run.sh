#!/usr/bin/env bash
# Runs a default `assess` on each set of gen.py and prints verdict, k, linkage, cluster sizes, outliers, the ARI with
# the planted groups (--labels) and the levels (../fresh/run.sh).
# Usage: bench/judgement/unseen/wide/run.sh [JAR]   (default target/treeproof.jar; KEEP=DIR keeps data and outputs)
here="$(cd "$(dirname "$0")" && pwd)"
GEN="$here/gen.py" exec "$here/../fresh/run.sh" "$@"
