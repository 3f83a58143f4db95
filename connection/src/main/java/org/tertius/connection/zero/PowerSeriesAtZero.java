package org.tertius.connection.zero;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The convergent expansion at z = 0 of the solutions of Painleve III (DLMF eq. 32.2.3)
 * <pre>  w(z) = B z^sigma V(X, Y),  X = z^(1+sigma), Y = z^(1-sigma),  V = sum v_ab X^a Y^b,  v_00 = 1,</pre>
 * for |Re sigma| &lt; 1. With D = z d/dz the equation multiplied by z^2 w is
 * <pre>  w D^2 w - (D w)^2 = alpha z w^3 + beta z w + gamma z^2 w^4 + delta z^2,</pre>
 * and for V this reads (derived here; the B z^sigma factor drops out of the left side)
 * <pre>  V D^2 V - (D V)^2 = alpha B X V^3 + (beta/B) Y V + gamma B^2 X^2 V^4 + (delta/B^2) Y^2,</pre>
 * whose coefficient at X^a Y^b is {@code (1/2) sum v_ij v_kl (e_kl - e_ij)^2} over (i,j)+(k,l) = (a,b),
 * with e_ab = a(1+sigma) + b(1-sigma) the exponent of X^a Y^b. The pair with (0,0) gives e_ab^2 v_ab,
 * which is solved for (e_ab != 0 for (a,b) != (0,0) because |Re sigma| &lt; 1).
 *
 * <p>sigma = 0 is the family analytic at 0 with w(0) = B; -1 &lt; Re sigma &lt; 0 is the image of the
 * 0 &lt; Re sigma &lt; 1 family under w -> 1/w (of the equation with the parameters of {@code reciprocal()}).
 * When alpha = beta = 0 only even powers of X and Y occur and the series is built in X^2 and Y^2.
 *
 * <p>Rounding: the division by e_ab^2 amplifies rounding errors when sigma is near +-1 (e_0b = b(1-sigma)
 * small). A first-order bound of the propagated rounding error is carried with every coefficient
 * ({@link #roundingAmplification()}) and added to the error estimate of every value; arbitrary-precision callers
 * use it to choose guard digits. Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class PowerSeriesAtZero<T> {
    private final AnalyticArithmetic<T> ar;
    private final T sigma;
    private final T b;
    private final T px;
    private final T py;
    private final int degree;
    private final List<T[]> v;
    private final double[][] err;
    private final double amplification;

    private PowerSeriesAtZero(AnalyticArithmetic<T> ar, T sigma, T b, int degree, Recurrence<T> r) {
        this.ar = ar;
        this.sigma = sigma;
        this.b = b;
        this.degree = degree;
        this.px = r.px;
        this.py = r.py;
        this.v = r.v;
        this.err = r.err;
        this.amplification = r.amplification;
    }

    /**
     * The expansion of the solution with w ~ B z^sigma of PIII(alpha, beta, gamma, delta), coefficients up to
     * total degree {@code degree} in (X, Y) (in (X^2, Y^2) when alpha = beta = 0).
     *
     * @throws InvalidInputException if |Re sigma| &gt;= 1 (resonant: logarithmic terms, see {@link LogarithmicAtZero}),
     *     B = 0, or degree outside [2, 400]
     */
    public static <T> PowerSeriesAtZero<T> create(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b,
                                                  int degree) {
        double re = ar.toComplex(sigma).getReal();
        if (!(Math.abs(re) < 1)) {
            throw new InvalidInputException("sigma", "must have |Re sigma| < 1 for the power family w ~ B z^sigma,"
                    + " got " + ar.toComplex(sigma) + "; at sigma = +-1 the behaviour is logarithmic"
                    + " (w ~ z (c1 log z + c2) for sigma = 1), use the logarithmic family there");
        }
        if (ar.abs(b) == 0) {
            throw new InvalidInputException("B", "must be non-zero (w ~ B z^sigma)");
        }
        if (degree < 2 || degree > 400) {
            throw new InvalidInputException("degree", "must be in [2, 400], got " + degree);
        }
        return new PowerSeriesAtZero<>(ar, sigma, b, degree, new Recurrence<>(ar, parameters, sigma, b, degree));
    }

    public T sigma() {
        return sigma;
    }

    public T amplitude() {
        return b;
    }

    public int degree() {
        return degree;
    }

    /** Coefficient v_ab of X^a Y^b (X, Y replaced by their squares when alpha = beta = 0). */
    public T coefficient(int a, int bIndex) {
        return v.get(a)[bIndex];
    }

    /**
     * The largest ratio of the propagated rounding bound of a coefficient to (unit roundoff x |coefficient|):
     * the number of digits the recurrence loses is about log10 of this.
     */
    public double roundingAmplification() {
        return amplification;
    }

    /** w(z) and w'(z) on the principal branch of z^sigma, with truncation and rounding error estimates. */
    public LocalValue<T> at(T z) {
        T lz = ar.log(z);
        T xv = ar.exp(ar.multiply(px, lz));
        T yv = ar.exp(ar.multiply(py, lz));
        T pre = ar.multiply(b, ar.exp(ar.multiply(sigma, lz)));
        double ax = ar.abs(xv);
        double ay = ar.abs(yv);
        T sw = ar.zero();
        T sd = ar.zero();
        double last = 0;
        double prev = 0;
        double round = 0;
        double roundD = 0;
        double sumAbs = 0;
        double sumAbsD = 0;
        T xa = ar.one();
        for (int a = 0; a <= degree; a++) {
            T term = xa;
            T[] row = v.get(a);
            for (int bb = 0; a + bb <= degree; bb++) {
                T t = ar.multiply(row[bb], term);
                T e = ar.add(sigma, ar.add(ar.multiply(px, ar.of(a)), ar.multiply(py, ar.of(bb))));
                T td = ar.multiply(t, e);
                sw = ar.add(sw, t);
                sd = ar.add(sd, td);
                double m = Math.pow(ax, a) * Math.pow(ay, bb);
                double at = ar.abs(t);
                sumAbs += at;
                sumAbsD += ar.abs(td);
                round += err[a][bb] * m;
                roundD += err[a][bb] * m * ar.abs(e);
                int n = a + bb;
                if (n == degree) {
                    last += at;
                } else if (n == degree - 1) {
                    prev += at;
                }
                term = ar.multiply(term, yv);
            }
            xa = ar.multiply(xa, xv);
        }
        double absPre = ar.abs(pre);
        double absZ = ar.abs(z);
        double trunc = last + prev;
        if (last > 0.5 * prev && prev > 0) {
            trunc = Math.max(trunc, sumAbs); // no visible decay: the point is outside the useful disc
        }
        double eps = ar.epsilon();
        double ew = absPre * (trunc + round + 4 * eps * sumAbs);
        double ed = absPre / absZ * (trunc * (1 + maxExponent()) + roundD + 4 * eps * sumAbsD);
        T w = ar.multiply(pre, sw);
        T dw = ar.divide(ar.multiply(pre, sd), z);
        return new LocalValue<>(z, w, dw, ew, ed);
    }

    private double maxExponent() {
        return ar.abs(sigma) + degree * Math.max(ar.abs(px), ar.abs(py));
    }

    /**
     * Start data for an integrator: the value at the largest z = zMax 2^-k (k = 0, 1, ..., on the ray through
     * zMax) whose estimated error relative to 1 + |value| is at most {@code tolerance}.
     *
     * @throws InvalidInputException if no such point exists above |z| = 1e-250
     */
    public LocalValue<T> startData(T zMax, double tolerance) {
        T z = zMax;
        T half = ar.ratio(1, 2);
        while (ar.abs(z) > 1e-250) {
            LocalValue<T> val = at(z);
            if (val.relativeError(ar) <= tolerance) {
                return val;
            }
            z = ar.multiply(z, half);
        }
        throw new InvalidInputException("tolerance", "the expansion at 0 with sigma = " + ar.toComplex(sigma)
                + " does not reach relative error " + tolerance + " for |z| >= 1e-250 at degree " + degree
                + "; raise the degree or the tolerance");
    }

    /** The coefficient recurrence with its rounding bound. */
    private static final class Recurrence<T> {
        final AnalyticArithmetic<T> ar;
        final T px;
        final T py;
        final List<T[]> v = new ArrayList<>();
        final double[][] err;
        double amplification = 1;
        private final List<Source<T>> sources = new ArrayList<>();
        private final int n;

        Recurrence(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b, int n) {
            List<T> p = parameters;
            this.ar = ar;
            this.n = n;
            boolean even = ar.abs(p.get(0)) == 0 && ar.abs(p.get(1)) == 0;
            int s = even ? 2 : 1;
            T one = ar.one();
            this.px = ar.multiply(ar.add(one, sigma), ar.of(s));
            this.py = ar.multiply(ar.subtract(one, sigma), ar.of(s));
            T b2 = ar.multiply(b, b);
            if (!even) {
                sources.add(new Source<>(ar.multiply(p.get(0), b), 1, 0, 3));
                sources.add(new Source<>(ar.divide(p.get(1), b), 0, 1, 1));
            }
            sources.add(new Source<>(ar.multiply(p.get(2), b2), 2 / s, 0, 4));
            sources.add(new Source<>(ar.divide(p.get(3), b2), 0, 2 / s, 0));
            this.err = new double[n + 1][];
            run();
        }

        private void run() {
            List<T[]> v2 = new ArrayList<>();
            List<T[]> v3 = new ArrayList<>();
            List<T[]> v4 = new ArrayList<>();
            double[][] m1 = new double[n + 1][];
            double[][] e2 = new double[n + 1][];
            double[][] m2 = new double[n + 1][];
            double[][] e3 = new double[n + 1][];
            double[][] m3 = new double[n + 1][];
            double[][] e4 = new double[n + 1][];
            for (int a = 0; a <= n; a++) {
                v.add(newRow(n + 1 - a));
                v2.add(newRow(n + 1 - a));
                v3.add(newRow(n + 1 - a));
                v4.add(newRow(n + 1 - a));
                m1[a] = new double[n + 1 - a];
                m2[a] = new double[n + 1 - a];
                m3[a] = new double[n + 1 - a];
                err[a] = new double[n + 1 - a];
                e2[a] = new double[n + 1 - a];
                e3[a] = new double[n + 1 - a];
                e4[a] = new double[n + 1 - a];
            }
            double eps = ar.epsilon();
            for (int d = 0; d <= n; d++) {
                for (int a = 0; a <= d; a++) {
                    int bb = d - a;
                    if (d == 0) {
                        v.get(0)[0] = ar.one();
                    } else {
                        solve(a, bb, v2, v3, v4, e3, e4, m1, eps);
                    }
                    m1[a][bb] = ar.abs(v.get(a)[bb]);
                    double[] pe = new double[1];
                    v2.get(a)[bb] = conv(v, err, m1, v, err, m1, a, bb, pe);
                    e2[a][bb] = pe[0];
                    m2[a][bb] = ar.abs(v2.get(a)[bb]);
                    v3.get(a)[bb] = conv(v2, e2, m2, v, err, m1, a, bb, pe);
                    e3[a][bb] = pe[0];
                    m3[a][bb] = ar.abs(v3.get(a)[bb]);
                    v4.get(a)[bb] = conv(v2, e2, m2, v2, e2, m2, a, bb, pe);
                    e4[a][bb] = pe[0];
                }
            }
        }

        @SuppressWarnings("unchecked")
        private T[] newRow(int len) {
            Object[] r = new Object[len];
            T z = ar.zero();
            Arrays.fill(r, z);
            return (T[]) r;
        }

        private void solve(int a, int bb, List<T[]> v2, List<T[]> v3, List<T[]> v4, double[][] e3, double[][] e4,
                           double[][] m1, double eps) {
            T rhs = ar.zero();
            double rhsErr = 0;
            double rhsAbs = 0;
            for (Source<T> s : sources) {
                int i = a - s.da;
                int j = bb - s.db;
                if (i < 0 || j < 0) {
                    continue;
                }
                T f;
                double fe;
                if (s.power == 0) {
                    if (i != 0 || j != 0) {
                        continue;
                    }
                    f = ar.one();
                    fe = 0;
                } else if (s.power == 1) {
                    f = v.get(i)[j];
                    fe = err[i][j];
                } else if (s.power == 3) {
                    f = v3.get(i)[j];
                    fe = e3[i][j];
                } else {
                    f = v4.get(i)[j];
                    fe = e4[i][j];
                }
                T t = ar.multiply(s.coefficient, f);
                rhs = ar.add(rhs, t);
                rhsErr += ar.abs(s.coefficient) * fe;
                rhsAbs += ar.abs(t);
            }
            // half the weighted sum over ordered pairs without (0,0)
            T sum = ar.zero();
            double sumErr = 0;
            double sumAbs = 0;
            for (int i = 0; i <= a; i++) {
                for (int j = 0; j <= bb; j++) {
                    int k = a - i;
                    int l = bb - j;
                    if ((i == 0 && j == 0) || (k == 0 && l == 0)) {
                        continue;
                    }
                    T de = ar.add(ar.multiply(px, ar.of(k - i)), ar.multiply(py, ar.of(l - j)));
                    T wgt = ar.multiply(de, de);
                    T t = ar.multiply(ar.multiply(v.get(i)[j], v.get(k)[l]), wgt);
                    sum = ar.add(sum, t);
                    double aw = ar.abs(wgt);
                    sumErr += aw * (m1[i][j] * err[k][l] + err[i][j] * m1[k][l]);
                    sumAbs += ar.abs(t);
                }
            }
            T e = ar.add(ar.multiply(px, ar.of(a)), ar.multiply(py, ar.of(bb)));
            T e2 = ar.multiply(e, e);
            T num = ar.subtract(rhs, ar.multiply(sum, ar.ratio(1, 2)));
            T val = ar.divide(num, e2);
            v.get(a)[bb] = val;
            double ae2 = ar.abs(e2);
            double bound = (rhsErr + 0.5 * sumErr + eps * (a + bb + 4) * (rhsAbs + 0.5 * sumAbs)) / ae2
                    + eps * ar.abs(val);
            err[a][bb] = bound;
            double av = ar.abs(val);
            if (av > 0) {
                amplification = Math.max(amplification, bound / (eps * av));
            }
        }

        /** Coefficient (a, b) of the product x y, with a first-order bound of its propagated rounding error. */
        private T conv(List<T[]> x, double[][] ex, double[][] mx, List<T[]> y, double[][] ey, double[][] my,
                       int a, int bb, double[] errOut) {
            T s = ar.zero();
            double e = 0;
            double abs = 0;
            for (int i = 0; i <= a; i++) {
                for (int j = 0; j <= bb; j++) {
                    T xv = x.get(i)[j];
                    T yv = y.get(a - i)[bb - j];
                    s = ar.add(s, ar.multiply(xv, yv));
                    e += mx[i][j] * ey[a - i][bb - j] + ex[i][j] * my[a - i][bb - j];
                    abs += mx[i][j] * my[a - i][bb - j];
                }
            }
            errOut[0] = e + ar.epsilon() * (a + bb + 2) * abs;
            return s;
        }
    }

    /** A term c X^da Y^db V^power of the right-hand side. */
    private static final class Source<T> {
        final T coefficient;
        final int da;
        final int db;
        final int power;

        Source(T coefficient, int da, int db, int power) {
            this.coefficient = coefficient;
            this.da = da;
            this.db = db;
            this.power = power;
        }
    }
}
