#!/usr/bin/env bash
# Byte comparison of two builds' study outputs: every file of `assess` (summary.json, the CSVs, methods.md, charts)
# except report.html and the output manifest, which hold the run's date and duration.
#   bench/study/same-output.sh BEFORE.jar AFTER.jar INPUT [assess options...]
# Runs both with --threads 1 and --threads 2 and compares all four output directories with the first.
set -euo pipefail
before="$1"; after="$2"; input="$3"; shift 3
out="$(mktemp -d)"
trap 'rm -rf "$out"' EXIT
for jar in before after; do
  for t in 1 2; do
    j="$before"; [ "$jar" = after ] && j="$after"
    java -jar "$j" assess "$input" --out "$out/$jar-$t" --threads "$t" --no-progress --quiet "$@" > /dev/null
  done
done
status=0
for d in before-2 after-1 after-2; do
  if diff -rq -x report.html -x .treeproof-output "$out/before-1" "$out/$d" > "$out/diff.txt"; then
    echo "same: $(basename "$input") $* ($d = before-1, $(cd "$out/before-1" && find . -type f | wc -l) files)"
  else
    echo "DIFFERENT: $(basename "$input") $* ($d):"; cat "$out/diff.txt"; status=1
  fi
done
exit $status
