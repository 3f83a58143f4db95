#!/usr/bin/env python3
"""Independent high-precision reference values for the third Painleve equation.

    w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w      (PIII)

(NIST DLMF eq. 32.2.3.)  This script is a stand-alone reference generator for
the test suite of the project; it is written with mpmath only and shares no code
or formulation with the Java engine.

Method
------
The equation is integrated directly in the variables (w, w') by the Taylor
series method (high-order power-series continuation; see e.g. A. Jorba and
M. Zou, Experimental Math. 14 (2005) 99-117).  At an expansion point c with
w(c + h) = sum_k a_k h^k, PIII multiplied by z*w reads

    z w w'' = z w'^2 - w w' + alpha w^3 + beta w + gamma z w^4 + delta z,

which is polynomial.  With z = c + h, comparing the coefficients of h^n gives
one linear equation for a_{n+2}, with the factor c*a_0*(n+2)*(n+1) in front of
it, so every new coefficient is found from the previous ones (Cauchy products
of the series w, w', w'', w^2, w^3, w^4 are updated incrementally).

The step is a fraction of the radius of convergence estimated by the root test
on the last two coefficients.  Poles of w (and, through the conditioning of the
recurrence, zeros of w) limit this radius, so the path slips past them with
small steps; a path through or very near one of them is abandoned and another
polygon is tried.  The argument of z is followed continuously along the path,
which fixes the sheet of the Riemann surface (sheet k: arg z in (-pi, pi] + 2 pi k).

Self-check
----------
Every target is computed twice, with different working precision, order, step
fraction and a different path of the same homotopy class in C minus {0}:
  run 1: a polygon in the z-plane (straight segment where possible, otherwise
         arcs of the unit circle followed by a radial segment);
  run 2: the image under exp of a bent segment in the log z plane.
Only values where both runs agree to at least MIN_DIGITS significant digits are
written; the number of agreeing digits is recorded.

Usage
-----
    python3 tools/reference/piii_reference.py [--scenario generic|complex|all]
                                              [--jobs N] [--outdir DIR]
"""

import argparse
import math
import os
import sys
import time
from multiprocessing import Pool

import mpmath
from mpmath import mp, mpf, mpc, fdot

MIN_DIGITS = 25          # keep only values verified to this many digits
OUT_DIGITS = 25          # significant digits written per value

# (working decimal digits, Taylor order, step fraction of the estimated radius)
RUN1 = (40, 70, mpf('0.25'))
RUN2 = (50, 90, mpf('0.23'))

# ---------------------------------------------------------------------------
# scenarios: parameters and initial data as exact strings (rationals 'p/q')
# ---------------------------------------------------------------------------


def parse_num(s):
    """Exact-ish conversion at the current precision: 'a/b', 'x', 'x+yj'."""
    s = s.strip()
    if '/' in s and 'j' not in s:
        p, q = s.split('/')
        return mpc(mpf(p) / mpf(q))
    if 'j' in s:
        return mpc(complex(0, 0)) + mpmath.mpmathify(s)
    return mpc(mpf(s))


