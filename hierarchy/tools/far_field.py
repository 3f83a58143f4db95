"""Large-zeta expansion of the decaying solutions of theta'' + theta'/zeta + sin theta = 0 (the profile at T = 0).

Contributor scratch work, kept for reference; not part of the build. Run: python3 far_field.py (needs sympy and
mpmath; a few minutes). Ansatz theta = sum_j zeta^(-1/2-j) sum_k (p_jk cos k psi + q_jk sin k psi),
psi = zeta + c log zeta + phi, p_01 = A, q_01 = 0; each power of zeta^(-1/2) is projected on cos k psi, sin k psi
(by a discrete Fourier transform, exact for trigonometric polynomials). With c free, the cos psi condition at
zeta^(-3/2) reads A (A^2 + 16 c) / 8 = 0, so c = -A^2/16, imposed below. Prints the coefficients used by
SineGordonTail, then checks the three-term form against an mpmath integration from theta(0) = pi/2 with
the closed-form constants A^2 = 16 nu, phi = pi/4 - 2 nu log 2 + arg Gamma(i nu), nu = log 2 / (2 pi).
"""
import mpmath as mp
import sympy as sp

psi, A, h = sp.symbols('psi A h', positive=True)
c = -A**2 / 16          # fixed at the first order below (the k = 1 condition at zeta^(-3/2): A (A^2 + 16 c) = 0)
N = 20                  # sample points of the discrete Fourier transform (harmonics up to 7 appear)


def residual(blocks):
    """theta'' + theta'/zeta + sin theta with theta = sum_j h^(2j+1) blocks[j], h = zeta^(-1/2)."""
    theta = sum(h**(2 * j + 1) * b for j, b in enumerate(blocks))
    d = lambda F: sp.diff(F, psi) * (1 + c * h**2) + sp.diff(F, h) * (-h**3 / 2)
    sine = sum((-1)**i * theta**(2 * i + 1) / sp.factorial(2 * i + 1) for i in range(4))
    return sp.expand(d(d(theta)) + h**2 * d(theta) + sine)


def modes(expr, order, ks):
    vals = [sp.expand(expr.coeff(h, order).subs(psi, 2 * sp.pi * m / N)) for m in range(N)]
    eqs = []
    for k in ks:
        for f in (sp.cos, sp.sin):
            e = sp.expand(sp.simplify(sum(v * f(2 * sp.pi * k * m / N) for m, v in enumerate(vals))))
            if e != 0:
                eqs.append(e)
    return eqs


P = {(j, k): sp.Symbol(f'p{j}{k}') for j in (1, 2) for k in range(1, 2 * j + 2, 2)}
Q = {(j, k): sp.Symbol(f'q{j}{k}') for j in (1, 2) for k in range(1, 2 * j + 2, 2)}
block = lambda j: sum(P[j, k] * sp.cos(k * psi) + Q[j, k] * sp.sin(k * psi) for k in range(1, 2 * j + 2, 2))
expr = residual([A * sp.cos(psi), block(1), block(2)])
sol = {}
# orders zeta^(-3/2), zeta^(-5/2): all harmonics; zeta^(-7/2): only k = 1, the condition fixing p21, q21 (the
# zeta^(-7/2) block enters the other harmonics only)
for order, ks in ((3, range(0, 8)), (5, range(0, 8)), (7, (1,))):
    eqs = [sp.expand(e.subs(sol)) for e in modes(expr, order, ks)]
    unknowns = sorted(set().union(*[e.free_symbols for e in eqs]) - {A}, key=str)
    sol.update(sp.solve(eqs, unknowns, dict=True)[0])
    sol = {k: sp.factor(sp.nsimplify(sp.radsimp(v.subs(sol)))) for k, v in sol.items()}
    print('order', order, sol)
# c = -A^2/16; p11 = A^3/32, q11 = A/8 - 3A^5/1024, p13 = -A^3/192; p21 = -9A^9/2097152 + 13A^5/4096 - 9A/128,
# q21 = -A^7/4096 + 7A^3/256, p23 = -3A^5/4096, q23 = 3A^3(A^4 - 128)/65536, p25 = A^5/20480 (others 0)

mp.mp.dps = 30
nu = mp.log(2) / (2 * mp.pi)
a = 4 * mp.sqrt(nu)
phi = mp.pi / 4 - 2 * nu * mp.log(2) + mp.arg(mp.gamma(1j * nu))
z0 = mp.mpf('1e-10')
ode = mp.odefun(lambda z, y: [y[1], -y[1] / z - mp.sin(y[0])], z0, [mp.pi / 2 - z0**2 / 4, -z0 / 2],
                tol=mp.mpf(10)**-26, degree=30)
subs = {A: a}
for zeta in (20, 40, 80, 160):
    z = mp.mpf(zeta)
    p_ = z - nu * mp.log(z) + phi
    value = a * z**-0.5 * mp.cos(p_)
    for j in (1, 2):
        for k in range(1, 2 * j + 2, 2):
            pk = sp.N(sol.get(P[j, k], 0).subs(subs), 30) if P[j, k] in sol else 0
            qk = sp.N(sol.get(Q[j, k], 0).subs(subs), 30) if Q[j, k] in sol else 0
            value += z**(-0.5 - j) * (mp.mpf(str(pk)) * mp.cos(k * p_) + mp.mpf(str(qk)) * mp.sin(k * p_))
    print('zeta', zeta, 'theta - three-term form:', mp.nstr(ode(z)[0] - value, 3))
# zeta 20: about 1e-6, 40: 3e-7, 80: 1e-8, 160: 2e-9 (the omitted order zeta^(-7/2)).
