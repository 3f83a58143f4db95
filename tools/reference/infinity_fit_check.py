#!/usr/bin/env python3
"""Independent check of `connect --at-infinity --digits D` (mpmath only; no code shared with the Java engine).

The solution given by exact start data (z0, w0, w0') is integrated by the Taylor series method of
piii_reference.py (same module, its `integrate`) along the imaginary axis to the targets, twice (two working
precisions, orders and step fractions); the values printed here are compared by hand with the transseries of the
fitted p, q (`connect --from-infinity root0,P,Q --ray pi/2 --digits D --start-at R`), README "Known gaps".

Usage: python3 tools/reference/infinity_fit_check.py ALPHA BETA GAMMA DELTA Z0 W0 DW0 R1 [R2 ...]
(numbers as 'a/b', decimals or 'x+yj'; the targets are R i).
"""
import sys
import time

from mpmath import mp, mpc, nstr

import piii_reference as ref


def run(args, settings):
    dps, order, frac = settings
    mp.dps = dps
    p = {k: ref.parse_num(v) for k, v in zip(('alpha', 'beta', 'gamma', 'delta', 'z0', 'w0', 'dw0'), args[:7])}
    out = []
    z = p['z0']
    for r in args[7:]:
        target = mpc(0, ref.parse_num(r).real)
        w, dw, _, steps, _ = ref.integrate(p, [z, target], order, frac)
        p = dict(p, z0=target, w0=w, dw0=dw)
        z = target
        out.append((r, w, dw, steps))
    return out


def main():
    args = [a.replace('i', 'j') if a.endswith('i') else a for a in sys.argv[1:]]
    t = time.time()
    first = run(args, ref.RUN1)
    second = run(args, ref.RUN2)
    for (r, w1, d1, s1), (_, w2, d2, s2) in zip(first, second):
        mp.dps = 50
        print('z = %si: w = %s  w\' = %s  (runs differ by %s, %s; %d, %d steps)' % (
            r, nstr(w2, 35), nstr(d2, 35), nstr(abs(w1 - w2), 3), nstr(abs(d1 - d2), 3), s1, s2))
    print('%.1f s' % (time.time() - t))


if __name__ == '__main__':
    main()
