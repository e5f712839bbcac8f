#!/usr/bin/env bash
# The judgement suite as a table: every case of JudgementCases through `treeproof assess` with default options.
#
#   bench/judgement/run.sh [--jar JAR] [--only REGEX] [--draw D] [--table FILE] [--markdown FILE] [--xmx SIZE]
#                          [--rejudge] [--list]
#
# Without --jar it builds target/treeproof.jar (and the test classes) first; with --jar it judges that jar and only
# compiles the test classes. The jar and the classes are copied to a private folder first, so a rebuild during the
# run changes nothing. Studies run one after another, each on all cores. Output: one line per case as it finishes,
# then "right in R of N cases". Scratch files (generated data, every study's output) go to target/judgement/.
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
  mvn -B -q -o -DskipTests package
  jar=target/treeproof.jar
else
  mvn -B -q -o test-compile
fi

private=$(mktemp -d)
trap 'rm -rf "$private"' EXIT
cp -r target/test-classes "$private/classes"
cp "$jar" "$private/treeproof.jar"

# the runner needs only Jackson and Commons CSV besides its own classes; the shaded jar carries both
java -cp "$private/classes:$private/treeproof.jar" org.treeproof.judgement.JudgementSuite \
  --jar "$private/treeproof.jar" "${args[@]}"
