#!/usr/bin/env bash
# Benchmarks of the double-precision engine (not tests): builds the project and the bench module, prints the
# machine and its load, the derived figures (CoreReport: nodes, expansions, lower bound and ratio, tree bytes,
# accuracy-matched DormandPrince853 comparison), then the JMH benchmarks, then a whole-process timing of the
# command-line tool. Figures and their reading: tools/bench/CORE_BENCH.md.
#   tools/bench/run-core-bench.sh                  # everything (about 10 minutes on 2 cores)
#   tools/bench/run-core-bench.sh GridBenchmark    # JMH: only benchmarks matching the pattern (report still runs)
#   SKIP_REPORT=1 SKIP_JMH=1 tools/bench/run-core-bench.sh   # only the build and the whole-process timing
set -euo pipefail
cd "$(dirname "$0")/../.."
JMH_VERSION=1.37
OUT=bench/target/results
CORES=${CORES:-0,1}

# JMH is fetched from Maven Central by the ordinary client if the local repository lacks it
for a in jmh-core jmh-generator-annprocess; do
  if [ ! -f "$HOME/.m2/repository/org/openjdk/jmh/$a/$JMH_VERSION/$a-$JMH_VERSION.jar" ]; then
    mvn -q -B dependency:get -Dartifact=org.openjdk.jmh:$a:$JMH_VERSION
  fi
done
mvn -q -B install -DskipTests
mvn -q -B -o -f bench/pom.xml package
mkdir -p "$OUT"
JAR=bench/target/tertius-benchmarks.jar
PIN=""
if command -v taskset >/dev/null; then PIN="taskset -c $CORES"; fi

echo "== machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ *//'), $(free -g | awk '/Mem:/{print $2}') GB"
echo "== uptime: $(uptime)"
echo "== busiest processes now:"
ps -eo pcpu,pid,etime,comm --sort=-pcpu | head -6

if [ -z "${SKIP_REPORT:-}" ]; then
  echo "== derived figures (CoreReport)"
  $PIN java -Xms2g -Xmx4g -cp "$JAR" org.tertius.bench.CoreReport 5 | tee "$OUT/core-report.txt"
fi

if [ -z "${SKIP_JMH:-}" ]; then
  echo "== JMH (-f 1 -wi 3 -i 5), load before: $(cut -d' ' -f1-3 /proc/loadavg)"
  $PIN java -jar "$JAR" -f 1 -wi 3 -i 5 -rf json -rff "$OUT/jmh.json" "$@" | tee "$OUT/jmh.txt" \
    | sed -n '/^Benchmark  /,$p'
  echo "== load after: $(cut -d' ' -f1-3 /proc/loadavg)"
fi

CLI=connection/target/tertius.jar
ARGS=(--alpha=1 --beta=-1/2 --gamma=1 --delta=-1 --z0=1 --w0=1/2 --dw0=1/3)
TMP=$(mktemp -d)
HELP=$(java -jar "$CLI" --help 2>&1 || true)
if grep -qE '^ +field' <<<"$HELP"; then
  echo "== whole process: tertius field, 401 x 401 over [-10,10]^2, sheet 0"
  for i in 1 2 3; do
    /usr/bin/time -f "wall %e s, max RSS %M KB" java -jar "$CLI" field "${ARGS[@]}" \
      --grid=-10:10:401,-10:10:401 --sheet=0 --out="$TMP/field.png"
  done
else
  echo "== 'tertius field' does not exist yet; when it does, time it with:"
  echo "   /usr/bin/time -f 'wall %e s, max RSS %M KB' java -jar $CLI field ${ARGS[*]} --grid=-10:10:401,-10:10:401 --sheet=0 --out=/tmp/field.png"
  echo "== whole process meanwhile: tertius eval at 7+8i (JVM start + one path of distance 10)"
  for i in 1 2 3; do
    /usr/bin/time -f "wall %e s, max RSS %M KB" java -jar "$CLI" eval "${ARGS[@]}" --at=7+8i
  done
fi
rm -rf "$TMP"
