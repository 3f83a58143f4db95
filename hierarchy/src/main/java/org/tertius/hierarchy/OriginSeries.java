package org.tertius.hierarchy;

import java.lang.reflect.Array;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.Term;
import org.tertius.core.number.Arithmetic;

/**
 * The power series at x = 0 of a solution analytic there of {@code x dy/dx = F(y, x)} (F polynomial in y and x),
 * for a state y(0) with F(y(0), 0) = 0. Coefficient j solves {@code (j I - J) y_j = [x^j] F(y_0 + ... +
 * y_{j-1} x^{j-1}, x)} with J the Jacobian of F at (y(0), 0) (Frobenius' method at a regular singular point;
 * common practice). The products of the unknowns' series in F are extended by one coefficient per order (each
 * monomial as a chain of partial products), so order N costs O(N^2) operations. Written once over an
 * {@link Arithmetic}: double precision for the engine's start, the high-precision engine's numbers for its
 * replay. Used only to leave the fixed singular point of member 1; the integration itself is the core engine's.
 * Immutable.
 *
 * @param <T> the number type
 */
final class OriginSeries<T> {
    private final List<T[]> c;
    private final Arithmetic<T> ar;
    private final ToDoubleFunction<T> modulus;

    private OriginSeries(List<T[]> c, Arithmetic<T> ar, ToDoubleFunction<T> modulus) {
        this.c = c;
        this.ar = ar;
        this.modulus = modulus;
    }

    /**
     * @param system a LOG system {@code x dy/dx = F} whose terms have non-negative powers of x (its structure; the
     *     coefficient values are {@code coefficients}, in the order of the system's coefficient list)
     * @param coefficients the coefficient values in the number type
     * @param y0 the state at x = 0
     * @param order number of coefficients beyond the constant
     * @param ar the arithmetic
     * @param modulus |t| as a double (for the pivots of the linear systems and the size checks)
     */
    static <T> OriginSeries<T> compute(PolynomialSystem system, List<T> coefficients, T[] y0, int order,
                                       Arithmetic<T> ar, ToDoubleFunction<T> modulus) {
        int d = system.dimension();
        List<T[]> c = new ArrayList<>();
        c.add(y0.clone());
        Products<T> products = new Products<>(system, c, ar);
        T[] f0 = products.rightHandSide(coefficients, 0);
        for (int i = 0; i < d; i++) {
            if (modulus.applyAsDouble(f0[i]) > 1e-12 * (1 + modulus.applyAsDouble(y0[i]))) {
                throw new InvalidInputException("start state at x = 0", "is not a rest point of x dy/dx = F: "
                        + system.unknowns().get(i) + " would not be analytic at x = 0");
            }
        }
        T[][] jac = jacobian(system, coefficients, y0, ar);
        for (int j = 1; j <= order; j++) {
            T[] zero = y0.clone();
            for (int i = 0; i < d; i++) {
                zero[i] = ar.zero();
            }
            c.add(zero);
            products.extend(j);
            T[] rhs = products.rightHandSide(coefficients, j);
            T[][] m = jac.clone();
            for (int a = 0; a < d; a++) {
                m[a] = jac[a].clone();
                for (int b = 0; b < d; b++) {
                    T shifted = ar.negate(jac[a][b]);
                    m[a][b] = a == b ? ar.add(shifted, integer(ar, j)) : shifted;
                }
            }
            c.set(j, solve(m, rhs, ar, modulus, j));
            products.extend(j);
        }
        return new OriginSeries<>(c, ar, modulus);
    }

    private static <T> T integer(Arithmetic<T> ar, int j) {
        T out = ar.zero();
        for (int k = 0; k < j; k++) {
            out = ar.add(out, ar.one());
        }
        return out;
    }

    /** Gaussian elimination with partial pivoting (common practice). */
    private static <T> T[] solve(T[][] m, T[] rhs, Arithmetic<T> ar, ToDoubleFunction<T> modulus, int order) {
        int d = rhs.length;
        T[] b = rhs.clone();
        for (int col = 0; col < d; col++) {
            int pivot = col;
            for (int row = col + 1; row < d; row++) {
                if (modulus.applyAsDouble(m[row][col]) > modulus.applyAsDouble(m[pivot][col])) {
                    pivot = row;
                }
            }
            if (!(modulus.applyAsDouble(m[pivot][col]) > 1e-300)) {
                throw new TertiusException("x = 0 is resonant at order " + order + " (j I - J singular)");
            }
            T[] tmp = m[col];
            m[col] = m[pivot];
            m[pivot] = tmp;
            T t = b[col];
            b[col] = b[pivot];
            b[pivot] = t;
            for (int row = col + 1; row < d; row++) {
                T f = ar.divide(m[row][col], m[col][col]);
                for (int k = col; k < d; k++) {
                    m[row][k] = ar.subtract(m[row][k], ar.multiply(f, m[col][k]));
                }
                b[row] = ar.subtract(b[row], ar.multiply(f, b[col]));
            }
        }
        T[] x = b.clone();
        for (int row = d - 1; row >= 0; row--) {
            T s = b[row];
            for (int k = row + 1; k < d; k++) {
                s = ar.subtract(s, ar.multiply(m[row][k], x[k]));
            }
            x[row] = ar.divide(s, m[row][row]);
        }
        return x;
    }

