#!/usr/bin/env bash
# Times every linkage in treeproof (Java, one thread) and scipy on the same points, n = 2000, 5000, 10000,
# and prints medians and ratios side by side; Java runs twice, with the JVM's default memory pages and
# with transparent huge pages (-XX:+UseTransparentHugePages, which numpy already uses for big arrays).
# Short on purpose (the machine is shared):
#   bench/linkage/run.sh                 # all sizes, REPS=3 runs per method and size
#   SIZES="2000" REPS=5 bench/linkage/run.sh
#   bench/linkage/run.sh cophenetic      # n = 20000: streaming cophenetic correlation in a 4 GB heap
# PYTHON selects the interpreter (default /usr/bin/python3, scipy 1.10.1).
set -euo pipefail
cd "$(dirname "$0")/../.."
PYTHON=${PYTHON:-/usr/bin/python3}
SIZES=${SIZES:-"2000 5000 10000"}
REPS=${REPS:-3}
OUT=bench/out/linkage
mkdir -p "$OUT"

[ -d target/classes/org/treeproof/tree ] || mvn -q -o compile
javac -d "$OUT" -cp target/classes bench/linkage/LinkageBench.java
JAVA=(java -XX:+UseSerialGC -XX:ActiveProcessorCount=1 -XX:+AlwaysPreTouch -cp "target/classes:$OUT")

if [ "${1:-}" = cophenetic ]; then
  # a small young generation lets the old one hold the array and the copy CondensedDistances.of makes
  "${JAVA[@]}" -Xmx4g -Xmn64m LinkageBench cophenetic 20000
  exit 0
fi

args=()
for n in $SIZES; do
  f="$OUT/points-$n.f64"
  [ -f "$f" ] || "$PYTHON" bench/linkage/make_points.py "$n" "$f"
  args+=("$f" "$n")
done
export OMP_NUM_THREADS=1 OPENBLAS_NUM_THREADS=1 MKL_NUM_THREADS=1
"$PYTHON" bench/linkage/bench_scipy.py "$REPS" "${args[@]}" > "$OUT/scipy.tsv"
"${JAVA[@]}" -Xms3g -Xmx3g LinkageBench "$REPS" "${args[@]}" > "$OUT/java.tsv"
# numpy asks the kernel for transparent huge pages on large arrays; the JVM does so only when told
"${JAVA[@]}" -Xms3g -Xmx3g -XX:+UseTransparentHugePages LinkageBench "$REPS" "${args[@]}" > "$OUT/java-thp.tsv"

"$PYTHON" - "$OUT/scipy.tsv" "$OUT/java.tsv" "$OUT/java-thp.tsv" <<'PY'
import sys
def load(p):
    return {(r[0], r[1]): tuple(float(v) for v in r[2:]) for r in (l.split("\t") for l in open(p) if l.strip())}
s, j, t = (load(p) for p in sys.argv[1:4])
print("median CPU seconds of REPS runs (wall-clock in brackets); ratio = scipy / java, above 1 means java is faster")
print(f"{'n':>6} {'linkage':<9} {'scipy':>15} {'java':>15} {'ratio':>6} {'java+THP':>15} {'ratio':>6}  same heights")
for key in s:
    (sw, sc, sh), (jw, jc, jh), (tw, tc, th) = s[key], j[key], t[key]
    same = all(abs(sh - h) <= 1e-9 * abs(sh) for h in (jh, th))
    print(f"{key[0]:>6} {key[1]:<9} {sc:6.3f} [{sw:6.3f}] {jc:6.3f} [{jw:6.3f}] {sc / jc:6.2f} "
          f"{tc:6.3f} [{tw:6.3f}] {sc / tc:6.2f}  {'yes' if same else 'NO'}")
PY
