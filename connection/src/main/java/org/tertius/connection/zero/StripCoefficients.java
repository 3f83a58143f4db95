package org.tertius.connection.zero;

import java.util.Arrays;
import java.util.List;
import java.util.function.IntUnaryOperator;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The coefficients v_ab of {@code V = w / (B z^sigma) = sum v_ab X^a Y^b} (X = z^(1+sigma), Y = z^(1-sigma)),
 * row by row, for the strip -1 &lt; Re sigma &lt;= 1, sigma != 1. The recurrence is the one of
 * {@link PowerSeriesAtZero} (derived there):
 * <pre>  e_ab^2 v_ab = [alpha B X V^3 + (beta/B) Y V + gamma B^2 X^2 V^4 + (delta/B^2) Y^2]_ab
 *                 - (1/2) sum' v_ij v_kl (e_kl - e_ij)^2,   e_ab = a(1+sigma) + b(1-sigma),</pre>
 * the sum over ordered pairs (i,j) + (k,l) = (a,b) without (0,0). e_ab vanishes only at (0,0) on the strip:
 * for Re sigma = 1 it is 2a + (b-a)(1-sigma) with (1-sigma) imaginary and non-zero.
 *
 * <p><b>Finite rows</b> (derived here for row 0, observed for the others). Row 0 is exactly
 * {@code 1 + beta Y/(B k^2) + (beta^2 + delta k^2) Y^2/(4 B^2 k^4)}, k = 1 - sigma: with w = z g(log z) the
 * equation reads {@code g g'' - g'^2 = beta g + delta + alpha z^2 g^3 + gamma z^4 g^4}, and without the z-terms
 * its solutions are {@code g = beta/k^2 + a cosh(k (t - t0))}, {@code a^2 = (beta^2 + delta k^2)/k^4}. Row a is a
 * polynomial in Y of degree 2a + 2 (2a + 1 in the variables X^2, Y^2 used when alpha = beta = 0); this was
 * observed to rounding level for random complex parameters. The series is therefore summed by rows: it converges
 * where |X| is small, whatever |Y| (the terms of row a are of size |X Y^2|^a |Y|^2, X Y^2 = z^(3 - sigma)), which is
 * what the edge Re sigma = 1 needs (|Y| = O(1) there). One column beyond the band is computed as a check and
 * kept in the sums, so a violation would show in the error estimates.
 *
 * <p>A first-order bound of the propagated rounding error is carried with every coefficient (as in
 * {@link PowerSeriesAtZero}). Immutable after construction.
 *
 * @param <T> number type
 */
final class StripCoefficients<T> {
    final AnalyticArithmetic<T> ar;
    /** Exponent of X (times 2 when alpha = beta = 0): step (1 + sigma). */
    final T px;
    /** Exponent of Y: step (1 - sigma). */
    final T py;
    /** 2 when alpha = beta = 0 (series in X^2, Y^2), else 1. */
    final int step;
    final int rows;
    /** v[a][b] for b &lt;= band(a) + 1. */
    final T[][] v;
    final double[][] err;
    private final T[][] v2;
    private final T[][] v3;
    private final T[][] v4;
    private final double[][] m1;
    private final double[][] m2;
    private final double[][] e2;
    private final double[][] e3;
    private final double[][] e4;
    private final T alphaB;
    private final T betaOverB;
    private final T gammaB2;
    private final T deltaOverB2;

    StripCoefficients(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b, int rows) {
        this.ar = ar;
        this.rows = rows;
        boolean even = ar.abs(parameters.get(0)) == 0 && ar.abs(parameters.get(1)) == 0;
        this.step = even ? 2 : 1;
        T one = ar.one();
        this.px = ar.multiply(ar.add(one, sigma), ar.of(step));
        this.py = ar.multiply(ar.subtract(one, sigma), ar.of(step));
        T b2 = ar.multiply(b, b);
        this.alphaB = ar.multiply(parameters.get(0), b);
        this.betaOverB = ar.divide(parameters.get(1), b);
        this.gammaB2 = ar.multiply(parameters.get(2), b2);
        this.deltaOverB2 = ar.divide(parameters.get(3), b2);
        this.v = newTable(this::vLength);
        this.v2 = newTable(this::powerLength);
        this.v3 = newTable(this::powerLength);
        this.v4 = newTable(this::powerLength);
        this.err = new double[rows + 1][];
        this.m1 = new double[rows + 1][];
        this.m2 = new double[rows + 1][];
        this.e2 = new double[rows + 1][];
        this.e3 = new double[rows + 1][];
        this.e4 = new double[rows + 1][];
        for (int a = 0; a <= rows; a++) {
            err[a] = new double[vLength(a)];
            m1[a] = new double[powerLength(a)];
            m2[a] = new double[powerLength(a)];
            e2[a] = new double[powerLength(a)];
            e3[a] = new double[powerLength(a)];
            e4[a] = new double[powerLength(a)];
        }
        run();
    }

    /** Degree in Y of row a: 2a + 2 (2a + 1 in the squared variables). */
    int band(int a) {
        return 2 * a + (step == 1 ? 2 : 1);
    }

    private int vLength(int a) {
        return band(a) + 2;
    }

    /** Stored length of the rows of V^2, V^3, V^4 (their bands are 2a + 2p or 2a + p, p the power). */
    private int powerLength(int a) {
        return 2 * a + 10;
    }

    @SuppressWarnings("unchecked")
    private T[][] newTable(IntUnaryOperator length) {
        Object[][] t = new Object[rows + 1][];
        T z = ar.zero();
        for (int a = 0; a <= rows; a++) {
            t[a] = new Object[length.applyAsInt(a)];
            Arrays.fill(t[a], z);
        }
        return (T[][]) t;
    }

    private T at(T[][] table, int a, int b) {
        return a >= 0 && a <= rows && b >= 0 && b < table[a].length ? table[a][b] : ar.zero();
    }

    private static double at(double[][] table, int a, int b) {
        return a >= 0 && a < table.length && b >= 0 && b < table[a].length ? table[a][b] : 0;
    }

    private void run() {
        double eps = ar.epsilon();
        for (int a = 0; a <= rows; a++) {
            for (int b = 0; b < vLength(a); b++) {
                if (a == 0 && b == 0) {
                    v[0][0] = ar.one();
                } else {
                    solve(a, b, eps);
                }
                m1[a][b] = ar.abs(v[a][b]);
            }
            for (int b = 0; b < powerLength(a); b++) {
                double[] pe = new double[1];
                v2[a][b] = conv(v, err, m1, v, err, m1, a, b, pe);
                e2[a][b] = pe[0];
                m2[a][b] = ar.abs(v2[a][b]);
            }
            for (int b = 0; b < powerLength(a); b++) {
                double[] pe = new double[1];
                v3[a][b] = conv(v2, e2, m2, v, err, m1, a, b, pe);
                e3[a][b] = pe[0];
                v4[a][b] = conv(v2, e2, m2, v2, e2, m2, a, b, pe);
                e4[a][b] = pe[0];
            }
        }
    }

    private void solve(int a, int b, double eps) {
        T rhs = ar.zero();
        double rhsErr = 0;
        double rhsAbs = 0;
        if (step == 1) {
            T t = ar.multiply(alphaB, at(v3, a - 1, b));
            rhs = ar.add(rhs, t);
            rhsErr += ar.abs(alphaB) * at(e3, a - 1, b);
            rhsAbs += ar.abs(t);
            t = ar.multiply(betaOverB, at(v, a, b - 1));
            rhs = ar.add(rhs, t);
            rhsErr += ar.abs(betaOverB) * at(err, a, b - 1);
            rhsAbs += ar.abs(t);
        }
        int shift = step == 1 ? 2 : 1;
        T t = ar.multiply(gammaB2, at(v4, a - shift, b));
        rhs = ar.add(rhs, t);
        rhsErr += ar.abs(gammaB2) * at(e4, a - shift, b);
        rhsAbs += ar.abs(t);
        if (a == 0 && b == shift) {
            rhs = ar.add(rhs, deltaOverB2);
            rhsAbs += ar.abs(deltaOverB2);
        }
        T sum = ar.zero();
        double sumErr = 0;
        double sumAbs = 0;
        for (int i = 0; i <= a; i++) {
            for (int j = 0; j < vLength(i) && j <= b; j++) {
                int k = a - i;
                int l = b - j;
                if ((i == 0 && j == 0) || (k == 0 && l == 0) || l >= vLength(k)) {
                    continue;
                }
                T de = ar.add(ar.multiply(px, ar.of(k - i)), ar.multiply(py, ar.of(l - j)));
                T weight = ar.multiply(de, de);
                T term = ar.multiply(ar.multiply(v[i][j], v[k][l]), weight);
                sum = ar.add(sum, term);
                double aw = ar.abs(weight);
                sumErr += aw * (m1[i][j] * err[k][l] + err[i][j] * m1[k][l]);
                sumAbs += ar.abs(term);
            }
        }
        T e = ar.add(ar.multiply(px, ar.of(a)), ar.multiply(py, ar.of(b)));
        T eSquared = ar.multiply(e, e);
        T value = ar.divide(ar.subtract(rhs, ar.multiply(sum, ar.ratio(1, 2))), eSquared);
        v[a][b] = value;
        err[a][b] = (rhsErr + 0.5 * sumErr + eps * (a + b + 4) * (rhsAbs + 0.5 * sumAbs)) / ar.abs(eSquared)
                + eps * ar.abs(value);
    }

    /** Coefficient (a, b) of the product x y with a first-order bound of its propagated rounding error. */
    private T conv(T[][] x, double[][] ex, double[][] mx, T[][] y, double[][] ey, double[][] my, int a, int b,
                   double[] errOut) {
        T s = ar.zero();
        double e = 0;
        double abs = 0;
        for (int i = 0; i <= a; i++) {
            int k = a - i;
            for (int j = 0; j < x[i].length && j <= b; j++) {
                int l = b - j;
                if (l >= y[k].length) {
                    continue;
                }
                T xv = x[i][j];
                T yv = y[k][l];
                s = ar.add(s, ar.multiply(xv, yv));
                double mxv = at(mx, i, j);
                double myv = at(my, k, l);
                e += mxv * at(ey, k, l) + at(ex, i, j) * myv;
                abs += mxv * myv;
            }
        }
        errOut[0] = e + ar.epsilon() * (a + b + 2) * abs;
        return s;
    }
}
