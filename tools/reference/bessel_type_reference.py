#!/usr/bin/env python3
"""Reference values of Bessel-type (Riccati) solutions of Painleve III with gamma = 1, delta = -1, integer order.

For alpha = 2 nu, beta = 2 - 2 nu (a = c = 1, b = 2 nu - 1 in z w' = z w^2 + b w + z, NIST DLMF 32.10(iv)),
w = -u'/u with u = z^nu (J_nu(z) + (1/2) Y_nu(z)) and u' = z^nu (J_{nu-1}(z) + (1/2) Y_{nu-1}(z)) (DLMF 10.6.6),
computed with mpmath's besselj and bessely at 60 working digits; a second run at 80 digits must agree to 50;
45 significant digits are written. Principal branches (points off the negative real axis, sheet 0).

Usage: python3 tools/reference/bessel_type_reference.py > connection/src/test/resources/special/bessel-type-integer-order.csv
"""
import mpmath

ORDERS = [0, 1, 2, -1]
POINTS = [(1.1, 0.4), (2.5, -1.0), (0.3, 2.0), (-1.5, 0.8)]


def w(nu, z):
    zn = z ** nu
    u = zn * (mpmath.besselj(nu, z) + mpmath.bessely(nu, z) / 2)
    du = zn * (mpmath.besselj(nu - 1, z) + mpmath.bessely(nu - 1, z) / 2)
    return -du / u


def main():
    print("# Bessel-type solutions of PIII(2 nu, 2 - 2 nu, 1, -1) for integer nu: w = -u'/u,")
    print("# u = z^nu (J_nu(z) + Y_nu(z)/2) (DLMF 32.10(iv), 10.6.6); mpmath %s besselj/bessely," % mpmath.__version__)
    print("# runs at 60 and 80 digits agree to 50; 45 significant digits written; the points are exact doubles.")
    print("# Command: python3 tools/reference/bessel_type_reference.py"
          " > connection/src/test/resources/special/bessel-type-integer-order.csv")
    print("# nu,z_re,z_im,w_re,w_im")
    for nu in ORDERS:
        for re, im in POINTS:
            mpmath.mp.dps = 60
            a = w(nu, mpmath.mpc(re, im))
            mpmath.mp.dps = 80
            b = w(nu, mpmath.mpc(re, im))
            assert abs(a - b) <= abs(b) * mpmath.mpf(10) ** -50
            print("%d,%r,%r,%s,%s" % (nu, re, im, mpmath.nstr(b.real, 45), mpmath.nstr(b.imag, 45)))


if __name__ == "__main__":
    main()
