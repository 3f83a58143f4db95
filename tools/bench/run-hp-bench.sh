#!/usr/bin/env bash
# High-precision benchmark: builds the tool, then times the generic D6 case (alpha=1, beta=-1/2, gamma=1,
# delta=-1, w(1)=1/2, w'(1)=1/3, value at 3+2i) as whole processes, side by side with the mpmath peer
# (mp_peer.py), both through the launcher connection/target/tertius and through java -jar, then prints the
# table of time per step against digits (in one warm JVM).
#   tools/bench/run-hp-bench.sh            # 50 and 100 digits (7 runs each), then the table 30 50 100 200
#   tools/bench/run-hp-bench.sh 1000       # also 1000 digits in the table (minutes)
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -DskipTests package
# the tool's jar holds every module and dependency, the benchmark classes of core included
CP=connection/target/tertius.jar
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3 --at 3+2i"
# min and median wall time (and the user time of the median run) of N runs of a command
times() {
  local n=$1; shift
  for i in $(seq "$n"); do /usr/bin/time -f "%e %U" "$@" 2>&1 >/dev/null | tail -1; done | sort -n |
    awk '{w[NR]=$1; u[NR]=$2} END {m=int((NR+1)/2); printf "wall min %.2f s, median %.2f s (user %.2f s)\n", w[1], w[m], u[m]}'
}
echo "== machine: $(nproc) cores, load $(cut -d' ' -f1-3 /proc/loadavg)"
echo "== product costs: Apfloat, BigInteger, limb columns"
java -cp "$CP" org.tertius.core.piii.HighPrecisionBench apfloat
for d in 50 100; do
  echo "== $d digits, whole process: connection/target/tertius (launcher)"
  times 7 connection/target/tertius eval $P --digits "$d"
  echo "== $d digits, whole process: java -jar connection/target/tertius.jar"
  times 7 java -jar connection/target/tertius.jar eval $P --digits "$d"
  echo "== $d digits, whole process: mpmath peer"
  times 3 python3 tools/bench/mp_peer.py --digits "$d"
done
echo "== time per step against digits (warm JVM)"
java -cp "$CP" org.tertius.core.piii.HighPrecisionBench table 30 50 100 200 "$@"
