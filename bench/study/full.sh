#!/usr/bin/env bash
# The full default study side by side with the numpy/scipy/scikit-learn study script, in one run, alternating.
#   bench/study/full.sh [BEFORE.jar]      n = 2000, p = 500 (N, P to change), ROUNDS rounds (default 3)
#   bench/study/full.sh --big [BEFORE.jar] also n = 10 000, p = 50: one run of each jar, wall time and peak RSS
# Environment: JAR (this build's jar, default target/treeproof.jar), PYSTUDY (default ../shared/tools/python-study.py from the repository root), PYTHON (/usr/bin/python3,
# which needs python3-sklearn), ROUNDS, N, P. Each round runs the script (`run --processes 2`, one BLAS thread),
# the BEFORE jar (if given) and this build's jar, each on the same table, and prints the medians and ratios.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
big=0
if [ "${1:-}" = "--big" ]; then big=1; shift; fi
before="${1:-}"
out="$root/bench/out/full"
mkdir -p "$out"
PYTHON="${PYTHON:-/usr/bin/python3}"
PYSTUDY="${PYSTUDY:-$root/../shared/tools/python-study.py}"
ROUNDS="${ROUNDS:-3}"; N="${N:-2000}"; P="${P:-500}"
jar="${JAR:-$root/target/treeproof.jar}"
[ -f "$jar" ] || (cd "$root" && mvn -q -DskipTests package)
export OMP_NUM_THREADS=1 OPENBLAS_NUM_THREADS=1 MKL_NUM_THREADS=1
table="$out/study_n${N}_p${P}.csv"
[ -f "$table" ] || "$PYTHON" "$PYSTUDY" generate "$table" --n "$N" --p "$P" > /dev/null

# wall seconds, peak resident kB and CPU seconds (user + system) of one command: "seconds kB cpu"
timed() {
  local s e
  s=$(date +%s.%N)
  /usr/bin/time -f "%M %U %S" -o "$out/rss.txt" "$@" > "$out/last.log" 2>&1
  e=$(date +%s.%N)
  tail -1 "$out/rss.txt" | awk -v a="$s" -v b="$e" '{ printf "%.1f %d %.1f\n", b - a, $1, $2 + $3 }'
}
assess() { # jar table dir
  rm -rf "$3"
  timed java -jar "$1" assess "$2" --scale none --out "$3" --no-progress --quiet
}

echo "# $(date -u '+%Y-%m-%d %H:%M') UTC; $(getconf _NPROCESSORS_ONLN) cores; load before: $(cut -d' ' -f1-3 /proc/loadavg)"
echo "# n = $N, p = $P; $ROUNDS rounds, alternating: script (run --processes 2), ${before:+before jar, }this jar"
: > "$out/times.tsv"
for r in $(seq 1 "$ROUNDS"); do
  t=$(timed "$PYTHON" "$PYSTUDY" run "$table" --processes 2); echo -e "script\t$t" >> "$out/times.tsv"
  echo "round $r script $t (load $(cut -d' ' -f1 /proc/loadavg))"
  if [ -n "$before" ]; then
    t=$(assess "$before" "$table" "$out/before"); echo -e "before\t$t" >> "$out/times.tsv"
    echo "round $r before $t (load $(cut -d' ' -f1 /proc/loadavg))"
  fi
  t=$(assess "$jar" "$table" "$out/after"); echo -e "after\t$t" >> "$out/times.tsv"
  echo "round $r after  $t (load $(cut -d' ' -f1 /proc/loadavg))"
done
if [ -n "$before" ] && diff -rq -x report.html -x .treeproof-output "$out/before" "$out/after" > /dev/null; then
  echo "before and after wrote the same bytes (all outputs but report.html's date and duration)"
elif [ -n "$before" ]; then
  echo "BEFORE AND AFTER DIFFER"
fi
echo "# load after: $(cut -d' ' -f1-3 /proc/loadavg)"
awk -F'\t' '
  { split($2, a, " "); n = ++c[$1]; t[$1, n] = a[1]; u[$1, n] = a[3] }
  function median(arr, k,   i, j, v, n, x) { n = c[k]; for (i = 1; i <= n; i++) v[i] = arr[k, i];
    for (i = 1; i <= n; i++) for (j = i + 1; j <= n; j++) if (v[j] < v[i]) { x = v[i]; v[i] = v[j]; v[j] = x }
    return n % 2 ? v[(n + 1) / 2] : (v[n / 2] + v[n / 2 + 1]) / 2 }
  END {
    s = median(t, "script"); su = median(u, "script")
    printf "| run | wall s (each round) | median wall s | wall / script | median CPU s (user + sys) | CPU / script |\n"
    printf "|---|---|---|---|---|---|\n"
    split("script before after", names, " ")
    for (q = 1; q <= 3; q++) { k = names[q]; if (!c[k]) continue; list = ""
      for (i = 1; i <= c[k]; i++) list = list (i > 1 ? ", " : "") t[k, i]
      printf "| %s | %s | %.1f | %.2f | %.1f | %.2f |\n", k, list, median(t, k), median(t, k) / s, median(u, k), median(u, k) / su }
  }' "$out/times.tsv"

if [ "$big" = 1 ]; then
  bigtable="$out/study_n10000_p50.csv"
  [ -f "$bigtable" ] || "$PYTHON" "$PYSTUDY" generate "$bigtable" --n 10000 --p 50 > /dev/null
  echo "# n = 10000, p = 50, default study (null calibration on), default heap; $(date -u '+%H:%M') UTC, load $(cut -d' ' -f1-3 /proc/loadavg)"
  for k in after before; do
    j="$jar"; [ "$k" = before ] && j="$before"
    [ -n "$j" ] || continue
    t=$(assess "$j" "$bigtable" "$out/big-$k")
    echo "| $k | $(echo "$t" | cut -d' ' -f1) s wall | $(echo "$t" | cut -d' ' -f3) s CPU | peak RSS $(echo "$t" | awk '{ printf "%.2f GB", $2 / 1048576 }') | load after $(cut -d' ' -f1 /proc/loadavg) |"
  done
fi
