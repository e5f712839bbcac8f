#!/usr/bin/env bash
# The judgement suite as a table: every case of JudgementCases through `treeproof assess` with default options.
#
#   bench/judgement/run.sh [--jar JAR] [--only REGEX] [--table FILE] [--xmx SIZE] [--list]
#
# Without --jar it builds target/treeproof.jar (and the test classes) first; with --jar it judges that jar and only
# compiles the test classes. Studies run one after another, each on all cores. Output: one line per case as it
# finishes, then "right in R of N cases". Scratch files go to target/judgement/.
set -euo pipefail
cd "$(dirname "$0")/../.."

jar=""
args=()
while [[ $# -gt 0 ]]; do
  case "$1" in
    --jar) jar="$2"; shift 2 ;;
    *) args+=("$1"); shift ;;
  esac
done

if [[ -z "$jar" ]]; then
  mvn -q -o -DskipTests package
  jar=target/treeproof.jar
else
  mvn -q -o test-compile
fi

# the runner needs only Jackson and Commons CSV besides its own classes; the shaded jar carries both
exec java -cp "target/test-classes:$jar" org.treeproof.judgement.JudgementSuite --jar "$jar" "${args[@]}"
