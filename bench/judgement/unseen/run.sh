#!/usr/bin/env bash
# Runs a default `assess` on each unseen data set (gen.py) and prints verdict, k, linkage, outliers, the structure
# test and, where gen.py wrote the planted labels, the adjusted Rand index of the recommended clusters with them
# (outliers count as one more cluster; planted far samples are label -1). Options a set needs (gen.py's
# name.opts, e.g. --log2) are added.
# Usage: bench/judgement/unseen/run.sh [JAR]   (default target/treeproof.jar; ONLY=REGEX runs the matching sets;
# EXTRA="OPTIONS" adds options to every set's run;
# KEEP=DIR keeps the data and every study's output in DIR)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
jar="${1:-$here/../../../target/treeproof.jar}"
if [ -n "${KEEP:-}" ]; then work="$KEEP"; mkdir -p "$work"; else work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT; fi
python3 "$here/gen.py" "$work/data"
printf '%-26s %-11s %3s %-9s %4s %6s %8s %6s\n' case verdict k linkage out stat pFitted ARI
for f in "$work"/data/*.csv; do
  c="$(basename "$f" .csv)"
  if [ -n "${ONLY:-}" ] && ! [[ "$c" =~ $ONLY ]]; then continue; fi
  opts=()
  if [ -f "$work/data/$c.opts" ]; then read -r -a opts < "$work/data/$c.opts"; fi
  extra=(); if [ -n "${EXTRA:-}" ]; then read -r -a extra <<< "$EXTRA"; fi
  java -jar "$jar" assess "$f" "${opts[@]}" "${extra[@]}" --out "$work/out/$c" --quiet >/dev/null
  python3 - "$work/out/$c" "$c" "$work/data/$c.truth" <<'PY'
import csv, json, os, sys
from math import comb
out, name, truth_file = sys.argv[1:4]
r = json.load(open(os.path.join(out, "summary.json")))["recommendation"]
t = r.get("structureTest") or {}
ari = float("nan")
if os.path.exists(truth_file):
    truth = [int(x) for x in open(truth_file).read().split()]
    rows = list(csv.DictReader(open(os.path.join(out, "clusters.csv"))))
    found = [row["cluster"] or "outlier" for row in rows]
    # adjusted Rand index (Hubert & Arabie 1985) from the contingency table; gives 0.24 for [0,0,0,1,1,1] against
    # [0,0,1,1,2,2], the value of scikit-learn's adjusted_rand_score documentation example (from memory)
    pairs = {}
    for a, b in zip(truth, found):
        pairs[(a, b)] = pairs.get((a, b), 0) + 1
    def margin(i):
        m = {}
        for key, v in pairs.items():
            m[key[i]] = m.get(key[i], 0) + v
        return m
    n = len(truth)
    index = sum(comb(v, 2) for v in pairs.values())
    sa = sum(comb(v, 2) for v in margin(0).values())
    sb = sum(comb(v, 2) for v in margin(1).values())
    expected = sa * sb / comb(n, 2)
    top = (sa + sb) / 2
    ari = 1.0 if top == expected else (index - expected) / (top - expected)
print(f"{name:26s} {r['verdict']:11s} {r['k']:3d} {r['linkage']:9s} {len(r['outliers']):4d} "
      f"{t.get('statistic', float('nan')):6.2f} {t.get('pValueFitted', float('nan')):8.2g} {ari:6.2f}")
PY
done
