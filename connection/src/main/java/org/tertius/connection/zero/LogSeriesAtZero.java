package org.tertius.connection.zero;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The resonant (logarithmic) solutions at z = 0, sigma = 1, of Painleve III (DLMF eq. 32.2.3) with beta or delta
 * non-zero (derived here):
 * <pre>  w = z G,  G = sum_n z^(s n) Q_n(t),  t = log z - t0,   s = 2 (alpha != 0) or 4 (alpha = 0),
 *   Q_0 = -(beta/2) t^2 - delta/(2 beta)   (beta != 0),      Q_0 = e sqrt(-delta) t,  e = +-1   (beta = 0).</pre>
 * With D = z d/dz and w = z G the equation becomes {@code G D^2 G - (D G)^2 = beta G + delta + alpha z^2 G^3 +
 * gamma z^4 G^4}; without the z-terms its solutions are {@code G = beta/k^2 + a cosh(k (t - t0))},
 * {@code a^2 = (beta^2 + delta k^2)/k^4}, whose limit k = 1 - sigma -> 0 is Q_0 (for beta = 0: G = e sqrt(-delta)
 * (t - t0)). The parameter of the family is t0 (complex), and for beta = 0 also the branch e. With
 * {@code D_j = s j + d/dt} the order z^(sn) reads
 * <pre>  L_n[Q_n] = alpha [G^3]_(n - 2/s) + gamma [G^4]_(n - 4/s) - sum_(0&lt;i&lt;n) (Q_i D_j^2 Q_j - D_i Q_i D_j Q_j),
 *   L_n[Q] = Q_0 D_n^2 Q + Q Q_0'' - 2 Q_0' D_n Q - beta Q,</pre>
 * (j = n - i; [G^p]_m the coefficient of z^(sm), zero for non-integer m). L_n maps t^m to a polynomial of degree
 * m + deg Q_0 with leading coefficient s^2 n^2 lead(Q_0), so Q_n (degree deg R_n - deg Q_0) follows from the top
 * coefficient down; the lowest deg Q_0 coefficients of the right side must then agree by themselves, which is
 * checked (their residual enters the error estimate). The series converges where |z^s t^2| is small.
 *
 * <p>Rounding: the coefficients are built by a few dozen operations each and enter multiplied by z^(sn); the
 * estimate charges 16 (n + 2)^2 units of rounding of every term (a first-order estimate, not a bound).
 * Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class LogSeriesAtZero<T> {
    private final AnalyticArithmetic<T> ar;
    private final T t0;
    private final int branch;
    private final int step;
    private final List<T[]> q = new ArrayList<>();
    private final double[] residual;

    private LogSeriesAtZero(AnalyticArithmetic<T> ar, List<T> p, T t0, int branch, int orders) {
        this.ar = ar;
        this.t0 = t0;
        this.branch = branch;
        this.step = ar.abs(p.get(0)) == 0 ? 4 : 2;
        this.residual = new double[orders + 1];
        build(p, orders);
    }

    /**
     * The logarithmic solution with parameter t0 (w ~ -(beta/2) z (log z - t0)^2 for beta != 0, w ~ e sqrt(-delta)
     * z (log z - t0) for beta = 0, principal square root), orders 0..orders in z^s.
     *
     * @param branch 0 when beta != 0; +1 or -1 (the sign e) when beta = 0
     * @throws InvalidInputException if beta = delta = 0, the branch does not fit beta, or orders outside [1, 100]
     */
    public static <T> LogSeriesAtZero<T> create(AnalyticArithmetic<T> ar, List<T> parameters, T t0, int branch,
                                                int orders) {
        boolean betaZero = ar.abs(parameters.get(1)) == 0;
        if (betaZero && ar.abs(parameters.get(3)) == 0) {
            throw new InvalidInputException("sigma", "sigma = 1 with beta = delta = 0 has no logarithmic solutions"
                    + " (w = C z is then a power solution)");
        }
        if (betaZero && branch != 1 && branch != -1) {
            throw new InvalidInputException("branch", "must be +1 or -1 for beta = 0 (w ~ branch sqrt(-delta) z"
                    + " (log z - t0)), got " + branch);
        }
        if (!betaZero && branch != 0) {
            throw new InvalidInputException("branch", "must be 0 for beta != 0 (w ~ -(beta/2) z (log z - t0)^2 has"
                    + " no branch choice), got " + branch);
        }
        if (orders < 1 || orders > 100) {
            throw new InvalidInputException("orders", "must be in [1, 100], got " + orders);
        }
        return new LogSeriesAtZero<>(ar, parameters, t0, branch, orders);
    }

    public T t0() {
        return t0;
    }

    public int branch() {
        return branch;
    }

    /** Coefficient of t^m in Q_n. */
    public T coefficient(int n, int m) {
        return q.get(n)[m];
    }

    /** Degree of Q_n. */
    public int degree(int n) {
        return q.get(n).length - 1;
    }

    private void build(List<T> p, int orders) {
        T alpha = p.get(0);
        T beta = p.get(1);
        T gamma = p.get(2);
        T delta = p.get(3);
        T[] q0;
        if (ar.abs(beta) == 0) {
            q0 = poly(ar.zero(), ar.multiply(ar.of(branch), ar.sqrt(ar.negate(delta))));
        } else {
            T c0 = ar.negate(ar.divide(delta, ar.multiply(ar.of(2), beta)));
            q0 = poly(c0, ar.zero(), ar.negate(ar.divide(beta, ar.of(2))));
        }
        q.add(q0);
        List<T[]> g2 = new ArrayList<>();
        List<T[]> g3 = new ArrayList<>();
        List<T[]> g4 = new ArrayList<>();
        for (int n = 0; n <= orders; n++) {
            if (n > 0) {
                T[] rhs = zeroPoly(0);
                if (step == 2) {
                    rhs = add(rhs, scale(alpha, g3.get(n - 1)));
                    if (n >= 2) {
                        rhs = add(rhs, scale(gamma, g4.get(n - 2)));
                    }
                } else {
                    rhs = add(rhs, scale(gamma, g4.get(n - 1)));
                }
                for (int i = 1; i < n; i++) {
                    int j = n - i;
                    T[] dj = shiftDerivative(q.get(j), j);
                    T[] di = shiftDerivative(q.get(i), i);
                    rhs = subtract(rhs, subtract(multiply(q.get(i), shiftDerivative(dj, j)), multiply(di, dj)));
                }
                q.add(solve(q0, beta, n, rhs));
            }
            g2.add(convolve(q, q, n));
            g3.add(convolve(g2, q, n));
            g4.add(convolve(g2, g2, n));
        }
    }

    /** [x y]_n = sum_i x_i y_(n-i). */
    private T[] convolve(List<T[]> x, List<T[]> y, int n) {
        T[] s = zeroPoly(0);
        for (int i = 0; i <= n; i++) {
            s = add(s, multiply(x.get(i), y.get(n - i)));
        }
        return s;
    }

    /** D_j f = s j f + f'. */
    private T[] shiftDerivative(T[] f, int j) {
        return add(scale(ar.of(step * j), f), derivative(f));
    }

    private T[] solve(T[] q0, T beta, int n, T[] rhs) {
        int dq0 = q0.length - 1;
        int degree = Math.max(0, rhs.length - 1 - dq0);
        T[] result = zeroPoly(degree);
        T[] r = rhs.clone();
        T lead = ar.multiply(ar.of((double) step * step * n * n), q0[dq0]);
        for (int m = degree; m >= 0; m--) {
            T top = m + dq0 < r.length ? r[m + dq0] : ar.zero();
            T cm = ar.divide(top, lead);
            result[m] = cm;
            T[] unit = zeroPoly(m);
            unit[m] = cm;
            r = subtract(r, apply(q0, beta, n, unit));
        }
        double size = 0;
        double left = 0;
        for (int i = 0; i < rhs.length; i++) {
            size += ar.abs(rhs[i]);
        }
        for (int i = 0; i < Math.min(dq0, r.length); i++) {
            left += ar.abs(r[i]);
        }
        for (int i = dq0; i < r.length; i++) {
            left += ar.abs(r[i]);
        }
        residual[n] = left / Math.max(size, Double.MIN_NORMAL);
        return result;
    }

    /** L_n[Q] = Q_0 D_n^2 Q + Q Q_0'' - 2 Q_0' D_n Q - beta Q. */
    private T[] apply(T[] q0, T beta, int n, T[] f) {
        T[] dn = shiftDerivative(f, n);
        T[] out = multiply(q0, shiftDerivative(dn, n));
        out = add(out, multiply(f, derivative(derivative(q0))));
        out = subtract(out, scale(ar.of(2), multiply(derivative(q0), dn)));
        return subtract(out, scale(beta, f));
    }

    /**
     * The largest relative residual of the consistency conditions of the orders (lowest coefficients that the
     * top-down solution does not use), a check of the derivation and of rounding.
     */
    public double consistencyResidual() {
        double m = 0;
        for (double r : residual) {
            m = Math.max(m, r);
        }
        return m;
    }

    /** w(z) and w'(z) at the point with log coordinate tau, with error estimates; the value's z is exp(tau). */
    public LocalValue<T> at(T tau) {
        T z = ar.exp(tau);
        T t = ar.subtract(tau, t0);
        double at = ar.abs(t);
        T zs = ar.exp(ar.multiply(ar.of(step), tau));
        double azs = ar.abs(zs);
        T g = ar.zero();
        T dg = ar.zero();
        T zp = ar.one();
        int n = q.size() - 1;
        double[] size = new double[n + 1];
        double eps = ar.epsilon();
        double roundG = 0;
        double roundD = 0;
        for (int k = 0; k <= n; k++) {
            T[] qk = q.get(k);
            T value = ar.zero();
            T slope = ar.zero();
            double majorant = 0;
            for (int m = qk.length - 1; m >= 0; m--) {
                slope = ar.add(ar.multiply(slope, t), value);
                value = ar.add(ar.multiply(value, t), qk[m]);
                majorant = majorant * at + ar.abs(qk[m]);
            }
            T term = ar.multiply(zp, value);
            g = ar.add(g, term);
            // D (z^(sk) Q_k) = z^(sk) (s k Q_k + Q_k')
            dg = ar.add(dg, ar.multiply(zp, ar.add(ar.multiply(ar.of(step * k), value), slope)));
            size[k] = Math.pow(azs, k) * majorant;
            double r = (16 * eps * (k + 2) * (k + 2) + residual[k]) * size[k];
            roundG += r;
            roundD += r * derivativeFactor(k, qk.length - 1, at);
            zp = ar.multiply(zp, zs);
        }
        double trunc = size[n] + (n >= 1 ? size[n - 1] : 0);
        if (n >= 1 && !(size[n] <= 0.5 * size[n - 1])) {
            for (double sz : size) {
                trunc += sz;
            }
        }
        double az = ar.abs(z);
        double ew = az * (trunc + roundG);
        double ed = trunc * derivativeFactor(n + 1, q.get(n).length + 1, at) + roundD;
        T w = ar.multiply(z, g);
        T dw = ar.add(g, dg);
        return new LocalValue<>(z, w, dw, ew, ed);
    }

    /** Bound of |(1 + D) f| / |f| for f = z^(sk) times a polynomial of the given degree in t (|t| = at). */
    private double derivativeFactor(int k, int degree, double at) {
        return step * k + 1 + degree / Math.max(at, 0.5);
    }

    /**
     * Start data: the value at the largest |z| = |zMax| 2^-k on the ray and sheet of {@code tauMax} whose estimated
     * error relative to 1 + |value| is at most {@code tolerance}.
     *
     * @throws InvalidInputException if no such point exists above |z| = 1e-250
     */
    public LocalValue<T> startData(T tauMax, double tolerance) {
        return LocalValue.firstWithin(ar, tauMax, tolerance, this::at)
                .orElseThrow(() -> new InvalidInputException("tolerance",
                        "the logarithmic series at 0 does not reach relative error " + tolerance
                                + " for |z| >= 1e-250; raise the tolerance"));
    }

    // --- polynomials in t as coefficient arrays (index = power) ---

    @SafeVarargs
    private T[] poly(T... c) {
        return c.clone();
    }

    @SuppressWarnings("unchecked")
    private T[] zeroPoly(int degree) {
        Object[] r = new Object[degree + 1];
        Arrays.fill(r, ar.zero());
        return (T[]) r;
    }

    private T[] add(T[] x, T[] y) {
        T[] r = zeroPoly(Math.max(x.length, y.length) - 1);
        for (int i = 0; i < r.length; i++) {
            T a = i < x.length ? x[i] : ar.zero();
            T b = i < y.length ? y[i] : ar.zero();
            r[i] = ar.add(a, b);
        }
        return r;
    }

    private T[] subtract(T[] x, T[] y) {
        return add(x, scale(ar.of(-1), y));
    }

    private T[] scale(T c, T[] x) {
        T[] r = zeroPoly(x.length - 1);
        for (int i = 0; i < x.length; i++) {
            r[i] = ar.multiply(c, x[i]);
        }
        return r;
    }

    private T[] multiply(T[] x, T[] y) {
        T[] r = zeroPoly(x.length + y.length - 2);
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < y.length; j++) {
                r[i + j] = ar.add(r[i + j], ar.multiply(x[i], y[j]));
            }
        }
        return r;
    }

    private T[] derivative(T[] x) {
        if (x.length <= 1) {
            return zeroPoly(0);
        }
        T[] r = zeroPoly(x.length - 2);
        for (int i = 1; i < x.length; i++) {
            r[i - 1] = ar.multiply(ar.of(i), x[i]);
        }
        return r;
    }
}
