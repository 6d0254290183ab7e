#!/usr/bin/env bash
# Writes every report of the samples, the starter example and the rule fixtures (JSON, HTML, PDF,
# JUnit XML, SARIF) with a fixed review date into DIR, each submission also under the house ruleset,
# so that two builds can be compared byte for byte:
#   src/bench/report-snapshot.sh target/countercheck.jar /tmp/before
#   ... change, rebuild ...
#   src/bench/report-snapshot.sh target/countercheck.jar /tmp/after && diff -r /tmp/before /tmp/after
# JAVA_OPTS passes JVM options to every run (e.g. -Dcountercheck.parallel=false).
set -euo pipefail
jar="${1:?usage: report-snapshot.sh JAR DIR}"
out="${2:?usage: report-snapshot.sh JAR DIR}"
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
mkdir -p "$out/in"
java -jar "$jar" example >"$out/in/starter-example.yaml"
cp "$here"/sample-submissions/*.yaml "$here"/src/test/resources/rule-fixtures/*.yaml "$out/in/"
run() {
  # The exit status says what the review found; only the files matter here.
  # shellcheck disable=SC2086
  java ${JAVA_OPTS:-} -jar "$jar" review "$@" --date 2026-01-01 --pdf --junit --sarif >/dev/null 2>&1 || true
}
jar="$(cd "$(dirname "$jar")" && pwd)/$(basename "$jar")"
cd "$out"  # the reports name the submission as given: a relative path, the same in every snapshot
run in --out own
run in --out house --ruleset house-example --rulesets-dir "$here/rulesets"
rm -rf in
cd - >/dev/null
(cd "$out" && find . -type f | sort | xargs sha256sum) >"$out.sha256"
echo "$(wc -l <"$out.sha256") files; hashes in $out.sha256"
