#!/usr/bin/env bash
# High-precision benchmark: builds core, then times the generic D6 case (alpha=1, beta=-1/2, gamma=1, delta=-1,
# w(1)=1/2, w'(1)=1/3, value at 3+2i) as whole processes, side by side with the mpmath peer (mp_peer.py),
# and prints the table of time per step against digits.
#   tools/bench/run-hp-bench.sh            # 50 and 100 digits side by side, then the table 30 50 100 200
#   tools/bench/run-hp-bench.sh 1000       # also 1000 digits in the table (minutes)
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -o install -DskipTests -pl core
CPFILE=$(mktemp)
mvn -q -B -o dependency:build-classpath -pl core -Dmdep.includeScope=runtime -Dmdep.outputFile="$CPFILE" >/dev/null
CP="core/target/classes:$(cat "$CPFILE")"
rm -f "$CPFILE"
JAVA_OPTS="-XX:+UseSerialGC -XX:TieredStopAtLevel=4 -Xshare:auto"
echo "== machine: $(nproc) cores, load $(cut -d' ' -f1-3 /proc/loadavg)"
echo "== Apfloat and BigInteger product costs"
java $JAVA_OPTS -cp "$CP" org.tertius.core.piii.HighPrecisionBench apfloat
for d in 50 100; do
  echo "== $d digits, whole process: Tertius"
  /usr/bin/time -f "wall %e s" java $JAVA_OPTS -cp "$CP" org.tertius.core.piii.HighPrecisionBench once "$d"
  echo "== $d digits, whole process: mpmath peer"
  /usr/bin/time -f "wall %e s" python3 tools/bench/mp_peer.py --digits "$d"
done
echo "== time per step against digits (warm JVM)"
java $JAVA_OPTS -cp "$CP" org.tertius.core.piii.HighPrecisionBench table 30 50 100 200 "$@"
