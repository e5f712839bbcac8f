#!/usr/bin/env bash
# Distance kernels against scipy.spatial.distance.pdist on the same data file.
#   bench/distance/run.sh          n = 5000, p = 500: euclidean and pearson (scipy 'correlation')
#   bench/distance/run.sh --big    also n = 20000, p = 500 euclidean once in a 4 GB heap (1.6 GB output)
# Environment: PYTHON (default python3), N, P, REPS (scipy, default 3), JREPS (java, default 5).
# Short on purpose: the machine is shared.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/distance"
mkdir -p "$out/classes"
PYTHON="${PYTHON:-python3}"
N="${N:-5000}"; P="${P:-500}"; REPS="${REPS:-3}"; JREPS="${JREPS:-5}"
cores="$(nproc)"

(cd "$root" && mvn -q -o -DskipTests compile)
javac -d "$out/classes" -cp "$root/target/classes" "$here/DistanceBench.java"
data="$out/data_n${N}_p${P}.f64"
[ -f "$data" ] || "$PYTHON" "$here/gen_data.py" "$N" "$P" "$data"

"$PYTHON" "$here/scipy_bench.py" "$data" "$N" "$P" "$REPS" euclidean correlation > "$out/scipy.tsv"
java -Xmx4g -cp "$out/classes:$root/target/classes" DistanceBench "$data" "$N" "$P" 2 "$JREPS" "1,$cores" \
  euclidean pearson > "$out/java.tsv"

echo "n = $N, p = $P; $(cut -f4 "$out/scipy.tsv" | head -1) (single-threaded), $("$PYTHON" --version 2>&1); $(java -version 2>&1 | head -1); $cores cores"
printf '%-10s %12s %14s %14s %10s %10s\n' metric "scipy s" "treeproof 1t" "treeproof ${cores}t" "ratio 1t" "ratio ${cores}t"
for m in euclidean pearson; do
  sm="$m"; [ "$m" = pearson ] && sm=correlation
  s="$(awk -F'\t' -v m="$sm" '$1 == m {print $2}' "$out/scipy.tsv")"
  j1="$(awk -F'\t' -v m="$m" '$1 == m && $2 == 1 {print $3}' "$out/java.tsv")"
  jn="$(awk -F'\t' -v m="$m" -v c="$cores" '$1 == m && $2 == c {print $3}' "$out/java.tsv")"
  awk -v m="$m" -v s="$s" -v a="$j1" -v b="$jn" \
    'BEGIN { printf "%-10s %12.3f %14.3f %14.3f %9.1fx %9.1fx\n", m, s, a, b, s / a, s / b }'
done
echo "(medians: scipy of $REPS runs, treeproof of $JREPS runs after 2 warm-ups; ratio = scipy time / treeproof time)"

if [ "${1:-}" = "--big" ]; then
  big="$out/data_n20000_p500.f64"
  [ -f "$big" ] || "$PYTHON" "$here/gen_data.py" 20000 500 "$big"
  echo "n = 20000, p = 500 euclidean in -Xmx4g (one run, $cores threads):"
  java -Xmx4g -cp "$out/classes:$root/target/classes" DistanceBench "$big" 20000 500 0 1 "$cores" euclidean
fi
