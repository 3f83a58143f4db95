package org.tertius.hierarchy.monodromy;

import java.util.List;
import java.util.function.UnaryOperator;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The damped least-squares step of the Levenberg-Marquardt method (common practice): (J^H J + mu D) delta =
 * -J^H r with D the diagonal of J^H J, solved by Gaussian elimination with partial pivoting in the working
 * arithmetic; with mu &gt; 0 a null direction of J (a gauge the conditions do not fix) gets no step. Stateless.
 */
final class LeastSquares {
    private LeastSquares() {
    }

    /**
     * @param jacobian rows of J (one per residual)
     * @param residual r
     * @return delta
     */
    static <T> T[] step(AnalyticArithmetic<T> ar, UnaryOperator<T> conj, List<T[]> jacobian, List<T> residual,
                        double mu) {
        int p = jacobian.get(0).length;
        @SuppressWarnings("unchecked")
        T[][] a = (T[][]) new Object[p][p + 1];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j <= p; j++) {
                a[i][j] = ar.zero();
            }
        }
        for (int row = 0; row < jacobian.size(); row++) {
            T[] jr = jacobian.get(row);
            for (int i = 0; i < p; i++) {
                T ci = conj.apply(jr[i]);
                for (int j = 0; j < p; j++) {
                    a[i][j] = ar.add(a[i][j], ar.multiply(ci, jr[j]));
                }
                a[i][p] = ar.subtract(a[i][p], ar.multiply(ci, residual.get(row)));
            }
        }
        double largest = 0;
        for (int i = 0; i < p; i++) {
            largest = Math.max(largest, ar.abs(a[i][i]));
        }
        for (int i = 0; i < p; i++) {
            T d = ar.of(mu * Math.max(ar.abs(a[i][i]), 1e-30 * largest + Double.MIN_NORMAL));
            a[i][i] = ar.add(a[i][i], d);
        }
        return solve(ar, a, p);
    }

    /** Solves the p x p system with right-hand side in column p. */
    static <T> T[] solve(AnalyticArithmetic<T> ar, T[][] a, int p) {
        for (int col = 0; col < p; col++) {
            int best = col;
            for (int r = col + 1; r < p; r++) {
                if (ar.abs(a[r][col]) > ar.abs(a[best][col])) {
                    best = r;
                }
            }
            T[] t = a[col];
            a[col] = a[best];
            a[best] = t;
            T pivot = a[col][col];
            if (ar.abs(pivot) == 0) {
                throw new ArithmeticException("singular least-squares system");
            }
            for (int r = col + 1; r < p; r++) {
                T f = ar.divide(a[r][col], pivot);
                for (int c = col; c <= p; c++) {
                    a[r][c] = ar.subtract(a[r][c], ar.multiply(f, a[col][c]));
                }
            }
        }
        @SuppressWarnings("unchecked")
        T[] x = (T[]) new Object[p];
        for (int r = p - 1; r >= 0; r--) {
            T sum = a[r][p];
            for (int c = r + 1; c < p; c++) {
                sum = ar.subtract(sum, ar.multiply(a[r][c], x[c]));
            }
            x[r] = ar.divide(sum, a[r][r]);
        }
        return x;
    }
}
