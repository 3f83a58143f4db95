#!/usr/bin/env python3
"""Discriminants (in z) of the special polynomials S_n(z; mu) of Painleve III, n = 1..4, as factored
polynomials in mu, with sympy: S_n generated symbolically in mu from the recurrence of P. A. Clarkson,
J. Phys. A 36 (2003) 9507 (DLMF 32.8(iii)), then sympy.discriminant and sympy.factor.

Usage: python3 tools/reference/special_discriminants.py
"""
import sympy as sp

z, mu = sp.symbols('z mu')
S = [sp.Integer(1), sp.Integer(1)]
for n in range(4):
    s, sm = S[-1], S[-2]
    rhs = sp.expand(-z * (s * sp.diff(s, z, 2) - sp.diff(s, z) ** 2) - s * sp.diff(s, z) + (z + mu) * s ** 2)
    q, r = sp.div(sp.Poly(rhs, z), sp.Poly(sm, z))
    assert r.is_zero
    S.append(sp.expand(q.as_expr()))
for n in range(1, 5):
    print("S_%d:" % n, sp.expand(S[n + 1].subs(z, z - mu)), " (in z + mu -> z)")
    print("disc S_%d:" % n, sp.factor(sp.discriminant(sp.Poly(S[n + 1], z))))
