#!/usr/bin/env bash
# Runs every command line of commands.txt with the given jar and writes, per line, standard output, standard
# error, the exit status and the checksums of the files it wrote into one folder, so that two builds can be
# compared with diff -r:
#   tools/compare/run-commands.sh connection/target/tertius.jar /tmp/before
set -uo pipefail
jar=$(readlink -f "$1"); dest=$2
here=$(cd "$(dirname "$0")" && pwd)
mkdir -p "$dest"
n=0
grep -v '^#' "$here/commands.txt" | grep -v '^$' | while IFS= read -r line; do
  n=$((n + 1)); out="$dest/files.$n"; rm -rf "$out"; mkdir -p "$out"
  args=${line//OUT/$out}
  # shellcheck disable=SC2086
  java -jar "$jar" $args >"$dest/$n.stdout" 2>"$dest/$n.stderr"
  echo "$? $line" >"$dest/$n.status"
  (cd "$out" && find . -type f -exec sha256sum {} + | sort -k2) >"$dest/$n.files"
  rm -rf "$out"
done
