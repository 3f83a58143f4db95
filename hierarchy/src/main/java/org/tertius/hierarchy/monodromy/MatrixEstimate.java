package org.tertius.hierarchy.monodromy;

import org.tertius.core.number.AnalyticArithmetic;

/**
 * A 2x2 matrix with an error bound per entry, and the products, inverses and determinants of such matrices with
 * first-order propagation of the errors plus the rounding of the operation (the working epsilon times the moduli
 * of the summands). Immutable.
 *
 * @param value the matrix
 * @param e11 error of entry (1,1)
 * @param e12 error of entry (1,2)
 * @param e21 error of entry (2,1)
 * @param e22 error of entry (2,2)
 * @param <T> number type
 */
record MatrixEstimate<T>(Matrix<T> value, double e11, double e12, double e21, double e22) {

    double error(int row, int column) {
        if (row == 1) {
            return column == 1 ? e11 : e12;
        }
        return column == 1 ? e21 : e22;
    }

    /** The matrix with the given columns, each with one error bound for both entries. */
    static <T> MatrixEstimate<T> ofColumns(Matrix.Vector<T> first, double firstError, Matrix.Vector<T> second,
                                           double secondError) {
        return new MatrixEstimate<>(Matrix.ofColumns(first, second), firstError, secondError, firstError, secondError);
    }

    static <T> MatrixEstimate<T> multiply(MatrixArithmetic<T> ma, MatrixEstimate<T> a, MatrixEstimate<T> b) {
        AnalyticArithmetic<T> ar = ma.numbers();
        Matrix<T> p = ma.multiply(a.value(), b.value());
        double[] e = new double[4];
        for (int i = 1; i <= 2; i++) {
            for (int j = 1; j <= 2; j++) {
                double s = 0;
                double mag = 0;
                for (int k = 1; k <= 2; k++) {
                    double ak = ar.abs(a.value().entry(i, k));
                    double bk = ar.abs(b.value().entry(k, j));
                    s += ak * b.error(k, j) + a.error(i, k) * bk + a.error(i, k) * b.error(k, j);
                    mag += ak * bk;
                }
                e[2 * (i - 1) + (j - 1)] = s + 2 * ar.epsilon() * mag;
            }
        }
        return new MatrixEstimate<>(p, e[0], e[1], e[2], e[3]);
    }

    static <T> Estimate<T> determinant(MatrixArithmetic<T> ma, MatrixEstimate<T> a) {
        AnalyticArithmetic<T> ar = ma.numbers();
        Matrix<T> v = a.value();
        double m11 = ar.abs(v.m11());
        double m12 = ar.abs(v.m12());
        double m21 = ar.abs(v.m21());
        double m22 = ar.abs(v.m22());
        double e = m22 * a.e11() + m11 * a.e22() + m12 * a.e21() + m21 * a.e12() + a.e11() * a.e22()
                + a.e12() * a.e21() + 2 * ar.epsilon() * (m11 * m22 + m12 * m21);
        return new Estimate<>(ma.determinant(v), e);
    }

    static <T> MatrixEstimate<T> inverse(MatrixArithmetic<T> ma, MatrixEstimate<T> a) {
        AnalyticArithmetic<T> ar = ma.numbers();
        Estimate<T> det = determinant(ma, a);
        double d = ar.abs(det.value());
        Matrix<T> inv = ma.inverse(a.value());
        double rel = det.error() / d;
        double eps = 2 * ar.epsilon();
        return new MatrixEstimate<>(inv, a.e22() / d + ar.abs(inv.m11()) * (rel + eps),
                a.e12() / d + ar.abs(inv.m12()) * (rel + eps), a.e21() / d + ar.abs(inv.m21()) * (rel + eps),
                a.e11() / d + ar.abs(inv.m22()) * (rel + eps));
    }
}
