#!/usr/bin/env bash
# Output benchmark (not a test): the cost of writing tables.
#  1. In one JVM: the numbers of a value row written with String.format (%.17g, %.3e; the writer before 0.1.0's
#     ShortestDecimal), Double.toString and ShortestDecimal (org.tertius.bench.NumberFormatBench).
#  2. Whole processes, interleaved run by run (so that a drift of the machine's speed touches all alike): a 401 x 401
#     grid of the demo solution written as CSV by a build A (default: a build of the commit before the new writer,
#     given as OLD_JAR) and by this build B, and as .npy by B; `field` on the same grid (no table written) as the
#     cost of the computation alone.
#   OLD_JAR=/path/to/old/tertius.jar tools/bench/run-output-bench.sh [runs]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-7}
NEW_JAR=connection/target/tertius.jar
OLD_JAR=${OLD_JAR:?give OLD_JAR, the jar of the build to compare with (e.g. built from an earlier commit)}
[ -f "$NEW_JAR" ] || mvn -o -q -pl connection -am -DskipTests package
[ -f bench/target/tertius-benchmarks.jar ] || mvn -o -q -Pbench -pl bench -am -DskipTests package
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3"
G="--grid -10:10:401,-10:10:401"
echo "== machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), load $(cut -d' ' -f1-3 /proc/loadavg)"
echo "== 1. numbers of a row, in one JVM"
java -cp bench/target/tertius-benchmarks.jar org.tertius.bench.NumberFormatBench
echo "== 2. whole processes, $runs rounds, interleaved"
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
summary() {
  sort -n | awk '{w[NR]=$1} END {m=int((NR+1)/2); printf "min %.2f s, median %.2f s", w[1], w[m]}'
}
for i in $(seq "$runs"); do
  /usr/bin/time -f "%e" java -jar "$OLD_JAR" table $P $G --out "$out/a.csv" 2>&1 >/dev/null | tail -1 >> "$out/t-a"
  /usr/bin/time -f "%e" java -jar "$NEW_JAR" table $P $G --out "$out/b.csv" 2>&1 >/dev/null | tail -1 >> "$out/t-b"
  /usr/bin/time -f "%e" java -jar "$NEW_JAR" table $P $G --format npy --out "$out/b.npy" 2>&1 >/dev/null | tail -1 >> "$out/t-n"
  /usr/bin/time -f "%e" java -jar "$NEW_JAR" field $P $G --out "$out/f.png" 2>&1 >/dev/null | tail -1 >> "$out/t-f"
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
echo "A table CSV (old writer): $(summary < "$out/t-a"), $(stat -c %s "$out/a.csv") bytes"
echo "B table CSV (new writer): $(summary < "$out/t-b"), $(stat -c %s "$out/b.csv") bytes"
echo "B table npy:              $(summary < "$out/t-n"), $(stat -c %s "$out/b.npy") bytes"
echo "B field (no table):       $(summary < "$out/t-f")"
paste <(sort -n "$out/t-a") <(sort -n "$out/t-b") <(sort -n "$out/t-n") <(sort -n "$out/t-f") |
  awk '{a[NR]=$1; b[NR]=$2; n[NR]=$3; f[NR]=$4} END {m=int((NR+1)/2);
       printf "A/B CSV: %.2fx (min), %.2fx (median); writing above field: A %.2f s, B %.2f s, npy %.2f s (medians)\n",
              a[1]/b[1], a[m]/b[m], a[m]-f[m], b[m]-f[m], n[m]-f[m]}'
