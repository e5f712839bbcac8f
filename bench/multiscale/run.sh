#!/usr/bin/env bash
# Cost of --branch-pvalues: the wall time of `assess` from the jar with and without it, side by side in one run,
# on the study benchmark's generated table (bench/study/make_data.py: 4 planted groups, seed 7).
#   bench/multiscale/run.sh            n = 500, p = 100, all defaults otherwise (200 replicates, 50 reference sets,
#                                      19 null sets), and --branch-pvalues at its default 10 scales x 200 replicates
# Environment: PYTHON (default python3), N, P, RUNS (default 3; the median is printed), THREADS (default: all cores).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/multiscale"
mkdir -p "$out"
PYTHON="${PYTHON:-python3}"
N="${N:-500}"; P="${P:-100}"; RUNS="${RUNS:-3}"; THREADS="${THREADS:-$(nproc)}"
jar="$root/target/treeproof.jar"
[ -f "$jar" ] || (cd "$root" && mvn -q -DskipTests package)
prefix="$out/table_n${N}_p${P}"
[ -f "$prefix.csv" ] || "$PYTHON" "$root/bench/study/make_data.py" "$N" "$P" "$prefix"

time_one() { # label, extra options...
  local label="$1"; shift
  local times=()
  for r in $(seq "$RUNS"); do
    rm -rf "$out/run"
    local start end
    start=$(date +%s.%N)
    java -jar "$jar" assess "$prefix.csv" --scale none --out "$out/run" --threads "$THREADS" --no-progress --quiet "$@"
    end=$(date +%s.%N)
    times+=("$(awk -v a="$start" -v b="$end" 'BEGIN { printf "%.2f", b - a }')")
  done
  printf '%s\n' "${times[@]}" | sort -n | awk -v l="$label" -v n="$RUNS" '{ t[NR] = $1 } END { printf "%-34s median %7.2f s  (runs: ", l, t[int((n + 1) / 2)]; for (i = 1; i <= n; i++) printf "%s%s", t[i], i < n ? " " : ")\n" }'
}

echo "assess, n = $N, p = $P, $THREADS threads, defaults otherwise; $RUNS run(s) each, one after another"
time_one "defaults" 
time_one "defaults + --branch-pvalues" --branch-pvalues
time_one "--branch-pvalues alone (no gap/null)" --branch-pvalues --reference-sets 0 --null-sets 0
time_one "neither (no gap/null)" --reference-sets 0 --null-sets 0
