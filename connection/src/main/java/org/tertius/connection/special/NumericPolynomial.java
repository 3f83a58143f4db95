package org.tertius.connection.special;

import java.math.BigInteger;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;

/**
 * A polynomial with exact coefficients c_k = a_k / q^(d-k) (a_k Gaussian integers, q a positive integer, d the
 * degree), converted once into an arithmetic, with Horner evaluation of the value and the derivative and a
 * rounding bound for each.
 *
 * <p>Rounding bound (common practice, Higham, Accuracy and Stability of Numerical Algorithms, §5.1): Horner's
 * rule in complex arithmetic of unit roundoff u returns p(x) with an absolute error below
 * (4 d + 9) u sum_k |c_k| |x|^k (each of the d steps is one complex multiply and add, at most about 4 u relative;
 * the coefficients and x carry one rounding each; the factor is generous). The sum is kept as a logarithm so
 * that it cannot overflow.
 *
 * @param <T> the number type
 */
final class NumericPolynomial<T> {
    private final AnalyticArithmetic<T> ar;
    private final T[] c;
    private final double[] logAbs;
    private final boolean finite;

    /**
     * @param ar the arithmetic
     * @param p numerators a_k (Gaussian integers)
     * @param den the denominator q: c_k = a_k / q^(d - k) (q = 1 for integer coefficients)
     */
    @SuppressWarnings("unchecked")
    NumericPolynomial(AnalyticArithmetic<T> ar, GaussianPolynomial p, BigInteger den) {
        this.ar = ar;
        int d = p.degree();
        this.c = (T[]) new Object[d + 1];
        this.logAbs = new double[d + 1];
        boolean ok = true;
        double logDen = Conversions.logAbs(den, BigInteger.ZERO);
        for (int k = 0; k <= d; k++) {
            BigInteger scale = den.pow(d - k);
            c[k] = Conversions.of(ar, p.re(k), p.im(k), scale);
            logAbs[k] = Conversions.logAbs(p.re(k), p.im(k)) - (d - k) * logDen;
            double a = ar.abs(c[k]);
            ok &= !Double.isNaN(a) && !Double.isInfinite(a);
        }
        this.finite = ok;
    }

    private NumericPolynomial(AnalyticArithmetic<T> ar, T[] c, double[] logAbs) {
        this.ar = ar;
        this.c = c;
        this.logAbs = logAbs;
        boolean ok = true;
        for (T x : c) {
            double a = ar.abs(x);
            ok &= !Double.isNaN(a) && !Double.isInfinite(a);
        }
        this.finite = ok;
    }

    /**
     * p(R y) / M in double precision with R = |a_0 / a_d|^(1/d) (the geometric mean of the root moduli) and M the
     * largest scaled coefficient, so that neither coefficients nor values near the roots overflow; the roots y of
     * this polynomial are the roots of p divided by R. Requires a_0 != 0. Scaled coefficients below the double
     * range become 0 (they cannot move a root at double precision).
     *
     * @return the polynomial and R
     */
    static Scaled scaledDouble(GaussianPolynomial p) {
        int d = p.degree();
        double[] l = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            l[k] = Conversions.logAbs(p.re(k), p.im(k));
        }
        double logR = (l[0] - l[d]) / d;
        double max = Double.NEGATIVE_INFINITY;
        for (int k = 0; k <= d; k++) {
            max = Math.max(max, l[k] + k * logR);
        }
        Complex[] c = new Complex[d + 1];
        double[] logs = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            logs[k] = l[k] + k * logR - max;
            if (l[k] == Double.NEGATIVE_INFINITY) {
                c[k] = Complex.ZERO;
                continue;
            }
            int shift = Math.max(0, Math.max(p.re(k).bitLength(), p.im(k).bitLength()) - 60);
            double x = p.re(k).shiftRight(shift).doubleValue();
            double y = p.im(k).shiftRight(shift).doubleValue();
            double m = Math.hypot(x, y);
            double size = Math.exp(logs[k]);
            c[k] = new Complex(x / m * size, y / m * size);
        }
        return new Scaled(new NumericPolynomial<>(ComplexArithmetic.INSTANCE, c, logs),
                Math.exp(logR));
    }

    /**
     * A scaled double-precision polynomial and its scale R.
     *
     * @param polynomial p(R y) / M
     * @param scale R
     */
    record Scaled(NumericPolynomial<Complex> polynomial, double scale) {
    }

    /** False if a coefficient overflowed the arithmetic (double only): evaluate in Apfloat instead. */
    boolean finite() {
        return finite;
    }

    int degree() {
        return c.length - 1;
    }

    T coefficient(int k) {
        return c[k];
    }

    /** Natural log of |c_k|. */
    double logAbsCoefficient(int k) {
        return logAbs[k];
    }

    AnalyticArithmetic<T> arithmetic() {
        return ar;
    }

    /** {p(x), p'(x)} by Horner's rule, without bounds (for iterations). */
    @SuppressWarnings("unchecked")
    T[] valueAndDerivative(T x) {
        int d = degree();
        T v = c[d];
        T dv = ar.zero();
        for (int k = d - 1; k >= 0; k--) {
            dv = ar.add(ar.multiply(dv, x), v);
            v = ar.add(ar.multiply(v, x), c[k]);
        }
        T[] out = (T[]) new Object[] {v, dv};
        return out;
    }

    /**
     * p(x) and p'(x), with log bounds of their rounding errors.
     *
     * @return the evaluation
     */
    Evaluation<T> evaluate(T x) {
        int d = degree();
        T v = c[d];
        T dv = ar.zero();
        double logX = ar.logAbs(x);
        double m = logAbs[d];
        double md = Double.NEGATIVE_INFINITY;
        for (int k = d - 1; k >= 0; k--) {
            dv = ar.add(ar.multiply(dv, x), v);
            v = ar.add(ar.multiply(v, x), c[k]);
            md = Conversions.logAdd(md + logX, m);
            m = Conversions.logAdd(m + logX, logAbs[k]);
        }
        double logFactor = Math.log((4.0 * d + 9) * ar.epsilon());
        return new Evaluation<>(v, dv, m + logFactor, md + logFactor + Math.log(2));
    }

    /**
     * A value, the derivative, and natural logs of bounds of their absolute rounding errors.
     *
     * @param <T> the number type
     */
    record Evaluation<T>(T value, T derivative, double logErrorValue, double logErrorDerivative) {
    }
}
