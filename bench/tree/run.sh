#!/usr/bin/env bash
# Peak resident memory and wall time of `tree` at n = 20000, p = 50 (a 1.6 GB condensed matrix), this build
# against another jar, alternating, side by side in one run; checks that both print the same bytes.
#   BEFORE=path/to/other/treeproof.jar bench/tree/run.sh     # RUNS (3), N (20000), LINKAGE (average), HEAP (4g)
# Without BEFORE only this build is measured. Needs GNU time (/usr/bin/time -v).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/tree"
mkdir -p "$out"
N="${N:-20000}"; RUNS="${RUNS:-3}"; LINKAGE="${LINKAGE:-average}"; HEAP="${HEAP:-4g}"
PYTHON="${PYTHON:-python3}"
(cd "$root" && mvn -q -o -DskipTests package)
cp "$root/target/treeproof.jar" "$out/after.jar"
table="$out/table_n${N}_p50"
[ -f "$table.csv" ] || "$PYTHON" "$root/bench/study/make_data.py" "$N" 50 "$table"
jars=(after)
if [ -n "${BEFORE:-}" ]; then cp "$BEFORE" "$out/before.jar"; jars=(before after); fi
: > "$out/runs.tsv"
for run in $(seq 1 "$RUNS"); do
  for j in "${jars[@]}"; do
    /usr/bin/time -v java "-Xmx$HEAP" -jar "$out/$j.jar" tree "$table.csv" --scale none --linkage "$LINKAGE" \
      --cut-k 2,3 > "$out/$j.json" 2> "$out/$j.time"
    rss=$(awk -F': ' '/Maximum resident/ {print $2}' "$out/$j.time")
    wall=$(awk -F': ' '/Elapsed \(wall/ {print $2}' "$out/$j.time")
    printf '%s\t%s\t%s\t%s\n' "$j" "$run" "$rss" "$wall" | tee -a "$out/runs.tsv"
  done
  if [ -n "${BEFORE:-}" ]; then cmp "$out/before.json" "$out/after.json" && echo "run $run: identical output"; fi
done
"$PYTHON" - "$out/runs.tsv" "$N" <<'PY'
import statistics, sys
rows = [l.split("\t") for l in open(sys.argv[1]).read().splitlines()]
n = int(sys.argv[2])
matrix = 8 * n * (n - 1) / 2
def secs(s):
    parts = [float(p) for p in s.split(":")]
    return sum(p * 60 ** i for i, p in enumerate(reversed(parts)))
print(f"n = {n}: condensed matrix {matrix / 1e9:.2f} GB; medians of {len(rows) // len({r[0] for r in rows})} runs")
print(f"{'jar':<8} {'peak RSS GB':>12} {'x matrix':>9} {'wall s':>8}")
for jar in sorted({r[0] for r in rows}, reverse=True):
    rss = statistics.median(int(r[2]) * 1024 for r in rows if r[0] == jar)
    wall = statistics.median(secs(r[3]) for r in rows if r[0] == jar)
    print(f"{jar:<8} {rss / 1e9:12.2f} {rss / matrix:9.2f} {wall:8.1f}")
PY
