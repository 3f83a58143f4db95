package org.tertius.hierarchy.monodromy;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexPairs;

/**
 * Operations on 2x2 {@link Matrix matrices} and their {@link Matrix.Vector vectors} in one
 * {@link AnalyticArithmetic}, with the moduli used by the error estimates (maximum norm of vectors, the induced
 * row-sum norm of matrices). Immutable, thread-safe.
 *
 * @param <T> number type
 */
final class MatrixArithmetic<T> {
    private final AnalyticArithmetic<T> ar;

    MatrixArithmetic(AnalyticArithmetic<T> ar) {
        this.ar = ar;
    }

    AnalyticArithmetic<T> numbers() {
        return ar;
    }

    Matrix<T> identity() {
        return new Matrix<>(ar.one(), ar.zero(), ar.zero(), ar.one());
    }

    Matrix<T> zero() {
        return new Matrix<>(ar.zero(), ar.zero(), ar.zero(), ar.zero());
    }

    /** c sigma3 = diag(c, -c). */
    Matrix<T> sigma3(T c) {
        return new Matrix<>(c, ar.zero(), ar.zero(), ar.negate(c));
    }

    Matrix<T> diagonal(T d1, T d2) {
        return new Matrix<>(d1, ar.zero(), ar.zero(), d2);
    }

    Matrix<T> add(Matrix<T> a, Matrix<T> b) {
        return new Matrix<>(ar.add(a.m11(), b.m11()), ar.add(a.m12(), b.m12()), ar.add(a.m21(), b.m21()),
                ar.add(a.m22(), b.m22()));
    }

    Matrix<T> subtract(Matrix<T> a, Matrix<T> b) {
        return new Matrix<>(ar.subtract(a.m11(), b.m11()), ar.subtract(a.m12(), b.m12()),
                ar.subtract(a.m21(), b.m21()), ar.subtract(a.m22(), b.m22()));
    }

    Matrix<T> scale(T c, Matrix<T> a) {
        return new Matrix<>(ar.multiply(c, a.m11()), ar.multiply(c, a.m12()), ar.multiply(c, a.m21()),
                ar.multiply(c, a.m22()));
    }

    Matrix<T> multiply(Matrix<T> a, Matrix<T> b) {
        return new Matrix<>(
                ar.add(ar.multiply(a.m11(), b.m11()), ar.multiply(a.m12(), b.m21())),
                ar.add(ar.multiply(a.m11(), b.m12()), ar.multiply(a.m12(), b.m22())),
                ar.add(ar.multiply(a.m21(), b.m11()), ar.multiply(a.m22(), b.m21())),
                ar.add(ar.multiply(a.m21(), b.m12()), ar.multiply(a.m22(), b.m22())));
    }

    Matrix.Vector<T> apply(Matrix<T> a, Matrix.Vector<T> v) {
        return new Matrix.Vector<>(ar.add(ar.multiply(a.m11(), v.top()), ar.multiply(a.m12(), v.bottom())),
                ar.add(ar.multiply(a.m21(), v.top()), ar.multiply(a.m22(), v.bottom())));
    }

    Matrix.Vector<T> scale(T c, Matrix.Vector<T> v) {
        return new Matrix.Vector<>(ar.multiply(c, v.top()), ar.multiply(c, v.bottom()));
    }

    T determinant(Matrix<T> a) {
        return ar.subtract(ar.multiply(a.m11(), a.m22()), ar.multiply(a.m12(), a.m21()));
    }

    /** det(u, v) of the matrix with columns u, v. */
    T determinant(Matrix.Vector<T> u, Matrix.Vector<T> v) {
        return ar.subtract(ar.multiply(u.top(), v.bottom()), ar.multiply(v.top(), u.bottom()));
    }

    /** The adjugate [[m22, -m12], [-m21, m11]] (the inverse times the determinant). */
    Matrix<T> adjugate(Matrix<T> a) {
        return new Matrix<>(a.m22(), ar.negate(a.m12()), ar.negate(a.m21()), a.m11());
    }

    Matrix<T> inverse(Matrix<T> a) {
        return scale(ar.reciprocal(determinant(a)), adjugate(a));
    }

    /**
     * |a| as a double, through the conversion to double (an arbitrary-precision modulus needs a square root at the
     * working precision; the estimates need only a few digits); the exact modulus where the conversion under- or
     * overflows.
     */
    double magnitude(T a) {
        Complex c = ar.toComplex(a);
        double m = ComplexPairs.abs(c.getReal(), c.getImaginary());
        return m > Double.MIN_NORMAL && m < Double.MAX_VALUE ? m : ar.abs(a);
    }

    /** Maximum modulus of the entries of a vector. */
    double norm(Matrix.Vector<T> v) {
        return Math.max(magnitude(v.top()), magnitude(v.bottom()));
    }

    /** The row-sum norm (induced by the maximum norm of vectors). */
    double norm(Matrix<T> a) {
        return Math.max(magnitude(a.m11()) + magnitude(a.m12()), magnitude(a.m21()) + magnitude(a.m22()));
    }

    /** Largest modulus of the differences of the entries. */
    double distance(Matrix<T> a, Matrix<T> b) {
        return norm(subtract(a, b));
    }
}
