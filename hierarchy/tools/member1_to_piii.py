"""Derivation of the map from member 1 of the hierarchy to Painleve III (D6).

Contributor scratch work, kept for reference; not part of the build. Run: python3 member1_to_piii.py
(needs sympy). Prints the coefficients of w z (w'' - PIII right-hand side) as a polynomial in w, w';
they vanish for the parameter map used in Member1Map.

Member 1 (see hierarchy/README.md), a_-2 = [[a, b], [c, -a]], a_-1 = [[m, u], [v, -m]], q = u/x, r = v/x:
  a' = (c u - b v)/x,  b' = -2 a u/x,  c' = 2 a v/x,  m' = 0,
  u' = -2 m u/x - 2 i b,  v' = 2 m v/x + 2 i c,
first integrals a^2 + b c = -s^2 (det a_-2 = s^2) and T = 2 a m + b v + c u.
With y = b/u (gauge invariant): y' = -2a/x + 2 m y/x + 2 i y^2, so a = -(x/2) y' + m y + i x y^2,
and c u = b c / y = -(s^2 + a^2)/y, b v = T - 2 a m - c u, a' = (c u - b v)/x.
"""
import sympy as sp

x, z, c, K, m, s, T = sp.symbols('x z c K m s T')
Y, Y1 = sp.symbols('Y Y1')
a = -(x / 2) * Y1 + m * Y + sp.I * x * Y**2
cu = -(s**2 + a**2) / Y
bv = T - 2 * a * m - cu
ap = (cu - bv) / x
# y'' from differentiating y' = -2a/x + 2 m y/x + 2 i y^2 along the system
Y2 = -2 * ap / x + 2 * a / x**2 + 2 * m * Y1 / x - 2 * m * Y / x**2 + 4 * sp.I * Y * Y1
assert sp.simplify(-2 * a / x + 2 * m * Y / x + 2 * sp.I * Y**2 - Y1) == 0

# w(z) = K z y(x), x = z^2 / c^2
W, W1 = sp.symbols('W W1')
xz = z**2 / c**2
dxdz = 2 * z / c**2
y = W / (K * z)
dydz = sp.diff(y, z) + sp.diff(y, W) * W1
yx = dydz / dxdz
d2ydz2 = dxdz**2 * Y2.subs({Y: y, Y1: yx, x: xz}) + sp.diff(dxdz, z) * yx
W2 = sp.simplify(K * (z * d2ydz2 + 2 * dydz))
al, be, ga, de = sp.symbols('alpha beta gamma delta')
# Painleve III, NIST DLMF eq. 32.2.3
P3 = W1**2 / W - W1 / z + (al * W**2 + be) / z + ga * W**3 + de / W
poly = sp.Poly(sp.expand(sp.simplify((W2 - P3) * W * z)), W, W1)
for mon, co in zip(poly.monoms(), poly.coeffs()):
    print(mon, sp.factor(co))
# Output: no W1 terms; W^4: gamma = -16/(K^2 c^4); W^3: alpha = 8 i (2m + 1)/(K c^2);
#         W^1: beta = 8 K T; W^0: delta = 16 K^2 s^2.
# Canonical choice K = i/(4 s), c^2 = 16 s: (alpha, beta, gamma, delta) = (4m + 2, 2 i T / s, 1, -1).
sol = {K: sp.I / (4 * s), c: 4 * sp.sqrt(s)}
print('canonical:', [sp.simplify(e.subs(sol)) for e in
                     (8 * sp.I * (2 * m + 1) / (K * c**2), 8 * K * T, -16 / (K**2 * c**4), 16 * K**2 * s**2)])
