#!/usr/bin/env bash
# Runs a default `assess` on each of the 21 hard sets of gen.py (seed 20261208; drawn by a tester before any verdict
# was seen) and prints one line per set: verdict, k, linkage, cluster sizes, outliers, the structure test, the ARI
# with the planted groups (--labels) and the levels. Options a set needs (NAME.opts) are added.
# Usage: bench/judgement/unseen/hard/run.sh [JAR]   (default target/treeproof.jar; ONLY=REGEX runs matching sets;
# EXTRA="OPTIONS" adds options to every set's run;
# KEEP=DIR keeps the data and every study's output in DIR)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
jar="${1:-$here/../../../../target/treeproof.jar}"
if [ -n "${KEEP:-}" ]; then work="$KEEP"; mkdir -p "$work"; else work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT; fi
python3 "$here/gen.py" "$work/data" >/dev/null
for f in "$work"/data/*.csv; do
  case "$f" in *.truth.csv) continue ;; esac
  c="$(basename "$f" .csv)"
  if [ -n "${ONLY:-}" ] && ! [[ "$c" =~ $ONLY ]]; then continue; fi
  opts=(); if [ -f "$work/data/$c.opts" ]; then read -r -a opts < "$work/data/$c.opts"; fi
  lab=(); if [ -f "$work/data/$c.truth.csv" ]; then lab=(--labels "$work/data/$c.truth.csv"); fi
  extra=(); if [ -n "${EXTRA:-}" ]; then read -r -a extra <<< "$EXTRA"; fi
  java -jar "$jar" assess "$f" "${opts[@]}" "${extra[@]}" "${lab[@]}" --out "$work/out/$c" --quiet >/dev/null
  python3 - "$work/out/$c" "$c" <<'PY'
import collections, csv, json, os, sys
out, name = sys.argv[1:3]
d = json.load(open(os.path.join(out, "summary.json")))
r = d["recommendation"]
t = r.get("structureTest") or {}
rows = list(csv.DictReader(open(os.path.join(out, "clusters.csv"))))
sizes = sorted(collections.Counter(x["cluster"] for x in rows if x["cluster"]).values(), reverse=True)
ari = (d.get("labels") or {}).get("ari")
print(f"{name:26s} {r['verdict']:11s} k={r['k']} {r['linkage']:8s} sizes={'/'.join(map(str, sizes))} "
      f"out={len(r['outliers'])} stat={t.get('statistic', float('nan')):.2f} p={t.get('pValue')} "
      f"ari={'' if ari is None else f'{ari:.2f}'} levels={r.get('levels')}")
PY
done
