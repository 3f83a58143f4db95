package org.tertius.hierarchy;

import java.lang.reflect.Array;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The power series at b = 0 of the solution analytic there of {@code b dy/db = F(y, b)}, F polynomial in y and b,
 * written once over {@link AnalyticArithmetic} (double or arbitrary precision). With y = sum_j c_j b^j and
 * F(c_0, 0) = 0, the coefficient of b^j gives {@code (j I - J) c_j = R_j}, where J is the Jacobian of F at
 * (c_0, 0) and R_j = [b^j] F(c_0 + ... + c_{j-1} b^{j-1}, b) (Frobenius' method at a regular singular point;
 * common practice). The exponents of the linearised flow are the eigenvalues of J; the analytic solution is
 * unique when no positive integer is one of them ("resonance", refused here). Products of series are kept per
 * term and extended by one degree per coefficient, so N coefficients cost O(N^2) per term. Immutable.
 *
 * @param <T> the number type
 */
public final class FrobeniusSeries<T> {
    /** One term {@code coefficient * b^basePower * prod y[factors[k]]} of F. */
    public static final class Term<T> {
        private final T coefficient;
        private final int basePower;
        private final int[] factors;

        /**
         * @param coefficient the constant factor
         * @param basePower the power of b (&gt;= 0)
         * @param factors the unknowns multiplied, with repetition (empty for a term free of unknowns)
         */
        public Term(T coefficient, int basePower, int[] factors) {
            if (basePower < 0) {
                throw new InvalidInputException("basePower", "a term of b dy/db = F at a regular singular point"
                        + " needs a power of b >= 0, got " + basePower);
            }
            this.coefficient = coefficient;
            this.basePower = basePower;
            this.factors = factors.clone();
        }
    }

    private final AnalyticArithmetic<T> arithmetic;
    private final Class<?> type;
    private final List<T[]> coefficients;

    private FrobeniusSeries(AnalyticArithmetic<T> arithmetic, Class<?> type, List<T[]> coefficients) {
        this.arithmetic = arithmetic;
        this.type = type;
        this.coefficients = coefficients;
    }

    /**
     * The series of the solution through y0 at b = 0.
     *
     * @param arithmetic the number type
     * @param system the terms of F, one list per unknown
     * @param y0 the value at b = 0; F(y0, 0) must vanish (to 1000 units of roundoff of the size of its terms)
     * @param order the number of coefficients beyond the constant
     * @param argument the name reported when y0 is not a rest point or the flow is resonant
     */
    public static <T> FrobeniusSeries<T> compute(AnalyticArithmetic<T> arithmetic, List<List<Term<T>>> system, T[] y0,
                                                 int order, String argument) {
        int d = y0.length;
        Class<?> type = y0.getClass().getComponentType();
        if (system.size() != d || order < 1) {
            throw new InvalidInputException("system", d + " equations and order >= 1 are needed, got "
                    + system.size() + " equations and order " + order);
        }
        List<T[]> c = new ArrayList<>();
        c.add(y0.clone());
        List<List<Products<T>>> products = new ArrayList<>();
        for (List<Term<T>> eq : system) {
            List<Products<T>> p = new ArrayList<>();
            for (Term<T> t : eq) {
                p.add(new Products<>(arithmetic, t));
            }
            products.add(p);
        }
        // degree 0: F(y0, 0) = 0 and the Jacobian there
        for (int i = 0; i < d; i++) {
            T f = arithmetic.zero();
            double size = 0;
            for (Products<T> p : products.get(i)) {
                p.extend(c);
                if (p.term.basePower == 0) {
                    T v = arithmetic.multiply(p.term.coefficient, p.top(0));
                    f = arithmetic.add(f, v);
                    size += arithmetic.abs(v);
                }
            }
            if (arithmetic.abs(f) > 1000 * arithmetic.epsilon() * Math.max(size, 1)) {
                throw new InvalidInputException(argument, "the data at the singular point are not a rest point of the"
                        + " flow (equation " + i + " leaves a remainder " + arithmetic.toComplex(f) + "), so no solution"
                        + " analytic there passes through them");
            }
        }
        T[][] jacobian = jacobian(arithmetic, type, system, y0);
        for (int j = 1; j <= order; j++) {
            T[] zero = newArray(arithmetic, type, d);
            c.add(zero);
            T[] rhs = newArray(arithmetic, type, d);
            for (int i = 0; i < d; i++) {
                T s = arithmetic.zero();
                for (Products<T> p : products.get(i)) {
                    p.extend(c);
                    int k = j - p.term.basePower;
                    if (k >= 0) {
                        s = arithmetic.add(s, arithmetic.multiply(p.term.coefficient, p.top(k)));
                    }
                }
                rhs[i] = s;
            }
            T[][] m = newMatrix(arithmetic, type, d);
            for (int a = 0; a < d; a++) {
                for (int b = 0; b < d; b++) {
                    m[a][b] = arithmetic.negate(jacobian[a][b]);
                }
                m[a][a] = arithmetic.add(m[a][a], arithmetic.of(j));
            }
            T[] cj = solve(arithmetic, type, m, rhs, j, argument);
            c.set(j, cj);
            for (List<Products<T>> eq : products) {
                for (Products<T> p : eq) {
                    p.redoLast(c);
                }
            }
        }
        return new FrobeniusSeries<>(arithmetic, type, c);
    }

