#!/usr/bin/env python3
"""Peer for scattered high-precision points: the mpmath route of mp_peer.py (an
arbitrary-precision Taylor-series integrator, order and step after Jorba and
Zou, Experimental Math. 14 (2005)) applied point by point, each target reached
along the straight segment from z0 = 1, as a user of mpmath would do it.  The
equation and data are those of mp_peer.py (the project's generic D6 case, NIST
DLMF eq. 32.2.3, a scenario of our own).

A segment that runs into a pole of the solution cannot be followed by this
route (the steps shrink without end): such a target is counted as blocked
after --max-steps steps and left out of the time per point.

Prints, per target, the value of w, and at the end the number of targets
reached, blocked, the total time and the time per reached target.

Usage:  python3 tools/bench/mp_scattered_peer.py --digits 50 --at="3+2i,-1.5+0.2i"
"""

import argparse
import time

import mpmath
from mpmath import mp, mpc, mpf

from mp_peer import Blocked, TaylorIntegrator, piii_coefficients


def parse(text):
    """a+bi with decimal parts, read exactly (as Tertius reads its targets with --digits)."""
    t = text.strip().rstrip('i')
    k = max(t.rfind('+', 1), t.rfind('-', 1))
    while k > 0 and t[k - 1] in 'eE':
        k = max(t.rfind('+', 1, k - 1), t.rfind('-', 1, k - 1))
    if not text.strip().endswith('i'):
        return mpc(mpf(text.strip()), 0)
    if k <= 0:
        return mpc(0, mpf(t))
    return mpc(mpf(t[:k]), mpf(t[k:]))


def main():
    ap = argparse.ArgumentParser(description='mpmath peer for scattered points (straight segments from z0 = 1)')
    ap.add_argument('--digits', type=int, default=50)
    ap.add_argument('--guard', type=int, default=10)
    ap.add_argument('--at', required=True, help='targets a+bi separated by commas')
    ap.add_argument('--max-steps', type=int, default=400, help='steps per target before it counts as blocked')
    args = ap.parse_args()
    mp.dps = args.digits + args.guard
    al, be, ga, de = mpc(1), mpc(-1) / 2, mpc(1), mpc(-1)
    z0, w0, dw0 = mpc(1), mpc(1) / 2, mpc(1) / 3
    reached, blocked = 0, 0
    t_reached = 0.0
    t0 = time.perf_counter()
    for text in args.at.split(','):
        integ = TaylorIntegrator(piii_coefficients(al, be, ga, de), args.digits)
        t = time.perf_counter()
        try:
            w, _ = integ.segment(z0, w0, dw0, parse(text), args.max_steps)
        except Blocked:
            blocked += 1
            print('%s blocked' % text)
            continue
        t_reached += time.perf_counter() - t
        reached += 1
        print('%s %s' % (text, mpmath.nstr(w, args.digits)))
    total = time.perf_counter() - t0
    print('reached %d blocked %d total %.2f s per-reached %.4f s' % (reached, blocked, total,
                                                                     t_reached / max(reached, 1)))


if __name__ == '__main__':
    main()
