package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.LaurentMatrix;
import org.tertius.hierarchy.algebra.Matrix2;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * The exact (symbolic) equations of member n, generated from the Lax pair
 * <pre>
 *   Phi_x = U Phi,  U = -i lambda sigma3 + Q,  Q = [[0, q], [r, 0]],
 *   Phi_lambda = A Phi,  A = sum_{k=-2}^{n-1} a_k lambda^k,  a_{n-1} = -i n t_n sigma3  (t_1 = x),
 *   Phi_{t_n} = B Phi,  B = (lambda^n W)_+,
 * </pre>
 * (the isomonodromic construction of Sakka, J. Phys. A 42 (2009) 025210, with the AKNS recursion).
 *
 * <p>The polynomial ring has the unknowns first: the entries (1,1), (1,2), (2,1) of a_k for k = -2 .. n-2
 * (3(n+1) unknowns, a_k traceless), then the parameters x, t_2 .. t_n, m. The x-flow is the zero-curvature
 * condition {@code A_x = U_lambda + [U, A]} read at lambda^k, k = -2 .. n-2 (the lowest one,
 * {@code a_{-2}' = [Q, a_{-2}]}, closes the system); the equation at lambda^{n-1} gives
 * {@code q = a_{n-2,12} / (n t_n)} and {@code r = a_{n-2,21} / (n t_n)}. The t_n-flow is
 * {@code A_t = B_lambda + [B, A]} with {@code W = sum_k w_k lambda^{-k}} read off from
 * {@code A = theta_lambda W + m sigma3 / lambda + O(lambda^-2)} at lambda = infinity, where
 * {@code theta = x lambda + t_2 lambda^2 + ... + t_n lambda^n + s / lambda}.
 *
 * <p>First integrals: the coefficients of det A(lambda) at lambda^-4 (= det a_{-2}), at lambda^-3
 * (= -tr(a_{-2} a_{-1})), and at lambda^p for p = n-2 .. 2n-3, where det A = -mu^2 with
 * {@code mu = -i theta_lambda + m / lambda + O(lambda^-2)}, which ties the diagonal entries of a_{-1} .. a_{n-2}
 * to x, the times and m. Immutable.
 */
final class MemberEquations {
    private final int n;
    private final int unknowns;
    private final int variables;
    private final List<String> names;
    private final List<Polynomial> xFlow;
    private final List<Polynomial> tFlow;
    private final Polynomial q;
    private final Polynomial r;
    private final Polynomial detA2;
    private final Polynomial traceForm;
    private final Map<Integer, Polynomial> constraints;

    MemberEquations(int n) {
        this.n = n;
        this.unknowns = 3 * (n + 1);
        this.variables = unknowns + n + 1;
        this.names = Collections.unmodifiableList(names(n));
        LaurentMatrix a = lax();
        Polynomial kappa = reciprocalOfTopTime();
        this.q = unknown(n - 2, 1).multiply(kappa);
        this.r = unknown(n - 2, 2).multiply(kappa);
        Map<Integer, Matrix2> uc = new TreeMap<>();
        uc.put(1, Matrix2.sigma3(constant(GaussianRational.I.negate())));
        uc.put(0, Matrix2.of(zero(), q, r, zero()));
        LaurentMatrix u = LaurentMatrix.of(variables, uc);
        this.xFlow = read(u.lambdaDerivative().add(u.commutator(a)));
        this.tFlow = n >= 2 ? read(timeFlowMatrix(a)) : List.of();
        Map<Integer, Polynomial> det = a.determinant();
        this.detA2 = det.getOrDefault(-4, zero());
        this.traceForm = a.coefficient(-2).multiply(a.coefficient(-1)).trace();
        Map<Integer, Polynomial> target = targets();
        Map<Integer, Polynomial> c = new LinkedHashMap<>();
        for (int p = 2 * n - 3; p >= n - 2; p--) {
            c.put(p, det.getOrDefault(p, zero()).subtract(target.getOrDefault(p, zero())));
        }
        this.constraints = Collections.unmodifiableMap(c);
    }

    private static List<String> names(int n) {
        List<String> s = new ArrayList<>();
        for (int k = -2; k <= n - 2; k++) {
            s.add("a(" + k + ")11");
            s.add("a(" + k + ")12");
            s.add("a(" + k + ")21");
        }
        s.add("x");
        for (int j = 2; j <= n; j++) {
            s.add("t_" + j);
        }
        s.add("m");
        return s;
    }

    /** A = sum a_k lambda^k with a_k made of the unknowns and a_{n-1} = -i n t_n sigma3. */
    private LaurentMatrix lax() {
        Map<Integer, Matrix2> c = new TreeMap<>();
        for (int k = -2; k <= n - 2; k++) {
            Polynomial d = unknown(k, 0);
            c.put(k, Matrix2.of(d, unknown(k, 1), unknown(k, 2), d.negate()));
        }
        c.put(n - 1, Matrix2.sigma3(timeVar(n).scale(GaussianRational.of(0, -n))));
        return LaurentMatrix.of(variables, c);
    }

    /** B = (lambda^n W)_+ for the t_n-flow, with w_0 .. w_n read off from A at infinity. */
    private LaurentMatrix timeFlowMatrix(LaurentMatrix a) {
        Polynomial kappa = reciprocalOfTopTime();
        List<Matrix2> w = new ArrayList<>();
        w.add(Matrix2.sigma3(constant(GaussianRational.I.negate())));
        for (int k = 1; k <= n; k++) {
            Matrix2 acc = a.coefficient(n - 1 - k);
            if (k == n) {
                acc = acc.subtract(Matrix2.sigma3(Polynomial.variable(variables, variables - 1)));
            }
            for (int j = Math.max(1, n - k); j <= n - 1; j++) {
                acc = acc.subtract(w.get(k - n + j).scale(timeVar(j).scale(GaussianRational.of(j, 0))));
            }
            w.add(acc.scale(kappa));
        }
        Map<Integer, Matrix2> bc = new TreeMap<>();
        for (int k = 0; k <= n; k++) {
            bc.put(n - k, w.get(k));
        }
        LaurentMatrix b = LaurentMatrix.of(variables, bc);
        return b.lambdaDerivative().add(b.commutator(a));
    }

    /** The right-hand sides for the unknowns: entries 11, 12, 21 of the lambda^k coefficient, k = -2 .. n-2. */
    private List<Polynomial> read(LaurentMatrix m) {
        List<Polynomial> rhs = new ArrayList<>();
        for (int k = -2; k <= n - 2; k++) {
            Matrix2 c = m.coefficient(k);
            rhs.add(c.entry(1, 1));
            rhs.add(c.entry(1, 2));
            rhs.add(c.entry(2, 1));
        }
        return Collections.unmodifiableList(rhs);
    }

    /** -mu^2 at lambda^p for p &gt;= n-2, mu_k = -i (k+1) t_{k+1} (k = 0 .. n-1), mu_{-1} = m. */
    private Map<Integer, Polynomial> targets() {
        Map<Integer, Polynomial> mu = new TreeMap<>();
        for (int k = 0; k <= n - 1; k++) {
            mu.put(k, timeVar(k + 1).scale(GaussianRational.of(0, -(k + 1))));
        }
        mu.put(-1, Polynomial.variable(variables, variables - 1));
        Map<Integer, Polynomial> t = new TreeMap<>();
        for (Map.Entry<Integer, Polynomial> i : mu.entrySet()) {
            for (Map.Entry<Integer, Polynomial> j : mu.entrySet()) {
                t.merge(i.getKey() + j.getKey(), i.getValue().multiply(j.getValue()).negate(), Polynomial::add);
            }
        }
        return t;
    }

    private Polynomial reciprocalOfTopTime() {
        int[] e = new int[variables];
        e[timeIndex(n)] = -1;
        return Polynomial.monomial(variables, GaussianRational.rational(1, n), e);
    }

    private Polynomial unknown(int level, int entry) {
        return Polynomial.variable(variables, index(level, entry));
    }

    private Polynomial timeVar(int j) {
        return Polynomial.variable(variables, timeIndex(j));
    }

    private Polynomial zero() {
        return Polynomial.zero(variables);
    }

    private Polynomial constant(GaussianRational c) {
        return Polynomial.constant(variables, c);
    }

    /** Index of entry (0: (1,1), 1: (1,2), 2: (2,1)) of a_level among the unknowns. */
    static int index(int level, int entry) {
        return 3 * (level + 2) + entry;
    }

    /** Index of t_j in the ring (t_1 = x). */
    int timeIndex(int j) {
        return j == 1 ? unknowns : unknowns + j - 1;
    }

    int mIndex() {
        return variables - 1;
    }

    int order() {
        return n;
    }

    int unknownCount() {
        return unknowns;
    }

    int variableCount() {
        return variables;
    }

    /** Names of the ring's variables (unknowns, then x, t_2 .. t_n, m). */
    List<String> names() {
        return names;
    }

    /** d/dx of each unknown. */
    List<Polynomial> xFlow() {
        return xFlow;
    }

    /** d/dt_n of each unknown (empty for n = 1, where t_1 = x). */
    List<Polynomial> tFlow() {
        return tFlow;
    }

    Polynomial q() {
        return q;
    }

    Polynomial r() {
        return r;
    }

    /** det a_{-2}; equals s^2 on solutions. */
    Polynomial detA2() {
        return detA2;
    }

    /** tr(a_{-2} a_{-1}), a first integral. */
    Polynomial traceForm() {
        return traceForm;
    }

    /**
     * The constraints [lambda^p] det A - [lambda^p](-mu^2), p = 2n-3 .. n-2 in that order; each vanishes on
     * solutions, and the one at p fixes the diagonal entry a_{p-n+1,11}.
     */
    Map<Integer, Polynomial> constraints() {
        return constraints;
    }
}
