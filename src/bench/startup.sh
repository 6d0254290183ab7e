#!/usr/bin/env bash
# Start-up times of the built jar through the launcher (src/launcher/run.sh, as ./countercheck and the
# release run it): `--version`, `validate` and `review` of the one-element starter example, each RUNS
# times (default 7). Prints the median, least and greatest wall time and the CPU time (user + system)
# of each. The first call creates the class-data-sharing archive and is not counted.
#   src/bench/startup.sh [JAR]        (default target/countercheck.jar)
# COUNTERCHECK_JAVA_OPTS passes JVM options to every run, as with the launcher.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$(cd "$(dirname "${1:-$here/target/countercheck.jar}")" && pwd)/$(basename "${1:-target/countercheck.jar}")"
runs="${RUNS:-7}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
export COUNTERCHECK_JAVA=java COUNTERCHECK_JAR="$jar"
launcher="$here/src/launcher/run.sh"
"$launcher" example >"$work/one.yaml"
"$launcher" --version >/dev/null
measure() {
  local what="$1"
  shift
  : >"$work/times"
  for _ in $(seq "$runs"); do
    # The exit status says what the review found; only the time matters here.
    /usr/bin/time -f "%e %U %S" -a -o "$work/times" "$launcher" "$@" >/dev/null 2>&1 || true
  done
  cut -d' ' -f1 "$work/times" | sort -n >"$work/wall"
  awk '{ printf "%.2f\n", $2 + $3 }' "$work/times" | sort -n >"$work/cpu"
  local mid=$(((runs + 1) / 2))
  printf "%-28s wall median %s s (least %s, greatest %s); CPU median %s s (least %s); %d runs\n" "$what" \
    "$(sed -n "${mid}p" "$work/wall")" "$(head -1 "$work/wall")" "$(tail -1 "$work/wall")" \
    "$(sed -n "${mid}p" "$work/cpu")" "$(head -1 "$work/cpu")" "$runs"
}
measure "countercheck --version" --version
measure "validate (one element)" validate "$work/one.yaml"
measure "review (one element)" review "$work/one.yaml" --out "$work/out" --date 2026-01-01
