package org.tertius.hierarchy;

import org.hipparchus.complex.Complex;
import org.hipparchus.complex.ComplexField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.ArrayFieldVector;
import org.hipparchus.linear.FieldDecompositionSolver;
import org.hipparchus.linear.FieldLUDecomposition;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.Term;

/**
 * The power series at x = 0 of a solution analytic there of {@code x dy/dx = F(y, x)} (F polynomial in y and x),
 * for a state y(0) with F(y(0), 0) = 0. Coefficient j solves {@code (j I - J) y_j = [x^j] F(y_0 + ... +
 * y_{j-1} x^{j-1}, x)} with J the Jacobian of F at (y(0), 0) (Frobenius' method at a regular singular point;
 * common practice). Used only to leave the fixed singular point of member 1; the integration itself is the
 * core engine's. Immutable.
 */
final class OriginSeries {
    private final Complex[][] c;

    private OriginSeries(Complex[][] c) {
        this.c = c;
    }

    /**
     * @param system a LOG system {@code x dy/dx = F} whose terms have non-negative powers of x
     * @param y0 the state at x = 0
     * @param order number of coefficients beyond the constant
     */
    static OriginSeries compute(PolynomialSystem system, Complex[] y0, int order) {
        int d = system.dimension();
        Complex[][] c = new Complex[order + 1][];
        c[0] = y0.clone();
        Complex[] f0 = coefficient(system, c, 0);
        for (int i = 0; i < d; i++) {
            if (f0[i].norm() > 1e-12 * (1 + y0[i].norm())) {
                throw new InvalidInputException("start state at x = 0", "is not a rest point of x dy/dx = F: "
                        + system.unknowns().get(i) + " would not be analytic at x = 0");
            }
        }
        Complex[][] jac = jacobian(system, y0);
        for (int j = 1; j <= order; j++) {
            c[j] = new Complex[d];
            java.util.Arrays.fill(c[j], Complex.ZERO);
            Complex[] rhs = coefficient(system, c, j);
            Complex[][] m = new Complex[d][d];
            for (int a = 0; a < d; a++) {
                for (int b = 0; b < d; b++) {
                    m[a][b] = jac[a][b].negate().add(a == b ? j : 0);
                }
            }
            FieldDecompositionSolver<Complex> solver = new FieldLUDecomposition<>(
                    new Array2DRowFieldMatrix<>(ComplexField.getInstance(), m)).getSolver();
            if (!solver.isNonSingular()) {
                throw new TertiusException("x = 0 is resonant at order " + j + " (j I - J singular)");
            }
            c[j] = solver.solve(new ArrayFieldVector<>(rhs)).toArray();
        }
        return new OriginSeries(c);
    }

    /** [x^j] F(y), where only y_0 .. y_{j-1} are used (entries c[j..] are zero or absent). */
    private static Complex[] coefficient(PolynomialSystem system, Complex[][] c, int j) {
        int d = system.dimension();
        Complex[] out = new Complex[d];
        for (int i = 0; i < d; i++) {
            Complex s = Complex.ZERO;
            for (Term t : system.terms(i)) {
                int p = t.basePower();
                if (p < 0 || p > j) {
                    continue;
                }
                Complex[] prod = truncatedOne(j - p);
                for (int v = 0; v < d; v++) {
                    for (int e = 0; e < t.exponent(v); e++) {
                        prod = multiply(prod, c, v, j - p);
                    }
                }
                s = s.add(system.coefficientValues().get(t.coefficient()).multiply(prod[j - p]));
            }
            out[i] = s;
        }
        return out;
    }

    private static Complex[] truncatedOne(int deg) {
        Complex[] one = new Complex[deg + 1];
        java.util.Arrays.fill(one, Complex.ZERO);
        one[0] = Complex.ONE;
        return one;
    }

    /** The product of a series with the series of unknown v, both truncated at degree deg. */
    private static Complex[] multiply(Complex[] a, Complex[][] c, int v, int deg) {
        Complex[] out = new Complex[deg + 1];
        for (int k = 0; k <= deg; k++) {
            Complex s = Complex.ZERO;
            for (int l = 0; l <= k; l++) {
                if (c[k - l] != null) {
                    s = s.add(a[l].multiply(c[k - l][v]));
                }
            }
            out[k] = s;
        }
        return out;
    }

    private static Complex[][] jacobian(PolynomialSystem system, Complex[] y0) {
        int d = system.dimension();
        Complex[][] jac = new Complex[d][d];
        for (int i = 0; i < d; i++) {
            for (int v = 0; v < d; v++) {
                jac[i][v] = Complex.ZERO;
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
                    Complex m = system.coefficientValues().get(t.coefficient()).multiply(e);
                    for (int u = 0; u < d; u++) {
                        int k = t.exponent(u) - (u == v ? 1 : 0);
                        for (int l = 0; l < k; l++) {
                            m = m.multiply(y0[u]);
                        }
                    }
                    jac[i][v] = jac[i][v].add(m);
                }
            }
        }
        return jac;
    }

    int order() {
        return c.length - 1;
    }

    /** Coefficient j (a copy), one entry per unknown. */
    Complex[] coefficients(int j) {
        return c[j].clone();
    }

    /** Root-test estimate of the radius of convergence from the last coefficients. */
    double radius() {
        double r = Double.POSITIVE_INFINITY;
        int n = order();
        for (int j = Math.max(1, n - 5); j <= n; j++) {
            double m = 0;
            for (Complex v : c[j]) {
                m = Math.max(m, v.norm());
            }
            if (m > 0) {
                r = Math.min(r, Math.pow(m, -1.0 / j));
            }
        }
        return r;
    }

    /** The partial sum at x. */
    Complex[] value(Complex x) {
        int d = c[0].length;
        Complex[] out = new Complex[d];
        for (int i = 0; i < d; i++) {
            Complex s = Complex.ZERO;
            for (int j = order(); j >= 0; j--) {
                s = s.multiply(x).add(c[j][i]);
            }
            out[i] = s;
        }
        return out;
    }

    /** Size of the last term at |x| (the truncation error is of this order when |x| is well inside the disk). */
    double lastTerm(double x) {
        double m = 0;
        for (Complex v : c[order()]) {
            m = Math.max(m, v.norm());
        }
        return m * Math.pow(x, order());
    }
}
