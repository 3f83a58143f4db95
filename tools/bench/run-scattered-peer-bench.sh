#!/usr/bin/env bash
# Scattered high-precision points against the mpmath route (a benchmark, not a test). The targets are those of
# run-hp-table-bench.sh (uniform in 0.3 <= |z| <= 8, seed 7, a scenario of our own). Tertius computes all N points
# in one process (`eval --at ... --digits D`); the peer (mp_scattered_peer.py: mpmath Taylor series, each target
# along the straight segment from z0 = 1, as a user of mpmath would) computes the first S of them, since it takes
# about a second per point at 50 digits; its time for N points is extrapolated from its time per reached target
# (targets whose segment runs into a pole are blocked for the peer and counted apart). The two alternate run by run.
# Prints the machine and load, both times, the ratio, and the largest difference of w between the two on the
# sample (relative to |w|), which must be below 10^-(D-5).
#   tools/bench/run-scattered-peer-bench.sh [runs=3] [N=1000] [S=30] [D=50]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-3}
n=${2:-1000}
sample=${3:-30}
digits=${4:-50}
JAR=connection/target/tertius.jar
[ -f "$JAR" ] || mvn -o -q -pl connection -am -DskipTests package
P="--alpha 1 --beta -1/2 --gamma 1 --delta -1 --z0 1 --w0 1/2 --dw0 1/3"
points() {
  python3 -c "
import random, math
random.seed(7)
pts = []
while len(pts) < $1:
    r = 8 * math.sqrt(random.random()); t = random.uniform(-math.pi, math.pi)
    if r >= 0.3:
        pts.append('%.6f%+.6fi' % (r * math.cos(t), r * math.sin(t)))
print(','.join(pts))"
}
AT=$(points "$n")
SAMPLE=$(points "$sample")
echo "== machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), load $(cut -d' ' -f1-3 /proc/loadavg)"
echo "== $n points at $digits digits (Tertius, whole process) against the mpmath route on the first $sample"
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
for i in $(seq "$runs"); do
  /usr/bin/time -f "%e" java -jar "$JAR" eval $P --at "$AT" --digits "$digits" >"$out/ours.csv" 2>"$out/err" \
    || { cat "$out/err"; exit 1; }
  tail -1 "$out/err" >> "$out/t-ours"
  (cd tools/bench && python3 mp_scattered_peer.py --digits "$digits" --at="$SAMPLE") > "$out/peer.txt"
  tail -1 "$out/peer.txt" | awk '{print $9}' >> "$out/t-peer"
done
tail -1 "$out/peer.txt"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
python3 - "$out" "$n" "$digits" <<'PY'
import sys, csv, statistics, re as regex
re_number = regex.compile(r'[-+]?[0-9]+\.?[0-9]*(?:[eE][-+]?[0-9]+)?')
from decimal import Decimal, getcontext
getcontext().prec = 200
d, n, digits = sys.argv[1], int(sys.argv[2]), int(sys.argv[3])
ours = sorted(float(x) for x in open(d + '/t-ours'))
peer = sorted(float(x) for x in open(d + '/t-peer'))
mo, mp_ = statistics.median(ours), statistics.median(peer)
print('Tertius, %d points: wall min %.2f s, median %.2f s' % (n, ours[0], mo))
print('peer, per reached point: min %.3f s, median %.3f s; for %d points (extrapolated) %.0f s' % (peer[0], mp_, n, n * mp_))
print('ratio peer / Tertius: %.0fx (medians)' % (n * mp_ / mo))
rows = [r for r in csv.reader(l for l in open(d + '/ours.csv') if not l.startswith('#'))][1:]
worst = 0
checked = 0
target = -1
for line in open(d + '/peer.txt'):
    parts = line.split(' ', 1)
    if len(parts) < 2 or parts[0] == 'reached':
        continue
    # one line per target, in the order of the targets, blocked ones included: index by target, not by reached count
    target += 1
    if parts[1].startswith('blocked'):
        continue
    m = re_number.findall(parts[1].replace(' ', ''))
    if len(m) != 2:
        continue
    checked += 1
    re, im = Decimal(m[0]), Decimal(m[1])
    r = rows[target]
    xr, xi = Decimal(r[3]), Decimal(r[4])
    diff = ((xr - re) ** 2 + (xi - im) ** 2).sqrt() / (xr * xr + xi * xi).sqrt()
    worst = max(worst, float(diff))
print('largest difference of w on the %d sample points reached by both (relative): %.1e' % (checked, worst))
if not worst < 10.0 ** -(digits - 5):
    print('FAILED: the difference exceeds 1e-%d' % (digits - 5))
    sys.exit(1)
PY