SCENARIOS = {
    'generic': {
        'file': 'piii-generic-d6.csv',
        'title': 'generic D6 case, real data',
        'alpha': '1', 'beta': '-1/2', 'gamma': '1', 'delta': '-1',
        'z0': '1', 'w0': '1/2', 'dw0': '1/3',
        # (z as exact decimal strings (re, im), sheet, note)
        'targets': [
            (('3', '2'), 0, ''),
            (('1', '10'), 0, 'distance 10 from z0'),
            (('-8', '6'), 0, ''),
            (('8', '6'), 0, ''),
            (('6', '-8'), 0, ''),
            (('10', '0'), 0, ''),
            (('11', '0'), 0, 'distance 10 from z0'),
            (('1', '-10'), 0, 'distance 10 from z0'),
            (('7', '8'), 0, 'distance 10 from z0'),
            (('-5', '8'), 0, 'distance 10 from z0'),
            (('-10', '0'), 0, 'approached from above'),
            (('-10', '0'), -1, 'approached from below (clockwise)'),
            (('-9', '0'), 0, 'distance 10 from z0, from above'),
            (('0', '2'), 1, ''),
            (('-3', '0'), 1, 'arg 3 pi'),
            (('1.5', '-2'), 1, ''),
            (('-2', '-3'), 1, ''),
            (('0.5', '0.5'), -1, ''),
            (('4', '0'), -1, ''),
            (('3', '3'), -1, ''),
            (('-1', '0'), -1, 'arg -pi'),
            (('0.01', '0'), 0, ''),
            (('0', '0.01'), 0, ''),
            (('-0.007071067811865475244008444', '-0.007071067811865475244008444'), 0, '|z| = 1e-2 (to 28 digits)'),
            (('0.0001', '0'), 0, ''),
            (('0', '0.0001'), 0, ''),
        ],
    },
    'complex': {
        'file': 'piii-complex-d6.csv',
        'title': 'D6 case, complex parameter and data',
        'alpha': '0.3+0.2j', 'beta': '-1.1', 'gamma': '1', 'delta': '-1',
        'z0': '0.5+0.5j', 'w0': '0.8-0.3j', 'dw0': '0.1+0.4j',
        'targets': [
            (('3.5', '0'), 0, ''),
            (('2', '3'), 0, ''),
            (('-2', '4'), 0, ''),
            (('5', '-2'), 0, ''),
            (('-4', '-3'), 0, ''),
            (('6', '5'), 0, ''),
            (('-7', '1'), 0, ''),
            (('3', '-2'), 1, ''),
            (('-3', '2'), 1, ''),
            (('4', '4'), 1, ''),
            (('-5', '-2'), 1, ''),
            (('2', '-6'), 1, ''),
        ],
    },
}


def load(sc):
    """Parameters and initial data of a scenario at the current precision."""
    p = {k: parse_num(sc[k]) for k in ('alpha', 'beta', 'gamma', 'delta', 'z0', 'w0', 'dw0')}
    return p


# ---------------------------------------------------------------------------
# Taylor coefficients
# ---------------------------------------------------------------------------


def taylor(c, w0, dw0, N, al, be, ga, de):
    """Coefficients a_0..a_N of w(c+h) for PIII with w(c)=w0, w'(c)=dw0.

    Uses  z w w'' = z w'^2 - w w' + al w^3 + be w + ga z w^4 + de z,  z = c + h.
    """
    a = [w0, dw0]
    d = [dw0]             # d_k = (k+1) a_{k+1}      (series of w')
    s = []                # s_k = (k+2)(k+1) a_{k+2} (series of w'')
    W2, W3, W4 = [], [], []
    P, Q = [], []         # series of w*w'' and w'^2
    ca0 = c * w0
    for n in range(N - 1):
        an = a[:n + 1]
        rn = an[::-1]
        # w^2 (symmetric product), w^3, w^4
        m = (n + 1) // 2
        x = 2 * fdot(an[:m], rn[:m])
        if n % 2 == 0:
            x += an[m] ** 2
        W2.append(x)
        W3.append(fdot(W2, rn))
        x = 2 * fdot(W2[:m], W2[n:n - m:-1]) if m else mpc(0)
        if n % 2 == 0:
            x += W2[m] ** 2
        W4.append(x)
        # w'^2 (symmetric) and w*w'
        dn = d[:n + 1]
        x = 2 * fdot(dn[:m], dn[n:n - m:-1]) if m else mpc(0)
        if n % 2 == 0:
            x += dn[m] ** 2
        Q.append(x)
        R = fdot(an, dn[::-1])
        # w*w'' without the unknown term a_0*s_n
        Pp = fdot(an[1:], s[::-1]) if n else mpc(0)
        rhs = c * Q[n] - R + al * W3[n] + be * a[n] + ga * c * W4[n]
        lhs = c * Pp
        if n:
            rhs += Q[n - 1] + ga * W4[n - 1]
            lhs += P[n - 1]
        if n == 0:
            rhs += de * c
        elif n == 1:
            rhs += de
        sn = (rhs - lhs) / ca0
        s.append(sn)
        P.append(Pp + w0 * sn)
        an2 = sn / ((n + 2) * (n + 1))
        a.append(an2)
        d.append((n + 2) * an2)
    return a, d


def horner(coef, h):
    r = mpc(0)
    for x in reversed(coef):
        r = r * h + x
    return r


