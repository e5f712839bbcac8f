#!/usr/bin/env bash
# Study-level benchmark, side by side with scipy in one run on the same generated table.
#   bench/study/run.sh              replicate throughput at n = 2000, p = 500 (sample and feature replicates)
#                                   and the wall time of a full default `assess` from the jar
#   bench/study/run.sh --big        also n = 20000, p = 50, 50 replicates in a 16 GB heap (several minutes)
# Environment: PYTHON (default python3), N, P, REPS (replicates per round, default 40), FF (feature fraction, 0.8).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/study"
mkdir -p "$out/classes"
PYTHON="${PYTHON:-python3}"
N="${N:-2000}"; P="${P:-500}"; REPS="${REPS:-40}"; FF="${FF:-0.8}"
cores="$(nproc)"
jar="$root/target/treeproof.jar"
[ -f "$jar" ] || (cd "$root" && mvn -q -DskipTests package)
javac -d "$out/classes" -cp "$jar" "$here/org/treeproof/study/ReplicateBench.java"
prefix="$out/table_n${N}_p${P}"
[ -f "$prefix.f64" ] || "$PYTHON" "$here/make_data.py" "$N" "$P" "$prefix"

"$PYTHON" "$here/replicate_scipy.py" "$prefix.f64" "$N" "$P" "$REPS" "$FF" > "$out/scipy.tsv"
java -Xmx8g -cp "$out/classes:$jar" org.treeproof.study.ReplicateBench "$prefix.f64" "$N" "$P" "$REPS" "$FF" "$cores" \
  > "$out/java.tsv"
echo "n = $N, p = $P, 80% subsamples, average linkage, k = 2..10; $(cut -f4 "$out/scipy.tsv" | head -1); $cores cores"
printf '%-8s %18s %22s %10s\n' kind "scipy s/replicate" "treeproof s/replicate" "throughput ratio"
for kind in sample feature; do
  s="$(awk -F'\t' -v k="$kind" '$1 == k {print $2}' "$out/scipy.tsv")"
  j="$(awk -F'\t' -v k="$kind" '$1 == k {print $4}' "$out/java.tsv")"
  awk -v k="$kind" -v s="$s" -v j="$j" 'BEGIN { printf "%-8s %18.4f %22.4f %9.1fx\n", k, s, j, s / j }'
done
echo "(scipy: one thread, median of $REPS replicates, ARI only; treeproof: $cores threads, median of 5 rounds of $REPS"
echo " replicates, all scores: ARI, consensus, Jaccard, per-sample stability, branch support)"

echo
echo "full evidence table from the jar: n = $N, p = $P, average,complete,ward, k = 2..10, 200 replicates,"
echo "50 reference sets, 19 null sets x 10 replicates (all defaults):"
rm -rf "$out/full"
start=$(date +%s.%N)
[ "${SKIP_FULL:-}" = 1 ] || java -Xmx8g -jar "$jar" assess "$prefix.csv" --scale none --out "$out/full" --no-progress --quiet
end=$(date +%s.%N)
awk -v a="$start" -v b="$end" 'BEGIN { printf "  wall time %.1f s\n", b - a }'

if [ "${1:-}" = "--big" ]; then
  big="$out/table_n20000_p50"
  [ -f "$big.csv" ] || "$PYTHON" "$here/make_data.py" 20000 50 "$big"
  rm -rf "$out/big"
  echo "n = 20000, p = 50, 50 replicates, no null calibration, 10 reference sets, -Xmx16g:"
  start=$(date +%s.%N)
  /usr/bin/time -f "  peak resident %M kB" java -Xmx16g -jar "$jar" assess "$big.csv" --scale none --out "$out/big" \
    --replicates 50 --null-sets 0 --reference-sets 10 --no-progress --quiet
  end=$(date +%s.%N)
  awk -v a="$start" -v b="$end" 'BEGIN { printf "  wall time %.1f s\n", b - a }'
fi
