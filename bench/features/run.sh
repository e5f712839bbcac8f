#!/usr/bin/env bash
# features.csv at n = 2000 samples, p = 20000 features (goal: within 30 s on 2 cores): FeatureContrast plus the
# CSV text, for k = 5 and k = 40 clusters, Wilcoxon and Welch, 1 and 2 threads. Median of REPS runs (default 3)
# after one warm-up run. Wall time and the process's CPU time are both printed: on a loaded shared machine the
# CPU time is what the work costs. Environment: N, P, REPS, KS ("5 40"), TESTS ("wilcoxon welch"), THREADS ("1 2").
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/features"
mkdir -p "$out/classes"
N="${N:-2000}"; P="${P:-20000}"; REPS="${REPS:-3}"; KS="${KS:-5 40}"; TESTS="${TESTS:-wilcoxon welch}"
THREADS="${THREADS:-1 2}"
[ -f "$root/target/treeproof.jar" ] || (cd "$root" && mvn -q -o -DskipTests package)
cp="$root/target/treeproof.jar"
javac -d "$out/classes" -cp "$cp" "$here/FeaturesBench.java"
echo "n = $N, p = $P; $(java -version 2>&1 | head -1); $(nproc) cores; load before $(cut -d' ' -f1-3 /proc/loadavg)"
printf '%-4s %-9s %-8s %10s %8s %9s %8s %8s\n' k test threads "compute s" "csv s" "total s" "csv MB" "CPU s"
for k in $KS; do
  for test in $TESTS; do
    for t in $THREADS; do
      java -Xmx6g -cp "$out/classes:$cp" FeaturesBench "$N" "$P" "$k" "$t" "$((REPS + 1))" "$test" \
        | tail -n "$REPS" > "$out/k${k}_${test}_t${t}.tsv"
      sort -t$'\t' -k8,8g "$out/k${k}_${test}_t${t}.tsv" | sed -n "$(( (REPS + 1) / 2 ))p" \
        | awk -F'\t' '{printf "%-4s %-9s %-8s %10.2f %8.2f %9.2f %8.1f %8.2f\n", $3, $5, $4, $6, $7, $8, $9, $10}'
    done
  done
done
echo "load after $(cut -d' ' -f1-3 /proc/loadavg); median of $REPS runs by total time after one warm-up; raw runs in bench/out/features/"