def radius(a):
    """Root-test estimate from the last two coefficients."""
    N = len(a) - 1
    r = mpmath.inf
    for k in (N - 1, N):
        m = abs(a[k])
        if m != 0:
            r = min(r, m ** (-mpf(1) / k))
    return r


class PathFailure(Exception):
    pass


def integrate(p, vertices, N, frac, max_steps=20000):
    """Follow the polygon 'vertices' (first = z0).  Returns w, w', continuous
    arg z, number of steps and smallest radius met."""
    al, be, ga, de = p['alpha'], p['beta'], p['gamma'], p['delta']
    z = p['z0']
    w, dw = p['w0'], p['dw0']
    if abs(vertices[0] - z) > mpf(10) ** (-mp.dps + 5):
        raise ValueError('path must start at z0')
    theta = mpmath.arg(z)
    steps = 0
    rmin = mpmath.inf
    for B in vertices[1:]:
        while True:
            rem = B - z
            dist = abs(rem)
            if dist == 0:
                break
            a, d = taylor(z, w, dw, N, al, be, ga, de)
            rho = radius(a)
            rmin = min(rmin, rho)
            if rho < mpf(10) ** -8 * abs(z):
                raise PathFailure('radius %s at z=%s' % (mpmath.nstr(rho, 3), mpmath.nstr(z, 8)))
            h = min(frac * rho, abs(z) / 2)
            if dist <= h:
                hc = rem
                znew = B
            else:
                hc = rem * (h / dist)
                znew = z + hc
            w = horner(a, hc)
            dw = horner(d, hc)
            theta += mpmath.arg(znew / z)
            z = znew
            steps += 1
            if steps > max_steps:
                raise PathFailure('too many steps')
    return w, dw, theta, steps, rmin


# ---------------------------------------------------------------------------
# paths
# ---------------------------------------------------------------------------


def target_theta(zt, sheet):
    return mpmath.arg(zt) + 2 * mpmath.pi * sheet


def path_polygon(z0, zt, sheet, variant=0):
    """Run-1 path: z-plane polygon.  For a sheet-0 target whose straight
    segment from z0 stays away from 0: variant 0 is that segment, variants 1
    and 2 go through a point beside its midpoint (either side).  Otherwise:
    arcs of a circle around 0 (radius |z0| (1 + 0.3 variant)) followed by a
    radial segment."""
    th0 = mpmath.arg(z0)
    th = target_theta(zt, sheet)
    u = zt - z0
    straight = False
    if sheet == 0 and abs(zt) >= mpf('0.5'):
        t = max(0, min(1, -mpmath.re(mpmath.conj(z0) * u) / abs(u) ** 2))
        straight = abs(z0 + t * u) > mpf('0.5') and abs(th - th0) < mpmath.pi * mpf('0.9')
    if straight and variant == 0:
        return [z0, zt]
    if straight and variant in (1, 2):
        side = 1 if variant == 1 else -1
        return [z0, (z0 + zt) / 2 + side * mpc(0, '0.2') * u, zt]
    r = abs(z0) * (1 + mpf('0.3') * variant)
    verts = [z0]
    if abs(r - abs(z0)) > 0:
        verts.append(r * mpmath.expjpi(th0 / mpmath.pi))
    M = int(mpmath.ceil(abs(th - th0) / (mpmath.pi / 8)))
    for j in range(1, M + 1):
        verts.append(r * mpmath.expj(th0 + (th - th0) * j / M))
    verts.append(zt)
    return verts


def path_logbend(z0, zt, sheet, bend=mpf('0.3')):
    """Run-2 path: z = exp(t(s)), t(s) = t0 + s (t1 - t0) + i bend sin(pi s),
    s in [0, 1], as a polygon with short chords."""
    t0 = mpmath.log(abs(z0)) + 1j * mpmath.arg(z0)
    t1 = mpmath.log(abs(zt)) + 1j * target_theta(zt, sheet)
    L = abs(t1 - t0)
    M = max(8, int(mpmath.ceil(L / mpf('0.15'))))
    verts = [z0]
    for j in range(1, M):
        sj = mpf(j) / M
        verts.append(mpmath.exp(t0 + sj * (t1 - t0) + 1j * bend * mpmath.sin(mpmath.pi * sj)))
    verts.append(zt)
    return verts