    /** The partial products of one term's factors, as series, extended one degree at a time. */
    private static final class Products<T> {
        private final AnalyticArithmetic<T> ar;
        private final Term<T> term;
        /** levels.get(l) = series of the product of the first l + 1 factors. */
        private final List<List<T>> levels = new ArrayList<>();

        Products(AnalyticArithmetic<T> ar, Term<T> term) {
            this.ar = ar;
            this.term = term;
            for (int l = 0; l < term.factors.length; l++) {
                levels.add(new ArrayList<>());
            }
        }

        /** The degree-k coefficient of the whole product (1 for a term free of unknowns). */
        T top(int k) {
            if (term.factors.length == 0) {
                return k == 0 ? ar.one() : ar.zero();
            }
            return levels.get(levels.size() - 1).get(k);
        }

        /** Adds the next degree, computed from the current coefficients (the newest may still be zero). */
        void extend(List<T[]> c) {
            int deg = c.size() - 1;
            for (int l = 0; l < levels.size(); l++) {
                if (levels.get(l).size() == deg) {
                    levels.get(l).add(coefficient(c, l, deg));
                }
            }
        }

        /** Recomputes the top degree once its coefficient is known. */
        void redoLast(List<T[]> c) {
            int deg = c.size() - 1;
            for (int l = 0; l < levels.size(); l++) {
                levels.get(l).set(deg, coefficient(c, l, deg));
            }
        }

        private T coefficient(List<T[]> c, int level, int deg) {
            int v = term.factors[level];
            if (level == 0) {
                return c.get(deg)[v];
            }
            List<T> prev = levels.get(level - 1);
            T s = ar.zero();
            for (int l = 0; l <= deg; l++) {
                s = ar.add(s, ar.multiply(prev.get(l), c.get(deg - l)[v]));
            }
            return s;
        }
    }

    private static <T> T[][] jacobian(AnalyticArithmetic<T> ar, Class<?> type, List<List<Term<T>>> system, T[] y0) {
        int d = y0.length;
        T[][] jac = newMatrix(ar, type, d);
        for (int i = 0; i < d; i++) {
            for (Term<T> t : system.get(i)) {
                if (t.basePower != 0) {
                    continue;
                }
                for (int k = 0; k < t.factors.length; k++) {
                    // d/dy_v of the product: the product of the other factors
                    T p = t.coefficient;
                    for (int l = 0; l < t.factors.length; l++) {
                        if (l != k) {
                            p = ar.multiply(p, y0[t.factors[l]]);
                        }
                    }
                    jac[i][t.factors[k]] = ar.add(jac[i][t.factors[k]], p);
                }
            }
        }
        return jac;
    }

