#!/usr/bin/env bash
# Which features the preparation's multimodal-feature note would name, on the unseen sets and the suite's draws.
#   bench/judgement/multimodal/run.sh [JAR]
# Generates the 90 unseen sets (bench/judgement/unseen/gen.py) into a temporary folder, and reads the suite's synthetic
# sets of draws 0-6 from target/judgement/data-D (made by bench/judgement/run.sh --draw D; missing draws are skipped).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(cd "$here/../../.." && pwd)"
jar="${1:-$root/target/treeproof.jar}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
python3 "$root/bench/judgement/unseen/gen.py" "$work/unseen" > /dev/null
javac -d "$work/classes" -cp "$jar" "$here/MultimodalNoteCheck.java"
echo "== unseen sets"
java -cp "$jar:$work/classes" MultimodalNoteCheck "$work"/unseen/*.csv
for d in 0 1 2 3 4 5 6; do
  dir="$root/target/judgement/data-$d"
  [ -d "$dir" ] || continue
  echo "== suite draw $d"
  java -cp "$jar:$work/classes" MultimodalNoteCheck $(ls "$dir"/*.csv | grep -v -- '-truth\.csv$' | grep -v '/bc\.csv$' | grep -v '/X[NS]')
done
