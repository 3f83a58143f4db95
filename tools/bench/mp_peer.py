#!/usr/bin/env python3
"""Peer benchmark: a general-purpose arbitrary-precision Taylor-series
integrator written with mpmath, applied to the project's generic D6 test case
of the third Painleve equation (NIST DLMF eq. 32.2.3)

    w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w,
    alpha = 1, beta = -1/2, gamma = 1, delta = -1,
    z0 = 1, w(1) = 1/2, w'(1) = 1/3,

evaluated at z = 3+2i (sheet 0, straight path from z0).

Method: Taylor series method with order and step size chosen as in
A. Jorba and M. Zou, "A software package for the numerical integration of
ODEs by means of high-order Taylor methods", Experimental Math. 14 (2005):
for a tolerance eps the order is p = ceil(-ln(eps)/2) + 1 (about 1.15 D for
eps = 10^-D) and the step is h = rho / e^2, where rho is the smaller of the
root-test radii of the last two Taylor coefficients.  The Taylor coefficients
come from the polynomial form of the equation, z w w'' = z w'^2 - w w' +
alpha w^3 + beta w + gamma z w^4 + delta z, by power-series arithmetic.

Usage:  python3 tools/bench/mp_peer.py --digits 50
"""

import argparse
import math
import time

import mpmath
from mpmath import mp, mpf, mpc, fdot


class Blocked(Exception):
    """A segment not followed to its end within the step budget."""


class TaylorIntegrator:
    """Arbitrary-precision Taylor integrator for a scalar second-order ODE
    whose Taylor coefficients are produced by `coefficients(c, y, dy, p)`
    (returning the coefficient lists of y and y' at expansion point c)."""

    def __init__(self, coefficients, digits):
        self.coefficients = coefficients
        eps_ln = digits * math.log(10)
        self.order = int(math.ceil(eps_ln / 2)) + 1
        self.steps = 0

    @staticmethod
    def _radius(a):
        p = len(a) - 1
        r = mpmath.inf
        for k in (p - 1, p):
            m = abs(a[k])
            if m:
                r = min(r, m ** (-mpf(1) / k))
        return r

    @staticmethod
    def _eval(coef, h):
        r = mpc(0)
        for x in reversed(coef):
            r = r * h + x
        return r

    def segment(self, z, y, dy, z1, max_steps=None):
        """Integrate along the straight segment from z to z1; with max_steps,
        raise Blocked when that many steps do not reach z1 (a pole in the way)."""
        shrink = mpmath.exp(-2)
        taken = 0
        while z != z1:
            if max_steps is not None and taken >= max_steps:
                raise Blocked()
            taken += 1
            a, d = self.coefficients(z, y, dy, self.order)
            h = shrink * self._radius(a)
            rem = z1 - z
            if abs(rem) <= h:
                hc, znew = rem, z1
            else:
                hc = rem * (h / abs(rem))
                znew = z + hc
            y, dy = self._eval(a, hc), self._eval(d, hc)
            z = znew
            self.steps += 1
        return y, dy


def piii_coefficients(al, be, ga, de):
    """Coefficient generator for PIII with the given parameters."""
    def coefficients(c, w0, dw0, p):
        a = [w0, dw0]            # w
        d = [dw0]                # w'   : d_k = (k+1) a_{k+1}
        s = []                   # w''  : s_k = (k+2)(k+1) a_{k+2}
        sq, cu, qu = [], [], []  # w^2, w^3, w^4
        ws, dd = [], []          # w w'', w'^2
        cw0 = c * w0
        zero = mpc(0)
        for n in range(p - 1):
            an = a[:n + 1]
            ra = an[::-1]
            m = (n + 1) // 2
            odd = n % 2
            x = 2 * fdot(an[:m], ra[:m])
            sq.append(x if odd else x + an[m] * an[m])
            cu.append(fdot(sq, ra))
            x = 2 * fdot(sq[:m], sq[n:n - m:-1]) if m else zero
            qu.append(x if odd else x + sq[m] * sq[m])
            x = 2 * fdot(d[:m], d[n:n - m:-1]) if m else zero
            dd.append(x if odd else x + d[m] * d[m])
            wd = fdot(an, d[n::-1])
            part = fdot(an[1:], s[::-1]) if n else zero
            rhs = c * (dd[n] + ga * qu[n]) - wd + al * cu[n] + be * a[n]
            lhs = c * part
            if n:
                rhs += dd[n - 1] + ga * qu[n - 1]
                lhs += ws[n - 1]
                if n == 1:
                    rhs += de
            else:
                rhs += de * c
            sn = (rhs - lhs) / cw0
            s.append(sn)
            ws.append(part + w0 * sn)
            nxt = sn / ((n + 2) * (n + 1))
            a.append(nxt)
            d.append((n + 2) * nxt)
        return a, d
    return coefficients


def main():
    ap = argparse.ArgumentParser(description='mpmath Taylor-series peer benchmark (PIII, generic D6 case)')
    ap.add_argument('--digits', type=int, default=50, help='target number of correct digits D')
    ap.add_argument('--guard', type=int, default=10, help='extra working digits (default 10)')
    args = ap.parse_args()
    D = args.digits
    mp.dps = D + args.guard
    t0 = time.perf_counter()
    al, be, ga, de = mpc(1), mpc(-1) / 2, mpc(1), mpc(-1)
    z0, w0, dw0 = mpc(1), mpc(1) / 2, mpc(1) / 3
    z1 = mpc(3, 2)
    integ = TaylorIntegrator(piii_coefficients(al, be, ga, de), D)
    w, dw = integ.segment(z0, w0, dw0, z1)
    el = time.perf_counter() - t0
    print('digits %d  working dps %d  order %d  steps %d' % (D, mp.dps, integ.order, integ.steps))
    print('w(3+2i)  = %s' % mpmath.nstr(w, D))
    print("w'(3+2i) = %s" % mpmath.nstr(dw, D))
    print('elapsed %.3f s' % el)


if __name__ == '__main__':
    main()
