#!/usr/bin/env bash
# scan.sh SRC_DIR TAG WORK_DIR: every data table of SRC_DIR (a NAME.opts file beside it gives prep_cuts.py's
# options; suite cases named counts* get "log2 samples-in-columns") through prep_cuts.py and LocalSeparation.java.
# Run from the repository root after `mvn -q -DskipTests package`; prints one line per cut.
set -eu
here="$(cd "$(dirname "$0")" && pwd)"
src=$1; tag=$2; w=$3; mkdir -p "$w"
javac -cp target/treeproof.jar -d "$w" "$here/LocalSeparation.java"
for f in "$src"/*.csv; do
  case $f in *truth*) continue ;; esac
  n=$(basename "$f" .csv); o=""
  [ -f "$src/$n.opts" ] && o=$(cat "$src/$n.opts")
  case $n in counts*) o="log2 samples-in-columns" ;; esac
  [ -f "$w/$n.lab" ] || python3 "$here/prep_cuts.py" "$f" "$w/$n" "$o" || { echo "$tag/$n prepfail"; continue; }
  java -cp "target/treeproof.jar:$w" LocalSeparation "$w/$n.x" "$w/$n.lab" "$tag/$n"
done