    private static <T> T[][] jacobian(PolynomialSystem system, List<T> coefficients, T[] y0, Arithmetic<T> ar) {
        int d = system.dimension();
        @SuppressWarnings("unchecked")
        T[][] jac = (T[][]) Array.newInstance(y0.getClass(), d);
        for (int i = 0; i < d; i++) {
            jac[i] = y0.clone();
            for (int v = 0; v < d; v++) {
                jac[i][v] = ar.zero();
            }
            for (Term t : system.terms(i)) {
                if (t.basePower() != 0) {
                    continue;
                }
                for (int v = 0; v < d; v++) {
                    int e = t.exponent(v);
                    if (e == 0) {
                        continue;
                    }
                    T m = ar.multiply(coefficients.get(t.coefficient()), integer(ar, e));
                    for (int u = 0; u < d; u++) {
                        int k = t.exponent(u) - (u == v ? 1 : 0);
                        for (int l = 0; l < k; l++) {
                            m = ar.multiply(m, y0[u]);
                        }
                    }
                    jac[i][v] = ar.add(jac[i][v], m);
                }
            }
        }
        return jac;
    }

    int order() {
        return c.size() - 1;
    }

    /** Root-test estimate of the radius of convergence from the last coefficients. */
    double radius() {
        double r = Double.POSITIVE_INFINITY;
        int n = order();
        for (int j = Math.max(1, n - 5); j <= n; j++) {
            double m = largest(c.get(j));
            if (m > 0) {
                r = Math.min(r, Math.pow(m, -1.0 / j));
            }
        }
        return r;
    }

    private double largest(T[] v) {
        double m = 0;
        for (T x : v) {
            m = Math.max(m, modulus.applyAsDouble(x));
        }
        return m;
    }

    /** The partial sum at x. */
    T[] value(T x) {
        T[] out = c.get(0).clone();
        for (int i = 0; i < out.length; i++) {
            T s = ar.zero();
            for (int j = order(); j >= 0; j--) {
                s = ar.add(ar.multiply(s, x), c.get(j)[i]);
            }
            out[i] = s;
        }
        return out;
    }

    /** Size of the last term at |x| (the truncation error is of this order when |x| is well inside the disk). */
    double lastTerm(double x) {
        return largest(c.get(order())) * Math.pow(x, order());
    }

    /**
     * The series of every monomial of F, as chains of partial products of the unknowns' series, extended one
     * coefficient at a time.
     */
    private static final class Products<T> {
        private final PolynomialSystem system;
        private final List<T[]> c;
        private final Arithmetic<T> ar;
        /** Per equation, per term: the factor indices (an unknown repeated by its exponent). */
        private final int[][][] factors;
        /** Per equation, per term, per factor k: the series of the product of factors 0..k. */
        private final List<List<List<List<T>>>> partial = new ArrayList<>();

        Products(PolynomialSystem system, List<T[]> c, Arithmetic<T> ar) {
            this.system = system;
            this.c = c;
            this.ar = ar;
            int d = system.dimension();
            factors = new int[d][][];
            for (int i = 0; i < d; i++) {
                List<Term> terms = system.terms(i);
                factors[i] = new int[terms.size()][];
                List<List<List<T>>> perTerm = new ArrayList<>();
                for (int t = 0; t < terms.size(); t++) {
                    List<Integer> f = new ArrayList<>();
                    for (int v = 0; v < d; v++) {
                        for (int e = 0; e < terms.get(t).exponent(v); e++) {
                            f.add(v);
                        }
                    }
                    factors[i][t] = f.stream().mapToInt(Integer::intValue).toArray();
                    List<List<T>> chain = new ArrayList<>();
                    for (int k = 0; k < f.size(); k++) {
                        chain.add(new ArrayList<>());
                    }
                    perTerm.add(chain);
                }
                partial.add(perTerm);
            }
            extend(0);
        }

        /** (Re)computes coefficient j of every partial product from the unknowns' coefficients 0..j. */
        void extend(int j) {
            for (int i = 0; i < factors.length; i++) {
                for (int t = 0; t < factors[i].length; t++) {
                    int[] f = factors[i][t];
                    List<List<T>> chain = partial.get(i).get(t);
                    for (int k = 0; k < f.length; k++) {
                        T value;
                        if (k == 0) {
                            value = c.get(j)[f[0]];
                        } else {
                            List<T> before = chain.get(k - 1);
                            value = ar.zero();
                            for (int l = 0; l <= j; l++) {
                                value = ar.add(value, ar.multiply(before.get(l), c.get(j - l)[f[k]]));
                            }
                        }
                        List<T> series = chain.get(k);
                        if (series.size() > j) {
                            series.set(j, value);
                        } else {
                            series.add(value);
                        }
                    }
                }
            }
        }

        /** [x^j] F from the coefficients known so far. */
        T[] rightHandSide(List<T> coefficients, int j) {
            int d = factors.length;
            T[] out = c.get(0).clone();
            for (int i = 0; i < d; i++) {
                T s = ar.zero();
                List<Term> terms = system.terms(i);
                for (int t = 0; t < terms.size(); t++) {
                    int m = j - terms.get(t).basePower();
                    if (m < 0 || terms.get(t).basePower() < 0) {
                        continue;
                    }
                    int[] f = factors[i][t];
                    T monomial = f.length == 0 ? (m == 0 ? ar.one() : ar.zero())
                            : partial.get(i).get(t).get(f.length - 1).get(m);
                    s = ar.add(s, ar.multiply(coefficients.get(terms.get(t).coefficient()), monomial));
                }
                out[i] = s;
            }
            return out;
        }
    }
}