    /** Gaussian elimination with partial pivoting; a pivot below d * eps * |row| signals a resonance. */
    private static <T> T[] solve(AnalyticArithmetic<T> ar, Class<?> type, T[][] m, T[] rhs, int j, String argument) {
        int d = rhs.length;
        for (int col = 0; col < d; col++) {
            int best = col;
            for (int r = col + 1; r < d; r++) {
                if (ar.abs(m[r][col]) > ar.abs(m[best][col])) {
                    best = r;
                }
            }
            T[] row = m[col];
            m[col] = m[best];
            m[best] = row;
            T tmp = rhs[col];
            rhs[col] = rhs[best];
            rhs[best] = tmp;
            if (ar.abs(m[col][col]) <= 64 * d * ar.epsilon() * (j + 1)) {
                throw new InvalidInputException(argument, "the flow is resonant at order " + j + " (" + j
                        + " is an exponent of the linearised flow at the singular point), so the solution analytic"
                        + " there is not fixed by its value; for the hierarchy this happens when 2m is a non-zero"
                        + " integer");
            }
            T inv = ar.reciprocal(m[col][col]);
            for (int r = col + 1; r < d; r++) {
                T f = ar.multiply(m[r][col], inv);
                if (ar.abs(f) == 0) {
                    continue;
                }
                for (int k = col; k < d; k++) {
                    m[r][k] = ar.subtract(m[r][k], ar.multiply(f, m[col][k]));
                }
                rhs[r] = ar.subtract(rhs[r], ar.multiply(f, rhs[col]));
            }
        }
        T[] x = newArray(ar, type, d);
        for (int r = d - 1; r >= 0; r--) {
            T s = rhs[r];
            for (int k = r + 1; k < d; k++) {
                s = ar.subtract(s, ar.multiply(m[r][k], x[k]));
            }
            x[r] = ar.divide(s, m[r][r]);
        }
        return x;
    }

    /** An array of the caller's element type (that of y0), filled with zeros. */
    @SuppressWarnings("unchecked")
    private static <T> T[] newArray(AnalyticArithmetic<T> ar, Class<?> type, int d) {
        T[] a = (T[]) Array.newInstance(type, d);
        Arrays.fill(a, ar.zero());
        return a;
    }

    @SuppressWarnings("unchecked")
    private static <T> T[][] newMatrix(AnalyticArithmetic<T> ar, Class<?> type, int d) {
        T[][] m = (T[][]) Array.newInstance(type, d, d);
        for (T[] row : m) {
            Arrays.fill(row, ar.zero());
        }
        return m;
    }

    public AnalyticArithmetic<T> arithmetic() {
        return arithmetic;
    }

    /** The number of coefficients beyond the constant. */
    public int order() {
        return coefficients.size() - 1;
    }

    /** Coefficient j of unknown i. */
    public T coefficient(int j, int i) {
        return coefficients.get(j)[i];
    }

    /** max_i |c_j[i]|. */
    public double size(int j) {
        double m = 0;
        for (T v : coefficients.get(j)) {
            m = Math.max(m, arithmetic.abs(v));
        }
        return m;
    }

    /**
     * Root-test estimate of the radius of convergence, min over the last six coefficients of |c_j|^(-1/j)
     * (infinite when they all vanish).
     */
    public double radius() {
        double r = Double.POSITIVE_INFINITY;
        for (int j = Math.max(1, order() - 5); j <= order(); j++) {
            double m = size(j);
            if (m > 0) {
                r = Math.min(r, Math.pow(m, -1.0 / j));
            }
        }
        return r;
    }

    /**
     * The estimated truncation error at |b| = rho: 16 times the largest of the last four terms (rho is meant to
     * lie well inside the disk of convergence, where the terms fall geometrically).
     */
    public double truncation(double rho) {
        double t = 0;
        for (int j = Math.max(1, order() - 3); j <= order(); j++) {
            t = Math.max(t, size(j) * Math.pow(rho, j));
        }
        return 16 * t;
    }

    /** Size of the last term at |b| = rho (the truncation error is of this order well inside the disk). */
    public double lastTerm(double rho) {
        return size(order()) * Math.pow(rho, order());
    }

    /** The rounding allowance of the partial sum at |b| = rho: 8 eps sum_j |c_j| rho^j (common practice). */
    public double rounding(double rho) {
        double s = 0;
        for (int j = 0; j <= order(); j++) {
            s += size(j) * Math.pow(rho, j);
        }
        return 8 * arithmetic.epsilon() * s;
    }

    /** The partial sum at b (Horner). */
    public T[] value(T b) {
        int d = coefficients.get(0).length;
        T[] out = newArray(arithmetic, type, d);
        for (int i = 0; i < d; i++) {
            T s = arithmetic.zero();
            for (int j = order(); j >= 0; j--) {
                s = arithmetic.add(arithmetic.multiply(s, b), coefficients.get(j)[i]);
            }
            out[i] = s;
        }
        return out;
    }
}
