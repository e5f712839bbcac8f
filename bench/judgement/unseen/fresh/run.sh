#!/usr/bin/env bash
# Runs a default `assess` on each set of gen.py (with NAME.opts where given) and prints verdict, k, linkage, cluster
# sizes, outliers, the ARI with the planted groups (--labels; planted far samples form one more group) and the levels.
# Usage: bench/judgement/unseen/fresh/run.sh [JAR]   (default target/treeproof.jar; KEEP=DIR keeps data and outputs;
# GEN=FILE and PYTHON=INTERPRETER run another generator, as ../wide/run.sh and ../shapes/run.sh do)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
jar="${1:-$here/../../../../target/treeproof.jar}"
if [ -n "${KEEP:-}" ]; then work="$KEEP"; mkdir -p "$work"; else work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT; fi
"${PYTHON:-python3}" "${GEN:-$here/gen.py}" "$work/data"
for f in "$work"/data/*.csv; do
  case "$f" in *.truth.csv) continue ;; esac
  c="$(basename "$f" .csv)"
  opts=()
  if [ -f "$work/data/$c.opts" ]; then read -r -a opts < "$work/data/$c.opts"; fi
  java -jar "$jar" assess "$f" "${opts[@]}" --labels "$work/data/$c.truth.csv" --out "$work/out/$c" --quiet >/dev/null
  python3 - "$work/out/$c" "$c" <<'PY'
import collections, csv, json, os, sys
out, name = sys.argv[1:3]
d = json.load(open(os.path.join(out, "summary.json")))
r = d["recommendation"]
rows = list(csv.DictReader(open(os.path.join(out, "clusters.csv"))))
sizes = sorted(collections.Counter(x["cluster"] for x in rows if x["cluster"]).values(), reverse=True)
print(f"{name:26s} {r['verdict']:11s} k={r['k']} {r['linkage']:8s} sizes={'/'.join(map(str, sizes))} "
      f"out={len(r['outliers'])} ari={d['labels']['ari']:.2f} levels={r.get('levels')}")
PY
done
