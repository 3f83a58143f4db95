"""The t_n-flow of member n near t_n = 0: regular singular on x = 0 (lower times zero), irregular elsewhere.

Contributor scratch work, kept for reference; not part of the build. Run: python3 tflow_origin.py (needs sympy).
Builds A = sum_{k=-2}^{n-1} a_k lambda^k (a_{n-1} = -i n t sigma3) and B = sum_k w_k lambda^(n-k) as in
hierarchy/README.md, with t_1 = x and t_2 .. t_{n-1} = 0, and prints for n = 2, 3:
  - t dA/dt = t (B_lambda + [B, A]) at x = 0 (polynomial in the unknowns and t),
  - that it vanishes at t = 0 on a_-1 = m sigma3, a_0 = .. = a_{n-2} = 0 (a_-2 free),
  - the eigenvalues of its Jacobian there (the exponents of the linearised flow),
  - the highest power of 1/t in dA/dt for x != 0 (2: an irregular singular point).
"""
import sympy as sp

lam, t, x, m = sp.symbols('lambda t x m')
I = sp.I
S3 = sp.Matrix([[1, 0], [0, -1]])


def coefficient(M, p):
    return M.applyfunc(lambda e: sp.expand(e * lam**3).coeff(lam, p + 3))


def tflow(n, xval):
    syms = {}
    A = sp.zeros(2, 2)
    for k in range(-2, n - 1):
        a11, a12, a21 = sp.symbols(f'a{k}_11 a{k}_12 a{k}_21'.replace('-', 'm'))
        syms[k] = (a11, a12, a21)
        A += sp.Matrix([[a11, a12], [a21, -a11]]) * lam**k
    A += -I * n * t * S3 * lam**(n - 1)
    times = {1: xval, n: t}
    for j in range(2, n):
        times[j] = 0
    w = [-I * S3]
    for k in range(1, n + 1):
        acc = coefficient(A, n - 1 - k)
        if k == n:
            acc = acc - m * S3
        for j in range(max(1, n - k), n):
            acc = acc - w[k - n + j] * j * times[j]
        w.append(sp.simplify(acc / (n * t)))
    B = sum((w[k] * lam**(n - k) for k in range(n + 1)), sp.zeros(2, 2))
    R = (sp.diff(B, lam) + B * A - A * B).applyfunc(sp.expand)
    unknowns, rhs = [], []
    for k in range(-2, n - 1):
        c = coefficient(R, k)
        for e, (i, j) in zip(syms[k], [(0, 0), (0, 1), (1, 0)]):
            unknowns.append(e)
            rhs.append(sp.expand(c[i, j]))
    return unknowns, rhs, syms


for n in (2, 3):
    u, rhs, syms = tflow(n, 0)
    F = [sp.expand(t * r) for r in rhs]
    print('member', n, ': t dy/dt on x = 0')
    for a, f in zip(u, F):
        print('  ', a, ':', f)
    p, q0, s = sp.symbols('p q0 s')
    rest = {e: 0 for k in syms for e in syms[k]}
    rest.update({syms[-2][0]: p, syms[-2][1]: q0, syms[-2][2]: -(s**2 + p**2) / q0, syms[-1][0]: m})
    print('  F at the rest point, t = 0:', [sp.simplify(f.subs(rest).subs(t, 0)) for f in F])
    J = sp.Matrix([[sp.diff(f, v).subs(rest).subs(t, 0) for v in u] for f in F])
    print('  exponents:', {sp.simplify(k): v for k, v in J.eigenvals().items()})
    u, rhs, syms = tflow(n, x)
    worst = max(-min(sp.Poly(sp.expand(r * t**4), t).monoms())[0] + 4 if r != 0 else 0 for r in rhs)
    print('  x != 0: dy/dt has poles of order', worst, 'at t = 0')
# Output (n = 2): exponents 0 (4 times), 1/2, m, -m, 1/2 + m, 1/2 - m; (n = 3): 0 (4 times), 1/3, 2/3,
# (k +- 2m)/3 for k = 0, 1, 2. A positive integer among them iff 2m is a non-zero integer. Poles of order 2 for x != 0.
