#!/usr/bin/env bash
# Speed benchmark (not a test): whole processes of two builds, A (the build to compare with) and B (this one),
# alternating run by run so that a drift of the machine's speed touches both alike, with the machine and its load
# average printed beside the figures (each round waits for a moment when the processors are idle, since the
# machine is shared; a round that could not wait says so):
#  1. `field` on the 401 x 401 grid over [-10, 10]^2 of the demo solution (the launcher of each build): wall, user
#     and resident memory, B's summary line (nodes, points served by the tree, by own paths);
#  2. `eval --at 3+2i --digits 100` by A, B and the mpmath peer (tools/bench/mp_peer.py), in turn;
#  3. thread scaling in one JVM (org.tertius.bench.GridScaling): the grid pass alone and the tree growth alone (one
#     thread but for the listing of its holes) with 1, 2 and all processors.
# A is a connection/target folder of another build, built in place (its launcher's class-data archive names the
# jar's path), e.g. of main:
#   git worktree add /tmp/main main && (cd /tmp/main && mvn -o -q -pl connection -am -DskipTests package)
#   OLD_DIR=/tmp/main/connection/target tools/bench/run-speed-bench.sh [runs]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-7}
OLD_DIR=${OLD_DIR:?give OLD_DIR, the connection/target folder of the build to compare with}
A=$OLD_DIR/tertius
B=connection/target/tertius
[ -x "$A" ] || { echo "no launcher $A" >&2; exit 2; }
[ -x "$B" ] || mvn -o -q -pl connection -am -DskipTests package
[ -f bench/target/tertius-benchmarks.jar ] || mvn -o -q -Pbench -pl bench -am -DskipTests package
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3"
G="--grid -10:10:401,-10:10:401"
load() { cut -d' ' -f1-3 /proc/loadavg; }
echo "== machine: $(nproc) processors, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), load $(load)"
echo "   A: $A"
echo "   B: $B"
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
# "wall user rss" lines on standard input: min and median wall, the median run's user time and memory
summary() {
  sort -n | awk '{w[NR]=$1; u[NR]=$2; m[NR]=$3} END {k=int((NR+1)/2);
    printf "wall min %.2f s, median %.2f s (user %.2f s, %d MB resident)", w[1], w[k], u[k], m[k]/1024}'
}
ratio() { # ratio of the min and median walls of two files: first / second
  paste <(sort -n "$1" | cut -d' ' -f1) <(sort -n "$2" | cut -d' ' -f1) |
    awk '{a[NR]=$1; b[NR]=$2} END {k=int((NR+1)/2); printf "%.2fx (min), %.2fx (median)", a[1]/b[1], a[k]/b[k]}'
}
idle_percent() { # share of idle processor time over 2 s, from /proc/stat
  local a b t i
  a=($(head -1 /proc/stat)); sleep 2; b=($(head -1 /proc/stat)); t=0
  for i in 1 2 3 4 5 6 7 8; do t=$((t + b[i] - a[i])); done
  echo $((100 * (b[4] - a[4]) / t))
}
quiet() { # before a round: wait (at most about 3 minutes) for the other users of the machine to pause
  local i
  for i in $(seq 60); do [ "$(idle_percent)" -ge 97 ] && return; done
  echo "   (round started on a busy machine: load $(load))"
}
timed() { # appends "wall user rss" of the command to file $1
  local file=$1; shift
  /usr/bin/time -o "$out/t" -f "%e %U %M" "$@" >/dev/null 2>"$out/err" || { cat "$out/err" >&2; exit 1; }
  cat "$out/t" >> "$file"
}

echo "== 1. field $G, whole processes, $runs rounds (A, B alternating); load $(load)"
for i in $(seq "$runs"); do
  quiet
  timed "$out/fa" "$A" field $P $G --out "$out/a.png"
  timed "$out/fb" "$B" field $P $G --out "$out/b.png"
done
grep -o '[0-9]* nodes.*failed; tree [0-9.]* s, grid [0-9.]* s' "$out/err" | sed 's/^/   B (last run): /'
echo "   A: $(summary < "$out/fa")"
echo "   B: $(summary < "$out/fb")"
echo "   A / B: $(ratio "$out/fa" "$out/fb"); load $(load)"

echo "== 2. eval $P --at 3+2i --digits 100, $runs rounds (A, B, peer alternating); load $(load)"
for i in $(seq "$runs"); do
  quiet
  timed "$out/ea" "$A" eval $P --at 3+2i --digits 100
  timed "$out/eb" "$B" eval $P --at 3+2i --digits 100
  timed "$out/ep" python3 tools/bench/mp_peer.py --digits 100
done
echo "   A:    $(summary < "$out/ea")"
echo "   B:    $(summary < "$out/eb")"
echo "   peer: $(summary < "$out/ep")"
echo "   A / B: $(ratio "$out/ea" "$out/eb"); peer / A: $(ratio "$out/ep" "$out/ea"); peer / B: $(ratio "$out/ep" "$out/eb"); load $(load)"

echo "== 3. thread scaling in one JVM (B)"
quiet
java -cp bench/target/tertius-benchmarks.jar org.tertius.bench.GridScaling "$runs"
