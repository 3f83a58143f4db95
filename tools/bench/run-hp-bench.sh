#!/usr/bin/env bash
# High-precision benchmark: builds the tool, then times the generic D6 case (alpha=1, beta=-1/2, gamma=1,
# delta=-1, w(1)=1/2, w'(1)=1/3, value at 3+2i) as whole processes, side by side with the mpmath peer
# (mp_peer.py): the launcher connection/target/tertius and the peer alternate run by run (7 each), then java -jar
# alone; then prints the table of time per step against digits (in one warm JVM).
#   tools/bench/run-hp-bench.sh            # 50 and 100 digits (7 runs each), then the table 30 50 100 200
#   tools/bench/run-hp-bench.sh 1000       # also 1000 digits in the table (minutes)
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -Pbench -DskipTests package
# the benchmark jar holds core, its dependencies and the benchmark classes
CP=bench/target/tertius-benchmarks.jar
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3 --at 3+2i"
# min and median wall time (and the user time of the median run) of the lines "wall user" on standard input
summary() {
  sort -n | awk '{w[NR]=$1; u[NR]=$2} END {m=int((NR+1)/2); printf "wall min %.2f s, median %.2f s (user %.2f s)\n", w[1], w[m], u[m]}'
}
times() {
  local n=$1; shift
  for i in $(seq "$n"); do /usr/bin/time -f "%e %U" "$@" 2>&1 >/dev/null | tail -1; done | summary
}
echo "== machine: $(nproc) cores, load $(cut -d' ' -f1-3 /proc/loadavg)"
echo "== product costs: Apfloat, BigInteger, limb columns"
java -cp "$CP" org.tertius.bench.HighPrecisionBench apfloat
for d in 50 100; do
  # the launcher and the peer alternate run by run, so that a drift of the machine's speed touches both alike
  echo "== $d digits, whole processes, interleaved: connection/target/tertius (launcher) and the mpmath peer"
  ours=$(mktemp); peer=$(mktemp)
  trap 'rm -f "$ours" "$peer"' EXIT
  for i in $(seq 7); do
    /usr/bin/time -f "%e %U" connection/target/tertius eval $P --digits "$d" 2>&1 >/dev/null | tail -1 >> "$ours"
    /usr/bin/time -f "%e %U" python3 tools/bench/mp_peer.py --digits "$d" 2>&1 >/dev/null | tail -1 >> "$peer"
  done
  echo "launcher: $(summary < "$ours")"
  echo "peer:     $(summary < "$peer")"
  paste <(sort -n "$ours" | cut -d' ' -f1) <(sort -n "$peer" | cut -d' ' -f1) |
    awk '{o[NR]=$1; p[NR]=$2} END {m=int((NR+1)/2); printf "peer / launcher: %.1fx (min), %.1fx (median)\n", p[1]/o[1], p[m]/o[m]}'
  rm -f "$ours" "$peer"
  echo "== $d digits, whole process: java -jar connection/target/tertius.jar"
  times 7 java -jar connection/target/tertius.jar eval $P --digits "$d"
done
echo "== time per step against digits (warm JVM)"
java -cp "$CP" org.tertius.bench.HighPrecisionBench table 30 50 100 200 "$@"
