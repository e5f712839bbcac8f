#!/usr/bin/env bash
# Runs a default `assess` on each unseen data set (gen.py) and prints verdict, k, linkage, outliers and the
# structure test. Usage: bench/judgement/unseen/run.sh [JAR]   (default target/treeproof.jar)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
jar="${1:-$here/../../../target/treeproof.jar}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
python3 "$here/gen.py" "$work/data"
printf '%-24s %-11s %3s %-9s %4s %6s %8s\n' case verdict k linkage out stat pFitted
for f in "$work"/data/*.csv; do
  c="$(basename "$f" .csv)"
  java -jar "$jar" assess "$f" --out "$work/out/$c" --quiet >/dev/null
  python3 - "$work/out/$c/summary.json" "$c" <<'PY'
import json, sys
r = json.load(open(sys.argv[1]))["recommendation"]
t = r.get("structureTest") or {}
print(f"{sys.argv[2]:24s} {r['verdict']:11s} {r['k']:3d} {r['linkage']:9s} {len(r['outliers']):4d} "
      f"{t.get('statistic', float('nan')):6.2f} {t.get('pValueFitted', float('nan')):8.2g}")
PY
done
