#!/usr/bin/env bash
# Runs the countercheck jar: called by the launchers with COUNTERCHECK_JAVA (the java command) and
# COUNTERCHECK_JAR set. Once per jar, it reviews the starter example twice (the second time over the
# reports of the first) while listing the classes a review loads, and stores them in a class-data-sharing
# archive beside the jar (when that folder is writable); every run then maps the archive in and starts faster. The archive is a static one:
# Java 17 leaves classes compiled for Java 5 (all of picocli's) out of an archive made at exit, and
# a static archive holds them too (a review then takes about a fifth less CPU time to start).
# COUNTERCHECK_JAVA_OPTS adds or overrides JVM options.
set -euo pipefail
java="${COUNTERCHECK_JAVA:?}"
jar="${COUNTERCHECK_JAR:?}"
archive="${jar%.jar}.jsa"
# Start-up matters more than peak speed for a review: the client compiler only, the serial collector,
# and a heap of at most 2 GB: a review holds about 30 kB per element and writes its reports as it goes,
# so that a submission of 20 000 elements fits with room to spare (the heap grows only as it is used).
opts=(-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Xmx2g -Xshare:auto -Xlog:cds=off)
if { [ ! -f "$archive" ] || [ "$jar" -nt "$archive" ]; } && [ -w "$(dirname "$jar")" ]; then
  # Written under a temporary name and moved into place, so that a concurrent run never maps half an archive.
  work="$(mktemp -d)"
  if "$java" "${opts[@]}" -jar "$jar" example >"$work/example.yaml" 2>/dev/null; then
    # Reviewed twice, the classes listed in the second run: a review usually replaces the reports of the
    # one before, which it first reads to recognise them as its own (the response workbook most of all).
    # The second run also writes the PDF, so that the PDF library's classes come from the archive too.
    # Its exit status tells what the review found, which does not matter here.
    "$java" "${opts[@]}" -jar "$jar" review "$work/example.yaml" --out "$work" --date 2026-01-01 >/dev/null 2>&1 || true
    "$java" "${opts[@]}" -XX:DumpLoadedClassList="$work/classes.lst" -jar "$jar" review "$work/example.yaml" \
      --out "$work" --date 2026-01-01 --pdf >/dev/null 2>&1 || true
    if [ -s "$work/classes.lst" ]; then
      "$java" "${opts[@]}" -Xshare:dump -XX:SharedClassListFile="$work/classes.lst" \
        -XX:SharedArchiveFile="$work/countercheck.jsa" -cp "$jar" >/dev/null 2>&1 || true
    fi
    if [ -s "$work/countercheck.jsa" ]; then mv -f "$work/countercheck.jsa" "$archive"; fi
  fi
  rm -rf "$work"
fi
if [ -f "$archive" ] && [ "$archive" -nt "$jar" ]; then
  opts+=(-XX:SharedArchiveFile="$archive")
fi
# shellcheck disable=SC2086
exec "$java" "${opts[@]}" ${COUNTERCHECK_JAVA_OPTS:-} -jar "$jar" "$@"
