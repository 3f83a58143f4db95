#!/usr/bin/env python3
"""Reference values of the demo solution of PIII next to its poles, for the honesty of error estimates there.

Solution: alpha = 1, beta = -1/2, gamma = 1, delta = -1, w(1) = 1/2, w'(1) = 1/3 (the demo of the README).
Poles: four poles of w found by `tertius poles` (double precision), each refined by Newton's method on 1/w,
z <- z + w/w', with w, w' from `tertius eval --digits 45`, to the double nearest the pole. Points:
p + d e^(i theta) for d = 1e-2, 1e-3, ..., 1e-14, rounded to doubles and written as the exact decimal
expansions of those doubles, so that a double-precision run and a high-precision one evaluate at exactly the
same point (a shortest round-trip form differs from the double by up to half an ulp, which 1e-6 from a pole
already changes w in the tenth digit).
Values: w and w' at each point from `tertius eval --digits 40` (the project's own high-precision mode, which
estimates its correct digits from two runs at different precision; the column `digits` is that estimate).

Independent check: at the points with d >= 1e-6 the values are recomputed with the Taylor integrator of
tools/reference/piii_reference.py (mpmath only, no code shared with the project) at 40 digits along the bent
log z path of that script, and the smallest number of agreeing digits is written into the header.

Usage (from the repository root, after `mvn -B -q -o -DskipTests package`):
    python3 tools/reference/near_pole_reference.py > tests/src/test/resources/reference/piii-near-poles.csv
"""

import math
import os
import subprocess
import sys
from decimal import Decimal

import mpmath
from mpmath import mp, mpc, mpf

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import piii_reference as independent  # noqa: E402

JAR = os.path.join('connection', 'target', 'tertius.jar')
DATA = ['--alpha', '1', '--beta', '-1/2', '--gamma', '1', '--delta', '-1', '--z0', '1', '--w0', '1/2',
        '--dw0', '1/3']
# (pole from `tertius poles ... --grid -6:6:121,-6:6:121`, direction theta of the approach)
POLES = [(('5.5248040100105890', '0'), 2.0),
         (('2.0526016697179350', '-1.5256118014892808'), 0.7),
         (('-4.8154939132939300', '-0.073563956518903070'), -1.2),
         (('-0.10642224010620646', '0.0072022313385908710'), 0.3)]
EXPONENTS = range(2, 15)


def exact(x):
    """The exact decimal expansion of a double."""
    return format(Decimal(x), 'f')


def point(re, im):
    return exact(re) + ('+' if math.copysign(1, im) > 0 else '') + exact(im) + 'i'


def evaluate(points, digits):
    """Rows z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,digits of the tool at the given doubles."""
    out = subprocess.run(['java', '-jar', JAR, 'eval'] + DATA + ['--digits', str(digits), '--at',
                         ','.join(point(re, im) for re, im in points)],
                         capture_output=True, text=True, check=True).stdout
    return [line.split(',') for line in out.strip().splitlines() if line[0] not in '#z']


def refine(re, im):
    mp.dps = 60
    z = mpc(re, im)
    for _ in range(4):
        r = evaluate([(float(z.real), float(z.imag))], 45)[0]
        z = z + mpc(r[3], r[4]) / mpc(r[5], r[6])
    return float(z.real), float(z.imag)


def independent_digits(zr, zi, w, dw):
    sc = dict(independent.SCENARIOS['generic'])
    target = ((exact(zr), exact(zi)), 0, '')
    r = independent.run_once(sc, target, independent.RUN1[:1] + (70, mpf('0.25')), 'logbend', 0)
    with mp.workdps(60):
        e = max(abs(r['w'] - w) / abs(w), abs(r['dw'] - dw) / abs(dw))
        return float(-mpmath.log10(e)) if e > 0 else 60.0


def main():
    rows = []
    worst = 99.0
    for k, ((re, im), theta) in enumerate(POLES):
        pr, pi = refine(re, im)
        points = []
        for e in EXPONENTS:
            d = 10.0 ** -e
            points.append((pr + d * math.cos(theta), pi + d * math.sin(theta)))
        values = evaluate(points, 40)
        for e, (zr, zi), v in zip(EXPONENTS, points, values):
            rows.append([exact(zr), exact(zi), str(k), '1e-%d' % e] + v[3:8])
            if e <= 6:
                with mp.workdps(60):
                    agree = independent_digits(zr, zi, mpc(v[3], v[4]), mpc(v[5], v[6]))
                    print('pole %d d=1e-%d: %.1f digits' % (k, e, agree), file=sys.stderr)
                    worst = min(worst, agree)
    print('# Reference values of the demo PIII solution (alpha=1, beta=-1/2, gamma=1, delta=-1, w(1)=1/2,'
          " w'(1)=1/3) next to four poles of w")
    print('# Source: python3 tools/reference/near_pole_reference.py (tertius eval --digits 40 at the doubles z, written exactly)')
    print('# Independent check (d >= 1e-6): tools/reference/piii_reference.py Taylor integrator at 40 digits'
          ' agrees to %.1f digits or more' % worst)
    print('z_re,z_im,pole,distance,w_re,w_im,dw_re,dw_im,digits')
    for r in rows:
        print(','.join(r))


if __name__ == '__main__':
    main()