def describe(verts, n=4):
    def one(v):
        x, y = [mpmath.nstr(mpmath.chop(t, mpf(10) ** -20), n) for t in (v.real, v.imag)]
        return '(%s%s%si)' % (x, '' if y.startswith('-') else '+', y)
    return ' -> '.join(one(v) for v in verts)


# ---------------------------------------------------------------------------
# one target, two independent runs
# ---------------------------------------------------------------------------


def run_once(sc, target, settings, kind, variant):
    dps, N, frac = settings
    with mp.workdps(dps):
        p = load(sc)
        zt = mpc(mpf(target[0][0]), mpf(target[0][1]))
        sheet = target[1]
        if kind == 'polygon':
            verts = path_polygon(p['z0'], zt, sheet, variant)
        else:
            verts = path_logbend(p['z0'], zt, sheet, [mpf('0.3'), mpf('-0.3'), mpf('0.6'), mpf('-0.6')][variant])
        t = time.time()
        w, dw, theta, steps, rmin = integrate(p, verts, N, mpf(frac))
        el = time.time() - t
        # sheet check from the continuous argument
        expect = target_theta(zt, sheet)
        if abs(theta - expect) > mpf(10) ** -10:
            raise PathFailure('ended on wrong sheet: arg %s vs %s' % (theta, expect))
        if kind == 'polygon':
            desc = describe(verts) if len(verts) <= 6 else \
                'arcs of |z| = %s, then radial (%d vertices)' % (mpmath.nstr(abs(verts[-2]), 3), len(verts))
        else:
            desc = 'exp of the log z segment bent by %s rad (%d chords)' % (
                mpmath.nstr([0.3, -0.3, 0.6, -0.6][variant], 2), len(verts) - 1)
        return dict(w=+w, dw=+dw, steps=steps, rmin=mpmath.nstr(rmin, 3), time=el,
                    path=desc, kind=kind, variant=variant)


def attempt(sc, target, settings, kind):
    errs = []
    for variant in range(4):
        try:
            return run_once(sc, target, settings, kind, variant), errs
        except PathFailure as e:
            errs.append('%s/%d: %s' % (kind, variant, e))
    return None, errs


def agreement(r1, r2):
    with mp.workdps(60):
        e = mpf(0)
        for key in ('w', 'dw'):
            x, y = r1[key], r2[key]
            if y == 0:
                continue
            e = max(e, abs(x - y) / abs(y))
        if e == 0:
            return mpf(60)
        return -mpmath.log10(e)


def work(args):
    name, idx = args
    sc = SCENARIOS[name]
    target = sc['targets'][idx]
    r1, e1 = attempt(sc, target, RUN1, 'polygon')
    r2, e2 = attempt(sc, target, RUN2, 'logbend')
    out = dict(name=name, idx=idx, target=target, r1=r1, r2=r2, errors=e1 + e2)
    if r1 and r2:
        out['digits'] = float(agreement(r1, r2))
    else:
        out['digits'] = 0.0
    return out


# ---------------------------------------------------------------------------
# output
# ---------------------------------------------------------------------------


def fmt(x, digits, scale):
    """x (mpf) to OUT_DIGITS significant digits; components below the verified
    accuracy relative to |w| (scale) are written as 0."""
    if x == 0 or abs(x) < scale * mpf(10) ** (-digits):
        return '0'
    return mpmath.nstr(x, OUT_DIGITS, strip_zeros=False, min_fixed=-4, max_fixed=6)


