#!/usr/bin/env bash
# High-precision tabulation benchmark (not a test): many points to many digits in one process, a build A (OLD_JAR,
# e.g. of the commit before the shared node series) against this build B, whole processes interleaved run by run so
# that a drift of the machine's speed touches both alike. Prints the machine, the load, min / median wall and
# processor times and the ratios; checks that A and B print the same values to all but the last digit or two.
#   OLD_JAR=/path/to/old/tertius.jar tools/bench/run-hp-table-bench.sh [runs] [line points] [scattered points]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-3}
nline=${2:-400}
nscat=${3:-200}
NEW_JAR=connection/target/tertius.jar
OLD_JAR=${OLD_JAR:?give OLD_JAR, the jar of the build to compare with (e.g. built from an earlier commit)}
[ -f "$NEW_JAR" ] || mvn -o -q -pl connection -am -DskipTests package
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3"
# scattered points: uniform in the disk |z| <= 8 outside |z| < 0.3, a fixed seed (a scenario of our own)
AT=$(python3 -c "
import random, math
random.seed(7)
pts = []
while len(pts) < $nscat:
    r = 8 * math.sqrt(random.random()); t = random.uniform(-math.pi, math.pi)
    if r >= 0.3:
        pts.append('%.6f%+.6fi' % (r * math.cos(t), r * math.sin(t)))
print(','.join(pts))")
echo "== machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), load $(cut -d' ' -f1-3 /proc/loadavg)"
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
run() { # label jar args...
  local label=$1 jar=$2; shift 2
  /usr/bin/time -f "%e %U %S" java -jar "$jar" "$@" 2>"$out/err" >"$out/$label.csv" || { cat "$out/err"; exit 1; }
  tail -1 "$out/err" | awk '{printf "%s %.2f\n", $1, $2 + $3}' >> "$out/t-$label"
}
for i in $(seq "$runs"); do
  run line-a "$OLD_JAR" table $P --line 0.5:8:"$nline" --digits 100
  run line-b "$NEW_JAR" table $P --line 0.5:8:"$nline" --digits 100
  run scat-a "$OLD_JAR" eval $P --at "$AT" --digits 50
  run scat-b "$NEW_JAR" eval $P --at "$AT" --digits 50
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
summary() { sort -n "$1" | awk '{w[NR]=$1; c[NR]=$2} END {m=int((NR+1)/2); printf "wall min %.2f median %.2f s, cpu median %.2f s", w[1], w[m], c[m]}'; }
for k in line scat; do
  echo "$k A: $(summary "$out/t-$k-a")"
  echo "$k B: $(summary "$out/t-$k-b")"
  paste <(sort -n "$out/t-$k-a") <(sort -n "$out/t-$k-b") |
    awk -v k="$k" '{a[NR]=$1; b[NR]=$3} END {m=int((NR+1)/2); printf "%s A/B: min %.2fx, median %.2fx\n", k, a[1]/b[1], a[m]/b[m]}'
  # values agree to all but the last printed digit or two (the paths differ in their steps)
  python3 - "$out/$k-a.csv" "$out/$k-b.csv" <<'PY'
import sys, csv
from decimal import Decimal, getcontext
getcontext().prec = 200
def rows(p):
    return [r for r in csv.reader(l for l in open(p) if not l.startswith('#'))][1:]
a, b = rows(sys.argv[1]), rows(sys.argv[2])
worst = 0
for ra, rb in zip(a, b):
    for k in (3, 5):  # w and w', each relative to its modulus (as the digit estimates are)
        xr, xi, yr, yi = (Decimal(v) for v in (ra[k], ra[k + 1], rb[k], rb[k + 1]))
        d = ((xr - yr) ** 2 + (xi - yi) ** 2).sqrt()
        m = max((xr * xr + xi * xi).sqrt(), (yr * yr + yi * yi).sqrt())
        if d != 0:
            worst = max(worst, float(d / m))
print("  largest difference of the values A/B relative to their moduli: %.1e (%d rows)" % (worst, len(a)))
PY
done
