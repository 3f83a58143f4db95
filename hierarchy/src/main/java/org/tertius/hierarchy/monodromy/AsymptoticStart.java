package org.tertius.hierarchy.monodromy;

import java.util.List;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Start values of the canonical columns at one irregular singular point from its {@link FormalSolution}, optimally
 * truncated, and their transport to the meeting point. The formal series runs in a scaled variable v: at infinity
 * v = lambda / L, at zero v = L / lambda (L = |s|), and the column b of the canonical solution is
 * <pre>  infinity:  H(v) e_b exp(Lambda_b),  Lambda_b = sum_{k>=0} b_k v^(k+1)/(k+1) + b_{-1} log lambda,
 *   zero:      G0 H(v) e_b exp(Lambda_b),  Lambda_b = b_0 v - b_{-1} log lambda,</pre>
 * with log lambda on the universal cover (the argument of the start ray). The start radius is the smallest |v|
 * (not below the one where the leading exponent difference reaches log(1/epsilon)) at which two consecutive terms
 * of column b are below epsilon/2 relative to its first; the series is cut before them, and its error is taken as
 * twice the first omitted term plus the next one (the remainder of an asymptotic series cut near its smallest term
 * is of the size of that term: common practice), plus the rounding of the partial sum and of the exponential (the
 * exponent is about log(1/epsilon) there). Immutable.
 *
 * @param <T> number type
 */
final class AsymptoticStart<T> {
    private final AnalyticArithmetic<T> ar;
    private final MatrixArithmetic<T> ma;
    private final FormalSolution<T> formal;
    private final double epsilon;
    private final int rank;
    private final T scale;
    private final Matrix<T> eigenvectors;
    private final boolean atZero;
    private final double[] modulus = new double[2];
    private final int[] cut = new int[2];

    AsymptoticStart(AnalyticArithmetic<T> ar, MatrixArithmetic<T> ma, FormalSolution<T> formal, double epsilon, int rank,
                    T scale, Matrix<T> eigenvectors, boolean atZero) {
        this.ar = ar;
        this.ma = ma;
        this.formal = formal;
        this.epsilon = epsilon;
        this.rank = rank;
        this.scale = scale;
        this.eigenvectors = eigenvectors;
        this.atZero = atZero;
        double floor = Math.pow((Math.log(1 / epsilon) + 3) / 2, 1.0 / rank);
        List<Matrix<T>> h = formal.series();
        for (int b = 1; b <= 2; b++) {
            double[] lm = new double[h.size()];
            for (int j = 0; j < h.size(); j++) {
                Matrix.Vector<T> col = h.get(j).column(b);
                lm[j] = Math.max(ar.logAbs(col.top()), ar.logAbs(col.bottom()));
            }
            double logTarget = Math.log(epsilon / 2);
            double best = Double.POSITIVE_INFINITY;
            int bestCut = h.size() - 2;
            for (int j = 1; j + 1 < h.size(); j++) {
                double need = Math.max((lm[j] - logTarget) / j, (lm[j + 1] - logTarget) / (j + 1));
                if (need < best) {
                    best = need;
                    bestCut = j;
                }
            }
            modulus[b - 1] = Math.max(floor, Math.exp(best));
            cut[b - 1] = bestCut;
        }
    }

    /** The lambda-radius of the start point of column b. */
    double radius(int b) {
        double l = ar.abs(scale);
        return atZero ? l / modulus[b - 1] : l * modulus[b - 1];
    }

    /**
     * Column b started on the ray of the given angle and carried radially to rho, then along the circle to the
     * meeting angle.
     */
    LinearIntegrator.Transport<T> carry(LinearIntegrator<T> integrator, int b, double angle, double rho, double meet) {
        double logR = Math.log(radius(b));
        T logLambda = ar.of(logR, angle);
        T lambda = ar.exp(logLambda);
        T v = atZero ? ar.divide(scale, lambda) : ar.divide(lambda, scale);
        T inverse = ar.reciprocal(v);
        List<Matrix<T>> h = formal.series();
        int n = cut[b - 1];
        T top = ar.zero();
        T bottom = ar.zero();
        T power = ar.one();
        double absSum = 0;
        for (int j = 0; j < n; j++) {
            Matrix.Vector<T> col = h.get(j).column(b);
            top = ar.add(top, ar.multiply(col.top(), power));
            bottom = ar.add(bottom, ar.multiply(col.bottom(), power));
            absSum += ma.norm(col) * ar.abs(power);
            power = ar.multiply(power, inverse);
        }
        double omitted = 2 * ma.norm(h.get(n).column(b)) * ar.abs(power)
                + ma.norm(h.get(n + 1).column(b)) * ar.abs(ar.multiply(power, inverse));
        T exponent = exponent(b, v, logLambda);
        T e = ar.exp(exponent);
        Matrix.Vector<T> start = ma.scale(e, new Matrix.Vector<>(top, bottom));
        double gain = 1;
        if (atZero) {
            start = ma.apply(eigenvectors, start);
            gain = ma.norm(eigenvectors);
        }
        // the exponent is large (about log(1/epsilon)) on the start ray: its rounding is a relative error of exp
        double error = ar.abs(e) * gain * (omitted + 4 * epsilon * absSum)
                + 2 * epsilon * (1 + exponentSize(b, v, logLambda)) * ma.norm(start);
        List<double[]> path = List.of(new double[] {logR, angle}, new double[] {Math.log(rho), angle},
                new double[] {Math.log(rho), meet});
        return integrator.carry(start, error, path);
    }

    /** The sum of the moduli of the terms of the exponent (the scale of its rounding error). */
    private double exponentSize(int b, T v, T logLambda) {
        double sum = 0;
        T power = v;
        for (int k = 0; k < rank; k++) {
            T bk = b == 1 ? formal.exponent11(k) : formal.exponent22(k);
            sum += ar.abs(bk) * ar.abs(power) / (k + 1);
            power = ar.multiply(power, v);
        }
        T b1 = b == 1 ? formal.exponent11(-1) : formal.exponent22(-1);
        return sum + ar.abs(b1) * ar.abs(logLambda);
    }

    private T exponent(int b, T v, T logLambda) {
        T sum = ar.zero();
        T power = v;
        for (int k = 0; k < rank; k++) {
            T bk = b == 1 ? formal.exponent11(k) : formal.exponent22(k);
            sum = ar.add(sum, ar.multiply(ar.divide(bk, ar.of(k + 1)), power));
            power = ar.multiply(power, v);
        }
        T b1 = b == 1 ? formal.exponent11(-1) : formal.exponent22(-1);
        T log = ar.multiply(b1, logLambda);
        return atZero ? ar.subtract(sum, log) : ar.add(sum, log);
    }
}