def write_csv(name, results, outdir, command, elapsed):
    sc = SCENARIOS[name]
    path = os.path.join(outdir, sc['file'])
    kept = [r for r in results if r['digits'] >= MIN_DIGITS]
    dropped = [r for r in results if r['digits'] < MIN_DIGITS]
    L = []
    L.append('# Reference values of PIII: w\'\' = w\'^2/w - w\'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w')
    L.append('# Scenario: %s' % sc['title'])
    L.append('# Source: tools/reference/piii_reference.py (Taylor series method in (w, w\'), mpmath %s)' % mpmath.__version__)
    L.append('# Run 1: %d working digits, order %d, step %s x root-test radius, z-plane polygon path'
             % (RUN1[0], RUN1[1], mpmath.nstr(RUN1[2], 3)))
    L.append('# Run 2: %d working digits, order %d, step %s x root-test radius, bent log z path'
             % (RUN2[0], RUN2[1], mpmath.nstr(RUN2[2], 3)))
    L.append('# Values written are from run 2; digits = significant digits to which runs 1 and 2 agree')
    L.append('# (max relative difference of w and w\'), floored; only digits >= %d are kept.' % MIN_DIGITS)
    L.append('# Components smaller than |value| * 10^-digits are written as 0.')
    L.append('# Parameters: alpha = %s, beta = %s, gamma = %s, delta = %s'
             % (sc['alpha'], sc['beta'], sc['gamma'], sc['delta']))
    L.append('# Start: z0 = %s (sheet 0), w(z0) = %s, w\'(z0) = %s  (exact)' % (sc['z0'], sc['w0'], sc['dw0']))
    L.append('# Sheet k: arg z in (-pi, pi] + 2 pi k, arg followed continuously along the path from arg z0.')
    L.append('# Command: %s' % command)
    L.append('# Generation time (wall): %.0f s' % elapsed)
    for r in results:
        (zr, zi), k, note = r['target']
        tag = 'z = %s%+gi sheet %d' % (zr, float(zi), k)
        if r['r1'] and r['r2']:
            L.append('# %s: digits %.1f; run 1: %d steps, path %s; run 2: %d steps, path %s%s%s'
                     % (tag, r['digits'], r['r1']['steps'], r['r1']['path'],
                        r['r2']['steps'], r['r2']['path'],
                        ('; ' + note) if note else '',
                        ('; abandoned paths: ' + '; '.join(r['errors'])) if r['errors'] else ''))
        else:
            L.append('# %s: no path found (%s)' % (tag, '; '.join(r['errors'])))
    if dropped:
        L.append('# Dropped (not verified to %d digits): %s' % (MIN_DIGITS, ', '.join(
            '%s%+gi sheet %d' % (r['target'][0][0], float(r['target'][0][1]), r['target'][1]) for r in dropped)))
    else:
        L.append('# Dropped targets: none')
    L.append('z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,digits')
    with mp.workdps(RUN2[0]):
        for r in kept:
            (zr, zi), k, note = r['target']
            dg = int(math.floor(r['digits']))
            w, dw = r['r2']['w'], r['r2']['dw']
            L.append(','.join([zr, zi, str(k),
                               fmt(w.real, dg, abs(w)), fmt(w.imag, dg, abs(w)),
                               fmt(dw.real, dg, abs(dw)), fmt(dw.imag, dg, abs(dw)), str(dg)]))
    with open(path, 'w') as f:
        f.write('\n'.join(L) + '\n')
    return path, len(kept), len(dropped)


def main():
    ap = argparse.ArgumentParser(description=__doc__.split('\n')[0])
    ap.add_argument('--scenario', default='all', choices=['generic', 'complex', 'all'])
    ap.add_argument('--jobs', type=int, default=os.cpu_count() or 1)
    here = os.path.dirname(os.path.abspath(__file__))
    ap.add_argument('--outdir', default=os.path.normpath(os.path.join(
        here, '..', '..', 'tests', 'src', 'test', 'resources', 'reference')))
    ap.add_argument('--only', type=int, nargs='*', help='target indices (for testing; no file written)')
    args = ap.parse_args()
    names = ['generic', 'complex'] if args.scenario == 'all' else [args.scenario]
    command = 'python3 tools/reference/piii_reference.py --scenario %s' % args.scenario
    for name in names:
        t0 = time.time()
        idxs = args.only if args.only is not None else range(len(SCENARIOS[name]['targets']))
        tasks = [(name, i) for i in idxs]
        if args.jobs > 1:
            with Pool(args.jobs) as pool:
                results = pool.map(work, tasks, chunksize=1)
        else:
            results = [work(t) for t in tasks]
        for r in results:
            print(name, r['target'], 'digits %.1f' % r['digits'],
                  r['r1'] and (r['r1']['steps'], round(r['r1']['time'], 1)),
                  r['r2'] and (r['r2']['steps'], round(r['r2']['time'], 1)), r['errors'], flush=True)
        el = time.time() - t0
        if args.only is None:
            path, nk, nd = write_csv(name, results, args.outdir, command, el)
            print('wrote %s: %d kept, %d dropped, %.0f s' % (path, nk, nd, el))


if __name__ == '__main__':
    main()
