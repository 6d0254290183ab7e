#!/usr/bin/env bash
# Makes the release archive target/countercheck-VERSION-OS-ARCH.tar.gz (run by `mvn -B package -Prelease`
# after the jar is built): a Java runtime trimmed by jlink to the modules countercheck uses, the jar,
# the POSIX and Windows launchers, the sample submissions and the README. The runtime is the build
# machine's platform: build on Windows for a Windows archive.
set -euo pipefail
cd "$(dirname "$0")/../.."
version="$1"
os="$(uname -s | tr '[:upper:]' '[:lower:]')"
arch="$(uname -m)"
name="countercheck-$version"
out="target/release/$name"
rm -rf "target/release"
mkdir -p "$out/bin" "$out/lib"
# The modules the jar needs (jdeps --print-module-deps: java.base, java.desktop, java.net.http, java.sql),
# and those its libraries reach by reflection or service lookup (logging, scripting for the SVG
# renderer, management, Unsafe, extra charsets).
jlink --add-modules java.base,java.desktop,java.net.http,java.sql,java.logging,java.scripting,java.management,jdk.unsupported,jdk.charsets \
  --strip-debug --no-header-files --no-man-pages --compress=2 --output "$out/runtime"
"$out/runtime/bin/java" -Xshare:dump >/dev/null
cp target/countercheck.jar src/launcher/run.sh "$out/lib/"
cp src/launcher/countercheck src/launcher/countercheck.cmd "$out/bin/"
cp -r sample-submissions README.md "$out/"
tar -C target/release -czf "target/$name-$os-$arch.tar.gz" "$name"
echo "release: target/$name-$os-$arch.tar.gz ($(du -sh "$out" | cut -f1) unpacked)"
