#!/usr/bin/env bash
# A real standalone Spark cluster on this machine, from the Maven jars only: a master and a worker, each its own
# JVM (org.apache.spark.deploy.master.Master and ...deploy.worker.Worker) bound to 127.0.0.1; the worker starts
# its executor JVM. treeproof is submitted to it with SparkSubmit and --engine spark, then run again with
# --engine local, and the two output directories are compared byte for byte (summary.json, clusters.csv,
# scores.csv). Nothing is downloaded beyond Maven's own dependency resolution.
#   bench/spark/standalone.sh                       # n = 2000, p = 500, the default study
#   N=300 P=50 bench/spark/standalone.sh            # a quick check
# Environment: N, P, CORES (worker cores, 2), EXECUTOR_MEMORY (2g), DRIVER_MEMORY (3g), ARGS (extra assess options).
# Prints wall seconds of both runs; leaves logs and outputs in bench/out/standalone/.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../.." && pwd)"
out="$root/bench/out/standalone"
N="${N:-2000}"; P="${P:-500}"; CORES="${CORES:-2}"
EXECUTOR_MEMORY="${EXECUTOR_MEMORY:-2g}"; DRIVER_MEMORY="${DRIVER_MEMORY:-3g}"; ARGS="${ARGS:-}"
PYTHON="${PYTHON:-python3}"
rm -rf "$out/spark-home" "$out/work" "$out/events" "$out/result-spark" "$out/result-local"
mkdir -p "$out/spark-home/jars" "$out/work" "$out/events" "$out/logs"

(cd "$root" && mvn -q -o -DskipTests package \
  && mvn -q dependency:build-classpath -Dmdep.includeScope=compile -Dmdep.outputFile="$out/cp.txt")
jar="$root/target/treeproof.jar"
# a Spark home whose jars/ folder holds the Maven jars: the worker builds its executors' class path from it
{ tr ':' '\n' < "$out/cp.txt"; echo; } | while read -r j; do [ -n "$j" ] && ln -sf "$j" "$out/spark-home/jars/"; done
export SPARK_HOME="$out/spark-home" SPARK_SCALA_VERSION=2.13 SPARK_LOCAL_IP=127.0.0.1 SPARK_LOCAL_DIRS="$out/work"
cp="$SPARK_HOME/jars/*"

table="$out/table_n${N}_p${P}"
[ -f "$table.csv" ] || "$PYTHON" "$root/bench/study/make_data.py" "$N" "$P" "$table"

free_port() { "$PYTHON" -c 'import socket; s = socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])'; }
port=$(free_port); ui=$(free_port); wui=$(free_port)
master="spark://127.0.0.1:$port"
pids=()
cleanup() { for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done; wait 2>/dev/null || true; }
trap cleanup EXIT

java -Xmx512m -cp "$cp" org.apache.spark.deploy.master.Master --host 127.0.0.1 --port "$port" \
  --webui-port "$ui" > "$out/logs/master.log" 2>&1 &
pids+=($!)
java -Xmx512m -cp "$cp" org.apache.spark.deploy.worker.Worker --host 127.0.0.1 --cores "$CORES" \
  --memory "$EXECUTOR_MEMORY" --webui-port "$wui" --work-dir "$out/work" "$master" > "$out/logs/worker.log" 2>&1 &
pids+=($!)
echo "master $master (pid ${pids[0]}), worker pid ${pids[1]}; waiting for the worker to register"
for i in $(seq 1 120); do
  if curl -s "http://127.0.0.1:$ui/json/" | grep -q '"aliveworkers" *: *1'; then break; fi
  if [ "$i" = 120 ]; then echo "the worker did not register within 120 s" >&2; exit 1; fi
  sleep 1
done
curl -s "http://127.0.0.1:$ui/json/" > "$out/logs/master-state.json"
echo "worker registered: $(grep -o '"cores" *: *[0-9]*' "$out/logs/master-state.json" | head -1)"

start=$(date +%s.%N)
java "-Xmx$DRIVER_MEMORY" -cp "$cp" org.apache.spark.deploy.SparkSubmit --master "$master" \
  --class org.treeproof.cli.Main --executor-memory "$EXECUTOR_MEMORY" --total-executor-cores "$CORES" \
  --conf spark.driver.host=127.0.0.1 --conf spark.driver.bindAddress=127.0.0.1 --conf spark.ui.enabled=false \
  --conf spark.log.level=WARN --conf spark.eventLog.enabled=true --conf spark.eventLog.dir="file://$out/events" --conf spark.eventLog.compress=false \
  --conf spark.eventLog.rolling.enabled=false \
  "$jar" assess "$table.csv" --out "$out/result-spark" --engine spark $ARGS \
  > "$out/logs/spark-run.log" 2>&1
spark_s=$(echo "$(date +%s.%N) - $start" | bc)
curl -s "http://127.0.0.1:$ui/json/" > "$out/logs/master-after.json"

start=$(date +%s.%N)
java "-Xmx$DRIVER_MEMORY" -jar "$jar" assess "$table.csv" --out "$out/result-local" --threads "$CORES" $ARGS \
  > "$out/logs/local-run.log" 2>&1
local_s=$(echo "$(date +%s.%N) - $start" | bc)

same=yes
for f in summary.json clusters.csv scores.csv; do
  if cmp "$out/result-spark/$f" "$out/result-local/$f"; then echo "$f: identical ($(wc -c < "$out/result-local/$f") bytes)"
  else same=no; fi
done
"$PYTHON" - "$out" "$N" "$P" "$CORES" "$EXECUTOR_MEMORY" "$spark_s" "$local_s" "$same" <<'PY' | tee "$out/result.txt"
import glob, json, os, sys
out, n, p, cores, mem, spark_s, local_s, same = sys.argv[1:]
state = json.load(open(f"{out}/logs/master-after.json"))
apps = [f"{a['id']} {a['state']} on {a['cores']} cores, {a['duration'] / 1000:.1f} s" for a in state["completedapps"]]
tasks, executors, hosts = 0, set(), set()
for f in glob.glob(f"{out}/events/**/*", recursive=True):
    if os.path.isdir(f) or "appstatus" in f:
        continue
    for line in open(f):
        e = json.loads(line)
        if e.get("Event") == "SparkListenerTaskEnd":
            tasks += 1
            executors.add(e["Task Info"]["Executor ID"])
            hosts.add(e["Task Info"]["Host"])
print(f"n = {n}, p = {p}: standalone cluster (master and worker JVMs, worker {cores} cores, executor {mem}): "
      f"{float(spark_s):.1f} s wall; --engine local --threads {cores}: {float(local_s):.1f} s wall")
print(f"applications the master completed: {'; '.join(apps) or 'none'}")
print(f"Spark tasks: {tasks}, on executor(s) {sorted(executors)} at {sorted(hosts)} (the driver is not an executor)")
print(f"summary.json, clusters.csv, scores.csv identical: {same}")
PY
[ "$same" = yes ] && [ -n "$(ls "$out/events")" ]
