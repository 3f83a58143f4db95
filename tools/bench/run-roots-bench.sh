#!/bin/sh
# Whole-process timings of 'tertius roots' (not a test): the roots of S_11(z; 1/3) (degree 66) and S_15(z; 1/3)
# (degree 120) to 30 digits with the picture, 5 runs each, after 'mvn -q -DskipTests package'. Prints the
# machine's load first: timings on a busy machine are slower in proportion.
set -e
cd "$(dirname "$0")/../.."
jar=connection/target/tertius.jar
test -f "$jar" || { echo "build first: mvn -q -DskipTests package" >&2; exit 2; }
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
echo "machine: $(nproc) cores, load: $(cut -d' ' -f1-3 /proc/loadavg)"
for n in 11 15; do
  for run in 1 2 3 4 5; do
    start=$(date +%s.%N)
    java -jar "$jar" roots --n "$n" --mu 1/3 --digits 30 --out "$tmp/roots.csv" --plot "$tmp/roots.png" 2>/dev/null
    end=$(date +%s.%N)
    echo "roots --n $n --mu 1/3 --digits 30 --plot: run $run: $(echo "$end - $start" | bc) s wall"
  done
done
