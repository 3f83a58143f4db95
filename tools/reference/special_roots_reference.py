#!/usr/bin/env python3
"""Reference roots of the special polynomials S_n(z; mu) of Painleve III.

S_n is generated here independently of the Java code, with Python fractions, from the recurrence of
P. A. Clarkson, J. Phys. A 36 (2003) 9507 (also NIST DLMF 32.8(iii)):
    S_{n+1} S_{n-1} = -z (S_n S_n'' - S_n'^2) - S_n S_n' + (z + mu) S_n^2,  S_{-1} = S_0 = 1,
and its roots are computed with mpmath.polyroots (Durand-Kerner) at 80 working digits; the roots written are
those of a second run at 100 digits, kept to 50 significant digits after checking that both runs agree to 55.

Usage: python3 tools/reference/special_roots_reference.py > connection/src/test/resources/special/special-polynomial-roots.csv
"""
from fractions import Fraction
import mpmath

CASES = [(3, Fraction(1, 3), Fraction(0)), (5, Fraction(1, 2), Fraction(1, 3)), (4, Fraction(2), Fraction(0)),
         (11, Fraction(1, 3), Fraction(0))]


def mul(a, b):
    out = [0] * (len(a) + len(b) - 1)
    for i, x in enumerate(a):
        for j, y in enumerate(b):
            out[i + j] += x * y
    return out


def add(a, b):
    n = max(len(a), len(b))
    return [(a[k] if k < len(a) else 0) + (b[k] if k < len(b) else 0) for k in range(n)]


def deriv(a):
    return [k * a[k] for k in range(1, len(a))] or [0]


def divide(a, b):
    a = list(a)
    q = [0] * (len(a) - len(b) + 1)
    for k in range(len(q) - 1, -1, -1):
        q[k] = a[k + len(b) - 1] / b[-1]
        for j, y in enumerate(b):
            a[k + j] -= q[k] * y
    assert all(x == 0 for x in a[:len(b) - 1]), "division leaves a remainder"
    return q


def special(n, mu):
    prev, cur = [complex_frac(1)], [complex_frac(1)]
    for _ in range(n):
        d1 = deriv(cur)
        d2 = deriv(d1)
        bracket = add(mul(cur, d2), [-x for x in mul(d1, d1)])
        t1 = [-x for x in ([0] + bracket)]            # -z (S S'' - S'^2)
        t2 = [-x for x in mul(cur, d1)]               # -S S'
        t3 = mul([mu, complex_frac(1)], mul(cur, cur))  # (z + mu) S^2
        prev, cur = cur, divide(add(add(t1, t2), t3), prev)
    return cur


class complex_frac:
    """Exact Gaussian rational a + b i."""
    def __init__(self, re, im=Fraction(0)):
        self.re, self.im = Fraction(re), Fraction(im)

    def __add__(self, o):
        o = cf(o)
        return complex_frac(self.re + o.re, self.im + o.im)
    __radd__ = __add__

    def __sub__(self, o):
        o = cf(o)
        return complex_frac(self.re - o.re, self.im - o.im)

    def __rsub__(self, o):
        return cf(o) - self

    def __neg__(self):
        return complex_frac(-self.re, -self.im)

    def __mul__(self, o):
        o = cf(o)
        return complex_frac(self.re * o.re - self.im * o.im, self.re * o.im + self.im * o.re)
    __rmul__ = __mul__

    def __truediv__(self, o):
        o = cf(o)
        n = o.re * o.re + o.im * o.im
        return self * complex_frac(o.re / n, -o.im / n)

    def __eq__(self, o):
        o = cf(o)
        return self.re == o.re and self.im == o.im


def cf(x):
    return x if isinstance(x, complex_frac) else complex_frac(x)


def roots(coeffs, dps):
    mpmath.mp.dps = dps
    c = [mpmath.mpc(mpmath.mpf(x.re.numerator) / x.re.denominator, mpmath.mpf(x.im.numerator) / x.im.denominator)
         for x in reversed(coeffs)]
    nz = 0
    while c and c[-1] == 0:
        c.pop()
        nz += 1
    r = list(mpmath.polyroots(c, maxsteps=2000, extraprec=4 * dps)) if len(c) > 1 else []
    return [mpmath.mpc(0)] * nz + r


def main():
    print("# Roots of the special polynomials S_n(z; mu) of Painleve III (Clarkson, J. Phys. A 36 (2003) 9507)")
    print("# Generator: tools/reference/special_roots_reference.py (Python fractions for S_n, mpmath %s polyroots)"
          % mpmath.__version__)
    print("# Runs at 80 and 100 working digits agree to 55 significant digits; 50 digits are written.")
    print("# Command: python3 tools/reference/special_roots_reference.py"
          " > connection/src/test/resources/special/special-polynomial-roots.csv")
    print("# n,mu_re,mu_im,re,im")
    for n, mre, mim in CASES:
        s = special(n, complex_frac(mre, mim))
        a = roots(s, 80)
        b = roots(s, 100)
        mpmath.mp.dps = 100
        for x in a:
            nearest = min(b, key=lambda y: abs(x - y))
            assert abs(x - nearest) <= mpmath.mpf(10) ** -55 * max(1, abs(x)), (n, x, nearest)
        for x in sorted(b, key=lambda y: (float(y.real), float(y.imag))):
            print("%d,%s,%s,%s,%s" % (n, mre, mim, mpmath.nstr(x.real, 50, min_fixed=-5, max_fixed=5),
                                      mpmath.nstr(x.imag, 50, min_fixed=-5, max_fixed=5)))


if __name__ == "__main__":
    main()
