#!/usr/bin/env bash
# One study, in process (LocalExecutor, 2 threads) and as Spark tasks on local[2] in the same JVM, alternating;
# prints the median wall time per stage and in total, side by side. Short on purpose (the machine is shared):
#   bench/spark/run.sh                        # n = 2000, p = 500, 3 runs of each, the study defaults
#   N=1000 RUNS=1 bench/spark/run.sh          # a quick look
# Environment: N, P, RUNS, REPLICATES (200), NULL_SETS (19), NULL_REPLICATES (20), REFERENCE_SETS (50),
# DISTANCES (executor | replicate: where Spark tasks get their distances, see SparkEngine), CHUNK (indices per
# Spark job; 0, the default, is twice the parallelism).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/spark"
mkdir -p "$out/classes"
N="${N:-2000}"; P="${P:-500}"; RUNS="${RUNS:-3}"
REPLICATES="${REPLICATES:-200}"; NULL_SETS="${NULL_SETS:-19}"; NULL_REPLICATES="${NULL_REPLICATES:-20}"
REFERENCE_SETS="${REFERENCE_SETS:-50}"; DISTANCES="${DISTANCES:-executor}"; CHUNK="${CHUNK:-0}"

(cd "$root" && mvn -q -o -DskipTests compile && mvn -q -o dependency:build-classpath -Dmdep.includeScope=test \
  -Dmdep.outputFile="$out/classpath.txt")
cp="$root/target/classes:$(cat "$out/classpath.txt")"
javac -d "$out/classes" -cp "$cp" "$here/SparkBench.java"
SPARK_LOCAL_IP=127.0.0.1 java -Xmx6g -cp "$out/classes:$cp" SparkBench "$N" "$P" "$RUNS" "$REPLICATES" \
  "$NULL_SETS" "$NULL_REPLICATES" "$REFERENCE_SETS" "$DISTANCES" "$CHUNK" | tee "$out/runs.tsv"

python3 - "$out/runs.tsv" "$N" "$P" "$RUNS" "$DISTANCES" <<'PY'
import statistics, sys
rows = [l.rstrip("\n").split("\t") for l in open(sys.argv[1]) if l.count("\t") == 3]
times = {}
for engine, run, stage, secs in rows:
    if run != "-1":
        times.setdefault(stage, {}).setdefault(engine, []).append(float(secs))
print(f"\nn = {sys.argv[2]}, p = {sys.argv[3]}, median of {sys.argv[4]} runs, wall seconds; "
      f"Spark local[2], distances per {sys.argv[5]}")
print(f"{'stage':<38} {'in process':>10} {'local[2]':>10} {'ratio':>7}")
for stage, by in times.items():
    l, s = statistics.median(by["local"]), statistics.median(by["spark"])
    print(f"{stage:<38} {l:10.2f} {s:10.2f} {s / l:7.2f}")
for engine, run, stage, secs in rows:
    if run == "-1":
        print(f"({stage}: {secs})")
PY
